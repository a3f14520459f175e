import { useEffect, useState } from 'react';
import { MAX_CELLS_PER_LINE } from '../../model/block';
import type { CountRange } from '../../explore/sweepSettings';

interface RangeFieldProps {
  readonly id: string;
  readonly label: string;
  readonly value: CountRange;
  /** Smallest value "from" and "to" may take (1 for cell counts, 0 for spares); the step is at least 1. */
  readonly min?: number;
  /** Largest value. */
  readonly max?: number;
  onCommit(range: CountRange): void;
}

function parseWhole(text: string, min: number, max: number): number | null {
  const n = Number(text.trim());
  return Number.isInteger(n) && n >= min && n <= max ? n : null;
}

/** From, to and step of a swept count: whole numbers (1 to 16,384 unless told); commits on Enter or blur. */
export function RangeField({
  id,
  label,
  value,
  min = 1,
  max = MAX_CELLS_PER_LINE,
  onCommit,
}: RangeFieldProps) {
  const [text, setText] = useState({ from: `${value.from}`, to: `${value.to}`, step: `${value.step}` });
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setText({ from: `${value.from}`, to: `${value.to}`, step: `${value.step}` });
    setError(null);
  }, [value]);

  const commit = () => {
    const from = parseWhole(text.from, min, max);
    const to = parseWhole(text.to, min, max);
    const step = parseWhole(text.step, 1, max);
    if (from === null || to === null || step === null) {
      setError(`whole numbers from ${min} to ${max.toLocaleString('en-US')}`);
      return;
    }
    if (to < from) {
      setError('"to" must not be below "from"');
      return;
    }
    setError(null);
    if (from !== value.from || to !== value.to || step !== value.step) onCommit({ from, to, step });
  };
  const part = (key: keyof CountRange, title: string) => (
    <input
      data-testid={`${id}-${key}`}
      aria-label={`${label}: ${title}`}
      value={text[key]}
      inputMode="numeric"
      aria-invalid={error !== null}
      onChange={(e) => setText({ ...text, [key]: e.target.value })}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
      }}
    />
  );
  return (
    <div className="range-field">
      <span className="range-label">{label}</span>
      <span className="range-inputs">
        {part('from', 'from')} to {part('to', 'to')} step {part('step', 'step')}
      </span>
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
