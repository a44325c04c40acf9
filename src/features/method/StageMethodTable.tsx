// All stages at a glance: method, both Biot numbers, Fo, duration and the engine's largest surface rate.
// Props in, markup out; a stage name is a button when the caller can select stages.
import type { PlanResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatNumber } from '@/features/units/formatNumber';
import { displayUnit } from '@/features/units/quantityUnits';
import { DIMENSIONLESS_DIGITS, splitLengthLabel } from './biotText';
import { methodName } from './methodName';
import './MethodPanel.css';

export interface StageMethodTableProps {
  result: PlanResult;
  system: UnitSystem;
  selectedStageIndex?: number;
  onSelectStage?: (index: number) => void;
}

const FOURIER_DIGITS = { kind: 'significant', count: 3 } as const;

export function StageMethodTable({ result, system, selectedStageIndex, onSelectStage }: StageMethodTableProps) {
  const first = result.stages[0];
  const lumpedSymbol = first ? splitLengthLabel(first.biot.lumped.lengthLabel).symbol : 'Lc';
  const seriesSymbol = first ? splitLengthLabel(first.biot.series.lengthLabel).symbol : 'L';
  return (
    <table className="stage-method-table">
      <caption>Methods by stage</caption>
      <thead>
        <tr>
          <th scope="col">Stage</th>
          <th scope="col">Method</th>
          <th scope="col">Bi ({lumpedSymbol} = {formatQuantity('length', result.geometry.characteristicLengthM, system)})</th>
          <th scope="col">Bi ({seriesSymbol} = {formatQuantity('length', result.geometry.seriesLengthM, system)})</th>
          <th scope="col">Fo at end</th>
          <th scope="col">Duration</th>
          <th scope="col">Largest surface rate ({displayUnit('coolingRate', system).symbol})</th>
        </tr>
      </thead>
      <tbody>
        {result.stages.map((stage) => {
          const selected = stage.index === selectedStageIndex;
          const label = `${stage.index + 1} ${stage.name}`;
          return (
            <tr key={stage.index} className={selected ? 'is-selected' : undefined}>
              <th scope="row">
                {onSelectStage ? (
                  <button type="button" className="stage-method-table__select" aria-pressed={selected} onClick={() => onSelectStage(stage.index)}>
                    {label}
                  </button>
                ) : (
                  label
                )}
              </th>
              <td>
                {methodName(stage.method)}
                {stage.forced ? ' (forced)' : ''}
              </td>
              <td className="num">{formatNumber(stage.biot.lumped.value, DIMENSIONLESS_DIGITS)}</td>
              <td className="num">{formatNumber(stage.biot.series.value, DIMENSIONLESS_DIGITS)}</td>
              <td className="num">{formatNumber(stage.fourierEnd, FOURIER_DIGITS)}</td>
              <td className="num">{formatQuantity('duration', stage.durationS, system)}</td>
              <td className="num">{formatQuantity('coolingRate', stage.maxSurfaceCoolingRateKPerS, system, { bare: true })}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
