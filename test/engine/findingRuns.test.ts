import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { collectFindings } from '../../src/engine/evaluation/checks';
import type { MatTable } from '../../src/engine/evaluation/matTable';
import { demoDesign } from '../../src/designs/demoDesign';
import { collectFindings as oracleFindings } from '../support/evaluateOracle/checks';
import { designWith } from '../support/designs';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { firstDifference } from '../support/identical';

// collectFindings walks runs of mats that share figures and leave every line served, reading the unsensed
// counts as 32-bit words; the oracle looks at every mat. Mat tables drawn here with any mix of figures
// and unserved lines (−0 included), including mats that share figures but not their unserved lines,
// which evaluate() itself never produces.
const design = demoDesign();
const report = evaluate(design);
// Figures of mats of several kinds, the first with issues of their own (1,024 and 2,048 cells per bit line
// lose margin and retention, 512 and 256 do not): tables of one, two or more figures take different ways
// to their runs (figureRuns.ts).
const allFigures = [1024, 512, 2048, 256].flatMap(
  (cells) =>
    evaluate(
      designWith(
        gridFloorplan({
          cell: FOLDED_8F2_CELL,
          featureSize: DEMO_PROCESS.featureSize,
          matRows: 2,
          matColumns: 2,
          cellsPerBitline: cells,
          cellsPerWordline: 512,
          ...DEMO_STRIPS,
        }),
      ),
    ).mats.figures,
);
const matTableArb = fc
  .record({
    figureCount: fc.integer({ min: 1, max: allFigures.length }),
    mats: fc.array(
      fc.record({
        figure: fc.nat(),
        unsensed: fc.constantFrom(0, 0, 0, -0, 3, 512),
        undriven: fc.constantFrom(0, 0, 0, 2),
        position: fc.nat(design.blocks.length - 1),
      }),
      { maxLength: 40 },
    ),
  })
  .map(({ figureCount, mats }): MatTable => ({
    count: mats.length,
    blocks: design.blocks,
    position: Int32Array.from(mats, (m) => m.position),
    figureIndex: Int32Array.from(mats, (m) => m.figure % figureCount),
    figures: allFigures.slice(0, figureCount),
    unsensedBitlines: Float64Array.from(mats, (m) => m.unsensed),
    undrivenWordlines: Int32Array.from(mats, (m) => m.undriven),
    servingPositions: new Int32Array(0),
    servingOffsets: new Int32Array(3 * mats.length),
  }));

describe('findings by runs of mats', () => {
  it('are the findings of the mat-by-mat pass on random mat tables', () => {
    fc.assert(
      fc.property(matTableArb, (mats) => {
        const actual = collectFindings(mats, [], report.storedHigh, design);
        const expected = oracleFindings(mats, [], report.storedHigh, design);
        expect(firstDifference(actual, expected)).toBeNull();
      }),
      { numRuns: 3_000 },
    );
  }, 60_000);
});
