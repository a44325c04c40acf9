// Vertex-centred finite-volume grid for the slab, long cylinder and sphere, refined towards the cooled surface.
// Nodes x_0 = 0 (centre / insulated face) ... x_N = L (cooled surface); faces at the midpoints between nodes,
// so node 0 and node N own half cells. Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Sec. 4.6-1 ("practice A":
// grid points first, faces midway between them, half control volumes at the boundaries) (from memory).
// The geometric factors drop the constant 2 pi (cylinder) and 4 pi (sphere); `basisScale` restores the geometry's basis.
import type { SeriesGeometry } from '../../geometry/geometry';

export interface VolumeGrid {
  geometry: SeriesGeometry;
  lengthM: number;
  /** Number of nodes, N + 1. */
  nodeCount: number;
  nodesM: Float64Array;
  /** Control volume of each node, m^(m+1) / (m+1) units with the 2 pi / 4 pi dropped. */
  volumes: Float64Array;
  /** Face area over node distance for the face between node i and i+1 (length nodeCount - 1). */
  faceAreaOverDistance: Float64Array;
  /** Area of the cooled surface in the same reduced units (L^m). */
  surfaceArea: number;
  totalVolume: number;
  /** Multiply reduced volumes and areas by this to get the geometry's basis (per m², per m, per part). */
  basisScale: number;
}

/** Exponent m in the area law A(x) = x^m: 0 slab, 1 cylinder, 2 sphere. */
export function areaExponentOf(geometry: SeriesGeometry): number {
  return geometry === 'slab' ? 0 : geometry === 'cylinder' ? 1 : 2;
}

/**
 * Node positions x/L = 1 - sinh(beta (1 - xi)) / sinh(beta), xi = i/N: a smooth stretching that clusters nodes
 * at the surface (spacing ratio beta / sinh(beta) there), which keeps the scheme second order.
 * Vinokur, On one-dimensional stretching functions for finite-difference calculations, J. Comput. Phys. 50 (1983) (from memory).
 * `pinnedM` are positions that get a node of their own: the nearest interior node whose index is a multiple of
 * `pinStride` moves there (stride 2 keeps the pinned node on the coarse grid of a Richardson pair).
 */
export function buildVolumeGrid(geometry: SeriesGeometry, lengthM: number, cellCount: number, stretch: number, pinnedM: readonly number[], pinStride: number, basisVolume: number): VolumeGrid {
  const n = cellCount + 1;
  const nodesM = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const xi = i / cellCount;
    nodesM[i] = stretch > 1e-9 ? lengthM * (1 - Math.sinh(stretch * (1 - xi)) / Math.sinh(stretch)) : lengthM * xi;
  }
  nodesM[0] = 0;
  nodesM[cellCount] = lengthM;
  for (const p of pinnedM) pinNode(nodesM, p, pinStride);
  return gridOnNodes(geometry, lengthM, nodesM, basisVolume);
}

function pinNode(nodesM: Float64Array, positionM: number, stride: number): void {
  const last = nodesM.length - 1;
  if (last <= stride || positionM <= 0 || positionM >= nodesM[last]) return;
  let best = stride;
  for (let i = stride; i < last; i += stride) if (Math.abs(nodesM[i] - positionM) < Math.abs(nodesM[best] - positionM)) best = i;
  if (Math.abs(nodesM[best] - positionM) === 0) return;
  // Move only if the order of the nodes is kept with a margin of a quarter of the neighbouring spacing.
  const lo = nodesM[best - 1] + 0.25 * (nodesM[best] - nodesM[best - 1]);
  const hi = nodesM[best + 1] - 0.25 * (nodesM[best + 1] - nodesM[best]);
  if (positionM > lo && positionM < hi) nodesM[best] = positionM;
}

/** Control volumes and face factors for given nodes (used also to continue on a previous stage's nodes). */
export function gridOnNodes(geometry: SeriesGeometry, lengthM: number, nodesM: Float64Array, basisVolume: number): VolumeGrid {
  const n = nodesM.length;
  const m = areaExponentOf(geometry);
  // V(a, b) = (b^(m+1) - a^(m+1)) / (m + 1): the volume between radii a and b per unit angle factor.
  const cum = (x: number) => x ** (m + 1) / (m + 1);
  const volumes = new Float64Array(n);
  const faceAreaOverDistance = new Float64Array(n - 1);
  let lowFace = 0;
  for (let i = 0; i < n; i++) {
    const highFace = i === n - 1 ? lengthM : 0.5 * (nodesM[i] + nodesM[i + 1]);
    volumes[i] = cum(highFace) - cum(lowFace);
    if (i < n - 1) faceAreaOverDistance[i] = highFace ** m / (nodesM[i + 1] - nodesM[i]);
    lowFace = highFace;
  }
  const totalVolume = cum(lengthM);
  return { geometry, lengthM, nodeCount: n, nodesM, volumes, faceAreaOverDistance, surfaceArea: lengthM ** m, totalVolume, basisScale: basisVolume / totalVolume };
}
