// How each reported point is drawn: colour, line dash and marker shape, so that traces stay apart in
// grey-scale print and for readers who do not tell the colours apart. Palette chosen for this app.
import type { PointId } from '@/schema/planSchema';

export interface TraceStyle {
  colour: string;
  dash: 'solid' | 'dash' | 'dot' | 'dashdot' | 'longdash' | 'longdashdot';
  marker: string;
}

const POINT_STYLES: Record<PointId, TraceStyle> = {
  centre: { colour: '#1d4f91', dash: 'solid', marker: 'circle' },
  surface: { colour: '#c4441b', dash: 'dash', marker: 'square' },
  mean: { colour: '#2f7d3a', dash: 'dot', marker: 'diamond' },
  depth: { colour: '#7a3b9c', dash: 'dashdot', marker: 'triangle-up' },
  'face-x': { colour: '#00808a', dash: 'longdash', marker: 'triangle-down' },
  'face-y': { colour: '#9a6a00', dash: 'longdashdot', marker: 'star' },
  'face-z': { colour: '#b0306a', dash: 'longdash', marker: 'pentagon' },
  edge: { colour: '#6b4a35', dash: 'dashdot', marker: 'hexagon' },
  corner: { colour: '#46525c', dash: 'dot', marker: 'cross' },
};

/** Extra series (plan variants) cycle through these, drawn thinner and in muted colours. */
const EXTRA_STYLES: TraceStyle[] = [
  { colour: '#6f6f6f', dash: 'dash', marker: 'circle-open' },
  { colour: '#8c6d9e', dash: 'dot', marker: 'square-open' },
  { colour: '#5f8c7a', dash: 'dashdot', marker: 'diamond-open' },
  { colour: '#a07a5a', dash: 'longdash', marker: 'triangle-up-open' },
];

export function pointTraceStyle(point: PointId): TraceStyle {
  return POINT_STYLES[point];
}

export function extraTraceStyle(index: number): TraceStyle {
  return EXTRA_STYLES[index % EXTRA_STYLES.length];
}

/** Markers on a line at most this many times per trace, so they tell traces apart without hiding the line. */
export const MARKERS_PER_TRACE = 10;
