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

/**
 * poissonCdf(i, mean) for every i = 0..k in one pass: the same terms added in the same order, so each entry
 * equals poissonCdf(i, mean) bit for bit (the running sum is clamped to 1 only where it is read).
 */
export function poissonCdfTable(k: number, mean: number): Float64Array {
  const table = new Float64Array(Math.max(0, k + 1));
  if (k < 0) return table;
  if (!(mean > 0)) return table.fill(1);
  let term = Math.exp(-mean);
  let sum = 0;
  if (term === 0) {
    let logTerm = -mean;
    for (let i = 0; i <= k; i++) {
      if (i > 0) logTerm += Math.log(mean / i);
      sum += Math.exp(logTerm);
      table[i] = Math.min(1, sum);
    }
    return table;
  }
  sum = term;
  table[0] = Math.min(1, sum);
  for (let i = 1; i <= k; i++) {
    term *= mean / i;
    sum += term;
    table[i] = Math.min(1, sum);
  }
  return table;
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
export function binomialTerms(k: number, n: number, p: number): number[] {
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
  return linesAndCellsFromTerms(
    binomialTerms(spares, lines, faultyLineProbability(lineFaults, lines)),
    poissonCdfTable(spares, cellFaults),
    spares,
  );
}

/**
 * linesAndCellsRepairProbability from its two tables: P(i faulty lines) for i = 0..S and P(cells ≤ k) for
 * k = 0..S (poissonCdfTable), so that callers holding them compute neither twice.
 */
export function linesAndCellsFromTerms(
  lineTerms: ArrayLike<number>,
  cellsAtMost: ArrayLike<number>,
  spares: number,
): number {
  let sum = 0;
  for (let i = 0; i <= spares; i++) sum += (lineTerms[i] as number) * (cellsAtMost[spares - i] as number);
  return Math.min(1, sum);
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
