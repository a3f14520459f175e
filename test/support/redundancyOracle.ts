/**
 * The crossed-domain repair bound as the engine computed it before one call learnt to share its domains'
 * terms (crossedRepair.ts): every class, tile and Poisson table computed on its own, P(cells ≤ k) summed
 * anew for every k. Kept verbatim as the oracle for test/engine/physics/crossedRepairFast.test.ts.
 */
import {
  faultyLineProbability,
  lineRepairProbability,
  poissonCdf,
} from '../../src/engine/physics/redundancy';
import type { LineDomainClass, TileShareClass } from '../../src/engine/physics/crossedRepair';

/** P(X = i) for i = 0..k, X ~ Binomial(n, p); entries beyond n are 0. */
function binomialTerms(k: number, n: number, p: number): number[] {
  const terms = new Array<number>(k + 1).fill(0);
  if (!(p > 0)) {
    terms[0] = 1;
    return terms;
  }
  const ratio = p / (1 - p);
  let logTerm = n * Math.log1p(-p);
  let term = Math.exp(logTerm);
  const last = Math.min(k, n);
  if (term > 1e-250) {
    // The product recurrence, while P(0) is far from underflow (a few ulps per step, k is small).
    for (let i = 0; i <= last; i++) {
      if (i > 0) term *= ((n - i + 1) / i) * ratio;
      terms[i] = term;
    }
    return terms;
  }
  for (let i = 0; i <= last; i++) {
    if (i > 0) logTerm += Math.log(((n - i + 1) / i) * ratio);
    terms[i] = Math.exp(logTerm);
  }
  return terms;
}

function linesAndCellsRepairProbability(
  lines: number,
  lineFaults: number,
  cellFaults: number,
  spares: number,
): number {
  if (!(cellFaults > 0)) return lineRepairProbability(lines, lineFaults, spares);
  const terms = binomialTerms(spares, lines, faultyLineProbability(lineFaults, lines));
  let sum = 0;
  for (let i = 0; i <= spares; i++) sum += (terms[i] as number) * poissonCdf(spares - i, cellFaults);
  return Math.min(1, sum);
}

/**
 * Die repair probability when rows are repaired per row domain and columns per column domain (a strip
 * segment), the two crossing: P(every row domain ≤ R faulty rows)·P(every column domain ≤ C faulty
 * columns), exact with no single-cell faults (rows and columns independent). With cell faults the exact
 * answer couples domains that share cells, so this takes the best of three repair plans fixed in advance,
 * each a lower bound of the exact value: every cell by a spare row of its row domain; every cell by a
 * spare column of its strip; or each strip's spare columns split among the tiles it senses, cells taking
 * their tile's columns first and the rest the row domain's rows (when the row classes carry their tiles).
 * Products in log space.
 */
export function plainCrossedRepairLowerBound(
  rowClasses: readonly LineDomainClass[],
  columnClasses: readonly LineDomainClass[],
  spareRows: number,
  spareColumns: number,
): number {
  const logOf = (classes: readonly LineDomainClass[], spares: number, withCells: boolean): number => {
    let sum = 0;
    for (const c of classes) {
      if (c.count === 0) continue;
      const p = withCells
        ? linesAndCellsRepairProbability(c.lines, c.lineFaults, c.cellFaults, spares)
        : lineRepairProbability(c.lines, c.lineFaults, spares);
      if (!(p > 0)) return -Infinity;
      sum += c.count * Math.log(p);
    }
    return sum;
  };
  const cellsByRows = logOf(rowClasses, spareRows, true) + logOf(columnClasses, spareColumns, false);
  const cellsByColumns = logOf(rowClasses, spareRows, false) + logOf(columnClasses, spareColumns, true);
  let split = -Infinity;
  // With no spare rows the split plan is the column plan with fewer columns per cell, and with no spare
  // columns it is the row plan: it can only win with both.
  if (spareRows > 0 && spareColumns > 0 && rowClasses.every((c) => c.tiles !== undefined)) {
    split = 0;
    for (const c of rowClasses) {
      if (c.count === 0) continue;
      const p = plainSplitPlanDomainProbability(c.lines, c.lineFaults, spareRows, c.tiles ?? []);
      if (!(p > 0)) {
        split = -Infinity;
        break;
      }
      split += c.count * Math.log(p);
    }
  }
  return Math.exp(Math.max(cellsByRows, cellsByColumns, split));
}

/**
 * Repair probability of one row domain under the split plan: every strip's spare columns are divided
 * among the tiles it senses (fixed in advance), each tile's column faults must fit its share, its single
 * cells take the share's columns left and the rest overflow to the domain's spare rows, which also take
 * the faulty rows. Counts are Poisson per tile (faults on one line counted apart: a lower bound), faulty
 * rows Binomial(lines, 1 − e^(−λ/lines)). P = Σ_i P(i rows)·P(Σ_tiles overflow ≤ R − i, every tile's
 * column faults ≤ its share); the overflow sum is a convolution truncated at R.
 */
export function plainSplitPlanDomainProbability(
  rows: number,
  rowFaults: number,
  spareRows: number,
  tiles: readonly TileShareClass[],
): number {
  // Distribution of the domain's total overflow, 0..R (mass beyond R or with a tile's columns exceeded is lost).
  let total: Float64Array = new Float64Array(spareRows + 1);
  total[0] = 1;
  for (const t of tiles)
    total = convolveTruncated(total, powerTruncated(tileOverflow(t, spareRows), t.count));
  const rowTerms = binomialTerms(spareRows, rows, faultyLineProbability(rowFaults, rows));
  let p = 0;
  let cumulative = 0;
  for (let i = spareRows; i >= 0; i--) {
    // cumulative = P(overflow ≤ R − i)
    cumulative += total[spareRows - i] as number;
    p += (rowTerms[i] as number) * cumulative;
  }
  return Math.min(1, p);
}

/** One tile's overflow distribution 0..R: Σ_{j≤c} P(j column faults)·P(cells = o + c − j) (o = 0: ≤ c − j). */
function tileOverflow(t: TileShareClass, spareRows: number): Float64Array {
  const out = new Float64Array(spareRows + 1);
  const c = t.columnSpares;
  const columnTerms = poissonTerms(c, t.columnFaults);
  const cellTerms = poissonTerms(c + spareRows, t.cellFaults);
  for (let j = 0; j <= c; j++) {
    const pj = columnTerms[j] as number;
    if (pj === 0) continue;
    const free = c - j;
    let upToFree = 0;
    for (let k = 0; k <= free; k++) upToFree += cellTerms[k] as number;
    out[0] = (out[0] as number) + pj * upToFree;
    for (let o = 1; o <= spareRows; o++) out[o] = (out[o] as number) + pj * (cellTerms[free + o] as number);
  }
  return out;
}

/** P(X = k) for k = 0..K, X ~ Poisson(λ), in log space. */
function poissonTerms(k: number, mean: number): number[] {
  const terms = new Array<number>(k + 1).fill(0);
  if (!(mean > 0)) {
    terms[0] = 1;
    return terms;
  }
  let term = Math.exp(-mean);
  if (term > 1e-250) {
    for (let i = 0; i <= k; i++) {
      if (i > 0) term *= mean / i;
      terms[i] = term;
    }
    return terms;
  }
  let logTerm = -mean;
  for (let i = 0; i <= k; i++) {
    if (i > 0) logTerm += Math.log(mean / i);
    terms[i] = Math.exp(logTerm);
  }
  return terms;
}

/** The n-fold convolution of a distribution with itself, truncated to its length (by squaring). */
function powerTruncated(a: Float64Array, n: number): Float64Array {
  let result: Float64Array = new Float64Array(a.length);
  result[0] = 1;
  let base = a;
  for (let m = Math.floor(n); m > 0; m = Math.floor(m / 2)) {
    if (m % 2 === 1) result = convolveTruncated(result, base);
    if (m > 1) base = convolveTruncated(base, base);
  }
  return result;
}

function convolveTruncated(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(a.length);
  for (let i = 0; i < a.length; i++) {
    const ai = a[i] as number;
    if (ai === 0) continue;
    for (let j = 0; i + j < a.length; j++) out[i + j] = (out[i + j] as number) + ai * (b[j] as number);
  }
  return out;
}
