import { describe, expect, it } from 'vitest';
import { cellChangeNotes, setMatCell } from '../../src/commands/setMatCell';
import { matCellStep } from '../../src/geometry/cellPitch';
import { restoreDesign } from '../../src/io/restore';
import { formatMatSizeAndBits } from '../../src/model/matSize';
import { evaluate } from '../../src/engine';
import { matGeometry } from '../../src/geometry/matGeometry';
import { blockRect } from '../../src/geometry/placedBlocks';
import type { Block, Mat } from '../../src/model/block';
import { EDRAM_CELL, FOLDED_8F2_CELL, GAIN_3T_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { demoDesign } from '../../src/designs/demoDesign';
import type { Design } from '../../src/model/design';
import { blockById, expectRefused, runUndoRedo } from '../support/commandSteps';
import { designWith, mat, strip } from '../support/designs';

const F = 18e-9;
const SIDE = 1024 * 2 * F; // folded 512 × 512 mat: 1,024 lines at 2F (arithmetic)

/** A hand-drawn clean bank: one mat, strips above, below and on the left, decoders left and below. */
function sketchedBank(): Design {
  const x = 30e-6;
  const y = 20e-6;
  return designWith([
    mat({ id: 'm', name: 'Mat 1', x, y }),
    strip('sa-1', 'senseAmpStrip', x, y - 6e-6, SIDE, 6e-6),
    strip('sa-2', 'senseAmpStrip', x, y + SIDE, SIDE, 6e-6),
    strip('swd-1', 'wordlineDriverStrip', x - 3e-6, y, 3e-6, SIDE),
    strip('rowdec-1', 'rowDecoder', x - 21e-6, y - 6e-6, 18e-6, SIDE + 12e-6),
    strip('coldec-1', 'columnDecoder', x - 3e-6, y + SIDE + 6e-6, SIDE + 3e-6, 14e-6),
  ]);
}

const matOf = (d: Design, id: string) => blockById(d, id) as Mat;
const bitsOf = (d: Design, id: string) => {
  const m = matOf(d, id);
  const cell = d.cells.find((c) => c.id === m.cellId);
  if (!cell) throw new Error('no cell');
  return matGeometry(m, cell, d.process.featureSize).bits;
};
const kinds = (d: Design) => evaluate(d).findings.map((f) => f.kind);

describe('command: change a mat’s cell', () => {
  it('keeps the capacity and the top-left corner; strips and decoders follow with no gap; run, undo, redo', () => {
    const design = sketchedBank();
    expect(kinds(design)).toEqual([]);
    runUndoRedo(design, setMatCell, { matIds: ['m'], cellId: EDRAM_CELL.id }, (d) => {
      const m = matOf(d, 'm');
      expect(m).toMatchObject({
        cellId: EDRAM_CELL.id,
        cellsPerBitline: 512,
        cellsPerWordline: 512,
        x: 30e-6,
        y: 20e-6,
      });
      expect(bitsOf(d, 'm')).toBe(bitsOf(design, 'm'));
      const r = blockRect(d, m);
      // 5F pitches: 1,024 lines × 90 nm (arithmetic).
      expect(r.width).toBeCloseTo(1024 * 5 * F, 12);
      // The strips span the new edges and abut them; the decoders follow the stack.
      expect(blockRect(d, blockById(d, 'sa-2'))).toMatchObject({ y: expect.closeTo(r.y + r.height, 12) });
      expect(blockRect(d, blockById(d, 'sa-2')).width).toBeCloseTo(r.width, 12);
      expect(blockRect(d, blockById(d, 'swd-1')).height).toBeCloseTo(r.height, 12);
      expect(blockRect(d, blockById(d, 'coldec-1')).y).toBeCloseTo(r.y + r.height + 6e-6, 12);
      expect(blockRect(d, blockById(d, 'rowdec-1')).height).toBeCloseTo(r.height + 12e-6, 12);
      // Nothing opened or overlapped: every edge still served, every decoder still reached.
      const geometryKinds = [
        'overlap',
        'unsensedBitlines',
        'undrivenWordlines',
        'noRowDecoder',
        'noColumnDecoder',
      ];
      expect(kinds(d).filter((k) => geometryKinds.includes(k))).toEqual([]);
    });
  });

  it('folded → open keeps the bits: twice the cells per word line on the same bit lines', () => {
    const after = setMatCell.run(sketchedBank(), { matIds: ['m'], cellId: OPEN_6F2_CELL.id });
    if (!after.ok) throw new Error(after.error);
    expect(matOf(after.design, 'm')).toMatchObject({ cellsPerBitline: 512, cellsPerWordline: 1024 });
    expect(bitsOf(after.design, 'm')).toBe(512 * 1024);
    // And back again.
    const back = setMatCell.run(after.design, { matIds: ['m'], cellId: FOLDED_8F2_CELL.id });
    if (!back.ok) throw new Error(back.error);
    expect(matOf(back.design, 'm')).toMatchObject({ cellsPerBitline: 512, cellsPerWordline: 512 });
  });

  it('an option keeps the counts instead; another corner can stay put', () => {
    const design = sketchedBank();
    const before = blockRect(design, matOf(design, 'm'));
    const kept = setMatCell.run(design, {
      matIds: ['m'],
      cellId: OPEN_6F2_CELL.id,
      keepCounts: true,
      anchor: 'bottomRight',
    });
    if (!kept.ok) throw new Error(kept.error);
    const m = matOf(kept.design, 'm');
    expect(m).toMatchObject({ cellsPerBitline: 512, cellsPerWordline: 512 });
    const r = blockRect(kept.design, m);
    expect(r.x + r.width).toBeCloseTo(before.x + before.width, 12);
    expect(r.y + r.height).toBeCloseTo(before.y + before.height, 12);
    // The left driver strip moved with the mat's left edge.
    expect(blockRect(kept.design, blockById(kept.design, 'swd-1')).x + 3e-6).toBeCloseTo(r.x, 12);
  });

  it('every mat of the demo bank at once: each column and row stretches once and the bank stays whole', () => {
    const design = demoDesign();
    const ids = design.blocks.filter((b: Block) => b.type === 'mat').map((b) => b.id);
    const after = setMatCell.run(design, { matIds: ids, cellId: EDRAM_CELL.id });
    if (!after.ok) throw new Error(after.error);
    const geometryKinds = [
      'overlap',
      'unsensedBitlines',
      'undrivenWordlines',
      'noRowDecoder',
      'noColumnDecoder',
    ];
    expect(kinds(after.design).filter((k) => geometryKinds.includes(k))).toEqual([]);
    expect(evaluate(after.design).totals.bits).toBe(evaluate(design).totals.bits);
  });

  describe('one mat inside a grid (mats that keep their cell beside it on several sides)', () => {
    const geometryKinds = [
      'overlap',
      'unsensedBitlines',
      'undrivenWordlines',
      'noRowDecoder',
      'noColumnDecoder',
    ];
    const rects = (d: Design) => new Map(d.blocks.map((b) => [b.id, blockRect(d, b)]));

    it.each([
      ['mat-r1c1', EDRAM_CELL.id],
      ['mat-r0c0', GAIN_3T_CELL.id],
      ['mat-r2c3', OPEN_6F2_CELL.id],
    ])(
      '%s → %s keeps its slot, fills it with whole cells, and nothing else moves; run, undo, redo',
      (id, cellId) => {
        const design = demoDesign();
        const before = rects(design);
        const findingsBefore = kinds(design).filter((k) => geometryKinds.includes(k));
        runUndoRedo(design, setMatCell, { matIds: [id], cellId }, (d) => {
          const m = matOf(d, id);
          expect(m.cellId).toBe(cellId);
          const after = rects(d);
          for (const [blockId, r] of before) {
            const a = after.get(blockId);
            expect(a?.x, blockId).toBeCloseTo(r.x, 12);
            expect(a?.y, blockId).toBeCloseTo(r.y, 12);
            expect(a?.width, blockId).toBeCloseTo(r.width, 12);
            expect(a?.height, blockId).toBeCloseTo(r.height, 12);
          }
          // The cell array fits in the slot with less than one cell to spare along each axis.
          const cell = d.cells.find((c) => c.id === cellId);
          if (!cell) throw new Error('no cell');
          const array = matGeometry({ ...m, footprint: undefined }, cell, d.process.featureSize);
          const slot = before.get(id);
          const step = matCellStep(cell, d.process.featureSize, m.bitlineAxis);
          expect(array.width).toBeLessThanOrEqual((slot?.width ?? 0) + 1e-12);
          expect(array.width).toBeGreaterThan((slot?.width ?? 0) - step.x);
          expect(array.height).toBeLessThanOrEqual((slot?.height ?? 0) + 1e-12);
          expect(array.height).toBeGreaterThan((slot?.height ?? 0) - step.y);
          // No overlap, no unserved edge, no decoder lost.
          expect(kinds(d).filter((k) => geometryKinds.includes(k))).toEqual(findingsBefore);
          // It still restores from its file.
          const restored = restoreDesign(JSON.parse(JSON.stringify(d)));
          expect(restored.ok).toBe(true);
          if (restored.ok)
            expect(blockRect(restored.design, matOf(restored.design, id))).toEqual(blockRect(d, m));
        });
      },
    );

    it('says what happened: the slot kept and the capacity it now has', () => {
      const design = demoDesign();
      const after = setMatCell.run(design, { matIds: ['mat-r1c1'], cellId: EDRAM_CELL.id });
      if (!after.ok) throw new Error(after.error);
      const [note] = cellChangeNotes(design, after.design, ['mat-r1c1']);
      expect(note).toMatch(/^Mat 2\.2 keeps its slot in the grid/);
      expect(note).toContain(`was ${formatMatSizeAndBits(512, 512, bitsOf(design, 'mat-r1c1'))}`);
      // Changing the whole bank instead keeps every mat's capacity, and says so.
      const ids = design.blocks.filter((b) => b.type === 'mat').map((b) => b.id);
      const whole = setMatCell.run(design, { matIds: ids, cellId: EDRAM_CELL.id });
      if (!whole.ok) throw new Error(whole.error);
      expect(cellChangeNotes(design, whole.design, ids)[0]).toMatch(/keeps its .* cells/);
    });

    it('refuses to keep the counts of a mat its column pins, saying why', () => {
      expectRefused(
        demoDesign(),
        setMatCell,
        { matIds: ['mat-r1c1'], cellId: EDRAM_CELL.id, keepCounts: true },
        /column with mats that keep their cell/,
      );
    });

    it('a changed mat changed again fills its slot anew, and back to its first cell it has no band', () => {
      const design = demoDesign();
      const once = setMatCell.run(design, { matIds: ['mat-r1c1'], cellId: EDRAM_CELL.id });
      if (!once.ok) throw new Error(once.error);
      const back = setMatCell.run(once.design, { matIds: ['mat-r1c1'], cellId: FOLDED_8F2_CELL.id });
      if (!back.ok) throw new Error(back.error);
      expect(matOf(back.design, 'mat-r1c1')).toMatchObject({ cellsPerBitline: 512, cellsPerWordline: 512 });
      expect(blockRect(back.design, matOf(back.design, 'mat-r1c1'))).toEqual(
        blockRect(design, matOf(design, 'mat-r1c1')),
      );
      expect(bitsOf(back.design, 'mat-r1c1')).toBe(bitsOf(design, 'mat-r1c1'));
    });
  });

  it('refuses an unknown cell and a selection without mats', () => {
    expectRefused(demoDesign(), setMatCell, { matIds: ['mat-r0c0'], cellId: 'missing' }, 'no cell');
    expectRefused(
      demoDesign(),
      setMatCell,
      { matIds: ['sa-r0c0'], cellId: OPEN_6F2_CELL.id },
      'no mat selected',
    );
  });
});
