// Layout settings shared by every chart view: fonts, margins, grid, legend under the plot.
import type { Layout, Legend } from 'plotly.js';

/** Room under the plot for tick labels and the axis title. */
const AXIS_TITLE_MARGIN_PX = 56;
/** Room under that for two rows of legend entries. */
const LEGEND_BELOW_PX = 44;

export const CHART_FONT_FAMILY = 'system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

/** Where the legend sits: under the plot (wide charts) or above it (small charts, where under it would meet the axis title). */
export type LegendPlace = 'below' | 'above';

export function chartLayoutBase(xTitle: string, yTitle: string, legendPlace: LegendPlace = 'below'): Partial<Layout> {
  return {
    font: { family: CHART_FONT_FAMILY, size: 12, color: '#222' },
    // Right margin room for the upright mode bar, so it never sits on a legend above the plot.
    margin: { t: 36, r: 40, b: legendPlace === 'below' ? AXIS_TITLE_MARGIN_PX + LEGEND_BELOW_PX : AXIS_TITLE_MARGIN_PX, l: 64 },
    modebar: { orientation: 'v' },
    paper_bgcolor: '#ffffff',
    plot_bgcolor: '#ffffff',
    hovermode: 'closest',
    // Below: pinned to the bottom of the chart box (not the plot), under a margin that holds the axis title,
    // so it never meets the title whatever the chart's height.
    legend:
      legendPlace === 'below'
        ? ({ orientation: 'h', x: 0, y: 0, yanchor: 'bottom', yref: 'container' } as Partial<Legend>)
        : { orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom' },
    xaxis: { title: { text: xTitle }, gridcolor: '#e3e3e3', zeroline: false, linecolor: '#999', showline: true, ticks: 'outside' },
    yaxis: { title: { text: yTitle }, gridcolor: '#e3e3e3', zeroline: false, linecolor: '#999', showline: true, ticks: 'outside' },
  };
}
