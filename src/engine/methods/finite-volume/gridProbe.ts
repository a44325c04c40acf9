// A reported point read from a finite-volume grid: a node, linear interpolation between two nodes, or the volume mean.
import type { VolumeGrid } from './buildVolumeGrid';

export interface GridProbe {
  /** Mean over the volume, or linear interpolation between node j and j + 1 with weight w on j + 1. */
  mean: boolean;
  j: number;
  w: number;
}

export const MEAN_PROBE: GridProbe = { mean: true, j: 0, w: 0 };

/** The probe at x metres from the centre (clamped to the grid). */
export function probeAt(grid: VolumeGrid, xM: number): GridProbe {
  const nodes = grid.nodesM;
  const last = grid.nodeCount - 1;
  if (xM <= 0) return { mean: false, j: 0, w: 0 };
  if (xM >= grid.lengthM) return { mean: false, j: last, w: 0 };
  let j = 0;
  while (j < last - 1 && nodes[j + 1] <= xM) j++;
  const w = (xM - nodes[j]) / (nodes[j + 1] - nodes[j]);
  return { mean: false, j, w };
}

export function probeValue(p: GridProbe, grid: VolumeGrid, t: Float64Array): number {
  if (p.mean) {
    let s = 0;
    for (let i = 0; i < grid.nodeCount; i++) s += grid.volumes[i] * t[i];
    return s / grid.totalVolume;
  }
  return p.w === 0 ? t[p.j] : (1 - p.w) * t[p.j] + p.w * t[p.j + 1];
}

/** dT/dt at the probe from the net inflow F and capacity C: dT_i/dt = F_i / (V_i C_i). */
export function probeSlope(p: GridProbe, grid: VolumeGrid, f: Float64Array, c: Float64Array): number {
  if (p.mean) {
    let s = 0;
    for (let i = 0; i < grid.nodeCount; i++) s += f[i] / c[i];
    return s / grid.totalVolume;
  }
  const a = f[p.j] / (grid.volumes[p.j] * c[p.j]);
  return p.w === 0 ? a : (1 - p.w) * a + p.w * (f[p.j + 1] / (grid.volumes[p.j + 1] * c[p.j + 1]));
}
