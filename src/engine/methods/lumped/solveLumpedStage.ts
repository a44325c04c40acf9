// Stage solver: the part as a body at one temperature (lumped capacitance), started from the start field's volume mean.
// Closed form (constant properties and h, no radiation): T = T_inf + (T_i - T_inf) exp(-t / tau), tau = rho c V / (h As),
// time to target t = tau ln((T_i - T_inf) / (T - T_inf)) (Incropera et al., Fundamentals of Heat and Mass Transfer,
// 6th ed., Eqs. 5.5-5.7, from memory).
// Otherwise the energy balance rho c(T) V dT/dt = -As [h(T)(T - T_inf) + eps sigma (T^4 - T_sur^4)] (ibid. Eq. 5.15,
// from memory; boundary.fluxOut) together with Q' = As fluxOut, integrated by Dormand-Prince 5(4) with
// RELATIVE_TOLERANCE; a target crossing is located inside the step by Brent on the step length (each trial a fresh
// Dormand-Prince step from the step's start), samples likewise. Steps also end exactly where T crosses a table
// breakpoint of rho, c or h (a kink of the right-hand side that the embedded error estimate would not see). Validity: any shape, as far as one temperature describes
// it (the plan runner judges that from the Biot number and lumpedSpreadFraction). Expected error: ~1e-9 of the excess.
// The body moves monotonically toward the equilibrium temperature where fluxOut = 0 (a scalar autonomous ODE cannot pass
// an equilibrium); the equilibrium is taken as the root of fluxOut between T_inf and T_sur.
import type { PointId } from '@/schema/planSchema';
import type { StageOutcome, StageSolver } from '../stageProblem';
import { findRootBracketed } from '@/engine/numerics/findRootBracketed';
import { dormandPrinceStep } from '@/engine/numerics/dormandPrinceStep';
import { integrateDormandPrince } from '@/engine/numerics/integrateDormandPrince';
import { integrateAdaptiveSimpson } from '@/engine/numerics/integrateAdaptiveSimpson';
import { fieldMeanK } from '@/engine/fieldAtPoints';
import { lumpedTimeConstantS } from './lumpedTimeConstantS';

const RELATIVE_TOLERANCE = 1e-10;
/** The body counts as at equilibrium (integration stops) within this fraction of its start excess. */
const FROZEN_FRACTION = 1e-12;
const MAX_STEPS = 1_000_000;
/** Longest stage a plan allows, s (the plan schema's limit). */
const MAX_STAGE_DURATION_S = 1e8;

const show = (k: number) => `${(k - 273.15).toFixed(2)} °C (${k.toFixed(2)} K)`;

function reachability(startK: number, targetK: number, equilibriumK: number, toleranceK: number): StageOutcome | null {
  if (Math.abs(startK - targetK) <= toleranceK) {
    return { ok: false, code: 'target-unreachable', message: `The part already starts at the target ${show(targetK)} (within ${toleranceK} K): there is nothing for this stage to do. Remove the stage or change its target.` };
  }
  if (Math.abs(targetK - equilibriumK) <= toleranceK) {
    return { ok: false, code: 'target-unreachable', message: `The target ${show(targetK)} equals the temperature the part settles at in this medium, ${show(equilibriumK)}: it is only approached asymptotically, never reached. Set the target a little short of it.` };
  }
  const between = (targetK - startK) * (targetK - equilibriumK) < 0;
  if (between) return null;
  const beyondEquilibrium = Math.sign(targetK - equilibriumK) === Math.sign(equilibriumK - startK);
  return {
    ok: false,
    code: 'target-unreachable',
    message: beyondEquilibrium
      ? `The target ${show(targetK)} lies on the far side of the temperature the part settles at in this medium, ${show(equilibriumK)}: the part (starting at ${show(startK)}) cannot pass it.`
      : `The target ${show(targetK)} is beyond what the part can reach: it starts at ${show(startK)} and only moves toward ${show(equilibriumK)} in this stage.`,
  };
}

export const solveLumpedStage: StageSolver = (problem) => {
  const { geometry, material, boundary, end } = problem;
  if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'Stopped.' };
  const startK = fieldMeanK(problem.start, geometry);
  const V = geometry.volumeM3;
  const As = geometry.cooledAreaM2;
  const mediumK = boundary.mediumK;
  const rad = boundary.radiation;

  let equilibriumK = mediumK;
  if (rad && rad.surroundingsK !== mediumK) {
    const lo = Math.min(mediumK, rad.surroundingsK);
    const hi = Math.max(mediumK, rad.surroundingsK);
    equilibriumK = findRootBracketed((t) => boundary.fluxOut(t), lo, hi);
  }
  if (end.kind === 'point-temperature') {
    const verdict = reachability(startK, end.temperatureK, equilibriumK, problem.toleranceK);
    if (verdict) return verdict;
  }

  const ids: PointId[] = geometry.points.map((p) => p.id);
  const depthM = problem.depthM ?? (end.kind === 'point-temperature' ? end.depthM : undefined);
  if (depthM !== undefined && !ids.includes('depth')) ids.push('depth');
  const count = Math.max(2, problem.sampleCount);
  const curves = (values: Float64Array) => Object.fromEntries(ids.map((id) => [id, Float64Array.from(values)])) as Partial<Record<PointId, Float64Array>>;
  const timesOver = (durationS: number) => Float64Array.from({ length: count }, (_, k) => (k === count - 1 ? durationS : (k * durationS) / (count - 1)));

  // Closed form.
  if (material.isConstant && boundary.hIsConstant && !rad) {
    const tau = lumpedTimeConstantS(geometry, material, boundary, startK);
    let durationS: number;
    if (end.kind === 'duration') durationS = end.seconds;
    else {
      durationS = tau * Math.log((startK - mediumK) / (end.temperatureK - mediumK));
      if (durationS > MAX_STAGE_DURATION_S) {
        return { ok: false, code: 'target-not-reached', message: `The part would reach ${show(end.temperatureK)} only after ${durationS.toExponential(3)} s, longer than the longest stage a plan allows (${MAX_STAGE_DURATION_S} s).` };
      }
    }
    const timeS = timesOver(durationS);
    const values = Float64Array.from(timeS, (t) => mediumK + (startK - mediumK) * Math.exp(-t / tau));
    const endK = values[count - 1];
    return {
      ok: true,
      solution: {
        method: 'lumped',
        durationS,
        samples: { timeS, temperaturesK: curves(values) },
        endField: { kind: 'uniform', temperatureK: endK },
        heatRemovedJ: material.volumetricHeatCapacity(startK) * V * (startK - endK),
        energyRelativeError: null,
        effort: {},
        notes: [],
      },
    };
  }

  // ODE form: y = [T, heat out through the surface so far].
  const f = (_t: number, y: Float64Array) => {
    const q = As * boundary.fluxOut(y[0]);
    return Float64Array.of(-q / (material.volumetricHeatCapacity(y[0]) * V), q);
  };
  const excessK = Math.abs(startK - equilibriumK);
  const energyScaleJ = material.volumetricHeatCapacity(startK) * V * Math.max(excessK, 1e-300);
  const rate = Math.abs(f(0, Float64Array.of(startK, 0))[0]);
  const horizonS = end.kind === 'duration' ? end.seconds : MAX_STAGE_DURATION_S;
  const options = {
    relativeTolerance: RELATIVE_TOLERANCE,
    absoluteTolerance: Float64Array.of(RELATIVE_TOLERANCE * Math.max(excessK, 1e-300), RELATIVE_TOLERANCE * energyScaleJ),
    initialStep: rate > 0 ? Math.min(horizonS, (1e-3 * excessK) / rate) : horizonS,
    maxSteps: MAX_STEPS,
  };
  // Temperatures where a property or h table changes slope, in the order the body meets them: each ends a step
  // exactly (located like the target), so no step straddles a kink of the right-hand side.
  const direction = Math.sign(equilibriumK - startK);
  const kinks = [...(material.density.breakpointsK ?? []), ...(material.specificHeat.breakpointsK ?? []), ...(boundary.hBreakpointsK ?? [])]
    .filter((t) => (t - startK) * direction > 0 && (equilibriumK - t) * direction > 0)
    .sort((a, b) => (a - b) * direction);
  const targetK = end.kind === 'point-temperature' ? end.temperatureK : null;
  const stepStarts: { t: number; y: Float64Array }[] = [];
  let crossing: { t: number; y: Float64Array } | null = null;
  let aborted = false;
  let kinkIndex = 0;
  let t = 0;
  let y: Float64Array = Float64Array.of(startK, 0);
  let steps = 0;
  let lastStepS = options.initialStep;
  let result: { t: number; y: Float64Array; steps: number } = { t, y, steps: 0 };
  for (;;) {
    let event: { t: number; y: Float64Array; isTarget: boolean } | null = null;
    result = integrateDormandPrince(f, t, y, horizonS, { ...options, initialStep: lastStepS }, (t0, y0, t1, y1) => {
      stepStarts.push({ t: t0, y: y0 });
      lastStepS = t1 - t0;
      if (stepStarts.length % 1000 === 0 && problem.signal?.aborted) { aborted = true; return false; }
      const passed = (level: number) => Math.sign(y1[0] - level) !== Math.sign(y0[0] - level);
      // The first level met along the motion: the target or the next kink, whichever is nearer the step's start.
      const levels: { level: number; isTarget: boolean }[] = [];
      if (targetK !== null && passed(targetK)) levels.push({ level: targetK, isTarget: true });
      if (kinkIndex < kinks.length && passed(kinks[kinkIndex])) levels.push({ level: kinks[kinkIndex], isTarget: false });
      if (levels.length > 0) {
        levels.sort((a, b) => Math.abs(a.level - y0[0]) - Math.abs(b.level - y0[0]));
        const { level, isTarget } = levels[0];
        const along = (h: number) => (h === 0 ? y0[0] : dormandPrinceStep(f, t0, y0, h).y[0]) - level;
        const h = findRootBracketed(along, 0, t1 - t0);
        event = { t: t0 + h, y: h === 0 ? y0 : dormandPrinceStep(f, t0, y0, h).y, isTarget };
        return false;
      }
      return Math.abs(y1[0] - equilibriumK) > FROZEN_FRACTION * excessK;
    });
    steps += result.steps;
    // Assigned inside the visitor, which TypeScript's flow analysis does not follow.
    const found = event as { t: number; y: Float64Array; isTarget: boolean } | null;
    if (aborted || !found) break;
    if (found.isTarget) { crossing = { t: found.t, y: found.y }; break; }
    kinkIndex++;
    t = found.t;
    y = found.y;
    if (steps >= MAX_STEPS) break;
  }
  if (aborted) return { ok: false, code: 'aborted', message: 'Stopped.' };
  if (end.kind === 'point-temperature' && crossing === null) {
    return { ok: false, code: 'target-not-reached', message: `The part has not reached ${show(end.temperatureK)} after ${result.t.toExponential(3)} s${steps >= MAX_STEPS ? ` (${MAX_STEPS} steps)` : ''}; it tends to ${show(equilibriumK)}.` };
  }
  const crossingS: number | null = crossing === null ? null : (crossing as { t: number }).t;
  const durationS = crossingS ?? horizonS;
  const finalState = crossing ?? { t: result.t, y: result.y };
  // State at time t: a fresh step from the start of the accepted step that covers t; at rest beyond the last state.
  let cursor = 0;
  const stateAt = (t: number): Float64Array => {
    if (t >= finalState.t && crossingS === null) return finalState.y;
    while (cursor + 1 < stepStarts.length && stepStarts[cursor + 1].t <= t) cursor++;
    const s = stepStarts[cursor];
    return t === s.t ? s.y : dormandPrinceStep(f, s.t, s.y, t - s.t).y;
  };
  const timeS = timesOver(durationS);
  const states = Array.from(timeS, (t) => stateAt(t));
  const values = Float64Array.from(states, (y) => y[0]);
  const endK = values[count - 1];
  const surfaceHeatJ = states[count - 1][1];
  // Stored energy given up: V int_{T_end}^{T_start} rho c(T) dT.
  const heatRemovedJ = V * integrateAdaptiveSimpson((t) => material.volumetricHeatCapacity(t), endK, startK, 1e-13 * Math.max(1, Math.abs(startK - endK)) * material.volumetricHeatCapacity(startK));
  return {
    ok: true,
    solution: {
      method: 'lumped',
      durationS,
      samples: { timeS, temperaturesK: curves(values) },
      endField: { kind: 'uniform', temperatureK: endK },
      heatRemovedJ,
      energyRelativeError: heatRemovedJ !== 0 ? Math.abs(surfaceHeatJ - heatRemovedJ) / Math.abs(heatRemovedJ) : null,
      effort: { steps },
      notes: [],
    },
  };
};
