// @vitest-environment jsdom
// Chart export with plotly mocked: the figure goes to Plotly.toImage with the asked size, and the SVG data URL
// (URI-encoded or base64, both of which plotly may return) comes back as SVG text.
import { afterEach, describe, expect, it, vi } from 'vitest';

const SVG = '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="5"><text>850 °C</text></svg>';
const plotly = vi.hoisted(() => ({ toImage: vi.fn() }));
vi.mock('plotly-impl', () => ({ default: plotly }));

const { chartToPngDataUrl, chartToSvgText } = await import('@/features/charts/chartToImage');
const figure = { data: [{ type: 'scatter' as const, x: [0], y: [1] }], layout: {} };

afterEach(() => plotly.toImage.mockReset());

describe('chartToImage', () => {
  it('decodes a URI-encoded SVG data URL', async () => {
    plotly.toImage.mockResolvedValueOnce(`data:image/svg+xml,${encodeURIComponent(SVG)}`);
    expect(await chartToSvgText(figure, { widthPx: 800, heightPx: 400 })).toBe(SVG);
    expect(plotly.toImage).toHaveBeenCalledWith({ data: figure.data, layout: figure.layout }, { format: 'svg', width: 800, height: 400 });
  });
  it('decodes a base64 SVG data URL', async () => {
    const bytes = new TextEncoder().encode(SVG);
    const base64 = btoa(String.fromCharCode(...bytes));
    plotly.toImage.mockResolvedValueOnce(`data:image/svg+xml;base64,${base64}`);
    expect(await chartToSvgText(figure, { widthPx: 10, heightPx: 5 })).toBe(SVG);
  });
  it('asks for PNG at the given scale', async () => {
    plotly.toImage.mockResolvedValueOnce('data:image/png;base64,AAAA');
    expect(await chartToPngDataUrl(figure, { widthPx: 1200, heightPx: 600, scale: 2 })).toBe('data:image/png;base64,AAAA');
    expect(plotly.toImage).toHaveBeenCalledWith({ data: figure.data, layout: figure.layout }, { format: 'png', width: 1200, height: 600, scale: 2 });
  });
});
