// How strongly the medium takes heat: one h, or h as a function of surface temperature
// (a boiling curve from the library, or rows typed by the user).
import type { HeatTransfer } from '@/schema/planSchema';
import type { BoilingCurve } from '@/library/libraryEntrySchema';
import { celsiusToKelvin } from '@/schema/planTemperatures';
import type { UnitSystem } from '@/features/units/unitSystem';
import { displayUnit } from '@/features/units/quantityUnits';
import { QuantityField } from '@/features/part/QuantityField';

/** A table started from a constant h spans these surface temperatures (kelvin). */
const TABLE_START_K = 373.15;
const TABLE_END_K = 1173.15;
/** Row added at the end of a table: this many kelvin above the last one. */
const NEW_ROW_STEP_K = 100;

export interface HeatTransferEditorProps {
  heatTransfer: HeatTransfer;
  boilingCurve?: BoilingCurve;
  system: UnitSystem;
  onChange: (heatTransfer: HeatTransfer, fieldLabel: string, mergeKey?: string) => string | null;
}

export function HeatTransferEditor({ heatTransfer, boilingCurve, system, onChange }: HeatTransferEditorProps) {
  const positive = (v: number) => (v > 0 ? null : 'must be greater than zero');
  const toTable = (): HeatTransfer =>
    boilingCurve
      ? { kind: 'surface-table', rows: boilingCurve.hWPerM2KBySurfaceC.map(([c, h]) => [celsiusToKelvin(c), h]) }
      : { kind: 'surface-table', rows: [[TABLE_START_K, (heatTransfer as { hWPerM2K: number }).hWPerM2K], [TABLE_END_K, (heatTransfer as { hWPerM2K: number }).hWPerM2K]] };
  return (
    <div className="subgroup">
      <div className="segmented" role="radiogroup" aria-label="Heat transfer coefficient: one value or by surface temperature">
        <label>
          <input
            type="radio"
            name="h-form"
            checked={heatTransfer.kind === 'constant'}
            onChange={() => heatTransfer.kind === 'surface-table' && onChange({ kind: 'constant', hWPerM2K: Math.max(...heatTransfer.rows.map((r) => r[1])) }, 'Heat transfer coefficient')}
          />{' '}
          one h
        </label>
        <label>
          <input type="radio" name="h-form" checked={heatTransfer.kind === 'surface-table'} onChange={() => heatTransfer.kind === 'constant' && onChange(toTable(), 'Heat transfer coefficient')} /> h by surface temperature
          (boiling curve)
        </label>
      </div>
      {heatTransfer.kind === 'constant' ? (
        <QuantityField
          label="Heat transfer coefficient h"
          kind="heatTransferCoefficient"
          valueSI={heatTransfer.hWPerM2K}
          system={system}
          check={positive}
          onCommit={(h) => onChange({ kind: 'constant', hWPerM2K: h }, 'Heat transfer coefficient h', 'h')}
        />
      ) : (
        <>
          {boilingCurve && <p className="source-line">{boilingCurve.label}</p>}
          <table className="rows-table">
            <caption>h by surface temperature</caption>
            <thead>
              <tr>
                <th scope="col">Surface temperature ({displayUnit('temperature', system).symbol})</th>
                <th scope="col">h ({displayUnit('heatTransferCoefficient', system).symbol})</th>
                <th scope="col">
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {heatTransfer.rows.map(([tK, h], i) => (
                <tr key={i}>
                  <td>
                    <QuantityField
                      compact
                      label={`h table row ${i + 1} surface temperature`}
                      kind="temperature"
                      valueSI={tK}
                      system={system}
                      onCommit={(t) => onChange({ kind: 'surface-table', rows: heatTransfer.rows.map((r, j) => (j === i ? [t, r[1]] : r)) }, `h table row ${i + 1} surface temperature`, `hrow${i}.t`)}
                    />
                  </td>
                  <td>
                    <QuantityField
                      compact
                      label={`h table row ${i + 1} h`}
                      kind="heatTransferCoefficient"
                      valueSI={h}
                      system={system}
                      check={positive}
                      onCommit={(x) => onChange({ kind: 'surface-table', rows: heatTransfer.rows.map((r, j) => (j === i ? [r[0], x] : r)) }, `h table row ${i + 1} h`, `hrow${i}.h`)}
                    />
                  </td>
                  <td>
                    <button
                      type="button"
                      className="icon-button"
                      disabled={heatTransfer.rows.length <= 2}
                      aria-label={`Remove h table row ${i + 1}`}
                      onClick={() => onChange({ kind: 'surface-table', rows: heatTransfer.rows.filter((_, j) => j !== i) }, 'h table')}
                    >
                      ✕
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <button
            type="button"
            onClick={() => {
              const [lastT, lastH] = heatTransfer.rows[heatTransfer.rows.length - 1];
              onChange({ kind: 'surface-table', rows: [...heatTransfer.rows, [lastT + NEW_ROW_STEP_K, lastH]] }, 'h table');
            }}
          >
            Add row to h table
          </button>
        </>
      )}
    </div>
  );
}
