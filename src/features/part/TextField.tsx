// A text input that commits each change it accepts; a refused value shows why and is not committed.
import { useEffect, useId, useRef, useState } from 'react';

export interface TextFieldProps {
  label: string;
  value: string;
  onCommit: (value: string) => string | null;
  multiline?: boolean;
}

export function TextField({ label, value, onCommit, multiline }: TextFieldProps) {
  const id = useId();
  const [text, setText] = useState(value);
  const [error, setError] = useState<string | null>(null);
  const focused = useRef(false);
  const textRef = useRef(text);
  textRef.current = text;
  // An outside change (undo, another control) rewrites the text unless it already says this value.
  useEffect(() => {
    if (!focused.current || textRef.current !== value) {
      setText(value);
      setError(null);
    }
  }, [value]);
  const props = {
    id,
    value: text,
    'aria-invalid': error ? true : undefined,
    'aria-describedby': error ? `${id}-msg` : undefined,
    onFocus: () => (focused.current = true),
    onBlur: () => {
      focused.current = false;
      if (!error) setText(value);
    },
    onChange: (e: { target: { value: string } }) => {
      setText(e.target.value);
      setError(onCommit(e.target.value));
    },
  };
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      {multiline ? <textarea rows={2} {...props} /> : <input type="text" {...props} />}
      {error && (
        <span id={`${id}-msg`} className="field-error" role="alert">
          ⚠ {error}
        </span>
      )}
    </div>
  );
}
