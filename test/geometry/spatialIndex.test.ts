import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bottom, right, type Rect } from '../../src/geometry/rect';
import { buildSpatialIndex } from '../../src/geometry/spatialIndex';

/** The rectangles whose boxes meet `query` grown by `margin` (closed), by looking at every one. */
function nearByScan(rects: readonly Rect[], query: Rect, margin: number): number[] {
  const hits: number[] = [];
  rects.forEach((r, i) => {
    if (
      r.x <= right(query) + margin &&
      right(r) >= query.x - margin &&
      r.y <= bottom(query) + margin &&
      bottom(r) >= query.y - margin
    )
      hits.push(i);
  });
  return hits;
}

const coordinate = fc.integer({ min: -50, max: 50 });
const size = fc.integer({ min: 0, max: 20 });
const rect = fc.record({ x: coordinate, y: coordinate, width: size, height: size });

describe('spatial index', () => {
  // Arithmetic test: the index must give what a scan of every rectangle gives, for queries inside the
  // floorplan (answered by the R-tree) and around all of it (answered without one).
  it('finds exactly the rectangles a full scan finds, for partial and whole-floorplan queries', () => {
    fc.assert(
      fc.property(
        fc.array(rect, { minLength: 1, maxLength: 60 }),
        fc.array(fc.oneof(rect, fc.constant({ x: -60, y: -60, width: 200, height: 200 })), {
          minLength: 1,
          maxLength: 6,
        }),
        fc.integer({ min: 0, max: 5 }),
        (rects, queries, margin) => {
          const index = buildSpatialIndex(rects);
          for (const q of queries) {
            expect([...index.near(q, margin)].sort((a, b) => a - b)).toEqual(nearByScan(rects, q, margin));
          }
        },
      ),
      { numRuns: 300 },
    );
    // Its own limit: a long property run must hold on a busy 2-core CI machine.
  }, 60_000);
});
