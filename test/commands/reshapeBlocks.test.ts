import { describe, expect, it } from 'vitest';
import { reshapeBlocks } from '../../src/commands/reshapeBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: reshape blocks', () => {
  it('runs, undoes and redoes a mat resize in whole cells and a strip resize', () => {
    runUndoRedo(
      demoDesign(),
      reshapeBlocks,
      {
        changes: [
          { id: 'mat-r0c0', cellsPerBitline: 256, y: 30e-6 },
          { id: 'sa-r0c0', width: 10e-6 },
        ],
      },
      (d) => {
        const m = blockById(d, 'mat-r0c0');
        expect(m.type === 'mat' && m.cellsPerBitline).toBe(256);
        expect(m.y).toBe(30e-6);
        const s = blockById(d, 'sa-r0c0');
        expect(s.type !== 'mat' && s.width).toBe(10e-6);
      },
    );
  });

  it('refuses sizes that do not fit the block type, and unknown blocks', () => {
    const design = demoDesign();
    expectRefused(
      design,
      reshapeBlocks,
      { changes: [{ id: 'mat-r0c0', width: 1e-6 }] },
      'sized by its cell counts',
    );
    expectRefused(design, reshapeBlocks, { changes: [{ id: 'sa-r0c0', cellsPerBitline: 8 }] }, 'only mats');
    expectRefused(design, reshapeBlocks, { changes: [{ id: 'sa-r0c0', height: 0 }] }, 'height');
    expectRefused(design, reshapeBlocks, { changes: [{ id: 'ghost', x: 0 }] }, 'no such block');
    const same = reshapeBlocks.run(design, { changes: [{ id: 'mat-r0c0', cellsPerBitline: 512 }] });
    expect(same.ok && same.design).toBe(design);
  });
});
