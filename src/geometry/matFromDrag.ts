import type { BitlineAxis, Mat } from '../model/block';
import { MAX_CELLS_PER_LINE } from '../model/blockBasics';
import type { CellDefinition } from '../model/cell';
import { matCellStep } from './cellPitch';
import { matGeometry } from './matGeometry';
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

function wholeCells(length: number, step: number): number {
  return Math.min(MAX_CELLS_PER_LINE, Math.max(1, Math.round(length / step)));
}

/**
 * The mat that fills the box from `anchor` to `pointer` (m), rounded to whole cells of `cell`: the
 * corner at the anchor stays put and the mat grows towards the pointer, whichever way that lies.
 */
export function matFromDrag(
  anchor: { x: number; y: number },
  pointer: { x: number; y: number },
  cell: CellDefinition,
  featureSize: number,
  axis: BitlineAxis,
): DraggedMat {
  const step = matCellStep(cell, featureSize, axis);
  const cellsAlongX = wholeCells(Math.abs(pointer.x - anchor.x), step.x);
  const cellsAlongY = wholeCells(Math.abs(pointer.y - anchor.y), step.y);
  // With vertical bit lines x runs along the word lines (cells per word line); horizontal swaps.
  const cellsPerWordline = axis === 'vertical' ? cellsAlongX : cellsAlongY;
  const cellsPerBitline = axis === 'vertical' ? cellsAlongY : cellsAlongX;
  const probe: Mat = {
    id: 'drag',
    name: '',
    type: 'mat',
    x: 0,
    y: 0,
    cellId: cell.id,
    cellsPerBitline,
    cellsPerWordline,
    bitlineAxis: axis,
  };
  const g = matGeometry(probe, cell, featureSize);
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
