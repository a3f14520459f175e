import { describe, expect, it } from 'vitest';
import { setMatCellCounts } from '../../src/commands/setMatCellCounts';
import { findMatReport } from '../../src/engine';
import { demoDesign } from '../../src/designs/demoDesign';
import { createAppStore } from '../../src/store/appStore';

describe('command: set cells per line', () => {
  it('runs, undoes and redoes, with the report following each step', () => {
    const store = createAppStore(demoDesign());
    const cbl = () =>
      findMatReport(store.getState().report, 'mat-r0c0')?.figures.bitlineCapacitance.total ?? NaN;
    const original = cbl();
    const originalDesign = store.getState().history.present;

    expect(store.getState().execute(setMatCellCounts, { matIds: ['mat-r0c0'], cellsPerBitline: 256 })).toBe(
      true,
    );
    const edited = cbl();
    expect(edited).toBeLessThan(original);
    const mat = store.getState().history.present.blocks.find((b) => b.id === 'mat-r0c0');
    expect(mat?.type === 'mat' && mat.cellsPerBitline).toBe(256);

    store.getState().undo();
    expect(store.getState().history.present).toBe(originalDesign);
    expect(cbl()).toBe(original);

    store.getState().redo();
    expect(cbl()).toBe(edited);
    expect(store.getState().history.future).toHaveLength(0);
  });

  it('changes several mats in one undo step and shares the blocks it did not touch', () => {
    const before = demoDesign();
    const result = setMatCellCounts.run(before, { matIds: ['mat-r0c0', 'mat-r0c1'], cellsPerWordline: 128 });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    const changed = result.design.blocks.filter((b, i) => b !== before.blocks[i]).map((b) => b.id);
    expect(changed).toEqual(['mat-r0c0', 'mat-r0c1']);
  });

  it.each([
    [-5, 'whole number from 1 to 16,384'],
    [0, 'whole number'],
    [12.5, 'whole number'],
    [Number.NaN, 'whole number'],
    [1e9, 'whole number'],
  ])('refuses %s cells per bit line and leaves the document untouched', (value, message) => {
    const store = createAppStore(demoDesign());
    const before = store.getState().history.present;
    expect(store.getState().execute(setMatCellCounts, { matIds: ['mat-r0c0'], cellsPerBitline: value })).toBe(
      false,
    );
    expect(store.getState().lastError).toContain(message);
    expect(store.getState().history.present).toBe(before);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('refuses when no mat is named, and records nothing when the value is unchanged', () => {
    const design = demoDesign();
    expect(setMatCellCounts.run(design, { matIds: ['sa-r0c0'], cellsPerBitline: 64 }).ok).toBe(false);
    const same = setMatCellCounts.run(design, { matIds: ['mat-r0c0'], cellsPerBitline: 512 });
    expect(same.ok && same.design).toBe(design);
  });
});
