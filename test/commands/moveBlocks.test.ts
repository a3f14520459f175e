import { describe, expect, it } from 'vitest';
import { moveBlocks } from '../../src/commands/moveBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: move blocks', () => {
  it('runs, undoes and redoes, moving only the named blocks', () => {
    const design = demoDesign();
    const before = blockById(design, 'mat-r0c0');
    runUndoRedo(design, moveBlocks, { ids: ['mat-r0c0', 'sa-r0c0'], dx: 2e-6, dy: -1e-6 }, (d) => {
      const moved = blockById(d, 'mat-r0c0');
      expect(moved.x).toBeCloseTo(before.x + 2e-6, 15);
      expect(moved.y).toBeCloseTo(before.y - 1e-6, 15);
      expect(blockById(d, 'mat-r0c1')).toBe(blockById(design, 'mat-r0c1'));
    });
  });

  it('a zero move records no step; off-die and non-finite moves are refused', () => {
    const design = demoDesign();
    const same = moveBlocks.run(design, { ids: ['mat-r0c0'], dx: 0, dy: 0 });
    expect(same.ok && same.design).toBe(design);
    expectRefused(design, moveBlocks, { ids: ['mat-r0c0'], dx: 1, dy: 0 }, 'x must lie between');
    expectRefused(design, moveBlocks, { ids: ['mat-r0c0'], dx: Number.NaN, dy: 0 }, 'finite');
    expectRefused(design, moveBlocks, { ids: [], dx: 1e-6, dy: 0 }, 'nothing selected');
  });
});
