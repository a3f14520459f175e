import type { Boxes } from './blockTable';
import type { Binned, Grid } from './neighbourGrid';
import type { PairBuffer } from './neighbourRows';
import { ScratchBuffer } from './scratchBuffer';

/**
 * True when boxes i and j share more than `margin` (m) in both directions: the overlap test of
 * engine/evaluation/overlaps.ts (overlapAreaAt > 0) with the same arithmetic.
 */
export function sharesBeyond(boxes: Boxes, i: number, j: number, margin: number): boolean {
  const { x, y, width, height } = boxes;
  const ax = x[i] as number;
  const ay = y[i] as number;
  const bx = x[j] as number;
  const by = y[j] as number;
  const w = Math.min(ax + (width[i] as number), bx + (width[j] as number)) - Math.max(ax, bx);
  const h = Math.min(ay + (height[i] as number), by + (height[j] as number)) - Math.max(ay, by);
  return w > margin && h > margin;
}

/** Reused between calls (see ScratchBuffer); it never leaves this module. */
const BY_START = new ScratchBuffer();

/**
 * The pair pass of neighbourGrid.ts's groupedNeighbourTable. A pair belongs to the cell holding the lower
 * corner of the two grown boxes' intersection: there one of them starts in the cell's column and one in
 * its row. The members of a cell are first put in order of where they start — both here, column only,
 * row only, neither — so that only pairs that belong here are visited (about half of all, in a tiled
 * array), and each is tested inline: no call per pair, which matters most in the first evaluations of a
 * session, before V8 has compiled anything.
 */
export function groupedGridPairs(
  boxes: Boxes,
  margin: number,
  group: Uint8Array,
  grid: Grid,
  cells: Binned,
  pairs: PairBuffer,
): void {
  const { firstColumn, firstRow, start, members } = cells;
  const columns = grid.columns;
  const cellCount = columns * grid.rows;
  const order = BY_START.take(members.length);
  for (let cell = 0; cell < cellCount; cell++) {
    const from = start[cell] as number;
    const to = start[cell + 1] as number;
    if (to - from < 2) continue;
    const column = cell % columns;
    const row = (cell - column) / columns;
    let both = 0;
    let columnOnly = 0;
    let rowOnly = 0;
    for (let p = from; p < to; p++) {
      const i = members[p] as number;
      if (firstColumn[i] === column) {
        if (firstRow[i] === row) both++;
        else columnOnly++;
      } else if (firstRow[i] === row) rowOnly++;
    }
    if (both === 0 && (columnOnly === 0 || rowOnly === 0)) continue;
    // order[0 … both) start here both ways, then column only, row only, neither.
    let atBoth = 0;
    let atColumn = both;
    let atRow = both + columnOnly;
    let atNeither = atRow + rowOnly;
    for (let p = from; p < to; p++) {
      const i = members[p] as number;
      if (firstColumn[i] === column) {
        if (firstRow[i] === row) order[atBoth++] = i;
        else order[atColumn++] = i;
      } else if (firstRow[i] === row) order[atRow++] = i;
      else order[atNeither++] = i;
    }
    const count = to - from;
    // Pairs with a box starting here both ways (with any other), then column-only with row-only boxes.
    for (let a = 0; a < both; a++)
      pairsFrom(boxes, margin, group, order, order[a] as number, a + 1, count, pairs);
    for (let a = both; a < both + columnOnly; a++)
      pairsFrom(boxes, margin, group, order, order[a] as number, both + columnOnly, atRow, pairs);
  }
}

/**
 * Tests box i against the boxes `order[first]` … `order[last − 1]` and keeps the pairs the rule accepts.
 * A function of its own rather than a closure: a closure made per call is a new call target each call,
 * and V8 throws away the compiled pass that had it inlined (on the second evaluation of a session).
 */
function pairsFrom(
  boxes: Boxes,
  margin: number,
  group: Uint8Array,
  order: Int32Array,
  i: number,
  first: number,
  last: number,
  pairs: PairBuffer,
): void {
  const { x, y, width, height } = boxes;
  const xi = x[i] as number;
  const yi = y[i] as number;
  const ri = xi + (width[i] as number);
  const bi = yi + (height[i] as number);
  const gi = group[i];
  // Box i grown by the margin, once rather than per pair.
  const left = xi - margin;
  const right = ri + margin;
  const top = yi - margin;
  const bottom = bi + margin;
  for (let b = first; b < last; b++) {
    const j = order[b] as number;
    const xj = x[j] as number;
    const yj = y[j] as number;
    const rj = xj + (width[j] as number);
    const bj = yj + (height[j] as number);
    if (gi !== group[j]) {
      // The grown box of either against the plain box of the other, as neighbourTable compares them.
      if (
        (left <= rj && xj <= right && top <= bj && yj <= bottom) ||
        (xj - margin <= ri && xi <= rj + margin && yj - margin <= bi && yi <= bj + margin)
      )
        pairs.add(i, j);
    } else if (Math.min(ri, rj) - Math.max(xi, xj) > margin && Math.min(bi, bj) - Math.max(yi, yj) > margin) {
      pairs.add(i, j);
    }
  }
}
