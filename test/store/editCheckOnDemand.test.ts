import { describe, expect, it } from 'vitest';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { editProblems } from '../../src/io/editCheck';
import { createAppStore, type EditCheck, type EditCheckSource } from '../../src/store/appStore';

/** An edit check that arrives when the test says so, as the app's does after the first paint. */
function lateEditCheck(): EditCheckSource & { arrive(): Promise<void> } {
  let loaded: EditCheck | null = null;
  let resolve: (check: EditCheck) => void = () => undefined;
  const arrival = new Promise<EditCheck>((r) => (resolve = r));
  return {
    now: () => loaded,
    load: () => arrival,
    async arrive() {
      loaded = editProblems;
      resolve(editProblems);
      await arrival;
      // Let the store's continuation run.
      await new Promise((r) => setTimeout(r, 0));
    },
  };
}

describe('edits made before the edit check has loaded', () => {
  it('keeps edits that restore and undoes the first that does not, with everything after it', async () => {
    const checks = lateEditCheck();
    const store = createAppStore(demoDesign(), checks);
    const start = store.getState().history.present;
    expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 36e-9, dy: 0 })).toBe(true);
    const good = store.getState().history.present;
    const goodReport = store.getState().report;
    // Off the die: restore would refuse it, but nothing can say so yet.
    expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 1, dy: 0 })).toBe(true);
    expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c1'], dx: 36e-9, dy: 0 })).toBe(true);
    expect(store.getState().history.past).toHaveLength(3);

    await checks.arrive();
    const state = store.getState();
    expect(state.history.present).toBe(good);
    expect(state.history.past).toEqual([start]);
    expect(state.history.future).toEqual([]);
    expect(state.lastError).toMatch(/^Move was refused: .*x must lie between/);
    expect(state.report).toBe(goodReport);

    // From now on the check runs at once and a bad edit changes nothing.
    expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 1, dy: 0 })).toBe(false);
    expect(store.getState().history.present).toBe(good);
  });

  it('leaves a history of good edits untouched', async () => {
    const checks = lateEditCheck();
    const store = createAppStore(demoDesign(), checks);
    store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 36e-9, dy: 0 });
    store.getState().undo();
    const before = store.getState().history;
    await checks.arrive();
    expect(store.getState().history).toBe(before);
    expect(store.getState().lastError).toBeNull();
  });
});
