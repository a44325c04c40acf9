// Plotly is loaded on first use, in its own chunk, so the first screen never waits for it.
import type * as PlotlyApi from 'plotly.js';

export type Plotly = typeof PlotlyApi;

let loading: Promise<Plotly> | null = null;
let loaded: Plotly | null = null;

export function loadPlotly(): Promise<Plotly> {
  loading ??= import('plotly-impl').then((module) => {
    // The UMD bundle arrives as the default export; a test mock may hand the API itself.
    const api = ((module as { default?: Plotly }).default ?? module) as Plotly;
    loaded = api;
    return api;
  });
  return loading;
}

/** Plotly if it has already been loaded (for synchronous clean-up on unmount), else null. */
export function loadedPlotly(): Plotly | null {
  return loaded;
}
