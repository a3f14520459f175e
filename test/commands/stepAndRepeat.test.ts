import { describe, expect, it } from 'vitest';
import { addBlocks } from '../../src/commands/addBlocks';
import { stepAndRepeat } from '../../src/commands/stepAndRepeat';
import { evaluate } from '../../src/engine';
import { blockRect } from '../../src/geometry/placedBlocks';
import { demoDesign } from '../../src/model/demoDesign';
import { designWith, mat } from '../support/designs';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';

describe('command: step and repeat', () => {
  it('runs, undoes and redoes a 3 × 2 array at the mat pitch: six abutting mats, five of them new', () => {
    const design = designWith([mat()]);
    const r = blockRect(design, blockById(design, 'm1'));
    runUndoRedo(
      design,
      stepAndRepeat,
      { ids: ['m1'], columns: 3, rows: 2, pitchX: r.width, pitchY: r.height },
      (d) => {
        expect(d.blocks).toHaveLength(6);
        const last = blockById(d, 'm1-2-3');
        expect(last.x).toBeCloseTo(2 * r.width, 15);
        expect(last.y).toBeCloseTo(r.height, 15);
        expect(last.name).toBe('M1 (2,3)');
        expect(evaluate(d).findings.filter((f) => f.kind === 'overlap')).toHaveLength(0);
      },
    );
  });

  it('1 × 1 changes nothing; bad counts and zero pitches are refused', () => {
    const design = demoDesign();
    const same = stepAndRepeat.run(design, { ids: ['mat-r0c0'], columns: 1, rows: 1, pitchX: 0, pitchY: 0 });
    expect(same.ok && same.design).toBe(design);
    const base = { ids: ['mat-r0c0'], pitchX: 1e-5, pitchY: 1e-5 };
    expectRefused(design, stepAndRepeat, { ...base, columns: 0, rows: 1 }, 'columns must be');
    expectRefused(design, stepAndRepeat, { ...base, columns: 2, rows: 1.5 }, 'rows must be');
    expectRefused(design, stepAndRepeat, { ...base, columns: 2, rows: 1, pitchX: 0 }, 'stack every copy');
    expectRefused(design, stepAndRepeat, { ...base, ids: [], columns: 2, rows: 2 }, 'nothing selected');
  });

  it('the copies can be added to again without id clashes', () => {
    const first = stepAndRepeat.run(designWith([mat()]), {
      ids: ['m1'],
      columns: 2,
      rows: 1,
      pitchX: 4e-5,
      pitchY: 0,
    });
    if (!first.ok) throw new Error(first.error);
    const again = addBlocks.run(first.design, { blocks: [mat({ id: 'm1-1-3', x: 8e-5 })] });
    expect(again.ok).toBe(true);
  });
});
