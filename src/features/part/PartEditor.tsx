// The part: shape and its sizes, material, and the temperature it starts the first stage at.
import { planBodySchema, shapeSchema, type Material, type Part, type Shape, type ShapeKind } from '@/schema/planSchema';
import type { MaterialEntry } from '@/library/libraryEntrySchema';
import type { UnitSystem } from '@/features/units/unitSystem';
import { MaterialEditor } from './MaterialEditor';
import { QuantityField } from './QuantityField';
import { SHAPE_DIMENSIONS, SHAPE_KINDS, SHAPE_LABELS, reshape } from './shapeDimensions';
import { validateEdit } from './validateEdit';

export interface PartEditorProps {
  part: Part;
  initialTemperatureK: number;
  system: UnitSystem;
  materials: readonly MaterialEntry[];
  onShape: (shape: Shape, mergeKey?: string) => void;
  onMaterial: (material: Material, mergeKey?: string) => void;
  onInitialTemperature: (temperatureK: number) => void;
}

export function PartEditor({ part, initialTemperatureK, system, materials, onShape, onMaterial, onInitialTemperature }: PartEditorProps) {
  const { shape } = part;
  return (
    <section className="panel" aria-labelledby="part-heading">
      <h2 id="part-heading">Part</h2>
      <fieldset className="group">
        <legend>Shape</legend>
        <div className="field">
          <label htmlFor="shape-kind">Shape</label>
          <select id="shape-kind" value={shape.kind} onChange={(e) => onShape(reshape(shape, e.target.value as ShapeKind))}>
            {SHAPE_KINDS.map((k) => (
              <option key={k} value={k}>
                {SHAPE_LABELS[k]}
              </option>
            ))}
          </select>
        </div>
        {SHAPE_DIMENSIONS[shape.kind].map((d) => (
          <QuantityField
            key={`${shape.kind}-${d.label}`}
            label={d.label}
            kind="length"
            valueSI={d.getM(shape)}
            system={system}
            check={(m) => (m > 0 ? null : 'must be greater than zero')}
            onCommit={(m) => {
              const checked = validateEdit(shapeSchema, d.setM(shape, m), d.label);
              if (!checked.ok) return checked.message;
              onShape(checked.value, `shape.${d.label}`);
              return null;
            }}
          />
        ))}
      </fieldset>
      <QuantityField
        label="Starting temperature (uniform)"
        kind="temperature"
        valueSI={initialTemperatureK}
        system={system}
        onCommit={(t) => {
          const checked = validateEdit(planBodySchema.shape.initialTemperature, t, 'Starting temperature');
          if (!checked.ok) return checked.message;
          onInitialTemperature(checked.value);
          return null;
        }}
      />
      <MaterialEditor material={part.material} library={materials} system={system} onChange={onMaterial} />
    </section>
  );
}
