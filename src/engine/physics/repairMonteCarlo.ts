/**
 * Seeded Monte-Carlo estimate of the die repair probability for mixed faults (single cells that a spare
 * row or a spare column can repair, whole word lines, whole bit-line pairs), with spare rows per row-repair
 * domain and spare columns per column-repair domain (a sense-amplifier strip segment), the two crossing as
 * the layout says (repairLayout.ts). Each trial throws the die's faults, checks the line faults of every
 * domain, joins the remaining cells into groups of domains they couple and solves each group's spare
 * allocation exactly (repairCover.ts). The estimate comes with its trial count and a Wilson score interval.
 *
 * How the faults of one trial are drawn (exact for the model, not an approximation):
 * - Defect faults cluster: their total count on the die is negative binomial with mean Λ and shape α
 *   (gamma-mixed Poisson; Poisson when α = ∞). Given the total, each defect picks its kind and tile with
 *   probability proportional to the expected counts, and its floorplan copy uniformly, which is the same
 *   joint law as independent gamma-mixed Poisson counts per kind and tile.
 * - Parametric faults (offset, weak cells) are independent: a Poisson total split the same way.
 * - Positions are uniform over the tile's rows and columns; a word line spans every tile of its mat.
 */
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { wilsonInterval, type ProportionInterval } from './binomialInterval';
import {
  coverCells,
  coverCrossedDomains,
  NOT_REPAIRED,
  REPAIRED,
  SEARCH_NODE_BUDGET,
  UNDECIDED,
} from './repairCover';
import { TILE_DEFECT, TILE_PARAMETRIC, type RepairLayout } from './repairLayout';
import {
  categoryTable,
  CountSampler,
  countProbabilities,
  FaultBuffer,
  FAULT_CELL,
  FAULT_COLUMN,
  FAULT_FATAL,
  FAULT_ROW,
  firstAbove,
  type CategoryTable,
} from './repairSampling';

export interface RepairMonteCarloRequest {
  /** One floorplan copy's row domains, column domains and tiles. */
  readonly layout: RepairLayout;
  /** Identical floorplan copies on the die, each with its own domains. */
  readonly copies: number;
  /** Spare rows per row-repair domain and spare columns per column-repair domain. */
  readonly spareRows: number;
  readonly spareColumns: number;
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

/**
 * A running estimate: call run(n) as many times as wanted (the worker calls it chunk by chunk); the
 * sequence of trials depends only on the seed, not on the chunking.
 */
export class RepairSimulation {
  private readonly rng: RandomGenerator;
  private readonly defectCount: CountSampler;
  private readonly parametricCount: CountSampler;
  private readonly defects: CategoryTable;
  private readonly parametric: CategoryTable;
  private readonly request: RepairMonteCarloRequest;
  /** Line keys: domain (over the whole die) × lines per domain stride + line index. */
  private readonly rowStride: number;
  private readonly columnStride: number;
  private readonly buffer = new FaultBuffer();
  private readonly rowsUsed = new Map<number, number>();
  private readonly columnsUsed = new Map<number, number>();
  private readonly faultyRows = new Set<number>();
  private readonly faultyColumns = new Set<number>();
  private readonly firstOfRowDomain = new Map<number, number>();
  private readonly firstOfColumnDomain = new Map<number, number>();
  private parent = new Int32Array(64);
  private cells: number[] = [];
  trials = 0;
  repaired = 0;
  undecided = 0;

  constructor(request: RepairMonteCarloRequest) {
    this.request = request;
    this.rng = xoroshiro128plus(request.seed | 0);
    const { layout, copies } = request;
    this.rowStride = Math.ceil(largest(layout.rowDomainRows));
    this.columnStride = Math.ceil(largest(layout.columnDomainColumns));
    const rowKeys = copies * layout.rowDomainRows.length * this.rowStride;
    const columnKeys = copies * layout.columnDomainColumns.length * this.columnStride;
    if (Math.max(rowKeys, columnKeys) > Number.MAX_SAFE_INTEGER) {
      throw new Error('too many lines on the die for the Monte-Carlo line keys');
    }
    this.defects = categoryTable(request, TILE_DEFECT, request.fatalDefects);
    this.parametric = categoryTable(request, TILE_PARAMETRIC, 0);
    this.defectCount = new CountSampler(countProbabilities(this.defects.total, request.clustering));
    this.parametricCount = new CountSampler(countProbabilities(this.parametric.total, Infinity));
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

  /** Draws the trial's faults into the buffer; false when one of them kills the die outright. */
  private throwFaults(defects: number, total: number): boolean {
    const { layout, copies } = this.request;
    const rowDomainsPerCopy = layout.rowDomainRows.length;
    const columnDomainsPerCopy = layout.columnDomainColumns.length;
    const b = this.buffer;
    for (let i = 0; i < total; i++) {
      const table = i < defects ? this.defects : this.parametric;
      const category = firstAbove(table.cumulative, this.uniform());
      const kind = table.kind[category] as number;
      if (kind === FAULT_FATAL) return false;
      const tile = table.tile[category] as number;
      const tiles = layout.tiles;
      const copy = Math.floor(this.uniform() * copies);
      b.kind[i] = kind;
      if (kind !== FAULT_COLUMN) {
        const rowDomain = copy * rowDomainsPerCopy + (tiles.rowDomain[tile] as number);
        b.rowDomain[i] = rowDomain;
        b.rowKey[i] =
          rowDomain * this.rowStride +
          (tiles.rowOffset[tile] as number) +
          Math.floor(this.uniform() * (tiles.rows[tile] as number));
      }
      if (kind !== FAULT_ROW) {
        const columnDomain = copy * columnDomainsPerCopy + (tiles.columnDomain[tile] as number);
        b.columnDomain[i] = columnDomain;
        b.columnKey[i] =
          columnDomain * this.columnStride +
          (tiles.columnOffset[tile] as number) +
          Math.floor(this.uniform() * (tiles.columns[tile] as number));
      }
    }
    return true;
  }

  private trial(): number {
    const defects = this.defectCount.sample(this.uniform());
    const parametric = this.parametricCount.sample(this.uniform());
    const total = defects + parametric;
    if (total === 0) return REPAIRED;
    this.buffer.ensure(total);
    if (!this.throwFaults(defects, total)) return NOT_REPAIRED;
    const b = this.buffer;
    const { spareRows, spareColumns } = this.request;
    // Line faults: distinct faulty lines per domain must fit the domain's spares.
    this.rowsUsed.clear();
    this.columnsUsed.clear();
    this.faultyRows.clear();
    this.faultyColumns.clear();
    for (let i = 0; i < total; i++) {
      const kind = b.kind[i] as number;
      if (kind === FAULT_ROW && !this.faultyRows.has(b.rowKey[i] as number)) {
        this.faultyRows.add(b.rowKey[i] as number);
        const used = (this.rowsUsed.get(b.rowDomain[i] as number) ?? 0) + 1;
        if (used > spareRows) return NOT_REPAIRED;
        this.rowsUsed.set(b.rowDomain[i] as number, used);
      } else if (kind === FAULT_COLUMN && !this.faultyColumns.has(b.columnKey[i] as number)) {
        this.faultyColumns.add(b.columnKey[i] as number);
        const used = (this.columnsUsed.get(b.columnDomain[i] as number) ?? 0) + 1;
        if (used > spareColumns) return NOT_REPAIRED;
        this.columnsUsed.set(b.columnDomain[i] as number, used);
      }
    }
    // Cells not on a replaced line, joined into groups of domains they couple (union-find).
    const cells = this.cells;
    cells.length = 0;
    for (let i = 0; i < total; i++) {
      if (b.kind[i] !== FAULT_CELL) continue;
      if (this.faultyRows.has(b.rowKey[i] as number) || this.faultyColumns.has(b.columnKey[i] as number))
        continue;
      cells.push(i);
    }
    if (cells.length === 0) return REPAIRED;
    if (cells.length === 1) return this.sparesLeftFor(cells[0] as number) ? REPAIRED : NOT_REPAIRED;
    return this.solveGroups(cells);
  }

  private rowSparesLeft(rowDomain: number): number {
    return this.request.spareRows - (this.rowsUsed.get(rowDomain) ?? 0);
  }

  private columnSparesLeft(columnDomain: number): number {
    return this.request.spareColumns - (this.columnsUsed.get(columnDomain) ?? 0);
  }

  private sparesLeftFor(i: number): boolean {
    const b = this.buffer;
    return (
      this.rowSparesLeft(b.rowDomain[i] as number) > 0 ||
      this.columnSparesLeft(b.columnDomain[i] as number) > 0
    );
  }

  private find(x: number): number {
    const parent = this.parent;
    while (parent[x] !== x) {
      parent[x] = parent[parent[x] as number] as number;
      x = parent[x] as number;
    }
    return x;
  }

  private solveGroups(cells: readonly number[]): number {
    const n = cells.length;
    if (this.parent.length < n) this.parent = new Int32Array(Math.max(n, 2 * this.parent.length));
    for (let k = 0; k < n; k++) this.parent[k] = k;
    const b = this.buffer;
    this.firstOfRowDomain.clear();
    this.firstOfColumnDomain.clear();
    const join = (map: Map<number, number>, domain: number, k: number) => {
      const first = map.get(domain);
      if (first === undefined) map.set(domain, k);
      else this.parent[this.find(k)] = this.find(first);
    };
    for (let k = 0; k < n; k++) {
      const i = cells[k] as number;
      join(this.firstOfRowDomain, b.rowDomain[i] as number, k);
      join(this.firstOfColumnDomain, b.columnDomain[i] as number, k);
    }
    const groups = new Map<number, number[]>();
    for (let k = 0; k < n; k++) {
      const root = this.find(k);
      const group = groups.get(root);
      if (group) group.push(cells[k] as number);
      else groups.set(root, [cells[k] as number]);
    }
    let undecided = false;
    for (const group of groups.values()) {
      const outcome =
        group.length === 1
          ? this.sparesLeftFor(group[0] as number)
            ? REPAIRED
            : NOT_REPAIRED
          : this.solveGroup(group);
      if (outcome === NOT_REPAIRED) return NOT_REPAIRED;
      if (outcome === UNDECIDED) undecided = true;
    }
    return undecided ? UNDECIDED : REPAIRED;
  }

  /** One group of coupled domains: distinct cells, local domain numbers, then the exact cover. */
  private solveGroup(group: readonly number[]): number {
    const b = this.buffer;
    const rowLocal = new Map<number, number>();
    const columnLocal = new Map<number, number>();
    const rowKeys: number[] = [];
    const columnKeys: number[] = [];
    const rowDomains: number[] = [];
    const columnDomains: number[] = [];
    const seen = new Set<string>();
    for (const i of group) {
      const rowKey = b.rowKey[i] as number;
      const columnKey = b.columnKey[i] as number;
      const id = `${rowKey},${columnKey}`;
      if (seen.has(id)) continue;
      seen.add(id);
      const rowDomain = b.rowDomain[i] as number;
      const columnDomain = b.columnDomain[i] as number;
      if (!rowLocal.has(rowDomain)) rowLocal.set(rowDomain, rowLocal.size);
      if (!columnLocal.has(columnDomain)) columnLocal.set(columnDomain, columnLocal.size);
      rowKeys.push(rowKey);
      columnKeys.push(columnKey);
      rowDomains.push(rowLocal.get(rowDomain) as number);
      columnDomains.push(columnLocal.get(columnDomain) as number);
    }
    const rowSpares = Int32Array.from(rowLocal.keys(), (d) => this.rowSparesLeft(d));
    const columnSpares = Int32Array.from(columnLocal.keys(), (d) => this.columnSparesLeft(d));
    const budget = { nodes: SEARCH_NODE_BUDGET };
    if (rowLocal.size === 1 && columnLocal.size === 1) {
      // One row domain and one strip: the classic problem, with its early abort.
      return coverCells(
        Float64Array.from(rowKeys),
        Float64Array.from(columnKeys),
        rowSpares[0] as number,
        columnSpares[0] as number,
        budget,
      );
    }
    return coverCrossedDomains(
      Float64Array.from(rowKeys),
      Float64Array.from(columnKeys),
      Int32Array.from(rowDomains),
      Int32Array.from(columnDomains),
      rowSpares,
      columnSpares,
      budget,
    );
  }
}

/** The largest entry, at least 1 (a loop: the lists can be too long to spread into Math.max). */
function largest(values: readonly number[]): number {
  let most = 1;
  for (const v of values) if (v > most) most = v;
  return most;
}

/** Runs a whole estimate at once (tests, CLI); the worker runs it in chunks instead. */
export function estimateRepairProbability(
  request: RepairMonteCarloRequest,
  trials: number,
): RepairMonteCarloResult {
  return new RepairSimulation(request).run(trials);
}
