import { describe, expect, it, vi } from 'vitest';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { setMatCellCounts } from '../../src/commands/setMatCellCounts';
import { demoDesign } from '../../src/designs/demoDesign';
import { evaluate } from '../../src/engine';

// The app loads the engine's edit path after its first paint; here it never arrives, so every edit must
// be evaluated whole — and give the report the incremental path would (evaluate() is its oracle).
const asked = vi.hoisted(() => ({ count: 0 }));
vi.mock('../../src/store/editPathOnDemand', () => ({
  loadedEditPath: () => {
    asked.count++;
    return null;
  },
  loadEditPath: () => new Promise(() => undefined),
}));

describe('edits made before the edit path has loaded', () => {
  it('are evaluated whole, and undo and redo give the reports of their designs', async () => {
    const { createAppStore } = await import('../../src/store/appStore');
    const store = createAppStore(demoDesign());
    expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 36e-9, dy: 0 })).toBe(true);
    const mat = store.getState().history.present.blocks.find((b) => b.id === 'mat-r0c1');
    if (!mat || mat.type !== 'mat') throw new Error('demo mat missing');
    expect(
      store.getState().execute(setMatCellCounts, {
        matIds: [mat.id],
        cellsPerBitline: mat.cellsPerBitline / 2,
        cellsPerWordline: mat.cellsPerWordline,
      }),
    ).toBe(true);
    expect(store.getState().report).toEqual(evaluate(store.getState().history.present));
    // Both edits were in place, so the store asked for the edit path each time and went on without it.
    expect(asked.count).toBeGreaterThanOrEqual(2);
    store.getState().undo();
    expect(store.getState().report).toEqual(evaluate(store.getState().history.present));
    store.getState().redo();
    expect(store.getState().report).toEqual(evaluate(store.getState().history.present));
  });
});
