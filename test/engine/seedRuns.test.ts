import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/engine';
import { evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { decoderReach, matIndexByPosition } from '../../src/engine/evaluation/decoderReach';
import { DecoderEdges } from '../../src/engine/evaluation/decoderEdges';
import { candidatesFound, candidatesOfChecks } from '../../src/engine/evaluation/reachSeeds';
import { ServingForest } from '../../src/engine/evaluation/servingForest';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { blockRuns } from '../../src/geometry/blockRuns';
import {
  BLOCK_TYPE_CODES,
  blockTable,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
} from '../../src/geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import type { Block, Strip } from '../../src/model/block';
import { layoutState } from '../../src/engine/evaluation/layoutFindings';
import { layoutState as layoutStateBefore } from '../support/layoutBefore/layoutFindings';
import type { Design } from '../../src/model/design';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, mat, strip } from '../support/designs';

/** 64 folded-cell pitches (2F at F = 18 nm), as in layoutFast.test.ts (arithmetic). */
const UNIT = 64 * 2 * 18e-9;
const STRIPS = ['senseAmpStrip', 'wordlineDriverStrip', 'rowDecoder', 'columnDecoder'] as const;
/** Steps around "exactly abutting" that straddle the tolerance, and an ulp-sized overlap. */
const NUDGES = [
  -ABUTMENT_TOLERANCE / 2,
  -ABUTMENT_TOLERANCE / 2,

  0,
  0,
  ABUTMENT_TOLERANCE / 2,
  -ABUTMENT_TOLERANCE / 2,
  ABUTMENT_TOLERANCE,
  -ABUTMENT_TOLERANCE,
  2 * ABUTMENT_TOLERANCE,
  -3 * ABUTMENT_TOLERANCE,
  -1e-19,
];

/**
 * The decoder seeds found run by run against those of the block-by-block pass, when the table's runs
 * exist; returns whether they did.
 */
function expectSameSeeds(design: Design): boolean {
  const table = blockTable(design);
  // The runs evaluate() passes (its neighbour pass cuts them when the table is banded), else cut here.
  const runs =
    evaluationNeighbours(table).runs ?? blockRuns(table, table.type, ABUTMENT_TOLERANCE, table.count);
  if (runs === null) return false;
  const { mats } = evaluate(design);
  const matIndexAt = matIndexByPosition(mats, table.count);
  const forest = ServingForest.of(mats, table);
  const rows = { decoderCode: BLOCK_TYPE_CODES.indexOf('rowDecoder'), stripCode: WORDLINE_DRIVER_STRIP_CODE };
  const columns = { decoderCode: BLOCK_TYPE_CODES.indexOf('columnDecoder'), stripCode: SENSE_AMP_STRIP_CODE };
  const rowEdges = DecoderEdges.of(table, rows.decoderCode);
  const columnEdges = DecoderEdges.of(table, columns.decoderCode);
  if (rowEdges?.reach !== null && columnEdges?.reach !== null) {
    // The candidates themselves, not only the seeds: the exact test after them would hide a box edge.
    const some = candidatesOfChecks(table, matIndexAt, rows, rowEdges, columns, columnEdges, null);
    const byBlocks = candidatesFound(some);
    const found = candidatesOfChecks(table, matIndexAt, rows, rowEdges, columns, columnEdges, runs);
    expect(candidatesFound(found)).toEqual(byBlocks);
  }
  const byBlocks = decoderReach(table, mats, matIndexAt, forest);
  const byRuns = decoderReach(table, mats, matIndexAt, forest, runs);
  for (let n = 0; n < 2; n++) expect(byRuns.results[n]?.reach.seed).toEqual(byBlocks.results[n]?.reach.seed);
  for (let n = 0; n < 2; n++) expect(byRuns.results[n]?.finding).toEqual(byBlocks.results[n]?.finding);
  for (let n = 0; n < 2; n++) {
    expect(byRuns.results[n]?.edges?.decoders).toEqual(byBlocks.results[n]?.edges?.decoders);
    expect(byRuns.results[n]?.edges?.reach).toEqual(byBlocks.results[n]?.edges?.reach);
  }
  return true;
}

/** Rows of blocks of one type left to right (the blocks of a run), each a little apart, against or over the last. */
const rowArb = fc.record({
  type: fc.constantFrom('mat', ...STRIPS),
  gy: fc.integer({ min: 0, max: 14 }),
  h: fc.integer({ min: 1, max: 3 }),
  vertical: fc.boolean(),
  blocks: fc.array(
    fc.record({
      gap: fc.integer({ min: 0, max: 2 }),
      w: fc.integer({ min: 1, max: 3 }),
      nudge: fc.constantFrom(...NUDGES),
    }),
    { minLength: 1, maxLength: 8 },
  ),
});

function rowsOf(rows: readonly (typeof rowArb extends fc.Arbitrary<infer T> ? T : never)[]): Block[] {
  const blocks: Block[] = [];
  rows.forEach((row, r) => {
    let x = 0;
    row.blocks.forEach((b, n) => {
      const id = `r${r}b${n}`;
      const at = x + b.gap * UNIT + b.nudge;
      const y = row.gy * UNIT;
      if (row.type === 'mat') {
        const m = mat({
          id,
          name: id,
          x: at,
          y,
          cellsPerBitline: 128,
          cellsPerWordline: 128,
          bitlineAxis: row.vertical ? 'vertical' : 'horizontal',
        });
        blocks.push(m);
        x = at + 2 * UNIT;
      } else {
        blocks.push(strip(id, row.type, at, y, b.w * UNIT, row.h * UNIT));
        x = at + b.w * UNIT;
      }
    });
  });
  return blocks;
}

/** A decoder whose box edge lands around a block's right edge: below, above or beside the block's row. */
const decoderArb = fc.record({
  matching: fc.boolean(),
  at: fc.nat(),
  side: fc.constantFrom('below', 'above', 'right'),
  steps: fc.constantFrom(0, 0, 0, -1, 1, -4, 4),
  size: fc.integer({ min: 1, max: 3 }),
});

function withDecoders(
  blocks: Block[],
  decoders: readonly (typeof decoderArb extends fc.Arbitrary<infer T> ? T : never)[],
): Block[] {
  const table = blocks.length > 0 ? blockTable(designWith(blocks)) : null;
  const out = blocks.slice();
  decoders.forEach((d, n) => {
    if (table === null) return;
    const i = d.at % table.count;
    const right = (table.x[i] as number) + (table.width[i] as number);
    const top = table.y[i] as number;
    const bottom = top + (table.height[i] as number);
    // Half-tolerance steps around the block's right edge, past the box's growth of twice the tolerance.
    const x = right + (d.steps * ABUTMENT_TOLERANCE) / 2 + 2 * ABUTMENT_TOLERANCE;
    const size = d.size * UNIT;
    const y = d.side === 'below' ? bottom : d.side === 'above' ? top - size : top;
    // Mostly the decoder whose check takes the block as a candidate.
    const driver = table.type[i] === WORDLINE_DRIVER_STRIP_CODE;
    out.push(
      strip(
        `d${n}`,
        driver === d.matching ? 'rowDecoder' : 'columnDecoder',
        d.side === 'right' ? right + (d.steps * ABUTMENT_TOLERANCE) / 2 : x,
        y,
        size,
        size,
      ),
    );
  });
  return out;
}

describe('decoder seeds found run by run (reachSeeds.ts)', () => {
  it('are those of the block-by-block pass on rows of blocks around decoders', () => {
    let withRuns = 0;
    let seeded = 0;
    fc.assert(
      fc.property(
        fc.array(rowArb, { minLength: 1, maxLength: 10 }),
        fc.array(decoderArb, { maxLength: 3 }),
        (rows, decoders) => {
          const design = designWith(withDecoders(rowsOf(rows), decoders));
          if (!expectSameSeeds(design)) return;
          withRuns++;
          const table = blockTable(design);
          const { mats } = evaluate(design);
          const reach = decoderReach(table, mats, matIndexByPosition(mats, table.count));
          const decoderCount = table.blocks.filter((b) => b.type.endsWith('Decoder')).length;
          const seeds = reach.results.reduce((s, r) => s + r.reach.seed.reduce((a, v) => a + v, 0), 0);
          if (seeds > decoderCount) seeded++;
        },
      ),
      { numRuns: 800 },
    );
    // Not a test that cannot fail: most tables have runs, and many have seeds besides the decoders.
    expect(withRuns).toBeGreaterThan(600);
    expect(seeded).toBeGreaterThan(100);
  }, 60_000);

  it('are those of the block-by-block pass on tiled arrays with decoders moved and nudged', () => {
    fc.assert(
      fc.property(
        fc.record({
          rows: fc.integer({ min: 1, max: 4 }),
          columns: fc.integer({ min: 1, max: 4 }),
          decoderShift: fc.integer({ min: -3, max: 3 }),
          nudge: fc.constantFrom(...NUDGES),
          vertical: fc.boolean(),
        }),
        (g) => {
          const blocks = gridFloorplan({
            cell: FOLDED_8F2_CELL,
            featureSize: DEMO_PROCESS.featureSize,
            matRows: g.rows,
            matColumns: g.columns,
            cellsPerBitline: 128,
            cellsPerWordline: 128,
            senseAmpStripHeight: UNIT,
            wordlineDriverStripWidth: UNIT,
            rowDecoderWidth: 2 * UNIT,
            columnDecoderHeight: 2 * UNIT,
          }).map((b) =>
            b.type === 'rowDecoder'
              ? { ...b, x: b.x + g.nudge, y: b.y + g.decoderShift * UNIT }
              : b.type === 'columnDecoder'
                ? { ...b, y: b.y + g.nudge, x: b.x + g.decoderShift * UNIT }
                : b,
          );
          expect(expectSameSeeds(designWith(blocks))).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  }, 60_000);
});

describe('decoder seeds when a decoder has an edge that is not finite', () => {
  it('are those of the code the one-pass search replaced', () => {
    fc.assert(
      fc.property(
        fc.array(rowArb, { minLength: 1, maxLength: 6 }),
        fc.array(decoderArb, { minLength: 1, maxLength: 2 }),
        fc.constantFrom(Infinity, -Infinity, NaN),
        fc.constantFrom('x', 'width'),
        (rows, decoders, bad, field) => {
          const blocks = withDecoders(rowsOf(rows), decoders);
          const last = blocks[blocks.length - 1] as Strip;
          blocks[blocks.length - 1] = { ...last, [field]: bad };
          const design = designWith(blocks);
          const table = blockTable(design);
          const { mats } = evaluate(design);
          const now = layoutState(table, mats);
          const before = layoutStateBefore(table, mats);
          for (let n = 0; n < 2; n++)
            expect(now.reach.results[n]?.reach.seed).toEqual(before.reach.results[n]?.reach.seed);
          expect(now.findings).toEqual(before.findings);
        },
      ),
      { numRuns: 200 },
    );
  }, 60_000);
});
