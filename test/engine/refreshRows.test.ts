import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { refreshRows } from '../../src/engine/evaluation/totals';
import { bandedNeighbourTable } from '../../src/geometry/bandedPairs';
import { ANY_BOXES, MAT_GROUP } from '../support/bandLimits';
import { BlockRuns } from '../../src/geometry/blockRuns';
import { blockTable, MAT_CODE, type BlockTable } from '../../src/geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import { matGeometry } from '../../src/geometry/matGeometry';
import type { Block } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith, mat } from '../support/designs';
import { refreshRows as oracleRefreshRows } from '../support/evaluateOracle/refreshRows';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

// Rows to refresh: mats side by side along their word lines, with the same extent across them, form one
// band that one row activation crosses, so a band counts its largest word-line count once. The band rule is
// common practice (no source); the expected counts are arithmetic on the layouts drawn here.

const F = DEMO_PROCESS.featureSize;
const m = mat();
const g = matGeometry(m, FOLDED_8F2_CELL, F); // 512 cells per bit line at half occupancy: 1,024 word lines
const rowsOf = (blocks: Block[]) => refreshRows(blockTable(designWith(blocks)));

describe('refresh rows', () => {
  it('a 2 × 2 grid of mats with vertical bit lines has two bands of 1,024 rows', () => {
    expect(g.wordlineCount).toBe(1024);
    const blocks = [0, 1].flatMap((r) =>
      [0, 1].map((c) => mat({ id: `m${r}${c}`, x: c * (g.width + 3e-6), y: r * (g.height + 6e-6) })),
    );
    expect(rowsOf(blocks)).toBe(2048);
  });

  it('mats of one band need not follow each other in the design', () => {
    const a1 = mat({ id: 'a1', x: 0, y: 0 });
    const b1 = mat({ id: 'b1', x: 0, y: g.height + 6e-6 });
    const a2 = mat({ id: 'a2', x: g.width + 3e-6, y: 0 });
    expect(rowsOf([a1, b1, a2])).toBe(2048);
  });

  it('a shorter mat in the same row is a band of its own', () => {
    const tall = mat({ id: 'tall' });
    const short = mat({ id: 'short', cellsPerBitline: 256, x: g.width + 3e-6 });
    expect(rowsOf([tall, short])).toBe(1024 + 512);
  });

  it('with horizontal bit lines, bands run down the page', () => {
    const blocks = [0, 1, 2].map((r) =>
      mat({ id: `h${r}`, bitlineAxis: 'horizontal', x: 0, y: r * (g.width + 6e-6) }),
    );
    // Three mats stacked, all starting at x = 0 with the same width: one band.
    expect(rowsOf(blocks)).toBe(1024);
  });

  it('counts nothing without mats', () => {
    expect(rowsOf([])).toBe(0);
  });
});

describe('refresh rows against the pre-rewrite pass', () => {
  // The pass skips a mat whose kind and start and extent bits equal the mat before it; the oracle reads
  // every mat. Tables drawn here from a few values, so that equal bits, −0, NaN and mats of other kinds
  // (other axis, word-line count, static cells) with the same numbers follow each other often.
  const value = fc.constantFrom(0, -0, 1e-6, 2e-6, 2e-6 + 2e-22, 3.5e-6, 1.000000001e-6, NaN);
  const kindArb = fc.record({
    static: fc.boolean(),
    vertical: fc.boolean(),
    wordlines: fc.constantFrom(128, 256, 1024),
  });
  const tableArb = fc
    .record({
      kinds: fc.array(kindArb, { minLength: 1, maxLength: 4 }),
      blocks: fc.array(
        fc.record({ mat: fc.nat(5), kind: fc.nat(), x: value, y: value, w: value, h: value }),
        { maxLength: 40 },
      ),
    })
    .map(({ kinds, blocks }) => {
      const n = blocks.length;
      const of = (pick: (b: (typeof blocks)[number]) => number) => Float64Array.from(blocks, pick);
      return {
        count: n,
        type: Uint8Array.from(blocks, (b) => (b.mat > 0 ? MAT_CODE : MAT_CODE + 1)),
        kindOf: Int32Array.from(blocks, (b) => (b.mat > 0 ? b.kind % kinds.length : -1)),
        x: of((b) => b.x),
        y: of((b) => b.y),
        width: of((b) => b.w),
        height: of((b) => b.h),
        kinds: kinds.map((k) => ({
          cell: { kind: k.static ? 'sram-6t' : 'dram-1t1c' },
          block: { bitlineAxis: k.vertical ? 'vertical' : 'horizontal' },
          geometry: { wordlineCount: k.wordlines },
        })),
      } as unknown as BlockTable;
    });

  it('counts the same rows on random tables of repeated values', () => {
    fc.assert(
      fc.property(tableArb, (table) => {
        expect(Object.is(refreshRows(table), oracleRefreshRows(table))).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  }, 60_000);
});

describe('refresh rows run by run', () => {
  // With the neighbour pass's runs, only runs of mats are visited and a mat of the last one's kind in the
  // same run is skipped; without, every block. Floorplans of every kind, runs cut on any of them.
  const sameByRuns = (blocks: Block[]) => {
    const table = blockTable(designWith(blocks));
    const runs = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP, ANY_BOXES)?.runs;
    if (runs) expect(Object.is(refreshRows(table, runs), oracleRefreshRows(table))).toBe(true);
  };

  it('counts the rows the block-by-block pass counts', () => {
    for (const arb of [editedGridFloorplan, irregularFloorplan, stripChainFloorplan])
      fc.assert(fc.property(arb, sameByRuns), { numRuns: 300 });
  }, 60_000);
});

describe('refresh rows of runs of mats of one kind or several', () => {
  // A run of one kind with vertical bit lines is counted by its first mat alone (the rest share its kind,
  // top edge and height). Rows of mats sharing top edge and height with kinds drawn from a few (other
  // axis, word-line count, static cells), cut into runs where the top edge or height changes.
  const value = fc.constantFrom(0, 1e-6, 2e-6, 3.5e-6);
  const kindArb = fc.record({
    static: fc.boolean(),
    vertical: fc.boolean(),
    wordlines: fc.constantFrom(128, 256, 1024),
  });
  const rowsArb = fc.record({
    kinds: fc.array(kindArb, { minLength: 1, maxLength: 4 }),
    rows: fc.array(
      fc.record({
        y: value,
        h: value,
        mats: fc.array(fc.record({ kind: fc.nat(), mixed: fc.boolean(), x: value, w: value }), {
          minLength: 1,
          maxLength: 6,
        }),
      }),
      { minLength: 1, maxLength: 6 },
    ),
  });

  it('counts the rows the block-by-block pass counts', () => {
    let mixed = 0;
    fc.assert(
      fc.property(rowsArb, ({ kinds, rows }) => {
        const blocks = rows.flatMap((row) => {
          // Most rows are of one kind; some mix in others.
          const first = row.mats[0]?.kind ?? 0;
          return row.mats.map((b) => ({
            ...b,
            y: row.y,
            h: row.h,
            kind: (b.mixed ? b.kind : first) % kinds.length,
          }));
        });
        const table = {
          count: blocks.length,
          type: new Uint8Array(blocks.length).fill(MAT_CODE),
          kindOf: Int32Array.from(blocks, (b) => b.kind),
          x: Float64Array.from(blocks, (b) => b.x),
          y: Float64Array.from(blocks, (b) => b.y),
          width: Float64Array.from(blocks, (b) => b.w),
          height: Float64Array.from(blocks, (b) => b.h),
          kinds: kinds.map((k) => ({
            cell: { kind: k.static ? 'sram-6t' : 'dram-1t1c' },
            block: { bitlineAxis: k.vertical ? 'vertical' : 'horizontal' },
            geometry: { wordlineCount: k.wordlines },
          })),
        } as unknown as BlockTable;
        // One run per row, or per stretch of one top edge and height where rows repeat them.
        const starts: number[] = [];
        blocks.forEach((b, i) => {
          const before = blocks[i - 1];
          if (!before || !Object.is(before.y, b.y) || !Object.is(before.h, b.h)) starts.push(i);
        });
        const count = starts.length;
        const runs = new BlockRuns(
          count,
          Int32Array.from([...starts, blocks.length]),
          Float64Array.from(starts, (i) => blocks[i]?.y ?? 0),
          Float64Array.from(starts, (i) => (blocks[i]?.y ?? 0) + (blocks[i]?.h ?? 0)),
          new Uint8Array(count).fill(MAT_CODE),
          new Uint8Array(count),
          new Int32Array(count),
          1,
        );
        if (new Set(blocks.map((b) => b.kind)).size > 1) mixed++;
        expect(Object.is(refreshRows(table, runs), oracleRefreshRows(table))).toBe(true);
      }),
      { numRuns: 3_000 },
    );
    expect(mixed).toBeGreaterThan(300);
  }, 60_000);
});
