import { describe, expect, it } from 'vitest';
import { matCellStep, matLinePitch } from '../../src/geometry/cellPitch';
import { matFromDrag } from '../../src/geometry/matFromDrag';
import { FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';

const F = 18e-9;

describe('cell pitch and drawing a mat by dragging', () => {
  it.each([
    // [cell, axis, line pitch x/F, line pitch y/F, cell step x/F, cell step y/F] — common practice (no source):
    // folded 2F × 2F at half occupancy, open 3F × 2F at full occupancy.
    [FOLDED_8F2_CELL, 'vertical', 2, 2, 4, 4],
    [OPEN_6F2_CELL, 'vertical', 3, 2, 3, 2],
    [OPEN_6F2_CELL, 'horizontal', 2, 3, 2, 3],
  ] as const)('%s with %s bit lines', (cell, axis, lx, ly, sx, sy) => {
    const pitch = matLinePitch(cell, F, axis);
    const step = matCellStep(cell, F, axis);
    expect(pitch.x / F).toBeCloseTo(lx, 12);
    expect(pitch.y / F).toBeCloseTo(ly, 12);
    expect(step.x / F).toBeCloseTo(sx, 12);
    expect(step.y / F).toBeCloseTo(sy, 12);
  });

  it('rounds the dragged box to whole cells and keeps the anchor corner', () => {
    // Open 6F², vertical: one cell per word line is 3F = 54 nm wide, one per bit line 2F = 36 nm tall.
    const m = matFromDrag(
      { x: 0, y: 0 },
      { x: 54e-9 * 100.4, y: 36e-9 * 49.6 },
      OPEN_6F2_CELL,
      F,
      'vertical',
    );
    expect(m.cellsPerWordline).toBe(100);
    expect(m.cellsPerBitline).toBe(50);
    expect(m.rect.width).toBeCloseTo(100 * 54e-9, 18);
    expect(m.rect.height).toBeCloseTo(50 * 36e-9, 18);
    expect(m.columns).toBe(100);
    expect(m.rows).toBe(50);
    expect(m.bits).toBe(5000);
  });

  it('drags up and to the left of the anchor; horizontal bit lines swap the counts', () => {
    const anchor = { x: 10e-6, y: 10e-6 };
    const m = matFromDrag(
      anchor,
      { x: 10e-6 - 72e-9 * 10, y: 10e-6 - 72e-9 * 20 },
      FOLDED_8F2_CELL,
      F,
      'horizontal',
    );
    // Folded: 4F = 72 nm per cell each way; x runs along the bit lines when they are horizontal.
    expect(m.cellsPerBitline).toBe(10);
    expect(m.cellsPerWordline).toBe(20);
    expect(m.rect.x + m.rect.width).toBeCloseTo(anchor.x, 15);
    expect(m.rect.y + m.rect.height).toBeCloseTo(anchor.y, 15);
    // 20 cells per word line on folded bit lines = 40 bit lines; bits = 10 × 40 (arithmetic).
    expect(m.columns).toBe(40);
    expect(m.bits).toBe(400);
  });

  it('a click without a drag still gives one cell', () => {
    const m = matFromDrag({ x: 0, y: 0 }, { x: 0, y: 0 }, FOLDED_8F2_CELL, F, 'vertical');
    expect(m.cellsPerBitline).toBe(1);
    expect(m.cellsPerWordline).toBe(1);
  });
});
