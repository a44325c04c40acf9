// The stage sheet screen (#/sheet): screen controls (back, paper, title block, print) above the
// paper-like sheet. Reads the store; draws the chart as SVG so the printed chart stays vector.
import { useEffect, useMemo, useState } from 'react';
import { useAppStore } from '@/state/useAppStore';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { EMPTY_SHEET_META, type PlanSheetMeta } from '@/schema/planDocument';
import { chartToSvgText } from '@/features/charts/chartToImage';
import { planOverlayFigure } from '@/features/variants/planOverlayFigure';
import { StageSheet } from './StageSheet';
import { sheetEntryCautions } from './sheetEntryCautions';

export type SheetPaper = 'a4' | 'letter';

const PAGE_RULES: Record<SheetPaper, string> = {
  a4: '@page { size: A4 portrait; margin: 14mm 12mm; }',
  letter: '@page { size: letter portrait; margin: 0.55in 0.5in; }',
};
/** Drawn at about the printed width (180 mm at 96 px/in) so the text in the SVG prints at its set size. */
const SHEET_CHART_SIZE = { widthPx: 680, heightPx: 400 };
const SHEET_CHART_BOTTOM_MARGIN_PX = 110;
/** Legend top, as a fraction of the plot height below the plot area. */
const SHEET_LEGEND_Y = -0.3;

const META_FIELDS: { key: keyof PlanSheetMeta; label: string; placeholder: string }[] = [
  { key: 'revision', label: 'Revision', placeholder: 'e.g. A' },
  { key: 'date', label: 'Date', placeholder: 'today' },
  { key: 'preparedBy', label: 'Prepared by', placeholder: 'name' },
  { key: 'checkedBy', label: 'Checked by', placeholder: 'left blank to sign' },
];

export function SheetPage() {
  const document = useAppStore((s) => s.document);
  const results = useAppStore((s) => s.results);
  const unitSystem = useAppStore((s) => s.unitSystem);
  const setSheetMeta = useAppStore((s) => s.setSheetMeta);
  const [paper, setPaper] = useState<SheetPaper>('a4');
  const [chart, setChart] = useState<{ svg: string; for: unknown } | null>(null);
  const main = results[MAIN_PLAN_ID];

  const figure = useMemo(() => {
    const f = planOverlayFigure(document, results, unitSystem);
    // On paper the legend sits well below the time axis title, with room for two rows of variants.
    return f && { ...f, layout: { ...f.layout, margin: { ...f.layout.margin, b: SHEET_CHART_BOTTOM_MARGIN_PX }, legend: { ...f.layout.legend, y: SHEET_LEGEND_Y } } };
  }, [results, document, unitSystem]);

  useEffect(() => {
    let current = true;
    if (figure) void chartToSvgText(figure, SHEET_CHART_SIZE).then((svg) => current && setChart({ svg, for: figure }));
    return () => {
      current = false;
    };
  }, [figure]);

  const chartSvg = chart && chart.for === figure ? chart.svg : null;
  const meta = document.sheet ?? EMPTY_SHEET_META;
  const todayIso = new Date().toISOString().slice(0, 10);
  const entryCautions = useMemo(() => sheetEntryCautions([document.main, ...document.variants.map((v) => v.plan)]), [document]);
  // A sheet is handed on: it waits for the full (cross-checked) pass of every plan, not the quick one.
  const planResults = [main, ...document.variants.map((v) => results[v.id])];
  const ready = Boolean(chartSvg) && planResults.every((r) => r?.crossChecked);

  return (
    <div className="cs-sheet-page" data-testid="sheet-page" data-ready={ready ? 'yes' : 'no'} data-paper={paper}>
      <style>{PAGE_RULES[paper]}</style>
      <div className="cs-screen-only cs-sheet-controls" role="toolbar" aria-label="Stage sheet">
        <a href="#/">← Back to the workbench</a>
        <label>
          Paper{' '}
          <select value={paper} onChange={(e) => setPaper(e.target.value as SheetPaper)} data-testid="sheet-paper">
            <option value="a4">A4 portrait</option>
            <option value="letter">US Letter portrait</option>
          </select>
        </label>
        {META_FIELDS.map((f) => (
          <label key={f.key}>
            {f.label}{' '}
            <input value={meta[f.key]} placeholder={f.placeholder} maxLength={f.key === 'revision' || f.key === 'date' ? 40 : 120} onChange={(e) => setSheetMeta({ [f.key]: e.target.value })} data-testid={`sheet-meta-${f.key}`} />
          </label>
        ))}
        <button type="button" onClick={() => window.print()} disabled={!ready}>
          Print or save as PDF
        </button>
        {!ready ? <span role="status">Waiting for the cross-checked results and the chart…</span> : null}
      </div>
      <StageSheet document={document} results={results} unitSystem={unitSystem} chartSvg={chartSvg} todayIso={todayIso} entryCautions={entryCautions} />
    </div>
  );
}
