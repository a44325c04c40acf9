// Every warning of a plan result, grouped by stage: severity by shape and word, the message with its numbers,
// and, on opening, the rule behind it and what to do. Native details/summary, so each item is reachable and
// opened from the keyboard. Props in, markup out.
import type { PlanResult } from '@/engine/plan/planResult';
import { formatNumber } from '@/features/units/formatNumber';
import { severityMark } from './severityMark';
import { warningGroups } from './warningGroups';
import './WarningList.css';

export interface WarningListProps {
  result: PlanResult;
  /** Show the standing note on hot parts, oil fires and steam (on by default). */
  showSafetyNote?: boolean;
}

const NUMBER_DIGITS = { kind: 'significant', count: 4 } as const;

export function WarningList({ result, showSafetyNote = true }: WarningListProps) {
  const groups = warningGroups(result);
  const count = groups.reduce((n, g) => n + g.warnings.length, 0);
  return (
    <section className="warning-list" aria-labelledby="warning-list-title">
      <h3 id="warning-list-title" className="warning-list__title">
        Checks {count > 0 ? `(${count} raised)` : ''}
      </h3>
      {result.failure && (
        <p className="warning-list__failure" role="alert">
          <span aria-hidden="true">■ </span>
          <strong>Not computed:</strong> stage {result.failure.index + 1} ({result.failure.name}): {result.failure.message} Later stages were not run.
        </p>
      )}
      {count === 0 ? (
        <p className="warning-list__empty">No validity rule was tripped for this plan.</p>
      ) : (
        groups.map((group) => (
          <div key={group.key} className="warning-list__group" role="group" aria-labelledby={`warning-group-${group.key}`}>
            <h4 id={`warning-group-${group.key}`} className="warning-list__group-title">
              {group.title}
            </h4>
            <ul className="warning-list__items">
              {group.warnings.map((w, i) => {
                const mark = severityMark(w.severity);
                return (
                  <li key={`${w.ruleId}-${i}`} className={`warning-list__item severity-${w.severity}`}>
                    <details>
                      <summary>
                        <span className="warning-list__icon" aria-hidden="true">
                          {mark.icon}
                        </span>
                        <span className="warning-list__severity">{mark.word}:</span> <span className="warning-list__message">{w.message}</span>
                      </summary>
                      <dl className="warning-list__detail">
                        <dt>Rule</dt>
                        <dd>{w.rule}</dd>
                        <dt>What to do</dt>
                        <dd>{w.advice}</dd>
                        {Object.keys(w.numbers).length > 0 && (
                          <>
                            <dt>Numbers</dt>
                            <dd className="warning-list__numbers">
                              {Object.entries(w.numbers)
                                .map(([name, value]) => `${name} = ${formatNumber(value, NUMBER_DIGITS)}`)
                                .join('; ')}
                            </dd>
                          </>
                        )}
                        <dt>Rule id</dt>
                        <dd>
                          <code>{w.ruleId}</code>
                        </dd>
                      </dl>
                    </details>
                  </li>
                );
              })}
            </ul>
          </div>
        ))
      )}
      {showSafetyNote && (
        <p className="warning-list__safety">
          Results plan temperatures only. Hot parts, quench-oil fires and steam from water quenching are real hazards: follow
          your site’s procedures, local codes and qualified heat-treatment practice.
        </p>
      )}
    </section>
  );
}
