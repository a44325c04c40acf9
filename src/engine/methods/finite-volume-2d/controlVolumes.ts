// Vertex-centred control volumes along one axis of a finite shape's symmetric part: a node at the
// centre (symmetry plane or axis) and one on the surface, each owning the half-cells around it.
// Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Sec. 4.6 ("practice B", faces midway) (from memory).
import type { FiniteAxis } from '../../geometry/geometry';

export interface AxisControlVolumes {
  coordinate: FiniteAxis['coordinate'];
  nodesM: Float64Array;
  /** Per node: length of its control volume (linear) or the integral of r dr over it (radial), m or m². */
  volumeWeight: Float64Array;
  /** Per face between node i and i+1: 1 (linear) or the face radius (radial), divided by the node spacing, 1/m or 1. */
  faceWeightPerSpacing: Float64Array;
  /** Weight of the cooled face at the last node: 1 (linear) or r0 (radial). */
  surfaceWeight: number;
  /** The solved part times this factor is the whole part: 2 for a mirror plane, 2 pi for the full revolution. */
  wholePartFactor: number;
}

export function controlVolumes(coordinate: FiniteAxis['coordinate'], nodesM: Float64Array): AxisControlVolumes {
  const n = nodesM.length;
  const volumeWeight = new Float64Array(n);
  const faceWeightPerSpacing = new Float64Array(n - 1);
  const faceM = (i: number) => (i < 0 ? 0 : i >= n - 1 ? nodesM[n - 1] : 0.5 * (nodesM[i] + nodesM[i + 1]));
  for (let i = 0; i < n; i++) {
    const lo = faceM(i - 1);
    const hi = faceM(i);
    // Linear: the CV length; radial: integral of r dr from lo to hi = (hi² - lo²)/2.
    volumeWeight[i] = coordinate === 'linear' ? hi - lo : 0.5 * (hi * hi - lo * lo);
  }
  for (let i = 0; i < n - 1; i++) {
    const spacing = nodesM[i + 1] - nodesM[i];
    faceWeightPerSpacing[i] = (coordinate === 'linear' ? 1 : faceM(i)) / spacing;
  }
  const radiusM = nodesM[n - 1];
  return {
    coordinate,
    nodesM,
    volumeWeight,
    faceWeightPerSpacing,
    surfaceWeight: coordinate === 'linear' ? 1 : radiusM,
    wholePartFactor: coordinate === 'linear' ? 2 : 2 * Math.PI,
  };
}

/** Evenly spaced nodes from 0 to halfLengthM, nodeCount of them (at least 2). */
export function evenNodes(halfLengthM: number, nodeCount: number): Float64Array {
  const nodes = new Float64Array(nodeCount);
  for (let i = 0; i < nodeCount; i++) nodes[i] = (halfLengthM * i) / (nodeCount - 1);
  return nodes;
}
