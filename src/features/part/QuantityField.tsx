// A number input in the chosen unit system. Text is parsed at each keystroke (units helpers);
// a good value is handed to onCommit at once, so results follow the typing. A bad value shows a
// message naming the field and the plan keeps its last good value.
import { useEffect, useId, useRef, useState } from 'react';
import type { UnitSystem } from '@/features/units/unitSystem';
import { QUANTITY_UNITS, displayUnit, type QuantityKind } from '@/features/units/quantityUnits';
import { parseQuantity } from '@/features/units/parseQuantity';

/** Digits kept when a value in SI is written back into a field (enough not to lose a typed value). */
const FIELD_SIGNIFICANT_DIGITS = 6;
/** Typed text and stored value agree when within this relative difference (float rounding of unit factors). */
const SAME_VALUE_RELATIVE = 1e-9;

export function fieldText(kind: QuantityKind, valueSI: number, system: UnitSystem): string {
  return String(Number(displayUnit(kind, system).fromSI(valueSI).toPrecision(FIELD_SIGNIFICANT_DIGITS)));
}

export interface QuantityFieldProps {
  label: string;
  kind: QuantityKind;
  valueSI: number;
  system: UnitSystem;
  /** Commit a parsed value; return a message when the plan refuses it. */
  onCommit: (valueSI: number) => string | null;
  /** Extra check on the parsed value (e.g. "must be greater than zero"); a message refuses it. */
  check?: (valueSI: number) => string | null;
  hint?: string;
  compact?: boolean;
}

export function QuantityField({ label, kind, valueSI, system, onCommit, check, hint, compact }: QuantityFieldProps) {
  const id = useId();
  const [text, setText] = useState(() => fieldText(kind, valueSI, system));
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  const unit = displayUnit(kind, system);

  const textRef = useRef(text);
  textRef.current = text;
  // A change from outside (undo, unit switch, another control) rewrites the text, unless the user is
  // typing here and the text already says this value.
  useEffect(() => {
    const typed = parseQuantity(kind, textRef.current, system);
    const saysThisValue = typed.ok && Math.abs(typed.valueSI - valueSI) <= SAME_VALUE_RELATIVE * Math.abs(valueSI);
    if (!focused.current || !saysThisValue) {
      setText(fieldText(kind, valueSI, system));
      setError(null);
    }
  }, [kind, valueSI, system]);

  const onChange = (next: string) => {
    setText(next);
    const parsed = parseQuantity(kind, next, system);
    if (!parsed.ok) return setError(parsed.message.replace(QUANTITY_UNITS[kind].name, label));
    const refused = check?.(parsed.valueSI) ?? null;
    if (refused) return setError(`${label}: ${refused}`);
    const rejected = onCommit(parsed.valueSI);
    if (rejected) return setError(rejected);
    setError(null);
  };

  return (
    <div className={compact ? 'field field-compact' : 'field'}>
      <label htmlFor={id}>
        {label} <span className="field-unit">({unit.symbol})</span>
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error || hint ? `${id}-msg` : undefined}
        onFocus={() => (focused.current = true)}
        onBlur={() => {
          focused.current = false;
          if (!error) setText(fieldText(kind, valueSI, system));
        }}
        onChange={(e) => onChange(e.target.value)}
      />
      {error ? (
        <span id={`${id}-msg`} className="field-error" role="alert">
          ⚠ {error}
        </span>
      ) : hint ? (
        <span id={`${id}-msg`} className="field-hint">
          {hint}
        </span>
      ) : null}
    </div>
  );
}
