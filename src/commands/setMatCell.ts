import { matGeometry } from '../geometry/matGeometry';
import { placedDesign } from '../geometry/placedIndex';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from '../geometry/rect';
import { stackOutlines } from '../geometry/stackFit';
import { anchorSides, AxisStretch, type AnchorCorner } from '../geometry/stretchMap';
import { MAX_CELLS_PER_LINE, type Block, type Mat } from '../model/block';
import { crossingOccupancy, type CellDefinition } from '../model/cell';
import type { Design } from '../model/design';
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

/**
 * Gives one or more mats another cell. By default each keeps its capacity (counts derived again for the
 * new footprint and occupancy) and its anchor corner, and the floorplan around it follows: the mat's old
 * span along each axis is stretched to its new size and every block of its stack (and the decoders beside
 * it) moves with that stretch, so strips that served its edges keep serving them, with no overlap or gap.
 * One command, one undo step.
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
    const placed = placedDesign(design);
    let found = false;
    for (const p of placed.placed) {
      const b = p.block;
      if (b.type !== 'mat' || !targets.has(b.id)) continue;
      found = true;
      const from = cells.get(b.cellId);
      if (b.cellId === next.id || !from) continue;
      const counts = args.keepCounts ? {} : countsKeepingCapacity(b, from, next);
      const mat: Mat = { ...b, ...counts, cellId: next.id };
      const g = matGeometry(mat, next, F);
      const r = p.rect;
      if (
        !stretchX.add(r.x, right(r), g.width, corner.left) ||
        !stretchY.add(r.y, bottom(r), g.height, corner.top)
      ) {
        return {
          ok: false,
          error: `${b.name || b.id} shares a row or column with another changed mat that would take another size; change them one at a time`,
        };
      }
      changed.set(b.id, mat);
    }
    if (!found) return { ok: false, error: 'no mat selected' };
    if (changed.size === 0) return { ok: true, design };

    // The blocks that follow the stretch: those of the stacks holding a changed mat, and what touches them.
    const region = stackOutlines(placed).filter((s) =>
      placed.placed.some((p) => changed.has(p.block.id) && meets(s.rect, p.rect)),
    );
    const blocks = design.blocks.map((b, i): Block => {
      const rect = placed.placed[i]?.rect ?? { x: b.x, y: b.y, width: 0, height: 0 };
      const inRegion = region.some((s) => meets(s.rect, rect));
      const base = changed.get(b.id) ?? b;
      if (!inRegion && !changed.has(b.id)) return b;
      if (base.type === 'mat') {
        // A mat's size comes from its cell: only its corner moves (the anchored corner of a changed mat).
        const x = corner.left
          ? stretchX.map(rect.x)
          : stretchX.map(right(rect)) - (matWidth(base) ?? rect.width);
        const y = corner.top
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
