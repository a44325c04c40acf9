// A chart as an image for export (sheets, downloads): SVG text or a PNG data URL, drawn off-screen
// by Plotly.toImage from the same figure the screen shows.
import type { ChartFigure } from './chartFigure';
import { loadPlotly } from './loadPlotly';

export interface ChartImageSize {
  widthPx: number;
  heightPx: number;
  /** PNG only: pixel scale (2 for print). */
  scale?: number;
}

const SVG_DATA_URL_PREFIX = /^data:image\/svg\+xml[^,]*,/;

/** PNG as a data URL ("data:image/png;base64,..."). */
export async function chartToPngDataUrl(figure: ChartFigure, size: ChartImageSize): Promise<string> {
  const plotly = await loadPlotly();
  return plotly.toImage({ data: figure.data, layout: figure.layout }, { format: 'png', width: size.widthPx, height: size.heightPx, scale: size.scale ?? 1 });
}

/** The SVG document text. */
export async function chartToSvgText(figure: ChartFigure, size: ChartImageSize): Promise<string> {
  const plotly = await loadPlotly();
  const url = await plotly.toImage({ data: figure.data, layout: figure.layout }, { format: 'svg', width: size.widthPx, height: size.heightPx });
  const body = url.replace(SVG_DATA_URL_PREFIX, '');
  if (!url.includes(';base64,')) return decodeURIComponent(body);
  // base64 carries UTF-8 bytes (e.g. the ° of axis titles): decode them as such, not as Latin-1.
  return new TextDecoder().decode(Uint8Array.from(atob(body), (c) => c.charCodeAt(0)));
}
