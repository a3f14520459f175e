import { allMats } from '../../src/engine/evaluation/matExports';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, findMatReport } from '../../src/engine/evaluation/evaluate';
import type { MatReport } from '../../src/engine/evaluation/report';
import { chargeTransferRatio } from '../../src/engine/physics/sensing';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { MAX_CELLS_PER_LINE } from '../../src/model/block';
import { designWith, mat, servedMatFigures } from '../support/designs';

/** Capacitances in the ranges the schema allows (F): Cs from 1 aF to 1 pF, Cbl up to 100 pF. */
const storage = fc.double({ min: 1e-18, max: 1e-12, noNaN: true });
const bitline = fc.double({ min: 1e-18, max: 1e-10, noNaN: true });

/** Thousands of generated cases take a few seconds; allow for a busy machine (not a speed assertion). */
const FUZZ_TIMEOUT = { timeout: 60_000 };

describe('charge-transfer ratio', () => {
  it('lies strictly between 0 and 1 for positive Cs and Cbl', FUZZ_TIMEOUT, () => {
    // Source: CTR = Cs/(Cs + Cbl), Weste & Harris, CMOS VLSI Design, 4th ed., 2011, §12.3 (arithmetic bound).
    fc.assert(
      fc.property(storage, bitline, (cs, cbl) => {
        const ctr = chargeTransferRatio(cs, cbl);
        expect(ctr).toBeGreaterThan(0);
        expect(ctr).toBeLessThan(1);
      }),
      { numRuns: 2000 },
    );
  });

  it('is exactly 1 when the bit line has no capacitance, and falls as Cbl grows', FUZZ_TIMEOUT, () => {
    // Source: arithmetic on CTR = Cs/(Cs + Cbl).
    fc.assert(
      fc.property(storage, bitline, bitline, (cs, a, b) => {
        expect(chargeTransferRatio(cs, 0)).toBe(1);
        fc.pre(a !== b);
        const [low, high] = a < b ? [a, b] : [b, a];
        expect(chargeTransferRatio(cs, low)).toBeGreaterThanOrEqual(chargeTransferRatio(cs, high));
      }),
      { numRuns: 1000 },
    );
  });
});

describe('one mat on the demo process', () => {
  const cells = fc.integer({ min: 1, max: MAX_CELLS_PER_LINE });

  it('bit-line capacitance is never negative and grows with cells per bit line', FUZZ_TIMEOUT, () => {
    // Source: Cbl = N·(Cj + Cbw + Cbb) + c_wire·L + C_sa, every term ≥ 0 (Keeth & Baker, DRAM Circuit
    // Design, 2001, ch. 2, from memory); arithmetic for the monotony.
    fc.assert(
      fc.property(cells, cells, (a, b) => {
        fc.pre(a !== b);
        const cbl = (n: number) =>
          findMatReport(evaluate(designWith([mat({ cellsPerBitline: n })])), 'm1')?.figures.bitlineCapacitance
            .total ?? NaN;
        const [low, high] = a < b ? [a, b] : [b, a];
        expect(cbl(low)).toBeGreaterThan(0);
        expect(cbl(high)).toBeGreaterThan(cbl(low));
      }),
      { numRuns: 300 },
    );
  });

  it('the sense signal falls strictly as cells per bit line grow', FUZZ_TIMEOUT, () => {
    // Source: ΔV = (V − Vpre)·Cs/(Cs + Cbl) with Cbl rising in N (Keeth & Baker, 2001, ch. 1, from memory).
    fc.assert(
      fc.property(cells, cells, (a, b) => {
        fc.pre(a !== b);
        const signal = (n: number) =>
          findMatReport(evaluate(designWith([mat({ cellsPerBitline: n })])), 'm1')?.figures.senseSignal ??
          NaN;
        const [low, high] = a < b ? [a, b] : [b, a];
        expect(signal(low)).toBeGreaterThan(signal(high));
      }),
      { numRuns: 300 },
    );
  });
});

describe('net sense margin', () => {
  it(
    'falls strictly as cells per bit line grow, for every 1T1C cell on every built-in process',
    FUZZ_TIMEOUT,
    () => {
      // Source: the margin is the charge-sharing signal less a k·σ offset and a noise allowance; the signal
      // falls with Cbl (Keeth & Baker, 2001, from memory) and the noise share Cbb/Cbl rises, while k depends
      // only on the number of sense amplifiers, which cells per bit line do not change.
      const oneT = BUILTIN_CELLS.filter((c) => c.kind === 'dram-1t1c');
      fc.assert(
        fc.property(
          fc.constantFrom(...oneT),
          fc.constantFrom(...BUILTIN_PROCESSES),
          fc.integer({ min: 1, max: 2048 }),
          fc.integer({ min: 1, max: 2048 }),
          (cell, process, a, b) => {
            fc.pre(a !== b);
            // A mat served at both ends, as in an array (a lone mat without strips senses nothing).
            const margins = (n: number) => {
              const f = servedMatFigures(cell, process, n);
              return [f.senseMargin, f.senseMarginAtRefresh, f.senseSignalAfterRefresh] as const;
            };
            const [low, high] = a < b ? [a, b] : [b, a];
            const [freshLow, agedLow, agedSignalLow] = margins(low);
            const [freshHigh, agedHigh, agedSignalHigh] = margins(high);
            expect(freshLow).toBeGreaterThan(freshHigh);
            // After a refresh window, a 1 that leaked below the precharge level reads wrongly, and a larger
            // transfer ratio then makes it worse; while it still reads right, the margin falls with N too.
            if (agedSignalLow > 0 && agedSignalHigh > 0) expect(agedLow).toBeGreaterThan(agedHigh);
          },
        ),
        { numRuns: 300 },
      );
    },
  );
});

/**
 * Every number in a mat report, by dotted name, that is NaN, less those that honestly do not exist: the
 * figures of a mat with no usable bit, the retention of a static cell, the latch and the steps after it when there is no signal to latch, and the
 * turn-on time when the word line never reaches the turn-on level.
 */
function nanFigures(report: MatReport): string[] {
  const f = report.figures;
  const absent = new Set<string>();
  if (f.usableBits === 0) {
    // Nothing is sensed (a lone open mat has no partner): no margin, retention or row cycle exists.
    for (const k of ['senseMargin', 'senseMarginAtRefresh', 'retentionTime', 'weakestRetentionTime'])
      absent.add(`figures.${k}`);
    for (const k of ['latch', 'restore', 'equalise', 'rcd', 'ras', 'rp', 'rc'])
      absent.add(`figures.timing.${k}`);
  }
  // No margin to lose (the fresh signal already falls short): no retention time exists.
  if (!f.needsRefresh || !(f.allowedDroop > 0))
    absent.add('figures.retentionTime').add('figures.weakestRetentionTime');
  if (!(f.senseSignal > 0)) for (const k of ['latch', 'rcd', 'ras', 'rc']) absent.add(`figures.timing.${k}`);
  if (!(f.wordlineTiming.turnOnShare < 1)) {
    absent.add('figures.wordlineTiming.toTurnOn').add('figures.timing.wordlineOn');
    for (const k of ['rcd', 'ras', 'rc']) absent.add(`figures.timing.${k}`);
  }
  const found: string[] = [];
  const walk = (value: unknown, name: string) => {
    if (typeof value === 'number') {
      if (Number.isNaN(value) && !absent.has(name)) found.push(name);
    } else if (typeof value === 'object' && value !== null) {
      for (const [key, inner] of Object.entries(value)) walk(inner, name ? `${name}.${key}` : key);
    }
  };
  walk(report, '');
  return found;
}

describe('grid floorplans from gridFloorplan', () => {
  const length = (min: number, max: number) => fc.double({ min, max, noNaN: true });
  const grid = fc.record({
    cell: fc.constantFrom(...BUILTIN_CELLS),
    process: fc.constantFrom(...BUILTIN_PROCESSES),
    matRows: fc.integer({ min: 1, max: 6 }),
    matColumns: fc.integer({ min: 1, max: 6 }),
    cellsPerBitline: fc.integer({ min: 1, max: 2048 }),
    cellsPerWordline: fc.integer({ min: 1, max: 2048 }),
    senseAmpStripHeight: length(0.1e-6, 20e-6),
    wordlineDriverStripWidth: length(0.1e-6, 20e-6),
    rowDecoderWidth: fc.oneof(fc.constant(0), length(1e-6, 50e-6)),
    columnDecoderHeight: fc.oneof(fc.constant(0), length(1e-6, 50e-6)),
  });

  it(
    'do not overlap, serve every line, keep efficiency in [0, 1] and give no NaN in mat figures',
    FUZZ_TIMEOUT,
    () => {
      // Source: efficiency = cell area / total area ≤ 1 whenever blocks do not overlap (Takahashi et al.,
      // IEEE JSSC 36(11), 2001, definition; arithmetic for the bound); no-NaN: common practice (no source).
      fc.assert(
        fc.property(grid, ({ process, ...spec }) => {
          const design = designWith(gridFloorplan({ ...spec, featureSize: process.featureSize }), process);
          const report = evaluate(design);
          const kinds = new Set(report.findings.map((f) => f.kind));
          expect(kinds.has('overlap')).toBe(false);
          expect(kinds.has('unsensedBitlines')).toBe(false);
          expect(kinds.has('undrivenWordlines')).toBe(false);
          expect(report.totals.matCount).toBe(spec.matRows * spec.matColumns);
          // A lone open-bit-line mat has no partner mat, so all its bits are lost and efficiency may be 0.
          expect(report.totals.arrayEfficiency).toBeGreaterThanOrEqual(0);
          expect(report.totals.arrayEfficiency).toBeLessThanOrEqual(1);
          for (const m of allMats(report.mats)) expect(nanFigures(m)).toEqual([]);
        }),
        { numRuns: 300 },
      );
    },
  );

  it('folded 8F² cells tile their mat exactly: cell area = mat area (the efficiency bound is tight)', () => {
    // Source: folded 8F² cells tile the mat outline exactly (common practice, no source; arithmetic).
    const f = servedMatFigures(FOLDED_8F2_CELL, DEMO_PROCESS, 512);
    expect(f.cellArea / f.area).toBeCloseTo(1, 12);
    expect(FOLDED_8F2_CELL.bitlineArchitecture).toBe('folded');
  });

  it('a lone mat with no strips senses nothing: no usable bit, efficiency 0, no area per bit', () => {
    // Source: a bit on a line that reaches no sense amplifier cannot be read (common practice, no source).
    const report = evaluate(designWith([mat()], DEMO_PROCESS));
    expect(report.totals.usableBits).toBe(0);
    expect(report.totals.arrayEfficiency).toBe(0);
    expect(report.totals.areaPerBit).toBeNaN();
    expect(report.totals.worstSenseMargin).toBeNaN();
  });
});
