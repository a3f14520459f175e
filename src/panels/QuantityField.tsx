import { useEffect, useState } from 'react';
import { formatPosition, formatQuantity, parseQuantity, type Quantity } from '../model/units';

interface QuantityFieldProps {
  readonly id: string;
  readonly label: string;
  readonly quantity: Quantity;
  /** Value in SI units; null when the selected blocks disagree ("mixed"). */
  readonly value: number | null;
  /** Significant digits shown; positions need more than figures do. */
  readonly digits?: number;
  /** For a position: its grid step (m); shown in µm at that step's precision (formatPosition). */
  readonly step?: number;
  /** Applies a parsed value (SI units); returns an error message when it was refused. */
  onCommit(value: number): string | null;
}

/** Counts are shown plainly ("512"), positions at their grid, everything else in engineering notation ("11 fF"). */
function display(value: number | null, quantity: Quantity, digits: number, step: number | undefined): string {
  if (value === null) return '';
  if (step !== undefined) return formatPosition(value, step);
  return quantity === 'count' ? String(value) : formatQuantity(value, quantity, digits);
}

/**
 * A unit-aware input: shows the value in engineering notation ("36.864 µm") and reads what people type
 * ("40u", "40 µm", "0.04 mm", "85 °C", or a bare number in SI units). Commits on Enter or blur, reverts on
 * Escape, and keeps a refused text with the reason beside it.
 */
export function QuantityField({
  id,
  label,
  quantity,
  value,
  digits = 7,
  step,
  onCommit,
}: QuantityFieldProps) {
  const shown = display(value, quantity, digits, step);
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
