// The tensor grid of a finite shape's symmetric part (2 or 3 axes): node volumes, conductance
// geometry of the faces between neighbours and the cooled areas of surface nodes, all on the solved
// part (the whole part is wholePartFactor times it). Node p = i0 + n0 * (i1 + n1 * i2).
// Finite-volume discretisation on vertex-centred control volumes: Patankar, Numerical Heat Transfer
// and Fluid Flow, 1980, Secs. 4.2 and 4.6 (from memory).
import type { FiniteAxis } from '../../geometry/geometry';
import { axisNodes, controlVolumes, type AxisControlVolumes } from './controlVolumes';

export interface FiniteGrid {
  axes: AxisControlVolumes[];
  counts: number[];
  strides: number[];
  size: number;
  /** Node volume on the solved part, m³ (radial axes carry the integral of r dr, without the 2 pi). */
  volumeM3: Float64Array;
  /** Per axis d: face area / node spacing between node p and p + strides[d], m (0 on the last layer). */
  faceAreaPerSpacingM: Float64Array[];
  /** Per axis d: cooled area of node p on the outer face of axis d, m² (0 elsewhere). */
  surfaceAreaM2: Float64Array[];
  /** Per axis d: the first node of every grid line running along d. */
  lineStarts: Int32Array[];
  /** Whole part = this factor times the solved part (volumes, areas, heat). */
  wholePartFactor: number;
}

export function finiteGrid(axes: FiniteAxis[], nodesPerAxis: number[], stretch: number): FiniteGrid {
  const cvs = axes.map((a, d) => controlVolumes(a.coordinate, axisNodes(a, nodesPerAxis[d], stretch)));
  const counts = cvs.map((c) => c.nodesM.length);
  const strides: number[] = [];
  let size = 1;
  for (const n of counts) {
    strides.push(size);
    size *= n;
  }
  const dims = counts.length;
  const volumeM3 = new Float64Array(size);
  const faceAreaPerSpacingM = cvs.map(() => new Float64Array(size));
  const surfaceAreaM2 = cvs.map(() => new Float64Array(size));
  const index = new Array<number>(dims).fill(0);
  for (let p = 0; p < size; p++) {
    let rest = p;
    for (let d = 0; d < dims; d++) {
      index[d] = rest % counts[d];
      rest = (rest - index[d]) / counts[d];
    }
    let v = 1;
    for (let d = 0; d < dims; d++) v *= cvs[d].volumeWeight[index[d]];
    volumeM3[p] = v;
    for (let d = 0; d < dims; d++) {
      // Area of a face normal to d = the product of the other axes' weights.
      let across = 1;
      for (let e = 0; e < dims; e++) if (e !== d) across *= cvs[e].volumeWeight[index[e]];
      const i = index[d];
      if (i < counts[d] - 1) faceAreaPerSpacingM[d][p] = cvs[d].faceWeightPerSpacing[i] * across;
      else surfaceAreaM2[d][p] = cvs[d].surfaceWeight * across;
    }
  }
  const lineStarts = counts.map((n, d) => {
    const starts = new Int32Array(size / n);
    let k = 0;
    for (let p = 0; p < size; p++) if (Math.floor(p / strides[d]) % n === 0) starts[k++] = p;
    return starts;
  });
  const wholePartFactor = cvs.reduce((f, c) => f * c.wholePartFactor, 1);
  return { axes: cvs, counts, strides, size, volumeM3, faceAreaPerSpacingM, surfaceAreaM2, lineStarts, wholePartFactor };
}
