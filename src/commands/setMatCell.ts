import { matCellStep } from '../geometry/cellPitch';
import { matGeometry } from '../geometry/matGeometry';
import { placedDesign } from '../geometry/placedIndex';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from '../geometry/rect';
import { stackOutlines } from '../geometry/stackFit';
import { anchorSides, AxisStretch, type AnchorCorner } from '../geometry/stretchMap';
import { isMat, MAX_CELLS_PER_LINE, type Block, type Mat } from '../model/block';
import { crossingOccupancy, type CellDefinition } from '../model/cell';
import type { Design } from '../model/design';
import { formatMatSizeAndBits } from '../model/matSize';
import { formatBits } from '../model/units';
import type { Command, CommandResult } from './command';

export interface SetMatCellArgs {
  readonly matIds: readonly string[];
  readonly cellId: string;
  /**
   * Keep cells per bit line and per word line as they are (the mat's capacity then follows the new cell's
   * occupancy); by default the capacity is kept and the counts are derived again.
   */
  readonly keepCounts?: boolean;
  /** The mat corner that stays put; top left by default. */
  readonly anchor?: AnchorCorner;
}

/**
 * Cell counts that keep a mat's capacity on a new cell: cells per bit line stay (the bit line keeps its
 * length in cells, so its capacitance per cell and its signal stay comparable), and cells per word line
 * follow the crossing occupancy: a folded array holds a cell at every other crossing, an open one at every
 * crossing, so the same bits on the same bit lines take twice the cells per word line going folded → open.
 * bits = cells per bit line × bit lines, bit lines = cells per word line ÷ occupancy (geometry/matGeometry.ts).
 */
export function countsKeepingCapacity(mat: Mat, from: CellDefinition, to: CellDefinition) {
  const ratio = crossingOccupancy(to.bitlineArchitecture) / crossingOccupancy(from.bitlineArchitecture);
  const cellsPerWordline = Math.min(
    MAX_CELLS_PER_LINE,
    Math.max(1, Math.round(mat.cellsPerWordline * ratio)),
  );
  return { cellsPerBitline: mat.cellsPerBitline, cellsPerWordline };
}

/** Whether two rectangles meet (touching counts). */
function meets(a: Rect, b: Rect): boolean {
  const tol = ABUTMENT_TOLERANCE;
  return a.x <= right(b) + tol && b.x <= right(a) + tol && a.y <= bottom(b) + tol && b.y <= bottom(a) + tol;
}

/** Overlap of [a0, a1] and [b0, b1] beyond the abutment tolerance (m). */
function overlaps(a0: number, a1: number, b0: number, b1: number): boolean {
  return Math.min(a1, b1) - Math.max(a0, b0) > ABUTMENT_TOLERANCE;
}

/** A mat without its slot: the cell array's own outline. */
function withoutSlot(mat: Mat): Mat {
  const array: Mat = { ...mat };
  delete array.footprint;
  return array;
}

/**
 * Counts that fill a slot of `width` × `height` (m) with whole cells of `cell` along the pinned axes; the
 * other axis keeps `mat`'s counts. What is left, less than one cell, becomes the mat's edge band.
 */
function countsFillingSlot(
  mat: Mat,
  cell: CellDefinition,
  featureSize: number,
  slot: Rect,
  pinned: { readonly x: boolean; readonly y: boolean },
): Pick<Mat, 'cellsPerBitline' | 'cellsPerWordline'> {
  const step = matCellStep(cell, featureSize, mat.bitlineAxis);
  const fill = (length: number, cellStep: number) =>
    Math.min(MAX_CELLS_PER_LINE, Math.max(1, Math.floor(length / cellStep + 1e-9)));
  // With vertical bit lines x runs along the word lines (cells per word line); horizontal swaps.
  const vertical = mat.bitlineAxis === 'vertical';
  const alongX = vertical ? 'cellsPerWordline' : 'cellsPerBitline';
  const alongY = vertical ? 'cellsPerBitline' : 'cellsPerWordline';
  return {
    cellsPerBitline: mat.cellsPerBitline,
    cellsPerWordline: mat.cellsPerWordline,
    ...(pinned.x ? { [alongX]: fill(slot.width, step.x) } : {}),
    ...(pinned.y ? { [alongY]: fill(slot.height, step.y) } : {}),
  };
}

/**
 * Gives one or more mats another cell. By default each keeps its capacity (counts derived again for the
 * new footprint and occupancy) and its anchor corner, and the floorplan around it follows: the mat's old
 * span along each axis is stretched to its new size and every block of its stack (and the decoders beside
 * it) moves with that stretch, so strips that served its edges keep serving them, with no overlap or gap.
 * Where a mat that keeps its cell shares the changed mat's column (or row) in its stack, that column (row)
 * cannot take another width (height): the changed mat keeps its slot instead, its counts fill the slot
 * with whole cells of the new cell, and the rest (under one cell) is an edge band (Mat.footprint); its
 * capacity then follows. One command, one undo step; cellChangeNotes() says what happened.
 */
export const setMatCell: Command<SetMatCellArgs> = {
  id: 'mat.setCell',
  label: 'Change mat cell',
  run(design: Design, args: SetMatCellArgs): CommandResult {
    const next = design.cells.find((c) => c.id === args.cellId);
    if (!next) return { ok: false, error: `no cell "${args.cellId}"` };
    const targets = new Set(args.matIds);
    const corner = anchorSides(args.anchor ?? 'topLeft');
    const F = design.process.featureSize;
    const cells = new Map(design.cells.map((c) => [c.id, c]));
    const stretchX = new AxisStretch();
    const stretchY = new AxisStretch();
    const changed = new Map<string, Mat>();
    /** Changed mats that keep their slot along x and/or y: their slot's start there (m). */
    const slotted = new Map<string, { x?: number; y?: number }>();
    const placed = placedDesign(design);
    const stacks = stackOutlines(placed);
    const changing = new Set<string>();
    let found = false;
    for (const p of placed.placed) {
      const b = p.block;
      if (b.type !== 'mat' || !targets.has(b.id)) continue;
      found = true;
      if (b.cellId !== next.id && cells.has(b.cellId)) changing.add(b.id);
    }
    if (!found) return { ok: false, error: 'no mat selected' };
    if (changing.size === 0) return { ok: true, design };

    for (const p of placed.placed) {
      const b = p.block;
      const from = cells.get(b.type === 'mat' ? b.cellId : '');
      if (b.type !== 'mat' || !changing.has(b.id) || !from) continue;
      const r = p.rect;
      const counts = args.keepCounts ? {} : countsKeepingCapacity(b, from, next);
      let mat: Mat = withoutSlot({ ...b, ...counts, cellId: next.id });
      let g = matGeometry(mat, next, F);
      // Mats keeping their cell in the same column (row) of this mat's stack pin its width (height).
      const stack = stacks.filter((s) => meets(s.rect, r));
      const pinned = { x: false, y: false };
      for (const q of placed.placed) {
        if (q.block.type !== 'mat' || changing.has(q.block.id) || !stack.some((s) => meets(s.rect, q.rect)))
          continue;
        if (overlaps(q.rect.x, right(q.rect), r.x, right(r))) pinned.x = true;
        if (overlaps(q.rect.y, bottom(q.rect), r.y, bottom(r))) pinned.y = true;
      }
      pinned.x &&= Math.abs(g.width - r.width) > ABUTMENT_TOLERANCE;
      pinned.y &&= Math.abs(g.height - r.height) > ABUTMENT_TOLERANCE;
      if (pinned.x || pinned.y) {
        const name = b.name || b.id;
        if (args.keepCounts)
          return {
            ok: false,
            error: `${name} shares its ${pinned.x ? 'column' : 'row'} with mats that keep their cell, so keeping its cell counts would change the ${pinned.x ? "column's width" : "row's height"}; let the counts follow the slot, or change the whole ${pinned.x ? 'column' : 'row'}`,
          };
        mat = { ...mat, ...countsFillingSlot(mat, next, F, r, pinned) };
        g = matGeometry(mat, next, F);
        mat = {
          ...mat,
          footprint: { width: pinned.x ? r.width : g.width, height: pinned.y ? r.height : g.height },
        };
        slotted.set(b.id, { ...(pinned.x ? { x: r.x } : {}), ...(pinned.y ? { y: r.y } : {}) });
        g = matGeometry(mat, next, F);
      }
      if (
        (!pinned.x && !stretchX.add(r.x, right(r), g.width, corner.left)) ||
        (!pinned.y && !stretchY.add(r.y, bottom(r), g.height, corner.top))
      ) {
        return {
          ok: false,
          error: `${b.name || b.id} shares a row or column with another changed mat that would take another size; change them one at a time`,
        };
      }
      changed.set(b.id, mat);
    }

    // The blocks that follow the stretch: those of the stacks holding a changed mat, and what touches them.
    const region = stacks.filter((s) =>
      placed.placed.some((p) => changed.has(p.block.id) && meets(s.rect, p.rect)),
    );
    const blocks = design.blocks.map((b, i): Block => {
      const rect = placed.placed[i]?.rect ?? { x: b.x, y: b.y, width: 0, height: 0 };
      const inRegion = region.some((s) => meets(s.rect, rect));
      const base = changed.get(b.id) ?? b;
      if (!inRegion && !changed.has(b.id)) return b;
      if (base.type === 'mat') {
        // A mat's size comes from its cell: only its corner moves (the anchored corner of a changed mat,
        // or its slot's corner along an axis where it keeps its slot).
        const slot = slotted.get(b.id);
        const x =
          slot?.x !== undefined
            ? stretchX.map(slot.x)
            : corner.left
              ? stretchX.map(rect.x)
              : stretchX.map(right(rect)) - (matWidth(base) ?? rect.width);
        const y =
          slot?.y !== undefined
            ? stretchY.map(slot.y)
            : corner.top
              ? stretchY.map(rect.y)
              : stretchY.map(bottom(rect)) - (matHeight(base) ?? rect.height);
        return { ...base, x, y };
      }
      const xs = stretchX.mapSpan(rect.x, rect.width);
      const ys = stretchY.mapSpan(rect.y, rect.height);
      return { ...base, x: xs.start, y: ys.start, width: xs.size, height: ys.size };
    });

    function size(mat: Mat) {
      const cell = cells.get(mat.cellId);
      return cell ? matGeometry(mat, cell, F) : null;
    }
    function matWidth(mat: Mat): number | undefined {
      return size(mat)?.width;
    }
    function matHeight(mat: Mat): number | undefined {
      return size(mat)?.height;
    }
    return { ok: true, design: { ...design, blocks } };
  },
};

/**
 * What a cell change did to each mat that changed cell between `before` and `after`, one sentence each,
 * for the panel to show: whether the mat kept its slot in a grid (and the capacity that left it), kept
 * its capacity (and the floorplan followed), or kept its counts.
 */
export function cellChangeNotes(before: Design, after: Design, matIds: readonly string[]): string[] {
  const F = after.process.featureSize;
  const cellsBefore = new Map(before.cells.map((c) => [c.id, c]));
  const cellsAfter = new Map(after.cells.map((c) => [c.id, c]));
  const matsBefore = new Map(before.blocks.filter(isMat).map((m) => [m.id, m]));
  const matsAfter = new Map(after.blocks.filter(isMat).map((m) => [m.id, m]));
  const notes: string[] = [];
  for (const id of matIds) {
    const was = matsBefore.get(id);
    const now = matsAfter.get(id);
    const wasCell = was && cellsBefore.get(was.cellId);
    const cell = now && cellsAfter.get(now.cellId);
    if (!was || !now || !wasCell || !cell || was.cellId === now.cellId) continue;
    const name = now.name || now.id;
    const g = matGeometry(now, cell, F);
    const array = matGeometry(withoutSlot(now), cell, F);
    const oldBits = matGeometry(was, wasCell, F).bits;
    const size = formatMatSizeAndBits(now.cellsPerBitline, now.cellsPerWordline, g.bits);
    const wasSize = formatMatSizeAndBits(was.cellsPerBitline, was.cellsPerWordline, oldBits);
    if (g.width > array.width + ABUTMENT_TOLERANCE || g.height > array.height + ABUTMENT_TOLERANCE)
      notes.push(
        `${name} keeps its slot in the grid (the mats beside it keep their cell), so on ${cell.name} it holds ${size} (was ${wasSize}); the rest of the slot, under one cell wide, is an edge band without usable cells. To keep its capacity instead, change its whole row and column.`,
      );
    else if (g.bits === oldBits)
      notes.push(
        `${name} keeps its ${formatBits(g.bits)} of cells: ${size} on ${cell.name}; the blocks around it moved with its new size.`,
      );
    else notes.push(`${name} keeps its cell counts on ${cell.name}: ${size} (was ${wasSize}).`);
  }
  return notes;
}
