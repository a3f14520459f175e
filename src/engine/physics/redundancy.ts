/**
 * Repair probability of memory arrays with spare word lines (rows) and spare bit-line pairs (columns), in
 * closed form. A repair domain is a group of mats that shares one pool of spare rows and one pool of spare
 * columns; a spare replaces any one row (or column) of its domain (flexible redundancy). Faults are Poisson
 * with the given expected counts per domain and land uniformly on the domain's rows and columns.
 */
import type { FaultCounts } from './faultRates';

/** One repair domain: its replaceable lines, its spares and the faults expected in it. */
export interface RepairDomain {
  /** Word lines a spare row may replace (all rows of the domain's mats). */
  readonly rows: number;
  /** Bit-line pairs (columns) a spare column may replace. */
  readonly columns: number;
  readonly spareRows: number;
  readonly spareColumns: number;
  /** Expected faults per domain (Poisson). */
  readonly faults: FaultCounts;
}

/** A number of identical domains on the die. */
export interface RepairDomainClass {
  readonly count: number;
  readonly domain: RepairDomain;
}

/** P(X ≤ k) for X ~ Poisson(λ), summed term by term (k is a spare count: small). */
export function poissonCdf(k: number, mean: number): number {
  if (k < 0) return 0;
  if (!(mean > 0)) return 1;
  let term = Math.exp(-mean);
  if (term === 0) return poissonCdfLog(k, mean);
  let sum = term;
  for (let i = 1; i <= k; i++) {
    term *= mean / i;
    sum += term;
  }
  return Math.min(1, sum);
}

/** The same sum in log space for means so large that e^(−λ) underflows. */
function poissonCdfLog(k: number, mean: number): number {
  let sum = 0;
  let logTerm = -mean;
  for (let i = 0; i <= k; i++) {
    if (i > 0) logTerm += Math.log(mean / i);
    sum += Math.exp(logTerm);
  }
  return Math.min(1, sum);
}

/**
 * P(X ≤ k) for X ~ Binomial(n, p), by the term recurrence P(i+1) = P(i)·(n−i)/(i+1)·p/(1−p) from
 * P(0) = (1−p)^n computed as exp(n·log1p(−p)), so that n of millions and p of 1e-9 keep their precision.
 */
export function binomialCdf(k: number, n: number, p: number): number {
  if (k < 0) return 0;
  if (k >= n || !(p > 0)) return 1;
  if (p >= 1) return 0;
  const ratio = p / (1 - p);
  let logTerm = n * Math.log1p(-p);
  let sum = Math.exp(logTerm);
  for (let i = 0; i < k; i++) {
    logTerm += Math.log(((n - i) / (i + 1)) * ratio);
    sum += Math.exp(logTerm);
  }
  return Math.min(1, sum);
}

/**
 * Probability that one given line of a domain is faulty when `expectedFaults` line faults fall uniformly
 * on `lines` lines: each line's count is Poisson(λ/M) (Poisson thinning), so q = 1 − e^(−λ/M).
 */
export function faultyLineProbability(expectedFaults: number, lines: number): number {
  if (!(lines > 0)) return 0;
  return -Math.expm1(-expectedFaults / lines);
}

/**
 * Exact probability that the spares of one kind cover the faulty lines of that kind: the number of
 * distinct faulty lines is Binomial(M, q) with q = 1 − e^(−λ/M) (two faults on one line need one spare),
 * and the domain is repaired when it is ≤ the spare count.
 * Source: Poisson thinning (common practice, no source); for M ≫ λ this is the classic Poisson
 * redundancy yield Σ_{k≤S} e^(−λ)λ^k/k! (e.g. MIT 6.780J "Control of Manufacturing Processes", 2008,
 * assignment 5 solutions, part 2).
 */
export function lineRepairProbability(lines: number, expectedFaults: number, spares: number): number {
  return binomialCdf(spares, lines, faultyLineProbability(expectedFaults, lines));
}

/**
 * Exact repair probability of a domain whose faults are whole rows and whole columns only (no single-cell
 * faults): rows and columns are independent, so P = P(faulty rows ≤ R)·P(faulty columns ≤ C).
 * NaN when the domain has single-cell faults (use sparseRepairProbability or the Monte-Carlo estimate).
 */
export function rowColumnRepairProbability(domain: RepairDomain): number {
  if (domain.faults.cells > 0) return Number.NaN;
  return (
    lineRepairProbability(domain.rows, domain.faults.rows, domain.spareRows) *
    lineRepairProbability(domain.columns, domain.faults.columns, domain.spareColumns)
  );
}

/**
 * Repair probability of a domain with single-cell faults as well, in the sparse limit: i faulty rows and
 * j faulty columns use i + j spares, and every single-cell fault then takes one of the R − i + C − j spares
 * left (either kind). P = Σ_{i≤R} Σ_{j≤C} P(i)·P(j)·P(cells ≤ R − i + C − j).
 * This is a lower bound of the exact probability: a cell fault on a faulty line costs nothing and two cell
 * faults on one line share a spare, which the sum ignores. It is tight when faults rarely share a line
 * (large mats, few faults), and the Monte-Carlo estimate is compared with it there.
 */
export function sparseRepairProbability(domain: RepairDomain): number {
  const { rows, columns, spareRows, spareColumns, faults } = domain;
  const qRow = faultyLineProbability(faults.rows, rows);
  const qColumn = faultyLineProbability(faults.columns, columns);
  const rowTerms = binomialTerms(spareRows, rows, qRow);
  const columnTerms = binomialTerms(spareColumns, columns, qColumn);
  let sum = 0;
  for (let i = 0; i <= spareRows; i++) {
    for (let j = 0; j <= spareColumns; j++) {
      sum +=
        (rowTerms[i] as number) *
        (columnTerms[j] as number) *
        poissonCdf(spareRows - i + spareColumns - j, faults.cells);
    }
  }
  return Math.min(1, sum);
}

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

/**
 * Probability that S spares of one kind repair a domain's faulty lines of that kind and then, one spare
 * each, its single-cell faults: Σ_{i≤S} P(i faulty lines)·P(cells ≤ S − i), faulty lines
 * Binomial(lines, 1 − e^(−λ/lines)), cells Poisson. A lower bound of the domain's share of the repair when
 * cells may also take spares of the other kind (a cell on a faulty line, or two cells on one line, need
 * fewer spares than counted); exact with no cell faults.
 */
export function linesAndCellsRepairProbability(
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

/** Identical repair domains of one kind: how many, their lines and their expected faults. */
export interface LineDomainClass {
  readonly count: number;
  readonly lines: number;
  readonly lineFaults: number;
  readonly cellFaults: number;
  /** For a row domain: its tiles with the spare columns the split plan gives them (omit to skip that plan). */
  readonly tiles?: readonly TileShareClass[];
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
export function crossedRepairLowerBound(
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
      const p = splitPlanDomainProbability(c.lines, c.lineFaults, spareRows, c.tiles ?? []);
      if (!(p > 0)) {
        split = -Infinity;
        break;
      }
      split += c.count * Math.log(p);
    }
  }
  return Math.exp(Math.max(cellsByRows, cellsByColumns, split));
}

/** Identical tiles of a row domain under the split plan: their faults and the spare columns they own. */
export interface TileShareClass {
  readonly count: number;
  readonly cellFaults: number;
  readonly columnFaults: number;
  /** Spare columns of the tile's strip set aside for this tile. */
  readonly columnSpares: number;
}

/**
 * Repair probability of one row domain under the split plan: every strip's spare columns are divided
 * among the tiles it senses (fixed in advance), each tile's column faults must fit its share, its single
 * cells take the share's columns left and the rest overflow to the domain's spare rows, which also take
 * the faulty rows. Counts are Poisson per tile (faults on one line counted apart: a lower bound), faulty
 * rows Binomial(lines, 1 − e^(−λ/lines)). P = Σ_i P(i rows)·P(Σ_tiles overflow ≤ R − i, every tile's
 * column faults ≤ its share); the overflow sum is a convolution truncated at R.
 */
export function splitPlanDomainProbability(
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

/**
 * Die repair probability: every domain must be repaired, and domains are independent, so
 * P = Π_classes p_class^count, summed in log space.
 */
export function dieRepairProbability(
  classes: readonly RepairDomainClass[],
  domainProbability: (domain: RepairDomain) => number,
): number {
  let logSum = 0;
  for (const { count, domain } of classes) {
    if (count === 0) continue;
    const p = domainProbability(domain);
    if (!(p > 0)) return Number.isNaN(p) ? Number.NaN : 0;
    logSum += count * Math.log(p);
  }
  return Math.exp(logSum);
}
