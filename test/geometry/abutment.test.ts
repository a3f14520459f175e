import { describe, expect, it } from 'vitest';
import { abutmentOnSide, sideLength, type Side } from '../../src/geometry/abutment';
import { ABUTMENT_TOLERANCE, type Rect } from '../../src/geometry/rect';

const rect = (x: number, y: number, width: number, height: number): Rect => ({ x, y, width, height });
/** A 10 × 10 target at (10, 10); neighbours are placed around it. Units are arbitrary lengths. */
const T = rect(10, 10, 10, 10);

// Source for every expected value here: arithmetic on the rectangles as placed in each row (y grows downwards).

describe('abutmentOnSide', () => {
  it.each([
    ['strip above, full width', rect(10, 5, 10, 5), 'top', { start: 0, end: 10 }],
    ['strip below, full width', rect(10, 20, 10, 5), 'bottom', { start: 0, end: 10 }],
    ['strip left, full height', rect(5, 10, 5, 10), 'left', { start: 0, end: 10 }],
    ['strip right, full height', rect(20, 10, 5, 10), 'right', { start: 0, end: 10 }],
    ['strip above, right half', rect(15, 5, 10, 5), 'top', { start: 5, end: 10 }],
    ['strip above, wider than the target', rect(0, 5, 40, 5), 'top', { start: 0, end: 10 }],
    ['strip left, lower part', rect(5, 17, 5, 10), 'left', { start: 7, end: 10 }],
  ] as const)('%s covers %s', (_name, neighbour, side, expected) => {
    const got = abutmentOnSide(T, neighbour, side);
    expect(got?.start).toBeCloseTo(expected.start, 12);
    expect(got?.end).toBeCloseTo(expected.end, 12);
  });

  it.each([
    ['strip above, asked about the bottom', rect(10, 5, 10, 5), 'bottom'],
    ['strip above with a gap', rect(10, 4, 10, 5), 'top'],
    ['strip above, entirely to the right', rect(25, 5, 10, 5), 'top'],
    ['strip above, meeting only at a corner', rect(20, 5, 10, 5), 'top'],
    ['strip left, overlapping the target instead of abutting', rect(8, 10, 5, 10), 'left'],
  ] as const)('%s: no abutment', (_name, neighbour, side: Side) => {
    expect(abutmentOnSide(T, neighbour, side)).toBeNull();
  });

  it('edges within the tolerance abut; edges just beyond it do not', () => {
    // Source: common practice (no source): a 1 nm tolerance absorbs float rounding, not real gaps.
    const tol = ABUTMENT_TOLERANCE;
    const m = rect(10e-6, 10e-6, 36.864e-6, 36.864e-6);
    const within = rect(10e-6, 4e-6 - tol / 2, 36.864e-6, 6e-6);
    const beyond = rect(10e-6, 4e-6 - 2 * tol, 36.864e-6, 6e-6);
    expect(abutmentOnSide(m, within, 'top')).not.toBeNull();
    expect(abutmentOnSide(m, beyond, 'top')).toBeNull();
  });

  it('sideLength is the width for top and bottom, the height for left and right', () => {
    const r = rect(0, 0, 3, 7);
    expect([
      sideLength(r, 'top'),
      sideLength(r, 'bottom'),
      sideLength(r, 'left'),
      sideLength(r, 'right'),
    ]).toEqual([3, 3, 7, 7]);
  });
});
