import { textLengthPriming } from '../io/designTextLength';
import type { Design } from '../model/design';
import type { AppStore } from '../store/appStore';
import { requestIdle } from './idleTime';

/** Idle time left below which the primer hands the page back (ms). */
const MIN_IDLE_MS = 2;

/**
 * Measures the open design's text length in idle time whenever the present design changes, so the
 * edit check (which refuses an edit whose text restore would not read) finds every block list measured
 * and the first edit after opening a whole die stays quick. After an edit the lists are known already
 * and a run ends at once. A newer design replaces the one being measured. Returns the unsubscribe.
 */
export function primeTextLengths(store: AppStore): () => void {
  let current: { design: Design; steps: Generator<void, void, void> } | null = null;
  let scheduled = false;

  const run = (deadline: { timeRemaining(): number }) => {
    scheduled = false;
    if (!current) return;
    do {
      if (current.steps.next().done) {
        current = null;
        return;
      }
    } while (deadline.timeRemaining() > MIN_IDLE_MS);
    scheduled = true;
    requestIdle(run);
  };

  const start = (design: Design) => {
    if (current?.design === design) return;
    current = { design, steps: textLengthPriming(design) };
    if (!scheduled) {
      scheduled = true;
      requestIdle(run);
    }
  };

  start(store.getState().history.present);
  return store.subscribe((state, previous) => {
    if (state.history.present !== previous.history.present) start(state.history.present);
  });
}
