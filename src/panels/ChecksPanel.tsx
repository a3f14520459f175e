import { useAppStore } from '../store/useAppStore';

/** Findings of the checks, errors first; clicking one selects the blocks it names. */
export function ChecksPanel() {
  const findings = useAppStore((s) => s.report.findings);
  const select = useAppStore((s) => s.select);
  const ordered = [...findings].sort((a, b) =>
    a.severity === b.severity ? 0 : a.severity === 'error' ? -1 : 1,
  );
  return (
    <section className="panel" aria-labelledby="checks-heading">
      <h2 id="checks-heading">
        Checks <span className="count">{findings.length === 0 ? 'all clear' : findings.length}</span>
      </h2>
      {ordered.length === 0 ? (
        <p className="hint" data-testid="checks-clear">
          Every bit line reaches a sense amplifier, every word line a driver, and no blocks overlap.
        </p>
      ) : (
        <ul className="findings" data-testid="findings">
          {ordered.map((f, i) => (
            <li key={`${f.kind}-${i}`} className={f.severity}>
              <button type="button" onClick={() => select(f.blockIds)} disabled={f.blockIds.length === 0}>
                <span className="severity">{f.severity}</span> {f.message}
              </button>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
