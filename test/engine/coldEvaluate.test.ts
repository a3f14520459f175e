import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate, type Report } from '../../src/engine';
import { blockTable, type BlockTable } from '../../src/geometry/blockTable';
import { withBlocksReplaced } from '../../src/geometry/replacedBlocks';
import type { Block } from '../../src/model/block';
import { demoDesign } from '../../src/designs/demoDesign';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_PROCESS, FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { benchGridSpec } from '../bench/benchGrid';
import { designWith } from '../support/designs';
import { blockTable as oracleBlockTable } from '../support/evaluateOracle/blockTable';
import { oracleEvaluate } from '../support/evaluateOracle/evaluate';
import { firstDifference } from '../support/identical';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

// evaluate()'s block table, counts, mat loop, totals and findings were rewritten to execute fewer
// bytecodes on a first (interpreted) call; the report must not change by a single bit.

/** The rows and sums of a block table (not its blocks, cells and kinds, which are the design's objects). */
function tableFacts(table: BlockTable) {
  const { count, x, y, width, height, type, kindOf, featureSize, sums } = table;
  return { count, x, y, width, height, type, kindOf, featureSize, sums: { ...sums } };
}

/**
 * The report without what the connection pass knows of whole runs' serving lists (matTable.ts RunLists,
 * which the oracle does not make; servedRuns.test.ts checks what it promises).
 */
function reportFacts(report: Report) {
  const mats: Record<string, unknown> = { ...report.mats };
  delete mats.runLists;
  return { ...report, mats };
}

function sameAsOracle(blocks: Parameters<typeof designWith>[0]): void {
  const design = designWith(blocks);
  expect(firstDifference(tableFacts(blockTable(design)), tableFacts(oracleBlockTable(design)))).toBeNull();
  expect(firstDifference(reportFacts(evaluate(design)), oracleEvaluate(design))).toBeNull();
}

describe('evaluate() against the pre-rewrite oracle, bit for bit', () => {
  it('on the demo design and tiled grids of folded and open cells', () => {
    const demo = demoDesign();
    expect(firstDifference(reportFacts(evaluate(demo)), oracleEvaluate(demo))).toBeNull();
    for (const cell of [FOLDED_8F2_CELL, OPEN_6F2_CELL])
      sameAsOracle(gridFloorplan({ cell, featureSize: DEMO_PROCESS.featureSize, ...benchGridSpec(8, 384) }));
  });

  it('on random irregular floorplans (every cell kind, both axes, nudges around the tolerance)', () => {
    fc.assert(fc.property(irregularFloorplan, sameAsOracle), { numRuns: 600 });
  }, 60_000);

  it('on random chains of mats with strips whole, partial, shifted or nudged (open bit lines pair across)', () => {
    fc.assert(fc.property(stripChainFloorplan, sameAsOracle), { numRuns: 600 });
  }, 60_000);

  it('a table with blocks replaced has the sums of the replaced design laid out afresh', () => {
    const moves = fc.array(fc.record({ at: fc.nat(), dx: fc.integer({ min: -3, max: 3 }) }), {
      minLength: 1,
      maxLength: 4,
    });
    fc.assert(
      fc.property(stripChainFloorplan, moves, (blocks, edits) => {
        const base = blockTable(designWith(blocks));
        const replacements = new Map<number, Block>();
        for (const { at, dx } of edits) {
          const i = at % blocks.length;
          const b = blocks[i] as Block;
          replacements.set(i, { ...b, x: b.x + dx * 1e-6 });
        }
        const replaced = withBlocksReplaced(base, replacements);
        const afresh = blockTable(designWith(replaced.blocks.slice()));
        expect(firstDifference(tableFacts(replaced), tableFacts(afresh))).toBeNull();
      }),
      { numRuns: 300 },
    );
  }, 60_000);

  it('on random tiled grids with blocks removed, moved and reordered', () => {
    fc.assert(fc.property(editedGridFloorplan, sameAsOracle), { numRuns: 300 });
  }, 60_000);
});
