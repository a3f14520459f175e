import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bandedNeighbourTable } from '../../src/geometry/bandedPairs';
import { ANY_BOXES } from '../support/bandLimits';
import { blockRuns } from '../../src/geometry/blockRuns';
import { boxesOf, type Boxes } from '../../src/geometry/blockTable';
import { sharesBeyond } from '../../src/geometry/neighbourGrid';
import { groupedGridTable } from '../../src/geometry/neighbourGrid';
import { neighboursOf, type NeighbourTable } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE, type Rect } from '../../src/geometry/rect';

const MICRON = 1e-6;

/** A block of a generated floorplan: its rectangle and its code (a block type). */
interface Coded {
  readonly rect: Rect;
  readonly code: number;
}

/**
 * A row of blocks written left to right, as tiled arrays are: shared top edge and height, gaps from
 * touching to a few microns, now and then an overlap (negative gap); one code, or now and then a mix.
 */
const band = fc
  .record({
    y: fc.integer({ min: 0, max: 24 }),
    height: fc.integer({ min: 0, max: 8 }),
    x: fc.integer({ min: -4, max: 8 }),
    code: fc.integer({ min: 0, max: 3 }),
    mixed: fc.boolean(),
    blocks: fc.array(
      fc.record({
        width: fc.integer({ min: 0, max: 6 }),
        gap: fc.constantFrom(0, 0, 1, 2, 3, -1),
        code: fc.integer({ min: 0, max: 3 }),
      }),
      { minLength: 1, maxLength: 12 },
    ),
  })
  .map(({ y, height, x, code, mixed, blocks }): Coded[] => {
    let at = x;
    return blocks.map((b) => {
      const rect = { x: at * MICRON, y: y * MICRON, width: b.width * MICRON, height: height * MICRON };
      at += b.width + b.gap;
      return { rect, code: mixed ? b.code : code };
    });
  });

/** A lone block anywhere (irregular: tall strips, odd sizes). */
const lone = fc
  .record({
    x: fc.integer({ min: -4, max: 40 }),
    y: fc.integer({ min: -4, max: 30 }),
    w: fc.integer({ min: 0, max: 30 }),
    h: fc.integer({ min: 0, max: 30 }),
    code: fc.integer({ min: 0, max: 3 }),
  })
  .map(({ x, y, w, h, code }): Coded[] => [
    { rect: { x: x * MICRON, y: y * MICRON, width: w * MICRON, height: h * MICRON }, code },
  ]);

/** Shifts that land on and around the margins the box tests use, and rounding-sized ones. */
const nudge = fc.constantFrom(
  0,
  ABUTMENT_TOLERANCE,
  -ABUTMENT_TOLERANCE,
  ABUTMENT_TOLERANCE / 2,
  2 * ABUTMENT_TOLERANCE,
  1e-21,
  -1e-21,
  MICRON,
);

/** A floorplan: bands and lone blocks in some design order, some coordinates nudged. */
const floorplan = fc
  .record({
    pieces: fc.array(fc.oneof({ weight: 4, arbitrary: band }, { weight: 1, arbitrary: lone }), {
      minLength: 1,
      maxLength: 10,
    }),
    nudges: fc.array(
      fc.record({ at: fc.nat(), field: fc.constantFrom('x', 'y', 'width', 'height'), by: nudge }),
      { maxLength: 6 },
    ),
  })
  .map(({ pieces, nudges }): Coded[] => {
    const blocks = pieces.flat().map((b) => ({ rect: { ...b.rect }, code: b.code }));
    for (const { at, field, by } of nudges) {
      const block = blocks[at % blocks.length];
      if (block) block.rect[field as keyof Rect] += by;
    }
    return blocks;
  });

/** Groups of the four codes: mats (1) against everything else (0), or every code its own group. */
const GROUPINGS = [Uint8Array.of(1, 0, 0, 0), Uint8Array.of(0, 1, 2, 3)];

function rows(table: NeighbourTable, n: number): number[][] {
  return Array.from({ length: n }, (_, i) => neighboursOf(table, i));
}

/** Every pair sharing more than the margin both ways, by testing all of them. */
function sharedByAll(boxes: Boxes, margin: number): number[] {
  const pairs: number[] = [];
  for (let i = 0; i < boxes.count; i++)
    for (let j = i + 1; j < boxes.count; j++) if (sharesBeyond(boxes, i, j, margin)) pairs.push(i, j);
  return pairs;
}

describe('bandedNeighbourTable: the grid pass by runs of blocks', () => {
  it('finds the same rows as the grid, and every shared pair, on banded, nudged and irregular floorplans', () => {
    fc.assert(
      fc.property(
        floorplan,
        fc.constantFrom(0, ABUTMENT_TOLERANCE, MICRON),
        fc.constantFrom(...GROUPINGS),
        (blocks, margin, groupOf) => {
          const boxes = boxesOf(blocks.map((b) => b.rect));
          const code = Uint8Array.from(blocks, (b) => b.code);
          const group = Uint8Array.from(blocks, (b) => groupOf[b.code] as number);
          const banded = bandedNeighbourTable(boxes, margin, code, groupOf, ANY_BOXES);
          // An edge before its opposite one (a nudge can make one) is left to the grid, as is a lone block.
          const backwards = (b: Coded) =>
            b.rect.x + b.rect.width < b.rect.x || b.rect.y + b.rect.height < b.rect.y;
          if (blocks.length < 2 || blocks.some(backwards)) {
            expect(banded).toBeNull();
            return;
          }
          expect(banded).not.toBeNull();
          if (!banded) return;
          expect(rows(banded, boxes.count)).toEqual(
            rows(groupedGridTable(boxes, margin, group), boxes.count),
          );
          expect(Array.from(banded.shared?.pairs ?? [])).toEqual(sharedByAll(boxes, margin));
          expect(banded.shared?.margin).toBe(margin);
        },
      ),
      { numRuns: 600 },
    );
  }, 60_000);

  it('leaves floorplans without long runs to the grid, and refuses non-finite boxes and negative sizes', () => {
    const scattered = boxesOf(
      Array.from({ length: 40 }, (_, i) => ({
        x: (i % 7) * MICRON,
        y: i * MICRON,
        width: MICRON,
        height: MICRON,
      })),
    );
    const codes = new Uint8Array(40);
    expect(bandedNeighbourTable(scattered, ABUTMENT_TOLERANCE, codes, GROUPINGS[0] as Uint8Array)).toBeNull();
    const row = (x0: number) =>
      Array.from({ length: 8 }, (_, i) => ({ x: x0 + 2 * i * MICRON, y: 0, width: MICRON, height: MICRON }));
    const grouping = GROUPINGS[0] as Uint8Array;
    const eight = new Uint8Array(8);
    expect(bandedNeighbourTable(boxesOf(row(0)), 0, eight, grouping)).not.toBeNull();
    expect(bandedNeighbourTable(boxesOf(row(Infinity)), 0, eight, grouping)).toBeNull();
    expect(bandedNeighbourTable(boxesOf(row(NaN)), 0, eight, grouping)).toBeNull();
    const backwards = row(0).map((r, i) => (i === 3 ? { ...r, width: -MICRON } : r));
    expect(bandedNeighbourTable(boxesOf(backwards), 0, eight, grouping)).toBeNull();
    // A negative height, even by less than an ulp of y: the grid bins such a box into no cell.
    const upside = row(0).map((r, i) => (i === 0 ? { ...r, y: MICRON, height: -1e-21 } : r));
    expect(bandedNeighbourTable(boxesOf(upside), 0, eight, grouping)).toBeNull();
  });

  it('cuts a row written left to right into one run, and breaks it where a block steps back or changes', () => {
    const rects: Rect[] = [
      { x: 0, y: 0, width: 2, height: 1 },
      { x: 2, y: 0, width: 2, height: 1 }, // touches: same run, marked touching
      { x: 5, y: 0, width: 1, height: 1 },
      { x: 5.5, y: 0, width: 1, height: 1 }, // overlaps the one before: a new run
      { x: 8, y: 0, width: 1, height: 2 }, // other height: a new run
      { x: 10, y: 0, width: 1, height: 2 },
    ];
    const runs = blockRuns(boxesOf(rects), new Uint8Array(6), 0, 6);
    expect(runs && Array.from(runs.start)).toEqual([0, 3, 4, 6]);
    expect(runs && Array.from(runs.touching)).toEqual([1, 0, 0]);
    expect(runs && Array.from(runs.bottom)).toEqual([1, 1, 2]);
    // Reaching back by no more than the margin (abutting tiles placed with rounding) keeps the run.
    const withMargin = blockRuns(boxesOf(rects), new Uint8Array(6), 0.5, 6);
    expect(withMargin && Array.from(withMargin.start)).toEqual([0, 4, 6]);
  });
});
