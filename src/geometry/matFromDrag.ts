import type { BitlineAxis } from '../model/block';
import { MAX_CELLS_PER_LINE } from '../model/blockBasics';
import type { CellDefinition } from '../model/cell';
import { matCellStep } from './cellPitch';
import { unplacedMatGeometry } from './matGeometry';
import type { Rect } from './rect';

/** A mat sized from a drag: its cell counts and the rectangle they give (m). */
export interface DraggedMat {
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly rect: Rect;
  /** Word lines (rows of cells along a bit line) and bit lines (columns), as the label shows them. */
  readonly rows: number;
  readonly columns: number;
  readonly bits: number;
}

/**
 * How a drawn mat's cell counts round: to multiples of {@link ROUND_CELLS} (the default), to powers of
 * two, or to whole cells (free). Decoders address powers of two, and arrays are built in round counts.
 */
export type CellRounding = 'round' | 'powerOfTwo' | 'free';

/** The step of the default rounding: 64 cells per line. */
export const ROUND_CELLS = 64;

/** Cells along a dragged length (m) at `step` metres per cell, rounded as asked, at least one step. */
export function roundedCells(length: number, step: number, rounding: CellRounding): number {
  const cells = length / step;
  let n: number;
  if (rounding === 'round') n = ROUND_CELLS * Math.max(1, Math.round(cells / ROUND_CELLS));
  else if (rounding === 'powerOfTwo') n = 2 ** Math.max(0, Math.round(Math.log2(Math.max(1, cells))));
  else n = Math.max(1, Math.round(cells));
  return Math.min(MAX_CELLS_PER_LINE, n);
}

/**
 * The mat that fills the box from `anchor` to `pointer` (m), its cell counts rounded as `rounding` says: the
 * corner at the anchor stays put and the mat grows towards the pointer, whichever way that lies.
 */
export function matFromDrag(
  anchor: { x: number; y: number },
  pointer: { x: number; y: number },
  cell: CellDefinition,
  featureSize: number,
  axis: BitlineAxis,
  rounding: CellRounding = 'free',
): DraggedMat {
  const step = matCellStep(cell, featureSize, axis);
  const cellsAlongX = roundedCells(Math.abs(pointer.x - anchor.x), step.x, rounding);
  const cellsAlongY = roundedCells(Math.abs(pointer.y - anchor.y), step.y, rounding);
  // With vertical bit lines x runs along the word lines (cells per word line); horizontal swaps.
  const cellsPerWordline = axis === 'vertical' ? cellsAlongX : cellsAlongY;
  const cellsPerBitline = axis === 'vertical' ? cellsAlongY : cellsAlongX;
  const g = unplacedMatGeometry(cell, cellsPerBitline, cellsPerWordline, featureSize, axis);
  const x = pointer.x >= anchor.x ? anchor.x : anchor.x - g.width;
  const y = pointer.y >= anchor.y ? anchor.y : anchor.y - g.height;
  return {
    cellsPerBitline,
    cellsPerWordline,
    rect: { x, y, width: g.width, height: g.height },
    rows: g.wordlineCount,
    columns: g.bitlineCount,
    bits: g.bits,
  };
}
