// runPlan: the engine's one entry point. Chains the stages of a plan, each starting from the field
// the previous stage left; picks a method per stage and says why; checks every stage by a second
// method; gathers heat removed, energy balance and validity warnings.
import type { PlanK, Stage, EndCondition } from '@/schema/planSchema';
import { geometryOf, type Geometry } from '../geometry/geometry';
import { materialModel, type MaterialModel } from '../properties/materialModel';
import { surfaceBoundary, radiationCoefficient } from '../properties/surfaceBoundary';
import type { Field } from '../fields';
import type { MethodId, StageEnd, StageProblem, StageSolution, StageSolver } from '../methods/stageProblem';
import { solveLumpedStage } from '../methods/lumped/solveLumpedStage';
import { solveSeriesStage } from '../methods/series/solveSeriesStage';
import { solveFiniteVolumeStage } from '../methods/finite-volume/solveFiniteVolumeStage';
import { solveProductStage } from '../methods/product/solveProductStage';
import { solveFiniteVolume2DStage } from '../methods/finite-volume-2d/solveFiniteVolume2DStage';
import { selectMethod } from './selectMethod';
import { effectiveH, stageBiot } from './stageBiot';
import { curveMeasures, maxSampleDifference, SURFACE_POINTS } from './curveMeasures';
import { fieldAtPoints, fieldProfile } from '../fieldAtPoints';
import { lumpedErrorEstimateK } from './lumpedErrorEstimate';
import { stageWarnings, LIQUID_H_THRESHOLD_WPERM2K } from '../validity/rules';
import type { StageFacts } from '../validity/stageFacts';
import type { FailedStage, PlanResult, StageResult } from './planResult';

/** Reported temperatures are within this of the exact answer unless a plan asks otherwise (K). */
export const DEFAULT_TOLERANCE_K = 0.01;
/** Samples per stage curve: 200 intervals resolve a quench's first seconds on a chart. */
export const SAMPLES_PER_STAGE = 201;
/** Lumped capacitance is "accurate enough" when the spread it ignores is below this share of the stage's temperature swing (common practice: the accuracy the Bi < 0.1 rule of thumb is meant to give). */
export const LUMPED_ACCURACY_FRACTION = 0.05;
/** The emissivity assumed for the radiation-left-out check when the material gives none: oxidised steel (common practice). */
export const DEFAULT_SURFACE_EMISSIVITY = 0.8;

/**
 * The quick pass that answers an edit at once (then replaced by the full pass) skips the cross-checks
 * and solves to this looser tolerance, K: far below what a chart shows, about a fifth of the work.
 */
export const QUICK_PASS_TOLERANCE_K = 0.1;

export interface RunPlanOptions {
  /** Defaults to DEFAULT_TOLERANCE_K, or QUICK_PASS_TOLERANCE_K for a quick pass. */
  toleranceK?: number;
  /** Check every stage by a second method (default). false = the quick pass for interactive editing. */
  crossCheck?: boolean;
  signal?: AbortSignal;
  onProgress?: (fraction: number) => void;
}

/** The solver of each method, for 1-D shapes and for finite shapes (product of series, 2-D grid). */
const SOLVERS_1D: Record<MethodId, StageSolver> = { lumped: solveLumpedStage, series: solveSeriesStage, 'finite-volume': solveFiniteVolumeStage };
const SOLVERS_FINITE: Record<MethodId, StageSolver> = { lumped: solveLumpedStage, series: solveProductStage, 'finite-volume': solveFiniteVolume2DStage };

function stageEnd(end: EndCondition): StageEnd {
  return end.kind === 'duration' ? end : { kind: 'point-temperature', point: end.point, depthM: end.depthM, temperatureK: end.temperature };
}

/** Relative spread (max - min)/max of a property over a temperature range. */
function variation(range: { min: number; max: number }): number {
  return range.max > 0 ? (range.max - range.min) / range.max : 0;
}

function heatCapacityVariation(material: MaterialModel, lowK: number, highK: number): number {
  const rho = material.density.rangeOver(lowK, highK);
  const cp = material.specificHeat.rangeOver(lowK, highK);
  return variation({ min: rho.min * cp.min, max: rho.max * cp.max });
}

function abortError(): Error {
  const e = new Error('The computation was stopped.');
  e.name = 'AbortError';
  return e;
}

export function runPlan(plan: PlanK, options: RunPlanOptions = {}): PlanResult {
  const crossCheck = options.crossCheck ?? true;
  const toleranceK = options.toleranceK ?? (crossCheck ? DEFAULT_TOLERANCE_K : QUICK_PASS_TOLERANCE_K);
  const geometry = geometryOf(plan.part.shape);
  const material = materialModel(plan.part.material);
  const stages: StageResult[] = [];
  let failure: FailedStage | null = null;
  let field: Field = { kind: 'uniform', temperatureK: plan.initialTemperature };
  let timeS = 0;

  for (let index = 0; index < plan.stages.length; index++) {
    if (options.signal?.aborted) throw abortError();
    const stage = plan.stages[index];
    const outcome = runStage(stage, index, field, timeS, { geometry, material, toleranceK, signal: options.signal, crossCheck, emissivity: plan.part.material.surfaceEmissivity, solvers: geometry.oneD ? SOLVERS_1D : SOLVERS_FINITE });
    if (!outcome.ok) {
      if (outcome.aborted) throw abortError();
      failure = { index, name: stage.name, code: outcome.code, message: outcome.message };
      break;
    }
    stages.push(outcome.result);
    field = outcome.endField;
    timeS += outcome.result.durationS;
    options.onProgress?.((index + 1) / plan.stages.length);
  }

  return {
    planName: plan.name,
    geometry: { volumeM3: geometry.volumeM3, cooledAreaM2: geometry.cooledAreaM2, characteristicLengthM: geometry.characteristicLengthM, seriesLengthM: geometry.seriesLengthM, basis: geometry.basis },
    points: geometry.points.map((p) => ({ id: p.id, label: p.label })),
    stages,
    failure,
    totalDurationS: timeS,
    crossChecked: crossCheck,
    toleranceK,
    warnings: stages.flatMap((s) => s.warnings),
  };
}

interface StageContext {
  geometry: Geometry;
  material: MaterialModel;
  toleranceK: number;
  signal?: AbortSignal;
  crossCheck: boolean;
  emissivity?: number;
  solvers: Record<MethodId, StageSolver>;
}

type StageRun =
  | { ok: true; result: StageResult; endField: Field }
  | { ok: false; aborted: boolean; code: string; message: string };

function runStage(stage: Stage, index: number, start: Field, startTimeS: number, ctx: StageContext): StageRun {
  const { geometry, material, toleranceK } = ctx;
  const boundary = surfaceBoundary(stage.medium);
  const end = stageEnd(stage.end);
  const depthM = end.kind === 'point-temperature' && end.point === 'depth' ? end.depthM : undefined;
  const startK = fieldAtPoints(start, geometry, depthM);
  const startMeanK = startK.mean!;
  // The hottest point on the cooled surface: the conservative one for h(Ts) and radiation.
  const surfaceStartK = Math.max(...SURFACE_POINTS.map((id) => startK[id]).filter((t): t is number => t !== undefined));

  // Constant-property methods evaluate properties at the stage's mean temperature: first guessed
  // (the target, or the start), then corrected to the mean of the start and end means.
  const guessEndK = end.kind === 'point-temperature' ? end.temperatureK : startMeanK;
  let propertyTemperatureK = (startMeanK + guessEndK) / 2;

  const hWPerM2K = effectiveH(boundary, surfaceStartK);
  const biotAt = (tK: number) => stageBiot(geometry, hWPerM2K, material.conductivity.at(tK));
  let biot = biotAt(propertyTemperatureK);
  const lumpedAccuracyLimitK = Math.max(toleranceK, LUMPED_ACCURACY_FRACTION * Math.abs(startMeanK - boundary.mediumK));
  const lumpedErrorK = lumpedErrorEstimateK(geometry, hWPerM2K / material.conductivity.at(propertyTemperatureK), startK, boundary.mediumK);
  const selection = selectMethod(
    { biotLumped: biot.lumped.value, lumpedErrorK, lumpedAccuracyLimitK, constantProperties: material.isConstant, hIsConstant: boundary.hIsConstant, radiation: boundary.radiation !== null },
    stage.method,
  );

  const problem = (over: Partial<StageProblem>): StageProblem => ({
    geometry, material, boundary, start, end, toleranceK, sampleCount: SAMPLES_PER_STAGE, depthM, propertyTemperatureK, signal: ctx.signal, ...over,
  });
  // Only the series holds properties constant; lumped integrates rho*cp(T) along its ODE.
  const usesConstantProperties = (m: MethodId) => m === 'series';
  let primary = ctx.solvers[selection.method](problem({}));
  // A method that finds itself out of its range after all (e.g. the series below its Fourier floor)
  // hands an automatic stage to the finite-volume solver, which is valid everywhere.
  if (!primary.ok && primary.code === 'not-applicable' && !selection.forced && selection.method !== 'finite-volume') {
    selection.reason = `finite-volume: ${selection.method} declined the stage (${primary.message})`;
    selection.method = 'finite-volume';
    selection.crossCheck = { method: 'finite-volume', refined: true };
    primary = ctx.solvers['finite-volume'](problem({}));
  }
  if (!primary.ok) return { ok: false, aborted: primary.code === 'aborted', code: primary.code, message: primary.message };
  const endMeanK = fieldAtPoints(primary.solution.endField, geometry, depthM).mean!;
  propertyTemperatureK = (startMeanK + endMeanK) / 2;
  biot = biotAt(propertyTemperatureK);
  if (!material.isConstant && usesConstantProperties(selection.method)) {
    primary = ctx.solvers[selection.method](problem({ propertyTemperatureK }));
    if (!primary.ok) return { ok: false, aborted: primary.code === 'aborted', code: primary.code, message: primary.message };
  }
  const sol: StageSolution = primary.solution;

  const crossTolerance = selection.crossCheck.refined ? toleranceK / 10 : toleranceK;
  const cross = !ctx.crossCheck ? null : ctx.solvers[selection.crossCheck.method](problem({ end: { kind: 'duration', seconds: Math.max(sol.durationS, Number.MIN_VALUE) }, toleranceK: crossTolerance, propertyTemperatureK }));
  // Both methods meet the tolerance, so they may differ by twice it; lumped is allowed its accuracy limit.
  const allowedK = selection.method === 'lumped' ? lumpedAccuracyLimitK : 2 * toleranceK;
  const crossCheck = cross?.ok && sol.durationS > 0 ? { method: cross.solution.method, refined: selection.crossCheck.refined, maxDifferenceK: maxSampleDifference(sol.samples, cross.solution.samples), toleranceK: allowedK } : null;

  const endK = fieldAtPoints(sol.endField, geometry, depthM);
  const measures = curveMeasures(sol.samples);
  const alpha = material.conductivity.at(propertyTemperatureK) / material.volumetricHeatCapacity(propertyTemperatureK);
  const fourierEnd = (alpha * sol.durationS) / geometry.seriesLengthM ** 2;
  const lowK = Math.min(measures.surfaceRangeK.lowK, endMeanK, startMeanK, startK.centre ?? startMeanK);
  const highK = Math.max(measures.surfaceRangeK.highK, endMeanK, startMeanK, startK.centre ?? startMeanK);
  const oneTerm = sol.notes.find((n) => n.kind === 'one-term-error') ?? null;
  const emissivityUsed = boundary.radiation?.emissivity ?? ctx.emissivity ?? DEFAULT_SURFACE_EMISSIVITY;
  const hConvection = boundary.radiation ? hWPerM2K - radiationCoefficient(boundary.radiation.emissivity, Math.max(surfaceStartK, boundary.mediumK), boundary.radiation.surroundingsK) : hWPerM2K;
  const chosenVerdict = selection.verdicts.find((v) => v.method === selection.method)!;

  const facts: StageFacts = {
    stageIndex: index,
    method: selection.method,
    forced: selection.forced,
    methodValid: chosenVerdict.valid,
    methodInvalidReason: chosenVerdict.valid ? null : chosenVerdict.reason,
    biotLumped: biot.lumped.value,
    biotSeries: biot.series.value,
    fourierEnd,
    durationS: sol.durationS,
    hWPerM2K: hConvection,
    hIsConstant: boundary.hIsConstant,
    radiationIncluded: boundary.radiation !== null,
    radiationCoefficientWPerM2K: radiationCoefficient(emissivityUsed, surfaceStartK, boundary.radiation?.surroundingsK ?? boundary.mediumK),
    emissivityUsed,
    surfaceStartK,
    mediumK: boundary.mediumK,
    liquidBath: hConvection >= LIQUID_H_THRESHOLD_WPERM2K || !boundary.hIsConstant,
    surfaceRangeK: measures.surfaceRangeK,
    constantProperties: usesConstantProperties(selection.method),
    propertyTemperatureK,
    propertyVariation: { conductivity: variation(material.conductivity.rangeOver(lowK, highK)), heatCapacity: heatCapacityVariation(material, lowK, highK) },
    lumpedErrorK: selection.method === 'lumped' ? lumpedErrorK : null,
    lumpedAccuracyLimitK,
    oneTermErrorK: oneTerm ? { centre: oneTerm.centreK, surface: oneTerm.surfaceK, mean: oneTerm.meanK } : null,
    crossCheck: crossCheck ? { method: crossCheck.method, refined: crossCheck.refined, maxDifferenceK: crossCheck.maxDifferenceK, allowedK } : null,
    energyRelativeError: sol.energyRelativeError,
    timeSteps: sol.effort.steps ?? null,
    endKind: end.kind,
  };

  const result: StageResult = {
    index,
    name: stage.name,
    method: selection.method,
    forced: selection.forced,
    methodReason: selection.reason,
    verdicts: selection.verdicts,
    biot,
    fourierEnd,
    startTimeS,
    durationS: sol.durationS,
    startK,
    endK,
    heatRemovedJ: sol.heatRemovedJ,
    heatBasis: geometry.basis,
    oneTermErrorK: oneTerm ? { centre: oneTerm.centreK, surface: oneTerm.surfaceK, mean: oneTerm.meanK, fromFo: oneTerm.fromFo } : null,
    crossCheck,
    energyRelativeError: sol.energyRelativeError,
    maxSurfaceCoolingRateKPerS: measures.maxSurfaceCoolingRateKPerS,
    maxCentreSurfaceDifferenceK: measures.maxCentreSurfaceDifferenceK,
    maxPointSpreadK: measures.maxPointSpreadK,
    effort: sol.effort,
    warnings: stageWarnings(facts),
    curves: {
      timeS: Array.from(sol.samples.timeS, (t) => t + startTimeS),
      temperaturesK: Object.fromEntries(Object.entries(sol.samples.temperaturesK).map(([id, c]) => [id, Array.from(c)])),
    },
    endProfile: fieldProfile(sol.endField, geometry),
  };
  return { ok: true, result, endField: sol.endField };
}
