import { describe, expect, it } from 'vitest';
import { addBlocks } from '../../src/commands/addBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat } from '../support/designs';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: add blocks', () => {
  it('runs, undoes and redoes; a lone mat is flagged until strips serve it', () => {
    const after = runUndoRedo(designWith([]), addBlocks, { blocks: [mat({ id: 'mat-1' })] }, (d) => {
      expect(d.blocks.map((b) => b.id)).toEqual(['mat-1']);
    });
    expect(blockById(after, 'mat-1').type).toBe('mat');
  });

  it('adds a spacer, which serves nothing and only takes area', () => {
    const spacer = {
      id: 'gap-1',
      name: 'Gap',
      type: 'spacer' as const,
      x: 0,
      y: 0,
      width: 5e-6,
      height: 5e-6,
    };
    runUndoRedo(designWith([mat()]), addBlocks, { blocks: [spacer] }, (d) => {
      expect(blockById(d, 'gap-1').type).toBe('spacer');
    });
  });

  it('refuses clashing ids, unknown cells, bad sizes and nothing at all', () => {
    const design = demoDesign();
    expectRefused(design, addBlocks, { blocks: [mat({ id: 'mat-r0c0' })] }, 'already used');
    expectRefused(design, addBlocks, { blocks: [mat({ id: 'x', cellId: 'nope' })] }, 'no cell "nope"');
    expectRefused(
      design,
      addBlocks,
      { blocks: [{ id: 's', name: '', type: 'senseAmpStrip', x: 0, y: 0, width: -1, height: 1e-6 }] },
      'width',
    );
    expectRefused(design, addBlocks, { blocks: [mat({ id: 'far', x: 5 })] }, 'x must lie between');
    expectRefused(design, addBlocks, { blocks: [] }, 'nothing to add');
  });
});
