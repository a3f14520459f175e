import { applyBuiltinProcess, setOffsetStacking, setProcessValue } from '../commands/processCommands';
import { setOperatingValue } from '../commands/setOperatingValue';
import { BUILTIN_PROCESSES } from '../model/builtins';
import { OPERATING_FIELDS, PROCESS_FIELDS } from '../model/fieldCatalog';
import { useAppStore } from '../store/useAppStore';
import { QuantityField } from './QuantityField';
import { useRunCommand } from './useRunCommand';

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
        <div className="field">
          <label htmlFor="builtin-process">Start from</label>
          <select
            id="builtin-process"
            data-testid="builtin-process"
            value={builtin ? builtin.id : ''}
            onChange={(e) => run(applyBuiltinProcess, { processId: e.target.value })}
          >
            {!builtin && <option value="">(own profile)</option>}
            {BUILTIN_PROCESSES.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        </div>
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
        <div className="field">
          <label htmlFor="offset-stacking">Offset and noise add</label>
          <select
            id="offset-stacking"
            value={process.offsetStacking}
            onChange={(e) =>
              run(setOffsetStacking, { stacking: e.target.value === 'rss' ? 'rss' : 'linear' })
            }
          >
            <option value="linear">linearly (worst case)</option>
            <option value="rss">as root sum of squares</option>
          </select>
        </div>
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
