import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { partitionFigures, ProcessCache } from '../../src/explore/partitionFigures';
import { runSweepRange, sweepCoordinates, sweepSize, type SweepRequest } from '../../src/explore/sweep';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';

// What a sweep keeps between points (ProcessCache: stored-1 levels, word-line step responses, …) must not
// change a single number: a whole random sweep, run in random chunks through one cache, equals each point
// assessed on its own with a fresh cache. toEqual compares numbers with Object.is. Arithmetic, no source.

/** Cell counts drawn from a short list, so a request repeats values and lines share their ratios. */
const counts = fc.uniqueArray(fc.constantFrom(8, 16, 64, 128, 200, 256, 512, 640, 1024, 2048), {
  minLength: 1,
  maxLength: 4,
});

const requestArbitrary = fc
  .record({
    targetMib: fc.constantFrom(1, 4, 16, 64),
    cellsPerBitline: counts,
    cellsPerWordline: counts,
    cells: fc.subarray([...BUILTIN_CELLS], { minLength: 1, maxLength: 4 }),
    processes: fc.subarray([...BUILTIN_PROCESSES], { minLength: 1 }),
    senseAmpStripHeight: fc.double({ min: 1e-6, max: 10e-6, noNaN: true }),
    rowDecoderWidth: fc.constantFrom(0, 18e-6),
    refreshWindow: fc.constantFrom(64e-3, 32e-3),
    temperature: fc.constantFrom(300, 358, 378),
    spares: fc.option(
      fc.record({
        rows: fc.uniqueArray(fc.integer({ min: 0, max: 4 }), { minLength: 1, maxLength: 2 }),
        columns: fc.uniqueArray(fc.integer({ min: 0, max: 4 }), { minLength: 1, maxLength: 2 }),
      }),
      { nil: undefined },
    ),
    chunk: fc.integer({ min: 1, max: 97 }),
  })
  .map((r): { request: SweepRequest; chunk: number } => ({
    request: {
      targetBits: r.targetMib * 2 ** 20,
      strips: {
        senseAmpStripHeight: r.senseAmpStripHeight,
        wordlineDriverStripWidth: 3e-6,
        rowDecoderWidth: r.rowDecoderWidth,
        columnDecoderHeight: 14e-6,
      },
      operating: { ...DEFAULT_OPERATING, refreshWindow: r.refreshWindow, temperature: r.temperature },
      cellsPerBitline: r.cellsPerBitline,
      cellsPerWordline: r.cellsPerWordline,
      cells: r.cells,
      processes: r.processes,
      ...(r.spares ? { spares: r.spares } : {}),
    },
    chunk: r.chunk,
  }));

describe('a sweep that keeps values between points gives the numbers of points assessed alone', () => {
  it('random requests, random chunks, one cache (property)', () => {
    fc.assert(
      fc.property(requestArbitrary, ({ request, chunk }) => {
        const n = sweepSize(request);
        const cache = new ProcessCache();
        const swept = [];
        for (let start = 0; start < n; start += chunk)
          swept.push(...runSweepRange(request, start, start + chunk, cache));
        expect(swept.length).toBe(n);
        for (const point of swept) {
          const c = sweepCoordinates(request, point.index);
          const cell = request.cells[c.cellIndex];
          const process = request.processes[c.processIndex];
          if (!cell || !process) throw new Error(`point ${point.index} is outside the request`);
          const alone = partitionFigures(
            {
              targetBits: request.targetBits,
              cell,
              process,
              operating: request.operating,
              cellsPerBitline: c.cellsPerBitline,
              cellsPerWordline: c.cellsPerWordline,
              strips: request.strips,
            },
            new ProcessCache(),
            {
              withYield: c.spareRows !== null,
              spareRows: c.spareRows ?? undefined,
              spareColumns: c.spareColumns ?? undefined,
            },
          );
          expect(point.figures).toEqual(alone.ok ? alone.figures : null);
          expect(point.problem).toBe(alone.ok ? null : alone.error);
        }
      }),
      { numRuns: 40, seed: 20_261_205 },
    );
  }, 60_000);
});
