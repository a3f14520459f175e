import { describe, expect, it } from 'vitest';
import { aggregateRuns } from '../../src/canvas/paint/aggregateRuns';

describe('aggregateRuns (level of detail for sub-outline blocks)', () => {
  it('merges a grid of cells with sub-pixel gaps into one rectangle', () => {
    const rects = [];
    for (let row = 0; row < 3; row++)
      for (let col = 0; col < 4; col++) rects.push({ x: col * 11, y: row * 12, width: 10, height: 10 });
    // 1 px per unit: gaps of 1 and 2 units are within a 2-px gap.
    expect(aggregateRuns(rects, 1, 2)).toEqual([{ x: 0, y: 0, width: 43, height: 34 }]);
  });

  it('keeps rectangles apart when their gap is larger than the threshold on screen', () => {
    const rects = [
      { x: 0, y: 0, width: 10, height: 10 },
      { x: 15, y: 0, width: 10, height: 10 },
    ];
    expect(aggregateRuns(rects, 1, 2)).toHaveLength(2);
    // Zoomed out ten times, the 5-unit gap is half a pixel: one run.
    expect(aggregateRuns(rects, 0.1, 1)).toEqual([{ x: 0, y: 0, width: 25, height: 10 }]);
  });

  it('does not merge rectangles of different rows or heights', () => {
    const rects = [
      { x: 0, y: 0, width: 10, height: 10 },
      { x: 10, y: 0, width: 10, height: 8 },
      { x: 0, y: 30, width: 10, height: 10 },
    ];
    expect(aggregateRuns(rects, 1, 1)).toHaveLength(3);
  });

  it('covers exactly the union when rectangles abut (arithmetic)', () => {
    const rects = [
      { x: 5, y: 2, width: 3, height: 1 },
      { x: 0, y: 2, width: 5, height: 1 },
    ];
    expect(aggregateRuns(rects, 1, 0.5)).toEqual([{ x: 0, y: 2, width: 8, height: 1 }]);
  });
});
