// @vitest-environment jsdom
// The variants screen edits variants only: a copy, a medium swap and an end change leave the main plan as it was.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { createAppStore } from '@/state/createAppStore';
import { AppStoreProvider } from '@/state/AppStoreProvider';
import { demoPlanK } from '../unit/exchange/demoDocument';
import { airResult, bathResult } from '../unit/exchange/demoResult';

vi.mock('plotly-impl', () => ({ default: { react: vi.fn(() => Promise.resolve()), purge: vi.fn() } }));
const { VariantsScreen } = await import('@/features/variants/VariantsScreen');

afterEach(cleanup);

function setup() {
  const store = createAppStore({ document: { main: demoPlanK, variants: [] }, nowMs: () => 0 });
  render(
    <AppStoreProvider store={store}>
      <VariantsScreen />
    </AppStoreProvider>,
  );
  return store;
}

describe('VariantsScreen', () => {
  it('copies the main plan, swaps a medium and changes an end in the variant only', () => {
    const store = setup();
    fireEvent.click(screen.getByTestId('add-variant'));
    const card = screen.getByTestId('variant-v1');
    fireEvent.change(within(card).getByTestId('variant-medium-2'), { target: { value: 'agitated-water' } });
    const end = within(card).getByLabelText(/Stage 2: centre reaches/);
    fireEvent.change(end, { target: { value: '100' } });
    const { main, variants } = store.getState().document;
    expect(main).toEqual(demoPlanK);
    expect(variants[0].plan.stages[1].medium.libraryId).toBe('agitated-water');
    expect(variants[0].plan.stages[1].end).toEqual({ kind: 'point-temperature', point: 'centre', temperature: 373.15 });
  });

  it('a bad end value names the field and changes nothing', () => {
    const store = setup();
    fireEvent.click(screen.getByTestId('add-variant'));
    const before = store.getState().document;
    fireEvent.change(within(screen.getByTestId('variant-v1')).getByLabelText(/Stage 1: duration/), { target: { value: '-5' } });
    expect(screen.getByText(/Stage 1: duration/, { selector: '.field-error' })).toBeTruthy();
    expect(store.getState().document).toBe(before);
  });

  it('shows the comparison from the results, pending where a plan has none yet', () => {
    const store = setup();
    fireEvent.click(screen.getByTestId('add-variant'));
    fireEvent.click(screen.getByTestId('add-variant'));
    act(() => store.setState({ results: { main: airResult, v1: bathResult } }));
    const table = screen.getByTestId('comparison-table');
    const total = within(table).getByRole('rowheader', { name: 'Total cycle time' }).parentElement!;
    expect([...total.children].map((c) => c.textContent)).toEqual(['Total cycle time', '30 min 20 s', '115 s', 'computing…']);
  });

  it('promote and remove act on the chosen variant', () => {
    const store = setup();
    fireEvent.click(screen.getByTestId('add-variant'));
    fireEvent.click(within(screen.getByTestId('variant-v1')).getByRole('button', { name: 'Make main plan' }));
    expect(store.getState().document.main.name).toBe('Variant 1');
    expect(store.getState().document.variants.map((v) => v.name)).toEqual([demoPlanK.name]);
    fireEvent.click(within(screen.getByTestId('variant-v2')).getByRole('button', { name: 'Remove' }));
    expect(store.getState().document.variants).toEqual([]);
  });
});
