// Stage solver: the exact eigenfunction series of a plate, long cylinder or sphere with constant h and properties.
// Method: T(x, t) = T_inf + sum b_n X(lambda_n x/L) exp(-lambda_n^2 Fo), Fo = alpha t / L^2, Bi = h L / k, with b_n the
// projection of the start field (projectField.ts) (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
// Eqs. 5.39-5.52; Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed., Secs. 3.9, 7.7, 9.8, from memory).
// Validity: 1-D shapes; constant h, no radiation; properties at problem.propertyTemperatureK.
// Truncation: terms from seriesTermCount so the dropped tail is below THETA_TAIL_TOLERANCE x the largest start excess
// at the first sample after t = 0 (t = 0 itself reports the start field). Floor: Fo of that sample must be above
// seriesFourierFloor (about 1e-7); shorter stages return not-applicable. Expected error: the tail bound (~1e-9 of the
// excess) plus rounding; far below toleranceK. Time to target: firstCrossingFo (Brent to machine precision in Fo).
import type { PointId } from '@/schema/planSchema';
import type { StageOutcome, StageNote, StageSolver } from '../stageProblem';
import type { Series1DField } from '@/engine/fields';
import { eigenfunction, eigenfunctionMean } from './eigenfunction';
import { eigenvalues } from './eigenvalues';
import { meanTemperature, temperatureAt } from './evaluateField1D';
import { firstCrossingFo } from './firstCrossingFo';
import { oneTermApproximation, ONE_TERM_FROM_FO } from './oneTermApproximation';
import { projectField } from './projectField';
import { MAX_SERIES_TERMS, seriesFourierFloor, seriesTermCount } from './seriesTermCount';
import { seriesSum } from './seriesSum';

const THETA_TAIL_TOLERANCE = 1e-9;
/** Longest stage a plan allows, s (the plan schema's limit). */
const MAX_STAGE_DURATION_S = 1e8;

const notApplicable = (message: string): StageOutcome => ({ ok: false, code: 'not-applicable', message });

export const solveSeriesStage: StageSolver = (problem) => {
  const { geometry, material, boundary, start, end } = problem;
  const oneD = geometry.oneD;
  if (!oneD) return notApplicable('The exact series covers plates, long cylinders and spheres only; this shape needs the product solution or the finite-volume method.');
  if (!boundary.hIsConstant) return notApplicable('The exact series needs a constant heat transfer coefficient; this medium gives h as a function of surface temperature. Use the finite-volume method.');
  if (boundary.radiation) return notApplicable('The exact series cannot include radiation (it is not linear in temperature). Use the finite-volume method, or lumped if the Biot number is small.');
  if (start.kind !== 'uniform' && start.kind !== 'series-1d' && start.kind !== 'grid-1d') return notApplicable(`The exact series cannot start from a ${start.kind} field.`);
  if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'Stopped.' };
  const lengthM = oneD.lengthM;
  const shape = oneD.geometry;
  if (start.kind !== 'uniform' && (start.geometry !== shape || Math.abs(start.lengthM - lengthM) > 1e-12 * lengthM)) {
    return notApplicable(`The start field belongs to a ${start.geometry} of ${start.lengthM} m, not to this ${shape} of ${lengthM} m.`);
  }
  // The reported depth: the problem's, or the end condition's when only that names one.
  const depthM = problem.depthM ?? (end.kind === 'point-temperature' ? end.depthM : undefined);
  if (depthM !== undefined && (depthM < 0 || depthM > lengthM)) {
    return notApplicable(`The depth ${depthM} m lies outside the part (0 to ${lengthM} m below the cooled surface).`);
  }

  const propertyK = problem.propertyTemperatureK;
  const conductivity = material.conductivity.at(propertyK);
  const rhoC = material.volumetricHeatCapacity(propertyK);
  const foPerS = conductivity / rhoC / (lengthM * lengthM);
  const hWPerM2K = boundary.convectionCoefficient(propertyK);
  const bi = (hWPerM2K * lengthM) / conductivity;
  const mediumK = boundary.mediumK;

  // Largest |T_start - T_inf|: the scale of every tolerance below.
  const excessK =
    start.kind === 'uniform' ? Math.abs(start.temperatureK - mediumK)
    : start.kind === 'series-1d' ? start.amplitudesK.reduce((s, a) => s + Math.abs(a), Math.abs(start.offsetK - mediumK))
    : start.temperaturesK.reduce((s, t) => Math.max(s, Math.abs(t - mediumK)), 0);
  const tailK = THETA_TAIL_TOLERANCE * excessK;
  const boundK = 2 * excessK;
  const foFloor = seriesFourierFloor(boundK, tailK);
  // One term at least, so that every weight array exists even for a start at the medium temperature.
  const termsAt = (fo: number) => seriesTermCount(Math.max(fo, foFloor), boundK, tailK);

  // Reported points: position x* from the centre, or the volume mean.
  const ids: PointId[] = ['centre', 'surface', 'mean'];
  if (depthM !== undefined) ids.push('depth');
  const xStarOf = (id: PointId) => (id === 'centre' ? 0 : id === 'surface' ? 1 : id === 'depth' ? 1 - (depthM ?? 0) / lengthM : NaN);
  const startValue = (id: PointId) => (id === 'mean' ? meanTemperature(start) : temperatureAt(start, xStarOf(id) * lengthM));

  // Coefficients and per-point weights b_n X_n(x*), grown on demand.
  let lambdas = new Float64Array(0);
  let coefficients = new Float64Array(0);
  const weights = new Map<PointId, Float64Array>();
  const weightOf = (id: PointId, lambda: number) => (id === 'mean' ? eigenfunctionMean(shape, lambda) : eigenfunction(shape, lambda * xStarOf(id)));
  const ensureTerms = (count: number) => {
    if (count <= lambdas.length) return;
    const size = Math.min(MAX_SERIES_TERMS, Math.max(count, 2 * lambdas.length));
    const all = eigenvalues(shape, bi, size);
    const added = projectField(start, shape, lengthM, mediumK, all.subarray(lambdas.length));
    const grown = new Float64Array(size);
    grown.set(coefficients);
    grown.set(added, lambdas.length);
    for (const id of ids) {
      const old = weights.get(id) ?? new Float64Array(0);
      const w = new Float64Array(size);
      w.set(old);
      for (let n = old.length; n < size; n++) w[n] = grown[n] * weightOf(id, all[n]);
      weights.set(id, w);
    }
    lambdas = Float64Array.from(all);
    coefficients = grown;
  };
  const pointAt = (id: PointId, fo: number) => {
    const n = termsAt(fo);
    ensureTerms(n);
    return mediumK + seriesSum(weights.get(id) as Float64Array, lambdas, fo, n);
  };

  // Stage length in Fo.
  let foEnd: number;
  if (end.kind === 'duration') {
    foEnd = end.seconds * foPerS;
  } else {
    if (!ids.includes(end.point)) return notApplicable(`The point "${end.point}" is not reported for a 1-D shape${end.point === 'depth' ? ' (no depth given)' : ''}.`);
    const point = end.point;
    const label = geometry.points.find((p) => p.id === point)?.label ?? point;
    const found = firstCrossingFo({
      value: (fo) => pointAt(point, fo),
      envelope: (fo) => {
        const n = termsAt(fo);
        ensureTerms(n);
        const w = weights.get(point) as Float64Array;
        let e = tailK;
        for (let i = 0; i < n; i++) e += Math.abs(w[i]) * Math.exp(-lambdas[i] * lambdas[i] * fo);
        return e;
      },
      startK: startValue(point),
      targetK: end.temperatureK,
      mediumK,
      toleranceK: problem.toleranceK,
      monotone: start.kind === 'uniform',
      foFloor,
      foMax: MAX_STAGE_DURATION_S * foPerS,
      secondsPerFo: 1 / foPerS,
      pointLabel: label,
    });
    if (!found.ok) return found;
    foEnd = found.fo;
  }
  if (problem.signal?.aborted) return { ok: false, code: 'aborted', message: 'Stopped.' };

  // Samples: t = 0 is the start field itself; later samples use the terms needed at the first of them.
  const count = Math.max(2, problem.sampleCount);
  const dFo = foEnd / (count - 1);
  const terms = termsAt(dFo);
  if (dFo < foFloor || !Number.isFinite(terms)) {
    return notApplicable(`The samples are too close to the start for the exact series (first sample at Fo = ${dFo.toExponential(2)}, floor ${foFloor.toExponential(2)}). Use fewer samples or the finite-volume method.`);
  }
  ensureTerms(terms);
  const durationS = foEnd / foPerS;
  const timeS = Float64Array.from({ length: count }, (_, k) => (k === count - 1 ? durationS : (k * durationS) / (count - 1)));
  const temperaturesK: Partial<Record<PointId, Float64Array>> = {};
  const ratios = Float64Array.from(lambdas.subarray(0, terms), (l) => Math.exp(-l * l * dFo));
  for (const id of ids) {
    const curve = new Float64Array(count).fill(mediumK);
    curve[0] = startValue(id);
    const w = weights.get(id) as Float64Array;
    for (let n = 0; n < terms; n++) {
      // exp(-lambda^2 k dFo) as successive powers of one ratio (relative rounding ~ k eps).
      let decay = 1;
      for (let k = 1; k < count; k++) {
        decay *= ratios[n];
        if (decay < 1e-300) break;
        curve[k] += w[n] * decay;
      }
    }
    temperaturesK[id] = curve;
  }

  // End field: the same series at Fo_end, with the terms that still matter there.
  const endTerms = Math.max(1, Math.min(terms, termsAt(foEnd)));
  const endField: Series1DField = {
    kind: 'series-1d',
    geometry: shape,
    lengthM,
    offsetK: mediumK,
    eigenvalues: Float64Array.from(lambdas.subarray(0, endTerms)),
    amplitudesK: Float64Array.from({ length: endTerms }, (_, n) => coefficients[n] * Math.exp(-lambdas[n] * lambdas[n] * foEnd)),
  };
  const meanStartK = meanTemperature(start);
  const meanEndK = meanTemperature(endField);
  const heatRemovedJ = rhoC * geometry.volumeM3 * (meanStartK - meanEndK);

  // Heat through the surface, h As int (T_s - T_inf) dt = h As (L^2/alpha) sum b_n X_n(1) (1 - e^{-lambda^2 Fo}) / lambda^2.
  const surface = weights.get('surface') as Float64Array;
  let surfaceIntegral = 0;
  for (let n = 0; n < terms; n++) surfaceIntegral += (surface[n] * -Math.expm1(-lambdas[n] * lambdas[n] * foEnd)) / (lambdas[n] * lambdas[n]);
  const surfaceHeatJ = hWPerM2K * geometry.cooledAreaM2 * (surfaceIntegral / foPerS);
  const energyRelativeError = heatRemovedJ !== 0 ? Math.abs(surfaceHeatJ - heatRemovedJ) / Math.abs(heatRemovedJ) : null;

  const notes: StageNote[] = [];
  if (start.kind === 'uniform' && foEnd > ONE_TERM_FROM_FO) {
    const excess = start.temperatureK - mediumK;
    const oneTerm = oneTermApproximation(shape, bi);
    const surfaceX = eigenfunction(shape, oneTerm.lambda1);
    const centre = temperaturesK.centre as Float64Array;
    const surfaceCurve = temperaturesK.surface as Float64Array;
    const mean = temperaturesK.mean as Float64Array;
    let centreK = 0;
    let surfaceK = 0;
    let meanK = 0;
    for (let k = 1; k < count; k++) {
      const fo = k * dFo;
      if (fo <= ONE_TERM_FROM_FO) continue;
      const centreTheta = oneTerm.theta(0, fo);
      centreK = Math.max(centreK, Math.abs(mediumK + excess * centreTheta - centre[k]));
      surfaceK = Math.max(surfaceK, Math.abs(mediumK + excess * centreTheta * surfaceX - surfaceCurve[k]));
      meanK = Math.max(meanK, Math.abs(mediumK + excess * oneTerm.meanTheta(fo) - mean[k]));
    }
    notes.push({ kind: 'one-term-error', centreK, surfaceK, meanK, fromFo: ONE_TERM_FROM_FO });
  }

  return {
    ok: true,
    solution: {
      method: 'series',
      durationS,
      samples: { timeS, temperaturesK },
      endField,
      heatRemovedJ,
      energyRelativeError,
      effort: { terms },
      notes,
    },
  };
};
