import { describe, expect, it } from 'vitest';
import { handlePosition, resizeMat, resizeRect, type ResizeHandle } from '../../src/geometry/resize';
import { FOLDED_8F2_CELL } from '../../src/model/builtins';
import { mat } from '../support/designs';

const F = 18e-9;
const r = { x: 10, y: 20, width: 30, height: 40 };

describe('resizing', () => {
  it.each([
    // [handle, dx, dy, expected rect] — arithmetic
    ['e', 5, 99, { x: 10, y: 20, width: 35, height: 40 }],
    ['w', 5, 0, { x: 15, y: 20, width: 25, height: 40 }],
    ['n', 0, -10, { x: 10, y: 10, width: 30, height: 50 }],
    ['se', -5, 5, { x: 10, y: 20, width: 25, height: 45 }],
    ['nw', 100, 100, { x: 39, y: 59, width: 1, height: 1 }],
  ] as const)('%s by (%d, %d)', (handle, dx, dy, expected) => {
    expect(resizeRect(r, handle, dx, dy, 1)).toEqual(expected);
  });

  it.each([
    ['n', 25, 20],
    ['se', 40, 60],
    ['w', 10, 40],
  ] as const)('handle %s sits at (%d, %d)', (handle: ResizeHandle, x, y) => {
    expect(handlePosition(r, handle)).toEqual({ x, y });
  });

  it('a mat resizes in whole cells and keeps its opposite side', () => {
    // Folded 8F²: 4F = 72 nm per cell each way. 512 × 512 cells → 36.864 µm square.
    const m = mat({ x: 0, y: 0 });
    const east = resizeMat(m, FOLDED_8F2_CELL, F, 'e', 72e-9 * 10.3, 0);
    expect(east.cellsPerWordline).toBe(522);
    expect(east.cellsPerBitline).toBe(512);
    expect(east.x).toBe(0);
    const north = resizeMat(m, FOLDED_8F2_CELL, F, 'n', 0, 72e-9 * 12.2);
    expect(north.cellsPerBitline).toBe(500);
    expect(north.y).toBeCloseTo(12 * 72e-9, 15);
    const tiny = resizeMat(m, FOLDED_8F2_CELL, F, 'sw', 1, -1);
    expect(tiny.cellsPerBitline).toBe(1);
    expect(tiny.cellsPerWordline).toBe(1);
  });
});
