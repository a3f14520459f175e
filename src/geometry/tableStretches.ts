import type { BitlineAxis, Block, BlockType, Strip } from '../model/block';
import { CODE_OF, MAT_CODE } from './blockCodes';
import type { BlockTable, MatKind, TableInProgress, TableSums } from './blockTable';
import { matKindOf } from './matKinds';
import { repeatedSum } from './repeatedSum';

/*
 * How blockTable() writes a design's blocks into its rows: stretch by stretch. A stretch is a run of
 * blocks, one after the other in design order, of one top edge, width, height, type code and mat kind (a
 * row of a tiled array); its first block's row holds those numbers, the other blocks only their left and
 * top edges until finishStretches fills in the rest with TypedArray.fill.
 */

/** Starting values of the bounds, read from module constants (see {@link writeRows}). */
const FAR = Infinity;
const NEAR = -Infinity;

/**
 * Writes every block's left and top edge, the left and right bounds, and where each stretch begins with
 * its numbers in its first block's row (design order; {@link finishStretches} fills in the rest per
 * stretch); returns the number of stretches. This loop takes a block that may open a stretch; the blocks
 * after it that continue its stretch from left to right (the rest of a row of a tiled array) are taken by
 * {@link moreMats} or {@link moreStrips}, which read only what tells them apart: in the interpreter every
 * bytecode counts (a first evaluation runs here before V8 compiles anything), and a loop that runs fewer
 * of them is not compiled during that evaluation either (this loop runs once per stretch, a few hundred
 * times on a tiled die, so it reads the table itself; the continuations take what they read as
 * arguments, DEVELOPERS.md "Nothing before the hot loop either"). The last mat's cell and counts are kept
 * in locals: consecutive mats are nearly always of one kind, so the kind is looked up only when one changes.
 */
export function writeRows(table: TableInProgress, stretches: Int32Array): number {
  const { blocks, x: xs, y: ys, width: widths, height: heights, type: types, kindOf, kinds } = table;
  const { bounds, matsOfKind } = table.sums;
  let minX = FAR;
  let maxX = NEAR;
  // The top edge, size and code of the stretch so far: sizes are ≥ 0, so −1 matches none and the first
  // block opens a stretch.
  let stretchY = 0;
  let areaWidth = -1;
  let areaHeight = -1;
  let sumCode = -1;
  let stretchKind = -1;
  let count = 0;
  // The box whose right edge is the far one so far: its left edge and width.
  let rightX = 0;
  let rightWidth = -1;
  // The last mat's cell, counts, axis, kind and size; a footprint makes the next mat look its kind up,
  // so the first one does.
  let lastCell = '';
  let lastPerBitline = 0;
  let lastPerWordline = 0;
  let lastAxis: BitlineAxis = 'vertical';
  let lastFootprint = true;
  let lastKind = -1;
  let lastWidth = 0;
  let lastHeight = 0;
  // Strips come in runs of one type: the last type's code likewise.
  let runType: BlockType | null = null;
  let runCode = -1;
  // The most blocks a continuation of mats (of strips) took so far, 0 before the first: later ones look
  // no further. The rows of a tiled array have one length, so a continuation ends with its row and does
  // not read the first block of another kind after it (V8 would throw away the loop it compiled for mats
  // at the first strip it met there).
  const n = blocks.length;
  let matRun = 0;
  let stripRun = 0;
  for (let i = 0; i < n;) {
    const block = blocks[i] as Block;
    const x = block.x;
    const y = block.y;
    let w = lastWidth;
    let h = lastHeight;
    let code = MAT_CODE;
    let kind = lastKind;
    if (block.type === 'mat') {
      if (
        block.cellId !== lastCell ||
        block.cellsPerBitline !== lastPerBitline ||
        block.cellsPerWordline !== lastPerWordline ||
        block.bitlineAxis !== lastAxis ||
        block.footprint !== undefined ||
        lastFootprint
      ) {
        lastKind = matKindOf(table, block);
        if (lastKind === matsOfKind.length) matsOfKind.push(0);
        const g = (kinds[lastKind] as MatKind).geometry;
        lastCell = block.cellId;
        lastPerBitline = block.cellsPerBitline;
        lastPerWordline = block.cellsPerWordline;
        lastAxis = block.bitlineAxis;
        lastFootprint = block.footprint !== undefined;
        lastWidth = g.width;
        lastHeight = g.height;
        w = lastWidth;
        h = lastHeight;
        kind = lastKind;
      }
    } else {
      w = block.width;
      h = block.height;
      if (block.type !== runType) {
        runType = block.type;
        runCode = CODE_OF.get(block.type) ?? -1;
      }
      code = runCode;
      kind = -1;
    }
    xs[i] = x;
    ys[i] = y;
    // A zero size opens a stretch of its own: 0 and −0 compare equal, and the stretch's other blocks
    // take the first one's numbers bit for bit.
    if (
      y !== stretchY ||
      w !== areaWidth ||
      h !== areaHeight ||
      code !== sumCode ||
      kind !== stretchKind ||
      w === 0 ||
      h === 0
    ) {
      stretchY = y;
      areaWidth = w;
      areaHeight = h;
      sumCode = code;
      stretchKind = kind;
      widths[i] = w;
      heights[i] = h;
      types[i] = code;
      kindOf[i] = kind;
      stretches[count++] = i;
    }
    // Comparisons rather than Math.min/max calls: coordinates are finite (restore checks them).
    if (x < minX) {
      minX = x;
      bounds[0] = x;
    }
    // x + w rounds monotonically in x: a box of the far edge's width starting no further right ends no
    // further right.
    if (w !== rightWidth || x > rightX) {
      const right = x + w;
      if (right > maxX) {
        maxX = right;
        rightX = x;
        rightWidth = w;
        bounds[2] = right;
      }
    }
    i++;
    // The blocks after it in its stretch, as long as none starts left of the one before: none of them
    // moves the left bound (they start at or right of this block), and the last ends furthest right
    // (x + w rounds monotonically). A zero size stays with this loop (a stretch of its own), so does a
    // footprint.
    if (w === 0 || h === 0) continue;
    let end = i;
    if (code !== MAT_CODE) {
      end = moreStrips(blocks, i, stripRun > 0 ? Math.min(i + stripRun, n) : n, xs, x, y, w, h, runType);
      if (end - i > stripRun) stripRun = end - i;
    } else if (!lastFootprint) {
      end = moreMats(
        blocks,
        i,
        matRun > 0 ? Math.min(i + matRun, n) : n,
        xs,
        x,
        y,
        lastCell,
        lastPerBitline,
        lastPerWordline,
        lastAxis,
      );
      if (end - i > matRun) matRun = end - i;
    }
    // 0 and −0 compare equal: the top edges take the first one's bits only where they have its sign.
    if (y === 0) end = sameZero(blocks, i, end, 1 / y);
    if (end === i) continue;
    ys.fill(y, i, end);
    const lastX = xs[end - 1] as number;
    i = end;
    const right = lastX + w;
    if (right > maxX) {
      maxX = right;
      rightX = lastX;
      rightWidth = w;
      bounds[2] = right;
    }
  }
  return count;
}

/** Where blocks from … to − 1 (top edges ±0) stop having the top edge whose reciprocal is `sign` (±∞). */
function sameZero(blocks: readonly Block[], from: number, to: number, sign: number): number {
  let i = from;
  while (i < to && 1 / (blocks[i] as Block).y === sign) i++;
  return i;
}

/**
 * From block `from` on (to `to` at most), the mats of the cell, counts and axis given (no footprint) at
 * top edge `y` (compared as numbers), each starting at or right of the one before (the first at or right
 * of `x`): writes their left edges and returns where they end.
 */
function moreMats(
  blocks: readonly Block[],
  from: number,
  to: number,
  xs: Float64Array,
  x: number,
  y: number,
  cell: string,
  perBitline: number,
  perWordline: number,
  axis: BitlineAxis,
): number {
  let lastX = x;
  let i = from;
  for (; i < to; i++) {
    const block = blocks[i] as Block;
    if (
      block.type !== 'mat' ||
      block.y !== y ||
      block.cellId !== cell ||
      block.cellsPerBitline !== perBitline ||
      block.cellsPerWordline !== perWordline ||
      block.bitlineAxis !== axis ||
      block.footprint !== undefined
    )
      break;
    const left = block.x;
    if (!(left >= lastX)) break;
    xs[i] = left;
    lastX = left;
  }
  return i;
}

/**
 * From block `from` on (to `to` at most), the strips of type `type` (not a mat) at top edge `y` (compared
 * as numbers) of width `w` and height `h`, each starting at or right of the one before (the first at or right of `x`): writes their
 * left edges and returns where they end.
 */
function moreStrips(
  blocks: readonly Block[],
  from: number,
  to: number,
  xs: Float64Array,
  x: number,
  y: number,
  w: number,
  h: number,
  type: BlockType | null,
): number {
  let lastX = x;
  let i = from;
  for (; i < to; i++) {
    // A block of the strip type given is a strip.
    const block = blocks[i] as Strip;
    if (block.type !== type || block.y !== y || block.width !== w || block.height !== h) break;
    const left = block.x;
    if (!(left >= lastX)) break;
    xs[i] = left;
    lastX = left;
  }
  return i;
}

/**
 * Finishes a table written by {@link writeRows}, stretch by stretch (stretch k: blocks `stretches[k]` …
 * `stretches[k + 1] − 1`, of one top edge, width, height, type code and mat kind, whose first block
 * holds them): the other blocks' widths, heights, codes and kinds (TypedArray.fill), the mats of each
 * kind, the top and bottom bounds, and each block's area (width · height) into its code's sum and the
 * placed area, in design order. Stretches of one size and code that follow each other (rows of a tiled
 * array) are added at once (repeatedSum.ts: to the bit what adding block by block gives, without a new
 * number per block in the interpreter). Returns the placed area.
 */
export function finishStretches(table: BlockTable, stretches: Int32Array, sums: TableSums): number {
  const { y, width, height, type, kindOf } = table;
  const { areaByCode, bounds, matsOfKind } = sums;
  let placedArea = 0;
  let k = 0;
  while (k + 1 < stretches.length) {
    const from = stretches[k] as number;
    const w = width[from] as number;
    const h = height[from] as number;
    const code = type[from] as number;
    // Consecutive stretches of one size and code are one sum.
    let next = k;
    do {
      const at = stretches[next] as number;
      const to = stretches[next + 1] as number;
      const kind = kindOf[at] as number;
      width.fill(w, at + 1, to);
      height.fill(h, at + 1, to);
      type.fill(code, at + 1, to);
      kindOf.fill(kind, at + 1, to);
      if (kind >= 0) matsOfKind[kind] = (matsOfKind[kind] as number) + to - at;
      // Comparisons as the rows' left and right bounds (writeRows): one top edge per stretch.
      const top = y[at] as number;
      const bottom = top + h;
      if (top < (bounds[1] as number)) bounds[1] = top;
      if (bottom > (bounds[3] as number)) bounds[3] = bottom;
      next++;
    } while (
      next + 1 < stretches.length &&
      width[stretches[next] as number] === w &&
      height[stretches[next] as number] === h &&
      type[stretches[next] as number] === code
    );
    const count = (stretches[next] as number) - from;
    const area = w * h;
    placedArea = repeatedSum(placedArea, area, count);
    areaByCode[code] = repeatedSum(areaByCode[code] as number, area, count);
    k = next;
  }
  return placedArea;
}
