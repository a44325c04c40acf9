// @vitest-environment jsdom
// Opening files and links from the toolbar: a bad one names its fields and changes nothing;
// a good link asks before it replaces the plan.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { createAppStore } from '@/state/createAppStore';
import { AppStoreProvider } from '@/state/AppStoreProvider';
import { planFileToText } from '@/schema/planFileToText';
import { encodePlanLink } from '@/schema/planLink';
import { MAX_PLAN_BYTES } from '@/schema/parsePlan';
import { demoDocument, demoPlanK } from '../unit/exchange/demoDocument';

vi.mock('plotly-impl', () => ({ default: {} }));
const { ExchangeToolbar } = await import('@/features/exchange/ExchangeToolbar');

afterEach(() => {
  cleanup();
  window.history.replaceState(null, '', '/');
});

function setup() {
  const store = createAppStore({ document: { main: demoPlanK, variants: [] }, nowMs: () => 0 });
  const before = store.getState().document;
  render(
    <AppStoreProvider store={store}>
      <ExchangeToolbar />
    </AppStoreProvider>,
  );
  return { store, before };
}

const fileOf = (text: string, name = 'plan.coolstage.json') => new File([text], name, { type: 'application/json' });

async function openFile(file: File) {
  fireEvent.change(screen.getByTestId('open-file-input'), { target: { files: [file] } });
}

describe('opening files', () => {
  it.each([
    ['malformed', '{"format": "coolstage-plan",, }', /\(file\): not valid JSON/],
    ['truncated', planFileToText(demoDocument).slice(0, 300), /may be truncated/],
    ['wrong version', planFileToText(demoDocument).replace('"version": 2', '"version": 7'), /version: this file is version 7/],
    ['bad field', planFileToText(demoDocument).replace('"radiusM": 0.02', '"radiusM": -0.02'), /main\.part\.shape\.radiusM: radiusM must be greater than zero/],
  ])('%s file: issues by field, document unchanged', async (_case, text, expected) => {
    const { store, before } = setup();
    await openFile(fileOf(text));
    const issues = await screen.findByTestId('exchange-issues');
    expect(issues.textContent).toMatch(expected);
    expect(issues.textContent).toContain('Nothing was changed.');
    expect(store.getState().document).toBe(before);
  });

  it('oversized file is refused without being read', async () => {
    const { store, before } = setup();
    const big = { name: 'big.json', size: MAX_PLAN_BYTES + 1, text: vi.fn(async () => '{}') } as unknown as File;
    fireEvent.change(screen.getByTestId('open-file-input'), { target: { files: [big] } });
    expect((await screen.findByTestId('exchange-issues')).textContent).toMatch(/at most 2 MB/);
    expect((big.text as unknown as { mock: { calls: unknown[] } }).mock.calls).toHaveLength(0);
    expect(store.getState().document).toBe(before);
  });

  it('a good file replaces the document, variants and sheet included, and can be undone', async () => {
    const { store, before } = setup();
    await openFile(fileOf(planFileToText(demoDocument)));
    await waitFor(() => expect(store.getState().document).toEqual(demoDocument));
    expect(screen.getByTestId('exchange-notice').textContent).toContain('Opened “Pin 40 mm, air then hold”');
    store.getState().undo();
    expect(store.getState().document).toBe(before);
  });
});

describe('opening links', () => {
  it('a tampered link is refused with its reason and changes nothing', async () => {
    window.history.replaceState(null, '', '/#plan=AAAA$$$');
    const { store, before } = setup();
    expect((await screen.findByTestId('link-refused')).textContent).toMatch(/altered or cut/);
    expect(store.getState().document).toBe(before);
  });

  it('a good link asks first; keeping the current plan changes nothing, opening replaces it', async () => {
    const link = await encodePlanLink(demoDocument);
    if (!link.ok) throw new Error('encode failed');
    window.history.replaceState(null, '', `/#${link.fragment}`);
    const { store, before } = setup();
    const prompt = await screen.findByTestId('link-prompt');
    expect(prompt.textContent).toContain('“Pin 40 mm, air then hold” with 2 stages and 1 variant');
    fireEvent.click(screen.getByRole('button', { name: 'Keep the current plan' }));
    expect(store.getState().document).toBe(before);
    expect(window.location.hash).toBe('#/');

    window.history.replaceState(null, '', `/#${link.fragment}`);
    window.dispatchEvent(new HashChangeEvent('hashchange'));
    fireEvent.click(await screen.findByRole('button', { name: 'Open the linked plan' }));
    expect(store.getState().document).toEqual(demoDocument);
  });
});
