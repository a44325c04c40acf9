// Vertex-centred control volumes along one axis of a finite shape's symmetric part: a node at the centre
// (symmetry plane or axis) and one on the surface, faces midway, built by the 1-D solver's grid code
// (finite-volume/buildVolumeGrid: Patankar 1980, Sec. 4.6-1, and Vinokur's stretching towards the surface).
// The 1-D code drops the 2 pi of the cylinder; wholePartFactor restores the whole part from the solved part.
import type { FiniteAxis } from '../../geometry/geometry';
import { buildVolumeGrid, gridOnNodes } from '../finite-volume/buildVolumeGrid';

export interface AxisControlVolumes {
  coordinate: FiniteAxis['coordinate'];
  nodesM: Float64Array;
  /** Per node: length of its control volume (linear) or the integral of r dr over it (radial), m or m². */
  volumeWeight: Float64Array;
  /** Per face between node i and i+1: 1 (linear) or the face radius (radial), over the node spacing. */
  faceWeightPerSpacing: Float64Array;
  /** Weight of the cooled face at the last node: 1 (linear) or r0 (radial). */
  surfaceWeight: number;
  /** The solved part times this factor is the whole part: 2 for a mirror plane, 2 pi for the full revolution. */
  wholePartFactor: number;
}

const axisGeometry = (coordinate: FiniteAxis['coordinate']) => (coordinate === 'radial' ? 'cylinder' : 'slab');

export function controlVolumes(coordinate: FiniteAxis['coordinate'], nodesM: Float64Array): AxisControlVolumes {
  const grid = gridOnNodes(axisGeometry(coordinate), nodesM[nodesM.length - 1], nodesM, 1);
  return {
    coordinate,
    nodesM,
    volumeWeight: grid.volumes,
    faceWeightPerSpacing: grid.faceAreaOverDistance,
    surfaceWeight: grid.surfaceArea,
    wholePartFactor: coordinate === 'radial' ? 2 * Math.PI : 2,
  };
}

/** nodeCount nodes from 0 to the half-length, clustered towards the surface by the stretching parameter. */
export function axisNodes(axis: FiniteAxis, nodeCount: number, stretch: number): Float64Array {
  return buildVolumeGrid(axisGeometry(axis.coordinate), axis.halfLengthM, nodeCount - 1, stretch, [], 1).nodesM;
}
