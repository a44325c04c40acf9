// The plotly dist bundle ships no types; it is the full plotly API restricted to the basic traces.
// 'plotly-impl' is the Vite alias the charts import, so tests and variant builds can swap the bundle.
declare module 'plotly.js-basic-dist-min' {
  import Plotly = require('plotly.js');
  export = Plotly;
}
declare module 'plotly-impl' {
  import Plotly = require('plotly.js');
  export = Plotly;
}
