// One stage in the chain: what it does (medium, its temperature, h, end condition) and what the
// engine found (duration, method). State is told in words, never by colour alone.
import type { Stage } from '@/schema/planSchema';
import type { StageResult, FailedStage } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { describeEndCondition } from './describeEndCondition';
import { METHOD_LABELS } from './methodLabels';

export interface StageBlockProps {
  index: number;
  stage: Stage;
  result: StageResult | null;
  failed: FailedStage | null;
  notRun: boolean;
  system: UnitSystem;
}

export function StageBlock({ index, stage, result, failed, notRun, system }: StageBlockProps) {
  const { medium } = stage;
  const warningCount = result?.warnings.filter((w) => w.severity !== 'info').length ?? 0;
  return (
    <div className="stage-block-body">
      <div className="stage-title">
        <span className="stage-number">{index + 1}</span> {stage.name}
      </div>
      <div>
        {medium.name}, {formatQuantity('temperature', medium.temperature, system)}
      </div>
      <div>h {medium.heatTransfer.kind === 'constant' ? formatQuantity('heatTransferCoefficient', medium.heatTransfer.hWPerM2K, system) : 'by boiling curve'}{medium.radiation ? ' + radiation' : ''}</div>
      <div>ends {describeEndCondition(stage.end, system)}</div>
      {failed ? (
        <div className="stage-failed" title={failed.message}>
          ✖ not computed (reason in the stage report)
        </div>
      ) : notRun ? (
        <div className="stage-muted">not run (an earlier stage failed)</div>
      ) : result ? (
        <>
          <div className="stage-duration">
            takes <strong>{formatQuantity('duration', result.durationS, system)}</strong>
          </div>
          <div>
            {METHOD_LABELS[result.method]}
            {result.forced ? ' (chosen by you)' : ''}
          </div>
          {warningCount > 0 && <div className="stage-warn">⚠ {warningCount} warning{warningCount === 1 ? '' : 's'}</div>}
        </>
      ) : (
        <div className="stage-muted">computing…</div>
      )}
    </div>
  );
}
