// The stage's start field on the finite-volume grid: uniform, a product field (evaluated axis by
// axis, then multiplied out), or a tensor-grid field (copied, or interpolated when the grids differ).
import type { Field } from '../../fields';
import type { FiniteGrid } from './finiteGrid';
import { seriesFactorAt } from '../product/productFieldTemperatureAt';
import { tensorGridTemperatureAt } from './tensorGridTemperatureAt';

/** Node temperatures, or null when the field belongs to a 1-D shape. */
export function startOnGrid(start: Field, grid: FiniteGrid): Float64Array | null {
  const u = new Float64Array(grid.size);
  const dims = grid.counts.length;
  const indexOf = (p: number, d: number) => Math.floor(p / grid.strides[d]) % grid.counts[d];
  switch (start.kind) {
    case 'uniform':
      return u.fill(start.temperatureK);
    case 'product': {
      if (start.axes.length !== dims) return null;
      u.fill(start.offsetK);
      for (const term of start.terms) {
        const onAxis = grid.axes.map((a, d) => Float64Array.from(a.nodesM, (x) => seriesFactorAt(term.factors[d], start.axes[d].geometry, start.axes[d].lengthM, x)));
        for (let p = 0; p < grid.size; p++) {
          let v = term.weightK;
          for (let d = 0; d < dims; d++) v *= onAxis[d][indexOf(p, d)];
          u[p] += v;
        }
      }
      return u;
    }
    case 'tensor-grid': {
      if (start.nodesM.length !== dims) return null;
      const same = start.nodesM.every((n, d) => n.length === grid.counts[d] && n.every((x, i) => x === grid.axes[d].nodesM[i]));
      if (same) return Float64Array.from(start.temperaturesK);
      const position = new Array<number>(dims);
      for (let p = 0; p < grid.size; p++) {
        for (let d = 0; d < dims; d++) position[d] = grid.axes[d].nodesM[indexOf(p, d)];
        u[p] = tensorGridTemperatureAt(start, position);
      }
      return u;
    }
    case 'series-1d':
    case 'grid-1d':
      return null;
  }
}
