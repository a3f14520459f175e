import { describe, expect, it } from 'vitest';
import { deleteBlocks } from '../../src/commands/deleteBlocks';
import { evaluate } from '../../src/engine';
import { demoDesign } from '../../src/designs/demoDesign';
import { expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: delete blocks', () => {
  it('runs, undoes and redoes; deleting a sense-amplifier strip leaves bit lines unsensed', () => {
    const design = demoDesign();
    expect(evaluate(design).findings).toHaveLength(0);
    runUndoRedo(design, deleteBlocks, { ids: ['sa-r0c0', 'sa-r1c0'] }, (d) => {
      expect(d.blocks).toHaveLength(design.blocks.length - 2);
      expect(d.blocks.some((b) => b.id === 'sa-r0c0')).toBe(false);
      const kinds = evaluate(d).findings.map((f) => `${f.kind}:${f.blockIds.join(',')}`);
      expect(kinds).toContain('unsensedBitlines:mat-r0c0');
    });
  });

  it('refuses when nothing named exists', () => {
    expectRefused(demoDesign(), deleteBlocks, { ids: ['ghost'] }, 'nothing selected');
  });
});
