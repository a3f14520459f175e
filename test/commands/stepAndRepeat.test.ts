import { describe, expect, it } from 'vitest';
import { addBlocks } from '../../src/commands/addBlocks';
import { stepAndRepeat } from '../../src/commands/stepAndRepeat';
import { evaluate } from '../../src/engine';
import { blockRect } from '../../src/geometry/placedBlocks';
import { demoDesign } from '../../src/designs/demoDesign';
import { repeatPitches } from '../../src/geometry/repeatPitch';
import { designWith, mat, strip } from '../support/designs';
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

  it('at the sharing pitch neighbours share one strip: a 2 × 3 array of served mats is clean, like a built bank', () => {
    const F = 18e-9;
    const side = 1024 * 2 * F; // folded 512 × 512 mat, arithmetic
    const blocks = [
      mat({ id: 'm', name: 'M', x: 20e-6, y: 20e-6 }),
      strip('sa-top', 'senseAmpStrip', 20e-6, 14e-6, side, 6e-6),
      strip('sa-bottom', 'senseAmpStrip', 20e-6, 20e-6 + side, side, 6e-6),
      strip('swd-left', 'wordlineDriverStrip', 17e-6, 20e-6, 3e-6, side),
      strip('swd-right', 'wordlineDriverStrip', 20e-6 + side, 20e-6, 3e-6, side),
    ];
    const design = designWith(blocks);
    const pitches = repeatPitches(design.blocks.map((b) => ({ type: b.type, rect: blockRect(design, b) })));
    expect(pitches?.sharesX && pitches.sharesY).toBe(true);
    expect(pitches?.abutting.x).toBeCloseTo(side + 6e-6, 12);
    expect(pitches?.sharing.x).toBeCloseTo(side + 3e-6, 12);
    expect(pitches?.sharing.y).toBeCloseTo(side + 6e-6, 12);
    const ids = blocks.map((b) => b.id);
    const args = {
      ids,
      columns: 3,
      rows: 2,
      pitchX: pitches?.sharing.x ?? 0,
      pitchY: pitches?.sharing.y ?? 0,
    };
    runUndoRedo(design, stepAndRepeat, { ...args, shareStrips: true }, (d) => {
      // 6 mats; sense-amplifier strips 3 columns × 3 rows of edges; drivers 4 × 2.
      const count = (type: string) => d.blocks.filter((b) => b.type === type).length;
      expect([count('mat'), count('senseAmpStrip'), count('wordlineDriverStrip')]).toEqual([6, 9, 8]);
      const kinds = evaluate(d).findings.map((f) => f.kind);
      expect(kinds.filter((k) => k !== 'noRowDecoder' && k !== 'noColumnDecoder')).toEqual([]);
    });
    // At the abutting pitch every copy keeps its own strips, and the stacked ones are reported.
    const abutting = stepAndRepeat.run(design, {
      ...args,
      pitchX: pitches?.abutting.x ?? 0,
      pitchY: pitches?.abutting.y ?? 0,
    });
    if (!abutting.ok) throw new Error(abutting.error);
    expect(abutting.design.blocks).toHaveLength(30);
    expect(evaluate(abutting.design).findings.map((f) => f.kind)).toContain('backToBackStrips');
  });
});
