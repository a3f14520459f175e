/**
 * Seeded Monte-Carlo estimate of the die repair probability for mixed faults (single cells that a spare
 * row or a spare column can repair, whole word lines, whole bit-line pairs). Each trial throws the die's
 * faults, groups them by repair domain and solves each faulty domain's spare allocation exactly
 * (repairCover.ts). The estimate comes with its trial count and a Wilson score interval.
 *
 * How the faults of one trial are drawn (exact for the model, not an approximation):
 * - Defect faults cluster: their total count on the die is negative binomial with mean Λ and shape α
 *   (gamma-mixed Poisson; Poisson when α = ∞). Given the total, each defect picks its kind and domain with
 *   probability proportional to the expected counts, which is the same joint law as independent
 *   gamma-mixed Poisson counts per kind and domain.
 * - Parametric faults (offset, weak cells) are independent: a Poisson total split the same way.
 * - Positions are uniform over the domain's rows and columns.
 */
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { wilsonInterval, type ProportionInterval } from './binomialInterval';
import type { FaultCounts } from './faultRates';
import { CoverScratch, coverDomain, NOT_REPAIRED, REPAIRED, UNDECIDED } from './repairCover';

/** Identical repair domains with their geometry, spares and expected faults per domain. */
export interface MonteCarloDomainClass {
  readonly count: number;
  readonly rows: number;
  readonly columns: number;
  readonly spareRows: number;
  readonly spareColumns: number;
  /** Expected defect faults per domain; they share the die's clustered defect density. */
  readonly defectFaults: FaultCounts;
  /** Expected parametric faults per domain (failing sense amplifiers, weak cells); independent. */
  readonly parametricFaults: FaultCounts;
}

export interface RepairMonteCarloRequest {
  readonly classes: readonly MonteCarloDomainClass[];
  /** Expected killing defects outside the repairable arrays (periphery): any one fails the die. */
  readonly fatalDefects: number;
  /** Negative-binomial cluster parameter α of the defects; Infinity for Poisson. */
  readonly clustering: number;
  readonly seed: number;
}

export interface RepairMonteCarloResult extends ProportionInterval {
  readonly trials: number;
  readonly repaired: number;
  /** Trials in which a domain's search gave up; counted as not repaired. */
  readonly undecided: number;
}

const FAULT_CELL = 0;
const FAULT_ROW = 1;
const FAULT_COLUMN = 2;
const FAULT_FATAL = 3;

/** One (domain class, fault kind) with its cumulative probability among the faults of one source. */
interface Category {
  readonly classIndex: number;
  readonly kind: number;
}

/** Cumulative table of a discrete count distribution, sampled by inversion (binary search). */
class CountSampler {
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
    let lo = 0;
    let hi = this.cumulative.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (u < (this.cumulative[mid] as number)) hi = mid;
      else lo = mid + 1;
    }
    return lo;
  }
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

/**
 * A running estimate: call run(n) as many times as wanted (the worker calls it chunk by chunk); the
 * sequence of trials depends only on the seed, not on the chunking.
 */
export class RepairSimulation {
  private readonly rng: RandomGenerator;
  private readonly defectCount: CountSampler;
  private readonly parametricCount: CountSampler;
  private readonly defectCategories: Category[] = [];
  private readonly defectCumulative: number[] = [];
  private readonly parametricCategories: Category[] = [];
  private readonly parametricCumulative: number[] = [];
  private readonly classes: readonly MonteCarloDomainClass[];
  private readonly classOffset: number[] = [];
  private readonly scratch = new CoverScratch();
  private keys = new Float64Array(256);
  private faultKind = new Uint8Array(256);
  private faultRow = new Float64Array(256);
  private faultColumn = new Float64Array(256);
  private readonly rowsOfDomain: number[] = [];
  private readonly columnsOfDomain: number[] = [];
  private readonly cellRows: number[] = [];
  private readonly cellColumns: number[] = [];
  trials = 0;
  repaired = 0;
  undecided = 0;

  constructor(request: RepairMonteCarloRequest) {
    this.rng = xoroshiro128plus(request.seed | 0);
    this.classes = request.classes;
    let offset = 0;
    for (const c of request.classes) {
      this.classOffset.push(offset);
      offset += c.count;
    }
    if (offset * 1e7 > Number.MAX_SAFE_INTEGER) throw new Error('too many repair domains for the sort keys');
    const defectTotal = this.buildCategories(
      (c) => c.defectFaults,
      this.defectCategories,
      this.defectCumulative,
      request.fatalDefects,
    );
    const parametricTotal = this.buildCategories(
      (c) => c.parametricFaults,
      this.parametricCategories,
      this.parametricCumulative,
      0,
    );
    this.defectCount = new CountSampler(countProbabilities(defectTotal, request.clustering));
    this.parametricCount = new CountSampler(countProbabilities(parametricTotal, Infinity));
  }

  private buildCategories(
    faultsOf: (c: MonteCarloDomainClass) => FaultCounts,
    categories: Category[],
    cumulative: number[],
    fatal: number,
  ): number {
    const weights: number[] = [];
    this.classes.forEach((c, classIndex) => {
      const f = faultsOf(c);
      const kinds: [number, number][] = [
        [FAULT_CELL, f.cells],
        [FAULT_ROW, f.rows],
        [FAULT_COLUMN, f.columns],
      ];
      for (const [kind, perDomain] of kinds) {
        if (perDomain > 0 && c.count > 0) {
          categories.push({ classIndex, kind });
          weights.push(perDomain * c.count);
        }
      }
    });
    if (fatal > 0) {
      categories.push({ classIndex: -1, kind: FAULT_FATAL });
      weights.push(fatal);
    }
    const total = weights.reduce((a, b) => a + b, 0);
    let sum = 0;
    for (const w of weights) {
      sum += w / total;
      cumulative.push(sum);
    }
    if (cumulative.length > 0) cumulative[cumulative.length - 1] = Infinity;
    return total;
  }

  /** A uniform number in (0, 1) from 32 random bits. */
  private uniform(): number {
    return ((this.rng.next() >>> 0) + 0.5) * 2.3283064365386963e-10;
  }

  /** Runs `count` more trials and returns the running totals. */
  run(count: number): RepairMonteCarloResult {
    for (let t = 0; t < count; t++) {
      const outcome = this.trial();
      this.trials++;
      if (outcome === REPAIRED) this.repaired++;
      else if (outcome === UNDECIDED) this.undecided++;
    }
    return this.result();
  }

  result(): RepairMonteCarloResult {
    return {
      ...wilsonInterval(this.repaired, this.trials),
      trials: this.trials,
      repaired: this.repaired,
      undecided: this.undecided,
    };
  }

  private ensure(size: number): void {
    if (this.keys.length >= size) return;
    const capacity = Math.max(size, this.keys.length * 2);
    this.keys = new Float64Array(capacity);
    this.faultKind = new Uint8Array(capacity);
    this.faultRow = new Float64Array(capacity);
    this.faultColumn = new Float64Array(capacity);
  }

  private trial(): number {
    const defects = this.defectCount.sample(this.uniform());
    const parametric = this.parametricCount.sample(this.uniform());
    const total = defects + parametric;
    if (total === 0) return REPAIRED;
    this.ensure(total);
    // Keys: domain × 1e7 + fault index, so a numeric sort groups the faults by domain (total < 1e7).
    for (let i = 0; i < total; i++) {
      const isDefect = i < defects;
      const categories = isDefect ? this.defectCategories : this.parametricCategories;
      const cumulative = isDefect ? this.defectCumulative : this.parametricCumulative;
      const category = categories[pick(cumulative, this.uniform())] as Category;
      if (category.kind === FAULT_FATAL) return NOT_REPAIRED;
      const c = this.classes[category.classIndex] as MonteCarloDomainClass;
      const domain = (this.classOffset[category.classIndex] as number) + Math.floor(this.uniform() * c.count);
      this.keys[i] = domain * 1e7 + i;
      this.faultKind[i] = category.kind;
      this.faultRow[i] = category.kind === FAULT_COLUMN ? -1 : Math.floor(this.uniform() * c.rows);
      this.faultColumn[i] = category.kind === FAULT_ROW ? -1 : Math.floor(this.uniform() * c.columns);
    }
    const keys = this.keys.subarray(0, total);
    keys.sort();
    let undecided = false;
    let start = 0;
    while (start < total) {
      const domain = Math.floor((keys[start] as number) / 1e7);
      let end = start + 1;
      while (end < total && Math.floor((keys[end] as number) / 1e7) === domain) end++;
      const outcome = this.solveDomain(keys, start, end, domain);
      if (outcome === NOT_REPAIRED) return NOT_REPAIRED;
      if (outcome === UNDECIDED) undecided = true;
      start = end;
    }
    return undecided ? UNDECIDED : REPAIRED;
  }

  private solveDomain(keys: Float64Array, start: number, end: number, domain: number): number {
    const c = this.classes[classOfDomain(this.classOffset, domain)] as MonteCarloDomainClass;
    if (end - start === 1) {
      // One fault: one spare of a fitting kind repairs it.
      const kind = this.faultKind[(keys[start] as number) - domain * 1e7] as number;
      if (kind === FAULT_ROW) return c.spareRows > 0 ? REPAIRED : NOT_REPAIRED;
      if (kind === FAULT_COLUMN) return c.spareColumns > 0 ? REPAIRED : NOT_REPAIRED;
      return c.spareRows + c.spareColumns > 0 ? REPAIRED : NOT_REPAIRED;
    }
    const rows = this.rowsOfDomain;
    const columns = this.columnsOfDomain;
    const cellRows = this.cellRows;
    const cellColumns = this.cellColumns;
    rows.length = 0;
    columns.length = 0;
    cellRows.length = 0;
    cellColumns.length = 0;
    for (let k = start; k < end; k++) {
      const i = (keys[k] as number) - domain * 1e7;
      const kind = this.faultKind[i] as number;
      if (kind === FAULT_ROW) rows.push(this.faultRow[i] as number);
      else if (kind === FAULT_COLUMN) columns.push(this.faultColumn[i] as number);
      else {
        cellRows.push(this.faultRow[i] as number);
        cellColumns.push(this.faultColumn[i] as number);
      }
    }
    return coverDomain(rows, columns, cellRows, cellColumns, c.spareRows, c.spareColumns, this.scratch);
  }
}

/** Index of the first cumulative entry above u. */
function pick(cumulative: readonly number[], u: number): number {
  let i = 0;
  while (u >= (cumulative[i] as number)) i++;
  return i;
}

function classOfDomain(offsets: readonly number[], domain: number): number {
  let i = offsets.length - 1;
  while (i > 0 && (offsets[i] as number) > domain) i--;
  return i;
}

/** Runs a whole estimate at once (tests, CLI); the worker runs it in chunks instead. */
export function estimateRepairProbability(
  request: RepairMonteCarloRequest,
  trials: number,
): RepairMonteCarloResult {
  return new RepairSimulation(request).run(trials);
}
