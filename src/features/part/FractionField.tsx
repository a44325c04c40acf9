// A dimensionless number between two limits (e.g. emissivity), typed as a plain decimal.
import { useEffect, useId, useRef, useState } from 'react';

export interface FractionFieldProps {
  label: string;
  value: number;
  /** Commit a value that parsed as a number; return a message when the plan refuses it. */
  onCommit: (value: number) => string | null;
}

export function FractionField({ label, value, onCommit }: FractionFieldProps) {
  const id = useId();
  const [text, setText] = useState(String(value));
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  useEffect(() => {
    if (!focused.current) {
      setText(String(value));
      setError(null);
    }
  }, [value]);
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-msg` : undefined}
        onFocus={() => (focused.current = true)}
        onBlur={() => {
          focused.current = false;
          if (!error) setText(String(value));
        }}
        onChange={(e) => {
          setText(e.target.value);
          const n = Number(e.target.value.trim());
          setError(e.target.value.trim() === '' || !Number.isFinite(n) ? `${label}: "${e.target.value}" is not a number.` : onCommit(n));
        }}
      />
      {error && (
        <span id={`${id}-msg`} className="field-error" role="alert">
          ⚠ {error}
        </span>
      )}
    </div>
  );
}
