// Adaptive integration of y' = f(t, y) from t0 to tEnd with the Dormand-Prince 5(4) pair (dormandPrinceStep.ts).
// Step control: err = RMS(e_i / (atol_i + rtol max(|y_i|, |y_new_i|))), accept if err <= 1, next h = h min(5, max(0.2,
// 0.9 err^(-1/5))) (Hairer, Norsett and Wanner, Solving Ordinary Differential Equations I, 2nd ed., Sec. II.4, Eqs. 4.11-4.13,
// from memory). Expected error: global error of order the tolerances times the number of time constants covered.
// Bounded: at most maxSteps accepted steps; the visitor may stop the integration early by returning false.
import { dormandPrinceStep, type OdeRight } from './dormandPrinceStep';

export interface IntegrationOptions {
  relativeTolerance: number;
  absoluteTolerance: Float64Array;
  initialStep: number;
  maxSteps: number;
}

/** Called after each accepted step [t0, t1]; return false to stop. */
export type StepVisitor = (t0: number, y0: Float64Array, t1: number, y1: Float64Array) => boolean;

export interface IntegrationResult {
  t: number;
  y: Float64Array;
  steps: number;
  rejected: number;
}

export function integrateDormandPrince(f: OdeRight, t0: number, y0: Float64Array, tEnd: number, options: IntegrationOptions, visit: StepVisitor): IntegrationResult {
  let t = t0;
  let y: Float64Array = Float64Array.from(y0);
  let h = Math.min(options.initialStep, tEnd - t0);
  let steps = 0;
  let rejected = 0;
  const n = y.length;
  while (t < tEnd && steps < options.maxSteps) {
    const last = t + h >= tEnd;
    const step = last ? tEnd - t : h;
    const { y: next, error } = dormandPrinceStep(f, t, y, step);
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const scale = options.absoluteTolerance[i] + options.relativeTolerance * Math.max(Math.abs(y[i]), Math.abs(next[i]));
      sum += (error[i] / scale) ** 2;
    }
    const err = Math.sqrt(sum / n);
    const factor = Math.min(5, Math.max(0.2, 0.9 * err ** -0.2));
    if (err <= 1 || !Number.isFinite(factor)) {
      const t1 = last ? tEnd : t + step;
      const keepGoing = visit(t, y, t1, next);
      t = t1;
      y = next;
      steps++;
      h = step * (err === 0 ? 5 : factor);
      if (!keepGoing) break;
    } else {
      rejected++;
      h = step * factor;
    }
  }
  return { t, y, steps, rejected };
}
