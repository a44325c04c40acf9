// One time step of the finite-volume heat equation  V_i dE_i/dt = F_i(T)  (E = e(T), the volumetric enthalpy)
// by TR-BDF2, gamma = 2 - sqrt(2): a trapezoidal stage to t + gamma h, then a BDF2 stage to t + h.
// Method: Bank, Coughran, Fichtner, Grosse, Rose and Smith, Transient simulation of silicon devices and circuits,
// IEEE Trans. CAD 4 (1985); written as the ESDIRK tableau c = (0, gamma, 1), rows (d, d), (w, w, d), d = gamma/2,
// w = sqrt(2)/4, with the embedded third-order weights ((1-w)/3, (3w+1)/3, d/3): Hosea and Shampine,
// Analysis and implementation of TR-BDF2, Appl. Numer. Math. 20 (1996) (from memory).
// Validity: any step size (L-stable: no oscillation at large Bi or on the first step); second order in time.
// Convergence rule: Newton per stage until the enthalpy residual over V C is below newtonTolK (kelvin);
// a stage that does not converge in MAX_NEWTON_ITERATIONS, or a step that leaves a cp peak unresolved, is refused.
// Error: local error estimate h * sum (bhat - b) F, filtered by (V C - d h dF/dT)^-1 as Hosea and Shampine do,
// in kelvin per node. Both stages are written as enthalpy differences equal to weighted sums of the fluxes, so
// the stored energy changes by exactly the heat that crosses the surface (to the Newton tolerance).
// Space: fluxes through faces with the harmonic-mean conductivity 2 k_P k_E / (k_P + k_E),
// Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Eq. 4.9 (from memory).
import type { SurfaceBoundary } from '../../properties/surfaceBoundary';
import { solveTridiagonal } from '../../numerics/solveTridiagonal';
import type { VolumeGrid } from './buildVolumeGrid';
import { evaluateMaterial, type MaterialTable } from './tabulateMaterial';

const GAMMA = 2 - Math.SQRT2;
const D = GAMMA / 2;
const W = Math.SQRT2 / 4;
// bhat - b for the three stages: ((1 - 4w)/3, 1/3, -2d/3); they sum to zero.
const ERR_WEIGHT_START = (1 - 4 * W) / 3;
const ERR_WEIGHT_MID = 1 / 3;
const ERR_WEIGHT_END = (-2 * D) / 3;
const MAX_NEWTON_ITERATIONS = 25;
/**
 * A step whose enthalpy change differs from the trapezoid of its end capacities by more than this fraction
 * has stepped over a feature of C(T) narrower than the step (a latent-heat peak): it is refused. Common practice.
 */
const CAPACITY_FEATURE_FRACTION = 0.05;

export type StepAttempt = { ok: true; errorK: number } | { ok: false; reason: 'newton' | 'capacity-peak' };

export interface TrBdf2Stepper {
  /** Accepted state: temperatures, net inflow F (W in grid units), capacities C, enthalpies e. */
  readonly temperatureK: Float64Array;
  readonly inflow: Float64Array;
  readonly capacity: Float64Array;
  readonly enthalpy: Float64Array;
  /** Trial temperatures after `attempt`. */
  readonly trialTemperatureK: Float64Array;
  /** Heat out through the surface over the trial step (grid units, J). */
  trialHeatOut(): number;
  /** Sets the accepted state (computes F, C, e). Returns false if the temperatures are not finite. */
  setState(temperatureK: Float64Array): boolean;
  attempt(stepS: number): StepAttempt;
  accept(): void;
}

export function createTrBdf2Stepper(grid: VolumeGrid, table: MaterialTable, boundary: SurfaceBoundary, lowK: number, highK: number, newtonTolK: number): TrBdf2Stepper {
  const n = grid.nodeCount;
  const { volumes: vol, faceAreaOverDistance: geo, surfaceArea } = grid;
  const arr = () => new Float64Array(n);
  let t0 = arr(), f0 = arr(), c0 = arr(), e0 = arr();
  let t1 = arr(), f1 = arr(), c1 = arr(), e1 = arr();
  const tg = arr(), fg = arr(), cg = arr(), eg = arr();
  const k = arr(), dk = arr();
  const lower = arr(), diag = arr(), upper = arr(), rhs = arr(), delta = arr(), work = arr(), explicit = arr();
  let q0 = 0, qg = 0, q1 = 0;
  let lastStepS = 0;
  // The state before the accepted one and the step between them, for the stage predictor.
  const tPrev = arr();
  let prevStepS = 0;
  const maxNewtonMoveK = Math.max(highK - lowK, 1);
  // One interval means constant properties: e is linear in T and no capacity peak can be stepped over.
  const capacityVaries = table.intervals > 1;

  /** F, C, e and the Jacobian V C - a dF/dT at T into (f, c, e, lower/diag/upper); returns the surface flux. */
  function evaluate(t: Float64Array, f: Float64Array, c: Float64Array, e: Float64Array, a: number): number {
    evaluateMaterial(table, t, n, k, dk, c, e);
    let inflowFromLeft = 0;
    // Derivatives of the previous face flow: P = d(phi)/dT_left, Q = d(phi)/dT_right.
    let dLeftPrev = 0;
    let dRightPrev = 0;
    for (let j = 0; j < n - 1; j++) {
      const ka = k[j], kb = k[j + 1];
      const inv = 1 / (ka + kb);
      const kf = 2 * ka * kb * inv;
      const g = geo[j];
      const gdt = g * (t[j] - t[j + 1]);
      const phi = gdt * kf;
      // d(kf)/d(ka) = 2 kb² / (ka + kb)², d(kf)/d(kb) = 2 ka² / (ka + kb)².
      const p = g * kf + gdt * 2 * kb * kb * inv * inv * dk[j];
      const q = -g * kf + gdt * 2 * ka * ka * inv * inv * dk[j + 1];
      f[j] = inflowFromLeft - phi;
      diag[j] = vol[j] * c[j] - a * (dRightPrev - p);
      lower[j] = -a * dLeftPrev;
      upper[j] = a * q;
      inflowFromLeft = phi;
      dLeftPrev = p;
      dRightPrev = q;
    }
    const last = n - 1;
    const ts = t[last];
    const qs = boundary.fluxOut(ts);
    f[last] = inflowFromLeft - surfaceArea * qs;
    diag[last] = vol[last] * c[last] - a * (dRightPrev - surfaceArea * boundary.fluxOutDerivative(ts));
    lower[last] = -a * dLeftPrev;
    return qs;
  }

  /**
   * Newton for V e(T) - a F(T) = explicit; T holds the guess and gets the solution. Converged when the residual,
   * divided by the node's heat capacity V C (kelvin of stored energy), is below newtonTolK: F, C, e are then those
   * of the returned T.
   */
  function solveStage(t: Float64Array, f: Float64Array, c: Float64Array, e: Float64Array, a: number): number | null {
    for (let iter = 0; iter <= MAX_NEWTON_ITERATIONS; iter++) {
      const qs = evaluate(t, f, c, e, a);
      let residualK = 0;
      for (let i = 0; i < n; i++) {
        const r = explicit[i] + a * f[i] - vol[i] * e[i];
        rhs[i] = r;
        // Scaled by the node's own capacity, not the diagonal: on long steps the conduction terms dominate the
        // diagonal and would hide a residual that still creates or destroys energy.
        const rk = Math.abs(r) / (vol[i] * c[i]);
        if (rk > residualK) residualK = rk;
      }
      if (!(residualK < Infinity) || !Number.isFinite(qs)) return null;
      if (residualK <= newtonTolK) return qs;
      if (iter === MAX_NEWTON_ITERATIONS) break;
      solveTridiagonal(n, lower, diag, upper, rhs, delta, work);
      let move = 0;
      for (let i = 0; i < n; i++) {
        const d = Math.abs(delta[i]);
        if (d > move) move = d;
      }
      const scale = move > maxNewtonMoveK ? maxNewtonMoveK / move : 1;
      for (let i = 0; i < n; i++) t[i] += scale * delta[i];
    }
    return null;
  }

  function peakSkipped(ta: Float64Array, ca: Float64Array, ea: Float64Array, tb: Float64Array, cb: Float64Array, eb: Float64Array): boolean {
    for (let i = 0; i < n; i++) {
      const de = eb[i] - ea[i];
      const trapezoid = 0.5 * (ca[i] + cb[i]) * (tb[i] - ta[i]);
      if (Math.abs(de - trapezoid) > CAPACITY_FEATURE_FRACTION * Math.abs(de) + 1e-12 * Math.abs(ea[i])) return true;
    }
    return false;
  }

  const stepper: TrBdf2Stepper = {
    get temperatureK() { return t0; },
    get inflow() { return f0; },
    get capacity() { return c0; },
    get enthalpy() { return e0; },
    get trialTemperatureK() { return t1; },
    // Heat out over the trial step: the same weighted sum of surface flows the enthalpy update used.
    trialHeatOut: () => lastStepS * surfaceArea * (W * q0 + W * qg + D * q1),
    setState(temperatureK) {
      t0.set(temperatureK);
      prevStepS = 0;
      q0 = evaluate(t0, f0, c0, e0, 0);
      for (let i = 0; i < n; i++) if (!Number.isFinite(f0[i])) return false;
      return Number.isFinite(q0);
    },
    attempt(h) {
      const a = D * h;
      // Stage 1, trapezoid to t + gamma h: V e_g - d h F_g = V e_0 + d h F_0.
      // Predictor: the secant through the last two accepted states (the accepted state on the first step).
      const lean = prevStepS > 0 ? (GAMMA * h) / prevStepS : 0;
      for (let i = 0; i < n; i++) {
        explicit[i] = vol[i] * e0[i] + a * f0[i];
        const guess = t0[i] + lean * (t0[i] - tPrev[i]);
        tg[i] = guess < lowK ? lowK : guess > highK ? highK : guess;
      }
      const qgNew = solveStage(tg, fg, cg, eg, a);
      if (qgNew === null) return { ok: false, reason: 'newton' };
      // Stage 2, BDF2 to t + h: V e_1 - d h F_1 = V e_0 + w h (F_0 + F_g).
      for (let i = 0; i < n; i++) {
        explicit[i] = vol[i] * e0[i] + W * h * (f0[i] + fg[i]);
        const guess = t0[i] + (tg[i] - t0[i]) / GAMMA;
        t1[i] = guess < lowK ? lowK : guess > highK ? highK : guess;
      }
      const q1New = solveStage(t1, f1, c1, e1, a);
      if (q1New === null) return { ok: false, reason: 'newton' };
      if (capacityVaries && (peakSkipped(t0, c0, e0, tg, cg, eg) || peakSkipped(tg, cg, eg, t1, c1, e1))) return { ok: false, reason: 'capacity-peak' };
      qg = qgNew;
      q1 = q1New;
      // Embedded error, filtered with the Jacobian of the last stage (still in lower/diag/upper).
      for (let i = 0; i < n; i++) rhs[i] = h * (ERR_WEIGHT_START * f0[i] + ERR_WEIGHT_MID * fg[i] + ERR_WEIGHT_END * f1[i]);
      solveTridiagonal(n, lower, diag, upper, rhs, delta, work);
      let errorK = 0;
      for (let i = 0; i < n; i++) {
        const d = Math.abs(delta[i]);
        if (d > errorK) errorK = d;
      }
      lastStepS = h;
      return { ok: true, errorK };
    },
    accept() {
      tPrev.set(t0);
      prevStepS = lastStepS;
      [t0, t1] = [t1, t0];
      [f0, f1] = [f1, f0];
      [c0, c1] = [c1, c0];
      [e0, e1] = [e1, e0];
      q0 = q1;
    },
  };
  return stepper;
}
