// General 1-D finite-volume stage solver: plane wall (symmetric or insulated back), long cylinder, sphere.
// Method: vertex-centred finite volumes (buildVolumeGrid), nodes clustered at the cooled surface, harmonic-mean face
// conductivity, enthalpy form with k(T) and rho cp(T) (tabulateMaterial), Newton-linearised surface flux
// (convection with constant or boiling-curve h plus radiation), TR-BDF2 in time with an embedded error estimate
// and automatic step control (trBdf2Stepper), on two nested grids whose results are combined by Richardson
// extrapolation in space (richardsonPair).
// Validity: any Bi, any start field of the shape (uniform, exact series, sampled grid), heating or cooling.
// Convergence rule: the grids are sized from Bi and toleranceK / (temperature span) (sizeGrid, then a
// COARSE_REDUCTION share of it for the coarse grid, twice that for the fine one); steps are accepted when the filtered
// local error of both grids is below TIME_TOLERANCE_FRACTION x toleranceK (a smaller share, and less again in
// transition boiling, where the boundary has a falling-flux range).
// Expected error: reported temperatures within toleranceK of the exact answer (checked against the exact series
// in test/unit/finite-volume; the demo quench through its film collapse within 0.007 K of a 30x tighter run, but a
// collapse amplifies earlier errors some 100 times, see docs/methods/finite-volume.md); energy balance exact to
// rounding (the stage enthalpy is set from the balance).
import type { StageOutcome, StageProblem, StageSolution } from '../stageProblem';
import type { Field1D } from '../../fields';
import type { PointId } from '@/schema/planSchema';
import type { SurfaceBoundary } from '../../properties/surfaceBoundary';
import { buildVolumeGrid, gridOnNodes, areaExponentOf, type VolumeGrid } from './buildVolumeGrid';
import { tabulateMaterial } from './tabulateMaterial';
import { createTrBdf2Stepper } from './trBdf2Stepper';
import { createRichardsonPair, type GridMember, type PairProbe, type RichardsonPair } from './richardsonPair';
import { MEAN_PROBE, probeAt } from './gridProbe';
import { createPointHistory, recordPoints, samplePoint } from './pointHistory';
import { sizeGrid } from './sizeGrid';
import { equilibriumTemperature } from './equilibriumTemperature';
import { temperatureAt } from '../series/evaluateField1D';
import { KELVIN_OFFSET } from '@/schema/planTemperatures';

/** Share of the tolerance given to the local time error of one step (the rest to space and accumulation). Common practice. */
const TIME_TOLERANCE_FRACTION = 0.1;
/**
 * The share for a stage whose boundary has a falling-flux range (transition boiling) between the temperatures the
 * stage can reach, while the surface has that range still ahead (once past it, TIME_TOLERANCE_FRACTION again):
 * a local error made before the film collapse is carried through it as a time shift of a curve falling at hundreds
 * of K/s. Set from the demo water quench: 0.1 left 0.039 K against a 30 times tighter run,
 * 0.03 with the transition rule below leaves 0.007 K. A rule of this solver.
 */
const TIME_TOLERANCE_FRACTION_FALLING_FLUX = 0.03;
/** Surface temperatures at which a boundary is scanned for a falling flux (besides its h-table rows). */
const FLUX_SCAN_POINTS = 64;
/**
 * Where the surface flux falls as the surface temperature rises (transition boiling: d(fluxOut)/dTs < 0) small
 * errors grow instead of dying out, the faster the steeper the fall. Steps there use the local tolerance divided by
 * 1 + TRANSITION_TOLERANCE_GAIN x Bi-, with Bi- = -(d fluxOut/dTs) L / k the Biot number of that negative
 * slope (series length L, k at mid-range). Measured on the demo water quench (gain 10: 0.019 K against a 30x
 * tighter run at the old 0.1 share above, where a fixed tenth left 0.039 K for fewer steps); a rule of this solver.
 */
const TRANSITION_TOLERANCE_GAIN = 10;
/**
 * Newton residual (kelvin of stored energy) below which a stage is converged, as a share of the local step
 * tolerance (well below the transition-boiling share of it too). The energy balance does not depend on it (the stage enthalpy is set from the balance); it bounds
 * how far T is from the inverse of that enthalpy. Common practice (a small fraction of the local error).
 */
const NEWTON_TOLERANCE_FRACTION = 1e-4;
/** Step controller: safety factor and limits on the change of step, Hairer, Norsett and Wanner, Solving ODEs I, 2nd ed., Sec. II.4 (from memory). */
const STEP_SAFETY = 0.9;
const STEP_GROWTH_MAX = 5;
const STEP_SHRINK_MIN = 0.2;
/** A located crossing must put the point within this share of the tolerance of the target. */
const LOCATE_TOLERANCE_FRACTION = 0.1;
const MAX_LOCATE_ITERATIONS = 60;
/** Bounded horizon for point targets: this many conduction-plus-surface time constants, and at most MAX_TARGET_TIME_S. */
const HORIZON_TIME_CONSTANTS = 200;
const MAX_TARGET_TIME_S = 1e9;
const MAX_STEPS = 500_000;
/** Margin of the property table beyond the temperatures the stage can reach, K. */
const TABLE_MARGIN_K = 5;
/** Positions at which a series start field is scanned for its range (the table margin covers what falls between). */
const RANGE_SCAN_POINTS = 65;
/**
 * The coarse grid of the pair has this share of the cells the second-order rule asks for (the fine grid twice as
 * many): extrapolation leaves an error of order dx^4. Measured against the exact series and a 1600-cell quench.
 */
const COARSE_REDUCTION = 1 / 4;

/**
 * Test and benchmark hooks: a fixed grid (cells of the grid, or of the coarse grid of the pair), a fixed time step,
 * or the plain second-order scheme on one grid (extrapolate: false).
 */
export interface FiniteVolumeOverrides {
  cellCount?: number;
  stretch?: number;
  fixedStepS?: number;
  extrapolate?: boolean;
}

/** Smallest and largest start temperature (a series field is scanned at RANGE_SCAN_POINTS positions). */
function fieldRange(field: Field1D): { min: number; max: number } {
  if (field.kind === 'uniform') return { min: field.temperatureK, max: field.temperatureK };
  let min = Infinity, max = -Infinity;
  const count = field.kind === 'grid-1d' ? field.temperaturesK.length : RANGE_SCAN_POINTS;
  for (let i = 0; i < count; i++) {
    const v = field.kind === 'grid-1d' ? field.temperaturesK[i] : temperatureAt(field, (field.lengthM * i) / (count - 1));
    if (v < min) min = v;
    if (v > max) max = v;
  }
  return { min, max };
}

/** Largest node spacing and surface spacing of `nodes` no larger than those of `needed`. */
function atLeastAsFine(nodes: Float64Array, needed: Float64Array): boolean {
  const widest = (x: Float64Array) => {
    let w = 0;
    for (let i = 1; i < x.length; i++) w = Math.max(w, x[i] - x[i - 1]);
    return w;
  };
  const surface = (x: Float64Array) => x[x.length - 1] - x[x.length - 2];
  return nodes.length >= 2 && widest(nodes) <= widest(needed) * (1 + 1e-9) && surface(nodes) <= surface(needed) * (1 + 1e-9);
}

/**
 * The span of surface temperatures between lowK and highK where d(fluxOut)/dTs < 0, or null: checked at
 * FLUX_SCAN_POINTS even temperatures and on both sides of every h-table row inside the range (the flux is
 * piecewise smooth between rows).
 */
function fallingFluxSpan(boundary: SurfaceBoundary, lowK: number, highK: number): { lowK: number; highK: number } | null {
  const at: number[] = [];
  for (let i = 0; i <= FLUX_SCAN_POINTS; i++) at.push(lowK + ((highK - lowK) * i) / FLUX_SCAN_POINTS);
  const rows = (boundary.hBreakpointsK ?? []).filter((b) => b > lowK && b < highK);
  const sides = [lowK, ...rows, highK];
  for (let i = 0; i + 1 < sides.length; i++) at.push(0.5 * (sides[i] + sides[i + 1]));
  const falling = at.filter((t) => boundary.fluxOutDerivative(t) < 0);
  return falling.length > 0 ? { lowK: Math.min(...falling), highK: Math.max(...falling) } : null;
}

const kelvin = (t: number) => `${t.toFixed(2)} K (${(t - KELVIN_OFFSET).toFixed(2)} °C)`;

export function solveFiniteVolumeStage(problem: StageProblem): StageOutcome {
  return solveFiniteVolumeStageWith(problem, {});
}

export function solveFiniteVolumeStageWith(problem: StageProblem, overrides: FiniteVolumeOverrides): StageOutcome {
  const { geometry, material, boundary, start, end } = problem;
  const oneD = geometry.oneD;
  if (!oneD) return { ok: false, code: 'not-applicable', message: 'The finite-volume method here is one-dimensional: it solves plates, long cylinders and spheres, not finite shapes.' };
  if (start.kind !== 'uniform' && start.kind !== 'grid-1d' && start.kind !== 'series-1d') {
    return { ok: false, code: 'not-applicable', message: `The start field is a ${start.kind} field of a finite shape; this stage is one-dimensional.` };
  }
  if (start.kind !== 'uniform' && (start.geometry !== oneD.geometry || Math.abs(start.lengthM - oneD.lengthM) > 1e-12 * oneD.lengthM)) {
    return { ok: false, code: 'not-applicable', message: 'The start field belongs to a different shape or size than this stage.' };
  }
  const lengthM = oneD.lengthM;
  const toleranceK = problem.toleranceK > 0 ? problem.toleranceK : 0.01;
  const target = end.kind === 'point-temperature' ? end : null;
  if (target && target.point !== 'centre' && target.point !== 'surface' && target.point !== 'mean' && target.point !== 'depth') {
    return { ok: false, code: 'not-applicable', message: `A ${oneD.geometry} has no point "${target.point}"; use centre, surface, mean or depth.` };
  }
  const targetDepthM = target?.point === 'depth' ? (target.depthM ?? problem.depthM) : undefined;
  if (target?.point === 'depth' && targetDepthM === undefined) return { ok: false, code: 'not-applicable', message: 'The stage ends on the depth point but no depth is given.' };
  const depthX = (d: number) => Math.min(lengthM, Math.max(0, lengthM - d));

  // Temperature range the stage can visit: start field, medium, surroundings (maximum principle), target.
  const mediumK = boundary.mediumK;
  const surroundingsK = boundary.radiation ? boundary.radiation.surroundingsK : mediumK;
  const equilibriumK = equilibriumTemperature(boundary);
  const range = fieldRange(start);
  const reachLowK = Math.min(range.min, mediumK, surroundingsK);
  const reachHighK = Math.max(range.max, mediumK, surroundingsK);
  const spanK = Math.max(reachHighK - reachLowK, toleranceK);
  const lowK = Math.min(reachLowK, target ? target.temperatureK : Infinity) - TABLE_MARGIN_K;
  const highK = Math.max(reachHighK, target ? target.temperatureK : -Infinity) + TABLE_MARGIN_K;
  const table = tabulateMaterial(material, lowK, highK);

  // Biot number on the series length with the largest secant h over the range, k at its smallest.
  let hMax = 0;
  let kMin = Infinity;
  for (let i = 0; i <= 16; i++) {
    const t = reachLowK + ((reachHighK - reachLowK) * i) / 16;
    kMin = Math.min(kMin, material.conductivity.at(t));
    const dT = t - equilibriumK;
    hMax = Math.max(hMax, Math.abs(dT) > 1e-9 ? boundary.fluxOut(t) / dT : boundary.fluxOutDerivative(t));
  }
  const biot = (hMax * lengthM) / kMin;
  const sized = sizeGrid(biot, toleranceK / spanK);
  const extrapolate = overrides.extrapolate ?? true;
  const cellCount = overrides.cellCount ?? (extrapolate ? Math.max(4, Math.ceil(COARSE_REDUCTION * sized.cellCount)) : sized.cellCount);
  const stretch = overrides.stretch ?? sized.stretch;
  const pinned = [problem.depthM, targetDepthM].filter((d): d is number => d !== undefined).map(depthX);
  const fineCells = extrapolate ? 2 * cellCount : cellCount;
  const sizedFine = buildVolumeGrid(oneD.geometry, lengthM, fineCells, stretch, pinned, extrapolate ? 2 : 1, geometry.volumeM3);
  // A previous stage's grid at least as fine everywhere is kept (with an odd node count, its even nodes make the
  // coarse grid): no interpolation, and no energy change, at the joint.
  const reuse =
    start.kind === 'grid-1d' && overrides.cellCount === undefined && (!extrapolate || start.nodesM.length % 2 === 1) && atLeastAsFine(start.nodesM, sizedFine.nodesM);
  const fineGrid = reuse ? gridOnNodes(oneD.geometry, lengthM, start.nodesM.slice(), geometry.volumeM3) : sizedFine;
  const coarseGrid = extrapolate ? gridOnNodes(oneD.geometry, lengthM, fineGrid.nodesM.filter((_, i) => i % 2 === 0), geometry.volumeM3) : null;

  const falling = fallingFluxSpan(boundary, reachLowK, reachHighK);
  const timeShare = falling ? TIME_TOLERANCE_FRACTION_FALLING_FLUX : TIME_TOLERANCE_FRACTION;
  /** Whether the surface at ts still has the falling-flux range ahead of it (between it and the equilibrium). */
  const collapseAhead = (ts: number) => falling !== null && (ts > equilibriumK ? ts > falling.lowK : ts < falling.highK);
  const member = (grid: VolumeGrid): GridMember | null => {
    const stepper = createTrBdf2Stepper(grid, table, boundary, lowK, highK, NEWTON_TOLERANCE_FRACTION * timeShare * toleranceK);
    const initialK = new Float64Array(grid.nodeCount);
    for (let i = 0; i < grid.nodeCount; i++) initialK[i] = start.kind === 'uniform' ? start.temperatureK : temperatureAt(start, grid.nodesM[i]);
    return stepper.setState(initialK) ? { grid, stepper } : null;
  };
  const fine = member(fineGrid);
  const coarse = coarseGrid ? member(coarseGrid) : null;
  if (!fine || (coarseGrid && !coarse)) return { ok: false, code: 'not-applicable', message: 'The start field has temperatures that are not finite numbers.' };
  const pair = createRichardsonPair(fine, coarse, reachLowK, reachHighK);
  const n = fineGrid.nodeCount;

  const probeOf = (xM: number | 'mean'): PairProbe => ({
    fine: xM === 'mean' ? MEAN_PROBE : probeAt(fineGrid, xM),
    coarse: coarseGrid ? (xM === 'mean' ? MEAN_PROBE : probeAt(coarseGrid, xM)) : null,
  });
  const probes: { id: PointId; probe: PairProbe }[] = [
    { id: 'centre', probe: probeOf(0) },
    { id: 'surface', probe: probeOf(lengthM) },
    { id: 'mean', probe: probeOf('mean') },
  ];
  if (problem.depthM !== undefined) probes.push({ id: 'depth', probe: probeOf(depthX(problem.depthM)) });
  const targetProbe: PairProbe | null = !target
    ? null
    : target.point === 'depth'
      ? probeOf(depthX(targetDepthM as number))
      : (probes.find((p) => p.id === target.point) as { probe: PairProbe }).probe;

  // Point targets: refuse what the maximum principle rules out before stepping.
  if (target && targetProbe) {
    const refusal = unreachableReason(target.temperatureK, pair.value(targetProbe, false), range, mediumK, surroundingsK, equilibriumK, !boundary.radiation || surroundingsK === mediumK);
    if (refusal) return { ok: false, code: 'target-unreachable', message: refusal };
  }

  const energyStart = pair.storedEnergy();
  const history = createPointHistory(probes.length, 256);
  const rowValues = new Float64Array(probes.length);
  const rowSlopes = new Float64Array(probes.length);
  const record = (timeS: number) => {
    for (let p = 0; p < probes.length; p++) {
      rowValues[p] = pair.value(probes[p].probe, false);
      rowSlopes[p] = pair.slope(probes[p].probe);
    }
    recordPoints(history, timeS, rowValues, rowSlopes);
  };
  record(0);

  const capacityMid = material.volumetricHeatCapacity(0.5 * (reachLowK + reachHighK));
  const kMid = material.conductivity.at(0.5 * (reachLowK + reachHighK));
  const surfaceSpacing = fineGrid.nodesM[n - 1] - fineGrid.nodesM[n - 2];
  const localTolK = timeShare * toleranceK;
  const pastCollapseTolK = TIME_TOLERANCE_FRACTION * toleranceK;
  const durationS = end.kind === 'duration' ? end.seconds : Infinity;
  const m = areaExponentOf(oneD.geometry);
  const hEq = Math.max(boundary.fluxOutDerivative(equilibriumK), 1e-12);
  const timeConstantS = (capacityMid * lengthM * lengthM) / kMid + (capacityMid * lengthM) / ((m + 1) * hEq);
  const horizonS = Math.min(MAX_TARGET_TIME_S, HORIZON_TIME_CONSTANTS * timeConstantS);
  const fineStepper = fine.stepper;

  let timeS = 0;
  let stepS = overrides.fixedStepS ?? Math.min(0.01 * (capacityMid * surfaceSpacing * surfaceSpacing) / kMid, durationS);
  let heatOut = 0;
  let steps = 0;
  let rejectedLast = false;
  const targetSide = target && targetProbe ? Math.sign(pair.value(targetProbe, false) - target.temperatureK) : 0;
  let finished = target !== null && targetSide === 0; // already at the target: a stage of zero length

  while (!finished) {
    if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'The calculation was stopped.' };
    if (steps >= MAX_STEPS) return { ok: false, code: 'target-not-reached', message: `No end after ${MAX_STEPS} time steps (${timeS.toExponential(3)} s simulated).` };
    let h = stepS;
    const remaining = durationS - timeS;
    if (h >= remaining || timeS + 1.05 * h >= durationS) h = remaining;
    const attempt = pair.attempt(h);
    if (!attempt.ok) {
      stepS = 0.25 * h;
      rejectedLast = true;
      if (stepS < 1e-14 * Math.max(1, timeS)) return { ok: false, code: 'target-not-reached', message: `The time step fell below ${stepS.toExponential(2)} s at ${timeS.toExponential(4)} s (${attempt.reason === 'newton' ? 'Newton did not converge' : 'capacity peak not resolved'}).` };
      continue;
    }
    const slopeMin = Math.min(boundary.fluxOutDerivative(fineStepper.temperatureK[n - 1]), boundary.fluxOutDerivative(fineStepper.trialTemperatureK[n - 1]));
    const unstable = slopeMin < 0;
    const stepTolK = unstable
      ? localTolK / (1 + (TRANSITION_TOLERANCE_GAIN * -slopeMin * lengthM) / kMid)
      : collapseAhead(fineStepper.trialTemperatureK[n - 1]) ? localTolK : pastCollapseTolK;
    const ratio = attempt.errorK > 0 ? stepTolK / attempt.errorK : Infinity;
    if (overrides.fixedStepS === undefined && ratio < 1) {
      stepS = h * Math.max(STEP_SHRINK_MIN, STEP_SAFETY * Math.cbrt(ratio));
      rejectedLast = true;
      continue;
    }
    if (target && targetProbe) {
      const after = pair.value(targetProbe, true) - target.temperatureK;
      if (Math.sign(after) !== targetSide) {
        const before = pair.value(targetProbe, false) - target.temperatureK;
        const located = locateCrossing(pair, targetProbe, target.temperatureK, h, before, after, LOCATE_TOLERANCE_FRACTION * toleranceK);
        if (located === null) return { ok: false, code: 'target-not-reached', message: `The crossing of ${kelvin(target.temperatureK)} near ${timeS.toExponential(4)} s could not be located.` };
        h = located;
        finished = true;
      }
    }
    heatOut += pair.trialHeatOut();
    pair.accept();
    timeS += h;
    steps++;
    record(timeS);
    if (overrides.fixedStepS === undefined) {
      const grow = Math.min(STEP_GROWTH_MAX, STEP_SAFETY * Math.cbrt(ratio));
      stepS = h * (rejectedLast ? Math.min(1, grow) : grow);
    }
    rejectedLast = false;
    if (end.kind === 'duration' && timeS >= durationS) finished = true;
    if (!finished && target) {
      let furthest = 0;
      const t = fineStepper.temperatureK;
      for (let i = 0; i < n; i++) furthest = Math.max(furthest, Math.abs(t[i] - equilibriumK));
      if (furthest <= toleranceK) return { ok: false, code: 'target-not-reached', message: `The ${target.point} never reaches ${kelvin(target.temperatureK)}: after ${timeS.toExponential(3)} s the whole part is within ${toleranceK} K of ${kelvin(equilibriumK)}, where it settles.` };
      if (timeS > horizonS) return { ok: false, code: 'target-not-reached', message: `The ${target.point} did not reach ${kelvin(target.temperatureK)} within ${horizonS.toExponential(3)} s (${HORIZON_TIME_CONSTANTS} time constants of the part).` };
    }
  }

  const sampleCount = Math.max(2, problem.sampleCount);
  const sampleTimes = new Float64Array(sampleCount);
  for (let i = 0; i < sampleCount; i++) sampleTimes[i] = (timeS * i) / (sampleCount - 1);
  const temperaturesK: Partial<Record<PointId, Float64Array>> = {};
  probes.forEach((p, i) => (temperaturesK[p.id] = samplePoint(history, i, sampleTimes)));

  const stored = energyStart - pair.storedEnergy();
  const energyRelativeError = Math.abs(stored) > 0 ? Math.abs(heatOut - stored) / Math.abs(stored) : Math.abs(heatOut) > 0 ? 1 : 0;
  const solution: StageSolution = {
    method: 'finite-volume',
    durationS: timeS,
    samples: { timeS: sampleTimes, temperaturesK },
    endField: { kind: 'grid-1d', geometry: oneD.geometry, lengthM, nodesM: fineGrid.nodesM.slice(), temperaturesK: pair.endTemperaturesK() },
    heatRemovedJ: heatOut * fineGrid.basisScale,
    energyRelativeError,
    effort: { steps, cells: n + (coarseGrid ? coarseGrid.nodeCount : 0) },
    notes: [],
  };
  return { ok: true, solution };
}

/**
 * Why a point target cannot be met, or null. Maximum principle for the heat equation with a surface flux of
 * the sign of (T - medium): no temperature leaves the range of the start field and the medium / surroundings
 * temperatures, and the equilibrium temperature is approached only asymptotically.
 * Protter and Weinberger, Maximum Principles in Differential Equations, 1967, Ch. 3 (from memory).
 */
function unreachableReason(targetK: number, pointStartK: number, range: { min: number; max: number }, mediumK: number, surroundingsK: number, equilibriumK: number, fluxSignFollowsEquilibrium: boolean): string | null {
  const lo = Math.min(range.min, mediumK, surroundingsK);
  const hi = Math.max(range.max, mediumK, surroundingsK);
  if (targetK < lo || targetK > hi) {
    return `The target ${kelvin(targetK)} lies outside ${kelvin(lo)} to ${kelvin(hi)}, the range spanned by the start field (${kelvin(range.min)} to ${kelvin(range.max)}) and the medium (${kelvin(mediumK)}${surroundingsK !== mediumK ? `, surroundings ${kelvin(surroundingsK)}` : ''}); no temperature in the part can leave that range.`;
  }
  if (fluxSignFollowsEquilibrium) {
    const wholeFieldAbove = range.min >= equilibriumK;
    const wholeFieldBelow = range.max <= equilibriumK;
    if ((wholeFieldAbove && targetK <= equilibriumK && pointStartK > targetK) || (wholeFieldBelow && targetK >= equilibriumK && pointStartK < targetK)) {
      return `The target ${kelvin(targetK)} is ${targetK === equilibriumK ? 'equal to' : 'beyond'} the medium temperature ${kelvin(equilibriumK)}, which the part only approaches and never passes.`;
    }
  }
  return null;
}

/**
 * Shortens the step that crossed the target until the point sits on it: Illinois variant of regula falsi on the
 * step length, each trial a full TR-BDF2 step from the accepted state.
 * Dowell and Jarratt, A modified regula falsi method for computing the root of an equation, BIT 11 (1971) (from memory).
 * Leaves the pair's trial state at the located step and returns its length, or null.
 */
function locateCrossing(pair: RichardsonPair, probe: PairProbe, targetK: number, stepS: number, before: number, after: number, tolK: number): number | null {
  let a = 0, fa = before, b = stepS, fb = after;
  let side = 0;
  let last = stepS;
  if (Math.abs(after) <= tolK) return stepS;
  for (let i = 0; i < MAX_LOCATE_ITERATIONS; i++) {
    const s = (a * fb - b * fa) / (fb - fa);
    const trial = s > a && s < b ? s : 0.5 * (a + b);
    const r = pair.attempt(trial);
    if (!r.ok) return null;
    last = trial;
    const g = pair.value(probe, true) - targetK;
    if (Math.abs(g) <= tolK) return last;
    if (Math.sign(g) === Math.sign(fb)) {
      b = trial;
      fb = g;
      if (side === 1) fa *= 0.5;
      side = 1;
    } else {
      a = trial;
      fa = g;
      if (side === -1) fb *= 0.5;
      side = -1;
    }
  }
  return null;
}
