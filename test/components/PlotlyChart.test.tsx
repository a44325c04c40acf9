// @vitest-environment jsdom
// The plotly wrapper with plotly mocked through the 'plotly-impl' alias: draws with react() once per
// figure, shows a status line until drawn, purges on unmount.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen, waitFor } from '@testing-library/react';

const plotly = vi.hoisted(() => ({ react: vi.fn(() => Promise.resolve()), purge: vi.fn() }));
vi.mock('plotly-impl', () => ({ default: plotly }));

const { PlotlyChart } = await import('@/features/charts/PlotlyChart');

afterEach(() => {
  cleanup();
  plotly.react.mockClear();
  plotly.purge.mockClear();
});

describe('PlotlyChart', () => {
  const figure = { data: [{ type: 'scatter' as const, x: [0, 1], y: [850, 600] }], layout: { title: { text: 't' } } };

  it('draws the figure with Plotly.react and hides the loading line', async () => {
    render(<PlotlyChart figure={figure} label="test chart" />);
    expect(screen.getByRole('status').textContent).toBe('Loading the chart…');
    await waitFor(() => expect(plotly.react).toHaveBeenCalledTimes(1));
    const [element, data, layout] = plotly.react.mock.calls[0] as unknown as [HTMLElement, unknown, unknown];
    expect(element.getAttribute('data-testid')).toBe('plot');
    expect(data).toBe(figure.data);
    expect(layout).toBe(figure.layout);
    await waitFor(() => expect(screen.queryByRole('status')).toBeNull());
    expect(screen.getByRole('figure', { name: 'test chart' })).toBeTruthy();
  });

  it('does not redraw when re-rendered with the same figure, and purges on unmount', async () => {
    const { rerender, unmount } = render(<PlotlyChart figure={figure} label="test chart" />);
    await waitFor(() => expect(plotly.react).toHaveBeenCalledTimes(1));
    rerender(<PlotlyChart figure={figure} label="test chart" />);
    await Promise.resolve();
    expect(plotly.react).toHaveBeenCalledTimes(1);
    unmount();
    expect(plotly.purge).toHaveBeenCalledTimes(1);
  });

  it('says so when plotly fails to draw', async () => {
    plotly.react.mockImplementationOnce(() => Promise.reject(new Error('no canvas')));
    render(<PlotlyChart figure={{ ...figure }} label="test chart" />);
    await waitFor(() => expect(screen.getByRole('status').textContent).toMatch(/could not be drawn/));
  });
});
