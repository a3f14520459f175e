/** One choice of a select field: the value it stands for and what the user reads. */
export interface SelectOption<T extends string> {
  readonly value: T;
  readonly label: string;
}

interface SelectFieldProps<T extends string> {
  /** Element id, and the test id unless `testId` says otherwise. */
  readonly id: string;
  readonly label: string;
  readonly options: readonly SelectOption<T>[];
  /** The chosen value, or null when there is none to show (several blocks that differ, say). */
  readonly value: T | null;
  /** Shown as the choice while `value` is null; picking it changes nothing. */
  readonly noValueLabel?: string;
  readonly testId?: string;
  onChange(value: T): void;
}

/** A labelled select in the panels' field layout. */
export function SelectField<T extends string>({
  id,
  label,
  options,
  value,
  noValueLabel = '',
  testId = id,
  onChange,
}: SelectFieldProps<T>) {
  return (
    <div className="field">
      <label htmlFor={id}>{label}</label>
      <select
        id={id}
        data-testid={testId}
        value={value ?? ''}
        onChange={(e) => {
          // The options are the only values the element can hold besides the empty no-value choice.
          const picked = options.find((o) => o.value === e.target.value);
          if (picked) onChange(picked.value);
        }}
      >
        {value === null && <option value="">{noValueLabel}</option>}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}
