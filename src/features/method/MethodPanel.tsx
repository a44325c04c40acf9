// The selected stage's method: which was used and why, every method's verdict, the dimensionless numbers,
// the cross-check and the accuracy figures. Props in, markup out.
import type { PlanResult, StageResult } from '@/engine/plan/planResult';
import type { UnitSystem } from '@/features/units/unitSystem';
import { stageMethodFacts, verdictLines } from './stageMethodFacts';
import './MethodPanel.css';

export interface MethodPanelProps {
  stage: StageResult;
  points: PlanResult['points'];
  system: UnitSystem;
  /** PlanResult.crossChecked: false for a quick pass without cross-checks. */
  crossChecked?: boolean;
}

export function MethodPanel({ stage, points, system, crossChecked = true }: MethodPanelProps) {
  const facts = stageMethodFacts(stage, points, system, crossChecked);
  const [method, ...numbers] = facts;
  return (
    <section className="method-panel" aria-labelledby={`method-panel-title-${stage.index}`}>
      <h3 id={`method-panel-title-${stage.index}`} className="method-panel__title">
        Method for stage {stage.index + 1}: {stage.name}
      </h3>
      <p className="method-panel__method">
        <strong>{method.value}</strong>
      </p>
      <p className="method-panel__reason">{method.detail}</p>
      <h4 className="method-panel__subtitle">Verdicts</h4>
      <ul className="method-panel__verdicts">
        {verdictLines(stage).map((v) => (
          <li key={v.method} className={v.valid ? 'method-panel__verdict is-valid' : 'method-panel__verdict is-invalid'}>
            <span className="method-panel__verdict-mark" aria-hidden="true">
              {v.valid ? '✓' : '✗'}
            </span>
            <span className="method-panel__verdict-method">{v.method}</span>
            <span className="method-panel__verdict-word">{v.word}</span>
            {v.used && <span className="method-panel__used">used</span>}
            <span className="method-panel__verdict-reason">{v.reason}</span>
          </li>
        ))}
      </ul>
      <dl className="method-panel__facts">
        {numbers.map((f) => (
          <div key={f.id} className="method-panel__fact" data-fact={f.id}>
            <dt>{f.term}</dt>
            <dd title={f.detail}>{f.value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
