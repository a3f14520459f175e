import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boxesOf } from '../../src/geometry/blockTable';
import { groupedNeighbourTable, neighbourTable } from '../../src/geometry/neighbourGrid';
import { sharesBeyond } from '../../src/geometry/neighbourGrid';
import { neighbourTableOf, neighboursOf } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE, type Rect } from '../../src/geometry/rect';
import { buildSpatialIndex } from '../../src/geometry/spatialIndex';

/**
 * The definition: every other box that a query with the grown box finds in the R-tree, made symmetric
 * (when the gap equals the margin, rounding can let the query from one side find the other but not back).
 */
function byTree(rects: readonly Rect[], margin: number): number[][] {
  const index = buildSpatialIndex(rects);
  const sets = rects.map(() => new Set<number>());
  rects.forEach((r, i) => {
    for (const j of index.near(r, margin)) {
      if (j === i) continue;
      sets[i]?.add(j);
      sets[j]?.add(i);
    }
  });
  return sets.map((s) => [...s].sort((a, b) => a - b));
}

/** Rectangles on a coarse lattice (µm steps), so that abutting and overlapping boxes are common. */
const latticeRect = fc
  .record({
    x: fc.integer({ min: -20, max: 40 }),
    y: fc.integer({ min: -20, max: 40 }),
    w: fc.integer({ min: 0, max: 12 }),
    h: fc.integer({ min: 0, max: 12 }),
  })
  .map(({ x, y, w, h }): Rect => ({ x: x * 1e-6, y: y * 1e-6, width: w * 1e-6, height: h * 1e-6 }));

/** Boxes of very different sizes and places, including huge ones and long thin strips. */
const wildRect = fc
  .record({
    x: fc.double({ min: -1e-2, max: 1e-2, noNaN: true }),
    y: fc.double({ min: -1e-2, max: 1e-2, noNaN: true }),
    w: fc.oneof(fc.constant(0), fc.double({ min: 1e-9, max: 2e-2, noNaN: true })),
    h: fc.oneof(fc.constant(0), fc.double({ min: 1e-9, max: 2e-2, noNaN: true })),
  })
  .map(({ x, y, w, h }): Rect => ({ x, y, width: w, height: h }));

/** Every row of the grid's table as plain arrays. */
function neighbourLists(rects: readonly Rect[], margin: number): number[][] {
  const table = neighbourTable(boxesOf(rects), margin);
  return rects.map((_, i) => neighboursOf(table, i));
}

describe('neighbourTable: every pair of touching boxes in one grid pass', () => {
  it('finds the same neighbours as one R-tree query per box (lattice boxes, abutting and overlapping)', () => {
    fc.assert(
      fc.property(
        fc.array(latticeRect, { maxLength: 120 }),
        fc.constantFrom(0, ABUTMENT_TOLERANCE, 1e-6),
        (rects, margin) => {
          expect(neighbourLists(rects, margin)).toEqual(byTree(rects, margin));
        },
      ),
      { numRuns: 300 },
    );
  }, 60_000);

  it('finds the same neighbours for boxes of wildly different sizes', () => {
    fc.assert(
      fc.property(fc.array(wildRect, { maxLength: 80 }), (rects) => {
        expect(neighbourLists(rects, ABUTMENT_TOLERANCE)).toEqual(byTree(rects, ABUTMENT_TOLERANCE));
      }),
      { numRuns: 300 },
    );
  });

  it('keeps only the pairs a filter accepts, and every one of those', () => {
    const keep = (i: number, j: number) => (i + j) % 3 !== 0;
    fc.assert(
      fc.property(fc.array(latticeRect, { maxLength: 80 }), (rects) => {
        const table = neighbourTable(boxesOf(rects), ABUTMENT_TOLERANCE, keep);
        const expected = byTree(rects, ABUTMENT_TOLERANCE).map((row, i) => row.filter((j) => keep(i, j)));
        expect(rects.map((_, i) => neighboursOf(table, i))).toEqual(expected);
      }),
      { numRuns: 200 },
    );
  });

  it('grouped: meeting pairs across groups and overlapping pairs within one, as the filter gives them', () => {
    const groupedRects = fc.array(
      fc.record({ rect: fc.oneof(latticeRect, wildRect), group: fc.integer({ min: 0, max: 1 }) }),
      { maxLength: 100 },
    );
    fc.assert(
      fc.property(groupedRects, fc.constantFrom(0, ABUTMENT_TOLERANCE, 1e-6), (items, margin) => {
        const boxes = boxesOf(items.map((item) => item.rect));
        const group = Uint8Array.from(items.map((item) => item.group));
        const keep = (i: number, j: number) => group[i] !== group[j] || sharesBeyond(boxes, i, j, margin);
        const grouped = groupedNeighbourTable(boxes, margin, group);
        const filtered = neighbourTable(boxes, margin, keep);
        expect(items.map((_, i) => neighboursOf(grouped, i))).toEqual(
          items.map((_, i) => neighboursOf(filtered, i)),
        );
      }),
      { numRuns: 400 },
    );
  }, 60_000);

  it('grouped: a tiled array keeps mat–strip touches and drops strip corners that only touch', () => {
    // Mat 0 with a strip above (1) and one to its left (2); the strips meet at a corner only, and strip 3
    // overlaps strip 1 by half its width.
    const rects: Rect[] = [
      { x: 2e-6, y: 1e-6, width: 10e-6, height: 10e-6 },
      { x: 2e-6, y: 0, width: 10e-6, height: 1e-6 },
      { x: 0, y: 1e-6, width: 2e-6, height: 10e-6 },
      { x: 7e-6, y: 0, width: 10e-6, height: 1e-6 },
    ];
    const table = groupedNeighbourTable(boxesOf(rects), ABUTMENT_TOLERANCE, Uint8Array.of(1, 0, 0, 0));
    expect(rects.map((_, i) => neighboursOf(table, i))).toEqual([[1, 2, 3], [0, 3], [0], [0, 1]]);
  });

  it('reports abutting blocks and not blocks a gap apart', () => {
    const rects: Rect[] = [
      { x: 0, y: 0, width: 10e-6, height: 10e-6 },
      { x: 10e-6, y: 0, width: 2e-6, height: 10e-6 }, // abuts the right edge of 0
      { x: 12.5e-6, y: 0, width: 2e-6, height: 10e-6 }, // 0.5 µm beyond 1
      { x: 5e-6, y: 5e-6, width: 10e-6, height: 10e-6 }, // overlaps 0, 1 and 2
    ];
    expect(neighbourLists(rects, ABUTMENT_TOLERANCE)).toEqual([[1, 3], [0, 3], [3], [0, 1, 2]]);
  });

  it('handles no boxes, one box, and many boxes in one place', () => {
    expect(neighbourLists([], 0)).toEqual([]);
    expect(neighbourLists([{ x: 0, y: 0, width: 1, height: 1 }], 0)).toEqual([[]]);
    const same = Array.from({ length: 30 }, () => ({ x: 1e-6, y: 1e-6, width: 0, height: 0 }));
    const lists = neighbourLists(same, 0);
    expect(lists.every((l, i) => l.length === 29 && !l.includes(i))).toBe(true);
  });

  it('keeps the grid small for a sparse floorplan (two tiny boxes a metre apart)', () => {
    const rects: Rect[] = [
      { x: 0, y: 0, width: 1e-9, height: 1e-9 },
      { x: 1, y: 1, width: 1e-9, height: 1e-9 },
      { x: 1e-9, y: 0, width: 1e-9, height: 1e-9 },
    ];
    expect(neighbourLists(rects, ABUTMENT_TOLERANCE)).toEqual([[2], [], [0]]);
  });

  it('builds a table with only some rows filled, sorted', () => {
    const table = neighbourTableOf(
      4,
      new Map([
        [2, [3, 0, 1]],
        [0, [2]],
      ]),
    );
    expect([0, 1, 2, 3].map((i) => neighboursOf(table, i))).toEqual([[2], [], [0, 1, 3], []]);
  });
});
