import { describe, expect, it } from 'vitest';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { createAppStore } from '../../src/store/appStore';

describe('undo depth of the editor', () => {
  it('undoes and redoes 250 separate edits back to the exact original document', () => {
    const store = createAppStore(demoDesign());
    const original = store.getState().history.present;
    for (let i = 0; i < 250; i++) {
      expect(store.getState().execute(moveBlocks, { ids: ['mat-r0c0'], dx: 36e-9, dy: 0 })).toBe(true);
    }
    const last = store.getState().history.present;
    for (let i = 0; i < 250; i++) store.getState().undo();
    expect(store.getState().history.present).toBe(original);
    for (let i = 0; i < 250; i++) store.getState().redo();
    expect(store.getState().history.present).toBe(last);
  });
});
