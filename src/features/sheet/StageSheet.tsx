// The printable stage sheet: title block, part, start state, stage table, chart, comparison,
// warnings, assumptions and cautions. Props in, paper out; the page (SheetPage) gathers the props.
// Every number is read from the plan or from the engine's results.
import type { PlanDocument, PlanSheetMeta } from '@/schema/planDocument';
import type { PlanResult } from '@/engine/plan/planResult';
import type { EngineWarning } from '@/engine/validity/warning';
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatNumber } from '@/features/units/formatNumber';
import { SHAPE_DIMENSIONS, SHAPE_LABELS } from '@/features/part/shapeDimensions';
import { STAGE_SHEET_CAUTIONS } from '@/library/cautions';
import { compareVariants } from '@/features/variants/compareVariants';
import { ComparisonTable } from '@/features/variants/ComparisonTable';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { describeEndCondition, describeHeatTransfer } from './describeStage';
import { sheetAssumptions } from './sheetAssumptions';
import { sheetMediaSources } from './sheetMediaSources';
import './StageSheet.css';

export interface StageSheetProps {
  document: PlanDocument;
  results: Record<string, PlanResult>;
  unitSystem: UnitSystem;
  /** The whole-plan chart as SVG text (vector), or null while it is drawn. */
  chartSvg: string | null;
  /** Printed when the title block leaves the date empty. */
  todayIso: string;
  /** Extra cautions carried by the library entries the plan uses (material and media). */
  entryCautions: string[];
}

const METHOD_WORDS: Record<string, string> = { lumped: 'lumped', series: 'exact series', 'finite-volume': 'finite volume' };
const SEVERITY_WORDS: Record<EngineWarning['severity'], string> = { info: 'Note', caution: 'Caution', warning: 'Warning' };
const dimensionless = (x: number) => formatNumber(x, { kind: 'significant', count: 3 });

/** Plan-level and stage warnings, each once. */
function warningsOf(result: PlanResult | undefined): EngineWarning[] {
  if (!result) return [];
  const seen = new Set<string>();
  return [...result.warnings, ...result.stages.flatMap((s) => s.warnings)].filter((w) => {
    const key = `${w.ruleId}|${w.stageIndex}|${w.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function TitleBlock({ meta, planName, todayIso }: { meta: PlanSheetMeta; planName: string; todayIso: string }) {
  const field = (label: string, value: string, testId: string) => (
    <div className="cs-sheet-field" data-testid={testId}>
      <span className="cs-sheet-field-label">{label}</span>
      <span className={value ? 'cs-sheet-field-value' : 'cs-sheet-field-value cs-sheet-field-blank'}>{value || '\u00a0'}</span>
    </div>
  );
  return (
    <header className="cs-sheet-title">
      <h1>Cooling stage sheet</h1>
      <div className="cs-sheet-fields">
        {field('Plan', planName, 'sheet-plan-name')}
        {field('Revision', meta.revision, 'sheet-revision')}
        {field('Date', meta.date || todayIso, 'sheet-date')}
        {field('Prepared by', meta.preparedBy, 'sheet-prepared-by')}
        {field('Checked by', meta.checkedBy, 'sheet-checked-by')}
      </div>
    </header>
  );
}

function WarningList({ warnings, stageNames }: { warnings: EngineWarning[]; stageNames: string[] }) {
  if (warnings.length === 0) return <p>The engine raised no warnings for this plan.</p>;
  return (
    <ol className="cs-sheet-warnings">
      {warnings.map((w, i) => (
        <li key={i} className={`cs-sheet-warning cs-sheet-warning-${w.severity}`}>
          <strong>
            {SEVERITY_WORDS[w.severity]}
            {w.stageIndex === null ? ', whole plan' : `, stage ${w.stageIndex + 1} (${stageNames[w.stageIndex] ?? ''})`}:
          </strong>{' '}
          {w.message} <span className="cs-sheet-muted">Rule: {w.rule}</span> <span>What to do: {w.advice}</span>
        </li>
      ))}
    </ol>
  );
}

export function StageSheet({ document, results, unitSystem, chartSvg, todayIso, entryCautions }: StageSheetProps) {
  const plan = document.main;
  const result = results[MAIN_PLAN_ID];
  const meta = document.sheet ?? { revision: '', preparedBy: '', checkedBy: '', date: '' };
  const t = (k: number | undefined) => (k === undefined ? '—' : formatQuantity('temperature', k, unitSystem));
  const { shape, material } = plan.part;
  const sizes = SHAPE_DIMENSIONS[shape.kind].map((d) => `${d.label.toLowerCase()} ${formatQuantity('length', d.getM(shape), unitSystem)}`).join(', ');
  const stageNames = plan.stages.map((s) => s.name);
  const comparison =
    document.variants.length > 0
      ? compareVariants([{ id: MAIN_PLAN_ID, name: plan.name, result }, ...document.variants.map((v) => ({ id: v.id, name: v.name, result: results[v.id] }))])
      : null;

  return (
    <article className="cs-sheet" data-testid="stage-sheet">
      <TitleBlock meta={meta} planName={plan.name} todayIso={todayIso} />

      <section className="cs-sheet-section cs-sheet-keep" data-testid="sheet-part">
        <h2>Part and start</h2>
        <dl className="cs-sheet-facts">
          <dt>Shape</dt>
          <dd>
            {SHAPE_LABELS[shape.kind]}, {sizes}
          </dd>
          <dt>Material</dt>
          <dd>
            {material.name}. <span className="cs-sheet-muted">Data: {material.source}</span>
          </dd>
          <dt>Initial state</dt>
          <dd>Uniform at {t(plan.initialTemperature)}</dd>
          {result ? (
            <>
              <dt>Total cycle</dt>
              <dd>
                {formatQuantity('duration', result.totalDurationS, unitSystem)} over {result.stages.length} of {plan.stages.length} stages
              </dd>
            </>
          ) : null}
        </dl>
      </section>

      <section className="cs-sheet-section" data-testid="sheet-stages">
        <h2>Stages</h2>
        <table className="cs-sheet-table cs-sheet-stages">
          <thead>
            <tr>
              <th scope="col">#</th>
              <th scope="col">Stage and medium</th>
              <th scope="col">Heat transfer</th>
              <th scope="col">Ends</th>
              <th scope="col">Duration</th>
              <th scope="col">Centre start → end</th>
              <th scope="col">Surface start → end</th>
              <th scope="col">Method</th>
              <th scope="col" title="Biot number on V/A">Bi (V/A)</th>
              <th scope="col" title="Biot number on the series length">Bi (series)</th>
              <th scope="col" title="Fourier number at the end of the stage">Fo at end</th>
            </tr>
          </thead>
          <tbody>
            {plan.stages.map((stage, i) => {
              const r = result?.stages.find((s) => s.index === i);
              const failed = result?.failure?.index === i ? result.failure : null;
              return (
                <tr key={i} data-testid={`sheet-stage-${i + 1}`}>
                  <td>{i + 1}</td>
                  <td>
                    <strong>{stage.name}</strong>
                    <br />
                    <span className="cs-sheet-medium-name">{stage.medium.name}</span>
                    <br />
                    <span className="cs-nowrap">at {t(stage.medium.temperature)}</span>
                  </td>
                  <td>{describeHeatTransfer(stage.medium, unitSystem)}</td>
                  <td>{describeEndCondition(stage.end, unitSystem)}</td>
                  {r ? (
                    <>
                      <td className="cs-nowrap">{formatQuantity('duration', r.durationS, unitSystem)}</td>
                      <td>
                        <span className="cs-nowrap">{t(r.startK.centre)} →</span> <span className="cs-nowrap">{t(r.endK.centre)}</span>
                      </td>
                      <td>
                        <span className="cs-nowrap">{t(r.startK.surface)} →</span> <span className="cs-nowrap">{t(r.endK.surface)}</span>
                      </td>
                      <td>
                        {METHOD_WORDS[r.method] ?? r.method}
                        {r.forced ? ' (chosen by user)' : ''}
                      </td>
                      <td>{dimensionless(r.biot.lumped.value)}</td>
                      <td>{dimensionless(r.biot.series.value)}</td>
                      <td>{dimensionless(r.fourierEnd)}</td>
                    </>
                  ) : (
                    <td colSpan={7} className="cs-sheet-muted">
                      {failed ? `Not computed: ${failed.message}` : result ? 'Not computed (an earlier stage stopped the plan).' : 'Not computed yet.'}
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
        <h3>Where the heat transfer numbers come from</h3>
        <ul className="cs-sheet-notes" data-testid="sheet-media-sources">
          {sheetMediaSources(plan).map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
        {plan.stages.some((s) => s.note) ? (
          <>
            <h3>Stage notes</h3>
            <ul className="cs-sheet-notes">
              {plan.stages.map((s, i) => (s.note ? <li key={i}>Stage {i + 1} ({s.name}): {s.note}</li> : null))}
            </ul>
          </>
        ) : null}
      </section>

      <section className="cs-sheet-section cs-sheet-keep cs-sheet-chart" data-testid="sheet-chart">
        <h2>Temperatures over the whole plan</h2>
        {chartSvg ? <div className="cs-sheet-chart-image" role="img" aria-label={`Temperature against time for ${plan.name}`} dangerouslySetInnerHTML={{ __html: chartSvg }} /> : <p className="cs-sheet-muted">The chart is being drawn…</p>}
      </section>

      {comparison ? (
        <section className="cs-sheet-section cs-sheet-keep" data-testid="sheet-comparison">
          <h2>Variants compared</h2>
          <ComparisonTable comparison={comparison} unitSystem={unitSystem} />
        </section>
      ) : null}

      <section className="cs-sheet-section" data-testid="sheet-warnings">
        <h2>Warnings</h2>
        <WarningList warnings={warningsOf(result)} stageNames={stageNames} />
        {document.variants.map((v) => {
          const warnings = warningsOf(results[v.id]);
          return warnings.length ? (
            <div key={v.id} className="cs-sheet-keep">
              <h3>Variant “{v.name}”</h3>
              <WarningList warnings={warnings} stageNames={v.plan.stages.map((s) => s.name)} />
            </div>
          ) : null;
        })}
      </section>

      <section className="cs-sheet-section cs-sheet-keep" data-testid="sheet-assumptions">
        <h2>Assumptions</h2>
        <ul>
          {sheetAssumptions(plan, result).map((a) => (
            <li key={a}>{a}</li>
          ))}
        </ul>
      </section>

      <section className="cs-sheet-section cs-sheet-keep cs-sheet-cautions" data-testid="sheet-cautions">
        <h2>Safety cautions</h2>
        <ul>
          {STAGE_SHEET_CAUTIONS.map((c) => (
            <li key={c.id}>
              <strong>{c.topic}.</strong> {c.text}
            </li>
          ))}
          {entryCautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      <footer className="cs-sheet-footer">
        Planning estimate from Coolstage; check against the site's own procedures before use. Sheet for “{plan.name}”{meta.revision ? `, revision ${meta.revision}` : ''}.
      </footer>
    </article>
  );
}
