// Volume mean of a tensor-grid field: sum of node temperature times control volume over the total,
// the same quadrature the finite-volume energy ledger uses (Patankar, Numerical Heat Transfer and
// Fluid Flow, 1980, Sec. 4.2 (from memory)). Second-order accurate in the node spacing.
import type { TensorGridField } from '../../fields';
import type { FiniteAxis } from '../../geometry/geometry';
import { controlVolumes } from './controlVolumes';

export function tensorGridMeanK(field: TensorGridField, axes: readonly FiniteAxis[]): number {
  const weights = field.nodesM.map((nodes, d) => controlVolumes(axes[d].coordinate, nodes).volumeWeight);
  const counts = field.nodesM.map((n) => n.length);
  let sum = 0;
  let volume = 0;
  for (let p = 0; p < field.temperaturesK.length; p++) {
    let rest = p;
    let v = 1;
    for (let d = 0; d < counts.length; d++) {
      const i = rest % counts[d];
      rest = (rest - i) / counts[d];
      v *= weights[d][i];
    }
    sum += v * field.temperaturesK[p];
    volume += v;
  }
  return sum / volume;
}
