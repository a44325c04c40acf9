// Variants side by side: make copies of the main plan, swap a stage's medium, rename, remove or
// promote them; the comparison table and the overlaid curves below come from the engine's results.
import { useMemo, useState } from 'react';
import { useAppStore } from '@/state/useAppStore';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { BUILT_IN_MEDIA, builtInMedium } from '@/library/builtInLibrary';
import { MAX_VARIANTS } from '@/schema/planFileSchema';
import type { PlanVariant } from '@/schema/planDocument';
import { PlotlyChart } from '@/features/charts/PlotlyChart';
import { QuantityField } from '@/features/part/QuantityField';
import type { EndCondition } from '@/schema/planSchema';
import { compareVariants } from './compareVariants';
import { ComparisonTable } from './ComparisonTable';
import { planOverlayFigure } from './planOverlayFigure';
import { swapStageMedium } from './swapStageMedium';
import './VariantsScreen.css';

const CUSTOM_MEDIUM = '';
/** The schema's upper limit on a stage duration. */
const MAX_STAGE_DURATION_S = 1e8;
const POINT_WORDS: Record<string, string> = { centre: 'centre', surface: 'surface', mean: 'mean', depth: 'depth' };

/** The one number of a stage's end condition: its duration, or the temperature its point must reach. */
function EndField({ end, label, onChange }: { end: EndCondition; label: string; onChange: (end: EndCondition) => void }) {
  const unitSystem = useAppStore((s) => s.unitSystem);
  if (end.kind === 'duration') {
    return (
      <QuantityField
        label={`${label}: duration`}
        kind="duration"
        valueSI={end.seconds}
        system={unitSystem}
        check={(s) => (s > 0 && s < MAX_STAGE_DURATION_S ? null : `must be above 0 and below ${MAX_STAGE_DURATION_S} s`)}
        onCommit={(seconds) => {
          onChange({ ...end, seconds });
          return null;
        }}
      />
    );
  }
  return (
    <QuantityField
      label={`${label}: ${POINT_WORDS[end.point] ?? end.point} reaches`}
      kind="temperature"
      valueSI={end.temperature}
      system={unitSystem}
      check={(k) => (k > 0 ? null : 'must be above absolute zero')}
      onCommit={(temperature) => {
        onChange({ ...end, temperature });
        return null;
      }}
    />
  );
}

function VariantCard({ variant }: { variant: PlanVariant }) {
  const renameVariant = useAppStore((s) => s.renameVariant);
  const removeVariant = useAppStore((s) => s.removeVariant);
  const promoteVariant = useAppStore((s) => s.promoteVariant);
  const addVariant = useAppStore((s) => s.addVariant);
  const editVariant = useAppStore((s) => s.editVariant);
  const [name, setName] = useState(variant.name);
  const [message, setMessage] = useState<string | null>(null);
  const commitName = () => {
    const next = name.trim();
    if (next === '' || next.length > 120) {
      setMessage('Variant name: must be 1 to 120 characters; the old name is kept.');
      setName(variant.name);
      return;
    }
    setMessage(null);
    if (next !== variant.name) renameVariant(variant.id, next);
  };
  return (
    <section className="cs-variant-card" data-testid={`variant-${variant.id}`} aria-label={`Variant ${variant.name}`}>
      <div className="cs-variant-head">
        <label>
          Name <input type="text" value={name} onChange={(e) => setName(e.target.value)} onBlur={commitName} onKeyDown={(e) => e.key === 'Enter' && commitName()} data-testid="variant-name" />
        </label>
        <button type="button" onClick={() => addVariant(variant.id)} title="Copy this variant into a new one">
          Copy
        </button>
        <button type="button" onClick={() => promoteVariant(variant.id)} title="Make this the main plan to edit everything in it; the current main plan is kept as a variant">
          Make main plan
        </button>
        <button type="button" onClick={() => removeVariant(variant.id)}>
          Remove
        </button>
      </div>
      <table className="cs-variant-stages">
        <thead>
          <tr>
            <th scope="col">#</th>
            <th scope="col">Stage</th>
            <th scope="col">Medium</th>
            <th scope="col">Ends</th>
          </tr>
        </thead>
        <tbody>
          {variant.plan.stages.map((stage, i) => {
            const libraryId = stage.medium.libraryId && builtInMedium(stage.medium.libraryId) ? stage.medium.libraryId : CUSTOM_MEDIUM;
            return (
              <tr key={i}>
                <td>{i + 1}</td>
                <td>{stage.name}</td>
                <td>
                  <select
                    aria-label={`Medium of stage ${i + 1} in ${variant.name}`}
                    data-testid={`variant-medium-${i + 1}`}
                    value={libraryId}
                    onChange={(e) => {
                      const entry = builtInMedium(e.target.value);
                      if (!entry) return;
                      const out = swapStageMedium(variant.plan, i, entry);
                      if (!out.ok) return setMessage(`Stage ${i + 1} medium: ${out.message}`);
                      setMessage(null);
                      editVariant(variant.id, () => out.plan);
                    }}
                  >
                    {libraryId === CUSTOM_MEDIUM ? <option value={CUSTOM_MEDIUM}>{stage.medium.name} (as set in the plan)</option> : null}
                    {BUILT_IN_MEDIA.map((m) => (
                      <option key={m.id} value={m.id}>
                        {m.name}
                        {m.boilingCurve ? ' (boiling curve)' : ''}
                      </option>
                    ))}
                  </select>
                </td>
                <td>
                  <EndField
                    end={stage.end}
                    label={`Stage ${i + 1}`}
                    onChange={(end) => editVariant(variant.id, (p) => ({ ...p, stages: p.stages.map((s, j) => (j === i ? { ...s, end } : s)) }), `variant.${variant.id}.stage.${i}.end`)}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {message ? (
        <p role="alert" className="cs-variant-message">
          {message}
        </p>
      ) : null}
    </section>
  );
}

export function VariantsScreen() {
  const document = useAppStore((s) => s.document);
  const results = useAppStore((s) => s.results);
  const unitSystem = useAppStore((s) => s.unitSystem);
  const addVariant = useAppStore((s) => s.addVariant);
  const comparison = useMemo(
    () => compareVariants([{ id: MAIN_PLAN_ID, name: `${document.main.name} (main)`, result: results[MAIN_PLAN_ID] }, ...document.variants.map((v) => ({ id: v.id, name: v.name, result: results[v.id] }))]),
    [document, results],
  );
  const figure = useMemo(() => planOverlayFigure(document, results, unitSystem), [document, results, unitSystem]);
  const full = document.variants.length >= MAX_VARIANTS;

  return (
    <div className="cs-variants" data-testid="variants-screen">
      <div className="cs-variants-list">
        <h2>Variants of “{document.main.name}”</h2>
        <p>A variant starts as a copy of the main plan. Swap a stage’s medium or its end here; to change anything else, make it the main plan (the current main plan stays as a variant).</p>
        <button type="button" onClick={() => addVariant()} disabled={full} data-testid="add-variant">
          New variant from the main plan
        </button>
        {full ? <p role="status">At most {MAX_VARIANTS} variants.</p> : null}
        {document.variants.map((v) => (
          <VariantCard key={v.id} variant={v} />
        ))}
      </div>
      <div className="cs-variants-results">
        <h2>Compared</h2>
        <ComparisonTable comparison={comparison} unitSystem={unitSystem} />
        <h2>Curves</h2>
        <p className="cs-variants-note">Main plan: every reported point. Variants: centre and surface (centre only when there are more than two variants), drawn in their own dash and marker patterns and named in the legend.</p>
        {figure ? <PlotlyChart figure={figure} label={`Temperature against time, ${document.main.name} and its variants`} heightPx={460} /> : <p role="status">Waiting for the engine’s results…</p>}
      </div>
    </div>
  );
}
