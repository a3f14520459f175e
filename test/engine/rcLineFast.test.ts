import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drivenLineTime, farEndTimeShare, lineModes } from '../../src/engine/physics/rcLine';
import * as before from '../support/rcLineBefore/rcLine';

// farEndTimeShare decides most bisection steps from the first four modes and a bound on the rest; the
// oracle sums all 16 terms at every step. The times must be the same numbers, bit for bit.

/** Source-to-line resistance ratios from none to far beyond any driver (and a few odd ones). */
const ratio = fc.oneof(
  fc.double({ min: 0, max: 1e4, noNaN: true }),
  fc.double({ min: 1e-9, max: 1, noNaN: true }),
  fc.constantFrom(0, 1e-300, 1e-12, 1, 1e12, 1e300),
);
/** Fractions of the step, inside (0, 1), dense near both ends and at the levels the engine asks for. */
const fraction = fc.oneof(
  fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }),
  fc.double({ min: 1e-300, max: 1e-3, noNaN: true }),
  fc.double({ min: 0.999, max: 1 - 2 ** -53, noNaN: true }),
  fc.constantFrom(0.5, 0.9, 0.1, 2 ** -1074, 1 - 2 ** -53),
);

describe('far-end time shares with most steps decided from the first modes', () => {
  it('are the times the all-terms bisection finds, on random lines and fractions', () => {
    fc.assert(
      fc.property(ratio, fraction, (r, f) => {
        const got = farEndTimeShare(lineModes(r), f);
        const want = before.farEndTimeShare(before.lineModes(r), f);
        expect(Object.is(got, want)).toBe(true);
      }),
      { numRuns: 3_000 },
    );
  }, 60_000);

  it('give the same driven-line times, every argument at random', () => {
    const positive = fc.double({ min: 1e-6, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(positive, positive, positive, fraction, (rd, rl, cl, f) => {
        expect(Object.is(drivenLineTime(rd, rl, cl, f), before.drivenLineTime(rd, rl, cl, f))).toBe(true);
      }),
      { numRuns: 1_000 },
    );
  }, 60_000);
});
