import { useEditorStore } from '../store/editorStore';
import { useShownReport } from '../store/liveReport';
import { useAppStore } from '../store/useAppStore';

/** Findings listed at most; a broken 4,096-mat floorplan can have thousands. */
const MAX_LISTED = 200;

/**
 * Findings of the checks, errors first, following a drag live. Clicking one selects the blocks it names
 * and frames them on the canvas, where they are marked in the colour of their severity.
 */
export function ChecksPanel() {
  const report = useShownReport();
  const findings = report.findings;
  // With no mat there is nothing the checks could fail on; 'all clear' would claim too much.
  const empty = report.totals.matCount === 0 && findings.length === 0;
  const select = useAppStore((s) => s.select);
  const requestFrame = useEditorStore((s) => s.requestFrame);
  const ordered = [...findings].sort((a, b) =>
    a.severity === b.severity ? 0 : a.severity === 'error' ? -1 : 1,
  );
  return (
    <section className="panel" aria-labelledby="checks-heading">
      <h2 id="checks-heading">
        Checks{' '}
        <span className="count">
          {empty ? 'nothing yet' : findings.length === 0 ? 'all clear' : findings.length}
        </span>
      </h2>
      {empty ? (
        <p className="hint" data-testid="checks-empty">
          Nothing to check yet: draw a mat, then the strips and decoders that serve it.
        </p>
      ) : ordered.length === 0 ? (
        <p className="hint" data-testid="checks-clear">
          Every bit line reaches a sense amplifier and a column decoder, every word line a driver and a row
          decoder, and no blocks overlap.
        </p>
      ) : (
        <ul className="findings" data-testid="findings">
          {ordered.slice(0, MAX_LISTED).map((f, i) => (
            <li key={`${f.kind}-${i}`} className={f.severity}>
              <button
                type="button"
                data-testid={`finding-${f.kind}`}
                onClick={() => {
                  select(f.blockIds);
                  requestFrame(f.blockIds);
                }}
                disabled={f.blockIds.length === 0}
                title="Select and frame the blocks of this finding"
              >
                <span className="severity">{f.severity}</span> {f.message}
              </button>
            </li>
          ))}
          {ordered.length > MAX_LISTED && (
            <li className="hint">and {ordered.length - MAX_LISTED} more; fix the ones above first</li>
          )}
        </ul>
      )}
    </section>
  );
}
