import type { StripSizes } from './partitionPlan';

/**
 * Width of a row of `columns` mats with a driver strip between and beside them, after the row decoder
 * (m). The same sums gridFloorplan uses to place the blocks, so the box agrees to the last bit. Takes a
 * fractional count too (the lower bound below).
 */
export function gridWidth(columns: number, matWidth: number, strips: StripSizes): number {
  const swd = strips.wordlineDriverStripWidth;
  return strips.rowDecoderWidth + (columns * (matWidth + swd) + swd);
}

/** Height of `rows` mats with a sense-amplifier strip between and beside them, and the column decoder (m). */
export function gridHeight(rows: number, matHeight: number, strips: StripSizes): number {
  const sa = strips.senseAmpStripHeight;
  return rows * (matHeight + sa) + sa + strips.columnDecoderHeight;
}

/** A chosen grid of mats and its bounding box (m). */
export interface GridChoice {
  readonly rows: number;
  readonly columns: number;
  readonly width: number;
  readonly height: number;
}

/**
 * Relative allowance for rounding when a lower bound rules out the rest of a family: the bound and the
 * areas it is compared with are each a few floating-point operations, good to ~1e-15.
 */
const BOUND_ALLOWANCE = 1e-9;

/**
 * The grid planPartition() wants: among the candidates — for k = 1 … ⌈√m⌉, family A: ⌈m/k⌉ + loss rows
 * × k columns, then family B: k + loss rows × ⌈m/k⌉ columns — those with at most `maxMats` mats, the
 * smallest box, then the fewest mats, then the squarer box; on a full tie the one listed first. Null when
 * every candidate has too many mats.
 *
 * It does not try every candidate. With the box w(c)·h(r), both sums of positive terms, family A's area
 * is at least LA(k) = w(k)·h(m/k + L) (⌈m/k⌉ ≥ m/k), and LA(k) = (α + βk)(γ + δm/k) is convex in k with
 * its minimum at k* = √(αδm/(βγ)) (α = row decoder + driver strip, β = mat width + driver strip,
 * δ = mat height + sense-amplifier strip, γ = L·δ + strip + column decoder). So, walking away from k*
 * (at least one step past it), once the bound exceeds the best area found, every further k of that
 * family is larger still and the walk stops; family B likewise with w(m/k)·h(k + L). Floating-point
 * rounding is monotone in these sums and products, so the computed bound never exceeds the computed
 * area; the small allowance covers the convexity argument. Arithmetic; test/designs/gridChoice.test.ts
 * holds it to trying every candidate.
 */
export function chooseGrid(
  needed: number,
  lossRows: number,
  matWidth: number,
  matHeight: number,
  strips: StripSizes,
  maxMats: number,
): GridChoice | null {
  let rows = 0;
  let columns = 0;
  let width = 0;
  let height = 0;
  let area = Infinity;
  /** Where the best stands in the candidate list (2k for family A, 2k + 1 for B): first wins a tie. */
  let position = 0;
  const consider = (r: number, c: number, at: number) => {
    if (r * c > maxMats) return;
    const w = gridWidth(c, matWidth, strips);
    const h = gridHeight(r, matHeight, strips);
    const a = w * h;
    if (rows > 0) {
      if (a !== area) {
        if (a > area) return;
      } else if (r * c !== rows * columns) {
        if (r * c > rows * columns) return;
      } else {
        const squareness = Math.abs(w - h);
        const best = Math.abs(width - height);
        if (squareness > best || (squareness === best && at > position)) return;
      }
    }
    rows = r;
    columns = c;
    width = w;
    height = h;
    area = a;
    position = at;
  };
  const side = Math.ceil(Math.sqrt(needed));
  const alpha = strips.rowDecoderWidth + strips.wordlineDriverStripWidth;
  const beta = matWidth + strips.wordlineDriverStripWidth;
  const delta = matHeight + strips.senseAmpStripHeight;
  const gamma = lossRows * delta + strips.senseAmpStripHeight + strips.columnDecoderHeight;
  const beyond = (bound: number) => bound * (1 - BOUND_ALLOWANCE) > area;

  // Family A: k columns, ⌈m/k⌉ + L rows.
  const starA = Math.sqrt((alpha * delta * needed) / (beta * gamma));
  const boundA = (k: number) =>
    gridWidth(k, matWidth, strips) * gridHeight(needed / k + lossRows, matHeight, strips);
  walk(side, starA, boundA, beyond, (k) => consider(Math.ceil(needed / k) + lossRows, k, 2 * k));
  // Family B: k + L rows, ⌈m/k⌉ columns.
  const starB = Math.sqrt((beta * gamma * needed) / (alpha * delta));
  const boundB = (k: number) =>
    gridWidth(needed / k, matWidth, strips) * gridHeight(k + lossRows, matHeight, strips);
  walk(side, starB, boundB, beyond, (k) => consider(k + lossRows, Math.ceil(needed / k), 2 * k + 1));

  return rows > 0 ? { rows, columns, width, height } : null;
}

/**
 * Visits k in 1 … side outward from the whole number nearest `star` (the bound's minimum), stopping in
 * each direction once k is at least one step past `star` and the bound at k is beyond the best.
 */
function walk(
  side: number,
  star: number,
  bound: (k: number) => number,
  beyond: (bound: number) => boolean,
  visit: (k: number) => void,
): void {
  // A star that is not a finite number (a zero strip sum) gives no shortcut: every k is visited.
  const start = Number.isFinite(star) ? Math.min(side, Math.max(1, Math.round(star))) : 1;
  for (let k = start; k <= side; k++) {
    visit(k);
    if (k >= star + 1 && beyond(bound(k))) break;
  }
  for (let k = start - 1; k >= 1; k--) {
    visit(k);
    if (k <= star - 1 && beyond(bound(k))) break;
  }
}
