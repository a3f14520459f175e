import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { uncoveredLineCount, type Interval } from '../../src/geometry/interval';
import { linesInGaps, uncoveredParts, unionIntervals } from '../support/intervalReference';

const iv = (start: number, end: number): Interval => ({ start, end });

// Source for every expected value here: arithmetic on the intervals as drawn in each row.

describe('unionIntervals', () => {
  it.each([
    ['nothing', [], 0, []],
    ['one', [iv(1, 2)], 0, [iv(1, 2)]],
    ['disjoint, out of order', [iv(5, 6), iv(1, 2)], 0, [iv(1, 2), iv(5, 6)]],
    ['overlapping', [iv(1, 4), iv(3, 6)], 0, [iv(1, 6)]],
    ['touching', [iv(1, 3), iv(3, 5)], 0, [iv(1, 5)]],
    ['nested', [iv(1, 10), iv(2, 3)], 0, [iv(1, 10)]],
    ['a gap within the tolerance closes', [iv(0, 1), iv(1.05, 2)], 0.1, [iv(0, 2)]],
    ['a gap beyond the tolerance stays', [iv(0, 1), iv(1.5, 2)], 0.1, [iv(0, 1), iv(1.5, 2)]],
    ['empty and reversed intervals are dropped', [iv(2, 2), iv(4, 3), iv(0, 1)], 0, [iv(0, 1)]],
  ] as const)('%s', (_name, input, tolerance, expected) => {
    expect(unionIntervals(input, tolerance)).toEqual(expected);
  });

  it('does not reorder the caller’s array', () => {
    const input = [iv(5, 6), iv(1, 2)];
    unionIntervals(input);
    expect(input).toEqual([iv(5, 6), iv(1, 2)]);
  });
});

describe('uncoveredParts of [0, length]', () => {
  it.each([
    ['nothing covered', [], 10, [iv(0, 10)]],
    ['all covered', [iv(0, 10)], 10, []],
    ['covered beyond both ends', [iv(-5, 15)], 10, []],
    ['left half covered', [iv(0, 5)], 10, [iv(5, 10)]],
    ['right half covered', [iv(5, 10)], 10, [iv(0, 5)]],
    ['middle covered', [iv(3, 7)], 10, [iv(0, 3), iv(7, 10)]],
    ['two pieces leave three gaps', [iv(2, 3), iv(5, 6)], 10, [iv(0, 2), iv(3, 5), iv(6, 10)]],
  ] as const)('%s', (_name, covered, length, expected) => {
    expect(uncoveredParts(covered, length)).toEqual(expected);
  });

  it('gaps no wider than the tolerance are ignored', () => {
    expect(uncoveredParts([iv(0, 4.9995), iv(5, 10)], 10, 1e-3)).toEqual([]);
    expect(uncoveredParts([iv(0, 9.9995)], 10, 1e-3)).toEqual([]);
  });
});

describe('linesInGaps: line i sits at (i + ½)·pitch', () => {
  it.each([
    ['whole span holds every line', [iv(0, 10)], 1, 10, 10],
    ['first half holds lines 0–4', [iv(0, 5)], 1, 10, 5],
    ['a gap between centres holds none', [iv(2.6, 3.4)], 1, 10, 0],
    ['a gap over one centre holds one', [iv(2.4, 2.6)], 1, 10, 1],
    ['a gap ending exactly on a centre excludes it', [iv(0, 2.5)], 1, 10, 2],
    ['a gap starting exactly on a centre includes it', [iv(2.5, 4)], 1, 10, 2],
    ['lines past lineCount are not counted', [iv(0, 100)], 1, 10, 10],
    ['two gaps add up', [iv(0, 2), iv(8, 10)], 1, 10, 4],
    ['pitch 2F in metres', [iv(0, 18e-9 * 2 * 512)], 18e-9 * 2, 1024, 512],
  ] as const)('%s', (_name, gaps, pitch, lineCount, expected) => {
    expect(linesInGaps(gaps, pitch, lineCount)).toBe(expected);
  });
});

describe('uncoveredLineCount (the flat form used by evaluate)', () => {
  const span = fc
    .tuple(fc.integer({ min: -4, max: 44 }), fc.integer({ min: -4, max: 44 }))
    .map(([a, b]) => iv(a * 0.25, b * 0.25));

  it('counts the same lines as linesInGaps of uncoveredParts, clipped to a window', () => {
    fc.assert(
      fc.property(
        fc.array(span, { maxLength: 6 }),
        fc.integer({ min: 0, max: 40 }),
        fc.integer({ min: 0, max: 40 }),
        fc.constantFrom(0, 1e-9, 0.3),
        (spans, a, b, tolerance) => {
          const length = 10;
          const pitch = 0.5;
          const lineCount = 20;
          const from = Math.min(a, b) * 0.25;
          const to = Math.max(a, b) * 0.25;
          const gaps = uncoveredParts(spans, length, tolerance)
            .map((g) => iv(Math.max(g.start, from), Math.min(g.end, to)))
            .filter((g) => g.end > g.start);
          const flat = new Float64Array(spans.flatMap((s) => [s.start, s.end]));
          expect(uncoveredLineCount(flat, spans.length, length, tolerance, pitch, lineCount, from, to)).toBe(
            linesInGaps(gaps, pitch, lineCount),
          );
          const flatAgain = new Float64Array(spans.flatMap((s) => [s.start, s.end]));
          expect(uncoveredLineCount(flatAgain, spans.length, length, tolerance, pitch, lineCount)).toBe(
            linesInGaps(uncoveredParts(spans, length, tolerance), pitch, lineCount),
          );
        },
      ),
      { numRuns: 3000 },
    );
  });
});
