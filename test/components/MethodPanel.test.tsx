// @vitest-environment jsdom
// Method panel and stage table from the hand-built shaft result (test/components/fixtures/quenchedShaftResult.ts).
// Expected texts are worked by hand from the fixture numbers; unit factors per NIST SP 811 Appendix B (from memory).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { MethodPanel } from '@/features/method/MethodPanel';
import { StageMethodTable } from '@/features/method/StageMethodTable';
import { stageMethodFacts } from '@/features/method/stageMethodFacts';
import { quenchedShaftResult as result } from './fixtures/quenchedShaftResult';

afterEach(cleanup);

const fact = (id: string) => {
  const el = document.querySelector(`[data-fact="${id}"] dd`);
  if (!el) throw new Error(`no fact ${id}`);
  return el.textContent;
};

describe('MethodPanel', () => {
  it('shows the method, why, and each verdict in words', () => {
    render(<MethodPanel stage={result.stages[1]} points={result.points} system="si" />);
    expect(screen.getByRole('heading', { name: 'Method for stage 2: oil quench' })).toBeTruthy();
    expect(screen.getByText('Exact series (chosen automatically)')).toBeTruthy();
    expect(screen.getByText(/rules out lumped capacitance/)).toBeTruthy();
    const verdicts = screen.getAllByRole('listitem').map((li) => li.textContent);
    expect(verdicts).toEqual([
      '✗Lumped capacitancenot validBi (Lc) = 0.47 is not below 0.1',
      '✓Exact seriesvalidusedconstant h and constant properties',
      '✓Finite volumevalidalways applicable',
    ]);
  });

  it('labels both Biot numbers by their lengths, and Fo by the series length', () => {
    render(<MethodPanel stage={result.stages[1]} points={result.points} system="si" />);
    expect(fact('biot-lumped')).toBe('Bi (Lc = V/As = 12.5 mm) = 0.47');
    expect(fact('biot-series')).toBe('Bi (r0 = 25 mm) = 0.94');
    expect(fact('fourier')).toBe('Fo (r0) = 3.21');
    expect(fact('biot-inputs')).toBe('h = 1500 W/(m²·K), k = 40 W/(m·K)');
  });

  it('reports cross-check, energy error, one-term error and effort', () => {
    render(<MethodPanel stage={result.stages[1]} points={result.points} system="si" />);
    expect(fact('cross-check')).toBe('Finite volume: largest difference 0.0061 K, within the tolerance of 0.01 K');
    expect(fact('energy')).toBe('2.4e-9 (relative)');
    expect(fact('one-term')).toBe('axis 0.042 K, surface 0.118 K, volume mean 0.031 K (from Fo = 0.2)');
    expect(fact('effort')).toBe('38 series terms');
  });

  it('in US units shows lengths in inches and h in Btu (1500 W/m²K / 5.678263 = 264 Btu/(h·ft²·°F))', () => {
    render(<MethodPanel stage={result.stages[1]} points={result.points} system="us" />);
    expect(fact('biot-series')).toBe('Bi (r0 = 0.984 in) = 0.94');
    expect(fact('biot-inputs')).toBe('h = 264 Btu/(h·ft²·°F), k = 23.1 Btu/(h·ft·°F)');
    expect(fact('max-rate')).toBe('69.5 °F/s'); // 38.6 K/s × 1.8
  });

  it('says when a method was forced and when a figure is absent', () => {
    render(<MethodPanel stage={result.stages[2]} points={result.points} system="si" />);
    expect(screen.getByText('Finite volume (forced by the plan)')).toBeTruthy();
    expect(fact('cross-check')).toBe('none for this stage');
    expect(fact('one-term')).toBe('not reported for this method');
    expect(fact('effort')).toBe('240 time steps, 48 cells');
  });

  it('says a cross-check was skipped in a quick pass, and shows the spread between points', () => {
    render(<MethodPanel stage={{ ...result.stages[1], crossCheck: null }} points={result.points} system="si" crossChecked={false} />);
    expect(fact('cross-check')).toBe('skipped in the quick pass; the full run checks it');
    expect(fact('max-point-spread')).toBe('162 K');
  });
});

describe('stageMethodFacts', () => {
  it('marks a cross-check outside its tolerance in capitals', () => {
    const stage = { ...result.stages[0], crossCheck: { method: 'series' as const, refined: false, maxDifferenceK: 2.5, toleranceK: 0.5 } };
    const crossCheck = stageMethodFacts(stage, result.points, 'si').find((f) => f.id === 'cross-check');
    expect(crossCheck?.value).toBe('Exact series: largest difference 2.5 K, OUTSIDE the tolerance of 0.5 K');
  });

  it('does not show a lumped stage as having no centre-surface difference', () => {
    expect(result.stages[0].method).toBe('lumped');
    const facts = stageMethodFacts(result.stages[0], result.points, 'si');
    expect(facts.find((f) => f.id === 'max-spread')?.value).toMatch(/not resolved/);
    expect(facts.find((f) => f.id === 'max-point-spread')).toBeUndefined();
  });

  it('says when the cross-check was a re-run of the same method at a tenth of the tolerance', () => {
    const stage = { ...result.stages[0], crossCheck: { method: 'finite-volume' as const, refined: true, maxDifferenceK: 0.004, toleranceK: 0.02 } };
    const crossCheck = stageMethodFacts(stage, result.points, 'si').find((f) => f.id === 'cross-check');
    expect(crossCheck?.value).toMatch(/^Finite volume \(re-run at a tenth of the tolerance\): largest difference/i);
  });
});

describe('StageMethodTable', () => {
  it('lists every stage with method, both Bi, Fo, duration and the largest surface rate', () => {
    render(<StageMethodTable result={result} system="si" />);
    const table = screen.getByRole('table', { name: 'Methods by stage' });
    const headers = within(table).getAllByRole('columnheader').map((h) => h.textContent);
    expect(headers).toEqual(['Stage', 'Method', 'Bi (Lc = V/As = 12.5 mm)', 'Bi (r0 = 25 mm)', 'Fo at end', 'Duration', 'Largest surface rate (K/s)']);
    const rows = within(table).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent));
    expect(rows).toEqual([
      ['Lumped capacitance', '0.0078', '0.016', '0.352', '20 s', '0.21'],
      ['Exact series', '0.47', '0.94', '3.21', '3 min 03 s', '38.6'],
      ['Finite volume (forced)', '0.0031', '0.0063', '10.6', '10 min 00 s', '0.052'],
    ]);
  });
  it('selects a stage from the keyboard-reachable stage button', () => {
    const onSelect = vi.fn();
    render(<StageMethodTable result={result} system="si" selectedStageIndex={0} onSelectStage={onSelect} />);
    const button = screen.getByRole('button', { name: '3 air hold' });
    expect(button.getAttribute('aria-pressed')).toBe('false');
    fireEvent.click(button);
    expect(onSelect).toHaveBeenCalledWith(2);
  });
});
