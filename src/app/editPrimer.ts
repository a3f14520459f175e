import type { Report } from '../engine';
import type { AppStore } from '../store/appStore';
import { loadEditPath, loadedEditPath } from '../store/editPathOnDemand';
import { requestIdle } from './idleTime';

/**
 * Builds in idle time what the first edit of the present report starts from and a whole evaluation
 * leaves to first use (the components the decoders reach through, engine reportState.prepareForEdits),
 * whenever the report changes: otherwise the first drag after opening a whole die would label them in
 * its first frame. A newer report replaces one still waiting. Returns the unsubscribe.
 */
export function primeEdits(store: AppStore): () => void {
  let waiting: Report | null = null;
  const run = () => {
    const report = waiting;
    waiting = null;
    if (!report) return;
    // The edit path loads after the first paint; the index is built once it is here.
    const path = loadedEditPath();
    if (path) path.prepareForEdits(report);
    else
      loadEditPath().then(
        (loaded) => loaded.prepareForEdits(report),
        () => undefined,
      );
  };
  const start = (report: Report) => {
    if (waiting === null) requestIdle(run);
    waiting = report;
  };
  start(store.getState().report);
  return store.subscribe((state, previous) => {
    if (state.report !== previous.report) start(state.report);
  });
}
