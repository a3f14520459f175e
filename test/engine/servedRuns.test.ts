import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { countMats, evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { MatTableBuilder, type MatTable } from '../../src/engine/evaluation/matTable';
import type { BlockRuns } from '../../src/geometry/blockRuns';
import { connectAllMats } from '../../src/engine/evaluation/servedRuns';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { bandedNeighbourTable } from '../../src/geometry/bandedPairs';
import { ANY_BOXES, MAT_GROUP } from '../support/bandLimits';
import { blockTable, type BlockTable } from '../../src/geometry/blockTable';
import type { NeighbourTable } from '../../src/geometry/neighbourRows';
import { withBlocksReplaced } from '../../src/geometry/replacedBlocks';
import { ABUTMENT_TOLERANCE } from '../../src/geometry/rect';
import { matGeometry, unplacedMatGeometry } from '../../src/geometry/matGeometry';
import type { Block, Mat } from '../../src/model/block';
import type { CellDefinition } from '../../src/model/cell';
import { BUILTIN_CELLS, DEMO_PROCESS, FOLDED_8F2_CELL, OPEN_6F2_CELL } from '../../src/model/builtins';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import { benchGridSpec } from '../bench/benchGrid';
import { designWith, mat, strip } from '../support/designs';
import { firstDifference } from '../support/identical';
import { editedGridFloorplan, irregularFloorplan, stripChainFloorplan } from '../support/randomFloorplans';

// With runs from the neighbour pass, the connection pass decides vertical tests once per pair of runs and
// compares left edges and widths by their bits (servedRuns.ts); without, it tests every pair of blocks
// (servedLines.ts, connectEachMat). Both must give the same columns and the same serving strips.

function connections(table: BlockTable, neighbours: NeighbourTable, checkRuns = false) {
  const n = countMats(table);
  const builder = new MatTableBuilder(table.blocks, n);
  const lines = connectAllMats(table, neighbours, n, builder);
  const mats = builder.finish();
  if (checkRuns && neighbours.runs) regularRuns = keepsRunLists(mats, lines.position, neighbours.runs);
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

/** Runs of mats the last pass by runs marked as having regular lists. */
let regularRuns = 0;

/** Checks what the table's RunLists promise (see matTable.ts; mat k at `position[k]`) and returns how many runs it marks. */
function keepsRunLists(mats: MatTable, position: Int32Array, runs: BlockRuns): number {
  const lists = mats.runLists;
  if (!lists) return 0;
  const { servingOffsets: offsets, servingPositions: positions } = mats;
  let marked = 0;
  for (let r = 0; r < runs.count; r++) {
    if (lists.regular[r] !== 1) continue;
    marked++;
    const first = lists.firstMat[r] as number;
    const base = offsets[3 * first] as number;
    const senseAmps = (offsets[3 * first + 1] as number) - base;
    const count = (offsets[3 * first + 2] as number) - base;
    for (let i = 0; i < (runs.start[r + 1] as number) - (runs.start[r] as number); i++) {
      const k = first + i;
      expect(position[k]).toBe((runs.start[r] as number) + i);
      const at = offsets[3 * k] as number;
      expect([(offsets[3 * k + 1] as number) - at, (offsets[3 * k + 2] as number) - at]).toEqual([
        senseAmps,
        count,
      ]);
      for (let s = 0; s < count; s++) expect(positions[at + s]).toBe((positions[base + s] as number) + i);
    }
  }
  return marked;
}

/**
 * Whether the pass by runs gives the block-by-block pass's answers; false when no runs were cut. Also
 * on the table as a gesture copies it (no stretches noted: a run may hold mats of several kinds).
 */
function sameByRuns(blocks: Block[], cells: readonly CellDefinition[] = []): boolean {
  const design = designWith(blocks);
  const written = blockTable({ ...design, cells: [...design.cells, ...cells] });
  let cut = false;
  for (const table of [written, withBlocksReplaced(written, new Map())]) {
    const banded = bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP, ANY_BOXES);
    if (!banded?.runs) continue;
    const plain: NeighbourTable = { start: banded.start, end: banded.end, list: banded.list };
    expect(firstDifference(connections(table, banded, true), connections(table, plain))).toBeNull();
    cut = true;
  }
  return cut;
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
    for (const cell of [FOLDED_8F2_CELL, OPEN_6F2_CELL]) {
      expect(
        sameByRuns(gridFloorplan({ cell, featureSize: DEMO_PROCESS.featureSize, ...benchGridSpec(8, 384) })),
      ).toBe(true);
      // Every row of mats has regular lists (each mat's strips are the first mat's, one place on), except
      // with open cells (matConnections decides each mat: nothing is copied).
      expect(regularRuns).toBe(cell === FOLDED_8F2_CELL ? 8 : 0);
    }
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

/** Offsets (m): within the 1 nm tolerance, on it, just beyond it, a micron. */
const ROW_NUDGE = fc.constantFrom(0.4e-9, -0.7e-9, 1e-9, -1e-9, 1.5e-9, -2e-9, MICRON);

/**
 * What is done to the blocks of one row of a tiled grid (a row of mats, of sense-amplifier strips or of
 * drivers): its mats take a twin cell (the same size, another kind), or one of them does; a row moves up
 * or down; its drivers grow shorter; its strips get narrower, go, or become another type; one strip goes.
 */
const ROW_CHANGES = [
  'twin row',
  'twin one',
  'move mats',
  'move sense amps',
  'move drivers',
  'shorter drivers',
  'narrower sense amps',
  'drop strip',
  'drop sense amps',
  'sense amps as drivers',
  'sense amps as spacers',
] as const;

/**
 * Tiled grids (vertical or, transposed, horizontal bit lines; any cell, open ones included) whose rows
 * repeat, written mats first and then strips in either order, with a few rows changed: so that rows of
 * mats are copies of an earlier row's, or look like one and are not.
 */
const repeatedRows = fc
  .record({
    rows: fc.integer({ min: 2, max: 6 }),
    columns: fc.integer({ min: 1, max: 4 }),
    cellId: fc.constantFrom(...BUILTIN_CELLS.map((c) => c.id)),
    cellsPerBitline: fc.constantFrom(64, 256),
    cellsPerWordline: fc.constantFrom(128, 256),
    horizontal: fc.boolean(),
    driversFirst: fc.boolean(),
    changes: fc.array(
      fc.record({ what: fc.constantFrom(...ROW_CHANGES), row: fc.nat(), column: fc.nat(), nudge: ROW_NUDGE }),
      { maxLength: 3 },
    ),
  })
  .map((spec) => {
    const cell = BUILTIN_CELLS.find((c) => c.id === spec.cellId) as CellDefinition;
    const twin: CellDefinition = { ...cell, id: 'twin', storageCapacitance: 1.5 * cell.storageCapacitance };
    let blocks = gridFloorplan({
      cell,
      featureSize: F,
      matRows: spec.rows,
      matColumns: spec.columns,
      cellsPerBitline: spec.cellsPerBitline,
      cellsPerWordline: spec.cellsPerWordline,
      ...DEMO_STRIPS,
    });
    for (const change of spec.changes) {
      const row = change.row % (spec.rows + 1);
      const of = (prefix: string) => (b: Block) => b.id.startsWith(`${prefix}-r${row}c`);
      const column = (b: Block) => b.id.endsWith(`c${change.column % (spec.columns + 1)}`);
      const edit = (where: (b: Block) => boolean, how: (b: Block) => Block) => {
        blocks = blocks.map((b) => (where(b) ? how(b) : b));
      };
      const nudge = change.nudge;
      if (change.what === 'twin row') edit(of('mat'), (b) => ({ ...b, cellId: 'twin' }) as Block);
      if (change.what === 'twin one')
        edit(
          (b) => of('mat')(b) && column(b),
          (b) => ({ ...b, cellId: 'twin' }) as Block,
        );
      if (change.what === 'move mats') edit(of('mat'), (b) => ({ ...b, y: b.y + nudge }));
      if (change.what === 'move sense amps') edit(of('sa'), (b) => ({ ...b, y: b.y + nudge }));
      if (change.what === 'move drivers') edit(of('swd'), (b) => ({ ...b, y: b.y + nudge }));
      if (change.what === 'shorter drivers')
        edit(of('swd'), (b) => (b.type === 'mat' ? b : { ...b, height: b.height - Math.abs(nudge) }));
      if (change.what === 'narrower sense amps')
        edit(of('sa'), (b) => (b.type === 'mat' ? b : { ...b, width: b.width - Math.abs(nudge) }));
      if (change.what === 'drop strip') blocks = blocks.filter((b) => !(of('sa')(b) && column(b)));
      if (change.what === 'drop sense amps') blocks = blocks.filter((b) => !of('sa')(b));
      if (change.what === 'sense amps as drivers')
        edit(of('sa'), (b) => ({ ...b, type: 'wordlineDriverStrip' }) as Block);
      if (change.what === 'sense amps as spacers') edit(of('sa'), (b) => ({ ...b, type: 'spacer' }) as Block);
    }
    if (spec.driversFirst) {
      const order = (b: Block) => (b.type === 'mat' ? 0 : b.type === 'wordlineDriverStrip' ? 1 : 2);
      blocks = [...blocks].sort((a, b) => order(a) - order(b));
    }
    if (spec.horizontal) {
      // Transposed: bit lines run horizontally, sense amplifiers at the left and right; rows written anew.
      blocks = blocks
        .map((b) =>
          b.type === 'mat'
            ? { ...b, x: b.y, y: b.x, bitlineAxis: 'horizontal' as const }
            : { ...b, x: b.y, y: b.x, width: b.height, height: b.width },
        )
        .sort((a, b) => (a.type === 'mat' ? 0 : 1) - (b.type === 'mat' ? 0 : 1) || a.y - b.y || a.x - b.x);
    }
    return { blocks, cells: [twin] };
  });

describe('the connection pass copying repeated rows', () => {
  it('marks no copy regular whose strips of one place lie in runs shifted apart', () => {
    // Sense-amplifier strips of the right half a hair taller (another band, another run); in one row a
    // spacer far away is written between the halves, so the right half's run starts one block later
    // there and the mats beside it have the strips after theirs' place.
    const blocks = gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: F,
      matRows: 4,
      matColumns: 4,
      cellsPerBitline: 256,
      cellsPerWordline: 128,
      ...DEMO_STRIPS,
    }).flatMap((b) => {
      if (b.type !== 'senseAmpStrip' || Number(b.id.at(-1)) < 2) return [b];
      const taller = { ...b, height: b.height * (1 + Number.EPSILON) };
      return b.id === 'sa-r2c2' ? [strip('far', 'spacer', -1, -1, MICRON, MICRON), taller] : [taller];
    });
    expect(sameByRuns(blocks)).toBe(true);
    expect(regularRuns).toBe(1);
  });

  it('copies no row whose line counts read the spans (they round differently from row to row)', () => {
    // Drivers end half a word-line pitch past a line's place, 1.5 pitches short of the mats' bottom: the
    // stretch each covers, (top + height) − top, rounds to either side of that place from row to row, so
    // that one or two word lines are left undriven. In pieces, nine to a side, each mat meets 18 drivers
    // (more than the pass keeps; matConnections counts them).
    const g = unplacedMatGeometry(FOLDED_8F2_CELL, 256, 128, F);
    const short = (g.wordlineCount - 1.5) * g.wordlinePitch;
    for (const pieces of [1, 9]) {
      const blocks = gridFloorplan({
        cell: FOLDED_8F2_CELL,
        featureSize: F,
        matRows: 24,
        matColumns: 2,
        cellsPerBitline: 256,
        cellsPerWordline: 128,
        ...DEMO_STRIPS,
      }).flatMap((b) => {
        if (b.type !== 'wordlineDriverStrip') return [b];
        const piece = g.height / pieces;
        return Array.from({ length: pieces }, (_, i) => ({
          ...b,
          id: `${b.id}-${i}`,
          y: b.y + i * piece,
          height: i === pieces - 1 ? short - (pieces - 1) * piece : piece,
        }));
      });
      expect(sameByRuns(blocks)).toBe(true);
      const table = blockTable(designWith(blocks));
      const { undrivenWordlines } = connections(table, evaluationNeighbours(table));
      expect(new Set(undrivenWordlines)).toEqual(new Set([1, 2]));
    }
  });

  it('gives the block-by-block answers on tiled grids with rows changed', () => {
    let marked = 0;
    fc.assert(
      fc.property(repeatedRows, ({ blocks, cells }) => {
        sameByRuns(blocks, cells);
        marked += regularRuns;
      }),
      { numRuns: 1500 },
    );
    expect(marked).toBeGreaterThan(1000);
  }, 60_000);
});
