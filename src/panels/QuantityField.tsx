import { useEffect, useState } from 'react';
import { formatQuantity, parseQuantity, type Quantity } from '../model/units';

interface QuantityFieldProps {
  readonly id: string;
  readonly label: string;
  readonly quantity: Quantity;
  /** SI value shown when the field is not being edited; null when a multi-selection disagrees. */
  readonly value: number | null;
  /** Applies a parsed SI value; returns an error message when it was refused. */
  onCommit(value: number): string | null;
}

/** Counts are shown plainly ("512"), everything else in engineering notation ("11 fF"). */
function display(value: number | null, quantity: Quantity): string {
  if (value === null) return '';
  return quantity === 'count' ? String(value) : formatQuantity(value, quantity, 6);
}

/**
 * A unit-aware input: accepts engineering notation ("25f", "25 fF", "0.12u", "85 °C"), commits on Enter
 * or blur, reverts on Escape, and shows why a value was refused without losing what was typed.
 */
export function QuantityField({ id, label, quantity, value, onCommit }: QuantityFieldProps) {
  const shown = display(value, quantity);
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText(shown);
    setError(null);
  }, [shown]);

  const commit = () => {
    if (text === shown) return;
    const parsed = parseQuantity(text, quantity);
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
