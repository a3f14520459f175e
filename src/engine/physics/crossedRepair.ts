/**
 * Die repair probability when row domains and column domains (strip segments) cross, in closed form: the
 * best of three repair plans fixed in advance, each a lower bound of the exact value. The yield integrates
 * it over the defect density, a hundred or more calls per die, so one call shares what its domains have in
 * common (identical row domains, tiles of one kind, Poisson tables of one mean) and computes it once; every
 * figure is the same sum in the same order as computed alone (test/engine/physics/crossedRepairFast.test.ts
 * holds it against the plain formulas).
 */
import {
  binomialTerms,
  faultyLineProbability,
  lineRepairProbability,
  linesAndCellsFromTerms,
  poissonCdfTable,
} from './redundancy';

/** Identical repair domains of one kind: how many, their lines and their expected faults. */
export interface LineDomainClass {
  readonly count: number;
  readonly lines: number;
  readonly lineFaults: number;
  readonly cellFaults: number;
  /** For a row domain: its tiles with the spare columns the split plan gives them (omit to skip that plan). */
  readonly tiles?: readonly TileShareClass[];
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
 * One kind's domain probabilities for the last domain asked about (lines, line faults, cell faults): the
 * domain classes of one plan often repeat one domain (every mat row of a grid), and the cell plan and the
 * split plan read the same faulty-line terms.
 */
class DomainTerms {
  private lines = Number.NaN;
  private lineFaults = Number.NaN;
  private cellFaults = Number.NaN;
  private lineOnly = Number.NaN;
  private withCells = Number.NaN;
  private terms: number[] | null = null;

  constructor(private readonly spares: number) {}

  private select(lines: number, lineFaults: number, cellFaults: number): void {
    if (lines === this.lines && lineFaults === this.lineFaults && cellFaults === this.cellFaults) return;
    this.lines = lines;
    this.lineFaults = lineFaults;
    this.cellFaults = cellFaults;
    this.lineOnly = Number.NaN;
    this.withCells = Number.NaN;
    this.terms = null;
  }

  /** P(faulty lines ≤ S) (lineRepairProbability). */
  lineRepair(c: LineDomainClass): number {
    this.select(c.lines, c.lineFaults, c.cellFaults);
    if (Number.isNaN(this.lineOnly))
      this.lineOnly = lineRepairProbability(c.lines, c.lineFaults, this.spares);
    return this.lineOnly;
  }

  /** P(faulty lines, then single cells, ≤ S) (linesAndCellsRepairProbability). */
  linesAndCells(c: LineDomainClass): number {
    this.select(c.lines, c.lineFaults, c.cellFaults);
    if (!(c.cellFaults > 0)) return this.lineRepair(c);
    if (Number.isNaN(this.withCells)) {
      this.withCells = linesAndCellsFromTerms(
        this.faultyLineTerms(c),
        poissonCdfTable(this.spares, c.cellFaults),
        this.spares,
      );
    }
    return this.withCells;
  }

  /** P(i faulty lines) for i = 0..S. */
  faultyLineTerms(c: LineDomainClass): number[] {
    this.select(c.lines, c.lineFaults, c.cellFaults);
    this.terms ??= binomialTerms(this.spares, c.lines, faultyLineProbability(c.lineFaults, c.lines));
    return this.terms;
  }
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
  const rows = new DomainTerms(spareRows);
  const columns = new DomainTerms(spareColumns);
  const logOf = (classes: readonly LineDomainClass[], terms: DomainTerms, withCells: boolean): number => {
    let sum = 0;
    for (const c of classes) {
      if (c.count === 0) continue;
      const p = withCells ? terms.linesAndCells(c) : terms.lineRepair(c);
      if (!(p > 0)) return -Infinity;
      sum += c.count * Math.log(p);
    }
    return sum;
  };
  const cellsByRows = logOf(rowClasses, rows, true) + logOf(columnClasses, columns, false);
  const cellsByColumns = logOf(rowClasses, rows, false) + logOf(columnClasses, columns, true);
  let split = -Infinity;
  // With no spare rows the split plan is the column plan with fewer columns per cell, and with no spare
  // columns it is the row plan: it can only win with both.
  if (spareRows > 0 && spareColumns > 0 && rowClasses.every((c) => c.tiles !== undefined)) {
    split = 0;
    const overflows = new TileOverflows(spareRows);
    for (const c of rowClasses) {
      if (c.count === 0) continue;
      const p = splitPlanFromTerms(rows.faultyLineTerms(c), spareRows, c.tiles ?? [], overflows);
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
export function splitPlanDomainProbability(
  rows: number,
  rowFaults: number,
  spareRows: number,
  tiles: readonly TileShareClass[],
): number {
  const rowTerms = binomialTerms(spareRows, rows, faultyLineProbability(rowFaults, rows));
  return splitPlanFromTerms(rowTerms, spareRows, tiles, new TileOverflows(spareRows));
}

function splitPlanFromTerms(
  rowTerms: readonly number[],
  spareRows: number,
  tiles: readonly TileShareClass[],
  overflows: TileOverflows,
): number {
  // Distribution of the domain's total overflow, 0..R (mass beyond R or with a tile's columns exceeded is
  // lost). The first tile's convolution with the unit distribution is that tile's own distribution.
  let total: Float64Array | null = null;
  for (const t of tiles) {
    const own = overflows.powered(t);
    total = total === null ? own : convolveTruncated(total, own);
  }
  if (total === null) {
    total = new Float64Array(spareRows + 1);
    total[0] = 1;
  }
  let p = 0;
  let cumulative = 0;
  for (let i = spareRows; i >= 0; i--) {
    // cumulative = P(overflow ≤ R − i)
    cumulative += total[spareRows - i] as number;
    p += (rowTerms[i] as number) * cumulative;
  }
  return Math.min(1, p);
}

/**
 * The overflow distributions of one call's tiles, each kind (count, faults, share) computed once, and the
 * Poisson terms of each mean computed once at the longest length asked (shorter tables are its prefix:
 * the recurrence does not depend on the length).
 */
class TileOverflows {
  private readonly kinds: { tile: TileShareClass; powered: Float64Array }[] = [];
  private readonly means: { mean: number; terms: number[] }[] = [];

  constructor(private readonly spareRows: number) {}

  powered(t: TileShareClass): Float64Array {
    for (const k of this.kinds) {
      const u = k.tile;
      if (
        u.count === t.count &&
        u.cellFaults === t.cellFaults &&
        u.columnFaults === t.columnFaults &&
        u.columnSpares === t.columnSpares
      )
        return k.powered;
    }
    const powered = powerTruncated(this.overflow(t), t.count);
    this.kinds.push({ tile: t, powered });
    return powered;
  }

  /** One tile's overflow distribution 0..R: Σ_{j≤c} P(j column faults)·P(cells = o + c − j) (o = 0: ≤ c − j). */
  private overflow(t: TileShareClass): Float64Array {
    const spareRows = this.spareRows;
    const out = new Float64Array(spareRows + 1);
    const c = t.columnSpares;
    const columnTerms = this.poissonTerms(c, t.columnFaults);
    const cellTerms = this.poissonTerms(c + spareRows, t.cellFaults);
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

  /** P(X = i) for i = 0..k (at least), X ~ Poisson(mean). */
  private poissonTerms(k: number, mean: number): number[] {
    for (const m of this.means) if (m.mean === mean && m.terms.length > k) return m.terms;
    const terms = poissonTerms(k, mean);
    this.means.push({ mean, terms });
    return terms;
  }
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
