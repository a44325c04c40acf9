// The one place a chart meets plotly: loads it lazily, draws with Plotly.react when the figure changes
// (callers memoise the figure), purges on unmount. Shows a line of text while plotly loads or if it fails.
import { useEffect, useRef, useState } from 'react';
import type { Config } from 'plotly.js';
import type { ChartFigure } from './chartFigure';
import { loadedPlotly, loadPlotly } from './loadPlotly';
import './PlotlyChart.css';

export interface PlotlyChartProps {
  figure: ChartFigure;
  /** What the chart shows, in words, for screen readers. */
  label: string;
  heightPx?: number;
}

const CHART_CONFIG: Partial<Config> = { responsive: true, displaylogo: false, modeBarButtonsToRemove: ['select2d', 'lasso2d', 'zoomIn2d', 'zoomOut2d'] };
const DEFAULT_HEIGHT_PX = 380;

type LoadState = 'loading' | 'drawn' | 'failed';

export function PlotlyChart({ figure, label, heightPx = DEFAULT_HEIGHT_PX }: PlotlyChartProps) {
  const plotRef = useRef<HTMLDivElement>(null);
  const [state, setState] = useState<LoadState>('loading');

  useEffect(() => {
    let current = true;
    loadPlotly()
      .then((plotly) => (plotRef.current && current ? plotly.react(plotRef.current, figure.data, figure.layout, CHART_CONFIG) : undefined))
      .then(() => current && setState('drawn'))
      .catch(() => current && setState('failed'));
    return () => {
      current = false;
    };
  }, [figure]);

  useEffect(() => {
    const element = plotRef.current;
    return () => {
      if (element) loadedPlotly()?.purge(element);
    };
  }, []);

  return (
    <figure className="plotly-chart" aria-label={label} aria-busy={state === 'loading'}>
      {state !== 'drawn' && (
        <p className="plotly-chart__status" role="status">
          {state === 'loading' ? 'Loading the chart…' : 'The chart could not be drawn (the plotting library failed to load).'}
        </p>
      )}
      <div ref={plotRef} className="plotly-chart__plot" data-testid="plot" style={{ height: heightPx }} />
    </figure>
  );
}
