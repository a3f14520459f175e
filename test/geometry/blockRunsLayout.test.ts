import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bandedNeighbourTable } from '../../src/geometry/bandedPairs';
import { ANY_BOXES, NO_REPEATS } from '../support/bandLimits';
import { blockRuns } from '../../src/geometry/blockRuns';
import { groupedGridTable } from '../../src/geometry/neighbourGrid';
import { neighboursOf, type NeighbourTable } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE, type Rect } from '../../src/geometry/rect';
import { blockTable, boxesOf, MAT_CODE, type BlockTable, type Boxes } from '../../src/geometry/blockTable';
import { blockRunsBefore } from '../support/blockRunsBefore';
import { designWith } from '../support/designs';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

/*
 * Runs cut once per band layout and walks repeated for pairs of runs laid out alike (blockRuns.ts,
 * bandedPairs.ts) against the block-by-block cut and walking every pair of runs (the oracles), on
 * floorplans made of repeated rows: the same row of left edges and widths at several heights, with
 * several codes, some copies nudged by a margin or an ulp so that they only nearly repeat.
 */

const MICRON = 1e-6;

interface Coded {
  readonly rect: Rect;
  readonly code: number;
}

/** Shifts on and around the margins the box tests use, and rounding-sized ones. */
const near = fc.constantFrom(0, 0, 0, ABUTMENT_TOLERANCE, -ABUTMENT_TOLERANCE, 1e-21, ABUTMENT_TOLERANCE / 2);

/**
 * A row of left edges and widths (m): gaps from touching to a few microns, now and then an overlap,
 * some edges shifted by about the margin (so that the box test's two directions round differently).
 */
const rowLayout = fc
  .record({
    x: fc.integer({ min: -4, max: 4 }),
    blocks: fc.array(
      fc.record({ width: fc.integer({ min: 0, max: 5 }), gap: fc.constantFrom(0, 0, 1, 2, -1), shift: near }),
      { minLength: 1, maxLength: 8 },
    ),
  })
  .map(({ x, blocks }) => {
    let at = x;
    return blocks.map((b) => {
      const placed = { x: at * MICRON + b.shift, width: b.width * MICRON };
      at += b.width + b.gap;
      return placed;
    });
  });

/** Nudges on and around the margins, rounding-sized ones, and a sign change of zero. */
const nudge = fc.constantFrom(ABUTMENT_TOLERANCE, -ABUTMENT_TOLERANCE, 1e-21, -1e-21, 5e-22, MICRON, -0);

/**
 * A few row layouts, each written at several heights (tops and heights that meet, overlap or clear the
 * rows around them, some shifted by about the margin), with one code per row or mixed codes, in some
 * design order; a few coordinates nudged.
 */
const repeatedRows = fc
  .record({
    layouts: fc.array(rowLayout, { minLength: 1, maxLength: 3 }),
    rows: fc.array(
      fc.record({
        layout: fc.nat(),
        y: fc.integer({ min: 0, max: 12 }),
        shift: near,
        height: fc.integer({ min: 0, max: 4 }),
        code: fc.integer({ min: 0, max: 3 }),
        mixed: fc.boolean(),
      }),
      { minLength: 1, maxLength: 9 },
    ),
    nudges: fc.array(
      fc.record({ at: fc.nat(), field: fc.constantFrom('x', 'y', 'width', 'height'), by: nudge }),
      { maxLength: 3 },
    ),
  })
  .map(({ layouts, rows, nudges }): Coded[] => {
    const blocks = rows.flatMap((row) =>
      (layouts[row.layout % layouts.length] ?? []).map((placed, k) => ({
        rect: {
          x: placed.x,
          y: row.y * MICRON + row.shift,
          width: placed.width,
          height: row.height * MICRON,
        },
        code: row.mixed ? (row.code + k) % 4 : row.code,
      })),
    );
    for (const { at, field, by } of nudges) {
      const block = blocks[at % blocks.length];
      if (block) block.rect[field as keyof Rect] = by === 0 ? -0 : block.rect[field as keyof Rect] + by;
    }
    return blocks;
  });

const GROUPINGS = [Uint8Array.of(1, 0, 0, 0), Uint8Array.of(0, 1, 2, 3)];

function rows(table: NeighbourTable, n: number): number[][] {
  return Array.from({ length: n }, (_, i) => neighboursOf(table, i));
}

function bits(values: Float64Array, from: number, to: number): string {
  return Array.from(new Uint32Array(values.slice(from, to).buffer)).join(',');
}

/** Whether runs r and s hold the same left edges and widths, bit for bit. */
function laidOutAlike(boxes: Boxes, start: Int32Array, r: number, s: number): boolean {
  const at = (k: number) => start[k] as number;
  return (
    at(r + 1) - at(r) === at(s + 1) - at(s) &&
    bits(boxes.x, at(r), at(r + 1)) === bits(boxes.x, at(s), at(s + 1)) &&
    bits(boxes.width, at(r), at(r + 1)) === bits(boxes.width, at(s), at(s + 1))
  );
}

/**
 * The table's copies (runRows.ts RunCopies) say what its rows hold: run r's rows are its model's, every
 * neighbour moved from the model's k-th partner run to the same place in r's k-th partner run. Returns
 * how many runs copy another's rows.
 */
function copiesHold(table: NeighbourTable): number {
  const runs = table.runs;
  const copies = table.copies;
  expect(copies === null || copies === undefined).toBe(runs === null || runs === undefined);
  if (!runs || !copies) return 0;
  const { model, partnersFrom, partners } = copies;
  const at = (k: number) => runs.start[k] as number;
  let copied = 0;
  for (let r = 0; r < runs.count; r++) {
    const m = model[r] as number;
    const from = partnersFrom[r] as number;
    const to = partnersFrom[r + 1] as number;
    const mine = Array.from(partners.subarray(from, to));
    // Every neighbour lies in one of the run's partner runs.
    for (let i = at(r); i < at(r + 1); i++)
      for (const j of neighboursOf(table, i))
        expect(mine.some((p) => at(p) <= j && j < at(p + 1))).toBe(true);
    if (m === r) continue;
    copied++;
    expect(at(m + 1) - at(m)).toBe(at(r + 1) - at(r));
    expect((partnersFrom[m + 1] as number) - (partnersFrom[m] as number)).toBe(to - from);
    const moved = (j: number): number => {
      for (let k = 0; k < to - from; k++) {
        const pm = partners[(partnersFrom[m] as number) + k] as number;
        if (at(pm) <= j && j < at(pm + 1)) return j - at(pm) + at(partners[from + k] as number);
      }
      return -1;
    };
    for (let q = 0; q < at(r + 1) - at(r); q++)
      expect(neighboursOf(table, at(r) + q)).toEqual(neighboursOf(table, at(m) + q).map(moved));
  }
  return copied;
}

describe('runs cut per band layout, walks repeated per pair of layouts', () => {
  it('cuts the runs the block-by-block cut does, and gives one layout only to runs laid out alike', () => {
    fc.assert(
      fc.property(repeatedRows, fc.constantFrom(0, ABUTMENT_TOLERANCE, MICRON), (blocks, margin) => {
        const boxes = boxesOf(blocks.map((b) => b.rect));
        const code = Uint8Array.from(blocks, (b) => b.code);
        const runs = blockRuns(boxes, code, margin, boxes.count);
        const before = blockRunsBefore(boxes, code, margin, boxes.count);
        // Bands are told apart by bits: a top edge or height of −0 beside 0 starts a band (and a run)
        // the numeric comparison did not; the walks give the same pairs either way.
        const signedZero = blocks.some((b) => Object.is(b.rect.y, -0) || Object.is(b.rect.height, -0));
        expect(runs === null).toBe(before === null);
        if (!runs || !before) return;
        if (!signedZero) {
          expect(Array.from(runs.start)).toEqual(Array.from(before.start));
          expect(Array.from(runs.top)).toEqual(Array.from(before.top));
          expect(Array.from(runs.bottom)).toEqual(Array.from(before.bottom));
          expect(Array.from(runs.code)).toEqual(Array.from(before.code));
          expect(Array.from(runs.touching)).toEqual(Array.from(before.touching));
        }
        for (let r = 0; r < runs.count; r++) {
          for (let s = 0; s < r; s++) {
            if (runs.layout[r] !== runs.layout[s]) continue;
            expect(laidOutAlike(boxes, runs.start, r, s)).toBe(true);
            expect(runs.touching[r]).toBe(runs.touching[s]);
          }
        }
      }),
      { numRuns: 1500 },
    );
  }, 60_000);

  it('finds by repeated walks the rows and shared pairs of walking every pair of runs, and of the grid', () => {
    let copiedRuns = 0;
    fc.assert(
      fc.property(
        repeatedRows,
        fc.constantFrom(0, ABUTMENT_TOLERANCE, MICRON),
        fc.constantFrom(...GROUPINGS),
        (blocks, margin, groupOf) => {
          const boxes = boxesOf(blocks.map((b) => b.rect));
          const code = Uint8Array.from(blocks, (b) => b.code);
          const repeated = bandedNeighbourTable(boxes, margin, code, groupOf, ANY_BOXES);
          const walked = bandedNeighbourTable(boxes, margin, code, groupOf, NO_REPEATS);
          expect(repeated === null).toBe(walked === null);
          if (!repeated || !walked) return;
          const n = boxes.count;
          expect(rows(repeated, n)).toEqual(rows(walked, n));
          expect(Array.from(repeated.start)).toEqual(Array.from(walked.start));
          expect(Array.from(repeated.end)).toEqual(Array.from(walked.end));
          expect(Array.from(repeated.shared?.pairs ?? [])).toEqual(Array.from(walked.shared?.pairs ?? []));
          // The table carries the runs it was found by, for other passes to read.
          expect(Array.from(repeated.runs?.start ?? [])).toEqual(
            Array.from(blockRuns(boxes, code, margin, n)?.start ?? []),
          );
          const group = Uint8Array.from(blocks, (b) => groupOf[b.code] as number);
          expect(rows(repeated, n)).toEqual(rows(groupedGridTable(boxes, margin, group), n));
          copiedRuns += copiesHold(repeated);
        },
      ),
      { numRuns: 1500 },
    );
    expect(copiedRuns).toBeGreaterThan(50);
  }, 60_000);

  it('takes a table’s stretches as bands: the rows of bands cut from the coordinates, and the grid’s', () => {
    const isMat = Uint8Array.from({ length: 8 }, (_, code) => (code === MAT_CODE ? 1 : 0));
    const floorplans = fc.oneof(editedGridFloorplan, irregularFloorplan, stripChainFloorplan);
    fc.assert(
      fc.property(floorplans, (blocks) => {
        const table: BlockTable = blockTable(designWith(blocks));
        const stretches = table.stretches ?? new Int32Array(0);
        // Each stretch: one top edge, width, height and code.
        for (let k = 0; k + 1 < stretches.length; k++)
          for (let i = (stretches[k] as number) + 1; i < (stretches[k + 1] as number); i++)
            for (const field of ['y', 'width', 'height', 'type'] as const)
              expect(table[field][i]).toBe(table[field][i - 1]);
        const { count, x, y, width, height } = table;
        const plain = { count, x, y, width, height };
        const noted = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, isMat, ANY_BOXES);
        const cut = bandedNeighbourTable(plain, ABUTMENT_TOLERANCE, table.type, isMat, ANY_BOXES);
        expect(noted === null).toBe(cut === null);
        if (!noted || !cut) return;
        expect(rows(noted, count)).toEqual(rows(cut, count));
        const group = Uint8Array.from(table.type, (code) => isMat[code] as number);
        expect(rows(noted, count)).toEqual(rows(groupedGridTable(plain, ABUTMENT_TOLERANCE, group), count));
        copiesHold(noted);
        const runs = noted.runs;
        if (runs)
          for (let r = 0; r < runs.count; r++)
            for (let s = 0; s < r; s++)
              if (runs.layout[r] === runs.layout[s]) expect(laidOutAlike(table, runs.start, r, s)).toBe(true);
      }),
      { numRuns: 400 },
    );
  }, 60_000);

  it('repeats the walks of a tiled array: rows of one layout share one layout id', () => {
    const rects: Rect[] = [];
    for (let r = 0; r < 4; r++)
      for (let c = 0; c < 5; c++)
        rects.push({ x: c * 3 * MICRON, y: r * 2 * MICRON, width: 2 * MICRON, height: MICRON });
    const runs = blockRuns(boxesOf(rects), new Uint8Array(rects.length), ABUTMENT_TOLERANCE, rects.length);
    expect(runs && Array.from(runs.layout)).toEqual([0, 0, 0, 0]);
    expect(runs?.layouts).toBe(1);
  });
});
