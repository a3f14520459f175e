import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LineTimeMemo } from '../../src/engine/physics/lineTimeMemo';
import { farEndTimeShare, lineModes } from '../../src/engine/physics/rcLine';
import { wordlineTiming } from '../../src/engine/physics/wordline';

// The memo must give the very numbers the plain root find gives (toEqual compares numbers with Object.is),
// for lines that share a ratio Rd/Rw but differ in length, capacitance and levels. Arithmetic, no source.
const LIMIT = 60_000;

/** A few resistances, so that random lines often share a ratio with an earlier one. */
const resistance = fc.oneof(
  fc.constantFrom(0, 1e3, 2.5e3, 8e3, 40e3),
  fc.double({ min: 1, max: 1e6, noNaN: true }),
);

describe('word-line step responses kept by ratio (LineTimeMemo)', () => {
  it(
    'wordlineTiming with a memo shared across many lines equals wordlineTiming without one',
    () => {
      const memo = new LineTimeMemo();
      fc.assert(
        fc.property(
          resistance,
          resistance,
          fc.oneof(fc.constant(0), fc.double({ min: 1e-16, max: 1e-11, noNaN: true })),
          fc.constantFrom(0, 1.1, 2.6, 3.0),
          fc.constantFrom(0, 0.5, 1.45, 1.9, 3.2),
          fc.constantFrom(-0.1, 0, 0.45, 0.7),
          (rd, rw, cw, high, turnOn, off) => {
            const plain = wordlineTiming(rd, rw, cw, high, turnOn, off);
            expect(wordlineTiming(rd, rw, cw, high, turnOn, off, memo)).toEqual(plain);
            // The same ratio on a line twice as long: the shared entry must scale, not repeat.
            const longer = wordlineTiming(2 * rd, 2 * rw, 3 * cw, high, turnOn, off);
            expect(wordlineTiming(2 * rd, 2 * rw, 3 * cw, high, turnOn, off, memo)).toEqual(longer);
          },
        ),
        { numRuns: 400, seed: 20_261_205 },
      );
    },
    LIMIT,
  );

  it('hands out a whole timing it keeps for the same six inputs, and the right one after others pushed it out', () => {
    const memo = new LineTimeMemo();
    const lines = Array.from(
      { length: 12 },
      (_, i) => [2e3, 1e3 * (i + 1), 1e-13 * (i + 2), 2.6, 1.45, 0.45] as const,
    );
    const line0 = [2e3, 1e3, 2e-13, 2.6, 1.45, 0.45] as const;
    const first = wordlineTiming(...line0, memo);
    expect(wordlineTiming(...line0, memo)).toBe(first);
    // Same line but for one input, each in turn: never the kept timing.
    for (let i = 0; i < 6; i++) {
      const changed: number[] = [...line0];
      changed[i] = (changed[i] as number) * 1.5;
      const [a, b, c, d, e, f] = changed as [number, number, number, number, number, number];
      expect(wordlineTiming(a, b, c, d, e, f, memo)).toEqual(wordlineTiming(a, b, c, d, e, f));
    }
    for (const line of lines) expect(wordlineTiming(...line, memo)).toEqual(wordlineTiming(...line));
    for (const line of lines) expect(wordlineTiming(...line, memo)).toEqual(wordlineTiming(...line));
  });

  it(
    'keeps answering right after it has started over (more ratios than it keeps)',
    () => {
      const memo = new LineTimeMemo();
      const first = memo.timeShare(0.25, 0.9);
      for (let i = 1; i <= 4200; i++) memo.timeShare(0.25 + i * 1e-3, 0.5);
      expect(memo.timeShare(0.25, 0.9)).toBe(first);
      expect(memo.timeShare(0.25, 0.9)).toBe(farEndTimeShare(lineModes(0.25), 0.9));
      expect(memo.timeShare(4.45, 0.5)).toBe(farEndTimeShare(lineModes(4.45), 0.5));
    },
    LIMIT,
  );
});
