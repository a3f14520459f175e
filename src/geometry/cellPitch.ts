import type { BitlineAxis } from '../model/block';
import type { CellDefinition } from '../model/cell';
import { cellPitches, crossingOccupancy } from '../model/cellBasics';

/** A step along the canvas axes (m). */
export interface Step {
  readonly x: number;
  readonly y: number;
}

/**
 * Line pitches of a mat along the canvas axes (m): with vertical bit lines, neighbouring bit lines sit one
 * bit-line pitch apart in x and neighbouring word lines one word-line pitch apart in y; horizontal swaps
 * them. Moves snap to these, so a moved mat stays on its neighbours' line grid. The pitches are the
 * cell's (its override when it has one, else multiples of F), the same that size the mat.
 */
export function matLinePitch(cell: CellDefinition, featureSize: number, axis: BitlineAxis): Step {
  const { bitlinePitch, wordlinePitch } = cellPitches(cell, featureSize);
  return axis === 'vertical' ? { x: bitlinePitch, y: wordlinePitch } : { x: wordlinePitch, y: bitlinePitch };
}

/**
 * How much a mat grows along each canvas axis for one more cell (m). One more cell per word line adds
 * 1/occupancy bit lines (two for folded, one for open); one more cell per bit line adds 1/occupancy word
 * lines. Common practice (no source); occupancy as in model/cell.ts.
 */
export function matCellStep(cell: CellDefinition, featureSize: number, axis: BitlineAxis): Step {
  const occupancy = crossingOccupancy(cell.bitlineArchitecture);
  const pitch = matLinePitch(cell, featureSize, axis);
  return { x: pitch.x / occupancy, y: pitch.y / occupancy };
}
