// Layout settings shared by every chart view: fonts, margins, grid, legend under the plot.
import type { Layout } from 'plotly.js';

export const CHART_FONT_FAMILY = 'system-ui, -apple-system, "Segoe UI", Roboto, sans-serif';

export function chartLayoutBase(xTitle: string, yTitle: string): Partial<Layout> {
  return {
    font: { family: CHART_FONT_FAMILY, size: 12, color: '#222' },
    margin: { t: 36, r: 16, b: 56, l: 64 },
    paper_bgcolor: '#ffffff',
    plot_bgcolor: '#ffffff',
    hovermode: 'closest',
    legend: { orientation: 'h', x: 0, y: -0.18, yanchor: 'top' },
    xaxis: { title: { text: xTitle }, gridcolor: '#e3e3e3', zeroline: false, linecolor: '#999', showline: true, ticks: 'outside' },
    yaxis: { title: { text: yTitle }, gridcolor: '#e3e3e3', zeroline: false, linecolor: '#999', showline: true, ticks: 'outside' },
  };
}
