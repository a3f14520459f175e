import { useEffect, useState } from 'react';
import { parseQuantity } from '../model/units';

interface CountFieldProps {
  readonly id: string;
  readonly label: string;
  /** Value shown when the field is not being edited; null when the selection disagrees. */
  readonly value: number | null;
  /** Applies a parsed value; returns an error message when it was refused. */
  onCommit(value: number): string | null;
}

/**
 * A whole-number input that accepts engineering notation ("1k"), commits on Enter or blur, reverts on
 * Escape, and shows why a value was refused without losing what was typed.
 */
export function CountField({ id, label, value, onCommit }: CountFieldProps) {
  const shown = value === null ? '' : String(value);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);

  const commit = () => {
    if (text === shown) return;
    const parsed = parseQuantity(text, 'count');
    if (!parsed.ok) {
      setError(parsed.error);
      return;
    }
    setError(onCommit(parsed.value));
  };

  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <input
        id={id}
        data-testid={id}
        inputMode="numeric"
        value={text}
        placeholder={value === null ? 'mixed' : undefined}
        aria-invalid={error !== null}
        aria-describedby={error ? `${id}-error` : undefined}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') {
            setText(shown);
            setError(null);
          }
        }}
      />
      {error && (
        <p className="field-error" id={`${id}-error`} role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
