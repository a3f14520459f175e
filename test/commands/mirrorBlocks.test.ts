import { describe, expect, it } from 'vitest';
import { mirrorBlocks } from '../../src/commands/mirrorBlocks';
import { blockRect } from '../../src/geometry/placedBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: mirror', () => {
  it('runs, undoes and redoes: positions reflect about the group centre and mats flip handedness', () => {
    const design = demoDesign();
    const left = blockRect(design, blockById(design, 'swd-r0c0'));
    const right = blockRect(design, blockById(design, 'swd-r0c1'));
    runUndoRedo(
      design,
      mirrorBlocks,
      { ids: ['swd-r0c0', 'mat-r0c0', 'swd-r0c1'], axis: 'leftRight' },
      (d) => {
        const m = blockById(d, 'mat-r0c0');
        expect(m.type === 'mat' && m.mirrored).toBe(true);
        expect(blockById(d, 'swd-r0c0').x).toBeCloseTo(right.x, 15);
        expect(blockById(d, 'swd-r0c1').x).toBeCloseTo(left.x, 15);
      },
    );
  });

  it('mirroring twice restores the handedness; top–bottom swaps strips above and below', () => {
    const design = demoDesign();
    const once = mirrorBlocks.run(design, { ids: ['mat-r0c0', 'sa-r0c0', 'sa-r1c0'], axis: 'topBottom' });
    if (!once.ok) throw new Error(once.error);
    expect(blockById(once.design, 'sa-r0c0').y).toBeCloseTo(blockById(design, 'sa-r1c0').y, 15);
    const twice = mirrorBlocks.run(once.design, { ids: ['mat-r0c0'], axis: 'leftRight' });
    if (!twice.ok) throw new Error(twice.error);
    const m = blockById(twice.design, 'mat-r0c0');
    expect(m.type === 'mat' && m.mirrored).toBe(false);
  });

  it('refuses an unknown axis or an empty selection', () => {
    expectRefused(demoDesign(), mirrorBlocks, { ids: [], axis: 'leftRight' }, 'nothing selected');
    expectRefused(
      demoDesign(),
      mirrorBlocks,
      { ids: ['mat-r0c0'], axis: 'diagonal' as unknown as 'leftRight' },
      'axis',
    );
  });
});
