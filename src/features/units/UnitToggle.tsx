// The SI / US switch for the shell's header: two radio buttons in a labelled group, so arrow keys move
// between them and a screen reader reads the choice. Props in, markup out.
import { useId } from 'react';
import { UNIT_SYSTEMS, type UnitSystem } from './unitSystem';
import './UnitToggle.css';

export interface UnitToggleProps {
  value: UnitSystem;
  onChange: (system: UnitSystem) => void;
}

export function UnitToggle({ value, onChange }: UnitToggleProps) {
  const name = useId();
  return (
    <fieldset className="unit-toggle">
      <legend className="unit-toggle__legend">Units</legend>
      {UNIT_SYSTEMS.map((system) => (
        <label key={system.id} className="unit-toggle__option" title={system.title}>
          <input type="radio" name={name} value={system.id} checked={value === system.id} onChange={() => onChange(system.id)} />
          <span>{system.label}</span>
        </label>
      ))}
    </fieldset>
  );
}
