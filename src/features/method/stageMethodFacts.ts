// What the method panel shows for one stage, as labelled lines of text: method and why, each method's verdict,
// both Biot numbers, Fo at the end, cross-check, energy error, one-term error and effort. Display wording only;
// every number comes from the stage result.
import type { MethodVerdict, PlanResult, StageResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatNumber } from '@/features/units/formatNumber';
import { biotText, DIMENSIONLESS_DIGITS, splitLengthLabel } from './biotText';
import { methodName } from './methodName';

export interface MethodFact {
  /** Stable key for lists and tests. */
  id: string;
  term: string;
  value: string;
  /** Longer wording, shown as a tooltip or second line. */
  detail?: string;
}

export interface VerdictLine {
  method: string;
  valid: boolean;
  /** The verdict in words, so it does not rest on an icon or a colour. */
  word: 'valid' | 'not valid';
  reason: string;
  used: boolean;
}

const FOURIER_DIGITS = { kind: 'significant', count: 3 } as const;
const ERROR_DIGITS = { kind: 'significant', count: 2 } as const;

export function verdictLines(stage: StageResult): VerdictLine[] {
  return stage.verdicts.map((v: MethodVerdict) => ({
    method: methodName(v.method),
    valid: v.valid,
    word: v.valid ? 'valid' : 'not valid',
    reason: v.reason,
    used: v.method === stage.method,
  }));
}

function effortText(effort: StageResult['effort']): string {
  const parts = [
    effort.terms !== undefined ? `${effort.terms} series terms` : null,
    effort.steps !== undefined ? `${effort.steps} time steps` : null,
    effort.cells !== undefined ? `${effort.cells} cells` : null,
  ].filter((p): p is string => p !== null);
  return parts.length > 0 ? parts.join(', ') : 'closed form (no steps or terms)';
}

/** crossChecked: false when the result came from a quick pass that skipped every cross-check. */
export function stageMethodFacts(stage: StageResult, points: PlanResult['points'], system: UnitSystem, crossChecked = true): MethodFact[] {
  const difference = (k: number) => formatQuantity('temperatureDifference', k, system);
  const lumped = biotText(stage.biot.lumped, system);
  const series = biotText(stage.biot.series, system);
  const seriesSymbol = splitLengthLabel(stage.biot.series.lengthLabel).symbol;
  const pointLabel = (id: 'centre' | 'surface' | 'mean') => points.find((p) => p.id === id)?.label ?? id;

  const facts: MethodFact[] = [
    { id: 'method', term: 'Method', value: `${methodName(stage.method)}${stage.forced ? ' (forced by the plan)' : ' (chosen automatically)'}`, detail: stage.methodReason },
    { id: 'biot-lumped', term: 'Biot number, lumped check', value: lumped.text, ...(lumped.title ? { detail: lumped.title } : {}) },
    { id: 'biot-series', term: 'Biot number, series length', value: series.text, ...(series.title ? { detail: series.title } : {}) },
    {
      id: 'biot-inputs',
      term: 'Built on',
      value: `h = ${formatQuantity('heatTransferCoefficient', stage.biot.hWPerM2K, system)}, k = ${formatQuantity('conductivity', stage.biot.conductivityWPerMK, system)}`,
    },
    { id: 'fourier', term: 'Fourier number at the end', value: `Fo (${seriesSymbol}) = ${formatNumber(stage.fourierEnd, FOURIER_DIGITS)}` },
    {
      id: 'cross-check',
      term: 'Cross-check',
      value: stage.crossCheck
        ? `${methodName(stage.crossCheck.method)}${stage.crossCheck.refined ? ' (re-run at a tenth of the tolerance)' : ''}: largest difference ${difference(stage.crossCheck.maxDifferenceK)}, ${stage.crossCheck.maxDifferenceK <= stage.crossCheck.toleranceK ? 'within' : 'OUTSIDE'} the tolerance of ${difference(stage.crossCheck.toleranceK)}`
        : crossChecked
          ? 'none for this stage'
          : 'skipped in the quick pass; the full run checks it',
    },
    {
      id: 'energy',
      term: 'Energy balance error',
      value: stage.energyRelativeError === null ? 'not computed by this method' : `${formatNumber(stage.energyRelativeError, ERROR_DIGITS)} (relative)`,
    },
    {
      id: 'one-term',
      term: 'One-term approximation error',
      value: stage.oneTermErrorK
        ? `${pointLabel('centre')} ${difference(stage.oneTermErrorK.centre)}, ${pointLabel('surface')} ${difference(stage.oneTermErrorK.surface)}, ${pointLabel('mean')} ${difference(stage.oneTermErrorK.mean)} (from Fo = ${formatNumber(stage.oneTermErrorK.fromFo, DIMENSIONLESS_DIGITS)})`
        : 'not reported for this method',
    },
    { id: 'max-rate', term: 'Largest surface cooling rate', value: formatQuantity('coolingRate', stage.maxSurfaceCoolingRateKPerS, system) },
    ...(stage.method === 'lumped'
      ? [{ id: 'max-spread', term: 'Largest centre–surface difference', value: 'not resolved: lumped capacitance holds the part at one temperature', detail: 'see the method reason and the cross-check for the spread it leaves out' }]
      : [
          { id: 'max-spread', term: 'Largest centre–surface difference', value: difference(stage.maxCentreSurfaceDifferenceK) },
          { id: 'max-point-spread', term: 'Largest spread between reported points', value: difference(stage.maxPointSpreadK), detail: 'mean excluded; an indicator of distortion and cracking risk' },
        ]),
    { id: 'effort', term: 'Effort', value: effortText(stage.effort) },
  ];
  return facts;
}
