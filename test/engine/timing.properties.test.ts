import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { offsetSigmaMultiplier } from '../../src/engine/physics/offset';
import { drivenLineTime } from '../../src/engine/physics/rcLine';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';
import { servedMatFigures } from '../support/designs';

// Properties of the timing chain and the die-scale statistics (arithmetic properties, no source needed
// beyond the formulas in src/engine/rowTiming.ts, rcLine.ts and offset.ts). Each has its own time limit
// for a busy machine (not a speed assertion).
const LIMIT = 60_000;

describe('timing properties', () => {
  it(
    'word-line delays (50 %, turn-on, 90 %) grow with the line length',
    () => {
      fc.assert(
        fc.property(
          fc.constantFrom(...BUILTIN_CELLS),
          fc.constantFrom(...BUILTIN_PROCESSES),
          fc.integer({ min: 8, max: 2048 }),
          fc.integer({ min: 8, max: 2048 }),
          (cell, process, a, b) => {
            fc.pre(a !== b);
            const [short, long] = (a < b ? [a, b] : [b, a]).map((n) =>
              servedMatFigures(cell, process, 256, n),
            );
            if (!short || !long) throw new Error('expected figures');
            expect(long.wordlineDelay).toBeGreaterThan(short.wordlineDelay);
            expect(long.wordlineTiming.toNinetyPercent).toBeGreaterThan(short.wordlineTiming.toNinetyPercent);
            if (short.wordlineTiming.turnOnShare < 1 && short.wordlineTiming.turnOnShare > 0)
              expect(long.wordlineTiming.toTurnOn).toBeGreaterThan(short.wordlineTiming.toTurnOn);
          },
        ),
        { numRuns: 150 },
      );
    },
    LIMIT,
  );

  it(
    'the far end of a driven line gets later as the line, or its driver, grows',
    () => {
      const positive = fc.double({ min: 1, max: 1e6, noNaN: true });
      fc.assert(
        fc.property(positive, positive, fc.double({ min: 0.05, max: 0.95, noNaN: true }), (rd, rw, share) => {
          const base = drivenLineTime(rd, rw, 1e-13, share);
          expect(drivenLineTime(rd, rw * 1.5, 1e-13 * 1.5, share)).toBeGreaterThan(base);
          expect(drivenLineTime(rd * 2, rw, 1e-13, share)).toBeGreaterThan(base);
        }),
        { numRuns: 300 },
      );
    },
    LIMIT,
  );

  it(
    'the developed signal never exceeds the full signal, and the development time grows with the bit line',
    () => {
      const oneT = BUILTIN_CELLS.filter((c) => c.kind === 'dram-1t1c');
      fc.assert(
        fc.property(
          fc.constantFrom(...oneT),
          fc.constantFrom(...BUILTIN_PROCESSES),
          fc.integer({ min: 4, max: 2048 }),
          fc.integer({ min: 4, max: 2048 }),
          fc.double({ min: 1e-11, max: 2e-8, noNaN: true }),
          (cell, process, a, b, fire) => {
            fc.pre(a !== b);
            const operating = { ...DEFAULT_OPERATING, senseFireTime: fire };
            const [short, long] = (a < b ? [a, b] : [b, a]).map((n) =>
              servedMatFigures(cell, process, n, 256, operating),
            );
            if (!short || !long) throw new Error('expected figures');
            for (const f of [short, long])
              expect(Math.abs(f.senseSignal)).toBeLessThanOrEqual(Math.abs(f.fullSenseSignal));
            if (short.read.kind !== 'chargeSharing' || long.read.kind !== 'chargeSharing')
              throw new Error('1T1C');
            expect(long.read.developmentTimeConstant).toBeGreaterThan(short.read.developmentTimeConstant);
          },
        ),
        { numRuns: 200 },
      );
    },
    LIMIT,
  );

  it(
    'k grows with the die’s sense-amplifier count',
    () => {
      fc.assert(
        fc.property(
          fc.integer({ min: 2, max: 1e9 }),
          fc.integer({ min: 2, max: 1e9 }),
          fc.double({ min: 1e-6, max: 1, noNaN: true }),
          (a, b, failures) => {
            fc.pre(a !== b);
            const [low, high] = a < b ? [a, b] : [b, a];
            expect(offsetSigmaMultiplier(high, failures)).toBeGreaterThan(
              offsetSigmaMultiplier(low, failures),
            );
          },
        ),
        { numRuns: 500 },
      );
      // The same through the operating input: more copies of the floorplan on the die, larger k.
      const cell = BUILTIN_CELLS[0];
      const process = BUILTIN_PROCESSES[0];
      if (!cell || !process) throw new Error('built-ins');
      const one = servedMatFigures(cell, process, 512, 512, {
        ...DEFAULT_OPERATING,
        floorplanCopiesPerDie: 1,
      });
      const many = servedMatFigures(cell, process, 512, 512, {
        ...DEFAULT_OPERATING,
        floorplanCopiesPerDie: 4096,
      });
      expect(many.offsetBudget).toBeGreaterThan(one.offsetBudget);
      expect(many.weakestRetentionTime).toBeLessThanOrEqual(one.weakestRetentionTime);
    },
    LIMIT,
  );
});
