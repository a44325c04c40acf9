// Where a stage ends: after a set time, or when a point of the part reaches a temperature.
import type { EndCondition, PointId } from '@/schema/planSchema';
import type { UnitSystem } from '@/features/units/unitSystem';
import { QuantityField } from '@/features/part/QuantityField';

/** Values a switch of end condition starts from (demo values, the user sets the real ones). */
const SWITCH_DURATION_S = 60;
const SWITCH_TARGET_K = 573.15;

export interface EndConditionEditorProps {
  end: EndCondition;
  points: { id: PointId; label: string }[];
  /** 1-D shapes can also end on a point at a depth below the surface. */
  oneD: boolean;
  system: UnitSystem;
  onChange: (end: EndCondition, fieldLabel: string, mergeKey?: string) => string | null;
}

export function EndConditionEditor({ end, points, oneD, system, onChange }: EndConditionEditorProps) {
  const choices = oneD ? [...points, { id: 'depth' as const, label: 'point at a depth below the surface' }] : points;
  return (
    <fieldset className="group">
      <legend>Stage ends</legend>
      <div className="segmented" role="radiogroup" aria-label="Stage ends">
        <label>
          <input type="radio" name="end-kind" checked={end.kind === 'duration'} onChange={() => onChange({ kind: 'duration', seconds: SWITCH_DURATION_S }, 'Stage ends')} /> after a time
        </label>
        <label>
          <input
            type="radio"
            name="end-kind"
            checked={end.kind === 'point-temperature'}
            onChange={() => onChange({ kind: 'point-temperature', point: 'centre', temperature: SWITCH_TARGET_K }, 'Stage ends')}
          />{' '}
          when a point reaches a temperature
        </label>
      </div>
      {end.kind === 'duration' ? (
        <QuantityField
          label="Duration"
          kind="duration"
          valueSI={end.seconds}
          system={system}
          check={(s) => (s > 0 ? null : 'must be greater than zero')}
          onCommit={(seconds) => onChange({ kind: 'duration', seconds }, 'Duration', 'seconds')}
          hint="also 5 min, 1 h 30 min"
        />
      ) : (
        <>
          <div className="field">
            <label htmlFor="end-point">Point</label>
            <select
              id="end-point"
              value={end.point}
              onChange={(e) => {
                const point = e.target.value as PointId;
                const { depthM: _old, ...rest } = end;
                onChange(point === 'depth' ? { ...rest, point, depthM: end.depthM ?? 0 } : { ...rest, point }, 'Point');
              }}
            >
              {!choices.some((c) => c.id === end.point) && <option value={end.point}>{end.point} (not on this shape)</option>}
              {choices.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.label}
                </option>
              ))}
            </select>
          </div>
          {end.point === 'depth' && (
            <QuantityField
              label="Depth below the surface"
              kind="length"
              valueSI={end.depthM ?? 0}
              system={system}
              check={(m) => (m >= 0 ? null : 'must not be negative')}
              onCommit={(depthM) => onChange({ ...end, depthM }, 'Depth below the surface', 'depth')}
            />
          )}
          <QuantityField
            label="Target temperature"
            kind="temperature"
            valueSI={end.temperature}
            system={system}
            onCommit={(temperature) => onChange({ ...end, temperature }, 'Target temperature', 'target')}
          />
        </>
      )}
    </fieldset>
  );
}
