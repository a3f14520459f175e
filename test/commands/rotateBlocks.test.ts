import { describe, expect, it } from 'vitest';
import { rotateBlocks } from '../../src/commands/rotateBlocks';
import { blockRect } from '../../src/geometry/placedBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { designWith, mat } from '../support/designs';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: rotate 90°', () => {
  it('runs, undoes and redoes: a mat turns about its centre and its bit lines change direction', () => {
    // A 512 × 256 folded mat: 512 bit lines × 2F wide, 1024 word lines × 2F tall (arithmetic).
    const design = designWith([mat({ cellsPerWordline: 256, x: 10e-6, y: 10e-6 })]);
    const before = blockRect(design, blockById(design, 'm1'));
    runUndoRedo(design, rotateBlocks, { ids: ['m1'] }, (d) => {
      const m = blockById(d, 'm1');
      expect(m.type === 'mat' && m.bitlineAxis).toBe('horizontal');
      const r = blockRect(d, m);
      expect(r.width).toBeCloseTo(before.height, 15);
      expect(r.height).toBeCloseTo(before.width, 15);
      expect(r.x + r.width / 2).toBeCloseTo(before.x + before.width / 2, 15);
      expect(r.y + r.height / 2).toBeCloseTo(before.y + before.height / 2, 15);
    });
  });

  it('turns a group about the centre of its bounding box: a strip above a mat ends up on its right', () => {
    const design = demoDesign();
    const after = runUndoRedo(design, rotateBlocks, { ids: ['mat-r0c0', 'sa-r0c0'] }, (d) => {
      const s = blockById(d, 'sa-r0c0');
      expect(s.type !== 'mat' && s.width).toBeCloseTo(6e-6, 15);
    });
    const m = blockRect(after, blockById(after, 'mat-r0c0'));
    const s = blockRect(after, blockById(after, 'sa-r0c0'));
    expect(s.x).toBeCloseTo(m.x + m.width, 12);
  });

  it('refuses with nothing selected', () => {
    expectRefused(demoDesign(), rotateBlocks, { ids: [] }, 'nothing selected');
  });
});
