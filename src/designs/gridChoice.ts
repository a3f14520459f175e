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
  const side = Math.ceil(Math.sqrt(needed));
  const swd = strips.wordlineDriverStripWidth;
  const sa = strips.senseAmpStripHeight;
  const alpha = strips.rowDecoderWidth + swd;
  const beta = matWidth + swd;
  const delta = matHeight + sa;
  const gamma = lossRows * delta + sa + strips.columnDecoderHeight;
  const best: Best = { rows: 0, columns: 0, width: 0, height: 0, area: Infinity, position: 0 };
  const search = { needed, lossRows, side, strips, beta, delta, maxMats, best };
  walkFamily(search, false, Math.sqrt((alpha * delta * needed) / (beta * gamma)));
  walkFamily(search, true, Math.sqrt((beta * gamma * needed) / (alpha * delta)));
  return best.rows > 0
    ? { rows: best.rows, columns: best.columns, width: best.width, height: best.height }
    : null;
}

/** The best grid so far, and where it stands in the candidate list (2k for family A, 2k + 1 for B). */
interface Best {
  rows: number;
  columns: number;
  width: number;
  height: number;
  area: number;
  position: number;
}

interface GridSearch {
  readonly needed: number;
  readonly lossRows: number;
  readonly side: number;
  readonly strips: StripSizes;
  /** mat width + driver strip, mat height + sense-amplifier strip (m) */
  readonly beta: number;
  readonly delta: number;
  readonly maxMats: number;
  readonly best: Best;
}

/**
 * Visits one family's k in 1 … side outward from the whole number nearest `star` (its bound's minimum).
 * A k whose bound is already beyond the best is skipped, and once k is also at least one step past
 * `star`, so is every k further out in that direction. No closures, one call per candidate built:
 * the explorer plans thousands of banks per sweep, mostly before the engine has optimised this code.
 */
function walkFamily(s: GridSearch, familyB: boolean, star: number): void {
  const { needed, lossRows, side, strips, beta, delta } = s;
  // A star that is not a finite number (a zero strip sum) gives no shortcut: every k is visited.
  const start = Number.isFinite(star) ? Math.min(side, Math.max(1, Math.round(star))) : 1;
  for (let step = 1; step >= -1; step -= 2) {
    for (let k = step === 1 ? start : start - 1; k >= 1 && k <= side; k += step) {
      // The bound: family A (k columns) with m/k + L rows, family B (k + L rows) with m/k columns. The
      // same sums as gridWidth and gridHeight, in the same order.
      const boundColumns = familyB ? needed / k : k;
      const boundRows = familyB ? k + lossRows : needed / k + lossRows;
      const bound =
        (strips.rowDecoderWidth + (boundColumns * beta + strips.wordlineDriverStripWidth)) *
        (boundRows * delta + strips.senseAmpStripHeight + strips.columnDecoderHeight);
      if (bound * (1 - BOUND_ALLOWANCE) > s.best.area) {
        if (step === 1 ? k >= star + 1 : k <= star - 1) break;
        continue;
      }
      const r = familyB ? k + lossRows : Math.ceil(needed / k) + lossRows;
      const c = familyB ? Math.ceil(needed / k) : k;
      consider(s, r, c, familyB ? 2 * k + 1 : 2 * k);
    }
  }
}

/** Keeps r × c when it has few enough mats and beats the best: smaller box, fewer mats, squarer, listed first. */
function consider(s: GridSearch, r: number, c: number, position: number): void {
  if (r * c > s.maxMats) return;
  // gridWidth and gridHeight, with the mat-plus-strip sums they would form (beta, delta) formed once.
  const strips = s.strips;
  const w = strips.rowDecoderWidth + (c * s.beta + strips.wordlineDriverStripWidth);
  const h = r * s.delta + strips.senseAmpStripHeight + strips.columnDecoderHeight;
  const a = w * h;
  const best = s.best;
  if (best.rows > 0) {
    if (a !== best.area) {
      if (a > best.area) return;
    } else if (r * c !== best.rows * best.columns) {
      if (r * c > best.rows * best.columns) return;
    } else {
      const squareness = Math.abs(w - h);
      const bestSquareness = Math.abs(best.width - best.height);
      if (squareness > bestSquareness || (squareness === bestSquareness && position > best.position)) return;
    }
  }
  best.rows = r;
  best.columns = c;
  best.width = w;
  best.height = h;
  best.area = a;
  best.position = position;
}
