import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countMats } from '../../src/engine/evaluation/evaluate';
import { MatTableBuilder } from '../../src/engine/evaluation/matTable';
import { connectAllMats } from '../../src/engine/evaluation/servedLines';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { bandedNeighbourTable, type BandLimits } from '../../src/geometry/bandedPairs';
import { BLOCK_TYPE_CODES, blockTable, MAT_CODE, type BlockTable } from '../../src/geometry/blockTable';
import type { NeighbourTable } from '../../src/geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import { matGeometry } from '../../src/geometry/matGeometry';
import type { Block, Mat } from '../../src/model/block';
import { DEMO_PROCESS, FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { benchGridSpec } from '../bench/benchGrid';
import { designWith, mat, strip } from '../support/designs';
import { firstDifference } from '../support/identical';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

// With runs from the neighbour pass, the connection pass decides vertical tests once per pair of runs and
// compares left edges and widths by their bits (servedRuns.ts); without, it tests every pair of blocks
// (servedLines.ts, connectEachMat). Both must give the same columns and the same serving strips.

/** No fallback to the grid: the banded pass cuts runs on any floorplan. */
const ANY_BOXES: BandLimits = {
  minRunLength: 0,
  runPairsPerRun: Infinity,
  visitsPerBlock: Infinity,
  repeatWalks: true,
};
const MAT_GROUP = Uint8Array.from(BLOCK_TYPE_CODES, (_, code) => (code === MAT_CODE ? 1 : 0));

function connections(table: BlockTable, neighbours: NeighbourTable) {
  const n = countMats(table);
  const builder = new MatTableBuilder(table.blocks, n);
  const lines = connectAllMats(table, neighbours, n, builder);
  const mats = builder.finish();
  return {
    position: lines.position.slice(0, n),
    unsensedBitlines: lines.unsensedBitlines.slice(0, n),
    undrivenWordlines: lines.undrivenWordlines.slice(0, n),
    senseAmpEnds: lines.senseAmpEnds.slice(0, n),
    unpartneredBitlines: lines.unpartneredBitlines.slice(0, n),
    servedKey: lines.servedKey.slice(0, n),
    servingPositions: mats.servingPositions.slice(),
    servingOffsets: mats.servingOffsets.slice(),
  };
}

/** Whether the pass by runs gives the block-by-block pass's answers; false when no runs were cut. */
function sameByRuns(blocks: Block[]): boolean {
  const table = blockTable(designWith(blocks));
  const banded = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP, ANY_BOXES);
  if (!banded?.runs) return false;
  const plain: NeighbourTable = { start: banded.start, end: banded.end, list: banded.list };
  expect(firstDifference(connections(table, banded), connections(table, plain))).toBeNull();
  return true;
}

const F = DEMO_PROCESS.featureSize;
const MICRON = 1e-6;
/** Edge offsets (m): none, within the tolerance, just beyond it, a micron. */
const NUDGE = fc.constantFrom(0, 0, 0, 0.4e-9, -0.7e-9, 1.5e-9, -2e-9, MICRON);

/**
 * Rows of mats of one axis and height but mixed kinds (other counts along the row, so other widths and
 * edge lengths), each with strips on its top and bottom edges (whole, narrower, shifted, nudged or
 * missing) and strips between the mats (the mats' height, or shorter); written row by row, mats first,
 * as tiled arrays are, so that rows are runs.
 */
const mixedRows = fc
  .array(
    fc.record({
      vertical: fc.boolean(),
      // Mats side by side with no strip between (the strips of one touch the next mat's corners).
      abut: fc.boolean(),
      mats: fc.array(
        fc.record({
          counts: fc.constantFrom(128, 256, 384),
          top: fc.constantFrom('whole', 'whole', 'half', 'shifted', 'none'),
          bottom: fc.constantFrom('whole', 'whole', 'half', 'shifted', 'none'),
          topNudge: NUDGE,
          bottomNudge: NUDGE,
          gap: NUDGE,
          between: fc.constantFrom('whole', 'whole', 'short', 'none'),
        }),
        { minLength: 1, maxLength: 6 },
      ),
    }),
    { minLength: 1, maxLength: 4 },
  )
  .map((rows) => {
    const blocks: Block[] = [];
    let y = 6 * MICRON;
    rows.forEach((row, r) => {
      // Vertical bit lines: sense amplifiers on top and bottom, drivers between; horizontal: the other way.
      const across = row.vertical ? 'senseAmpStrip' : 'wordlineDriverStrip';
      const along = row.vertical ? 'wordlineDriverStrip' : 'senseAmpStrip';
      const mats: Block[] = [];
      const edges: Block[] = [];
      const betweens: Block[] = [];
      let x = 0;
      let height = 0;
      row.mats.forEach((m, c) => {
        const shape: Partial<Mat> = row.vertical
          ? { cellsPerBitline: 256, cellsPerWordline: m.counts, bitlineAxis: 'vertical' }
          : { cellsPerBitline: m.counts, cellsPerWordline: 256, bitlineAxis: 'horizontal' };
        const step = row.abut ? (c === 0 ? 0 : m.gap === MICRON ? 0 : m.gap) : 3 * MICRON + m.gap;
        const block = mat({ id: `m${r}-${c}`, x: x + step, y, ...shape });
        const g = matGeometry(block, FOLDED_8F2_CELL, F);
        height = g.height;
        if (m.between !== 'none' && !row.abut) {
          const h = m.between === 'short' ? g.height / 2 : g.height;
          betweens.push(strip(`b${r}-${c}`, along, x, y, 3 * MICRON, h));
        }
        mats.push(block);
        for (const [side, variant, nudge] of [
          ['t', m.top, m.topNudge],
          ['u', m.bottom, m.bottomNudge],
        ] as const) {
          if (variant === 'none') continue;
          const w = variant === 'half' ? g.width / 2 : g.width;
          const sx = block.x + (variant === 'shifted' ? g.width / 3 : nudge);
          const sy = side === 't' ? y - 6 * MICRON : y + g.height + nudge;
          edges.push(strip(`${side}${r}-${c}`, across, sx, sy, w, 6 * MICRON));
        }
        x = block.x + g.width;
      });
      if (!row.abut) betweens.push(strip(`b${r}-end`, along, x, y, 3 * MICRON, height));
      blocks.push(...mats, ...edges, ...betweens);
      y += height + 6 * MICRON;
    });
    return blocks;
  });

describe('the connection pass by runs', () => {
  it('gives the block-by-block answers on tiled grids of folded and open cells', () => {
    for (const cell of [FOLDED_8F2_CELL, OPEN_6F2_CELL])
      expect(
        sameByRuns(gridFloorplan({ cell, featureSize: DEMO_PROCESS.featureSize, ...benchGridSpec(8, 384) })),
      ).toBe(true);
  });

  it("a strip of the mats' layout at another place that touches a mat's corner shares none of its edge", () => {
    // Two mats 0.5 nm apart with a driver strip that thin between them: the sense-amplifier strip over
    // the second mat touches the first mat's corner (within the tolerance); both rows of strips have the
    // mats' left edges and widths, so the runs share one layout.
    const g = matGeometry(mat(), FOLDED_8F2_CELL, F);
    const gap = 0.5e-9;
    const y = 6 * MICRON;
    const mats = [mat({ id: 'a', x: 3 * MICRON, y }), mat({ id: 'b', x: 3 * MICRON + g.width + gap, y })];
    const blocks: Block[] = [
      ...mats,
      ...mats.map((m) => strip(`top-${m.id}`, 'senseAmpStrip', m.x, 0, g.width, y)),
      ...mats.map((m) => strip(`bottom-${m.id}`, 'senseAmpStrip', m.x, y + g.height, g.width, y)),
      strip('left', 'wordlineDriverStrip', 0, y, 3 * MICRON, g.height),
      strip('between', 'wordlineDriverStrip', 3 * MICRON + g.width, y, gap, g.height),
      strip('right', 'wordlineDriverStrip', 3 * MICRON + 2 * g.width + gap, y, 3 * MICRON, g.height),
    ];
    expect(sameByRuns(blocks)).toBe(true);
  });

  it('gives the block-by-block answers on random rows of mixed mats and strips', () => {
    fc.assert(
      fc.property(mixedRows, (blocks) => void sameByRuns(blocks)),
      { numRuns: 1500 },
    );
  }, 60_000);

  it('gives the block-by-block answers on random irregular floorplans', () => {
    fc.assert(
      fc.property(irregularFloorplan, (blocks) => void sameByRuns(blocks)),
      { numRuns: 800 },
    );
  }, 60_000);

  it('gives the block-by-block answers on random chains of mats with strips whole, partial, shifted or nudged', () => {
    fc.assert(
      fc.property(stripChainFloorplan, (blocks) => void sameByRuns(blocks)),
      { numRuns: 800 },
    );
  }, 60_000);

  it('gives the block-by-block answers on random tiled grids with blocks removed, moved and reordered', () => {
    fc.assert(
      fc.property(editedGridFloorplan, (blocks) => void sameByRuns(blocks)),
      { numRuns: 300 },
    );
  }, 60_000);
});
