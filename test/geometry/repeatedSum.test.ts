import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { repeatedSum } from '../../src/geometry/repeatedSum';

/** The definition: n additions one after the other. */
function loopSum(s: number, v: number, n: number): number {
  let sum = s;
  for (let i = 0; i < n; i++) sum += v;
  return sum;
}

/** Doubles of every kind: any bit pattern, short significands (ties), powers of two, edge values. */
const anyDouble = fc.oneof(
  fc.double({ noNaN: false }),
  fc.double({ min: 1e-30, max: 1e30, noNaN: true }),
  fc.integer({ min: 1, max: 2 ** 20 }).chain((m) => fc.integer({ min: -60, max: 60 }).map((e) => m * 2 ** e)),
  fc.constantFrom(
    0,
    -0,
    5e-324,
    2 ** -1022,
    Number.MAX_VALUE,
    2 ** 1023,
    Infinity,
    -Infinity,
    NaN,
    0.1,
    1e-12,
  ),
);

describe('repeatedSum', () => {
  it('is the sum a loop of additions gives, to the bit, for any start, addend and count', () => {
    fc.assert(
      fc.property(anyDouble, anyDouble, fc.integer({ min: 0, max: 5000 }), (s, v, n) => {
        expect(Object.is(repeatedSum(s, v, n), loopSum(s, v, n))).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  }, 60_000);

  it('from a start of zero, as evaluate sums a run of mats (positive addends of any magnitude)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 5e-324, max: 1e300, noNaN: true }),
        fc.integer({ min: 0, max: 70_000 }),
        (v, n) => {
          expect(Object.is(repeatedSum(0, v, n), loopSum(0, v, n))).toBe(true);
        },
      ),
      { numRuns: 3_000 },
    );
  }, 60_000);

  it('when the last addition inside a binade lands on its upper edge or just short of it', () => {
    // Sum M·u (2^52 ≤ M < 2^53), addend (q + f)·u: after k additions of d = round(q + f) the exact sum
    // reaches 2^53·u − r·u, r in −1 … 1 (arithmetic: the edge cases of the per-binade count).
    const edge = fc.record({
      q: fc.integer({ min: 0, max: 50 }),
      quarter: fc.constantFrom(0, 1, 3),
      k: fc.integer({ min: 1, max: 200 }),
      r: fc.integer({ min: -1, max: 1 }),
      scale: fc.integer({ min: -60, max: 60 }),
    });
    fc.assert(
      fc.property(edge, ({ q, quarter, k, r, scale }) => {
        const d = quarter === 3 ? q + 1 : q;
        if (d === 0) return;
        const u = 2 ** scale;
        const start = (2 ** 53 - q - k * d + r) * u;
        const v = (q + quarter / 4) * u;
        for (const n of [k - 1, k, k + 1, k + 5])
          expect(Object.is(repeatedSum(start, v, n), loopSum(start, v, n))).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  }, 60_000);

  it('crosses binades and meets ties in the examples that are easy to get wrong', () => {
    for (const [s, v, n] of [
      [0, 0.1, 4096],
      [0, 1e-12, 65_536],
      [1, 2 ** -53, 10],
      [1, 2 ** -53 + 2 ** -80, 10],
      [1, 3 * 2 ** -54, 1000],
      [2 ** 53 - 1, 1, 5],
      [0, 3 * 2 ** -20, 5000],
      [1e300, 1e292, 3000],
      // Zeros keep their sign rules; a sum that reaches 0 exactly is +0.
      [-0, 0, 3],
      [-0, -0, 3],
      [3, -1, 3],
      [3, -1, 5],
      [-0, -0.1, 100],
    ] as const)
      expect(Object.is(repeatedSum(s, v, n), loopSum(s, v, n))).toBe(true);
  });
});
