// @vitest-environment jsdom
// The warning list from the hand-built shaft result (test/components/fixtures/quenchedShaftResult.ts).
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { WarningList } from '@/features/warnings/WarningList';
import { warningGroups } from '@/features/warnings/warningGroups';
import { quenchedShaftResult, quietShaftResult } from './fixtures/quenchedShaftResult';

afterEach(cleanup);

describe('warningGroups', () => {
  it('lists the whole plan first, then stages; a warning on both plan and stage once; most serious first', () => {
    const groups = warningGroups(quenchedShaftResult);
    expect(groups.map((g) => g.title)).toEqual(['Whole plan', 'Stage 2: oil quench']);
    expect(groups[1].warnings.map((w) => `${w.severity}:${w.ruleId}`)).toEqual(['warning:constant-h-in-boiling-range', 'info:one-term-error']);
    expect(groups.flatMap((g) => g.warnings).length).toBe(3);
  });
});

describe('WarningList', () => {
  it('groups by stage with a severity word on every item', () => {
    render(<WarningList result={quenchedShaftResult} />);
    expect(screen.getByRole('heading', { name: 'Checks (3 raised)' })).toBeTruthy();
    const stageGroup = screen.getByRole('group', { name: 'Stage 2: oil quench' });
    const summaries = within(stageGroup).getAllByRole('listitem').map((li) => li.querySelector('summary')?.textContent);
    expect(summaries).toEqual([
      '▲Warning: A constant h = 1500 W/m²K is used in a liquid bath while the surface passes from 845.9 °C down to 112.4 °C, through the boiling range.',
      '●Note: A one-term hand calculation would be off by up to 0.042 K at the centre, 0.118 K at the surface and 0.031 K in the mean.',
    ]);
    expect(within(screen.getByRole('group', { name: 'Whole plan' })).getByText('Caution:')).toBeTruthy();
  });

  it('opens to the rule, the advice and the numbers', () => {
    render(<WarningList result={quenchedShaftResult} />);
    const summary = screen.getByText(/A constant h = 1500/).closest('summary')!;
    const details = summary.parentElement as HTMLDetailsElement;
    expect(details.open).toBe(false);
    fireEvent.click(summary);
    expect(details.open).toBe(true);
    expect(within(details).getByText('Give the bath an h table against surface temperature (a boiling curve).')).toBeTruthy();
    expect(within(details).getByText('hWPerM2K = 1500; surfaceHighK = 1119; mediumK = 333.1')).toBeTruthy();
  });

  it('says no rule was tripped when there is nothing to show', () => {
    render(<WarningList result={quietShaftResult} />);
    expect(screen.getByText('No validity rule was tripped for this plan.')).toBeTruthy();
    expect(screen.queryAllByRole('listitem')).toHaveLength(0);
  });

  it('shows a stage that could not be computed as an alert', () => {
    const failed = { ...quietShaftResult, failure: { index: 2, name: 'air hold', code: 'target-unreachable', message: 'The axis cannot reach 20 °C in air at 25 °C.' } };
    render(<WarningList result={failed} showSafetyNote={false} />);
    expect(screen.getByRole('alert').textContent).toBe('■ Not computed: stage 3 (air hold): The axis cannot reach 20 °C in air at 25 °C. Later stages were not run.');
    expect(screen.queryByText(/quench-oil fires/)).toBeNull();
  });

  it('carries the safety note by default', () => {
    render(<WarningList result={quietShaftResult} />);
    expect(screen.getByText(/quench-oil fires and steam/)).toBeTruthy();
  });
});
