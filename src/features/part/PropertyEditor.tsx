// One material property: a constant, or a table of (temperature, value) rows.
// Each edit is checked with the plan's propertySchema (rows must rise in temperature).
import { propertySchema, type PropertyInput } from '@/schema/planSchema';
import { displayUnit, type QuantityKind } from '@/features/units/quantityUnits';
import { formatQuantity } from '@/features/units/formatQuantity';
import type { UnitSystem } from '@/features/units/unitSystem';
import { QuantityField } from './QuantityField';
import { validateEdit } from './validateEdit';

/** A constant turned into a table starts with two equal rows: at 20 degC and this step above. */
const TABLE_FIRST_ROW_K = 293.15;
/** Row added at the end of a table: this many kelvin above the last one. */
const NEW_ROW_STEP_K = 100;

export interface PropertyEditorProps {
  label: string;
  kind: QuantityKind;
  value: PropertyInput;
  system: UnitSystem;
  /** Commit a checked value; the merge key groups keystrokes in one field into one undo step. */
  onChange: (value: PropertyInput, mergeKey: string) => void;
}

export function PropertyEditor({ label, kind, value, system, onChange }: PropertyEditorProps) {
  const commit = (candidate: unknown, mergeKey: string): string | null => {
    const checked = validateEdit(propertySchema, candidate, label);
    if (!checked.ok) return checked.message;
    onChange(checked.value, mergeKey);
    return null;
  };
  const positive = (v: number) => (v > 0 ? null : 'must be greater than zero');

  return (
    <fieldset className="property">
      <legend>{label}</legend>
      <div className="segmented" role="radiogroup" aria-label={`${label}: constant or table`}>
        <label>
          <input type="radio" name={`${label}-form`} checked={typeof value === 'number'} onChange={() => typeof value !== 'number' && commit(value.table[0][1], `${label}.form`)} /> constant
        </label>
        <label>
          <input
            type="radio"
            name={`${label}-form`}
            checked={typeof value !== 'number'}
            onChange={() => typeof value === 'number' && commit({ table: [[TABLE_FIRST_ROW_K, value], [TABLE_FIRST_ROW_K + NEW_ROW_STEP_K, value]] }, `${label}.form`)}
          />{' '}
          table by temperature
        </label>
      </div>
      {typeof value === 'number' ? (
        <QuantityField label={label} kind={kind} valueSI={value} system={system} check={positive} onCommit={(v) => commit(v, `${label}.constant`)} />
      ) : (
        <details>
          <summary>
            {value.table.length} rows, {formatQuantity(kind, Math.min(...value.table.map((r) => r[1])), system)} to {formatQuantity(kind, Math.max(...value.table.map((r) => r[1])), system)} over{' '}
            {formatQuantity('temperature', value.table[0][0], system)} to {formatQuantity('temperature', value.table[value.table.length - 1][0], system)}
          </summary>
        <table className="rows-table">
          <thead>
            <tr>
              <th scope="col">Temperature ({displayUnit('temperature', system).symbol})</th>
              <th scope="col">
                {label} ({displayUnit(kind, system).symbol})
              </th>
              <th scope="col">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {value.table.map(([tK, v], i) => (
              <tr key={i}>
                <td>
                  <QuantityField
                    compact
                    label={`${label}, row ${i + 1} temperature`}
                    kind="temperature"
                    valueSI={tK}
                    system={system}
                    onCommit={(t) => commit({ table: value.table.map((r, j) => (j === i ? [t, r[1]] : r)) }, `${label}.row${i}.t`)}
                  />
                </td>
                <td>
                  <QuantityField
                    compact
                    label={`${label}, row ${i + 1}`}
                    kind={kind}
                    valueSI={v}
                    system={system}
                    check={positive}
                    onCommit={(x) => commit({ table: value.table.map((r, j) => (j === i ? [r[0], x] : r)) }, `${label}.row${i}.v`)}
                  />
                </td>
                <td>
                  <button type="button" className="icon-button" disabled={value.table.length <= 2} aria-label={`Remove ${label} row ${i + 1}`} onClick={() => commit({ table: value.table.filter((_, j) => j !== i) }, `${label}.rows`)}>
                    ✕
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
          <tfoot>
            <tr>
              <td colSpan={3}>
                <button
                  type="button"
                  onClick={() => {
                    const [lastT, lastV] = value.table[value.table.length - 1];
                    commit({ table: [...value.table, [lastT + NEW_ROW_STEP_K, lastV]] }, `${label}.rows`);
                  }}
                >
                  Add row to {label.toLowerCase()}
                </button>
              </td>
            </tr>
          </tfoot>
        </table>
        </details>
      )}
    </fieldset>
  );
}
