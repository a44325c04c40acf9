// The dimensions a form shows for each shape, as whole sizes (thickness, diameter, length), with
// the conversion to and from the schema's half-sizes and radii.
import type { Shape, ShapeKind } from '@/schema/planSchema';

export interface ShapeDimension {
  /** Form label; also names the field in messages. */
  label: string;
  getM(shape: Shape): number;
  setM(shape: Shape, valueM: number): Shape;
}

export const SHAPE_LABELS: Record<ShapeKind, string> = {
  plate: 'Plate, both faces cooled',
  'plate-insulated-back': 'Plate, one face cooled (back insulated)',
  'long-cylinder': 'Long round bar',
  sphere: 'Ball',
  'short-cylinder': 'Short round (disc or billet)',
  bar: 'Long rectangular bar',
  block: 'Rectangular block',
};

export const SHAPE_KINDS = Object.keys(SHAPE_LABELS) as ShapeKind[];

type Of<K extends ShapeKind> = Extract<Shape, { kind: K }>;
const whole = <K extends ShapeKind, F extends keyof Of<K> & string>(label: string, _kind: K, field: F): ShapeDimension => ({
  label,
  getM: (s) => 2 * ((s as Of<K>)[field] as number),
  setM: (s, m) => ({ ...s, [field]: m / 2 }),
});

export const SHAPE_DIMENSIONS: Record<ShapeKind, ShapeDimension[]> = {
  plate: [whole('Thickness', 'plate', 'halfThicknessM')],
  'plate-insulated-back': [{ label: 'Thickness', getM: (s) => (s as Of<'plate-insulated-back'>).thicknessM, setM: (s, m) => ({ ...s, thicknessM: m }) as Shape }],
  'long-cylinder': [whole('Diameter', 'long-cylinder', 'radiusM')],
  sphere: [whole('Diameter', 'sphere', 'radiusM')],
  'short-cylinder': [whole('Diameter', 'short-cylinder', 'radiusM'), whole('Length', 'short-cylinder', 'halfLengthM')],
  bar: [whole('Width', 'bar', 'halfWidthM'), whole('Height', 'bar', 'halfHeightM')],
  block: [whole('Length', 'block', 'halfLengthM'), whole('Width', 'block', 'halfWidthM'), whole('Height', 'block', 'halfHeightM')],
};

/** The smallest half-size of a shape: kept when the shape kind changes, so the part stays about as thick. */
function halfSizeM(shape: Shape): number {
  switch (shape.kind) {
    case 'plate':
      return shape.halfThicknessM;
    case 'plate-insulated-back':
      return shape.thicknessM / 2;
    case 'long-cylinder':
    case 'sphere':
      return shape.radiusM;
    case 'short-cylinder':
      return Math.min(shape.radiusM, shape.halfLengthM);
    case 'bar':
      return Math.min(shape.halfWidthM, shape.halfHeightM);
    case 'block':
      return Math.min(shape.halfLengthM, shape.halfWidthM, shape.halfHeightM);
  }
}

/** A shape of another kind with the same smallest half-size; the other sides are set in simple ratios. */
export function reshape(shape: Shape, kind: ShapeKind): Shape {
  if (shape.kind === kind) return shape;
  const h = halfSizeM(shape);
  switch (kind) {
    case 'plate':
      return { kind, halfThicknessM: h };
    case 'plate-insulated-back':
      return { kind, thicknessM: 2 * h };
    case 'long-cylinder':
    case 'sphere':
      return { kind, radiusM: h };
    case 'short-cylinder':
      return { kind, radiusM: h, halfLengthM: 2 * h };
    case 'bar':
      return { kind, halfWidthM: 2 * h, halfHeightM: h };
    case 'block':
      return { kind, halfLengthM: 3 * h, halfWidthM: 2 * h, halfHeightM: h };
  }
}
