import { useState } from 'react';

interface NameFieldProps {
  readonly value: string;
  /** Applies the new name; returns an error message when it was refused. */
  onCommit(name: string): string | null;
}

/** The name of one block; commits on Enter or blur, reverts on Escape. Remount it per block (key). */
export function NameField({ value, onCommit }: NameFieldProps) {
  const [text, setText] = useState(value);
  const [error, setError] = useState<string | null>(null);
  const commit = () => {
    if (text === value) return;
    setError(onCommit(text.trim()));
  };
  return (
    <div className="field">
      <label htmlFor="block-name">Name</label>
      <input
        id="block-name"
        data-testid="block-name"
        value={text}
        maxLength={120}
        aria-invalid={error !== null}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') setText(value);
        }}
      />
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
