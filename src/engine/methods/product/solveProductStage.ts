// Exact product solution for finite shapes (short cylinder, bar, block) with constant properties and h.
// Method: the field is a sum of separable terms T = T_inf + sum_j w_j prod_d f_jd(x_d, t); each factor solves
// the 1-D problem of its axis (slab of half-side L, or cylinder of radius r0) with Bi_d = h L_d / k, so
// f_jd = sum_n b_n exp(-lambda_n² alpha t / L_d²) X(lambda_n x_d / L_d) (product theorem: Carslaw and Jaeger,
// Conduction of Heat in Solids, 2nd ed., Sec. 1.15; Incropera et al., Fundamentals of Heat and Mass Transfer,
// 6th ed., Sec. 5.8 (from memory)). A uniform start is one term with unit factors; a stage after another adds the
// constant term (T_inf,old - T_inf,new) and projects every factor onto the new eigenfunctions (series/projectField),
// so a plan of several media stays exact: see docs/methods/product-solutions.md.
// Mean: product of axis means, which for a uniform start is Langston's rule
// Q/Q0 = 1 - prod_d (1 - (Q/Q0)_d) (Langston, Int. J. Heat Mass Transfer 25 (1982) 149; Incropera 6th ed., Eq. 5.52 (from memory)).
// Validity: constant h, no radiation, the same medium on every face; properties taken at propertyTemperatureK.
// Truncation: per axis, seriesTermCount at the smallest Fo evaluated with a tail below toleranceK / TAIL_SHARE
// split over terms and axes; t = 0 is taken from the start field itself. Expected error: below toleranceK.
// Point-temperature ends: scanned on a geometric time grid, then located by Brent (numerics/findRootBracketed).
import type { StageOutcome, StageSolver } from '../stageProblem';
import type { PointId } from '@/schema/planSchema';
import type { ProductField, SeriesFactor } from '../../fields';
import { eigenvalues } from '../series/eigenvalues';
import { eigenfunction, eigenfunctionMean } from '../series/eigenfunction';
import { seriesTermCount } from '../series/seriesTermCount';
import { seriesSum } from '../series/seriesSum';
import { findRootBracketed } from '../../numerics/findRootBracketed';
import { projectField } from '../series/projectField';
import { productFieldMeanK, productFieldTemperatureAt } from './productFieldTemperatureAt';

/** The tail of each axis series is kept below toleranceK / (TAIL_SHARE x terms x axes). */
const TAIL_SHARE = 4;
/** First time of the crossing scan, as Fo on the smallest axis; later scan times grow by SCAN_GROWTH. */
const SCAN_FIRST_FOURIER = 1e-4;
const SCAN_GROWTH = 1.25;
const MAX_STAGE_S = 1e8;
/** Amplitudes below this fraction of the largest are dropped from the end field. */
const NEGLIGIBLE_AMPLITUDE = 1e-15;
/** Samples per axis of the start field's range check. */
const RANGE_SAMPLES = 9;
const UNIT_FACTOR: SeriesFactor = { offset: 1, eigenvalues: new Float64Array(0), amplitudes: new Float64Array(0) };

interface Probe {
  id: PointId;
  positionM: number[] | null;
}

export const solveProductStage: StageSolver = (problem): StageOutcome => {
  const { geometry, material, boundary, end } = problem;
  // A product stage takes milliseconds: cancellation is honoured at its start.
  if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'The stage was cancelled.' };
  const axes = geometry.finiteAxes;
  if (!axes) return { ok: false, code: 'not-applicable', message: 'The product solution is for short cylinders, bars and blocks; 1-D shapes use the 1-D series.' };
  if (!boundary.hIsConstant || boundary.radiation) {
    return { ok: false, code: 'not-applicable', message: 'The product solution needs a constant h and no radiation; this stage has ' + (boundary.radiation ? 'radiation.' : 'an h that depends on the surface temperature.') };
  }
  const start: ProductField | null =
    problem.start.kind === 'uniform'
      ? { kind: 'product', axes: axes.map((a) => ({ geometry: a.coordinate === 'radial' ? 'cylinder' : 'slab', lengthM: a.halfLengthM })), offsetK: problem.start.temperatureK, terms: [] }
      : problem.start.kind === 'product' && problem.start.axes.length === axes.length
        ? problem.start
        : null;
  if (!start) return { ok: false, code: 'not-applicable', message: `The product solution needs a uniform or product start field; this stage starts from a ${problem.start.kind} field.` };

  const mediumK = boundary.mediumK;
  const kWPerMK = material.conductivity.at(problem.propertyTemperatureK);
  const rhoCpJPerM3K = material.volumetricHeatCapacity(problem.propertyTemperatureK);
  const alphaM2PerS = kWPerMK / rhoCpJPerM3K;
  const hWPerM2K = boundary.convectionCoefficient(mediumK);
  const axisGeometry = start.axes.map((a) => a.geometry);
  const axisLengthM = axes.map((a) => a.halfLengthM);
  // Bi = h L / k and Fo = alpha t / L² per axis (Incropera 6th ed., Eqs. 5.10 and 5.33 (from memory)).
  const biot = axisLengthM.map((l) => (hWPerM2K * l) / kWPerMK);
  const foPerS = axisLengthM.map((l) => alphaM2PerS / (l * l));
  // The stage's terms: the start's own, plus the constant part measured from the new medium.
  const terms = [...start.terms, { weightK: start.offsetK - mediumK, factors: axes.map(() => UNIT_FACTOR) }].filter((t) => t.weightK !== 0);

  const probes: Probe[] = geometry.points.map((p) => ({ id: p.id, positionM: p.positionM ?? null }));
  // The end condition's own depth wins over the plan's reported depth.
  const depthM = (end.kind === 'point-temperature' && end.point === 'depth' ? end.depthM : undefined) ?? problem.depthM;
  if (depthM !== undefined) {
    if (depthM > axisLengthM[0]) return { ok: false, code: 'not-applicable', message: `Depth ${depthM} m is deeper than the centre (${axisLengthM[0]} m below the ${axes[0].name === 'r' ? 'side' : 'face ⟂ x'}).` };
    probes.push({ id: 'depth', positionM: axisLengthM.map((l, d) => (d === 0 ? l - depthM : 0)) });
  }
  const startValue = (p: Probe) => (p.positionM ? productFieldTemperatureAt(start, p.positionM) : productFieldMeanK(start));

  /** Series built for every time with Fo >= foMin on each axis: per term, per axis, the projected amplitudes. */
  const build = (minTimeS: number) => {
    const tol = problem.toleranceK / (TAIL_SHARE * Math.max(1, terms.length) * axes.length);
    const counts = axes.map((_, d) => {
      let n = 1;
      for (const term of terms) {
        const f = term.factors[d];
        let bound = Math.abs(f.offset);
        for (const a of f.amplitudes) bound += Math.abs(a);
        n = Math.max(n, seriesTermCount(foPerS[d] * minTimeS, 2 * Math.abs(term.weightK) * bound, tol));
      }
      return n;
    });
    if (!counts.every(Number.isFinite)) return null;
    const lambdas = counts.map((n, d) => eigenvalues(axisGeometry[d], biot[d], n));
    // A factor is dimensionless; projectField is linear in the field, so it takes the factor as a 1-D series with medium 0.
    const amplitudes = terms.map((term) =>
      term.factors.map((f, d) =>
        projectField({ kind: 'series-1d', geometry: axisGeometry[d], lengthM: axisLengthM[d], offsetK: f.offset, eigenvalues: f.eigenvalues, amplitudesK: f.amplitudes }, axisGeometry[d], axisLengthM[d], 0, lambdas[d]),
      ),
    );
    // Per probe, term, axis: b_n X(lambda_n x / L) (or b_n mean X), so a time costs only the exponentials.
    const weights = probes.map((p) =>
      amplitudes.map((perAxis) =>
        perAxis.map((b, d) => Float64Array.from(b, (bn, n) => bn * (p.positionM ? eigenfunction(axisGeometry[d], (lambdas[d][n] * p.positionM[d]) / axisLengthM[d]) : eigenfunctionMean(axisGeometry[d], lambdas[d][n])))),
      ),
    );
    const valueAt = (probeIndex: number, timeS: number) => {
      if (timeS === 0) return startValue(probes[probeIndex]);
      let t = mediumK;
      terms.forEach((term, j) => {
        let product = term.weightK;
        for (let d = 0; d < axes.length; d++) product *= seriesSum(weights[probeIndex][j][d], lambdas[d], foPerS[d] * timeS, counts[d]);
        t += product;
      });
      return t;
    };
    /** Largest possible |T - T_inf| anywhere at timeS (|X| <= 1). */
    const excessBound = (timeS: number) =>
      terms.reduce((sum, term, j) => sum + Math.abs(term.weightK) * amplitudes[j].reduce((p, b, d) => p * b.reduce((s, bn, n) => s + Math.abs(bn) * Math.exp(-(lambdas[d][n] ** 2) * foPerS[d] * timeS), 0), 1), 0);
    return { counts, lambdas, amplitudes, valueAt, excessBound };
  };

  const scanStartS = SCAN_FIRST_FOURIER / Math.max(...foPerS);
  let durationS: number;
  if (end.kind === 'duration') durationS = end.seconds;
  else {
    const index = probes.findIndex((p) => p.id === end.point);
    if (index < 0) return { ok: false, code: 'not-applicable', message: `A ${geometry.shape.kind} has no reported point "${end.point}"; its points are ${probes.map((p) => p.id).join(', ')}.` };
    const targetK = end.temperatureK;
    const gap0 = startValue(probes[index]) - targetK;
    if (Math.abs(targetK - mediumK) < problem.toleranceK && gap0 !== 0) {
      return { ok: false, code: 'target-unreachable', message: `The ${end.point} only approaches the medium temperature ${mediumK.toFixed(2)} K; a target within ${problem.toleranceK} K of it is never reached in finite time.` };
    }
    const scan = build(scanStartS);
    if (!scan) return { ok: false, code: 'not-applicable', message: 'The series would need too many terms at the start of this stage.' };
    // Maximum principle: the field stays between its start extremes and T_inf (sampled on RANGE_SAMPLES per axis,
    // the centre, faces, edges and corners among them).
    const range = startRange(start, axisLengthM);
    const lowK = Math.min(range.lowK, mediumK);
    const highK = Math.max(range.highK, mediumK);
    if (targetK < lowK || targetK > highK) {
      return { ok: false, code: 'target-unreachable', message: `The ${end.point} cannot reach ${targetK.toFixed(2)} K: in a medium at ${mediumK.toFixed(2)} K the part stays between ${lowK.toFixed(2)} K and ${highK.toFixed(2)} K.` };
    }
    if (gap0 === 0) durationS = 0;
    else {
      let lo = 0;
      let hi = scanStartS;
      let gapHi = scan.valueAt(index, hi) - targetK;
      while (gapHi !== 0 && gapHi > 0 === gap0 > 0) {
        if (scan.excessBound(hi) < Math.abs(targetK - mediumK) || hi > MAX_STAGE_S) {
          return { ok: false, code: 'target-not-reached', message: `The ${end.point} did not reach ${targetK.toFixed(2)} K: after ${hi.toPrecision(4)} s the whole part is closer than that to the medium at ${mediumK.toFixed(2)} K.` };
        }
        lo = hi;
        hi *= SCAN_GROWTH;
        gapHi = scan.valueAt(index, hi) - targetK;
      }
      // Within the first scan interval the series must hold at smaller Fo.
      const locate = lo > 0 ? scan : build(scanStartS * 1e-3);
      if (!locate) return { ok: false, code: 'not-applicable', message: 'The target is reached so early that the series would need too many terms; use the finite-volume method.' };
      durationS = findRootBracketed((t) => locate.valueAt(index, t) - targetK, lo > 0 ? lo : scanStartS * 1e-3, hi, hi * 1e-13);
    }
  }

  const sampleCount = Math.max(2, problem.sampleCount);
  const timeS = Float64Array.from({ length: sampleCount }, (_, i) => (i === sampleCount - 1 ? durationS : (durationS * i) / (sampleCount - 1)));
  const series = build(durationS > 0 ? timeS[1] : scanStartS);
  if (!series) return { ok: false, code: 'not-applicable', message: `The stage's first sample (t = ${timeS[1].toPrecision(3)} s) is too early for the series; use more time or the finite-volume method.` };
  const temperaturesK: Partial<Record<PointId, Float64Array>> = {};
  probes.forEach((p, i) => {
    temperaturesK[p.id] = Float64Array.from(timeS, (t) => series.valueAt(i, t));
  });
  const endField: ProductField = {
    kind: 'product',
    axes: start.axes,
    offsetK: mediumK,
    terms: terms.map((term, j) => ({
      weightK: term.weightK,
      factors: axes.map((_, d) => decayedFactor(series.lambdas[d], series.amplitudes[j][d], foPerS[d] * durationS)),
    })),
  };
  const meanStartK = productFieldMeanK(start);
  const meanEndK = productFieldMeanK(endField);
  return {
    ok: true,
    solution: {
      method: 'series',
      durationS,
      samples: { timeS, temperaturesK },
      endField,
      heatRemovedJ: rhoCpJPerM3K * geometry.volumeM3 * (meanStartK - meanEndK),
      energyRelativeError: null,
      effort: { terms: series.counts.reduce((a, b) => a + b, 0) * terms.length },
      notes: [],
    },
  };
};

/** Lowest and highest start temperature on an even grid of RANGE_SAMPLES per axis. */
function startRange(start: ProductField, axisLengthM: number[]): { lowK: number; highK: number } {
  let lowK = Infinity;
  let highK = -Infinity;
  const dims = axisLengthM.length;
  const position = new Array<number>(dims);
  for (let k = 0; k < RANGE_SAMPLES ** dims; k++) {
    let rest = k;
    for (let d = 0; d < dims; d++) {
      position[d] = (axisLengthM[d] * (rest % RANGE_SAMPLES)) / (RANGE_SAMPLES - 1);
      rest = Math.floor(rest / RANGE_SAMPLES);
    }
    const t = productFieldTemperatureAt(start, position);
    lowK = Math.min(lowK, t);
    highK = Math.max(highK, t);
  }
  return { lowK, highK };
}

/** b_n exp(-lambda_n² Fo), with negligible trailing terms dropped. */
function decayedFactor(lambdas: Float64Array, amplitudes: Float64Array, fo: number): SeriesFactor {
  const a = Float64Array.from(amplitudes, (b, n) => b * Math.exp(-lambdas[n] * lambdas[n] * fo));
  let largest = 0;
  for (const v of a) largest = Math.max(largest, Math.abs(v));
  let count = a.length;
  while (count > 1 && Math.abs(a[count - 1]) <= NEGLIGIBLE_AMPLITUDE * largest) count--;
  return { offset: 0, eigenvalues: Float64Array.from(lambdas.subarray(0, count)), amplitudes: a.slice(0, count) };
}
