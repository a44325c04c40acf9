// Vertex-centred control volumes along one axis of a finite shape's symmetric part: a node at the centre
// (symmetry plane or axis) and one on the surface, faces midway, built by the 1-D solver's grid code
// (finite-volume/gridOnNodes: Patankar 1980, Sec. 4.6-1). The 1-D code drops the 2 pi of the cylinder;
// wholePartFactor restores the whole part from the solved part. Node positions are this file's own: the 2-D/3-D
// error constants in test/unit/finite-volume-2d were measured on them, whatever the 1-D grid sizing does.
import type { FiniteAxis } from '../../geometry/geometry';
import { gridOnNodes } from '../finite-volume/buildVolumeGrid';

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

/**
 * nodeCount nodes from 0 to the half-length, x/L = 1 - sinh(beta (1 - xi)) / sinh(beta), xi = i / (nodeCount - 1):
 * spacing beta coth(beta) times the even one at the centre and beta / sinh(beta) at the surface (Vinokur, On
 * one-dimensional stretching functions for finite-difference calculations, J. Comput. Phys. 50 (1983) 215 (from memory)).
 */
export function axisNodes(axis: FiniteAxis, nodeCount: number, beta: number): Float64Array {
  const cells = nodeCount - 1;
  const nodes = new Float64Array(nodeCount);
  for (let i = 0; i <= cells; i++) nodes[i] = beta > 0 ? axis.halfLengthM * (1 - Math.sinh(beta * (1 - i / cells)) / Math.sinh(beta)) : (axis.halfLengthM * i) / cells;
  nodes[cells] = axis.halfLengthM;
  return nodes;
}
