// Temperature of a tensor-grid field at a position of the solved part: multilinear interpolation
// between the surrounding nodes (Press et al., Numerical Recipes, 3rd ed., Sec. 3.6 (from memory)).
// Exact at nodes; second-order error between them. Positions outside the grid are clamped to it.
import type { TensorGridField } from '../../fields';

export function tensorGridTemperatureAt(field: TensorGridField, positionM: readonly number[]): number {
  const dims = field.nodesM.length;
  const lo: number[] = [];
  const frac: number[] = [];
  const strides: number[] = [];
  let stride = 1;
  for (let d = 0; d < dims; d++) {
    const nodes = field.nodesM[d];
    const n = nodes.length;
    const x = Math.min(Math.max(positionM[d], nodes[0]), nodes[n - 1]);
    let i = 0;
    while (i < n - 2 && nodes[i + 1] < x) i++;
    lo.push(i);
    frac.push((x - nodes[i]) / (nodes[i + 1] - nodes[i]));
    strides.push(stride);
    stride *= n;
  }
  let sum = 0;
  for (let corner = 0; corner < 1 << dims; corner++) {
    let weight = 1;
    let p = 0;
    for (let d = 0; d < dims; d++) {
      const up = (corner >> d) & 1;
      weight *= up ? frac[d] : 1 - frac[d];
      p += (lo[d] + up) * strides[d];
    }
    if (weight !== 0) sum += weight * field.temperaturesK[p];
  }
  return sum;
}
