import fc from 'fast-check';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import type { Block } from '../../src/model/block';
import type { CellDefinition } from '../../src/model/cell';
import { BUILTIN_CELLS, DEMO_PROCESS } from '../../src/model/builtins';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';
import { unplacedMatGeometry } from '../../src/geometry/matGeometry';
import { mat, strip } from './designs';

/**
 * Random floorplans for oracle tests of evaluate(): small irregular ones on a coarse grid (so that edges
 * meet, overlap and touch at corners often, with every cell kind, open bit lines included, both bit-line
 * axes and nudges within and beyond the abutment tolerance), and tiled grids with some blocks removed,
 * moved or reordered.
 */

/** 64 folded-cell pitches (2F at F = 18 nm): mats of 128 or 256 cells per line span 2 or 4 units (arithmetic). */
const UNIT = 64 * 2 * 18e-9;
const STRIP_TYPES = [
  'senseAmpStrip',
  'wordlineDriverStrip',
  'rowDecoder',
  'columnDecoder',
  'spacer',
] as const;
const CELL_IDS = BUILTIN_CELLS.map((c) => c.id);
/** Offsets (m): none, within the 1 nm abutment tolerance, just beyond it, and a fraction of a unit. */
const NUDGES = [0, 0, 0, 0, 4e-10, -7e-10, 1.5e-9, -2e-9, 0.37 * UNIT];

function cellById(id: string): CellDefinition {
  const cell = BUILTIN_CELLS.find((c) => c.id === id);
  if (!cell) throw new Error(`no built-in cell ${id}`);
  return cell;
}

const blockArb = fc.record({
  isMat: fc.boolean(),
  stripType: fc.constantFrom(...STRIP_TYPES),
  gx: fc.integer({ min: 0, max: 12 }),
  gy: fc.integer({ min: 0, max: 12 }),
  w: fc.integer({ min: 1, max: 8 }),
  h: fc.integer({ min: 1, max: 8 }),
  cellsPerBitline: fc.constantFrom(128, 256),
  cellsPerWordline: fc.constantFrom(128, 256),
  vertical: fc.boolean(),
  cellId: fc.constantFrom(...CELL_IDS),
  nx: fc.constantFrom(...NUDGES),
  ny: fc.constantFrom(...NUDGES),
  named: fc.boolean(),
});

/** An irregular floorplan of up to 30 blocks. */
export const irregularFloorplan: fc.Arbitrary<Block[]> = fc
  .array(blockArb, { minLength: 1, maxLength: 30 })
  .map((specs) =>
    specs.map((s, n) =>
      s.isMat
        ? mat({
            id: `b${n}`,
            name: s.named ? `Mat ${n}` : '',
            x: s.gx * UNIT + s.nx,
            y: s.gy * UNIT + s.ny,
            cellId: s.cellId,
            cellsPerBitline: s.cellsPerBitline,
            cellsPerWordline: s.cellsPerWordline,
            bitlineAxis: s.vertical ? 'vertical' : 'horizontal',
          })
        : strip(`b${n}`, s.stripType, s.gx * UNIT + s.nx, s.gy * UNIT + s.ny, s.w * UNIT, s.h * UNIT),
    ),
  );

/** A tiled grid (gridFloorplan) of up to 6 × 6 mats of one cell, then edited. */
export const editedGridFloorplan: fc.Arbitrary<Block[]> = fc
  .record({
    rows: fc.integer({ min: 1, max: 6 }),
    columns: fc.integer({ min: 1, max: 6 }),
    cellId: fc.constantFrom(...CELL_IDS),
    cellsPerBitline: fc.constantFrom(64, 256, 384),
    cellsPerWordline: fc.constantFrom(128, 512),
    edits: fc.array(
      fc.record({
        at: fc.nat(),
        what: fc.constantFrom('remove', 'nudge', 'move', 'swap'),
        nudge: fc.constantFrom(...NUDGES),
        other: fc.nat(),
      }),
      { maxLength: 6 },
    ),
  })
  .map((spec) => {
    const cell = cellById(spec.cellId);
    const blocks = gridFloorplan({
      cell,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: spec.rows,
      matColumns: spec.columns,
      cellsPerBitline: spec.cellsPerBitline,
      cellsPerWordline: spec.cellsPerWordline,
      ...DEMO_STRIPS,
    });
    for (const edit of spec.edits) {
      if (blocks.length < 2) break;
      const i = edit.at % blocks.length;
      const b = blocks[i] as Block;
      if (edit.what === 'remove') blocks.splice(i, 1);
      else if (edit.what === 'nudge') blocks[i] = { ...b, x: b.x + edit.nudge };
      else if (edit.what === 'move') blocks[i] = { ...b, y: b.y + edit.nudge + UNIT };
      else {
        const j = edit.other % blocks.length;
        blocks[i] = blocks[j] as Block;
        blocks[j] = b;
      }
    }
    return blocks;
  });

/** How a strip meets a mat edge: whole, half of it, shifted along it, off by a nudge, or absent. */
const FITS = ['whole', 'whole', 'whole', 'half', 'shifted', 'nudged', 'none'] as const;

const chainArb = fc.record({
  cellId: fc.constantFrom(...CELL_IDS),
  cellsPerBitline: fc.constantFrom(64, 128, 256),
  cellsPerWordline: fc.constantFrom(128, 256),
  vertical: fc.boolean(),
  length: fc.integer({ min: 1, max: 4 }),
  /** How each sense-amplifier strip along the chain (length + 1 of them) and each driver meets its mats. */
  senseFits: fc.array(fc.constantFrom(...FITS), { minLength: 5, maxLength: 5 }),
  driverFits: fc.array(fc.constantFrom(...FITS), { minLength: 8, maxLength: 8 }),
  decoder: fc.boolean(),
  nudge: fc.constantFrom(...NUDGES),
  gx: fc.integer({ min: 0, max: 40 }),
  gy: fc.integer({ min: 0, max: 40 }),
});

/**
 * Chains of mats of one cell stacked along their bit lines with sense-amplifier strips between them (and
 * maybe at the ends), drivers (or a row decoder) beside each mat: the shape open bit lines pair across,
 * with strips that cover an edge whole, in part, shifted or nudged. Several chains may overlap.
 */
export const stripChainFloorplan: fc.Arbitrary<Block[]> = fc
  .array(chainArb, { minLength: 1, maxLength: 3 })
  .map((chains) => {
    const blocks: Block[] = [];
    const SA = 0.5 * UNIT;
    const SWD = 0.4 * UNIT;
    chains.forEach((c, n) => {
      const cell = cellById(c.cellId);
      const axis = c.vertical ? 'vertical' : 'horizontal';
      const g = unplacedMatGeometry(
        cell,
        c.cellsPerBitline,
        c.cellsPerWordline,
        DEMO_PROCESS.featureSize,
        axis,
      );
      // Along = the bit-line direction (y for vertical bit lines); across = the word-line direction.
      const along = c.vertical ? g.height : g.width;
      const across = c.vertical ? g.width : g.height;
      const place = (u: number, v: number, du: number, dv: number) =>
        c.vertical
          ? { x: c.gx * UNIT + v, y: c.gy * UNIT + u, width: dv, height: du }
          : { x: c.gx * UNIT + u, y: c.gy * UNIT + v, width: du, height: dv };
      const fitted = (fit: (typeof FITS)[number], start: number, length: number) => {
        if (fit === 'half') return { start, length: length / 2 };
        if (fit === 'shifted') return { start: start + length / 3, length };
        if (fit === 'nudged') return { start: start + c.nudge, length };
        return { start, length };
      };
      let u = 0;
      for (let k = 0; k <= c.length; k++) {
        const fit = c.senseFits[k] ?? 'none';
        if (fit !== 'none') {
          const f = fitted(fit, 0, across);
          const r = place(u + (fit === 'nudged' ? c.nudge : 0), f.start, SA, f.length);
          blocks.push(strip(`c${n}sa${k}`, 'senseAmpStrip', r.x, r.y, r.width, r.height));
        }
        u += SA;
        if (k === c.length) break;
        const m = place(u, 0, along, across);
        blocks.push(
          mat({
            id: `c${n}m${k}`,
            name: `C${n} M${k}`,
            x: m.x,
            y: m.y,
            cellId: cell.id,
            cellsPerBitline: c.cellsPerBitline,
            cellsPerWordline: c.cellsPerWordline,
            bitlineAxis: axis,
          }),
        );
        for (const e of [0, 1]) {
          const dfit = c.driverFits[2 * k + e] ?? 'none';
          if (dfit === 'none') continue;
          const f = fitted(dfit, u, along);
          const r = place(f.start, e === 0 ? -SWD : across, f.length, SWD);
          const type = c.decoder && e === 0 ? 'rowDecoder' : 'wordlineDriverStrip';
          blocks.push(strip(`c${n}d${k}${e}`, type, r.x, r.y, r.width, r.height));
        }
        u += along;
      }
    });
    return blocks;
  });
