// @vitest-environment jsdom
// The stage sheet shows every stage, every warning, the comparison, assumptions and cautions.
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import { StageSheet } from '@/features/sheet/StageSheet';
import { STAGE_SHEET_CAUTIONS } from '@/library/cautions';
import type { EngineWarning } from '@/engine/validity/warning';
import { demoDocument } from '../unit/exchange/demoDocument';
import { airResult, bathResult } from '../unit/exchange/demoResult';

afterEach(cleanup);

const warning = (stageIndex: number | null, message: string): EngineWarning => ({ ruleId: 'test-rule', severity: 'caution', stageIndex, message, rule: 'a rule in words (common practice)', advice: 'do this', numbers: {} });

const mainResult = {
  ...airResult,
  warnings: [warning(null, 'Plan-level warning with 1.23 in it.')],
  stages: [{ ...airResult.stages[0], warnings: [warning(0, 'Transfer stage warning, Bi = 0.31.')] }, airResult.stages[1]],
};

function renderSheet(document = demoDocument) {
  return render(<StageSheet document={document} results={{ main: mainResult, v1: { ...bathResult, warnings: [warning(1, 'Bath variant warning.')] } }} unitSystem="si" chartSvg={'<svg xmlns="http://www.w3.org/2000/svg" data-testid="chart-svg"><path d="M0 0L10 10"/></svg>'} todayIso="2026-12-01" entryCautions={['Entry caution from the library.']} />);
}

describe('StageSheet', () => {
  it('title block: plan name, revision, date, prepared by; checked by left blank to sign', () => {
    renderSheet();
    expect(screen.getByTestId('sheet-plan-name').textContent).toContain('Pin 40 mm, air then hold');
    expect(screen.getByTestId('sheet-revision').textContent).toContain('B');
    expect(screen.getByTestId('sheet-date').textContent).toContain('2026-12-01');
    expect(screen.getByTestId('sheet-prepared-by').textContent).toContain('A. Example');
    expect(screen.getByTestId('sheet-checked-by').textContent).toBe('Checked by\u00a0');
  });

  it('part, material source and initial state', () => {
    renderSheet();
    const part = screen.getByTestId('sheet-part').textContent ?? '';
    expect(part).toContain('Long round bar, diameter 40');
    expect(part).toContain('Demo carbon steel');
    expect(part).toContain('Incropera 6th ed. Table A.1');
    expect(part).toContain('Uniform at 850.0 °C');
  });

  it('one row per stage with medium, end condition, results, method, both Biot numbers and Fo', () => {
    renderSheet();
    const row1 = screen.getByTestId('sheet-stage-1').textContent ?? '';
    expect(row1).toContain('Transfer');
    expect(row1).toContain('still air');
    expect(row1).toContain('radiation, emissivity 0.8');
    expect(row1).toContain('after 20 s');
    expect(row1).toContain('850.0 °C → 826.9 °C');
    expect(row1).toContain('lumped');
    const cells = within(screen.getByTestId('sheet-stage-1')).getAllByRole('cell').map((c) => c.textContent);
    expect(cells.slice(-3)).toEqual(['0.05', '0.1', '0.5']);
    const row2 = screen.getByTestId('sheet-stage-2').textContent ?? '';
    expect(row2).toContain('when centre reaches 600.0 °C');
    expect(row2).toContain('exact series');
  });

  it('the chart is inline SVG (vector on paper)', () => {
    renderSheet();
    expect(screen.getByTestId('sheet-chart').querySelector('svg path')?.getAttribute('d')).toBe('M0 0L10 10');
  });

  it('every warning of the plan and of the variants, the comparison, assumptions, every caution', () => {
    renderSheet();
    const warnings = screen.getByTestId('sheet-warnings').textContent ?? '';
    expect(warnings).toContain('Plan-level warning with 1.23 in it.');
    expect(warnings).toContain('stage 1 (Transfer): Transfer stage warning, Bi = 0.31.');
    expect(warnings).toContain('Variant “Bath instead of hold”');
    expect(warnings).toContain('Bath variant warning.');
    const comparison = screen.getByTestId('comparison-table');
    expect(within(comparison).getAllByRole('columnheader').map((h) => h.textContent)).toEqual(['Figure', 'Pin 40 mm, air then hold', 'Bath instead of hold']);
    expect(screen.getByTestId('sheet-assumptions').textContent).toContain('infinitely long');
    // The fixture result says it was not cross-checked (crossChecked: false).
    expect(screen.getByTestId('sheet-assumptions').textContent).toContain('not cross-checked by a second method');
    const cautions = screen.getByTestId('sheet-cautions').textContent ?? '';
    for (const c of STAGE_SHEET_CAUTIONS) expect(cautions).toContain(c.topic);
    expect(cautions).toContain('Entry caution from the library.');
  });

  it('no comparison without variants; a stage not computed says so', () => {
    renderSheet({ ...demoDocument, variants: [] });
    expect(screen.queryByTestId('comparison-table')).toBeNull();
    cleanup();
    render(<StageSheet document={demoDocument} results={{}} unitSystem="us" chartSvg={null} todayIso="2026-12-01" entryCautions={[]} />);
    expect(screen.getByTestId('sheet-stage-1').textContent).toContain('Not computed yet.');
    expect(screen.getByTestId('sheet-part').textContent).toContain('1562.0 °F');
  });
});

describe('StageSheet media sources', () => {
  it('names where each stage’s h comes from: library source, curve label, or user data', async () => {
    const { builtInMedium } = await import('@/library/builtInLibrary');
    const air = builtInMedium('still-air')!;
    const plan = structuredClone(demoDocument.main);
    plan.stages[0].medium.libraryId = 'still-air';
    render(<StageSheet document={{ ...demoDocument, main: plan, variants: [] }} results={{}} unitSystem="si" chartSvg={null} todayIso="2026-12-01" entryCautions={[]} />);
    const items = within(screen.getByTestId('sheet-media-sources')).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toEqual([`Stage 1 (still air), h: library “${air.name}”: ${air.hWPerM2K.source}`, 'Stage 2 (still air), h: as entered in the plan (user data)']);
  });
});

describe('sheetMediaSources', () => {
  it('stages with the same medium and source share one line, with runs of stage numbers', async () => {
    const { sheetMediaSources } = await import('@/features/sheet/sheetMediaSources');
    const plan = structuredClone(demoDocument.main);
    plan.stages = [0, 1, 2, 3, 4].map((i) => ({ ...plan.stages[0], medium: { ...plan.stages[0].medium, name: i === 3 ? 'oil' : 'air' } }));
    expect(sheetMediaSources(plan)).toEqual(['Stages 1–3, 5 (air), h: as entered in the plan (user data)', 'Stage 4 (oil), h: as entered in the plan (user data)']);
  });
});
