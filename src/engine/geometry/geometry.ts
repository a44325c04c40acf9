// Geometry of the part: volume, cooled area, the two lengths the Biot number is built on,
// and the points the engine reports. Per unit face area for plates, per unit length for long cylinders.
// Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 5.2 (Lc = V/As) and Sec. 5.5 (L, r0) (from memory).
import type { Shape, PointId } from '@/schema/planSchema';

export type SeriesGeometry = 'slab' | 'cylinder' | 'sphere';

export interface ReportedPoint {
  id: PointId;
  label: string;
  /** Finite shapes: position from the centre along each of geometry.finiteAxes, m. */
  positionM?: number[];
}

/**
 * One axis of a finite shape's symmetric part: 'radial' (0..r0, weight r) or 'linear' (0..half side).
 * The solved region is the part between the centre and the faces; symmetry gives the rest.
 */
export interface FiniteAxis {
  coordinate: 'radial' | 'linear';
  name: 'r' | 'x' | 'y' | 'z';
  halfLengthM: number;
}

export interface Geometry {
  shape: Shape;
  volumeM3: number;
  cooledAreaM2: number;
  /** Lc = V / As, the length of the lumped-capacitance Biot number. */
  characteristicLengthM: number;
  /** The length the exact series is built on (L for plates, r0 for cylinders and spheres). */
  seriesLengthM: number;
  seriesLengthLabel: string;
  /** What "per part" means for this shape. */
  basis: 'part' | 'per m² of cooled face' | 'per m of length';
  /** The 1-D problem the shape reduces to, or null for finite shapes. */
  oneD: { geometry: SeriesGeometry; lengthM: number } | null;
  points: ReportedPoint[];
  /** Finite shapes only: the axes of the product solution and the multi-dimensional grid. */
  finiteAxes?: FiniteAxis[];
}

const POINTS_1D = (centreLabel: string): ReportedPoint[] => [
  { id: 'centre', label: centreLabel },
  { id: 'surface', label: 'surface' },
  { id: 'mean', label: 'volume mean' },
];

export function geometryOf(shape: Shape): Geometry {
  switch (shape.kind) {
    case 'plate': {
      const L = shape.halfThicknessM;
      // Per m² of one face: V = 2L, As = 2 (both faces) -> Lc = L.
      return { shape, volumeM3: 2 * L, cooledAreaM2: 2, characteristicLengthM: L, seriesLengthM: L, seriesLengthLabel: 'L (half-thickness)', basis: 'per m² of cooled face', oneD: { geometry: 'slab', lengthM: L }, points: POINTS_1D('mid-plane') };
    }
    case 'plate-insulated-back': {
      const L = shape.thicknessM;
      return { shape, volumeM3: L, cooledAreaM2: 1, characteristicLengthM: L, seriesLengthM: L, seriesLengthLabel: 'L (thickness)', basis: 'per m² of cooled face', oneD: { geometry: 'slab', lengthM: L }, points: POINTS_1D('insulated face') };
    }
    case 'long-cylinder': {
      const r = shape.radiusM;
      // Per m of length: V = pi r², As = 2 pi r -> Lc = r/2.
      return { shape, volumeM3: Math.PI * r * r, cooledAreaM2: 2 * Math.PI * r, characteristicLengthM: r / 2, seriesLengthM: r, seriesLengthLabel: 'r0 (radius)', basis: 'per m of length', oneD: { geometry: 'cylinder', lengthM: r }, points: POINTS_1D('axis') };
    }
    case 'sphere': {
      const r = shape.radiusM;
      // V = 4/3 pi r³, As = 4 pi r² -> Lc = r/3.
      return { shape, volumeM3: (4 / 3) * Math.PI * r ** 3, cooledAreaM2: 4 * Math.PI * r * r, characteristicLengthM: r / 3, seriesLengthM: r, seriesLengthLabel: 'r0 (radius)', basis: 'part', oneD: { geometry: 'sphere', lengthM: r }, points: POINTS_1D('centre') };
    }
    case 'short-cylinder': {
      const { radiusM: r, halfLengthM: L } = shape;
      const V = Math.PI * r * r * 2 * L;
      const A = 2 * Math.PI * r * 2 * L + 2 * Math.PI * r * r;
      const finiteAxes: FiniteAxis[] = [{ coordinate: 'radial', name: 'r', halfLengthM: r }, { coordinate: 'linear', name: 'z', halfLengthM: L }];
      return { shape, volumeM3: V, cooledAreaM2: A, characteristicLengthM: V / A, seriesLengthM: Math.min(r, L), seriesLengthLabel: r <= L ? 'r0 (radius)' : 'L (half-length)', basis: 'part', oneD: null, finiteAxes, points: [
        { id: 'centre', label: 'centre', positionM: [0, 0] },
        { id: 'face-x', label: 'side, mid-length', positionM: [r, 0] },
        { id: 'face-z', label: 'end face, centre', positionM: [0, L] },
        { id: 'edge', label: 'rim (end-face edge)', positionM: [r, L] },
        { id: 'mean', label: 'volume mean' } ] };
    }
    case 'bar': {
      const { halfWidthM: a, halfHeightM: b } = shape;
      // Per m of length: V = 4ab, As = 4(a + b).
      const finiteAxes: FiniteAxis[] = [{ coordinate: 'linear', name: 'x', halfLengthM: a }, { coordinate: 'linear', name: 'y', halfLengthM: b }];
      return { shape, volumeM3: 4 * a * b, cooledAreaM2: 4 * (a + b), characteristicLengthM: (a * b) / (a + b), seriesLengthM: Math.min(a, b), seriesLengthLabel: 'smaller half-side', basis: 'per m of length', oneD: null, finiteAxes, points: [
        { id: 'centre', label: 'axis', positionM: [0, 0] },
        { id: 'face-x', label: 'face ⟂ x (at x = a), middle', positionM: [a, 0] },
        { id: 'face-y', label: 'face ⟂ y (at y = b), middle', positionM: [0, b] },
        { id: 'edge', label: 'long edge', positionM: [a, b] },
        { id: 'mean', label: 'volume mean' } ] };
    }
    case 'block': {
      const { halfLengthM: a, halfWidthM: b, halfHeightM: c } = shape;
      const V = 8 * a * b * c;
      const A = 8 * (a * b + b * c + a * c);
      const finiteAxes: FiniteAxis[] = [{ coordinate: 'linear', name: 'x', halfLengthM: a }, { coordinate: 'linear', name: 'y', halfLengthM: b }, { coordinate: 'linear', name: 'z', halfLengthM: c }];
      // The reported edge runs along the longest side (the two faces that meet there are the closest together).
      const halves = [a, b, c];
      const along = halves.indexOf(Math.max(a, b, c));
      const edgeAt = halves.map((h, d) => (d === along ? 0 : h));
      return { shape, volumeM3: V, cooledAreaM2: A, characteristicLengthM: V / A, seriesLengthM: Math.min(a, b, c), seriesLengthLabel: 'smallest half-side', basis: 'part', oneD: null, finiteAxes, points: [
        { id: 'centre', label: 'centre', positionM: [0, 0, 0] },
        { id: 'face-x', label: 'face ⟂ x, middle', positionM: [a, 0, 0] },
        { id: 'face-y', label: 'face ⟂ y, middle', positionM: [0, b, 0] },
        { id: 'face-z', label: 'face ⟂ z, middle', positionM: [0, 0, c] },
        { id: 'edge', label: `edge along ${'xyz'[along]} (the longest side), middle`, positionM: edgeAt },
        { id: 'corner', label: 'corner', positionM: [a, b, c] },
        { id: 'mean', label: 'volume mean' } ] };
    }
  }
}
