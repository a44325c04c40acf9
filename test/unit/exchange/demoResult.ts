// Hand-built PlanResults for the exchange and comparison tests. The numbers are fixtures chosen so
// that every figure a test checks can be read off by eye; they are not physics and are not
// claimed to be. Tests that need real physics run the engine instead.
import type { PlanResult, StageResult } from '@/engine/plan/planResult';

type StageFixture = Pick<StageResult, 'index' | 'name' | 'method' | 'startTimeS' | 'durationS' | 'heatRemovedJ' | 'maxSurfaceCoolingRateKPerS' | 'maxCentreSurfaceDifferenceK'> & {
  timeS: number[];
  centreK: number[];
  surfaceK: number[];
  meanK: number[];
};

export function stageFixture(f: StageFixture): StageResult {
  const last = f.timeS.length - 1;
  return {
    index: f.index,
    name: f.name,
    method: f.method,
    forced: false,
    methodReason: 'fixture',
    verdicts: [],
    biot: { lumped: { value: 0.05, lengthM: 0.01, lengthLabel: 'Lc' }, series: { value: 0.1, lengthM: 0.02, lengthLabel: 'r0 (radius)' }, hWPerM2K: 100, conductivityWPerMK: 45 },
    fourierEnd: 0.5,
    startTimeS: f.startTimeS,
    durationS: f.durationS,
    startK: { centre: f.centreK[0], surface: f.surfaceK[0], mean: f.meanK[0] },
    endK: { centre: f.centreK[last], surface: f.surfaceK[last], mean: f.meanK[last] },
    heatRemovedJ: f.heatRemovedJ,
    heatBasis: 'per m of length',
    oneTermErrorK: null,
    crossCheck: null,
    energyRelativeError: null,
    maxSurfaceCoolingRateKPerS: f.maxSurfaceCoolingRateKPerS,
    maxCentreSurfaceDifferenceK: f.maxCentreSurfaceDifferenceK,
    maxPointSpreadK: f.maxCentreSurfaceDifferenceK,
    effort: {},
    warnings: [],
    curves: { timeS: f.timeS, temperaturesK: { centre: f.centreK, surface: f.surfaceK, mean: f.meanK } },
    endProfile: { positionM: [0, 0.02], temperatureK: [f.centreK[last], f.surfaceK[last]] },
  };
}

const geometry: PlanResult['geometry'] = { volumeM3: 1.2566e-3, cooledAreaM2: 0.12566, characteristicLengthM: 0.01, seriesLengthM: 0.02, basis: 'per m of length' };
const points: PlanResult['points'] = [
  { id: 'centre', label: 'axis' },
  { id: 'surface', label: 'surface' },
  { id: 'mean', label: 'volume mean' },
];

export const airResult: PlanResult = {
  planName: 'Pin 40 mm, air then hold',
  geometry,
  points,
  stages: [
    stageFixture({ index: 0, name: 'Transfer', method: 'lumped', startTimeS: 0, durationS: 20, heatRemovedJ: 50_000, maxSurfaceCoolingRateKPerS: 2.5, maxCentreSurfaceDifferenceK: 4, timeS: [0, 10, 20], centreK: [1123.15, 1110, 1100], surfaceK: [1123.15, 1106, 1096], meanK: [1123.15, 1108, 1098] }),
    stageFixture({ index: 1, name: 'Hold, "still" air', method: 'series', startTimeS: 20, durationS: 1800, heatRemovedJ: 1_500_000, maxSurfaceCoolingRateKPerS: 1.25, maxCentreSurfaceDifferenceK: 6, timeS: [20, 920, 1820], centreK: [1100, 950, 873.15], surfaceK: [1096, 945, 870], meanK: [1098, 948, 872] }),
  ],
  failure: null,
  totalDurationS: 1820,
  crossChecked: false,
  toleranceK: 0.1,
  warnings: [],
};

export const bathResult: PlanResult = {
  ...airResult,
  planName: 'Pin 40 mm, air then bath',
  stages: [
    airResult.stages[0],
    stageFixture({ index: 1, name: 'Bath', method: 'finite-volume', startTimeS: 20, durationS: 95, heatRemovedJ: 3_200_000, maxSurfaceCoolingRateKPerS: 42, maxCentreSurfaceDifferenceK: 310, timeS: [20, 60, 115], centreK: [1100, 700, 373.15], surfaceK: [1096, 420, 340], meanK: [1098, 560, 360] }),
  ],
  totalDurationS: 115,
};
