import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chooseGrid } from '../../src/designs/gridChoice';
import { MAX_PARTITION_MATS } from '../../src/designs/partitionPlan';
import { everyGridCandidate } from '../support/gridOracle';

// chooseGrid() skips candidates a lower bound rules out; it must pick exactly the grid that trying every
// candidate picks, ties included (arithmetic; the oracle is the old whole scan).
const LIMIT = 60_000;

/** Lengths (m): whole multiples of 0.25 µm give many exact ties; any double gives the general case. */
const length = (min: number, max: number) =>
  fc.oneof(
    fc.integer({ min: Math.ceil(min / 0.25e-6), max: Math.floor(max / 0.25e-6) }).map((n) => n * 0.25e-6),
    fc.double({ min, max, noNaN: true }),
  );

const gridInputs = fc.record({
  needed: fc.oneof(fc.integer({ min: 1, max: 64 }), fc.integer({ min: 1, max: MAX_PARTITION_MATS })),
  lossRows: fc.constantFrom(0, 1),
  matWidth: length(0.25e-6, 2e-3),
  matHeight: length(0.25e-6, 2e-3),
  strips: fc.record({
    senseAmpStripHeight: length(0.25e-6, 1e-3),
    wordlineDriverStripWidth: length(0.25e-6, 1e-3),
    rowDecoderWidth: fc.oneof(fc.constant(0), length(0.25e-6, 1e-3)),
    columnDecoderHeight: fc.oneof(fc.constant(0), length(0.25e-6, 1e-3)),
  }),
  maxMats: fc.constantFrom(MAX_PARTITION_MATS, 64, 1000),
});

describe('bank grid choice with a lower bound (chooseGrid)', () => {
  it(
    'picks the grid trying every candidate picks (property)',
    () => {
      fc.assert(
        fc.property(gridInputs, (g) => {
          const args = [g.needed, g.lossRows, g.matWidth, g.matHeight, g.strips, g.maxMats] as const;
          expect(chooseGrid(...args)).toEqual(everyGridCandidate(...args));
        }),
        { numRuns: 3000, seed: 20_261_205 },
      );
    },
    LIMIT,
  );

  it('square mats without decoders: the tie between a×b and b×a goes to the one listed first', () => {
    const strips = {
      senseAmpStripHeight: 1e-6,
      wordlineDriverStripWidth: 1e-6,
      rowDecoderWidth: 0,
      columnDecoderHeight: 0,
    };
    for (const needed of [1, 2, 6, 12, 30, 64, 100, 1000, 4096]) {
      const args = [needed, 0, 9e-6, 9e-6, strips, MAX_PARTITION_MATS] as const;
      expect(chooseGrid(...args)).toEqual(everyGridCandidate(...args));
    }
  });

  it('says so when every candidate has too many mats', () => {
    const strips = {
      senseAmpStripHeight: 1e-6,
      wordlineDriverStripWidth: 1e-6,
      rowDecoderWidth: 0,
      columnDecoderHeight: 0,
    };
    expect(chooseGrid(50, 1, 1e-5, 1e-5, strips, 50)).toBeNull();
    expect(everyGridCandidate(50, 1, 1e-5, 1e-5, strips, 50)).toBeNull();
  });
});
