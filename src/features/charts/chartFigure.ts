// What every chart view builds and the wrapper draws: plotly traces and layout, plain data.
import type { Data, Layout } from 'plotly.js';

export interface ChartFigure {
  data: Data[];
  layout: Partial<Layout>;
}
