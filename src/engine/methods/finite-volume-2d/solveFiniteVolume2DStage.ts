// Finite-volume solver for finite shapes: short cylinder (r, z axisymmetric), bar (x, y) and block
// (x, y, z), on the symmetric part between the centre and the cooled faces.
// Method: vertex-centred finite volumes (finiteGrid) stepped by the Douglas ADI scheme with enthalpy-chord
// capacity and Picard re-linearisation with the Newton slope of the surface flux (douglasAdiStep): k(T),
// rho(T) cp(T), h(Ts) tables and radiation.
// Validity: any start field on the shape (uniform, product, tensor grid), any medium; all faces see the
// same medium. Time step: a trial step is accepted when (1) its local error at every node, estimated by Milne's
// device (the step against the quadratic through the last three fields; nodes that just crossed a table row are
// left out), is below LOCAL_ERROR_SHARE x toleranceK (toleranceK no less than the default grid's), (2) the surface h
// changes by at most H_CHANGE_MAX relative, (3) no node changes by more than twice STEP_TARGET_CHANGE_K / refinement
// and (4) the Picard iteration converged; otherwise it is shortened (Hairer, Norsett and Wanner's controller, cube
// root of the error ratio). The Picard iteration starts from that quadratic, extrapolated to the trial's end (2.03
// iterations per trial on the oil benchmark; 2.20 from the last step's rate). Every accepted step is recorded with each point's value and its rate from the semi-discrete
// equations; samples are cubic Hermite between steps (resampleHermite), so duration and point-temperature ends
// take the same steps and give the same samples. Point-temperature ends are located inside the step by Brent's
// method on the step length (numerics/findRootBracketed).
// Grid: DEFAULT_NODES_2D / DEFAULT_NODES_3D nodes per axis at toleranceK = 0.01 K; cells and steps follow
// 1/sqrt(toleranceK), up to 2x (2-D) or 1.5x (3-D) finer, so a re-run at a tenth of the tolerance is a
// grid-refinement check, and down to half as fine for the workbench's quick pass at 0.1 K. Nodes are clustered towards the faces by DEFAULT_STRETCH
// (Vinokur's sinh stretching; face spacing 0.7 of the even spacing).
// Expected error: second order in space and time (test/unit/finite-volume-2d); the time part at toleranceK 0.01 K
// is 0.32-0.43 K at the faces and 0.02 K at the centre through a water boiling curve (stepControl.test), 0.1-0.2 K
// at the faces in the oil benchmark (it adds up over long smooth stretches: the bound is per step). Against the exact product solution
// on the default grids (40 x 40 cells in 2-D, 20³ in 3-D), 25-40 mm parts from 850 °C: about 0.05 K (2-D) and
// 0.28 K (3-D corner) in oil, 0.34 K in the first second of a water quench, less in air; through transition boiling
// about 0.5 K; where a wetting front runs along the faces (water on steel, 1100 K) the grid error is 8-11 K at the face
// points and 6 K at the rim at 40 cells (the front's timing), 1-1.6 K at 80 cells. This is above the default toleranceK of
// 0.01 K: the runner's cross-check reports the difference.
// Energy: heat through the faces equals the change of enthalpy to rounding for constant properties and to about
// 1e-8 relative with tables (the Picard stop), reported as energyRelativeError.
// Speed (test/bench/finiteVolume2D.bench.ts, 40 x 40 oil stage): 506 steps, 613 trials, 1243 Picard iterations; the
// trials are set by the local-error rule and each needs two iterations (one to converge, one to show it), so the cost
// per iteration sets the time (docs/methods/product-solutions.md, Sec. 4, has the figures and what was tried).
import type { StageOutcome, StageProblem, StageSolver } from '../stageProblem';
import type { PointId } from '@/schema/planSchema';
import type { TensorGridField } from '../../fields';
import { finiteGrid } from './finiteGrid';
import { startOnGrid } from './startOnGrid';
import { douglasAdiStepper } from './douglasAdiStep';
import { tabulateMaterial, evaluateMaterial } from '../finite-volume/tabulateMaterial';
import { tensorGridTemperatureAt } from './tensorGridTemperatureAt';
import { resampleHermite } from './resampleHermite';
import { findRootBracketed } from '../../numerics/findRootBracketed';
import { equilibriumTemperature } from '../finite-volume/equilibriumTemperature';

const DEFAULT_NODES_2D = 41;
const DEFAULT_NODES_3D = 21;
/** The tolerance the default grids are for; a tighter one refines them as 1/sqrt(tolerance) (second order), up to the caps. */
const DEFAULT_GRID_TOLERANCE_K = 0.01;
const MAX_REFINEMENT_2D = 2;
const MAX_REFINEMENT_3D = 1.5;
/** A looser tolerance (the workbench's quick pass at 0.1 K) coarsens cells and steps as 1/sqrt(toleranceK), down to this. */
const MIN_REFINEMENT = 0.5;
/**
 * Stretching beta of axisNodes: spacing 1.66 of even at the centre, 0.70 at the faces. A rule of this solver, set
 * from measurement on the hub water quench (docs/methods/product-solutions.md, Sec. 4): beta 2 (spacing 2.07 and 0.55)
 * put 13-21 K of grid error on the face centres, where a wetting front arrives along the coarse middle of the face;
 * beta 1.5 halves it (7.6-11.4 K) and costs the rim 5.8 K (was 1.9 K); beta 1 and below lose the first second of a
 * water quench (productAgreement.test, 0.45 K).
 */
const DEFAULT_STRETCH = 1.5;
const STEP_TARGET_CHANGE_K = 10;
/**
 * Share of toleranceK given to the estimated local error of one step. A rule of this solver, set from measurement:
 * a tenth (common practice) held the hub water quench's time error to 0.05 K but took 3795 steps, and the runner's
 * refined cross-check three times that; a half gave 0.15-0.37 K at the faces in 1055 steps on the beta 2 grid, but
 * 0.55 K on the beta 1.5 grid (measured); 0.4 gives 0.35-0.41 K in 1090 steps (stepControl.test; 0.32-0.43 K in 1078
 * steps since the Picard iteration starts from the quadratic extrapolation).
 */
const LOCAL_ERROR_SHARE = 0.4;
/** Largest relative change of the surface h over one step: the steep rows of a boiling curve are crossed in several steps. A rule of this solver. */
const H_CHANGE_MAX = 0.1;
/** Step controller: safety factor and limits on the change of step, Hairer, Norsett and Wanner, Solving ODEs I, 2nd ed., Sec. II.4 (from memory). */
const STEP_SAFETY = 0.9;
const STEP_GROWTH_MAX = 1.5;
const STEP_SHRINK_MIN = 0.2;
/** A last step this much longer than the proposed one is taken rather than leaving a sliver before the end. */
const LAST_STEP_STRETCH = 0.1;
/** First step as a fraction of the smallest cell's diffusion time h²/alpha. */
const FIRST_STEP_FOURIER = 0.05;
const MIN_STEP_S = 1e-9;
const MAX_STEPS = 500_000;
const MAX_STAGE_S = 1e8;
/** Relative width in step length to which a crossing is located (far below any reported tolerance in K). */
const LOCATE_STEP_TOLERANCE = 1e-10;
/** The Picard iteration stops when the iterate moves less than this fraction of toleranceK. */
const PICARD_SHARE_OF_TOLERANCE = 0.1;
/** Margin of the material table beyond the temperatures a stage can reach, K. */
const TABLE_MARGIN_K = 5;

export interface FiniteVolume2DOptions {
  /** Nodes per axis, centre and surface included (cells = nodes - 1). */
  nodesPerAxis?: number;
  /** Bound on the estimated local error of one step, K, instead of the tolerance's (time-convergence checks). */
  localErrorK?: number;
}

/** How much finer than the defaults the cells and the steps are at this tolerance (1 at 0.01 K, below 1 for looser ones). */
function refinementFor(dims: number, toleranceK: number): number {
  return Math.min(dims === 2 ? MAX_REFINEMENT_2D : MAX_REFINEMENT_3D, Math.max(MIN_REFINEMENT, Math.sqrt(DEFAULT_GRID_TOLERANCE_K / toleranceK)));
}

export function finiteVolume2DSolver(options: FiniteVolume2DOptions = {}): StageSolver {
  return (problem) => solveOnGrid(problem, options);
}

/** The solver with the default grids. */
export const solveFiniteVolume2DStage: StageSolver = finiteVolume2DSolver();

function solveOnGrid(problem: StageProblem, options: FiniteVolume2DOptions): StageOutcome {
  const { geometry, material, boundary, end } = problem;
  const axes = geometry.finiteAxes;
  if (!axes) return { ok: false, code: 'not-applicable', message: 'This solver is for short cylinders, bars and blocks; 1-D shapes use the 1-D finite-volume solver.' };
  const refinement = refinementFor(axes.length, problem.toleranceK);
  const nodes = options.nodesPerAxis ?? 1 + Math.round(((axes.length === 2 ? DEFAULT_NODES_2D : DEFAULT_NODES_3D) - 1) * refinement);
  // The step error is second order as well: the change per step shrinks with the cells.
  const stepTargetK = STEP_TARGET_CHANGE_K / refinement;
  const grid = finiteGrid(axes, axes.map(() => nodes), DEFAULT_STRETCH);
  const startField = startOnGrid(problem.start, grid);
  if (!startField) return { ok: false, code: 'not-applicable', message: `The stage starts from a ${problem.start.kind} field of a 1-D shape; a ${geometry.shape.kind} needs a uniform, product or grid field.` };

  let u: Float64Array = startField;
  // Reported points: the geometry's positioned points, the mean, and the depth below face-x when asked.
  const probes: { id: PointId; positionM: number[] | null }[] = [];
  for (const point of geometry.points) probes.push({ id: point.id, positionM: point.positionM ?? null });
  // The end condition's own depth wins over the plan's reported depth.
  const depthM = (end.kind === 'point-temperature' && end.point === 'depth' ? end.depthM : undefined) ?? problem.depthM;
  if (depthM !== undefined) {
    const halfM = axes[0].halfLengthM;
    if (depthM > halfM) return { ok: false, code: 'not-applicable', message: `Depth ${depthM} m is deeper than the centre (${halfM} m below the ${axes[0].name === 'r' ? 'side' : 'face ⟂ x'}).` };
    probes.push({ id: 'depth', positionM: axes.map((_, d) => (d === 0 ? halfM - depthM : 0)) });
  }
  const field: TensorGridField = { kind: 'tensor-grid', nodesM: grid.axes.map((a) => a.nodesM), temperaturesK: u };
  // The volume mean uses the grid's own control volumes (the quadrature of tensorGridMeanK).
  const volumeTotalM3 = grid.volumeM3.reduce((a, b) => a + b, 0);
  const valueOf = (temperaturesK: Float64Array, positionM: number[] | null) => {
    if (positionM) return tensorGridTemperatureAt({ ...field, temperaturesK }, positionM);
    let sum = 0;
    for (let p = 0; p < temperaturesK.length; p++) sum += grid.volumeM3[p] * temperaturesK[p];
    return sum / volumeTotalM3;
  };
  let targetProbe: (typeof probes)[number] | undefined;
  if (end.kind === 'point-temperature') {
    targetProbe = probes.find((p) => p.id === end.point);
    if (!targetProbe) return { ok: false, code: 'not-applicable', message: `A ${geometry.shape.kind} has no reported point "${end.point}"; its points are ${probes.map((p) => p.id).join(', ')}.` };
  }

  // Material table over every temperature the stage can reach (maximum principle).
  let fieldLowK = Infinity;
  let fieldHighK = -Infinity;
  for (let p = 0; p < u.length; p++) {
    fieldLowK = Math.min(fieldLowK, u[p]);
    fieldHighK = Math.max(fieldHighK, u[p]);
  }
  const lowK = Math.min(fieldLowK, boundary.mediumK, boundary.radiation?.surroundingsK ?? boundary.mediumK);
  const highK = Math.max(fieldHighK, boundary.mediumK, boundary.radiation?.surroundingsK ?? boundary.mediumK);
  const table = tabulateMaterial(material, lowK - TABLE_MARGIN_K, highK + TABLE_MARGIN_K);
  const stepper = douglasAdiStepper(grid, table, material.isConstant, boundary, problem.toleranceK * PICARD_SHARE_OF_TOLERANCE);
  const equilibriumK = equilibriumTemperature(boundary);

  let targetK = 0;
  let startGap = 0;
  if (end.kind === 'point-temperature' && targetProbe) {
    targetK = end.temperatureK;
    // Maximum principle: the flux out has the sign of Ts - T_eq, so the field stays between its start extremes and T_eq.
    const fieldLow = Math.min(fieldLowK, equilibriumK);
    const fieldHigh = Math.max(fieldHighK, equilibriumK);
    if (targetK < fieldLow || targetK > fieldHigh) {
      return { ok: false, code: 'target-unreachable', message: `The ${end.point} cannot reach ${targetK.toFixed(2)} K: the part stays between ${fieldLow.toFixed(2)} K and ${fieldHigh.toFixed(2)} K in this medium (it tends to ${equilibriumK.toFixed(2)} K).` };
    }
    if (Math.abs(targetK - equilibriumK) < problem.toleranceK) {
      return { ok: false, code: 'target-unreachable', message: `The ${end.point} only approaches the equilibrium ${equilibriumK.toFixed(2)} K of this medium; a target within ${problem.toleranceK} K of it is never reached in finite time.` };
    }
    startGap = valueOf(u, targetProbe.positionM) - targetK;
  }

  const sampleCount = Math.max(2, problem.sampleCount);
  const durationS = end.kind === 'duration' ? end.seconds : Infinity;
  // Every accepted step is recorded with the probes' values and slopes; samples are interpolated at the end.
  const historyS: number[] = [];
  const history: number[][] = probes.map(() => []);
  const slopes: number[][] = probes.map(() => []);
  const nodeRate = new Float64Array(grid.size);
  const record = (t: number) => {
    stepper.rate(u, nodeRate);
    historyS.push(t);
    probes.forEach((p, i) => {
      history[i].push(valueOf(u, p.positionM));
      slopes[i].push(valueOf(nodeRate, p.positionM));
    });
  };
  record(0);
  const startEnergy = storedEnergy(u);
  let next: Float64Array = new Float64Array(grid.size);
  // The two fields before u, for the error estimate (earlier1 at t - back1S, earlier2 at t - back1S - back2S).
  let earlier1: Float64Array = new Float64Array(grid.size);
  let earlier2: Float64Array = new Float64Array(grid.size);
  let back1S = 0;
  let back2S = 0;
  let known = 0;
  // The quadratic through u, earlier1 and earlier2 at the trial's end, and the share of its miss that is the step's own error.
  const guess = new Float64Array(grid.size);
  let ownErrorShare = 0;
  // Below the default tolerance the grid is refined and the steps follow it through the change limit only: the time
  // error at the default tolerance is already far below the grid's where the two differ most (a wetting front).
  const localToleranceK = options.localErrorK ?? LOCAL_ERROR_SHARE * Math.max(problem.toleranceK, DEFAULT_GRID_TOLERANCE_K);
  const surfaceNodes: number[] = [];
  const isSurface = new Uint8Array(grid.size);
  for (let p = 0; p < grid.size; p++) {
    if (grid.surfaceAreaM2.some((a) => a[p] > 0)) {
      surfaceNodes.push(p);
      isSurface[p] = 1;
    }
  }
  const sortedRows = (rows: readonly number[]) => Float64Array.from(new Set(rows)).sort();
  const materialKinksK = sortedRows([material.conductivity, material.density, material.specificHeat].flatMap((m) => m.breakpointsK ?? []));
  const surfaceKinksK = sortedRows([...materialKinksK, ...(boundary.hBreakpointsK ?? [])]);
  // The smallest spacing is at the faces (the grid is clustered there).
  const minSpacing = Math.min(...grid.axes.map((a) => a.nodesM[a.nodesM.length - 1] - a.nodesM[a.nodesM.length - 2]));
  const alpha = material.conductivity.at(u[0]) / material.volumetricHeatCapacity(u[0]);
  let dtS = Math.min(FIRST_STEP_FOURIER * (minSpacing * minSpacing) / alpha, durationS);
  let timeS = 0;
  let steps = 0;
  let heatOutJ = 0;
  let reached = startGap === 0 && end.kind === 'point-temperature';

  while (!reached) {
    if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'The stage was cancelled.' };
    if (end.kind === 'duration' && timeS >= durationS) break;
    // A step that would leave a sliver before the end is stretched to the end.
    const lastS = durationS - timeS;
    const tryS = lastS < (1 + LAST_STEP_STRETCH) * dtS ? lastS : dtS;
    // The first Picard iterate: the quadratic through the last three fields, extrapolated to the trial's end.
    if (known >= 2) extrapolate(tryS);
    let result = stepper.step(u, tryS, next, known >= 2 ? guess : undefined);
    if (!result.converged && tryS > MIN_STEP_S) {
      dtS = tryS / 2;
      continue;
    }
    // Step ratios, each measure over its limit and scaled to act linearly on the step: 1 is on the limit.
    let ratio = result.maxChangeK / stepTargetK;
    if (known >= 2) ratio = Math.max(ratio, Math.cbrt(localErrorK() / localToleranceK));
    ratio = Math.max(ratio, largestRelativeHChange() / H_CHANGE_MAX);
    if (ratio > 1 && tryS > MIN_STEP_S) {
      dtS = tryS * Math.max(STEP_SHRINK_MIN, STEP_SAFETY / ratio);
      continue;
    }
    let takenS = tryS;
    if (end.kind === 'point-temperature' && targetProbe) {
      const gap = valueOf(next, targetProbe.positionM) - targetK;
      if (gap === 0 || gap > 0 !== startGap > 0) {
        // The target is crossed inside this step: find the step length that lands on it.
        const probe = targetProbe;
        let located = result;
        const gapAfter = (s: number) => {
          located = stepper.step(u, s, next);
          return valueOf(next, probe.positionM) - targetK;
        };
        const lengthS = gap === 0 ? tryS : findRootBracketed(gapAfter, 0, tryS, tryS * LOCATE_STEP_TOLERANCE, valueOf(u, probe.positionM) - targetK, gap);
        // Brent's last evaluation need not be at the root it returns: step there once more.
        if (gap !== 0) gapAfter(lengthS);
        takenS = lengthS;
        result = located;
        reached = true;
      }
    }
    heatOutJ += result.heatOutJ;
    [earlier2, earlier1, u, next] = [earlier1, u, next, earlier2];
    back2S = back1S;
    back1S = takenS;
    known++;
    timeS = takenS === lastS ? durationS : timeS + takenS;
    steps++;
    record(timeS);
    dtS = tryS * Math.min(STEP_GROWTH_MAX, STEP_SAFETY / Math.max(ratio, 1e-12));
    if (end.kind === 'point-temperature' && !reached) {
      let farthest = 0;
      for (let p = 0; p < u.length; p++) farthest = Math.max(farthest, Math.abs(u[p] - equilibriumK));
      const stalled = farthest < Math.abs(targetK - equilibriumK);
      if (stalled || timeS > MAX_STAGE_S || steps > MAX_STEPS) {
        return { ok: false, code: 'target-not-reached', message: `The ${end.point} did not reach ${targetK.toFixed(2)} K: after ${timeS.toPrecision(4)} s the whole part is within ${farthest.toPrecision(3)} K of the medium's equilibrium ${equilibriumK.toFixed(2)} K and still moving away from the target.` };
      }
    } else if (steps > MAX_STEPS) {
      return { ok: false, code: 'target-not-reached', message: `The stage needed more than ${MAX_STEPS} time steps; shorten it or use a coarser grid.` };
    }
  }

  const stageS = timeS;
  const sampleTimes = Float64Array.from({ length: sampleCount }, (_, i) => (i === sampleCount - 1 ? stageS : (stageS * i) / (sampleCount - 1)));
  const temperaturesK: Partial<Record<PointId, Float64Array>> = {};
  probes.forEach((p, i) => {
    temperaturesK[p.id] = resampleHermite(historyS, history[i], slopes[i], sampleTimes);
  });
  const factor = grid.wholePartFactor;
  const storedChangeJ = factor * (storedEnergy(u) - startEnergy);
  const heatRemovedJ = factor * heatOutJ;
  const energyRelativeError = storedChangeJ === 0 ? (heatRemovedJ === 0 ? 0 : 1) : Math.abs(heatRemovedJ + storedChangeJ) / Math.abs(storedChangeJ);
  return {
    ok: true,
    solution: {
      method: 'finite-volume',
      durationS: stageS,
      samples: { timeS: sampleTimes, temperaturesK },
      endField: { kind: 'tensor-grid', nodesM: grid.axes.map((a) => Float64Array.from(a.nodesM)), temperaturesK: Float64Array.from(u) },
      heatRemovedJ,
      energyRelativeError,
      effort: { steps, cells: grid.size },
      notes: [],
    },
  };

  function storedEnergy(temperaturesK: Float64Array): number {
    const n = temperaturesK.length;
    const k = new Float64Array(n), c = new Float64Array(n), e = new Float64Array(n);
    evaluateMaterial(table, temperaturesK, n, k, c, e);
    let sum = 0;
    for (let p = 0; p < n; p++) sum += grid.volumeM3[p] * e[p];
    return sum;
  }
  /**
   * Milne's device on the trial step (Lambert, Numerical Methods for Ordinary Differential Systems, 1991, Sec. 4.5
   * (from memory)): the quadratic through the last three accepted fields, extrapolated by h, misses the exact value by
   * h (h + b1) (h + b1 + b2) u''' / 6 (the interpolation remainder); the Crank-Nicolson step by h³ u''' / 12 (Lambert,
   * Sec. 3.5 (from memory)). extrapolate(h) puts the quadratic into guess; localErrorK() returns the largest of the
   * step's own errors at the nodes, K, from the difference of the two.
   */
  function extrapolate(h: number): void {
    const t1 = -back1S;
    const t2 = -back1S - back2S;
    // Lagrange weights at h of the nodes 0 (u), t1 (earlier1), t2 (earlier2).
    const w0 = ((h - t1) * (h - t2)) / (t1 * t2);
    const w1 = (h * (h - t2)) / (t1 * (t1 - t2));
    const w2 = (h * (h - t1)) / (t2 * (t2 - t1));
    for (let p = 0; p < grid.size; p++) guess[p] = w0 * u[p] + w1 * earlier1[p] + w2 * earlier2[p];
    const remainder = (h * (h - t1) * (h - t2)) / 6;
    const own = (h * h * h) / 12;
    ownErrorShare = own / (own + remainder);
  }

  function localErrorK(): number {
    let largest = 0;
    for (let p = 0; p < grid.size; p++) {
      const d = Math.abs(next[p] - guess[p]);
      if (d > largest && !crossesKink(p)) largest = d;
    }
    return ownErrorShare * largest;
  }

  /**
   * Whether node p passed a table row of k, rho, cp (or, on the surface, of h) over the last three steps and the
   * trial: there the rate has a kink, the quadratic does not hold and the estimate is the kink's, a one-off error of
   * the step that the change and h limits bound instead.
   */
  function crossesKink(p: number): boolean {
    const a = earlier2[p], b = earlier1[p], c = u[p], d = next[p];
    const lo = Math.min(a, b, c, d);
    const hi = Math.max(a, b, c, d);
    const rows = isSurface[p] ? surfaceKinksK : materialKinksK;
    // First row above lo (binary search), then whether it lies below hi.
    let first = 0;
    let last = rows.length;
    while (first < last) {
      const mid = (first + last) >> 1;
      if (rows[mid] <= lo) first = mid + 1;
      else last = mid;
    }
    return first < rows.length && rows[first] < hi;
  }

  /** Largest |h(Ts') - h(Ts)| / min(h) over the surface nodes for the trial step from u to next. */
  function largestRelativeHChange(): number {
    if (boundary.hIsConstant) return 0;
    let largest = 0;
    for (const p of surfaceNodes) {
      const before = boundary.convectionCoefficient(u[p]);
      const after = boundary.convectionCoefficient(next[p]);
      largest = Math.max(largest, Math.abs(after - before) / Math.min(before, after));
    }
    return largest;
  }
}
