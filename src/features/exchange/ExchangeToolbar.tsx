// The workbench's exchange tools: save and open plan files, share a link, export CSV, PNG and SVG,
// (the Variants and Stage sheet screens are in the shell's screen links). Results are read from the store, never computed here.
import { useEffect, useRef, useState, type ReactNode } from 'react';
import { useAppStore } from '@/state/useAppStore';
import { MAIN_PLAN_ID } from '@/state/connectEngine';
import { planFileToText } from '@/schema/planFileToText';
import { encodePlanLink } from '@/schema/planLink';
import type { PlanIssue } from '@/schema/parsePlan';
import { chartToPngDataUrl, chartToSvgText } from '@/features/charts/chartToImage';
import { planOverlayFigure } from '@/features/variants/planOverlayFigure';
import { csvFileName, planResultToCsv } from './planResultToCsv';
import { downloadBlob } from './downloadBlob';
import { safeFileName } from './safeFileName';
import { readPlanFile } from './readPlanFile';
import { PlanIssueList } from './PlanIssueList';
import { LinkOpenPrompt } from './LinkOpenPrompt';
import './ExchangeToolbar.css';

/** A plain "done" line goes away by itself after this long; problems and links stay until dismissed. */
const DONE_NOTICE_MS = 8000;

/** Exported chart size: wide enough for a slide, PNG at twice the pixels for print. */
const EXPORT_CHART = { widthPx: 1100, heightPx: 560, scale: 2 };

type Notice = { kind: 'done'; text: string } | { kind: 'issues'; title: string; issues: PlanIssue[] } | { kind: 'link'; url: string };

export function ExchangeToolbar() {
  const document = useAppStore((s) => s.document);
  const results = useAppStore((s) => s.results);
  const unitSystem = useAppStore((s) => s.unitSystem);
  const commitDocument = useAppStore((s) => s.commitDocument);
  const fileInput = useRef<HTMLInputElement>(null);
  const [notice, setNotice] = useState<Notice | null>(null);
  const [csvStage, setCsvStage] = useState('all');
  const main = results[MAIN_PLAN_ID];

  useEffect(() => {
    if (notice?.kind !== 'done') return;
    const timer = setTimeout(() => setNotice(null), DONE_NOTICE_MS);
    return () => clearTimeout(timer);
  }, [notice]);

  const save = () => {
    downloadBlob(safeFileName(document.main.name, 'coolstage.json'), new Blob([planFileToText(document, 'degC')], { type: 'application/json' }));
    setNotice({ kind: 'done', text: `Saved “${document.main.name}” with ${document.variants.length} variant(s).` });
  };

  const open = async (file: File | undefined) => {
    if (!file) return;
    const outcome = await readPlanFile(file);
    if (fileInput.current) fileInput.current.value = '';
    if (!outcome.ok) {
      setNotice({ kind: 'issues', title: `“${file.name}” could not be opened.`, issues: outcome.issues });
      return;
    }
    commitDocument(outcome.document);
    setNotice({ kind: 'done', text: `Opened “${outcome.document.main.name}” from ${file.name}${outcome.migratedFrom ? ` (a version-${outcome.migratedFrom} file, brought up to date)` : ''}. Undo brings back the previous plan.` });
  };

  const share = async () => {
    const link = await encodePlanLink(document);
    if (!link.ok) return setNotice({ kind: 'issues', title: 'No link was made.', issues: link.issues });
    const url = `${window.location.origin}${window.location.pathname}#${link.fragment}`;
    setNotice({ kind: 'link', url });
    await navigator.clipboard?.writeText(url).catch(() => undefined);
  };

  const exportCsv = () => {
    if (!main) return;
    const stageIndex = csvStage === 'all' ? undefined : Number(csvStage);
    const csv = planResultToCsv(main, { temperatureUnit: unitSystem === 'us' ? 'degF' : 'degC', stageIndex });
    downloadBlob(csvFileName(main, stageIndex), new Blob([csv], { type: 'text/csv' }));
  };

  const exportChart = async (format: 'png' | 'svg') => {
    const figure = planOverlayFigure(document, results, unitSystem);
    if (!figure) return;
    const name = safeFileName(document.main.name, format);
    if (format === 'svg') downloadBlob(name, new Blob([await chartToSvgText(figure, EXPORT_CHART)], { type: 'image/svg+xml' }));
    else downloadBlob(name, await (await fetch(await chartToPngDataUrl(figure, EXPORT_CHART))).blob());
  };

  const noResult = main ? undefined : 'Waiting for the engine’s results';
  let body: ReactNode = null;
  if (notice?.kind === 'done') body = <span role="status">{notice.text}</span>;
  if (notice?.kind === 'issues') body = <PlanIssueList title={notice.title} issues={notice.issues} />;
  if (notice?.kind === 'link')
    body = (
      <label className="cs-exchange-link">
        Link to this plan (copied if the browser allows):{' '}
        <input readOnly value={notice.url} data-testid="share-link-url" onFocus={(e) => e.currentTarget.select()} />
      </label>
    );

  return (
    <div className="cs-exchange">
      <div className="cs-exchange-buttons" role="toolbar" aria-label="Files, sharing and exports">
        <span>Plan file:</span>
        <button type="button" onClick={save} title="Save the plan and its variants as a .coolstage.json file">
          Save
        </button>
        <button type="button" onClick={() => fileInput.current?.click()} title="Open a plan file">
          Open…
        </button>
        <input ref={fileInput} type="file" accept=".json,application/json" hidden aria-label="Plan file to open" data-testid="open-file-input" onChange={(e) => void open(e.target.files?.[0])} />
        <button type="button" className="cs-exchange-gap" onClick={() => void share()} title="Make a link that carries the plan">
          Share link
        </button>
        <span className="cs-exchange-gap">Results:</span>
        <select value={csvStage} onChange={(e) => setCsvStage(e.target.value)} aria-label="CSV covers" data-testid="csv-scope">
          <option value="all">whole plan</option>
          {document.main.stages.map((s, i) => (
            <option key={i} value={i}>
              stage {i + 1}: {s.name}
            </option>
          ))}
        </select>
        <button type="button" onClick={exportCsv} disabled={!main} title={noResult ?? 'Temperatures at every reported point against time, as CSV'}>
          Export CSV
        </button>
        <span className="cs-exchange-gap">Chart:</span>
        <button type="button" onClick={() => void exportChart('png')} disabled={!main} title={noResult ?? 'The temperature chart as a PNG image'}>
          PNG
        </button>
        <button type="button" onClick={() => void exportChart('svg')} disabled={!main} title={noResult ?? 'The temperature chart as an SVG drawing'}>
          SVG
        </button>
      </div>
      {body ? (
        <div className="cs-exchange-notice" data-testid="exchange-notice">
          {body}
          <button type="button" onClick={() => setNotice(null)} aria-label="Dismiss">
            ×
          </button>
        </div>
      ) : null}
      <LinkOpenPrompt />
    </div>
  );
}
