import { describe, expect, it } from 'vitest';
import { addedBlockIds } from '../../src/commands/blockIds';
import { pasteBlocks } from '../../src/commands/pasteBlocks';
import { OPEN_6F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat } from '../support/designs';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: paste', () => {
  it('runs, undoes and redoes; clashing ids get a suffix', () => {
    const design = demoDesign();
    const clip = [blockById(design, 'mat-r0c0'), blockById(design, 'sa-r0c0')];
    runUndoRedo(design, pasteBlocks, { blocks: clip, cells: [], dx: 0, dy: 200e-6 }, (d, before) => {
      expect(addedBlockIds(before, d)).toEqual(['mat-r0c0-2', 'sa-r0c0-2']);
      expect(blockById(d, 'sa-r0c0-2').y).toBeCloseTo(blockById(design, 'sa-r0c0').y + 200e-6, 15);
      // Names that clash get the next free number, so messages name one block each.
      expect(blockById(d, 'mat-r0c0-2').name).toBe('Mat 1.1 (2)');
      expect(new Set(d.blocks.map((b) => b.name)).size).toBe(d.blocks.length);
    });
  });

  it('brings along a cell the design lacks', () => {
    const design = designWith([]);
    const target = { ...design, cells: design.cells.filter((c) => c.id !== OPEN_6F2_CELL.id) };
    const m = mat({ id: 'open', cellId: OPEN_6F2_CELL.id });
    runUndoRedo(target, pasteBlocks, { blocks: [m], cells: [OPEN_6F2_CELL], dx: 0, dy: 0 }, (d) => {
      expect(d.cells.map((c) => c.id)).toContain(OPEN_6F2_CELL.id);
      expect(blockById(d, 'open').type).toBe('mat');
    });
    expectRefused(target, pasteBlocks, { blocks: [m], cells: [], dx: 0, dy: 0 }, 'lacks cell');
  });

  it('refuses an empty clipboard', () => {
    expectRefused(demoDesign(), pasteBlocks, { blocks: [], cells: [], dx: 0, dy: 0 }, 'no blocks');
  });
});
