import { describe, expect, it } from 'vitest';
import { addedBlockIds } from '../../src/commands/blockIds';
import { duplicateBlocks } from '../../src/commands/duplicateBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: duplicate', () => {
  it('runs, undoes and redoes, giving the copies fresh ids and the offset', () => {
    const design = demoDesign();
    runUndoRedo(design, duplicateBlocks, { ids: ['mat-r0c0'], dx: 1e-6, dy: 2e-6 }, (d, before) => {
      expect(addedBlockIds(before, d)).toEqual(['mat-r0c0-2']);
      const copy = blockById(d, 'mat-r0c0-2');
      expect(copy.x).toBeCloseTo(blockById(design, 'mat-r0c0').x + 1e-6, 15);
      expect(copy.name).toBe('Mat 1.1 (2)');
    });
  });

  it('names stay unique: a copy of a copy takes the next free number', () => {
    const once = duplicateBlocks.run(demoDesign(), { ids: ['mat-r0c0'], dx: 0, dy: 1e-3 });
    if (!once.ok) throw new Error(once.error);
    const twice = duplicateBlocks.run(once.design, { ids: ['mat-r0c0', 'mat-r0c0-2'], dx: 1e-3, dy: 0 });
    if (!twice.ok) throw new Error(twice.error);
    const names = twice.design.blocks.map((b) => b.name).filter((n) => n.startsWith('Mat 1.1'));
    expect(names).toEqual(['Mat 1.1', 'Mat 1.1 (2)', 'Mat 1.1 (3)', 'Mat 1.1 (4)']);
  });

  it('is deterministic: the same document and arguments give the same ids', () => {
    const design = demoDesign();
    const a = duplicateBlocks.run(design, { ids: ['mat-r0c0', 'sa-r0c0'], dx: 0, dy: 1e-6 });
    const b = duplicateBlocks.run(design, { ids: ['mat-r0c0', 'sa-r0c0'], dx: 0, dy: 1e-6 });
    expect(a).toEqual(b);
  });

  it('refuses an empty selection and a non-finite offset', () => {
    expectRefused(demoDesign(), duplicateBlocks, { ids: [], dx: 0, dy: 0 }, 'nothing selected');
    expectRefused(demoDesign(), duplicateBlocks, { ids: ['mat-r0c0'], dx: Infinity, dy: 0 }, 'finite');
  });
});
