/**
 * How the repair Monte Carlo (repairMonteCarlo.ts) draws one trial's faults: count distributions sampled
 * by inversion, the (tile, kind) categories of each fault source as a cumulative table, and the growable
 * arrays a trial's faults are written into.
 */
import type { RepairMonteCarloRequest } from './repairMonteCarlo';

/** Fault kinds of one trial: a single cell, a whole word line, a whole bit-line pair, a periphery kill. */
export const FAULT_CELL = 0;
export const FAULT_ROW = 1;
export const FAULT_COLUMN = 2;
export const FAULT_FATAL = 3;

/** Cumulative table of a discrete count distribution, sampled by inversion (binary search). */
export class CountSampler {
  private readonly cumulative: Float64Array;
  constructor(probabilities: readonly number[]) {
    this.cumulative = new Float64Array(probabilities.length);
    let sum = 0;
    probabilities.forEach((p, i) => {
      sum += p;
      this.cumulative[i] = sum;
    });
    // The table stops where the tail is below 1e-15; the last entry takes what is left.
    this.cumulative[this.cumulative.length - 1] = Infinity;
  }
  sample(u: number): number {
    return firstAbove(this.cumulative, u);
  }
}

/** Index of the first entry of an ascending table above u (binary search; the last entry is Infinity). */
export function firstAbove(cumulative: Float64Array, u: number): number {
  let lo = 0;
  let hi = cumulative.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (u < (cumulative[mid] as number)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** P(N = k) for k = 0, 1, … until the remaining tail is below 1e-15: Poisson(λ) or NB(mean λ, shape α). */
export function countProbabilities(mean: number, clustering: number): number[] {
  if (!(mean > 0)) return [1];
  const out: number[] = [];
  let cumulative = 0;
  const poisson = !Number.isFinite(clustering);
  // Start in log space: P(0) = e^(−λ), or (α/(α+λ))^α.
  let logTerm = poisson ? -mean : -clustering * Math.log1p(mean / clustering);
  const ratio = poisson ? 0 : mean / (clustering + mean);
  const limit = 1_000_000;
  for (let k = 0; k < limit; k++) {
    if (k > 0) logTerm += poisson ? Math.log(mean / k) : Math.log(((k - 1 + clustering) / k) * ratio);
    const p = Math.exp(logTerm);
    out.push(p);
    cumulative += p;
    if (k > mean && 1 - cumulative < 1e-15) break;
  }
  return out;
}

/** The (tile, kind) categories of one fault source, as a cumulative table. */
export interface CategoryTable {
  readonly cumulative: Float64Array;
  readonly tile: Int32Array;
  readonly kind: Uint8Array;
  readonly total: number;
}

/** The categories of one source: `source` is TILE_DEFECT or TILE_PARAMETRIC (offset in a tile's faults). */
export function categoryTable(
  request: RepairMonteCarloRequest,
  source: number,
  fatal: number,
): CategoryTable {
  const weights: number[] = [];
  const tiles: number[] = [];
  const kinds: number[] = [];
  const t = request.layout.tiles;
  for (let index = 0; index < t.count; index++) {
    // The tile's cells, rows and columns, in the order of FAULT_CELL, FAULT_ROW, FAULT_COLUMN.
    for (let kind = FAULT_CELL; kind <= FAULT_COLUMN; kind++) {
      const perTile = t.faults[6 * index + source + kind] as number;
      if (perTile > 0 && request.copies > 0) {
        weights.push(perTile * request.copies);
        tiles.push(index);
        kinds.push(kind);
      }
    }
  }
  if (fatal > 0) {
    weights.push(fatal);
    tiles.push(-1);
    kinds.push(FAULT_FATAL);
  }
  const total = weights.reduce((a, b) => a + b, 0);
  const cumulative = new Float64Array(weights.length);
  let sum = 0;
  weights.forEach((w, i) => {
    sum += w / total;
    cumulative[i] = sum;
  });
  if (cumulative.length > 0) cumulative[cumulative.length - 1] = Infinity;
  return { cumulative, tile: Int32Array.from(tiles), kind: Uint8Array.from(kinds), total };
}

/** Growable per-trial fault arrays. */
export class FaultBuffer {
  kind = new Uint8Array(64);
  rowDomain = new Float64Array(64);
  rowKey = new Float64Array(64);
  columnDomain = new Float64Array(64);
  columnKey = new Float64Array(64);
  ensure(size: number): void {
    if (this.kind.length >= size) return;
    const capacity = Math.max(size, this.kind.length * 2);
    this.kind = new Uint8Array(capacity);
    this.rowDomain = new Float64Array(capacity);
    this.rowKey = new Float64Array(capacity);
    this.columnDomain = new Float64Array(capacity);
    this.columnKey = new Float64Array(capacity);
  }
}
