// @vitest-environment jsdom
// The time-axis switch redraws the same result on a log time axis (plotly mocked through 'plotly-impl').
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { Layout } from 'plotly.js';
import { quenchedShaftResult as result } from './fixtures/quenchedShaftResult';

const plotly = vi.hoisted(() => ({ react: vi.fn(() => Promise.resolve()), purge: vi.fn() }));
vi.mock('plotly-impl', () => ({ default: plotly }));
const { TemperatureHistoryChart } = await import('@/features/charts/TemperatureHistoryChart');

afterEach(() => {
  cleanup();
  plotly.react.mockClear();
});

const lastLayout = () => (plotly.react.mock.calls.at(-1) as unknown as [HTMLElement, unknown, Partial<Layout>])[2];

describe('TemperatureHistoryChart', () => {
  it('starts where asked (linear) and switches to a log time axis', async () => {
    render(<TemperatureHistoryChart result={result} system="si" initialTimeAxis="linear" />);
    await waitFor(() => expect(plotly.react).toHaveBeenCalledTimes(1));
    expect(lastLayout().xaxis?.type).toBeUndefined();
    fireEvent.click(screen.getByRole('radio', { name: 'log' }));
    await waitFor(() => expect(plotly.react).toHaveBeenCalledTimes(2));
    expect(lastLayout().xaxis?.type).toBe('log');
    expect((lastLayout().xaxis?.title as { text: string }).text).toBe('Time (min, log scale)');
  });
  it('starts on the suggested axis: log for the fixture, whose 20 s transfer is 2.5 % of the plan', async () => {
    render(<TemperatureHistoryChart result={result} system="si" />);
    await waitFor(() => expect(plotly.react).toHaveBeenCalledTimes(1));
    expect(lastLayout().xaxis?.type).toBe('log');
    expect((screen.getByRole('radio', { name: 'log' }) as HTMLInputElement).checked).toBe(true);
  });
});
