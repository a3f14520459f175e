import { applyBuiltinProcess, setOffsetStacking, setProcessValue } from '../commands/processCommands';
import { setOperatingValue } from '../commands/setOperatingValue';
import { BUILTIN_PROCESSES } from '../model/builtins';
import type { OffsetStacking } from '../model/process';
import { OPERATING_FIELDS, PROCESS_FIELDS } from '../model/fieldCatalog';
import { useAppStore } from '../store/useAppStore';
import { QuantityField } from './QuantityField';
import { SelectField, type SelectOption } from './SelectField';
import { useRunCommand } from './useRunCommand';

const STACKING_OPTIONS: readonly SelectOption<OffsetStacking>[] = [
  { value: 'linear', label: 'linearly (worst case)' },
  { value: 'rss', label: 'as root sum of squares' },
];

/** The design's own process profile and operating conditions, with built-ins to start from. */
export function ProcessPanel() {
  const process = useAppStore((s) => s.history.present.process);
  const operating = useAppStore((s) => s.history.present.operating);
  const run = useRunCommand();
  const builtin = BUILTIN_PROCESSES.find((p) => p.id === process.id);
  const edited = builtin !== undefined && PROCESS_FIELDS.some((f) => builtin[f.key] !== process[f.key]);

  return (
    <>
      <section className="panel" aria-labelledby="process-heading">
        <h2 id="process-heading">Process</h2>
        <SelectField
          id="builtin-process"
          label="Start from"
          value={builtin ? builtin.id : null}
          noValueLabel="(own profile)"
          options={BUILTIN_PROCESSES.map((p) => ({ value: p.id, label: p.name }))}
          onChange={(processId) => run(applyBuiltinProcess, { processId })}
        />
        <p className="hint">{process.description}</p>
        <div className="panel-actions">
          <button
            type="button"
            data-testid="reset-process"
            disabled={!edited}
            onClick={() => builtin && run(applyBuiltinProcess, { processId: builtin.id })}
            title="Restore every value of the built-in profile"
          >
            Reset to built-in
          </button>
          {edited && <span className="hint">edited</span>}
        </div>
        {PROCESS_FIELDS.map((f) => (
          <QuantityField
            key={f.key}
            id={`process-${f.key}`}
            label={f.label}
            quantity={f.quantity}
            value={process[f.key]}
            onCommit={(value) => run(setProcessValue, { field: f.key, value })}
          />
        ))}
        <SelectField
          id="offset-stacking"
          label="Offset and noise add"
          value={process.offsetStacking}
          options={STACKING_OPTIONS}
          onChange={(stacking) => run(setOffsetStacking, { stacking })}
        />
      </section>
      <section className="panel" aria-labelledby="operating-heading">
        <h2 id="operating-heading">Operating conditions</h2>
        {OPERATING_FIELDS.map((f) => (
          <QuantityField
            key={f.key}
            id={`operating-${f.key}`}
            label={f.label}
            quantity={f.quantity}
            value={operating[f.key]}
            onCommit={(value) => run(setOperatingValue, { field: f.key, value })}
          />
        ))}
      </section>
    </>
  );
}
