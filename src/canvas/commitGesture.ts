import { addedBlockIds } from '../commands/blockIds';
import type { AppStore } from '../store/appStore';
import type { GestureResult } from './gestures/gesture';

/**
 * Hands a finished gesture's result to the store: runs its command (one undo step) and selects what it
 * asks for — the blocks the command added, or named ids. A click that never became a drag selects
 * `clickSelection` first (a press on a selected block narrows the selection only if nothing moved).
 */
export function commitGesture(
  app: AppStore,
  result: GestureResult,
  clickSelection: readonly string[] | undefined,
): void {
  const store = app.getState();
  if (clickSelection) store.select(clickSelection);
  const wanted = result.select;
  if (result.call) {
    const before = store.history.present;
    if (store.execute(result.call.command, result.call.args)) {
      if (wanted === 'added') store.select(addedBlockIds(before, app.getState().history.present));
      else if (wanted) store.select(wanted);
    }
  } else if (wanted && wanted !== 'added') {
    store.select(wanted);
  }
}
