// @vitest-environment jsdom
// The library forms: a refused entry lists each field the library door named; a good one is handed on
// with the part's tables in degC and the stage's temperature in degC (t/°C = T/K - 273.15, BIPM SI
// Brochure, 9th ed.).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { MaterialEntryForm } from '@/features/library-editor/MaterialEntryForm';
import { MediumEntryForm } from '@/features/library-editor/MediumEntryForm';

afterEach(cleanup);

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;
const SPAN_K = { lowK: 298.15, highK: 1143.15 };

describe('MaterialEntryForm', () => {
  it('refuses an entry without a description and a taken id, naming both fields; saves nothing', () => {
    const onSave = vi.fn();
    render(<MaterialEntryForm material={plan.part.material} spanK={SPAN_K} takenIds={new Set(['my-plain-carbon-steel-about-0-2-c'])} onSave={onSave} />);
    fireEvent.click(screen.getByRole('button', { name: 'Save material to my library' }));
    const text = screen.getByRole('alert').textContent ?? '';
    expect(text).toMatch(/description/);
    expect(onSave).not.toHaveBeenCalled();
    fireEvent.change(screen.getByLabelText('Description'), { target: { value: 'bar stock' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save material to my library' }));
    expect(screen.getByRole('alert').textContent).toMatch(/id "my-plain-carbon-steel-about-0-2-c" is already taken/);
    expect(onSave).not.toHaveBeenCalled();
  });

  it('saves a described entry with the demo tables back in degC', () => {
    const onSave = vi.fn();
    render(<MaterialEntryForm material={plan.part.material} spanK={SPAN_K} takenIds={new Set()} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText('Description'), { target: { value: 'bar stock as delivered' } });
    fireEvent.change(screen.getByLabelText('Id (letters, digits, hyphens)'), { target: { value: 'shop-bar' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save material to my library' }));
    expect(screen.getByRole('status').textContent).toMatch(/Saved “Plain carbon steel/);
    const entry = onSave.mock.calls[0][0];
    expect(entry.id).toBe('shop-bar');
    expect(entry.specificHeatJPerKgK).toEqual(demoPlan.part.material.specificHeatJPerKgK.table);
  });
});

describe('MediumEntryForm', () => {
  it('saves the demo quench with its boiling curve and its bath at 25 °C', () => {
    const onSave = vi.fn();
    const stage = plan.stages[1];
    render(<MediumEntryForm medium={stage.medium} stageName={stage.name} system="si" takenIds={new Set()} onSave={onSave} />);
    fireEvent.change(screen.getByLabelText('Description'), { target: { value: 'our tank' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save medium to my library' }));
    const entry = onSave.mock.calls[0]?.[0];
    if (!entry) throw new Error(`not saved: ${screen.queryByRole('alert')?.textContent}`);
    expect(entry.temperatureC.suggested).toBeCloseTo(25, 9);
    expect(entry.boilingCurve.hWPerM2KBySurfaceC[0]).toEqual([25, 700]);
    expect(entry.cautions.length).toBeGreaterThan(0);
  });
});
