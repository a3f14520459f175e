import { allMats } from '../../src/engine/evaluation/matExports';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildPartition, partitionName } from '../../src/designs/buildPartition';
import { formatBits } from '../../src/model/units';
import { gridExtent, losesEdgeBits, planPartition } from '../../src/designs/partitionPlan';
import { evaluate } from '../../src/engine';
import { findOverlaps } from '../../src/engine/evaluation/overlaps';
import { senseAmpStripIdsOf } from '../../src/engine/evaluation/matExports';
import { blockTable } from '../../src/geometry/blockTable';
import { neighbourTable } from '../../src/geometry/neighbourGrid';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import {
  BUILTIN_CELLS,
  BUILTIN_PROCESSES,
  DEFAULT_OPERATING,
  DEMO_PROCESS,
  EDRAM_CELL,
  FOLDED_8F2_CELL,
  GAIN_3T_CELL,
  OPEN_6F2_CELL,
} from '../../src/model/builtins';
import { variantDesignSchema } from '../../src/model/designSchema';
import type { CellDefinition } from '../../src/model/cell';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

const MIB = 2 ** 20;

const anySpec = fc.record({
  cell: fc.constantFrom(...BUILTIN_CELLS),
  process: fc.constantFrom(...BUILTIN_PROCESSES),
  cellsPerBitline: fc.constantFrom(32, 64, 100, 128, 256, 512, 1000, 1024),
  cellsPerWordline: fc.constantFrom(32, 64, 128, 300, 512, 1024, 2048),
  targetBits: fc.integer({ min: 1, max: 8 * MIB }),
  strips: fc.record({
    senseAmpStripHeight: fc.double({ min: 1e-6, max: 12e-6, noNaN: true }),
    wordlineDriverStripWidth: fc.double({ min: 1e-6, max: 6e-6, noNaN: true }),
    rowDecoderWidth: fc.constantFrom(0, 18e-6),
    columnDecoderHeight: fc.constantFrom(0, 14e-6),
  }),
  operating: fc.constant(DEFAULT_OPERATING),
});

describe('partition builder', () => {
  it('reaches the capacity, never overlaps and serves every line, for any input (property)', () => {
    fc.assert(
      fc.property(anySpec, (spec) => {
        const built = buildPartition(spec);
        if (!built.ok) return;
        expect(variantDesignSchema.safeParse(built.design).success).toBe(true);
        const report = evaluate(built.design);
        expect(report.totals.usableBits).toBeGreaterThanOrEqual(spec.targetBits);
        expect(report.totals.usableBits).toBe(built.plan.usableBits);
        expect(report.totals.matCount).toBe(built.plan.matCount);
        const table = blockTable(built.design);
        expect(findOverlaps(table, neighbourTable(table, ABUTMENT_TOLERANCE))).toEqual([]);
        const kinds = new Set(report.findings.map((f) => f.kind));
        for (const kind of ['overlap', 'unsensedBitlines', 'undrivenWordlines'] as const) {
          expect(kinds.has(kind)).toBe(false);
        }
        // Every mat has sense amplifiers at both bit-line ends.
        expect(allMats(report.mats).every((_, k) => senseAmpStripIdsOf(report.mats, k).length === 2)).toBe(
          true,
        );
      }),
      { numRuns: 80, seed: 7 },
    );
  }, 60_000);

  it('uses no more mats than needed: neither dimension could shrink (property, arithmetic)', () => {
    fc.assert(
      fc.property(anySpec, (spec) => {
        const planned = planPartition({ ...spec, featureSize: spec.process.featureSize });
        if (!planned.ok) return;
        const p = planned.plan;
        const loss = losesEdgeBits(spec.cell) ? 1 : 0;
        const readable = (rows: number, columns: number) => (rows - loss) * columns * p.bitsPerMat;
        expect(readable(p.matRows, p.matColumns)).toBe(p.usableBits);
        expect(p.usableBits).toBeGreaterThanOrEqual(spec.targetBits);
        expect(readable(p.matRows - 1, p.matColumns)).toBeLessThan(spec.targetBits);
        expect(readable(p.matRows, p.matColumns - 1)).toBeLessThan(spec.targetBits);
      }),
      { numRuns: 300, seed: 11 },
    );
  });

  it('chooses the smallest bounding box of all grids that reach the target (brute force)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(FOLDED_8F2_CELL, OPEN_6F2_CELL, GAIN_3T_CELL),
        fc.integer({ min: 1, max: 120 }),
        fc.double({ min: 0.2e-6, max: 40e-6, noNaN: true }),
        fc.double({ min: 0.2e-6, max: 40e-6, noNaN: true }),
        (cell: CellDefinition, matsWanted, sa, swd) => {
          const strips = { ...DEMO_STRIPS, senseAmpStripHeight: sa, wordlineDriverStripWidth: swd };
          const spec = {
            cell,
            featureSize: DEMO_PROCESS.featureSize,
            cellsPerBitline: 128,
            cellsPerWordline: 256,
            strips,
            targetBits: 1,
          };
          const bitsPerMat = planPartition(spec);
          if (!bitsPerMat.ok) throw new Error(bitsPerMat.error);
          const target = matsWanted * bitsPerMat.plan.bitsPerMat;
          const planned = planPartition({ ...spec, targetBits: target });
          if (!planned.ok) throw new Error(planned.error);
          const loss = losesEdgeBits(cell) ? 1 : 0;
          let smallest = Infinity;
          for (let rows = 1; rows <= matsWanted + loss; rows++) {
            for (let columns = 1; columns <= matsWanted; columns++) {
              if ((rows - loss) * columns < matsWanted) continue;
              const e = gridExtent(rows, columns, planned.plan.matWidth, planned.plan.matHeight, strips);
              smallest = Math.min(smallest, e.width * e.height);
            }
          }
          expect(planned.plan.width * planned.plan.height).toBeLessThanOrEqual(smallest * (1 + 1e-12));
        },
      ),
      { numRuns: 200, seed: 3 },
    );
  });

  it.each([
    ['1T1C folded 8F² on Halden D18', FOLDED_8F2_CELL, 64e-3, [128, 256, 512], [256, 512, 1024, 2048]],
    ['1T1C open 6F² on Halden D18', OPEN_6F2_CELL, 64e-3, [64, 128, 256], [256, 512, 1024]],
    ['eDRAM folded on Halden D18', EDRAM_CELL, 64e-3, [128, 512, 1024], [256, 1024]],
    // The weakest of the bank's 16 Mi cells (two-population retention) sets the window: 2 ms, not 10 ms.
    ['3T gain cell on Halden D18, 2 ms refresh', GAIN_3T_CELL, 2e-3, [64, 256], [128, 1024]],
  ] as const)('gives a design with no failing check for sane inputs: %s', (_, cell, window, bls, wls) => {
    for (const cellsPerBitline of bls) {
      for (const cellsPerWordline of wls) {
        const built = buildPartition({
          targetBits: 16 * MIB,
          cell,
          process: DEMO_PROCESS,
          operating: { ...DEFAULT_OPERATING, refreshWindow: window },
          cellsPerBitline,
          cellsPerWordline,
          strips: DEMO_STRIPS,
        });
        if (!built.ok) throw new Error(built.error);
        const errors = evaluate(built.design).findings.filter((f) => f.severity === 'error');
        expect(errors, `${cellsPerBitline} × ${cellsPerWordline}`).toEqual([]);
      }
    }
  });

  it('gives an open 1T1C array one extra mat row for the halves lost at its two edges', () => {
    const built = buildPartition({
      targetBits: 8 * 256 * 512,
      cell: OPEN_6F2_CELL,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 256,
      cellsPerWordline: 512,
      strips: DEMO_STRIPS,
    });
    if (!built.ok) throw new Error(built.error);
    const report = evaluate(built.design);
    // 8 mats' worth of bits: the edge rows each read half, so one extra row of mats.
    expect(built.plan.matCount).toBe(8 + built.plan.matColumns);
    expect(report.totals.lostBits).toBe(built.plan.matColumns * 256 * 512);
    expect(report.findings.some((f) => f.kind === 'openBitlineEdge' && f.severity === 'warning')).toBe(true);
  });

  it('places mats, strips and decoders where the plan says', () => {
    const built = buildPartition({
      targetBits: 6 * 512 * 1024,
      cell: FOLDED_8F2_CELL,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      strips: DEMO_STRIPS,
    });
    if (!built.ok) throw new Error(built.error);
    const { plan, design } = built;
    const count = (type: string) => design.blocks.filter((b) => b.type === type).length;
    expect(count('mat')).toBe(plan.matCount);
    expect(count('senseAmpStrip')).toBe((plan.matRows + 1) * plan.matColumns);
    expect(count('wordlineDriverStrip')).toBe(plan.matRows * (plan.matColumns + 1));
    expect(count('rowDecoder')).toBe(1);
    expect(count('columnDecoder')).toBe(1);
    const report = evaluate(design);
    expect(report.totals.totalArea).toBeCloseTo(plan.width * plan.height, 20);
  });

  it('refuses nonsense with a reason', () => {
    const base = {
      targetBits: MIB,
      cell: FOLDED_8F2_CELL,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      strips: DEMO_STRIPS,
    };
    const refused = (patch: object) => {
      const r = buildPartition({ ...base, ...patch });
      return r.ok ? '' : r.error;
    };
    expect(refused({ cellsPerBitline: 0 })).toMatch(/whole numbers/);
    expect(refused({ cellsPerWordline: 1.5 })).toMatch(/whole numbers/);
    expect(refused({ targetBits: 0 })).toMatch(/target capacity/);
    expect(refused({ strips: { ...DEMO_STRIPS, senseAmpStripHeight: 0 } })).toMatch(/above zero/);
    expect(refused({ strips: { ...DEMO_STRIPS, rowDecoderWidth: Number.NaN } })).toMatch(/decoder/);
    expect(refused({ targetBits: 2 ** 34, cellsPerBitline: 16, cellsPerWordline: 16 })).toMatch(/mats/);
  });

  it('names a build after what it is', () => {
    expect(formatBits(64 * MIB)).toBe('64 Mib');
    expect(formatBits(1.5 * 2 ** 30)).toBe('1.5 Gib');
    expect(formatBits(1000)).toBe('1,000 b');
    const name = partitionName({
      targetBits: 64 * MIB,
      cell: FOLDED_8F2_CELL,
      process: DEMO_PROCESS,
      operating: DEFAULT_OPERATING,
      cellsPerBitline: 512,
      cellsPerWordline: 1024,
      strips: DEMO_STRIPS,
    });
    expect(name).toBe('64 Mib bank · 1T1C folded 8F² · 512 × 1024 · Halden D18');
  });
});
