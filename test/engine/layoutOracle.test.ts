import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { blockTable } from '../../src/geometry/blockTable';
import type { Block } from '../../src/model/block';
import { layoutFindings } from '../../src/engine/evaluation/layoutFindings';
import { layoutFindings as oracleLayoutFindings } from '../support/layoutOracle/layoutFindings';
import { designWith, mat, strip } from '../support/designs';

/** 64 folded-cell pitches (2F at F = 18 nm): mats of 128 or 256 cells per line span 2 or 4 units (arithmetic). */
const UNIT = 64 * 2 * 18e-9;
const TYPES = ['mat', 'senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'columnDecoder'] as const;

/** A block on a coarse grid so that edges meet often: mats, strips and decoders of random size. */
const blockArb = fc.record({
  type: fc.constantFrom(...TYPES),
  gx: fc.integer({ min: 0, max: 12 }),
  gy: fc.integer({ min: 0, max: 12 }),
  w: fc.integer({ min: 1, max: 8 }),
  h: fc.integer({ min: 1, max: 8 }),
  cells: fc.constantFrom(128, 256),
  vertical: fc.boolean(),
});

describe('layout checks against the scan-everything oracle', () => {
  it('give the same findings on random small floorplans', () => {
    fc.assert(
      fc.property(fc.array(blockArb, { minLength: 1, maxLength: 30 }), (specs) => {
        const blocks: Block[] = specs.map((s, n) =>
          s.type === 'mat'
            ? mat({
                id: `b${n}`,
                name: `b${n}`,
                x: s.gx * UNIT,
                y: s.gy * UNIT,
                cellsPerBitline: s.cells,
                cellsPerWordline: s.cells,
                bitlineAxis: s.vertical ? 'vertical' : 'horizontal',
              })
            : strip(`b${n}`, s.type, s.gx * UNIT, s.gy * UNIT, s.w * UNIT, s.h * UNIT),
        );
        const design = designWith(blocks);
        const report = evaluate(design);
        const table = blockTable(design);
        expect(layoutFindings(table, report.mats)).toEqual(oracleLayoutFindings(table, report.mats));
      }),
      { numRuns: 1000 },
    );
  }, 60_000);
});
