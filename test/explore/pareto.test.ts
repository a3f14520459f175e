import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { dominates, paretoFront, type Direction, type Point2 } from '../../src/explore/pareto';

/** The front by definition: every finite point that no other finite point dominates. O(n²). */
function bruteForceFront(points: readonly Point2[], dx: Direction, dy: Direction): number[] {
  const finite = (p: Point2) => Number.isFinite(p.x) && Number.isFinite(p.y);
  return points
    .map((p, i) => ({ p, i }))
    .filter(({ p }) => finite(p))
    .filter(({ p }) => !points.some((q) => finite(q) && dominates(q, p, dx, dy)))
    .map(({ i }) => i);
}

const coordinate = fc.oneof(
  { weight: 8, arbitrary: fc.integer({ min: -6, max: 6 }) },
  { weight: 4, arbitrary: fc.double({ min: -1e3, max: 1e3, noNaN: true }) },
  { weight: 1, arbitrary: fc.constantFrom(Number.NaN, Infinity, -Infinity) },
);
const points = fc.array(fc.record({ x: coordinate, y: coordinate }), { maxLength: 200 });
const direction = fc.constantFrom<Direction>('min', 'max');

describe('Pareto front', () => {
  it('equals the brute-force front for any points and directions (property)', () => {
    fc.assert(
      fc.property(points, direction, direction, (ps, dx, dy) => {
        const fast = paretoFront(ps, dx, dy);
        expect([...fast].sort((a, b) => a - b)).toEqual(bruteForceFront(ps, dx, dy));
      }),
      { numRuns: 2000, seed: 42 },
    );
  }, 60_000);

  it('lists the front from the best x to the worst, while y gets better (property)', () => {
    fc.assert(
      fc.property(points, direction, direction, (ps, dx, dy) => {
        const front = paretoFront(ps, dx, dy).map((i) => ps[i] as Point2);
        for (let k = 1; k < front.length; k++) {
          const a = front[k - 1] as Point2;
          const b = front[k] as Point2;
          expect(dx === 'min' ? a.x <= b.x : a.x >= b.x).toBe(true);
          expect(dy === 'min' ? a.y >= b.y : a.y <= b.y).toBe(true);
        }
      }),
      { numRuns: 500, seed: 5 },
    );
  });

  it('keeps the small-area, high-margin corner: a worked example (arithmetic)', () => {
    // x = area per bit (smaller is better), y = margin (larger is better).
    const ps = [
      { x: 1, y: 10 },
      { x: 2, y: 30 },
      { x: 2, y: 20 },
      { x: 3, y: 30 },
      { x: 4, y: 50 },
      { x: 4, y: 50 },
      { x: 0.5, y: -5 },
    ];
    expect(paretoFront(ps, 'min', 'max')).toEqual([6, 0, 1, 4, 5]);
  });
});
