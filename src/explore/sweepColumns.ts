import type { FigureKey, FindingKind, PartitionFigures } from '../engine';
import type { SweepPoint } from './sweep';

/**
 * Sweep points as columns of numbers, the way they cross from the sweep worker to the page: a chunk of
 * points is a few typed arrays whose buffers are transferred (no structured clone of thousands of
 * objects, nothing for the page's collector). The page keeps every point in a SweepTable and builds a
 * SweepPoint object only for the point a card, the front table, the CSV or a build asks for.
 */

/**
 * Every numeric figure of a point, once each. The Record makes the compiler refuse a PartitionFigures
 * number that is missing here, so a new figure travels without anyone remembering this list.
 */
const EVERY_FIGURE: Record<FigureKey, true> = {
  matCount: true,
  usableBits: true,
  totalArea: true,
  cellArea: true,
  areaPerBit: true,
  areaPerBitInF2: true,
  arrayEfficiency: true,
  senseMargin: true,
  senseSignalAtRefresh: true,
  requiredSignal: true,
  wordlineDelay: true,
  wordlineResistance: true,
  wordlineCapacitance: true,
  activationEnergyPerBit: true,
  activationEnergy: true,
  cellsPerWordline: true,
  rowToColumnDelay: true,
  wordlineTurnOn: true,
  senseFireWait: true,
  latchTime: true,
  rowCycleTime: true,
  rowActiveTime: true,
  rowPrechargeTime: true,
  retentionTime: true,
  weakestRetentionTime: true,
  refreshCycleTime: true,
  refreshInterval: true,
  refreshBusyFraction: true,
  refreshPower: true,
  dieYield: true,
  repairProbability: true,
  redundancyArea: true,
  areaPerBitWithRedundancy: true,
  goodDiesPerWafer: true,
  spareRows: true,
  spareColumns: true,
};
export const FIGURE_COLUMNS = Object.keys(EVERY_FIGURE) as FigureKey[];
const FIGURE_COLUMN = new Map(FIGURE_COLUMNS.map((key, k) => [key, k]));

/** The columns that say which partition a point is; null spares travel as NaN. */
const PLACE_COLUMNS = [
  'index',
  'cellsPerBitline',
  'cellsPerWordline',
  'cellIndex',
  'processIndex',
  'matRows',
  'matColumns',
  'spareRows',
  'spareColumns',
] as const satisfies readonly (keyof SweepPoint)[];
type PlaceColumn = (typeof PLACE_COLUMNS)[number];

/** Index columns into the run's text tables (−1: none). */
const TEXT_COLUMNS = ['errorKinds', 'warningKinds', 'problem'] as const;

/** One chunk of points as it crosses from the worker: figure-major columns, `count` values each. */
export interface SweepChunk {
  readonly count: number;
  /** PLACE_COLUMNS.length × count values. */
  readonly place: Float64Array;
  /** FIGURE_COLUMNS.length × count values (NaN where the point has no plan). */
  readonly figures: Float64Array;
  /** TEXT_COLUMNS.length × count indices into the run's kind lists and problem texts. */
  readonly texts: Int32Array;
  /** Kind lists and problem texts first used by this chunk, appended to the run's tables in order. */
  readonly newKindLists: readonly (readonly FindingKind[])[];
  readonly newProblems: readonly string[];
}

/** The buffers of a chunk, to transfer rather than copy. */
export function chunkBuffers(chunk: SweepChunk): ArrayBuffer[] {
  return [chunk.place.buffer, chunk.figures.buffer, chunk.texts.buffer] as ArrayBuffer[];
}

/** Text tables of one run on the worker's side: each kind list and problem text gets a number once. */
export class SweepTextTables {
  private readonly kindLists = new Map<string, number>();
  private readonly problems = new Map<string, number>();
  private kindListCount = 0;
  private problemCount = 0;

  kindList(kinds: readonly FindingKind[], added: FindingKind[][]): number {
    // Most lists are empty or hold one kind: no joined text for those.
    const key = kinds.length === 0 ? '' : kinds.length === 1 ? (kinds[0] ?? '') : kinds.join(',');
    let id = this.kindLists.get(key);
    if (id === undefined) {
      id = this.kindListCount++;
      this.kindLists.set(key, id);
      added.push([...kinds]);
    }
    return id;
  }

  problem(text: string, added: string[]): number {
    let id = this.problems.get(text);
    if (id === undefined) {
      id = this.problemCount++;
      this.problems.set(text, id);
      added.push(text);
    }
    return id;
  }
}

/** Encodes assessed points as a chunk; `tables` numbers the texts across the whole run. */
export function encodeSweepChunk(points: readonly SweepPoint[], tables: SweepTextTables): SweepChunk {
  const n = points.length;
  const place = new Float64Array(PLACE_COLUMNS.length * n);
  const figures = new Float64Array(FIGURE_COLUMNS.length * n).fill(Number.NaN);
  const texts = new Int32Array(TEXT_COLUMNS.length * n).fill(-1);
  const newKindLists: FindingKind[][] = [];
  const newProblems: string[] = [];
  // Column by column: each inner loop reads one property name from every point, so the read stays
  // monomorphic, and writes run along the column.
  PLACE_COLUMNS.forEach((column, c) => {
    for (let i = 0; i < n; i++) place[c * n + i] = points[i]?.[column] ?? Number.NaN;
  });
  FIGURE_COLUMNS.forEach((key, k) => {
    for (let i = 0; i < n; i++) {
      const f = points[i]?.figures;
      if (f) figures[k * n + i] = f[key];
    }
  });
  for (let i = 0; i < n; i++) {
    const p = points[i];
    if (!p) continue;
    const f = p.figures;
    if (f) {
      texts[i] = tables.kindList(f.errorKinds, newKindLists);
      texts[n + i] = tables.kindList(f.warningKinds, newKindLists);
    }
    if (p.problem !== null) texts[2 * n + i] = tables.problem(p.problem, newProblems);
  }
  return { count: n, place, figures, texts, newKindLists, newProblems };
}

/** A table's rows as plain data (typed arrays and texts), to hand from the worker to the page. */
export interface SweepTableState {
  readonly count: number;
  readonly place: readonly Float64Array[];
  readonly figures: readonly Float64Array[];
  readonly texts: readonly Int32Array[];
  readonly kindLists: readonly (readonly FindingKind[])[];
  readonly problems: readonly string[];
}

/**
 * Every point of a run, column by column, filled chunk by chunk in arrival order. Rows are positions in
 * arrival order (a sweep's points arrive by index, so row i is point i). Append-only: a row once written
 * never changes, so views of the first `count` rows stay valid while more arrive.
 */
export class SweepTable {
  private capacity: number;
  private placeColumns: Float64Array[];
  private figureColumns: Float64Array[];
  private textColumns: Int32Array[];
  private kindLists: (readonly FindingKind[])[] = [];
  private problems: string[] = [];
  count = 0;

  constructor() {
    this.capacity = 16;
    this.placeColumns = PLACE_COLUMNS.map(() => new Float64Array(this.capacity));
    this.figureColumns = FIGURE_COLUMNS.map(() => new Float64Array(this.capacity));
    this.textColumns = TEXT_COLUMNS.map(() => new Int32Array(this.capacity));
  }

  /** Makes room for `rows` rows in all (a run's size, once known), so appending copies each value once. */
  reserve(rows: number): void {
    if (rows > this.capacity) this.grow(rows);
  }

  append(chunk: SweepChunk): void {
    const n = chunk.count;
    if (this.count + n > this.capacity) this.grow(Math.max(this.count + n, this.capacity * 2));
    const at = this.count;
    const copy = (columns: (Float64Array | Int32Array)[], from: Float64Array | Int32Array) => {
      columns.forEach((column, c) => column.set(from.subarray(c * n, (c + 1) * n), at));
    };
    copy(this.placeColumns, chunk.place);
    copy(this.figureColumns, chunk.figures);
    copy(this.textColumns, chunk.texts);
    this.kindLists.push(...chunk.newKindLists);
    this.problems.push(...chunk.newProblems);
    this.count += n;
  }

  /** The rows as plain data; the arrays are shared (hand them over, then stop using this table). */
  state(): SweepTableState {
    return {
      count: this.count,
      place: this.placeColumns,
      figures: this.figureColumns,
      texts: this.textColumns,
      kindLists: this.kindLists,
      problems: this.problems,
    };
  }

  /** The buffers of a state, to transfer rather than copy. */
  static buffers(state: SweepTableState): ArrayBuffer[] {
    return [...state.place, ...state.figures, ...state.texts].map((c) => c.buffer as ArrayBuffer);
  }

  /**
   * Takes over the rows of another table of the same run (the sweep worker's, which holds every row
   * this one has and more): its arrays are used, not copied. Views taken before stay valid for the rows
   * they held (the rows are the same), but read the columns again for the new ones.
   */
  adopt(state: SweepTableState): void {
    if (state.count < this.count) throw new Error('a table can only take over a table with more rows');
    this.placeColumns = [...state.place];
    this.figureColumns = [...state.figures];
    this.textColumns = [...state.texts];
    this.capacity = Math.min(
      ...this.placeColumns.map((c) => c.length),
      ...this.figureColumns.map((c) => c.length),
      ...this.textColumns.map((c) => c.length),
    );
    this.kindLists = [...state.kindLists];
    this.problems = [...state.problems];
    this.count = state.count;
  }

  private grow(capacity: number): void {
    const grown = <T extends Float64Array | Int32Array>(column: T, make: (n: number) => T): T => {
      const next = make(capacity);
      next.set(column.subarray(0, this.count));
      return next;
    };
    this.placeColumns = this.placeColumns.map((c) => grown(c, (n) => new Float64Array(n)));
    this.figureColumns = this.figureColumns.map((c) => grown(c, (n) => new Float64Array(n)));
    this.textColumns = this.textColumns.map((c) => grown(c, (n) => new Int32Array(n)));
    this.capacity = capacity;
  }

  /** One figure of every row (valid for the first `count` rows; NaN where a point has no plan). */
  figure(key: FigureKey): Float64Array {
    return this.figureColumns[FIGURE_COLUMN.get(key) ?? -1] ?? new Float64Array(0);
  }

  /** Which partition each row is: one of the place columns. */
  place(column: PlaceColumn): Float64Array {
    return this.placeColumns[PLACE_COLUMNS.indexOf(column)] ?? new Float64Array(0);
  }

  /** Whether row `i` has a plan (and so figures). */
  planned(i: number): boolean {
    return (this.textColumns[2]?.[i] ?? -1) < 0;
  }

  /** The error-severity check kinds row `i` fails (empty without a plan). */
  errorKinds(i: number): readonly FindingKind[] {
    return this.kindLists[this.textColumns[0]?.[i] ?? -1] ?? [];
  }

  /** Row `i` as the object runSweepRange() made. */
  point(i: number): SweepPoint {
    const place = (column: PlaceColumn) =>
      this.placeColumns[PLACE_COLUMNS.indexOf(column)]?.[i] ?? Number.NaN;
    const spare = (column: 'spareRows' | 'spareColumns') => {
      const v = place(column);
      return Number.isNaN(v) ? null : v;
    };
    const problem = this.textColumns[2]?.[i] ?? -1;
    let figures: PartitionFigures | null = null;
    if (problem < 0) {
      const f: Record<string, unknown> = {};
      FIGURE_COLUMNS.forEach((key, k) => {
        f[key] = this.figureColumns[k]?.[i] ?? Number.NaN;
      });
      f.errorKinds = [...(this.kindLists[this.textColumns[0]?.[i] ?? -1] ?? [])];
      f.warningKinds = [...(this.kindLists[this.textColumns[1]?.[i] ?? -1] ?? [])];
      figures = f as unknown as PartitionFigures;
    }
    return {
      index: place('index'),
      cellsPerBitline: place('cellsPerBitline'),
      cellsPerWordline: place('cellsPerWordline'),
      cellIndex: place('cellIndex'),
      processIndex: place('processIndex'),
      matRows: place('matRows'),
      matColumns: place('matColumns'),
      spareRows: spare('spareRows'),
      spareColumns: spare('spareColumns'),
      figures,
      problem: problem < 0 ? null : (this.problems[problem] ?? null),
    };
  }

  /** The first `rows` rows as point objects (exports and tallies after a sweep; the chart needs none). */
  points(rows = this.count): SweepPoint[] {
    const points: SweepPoint[] = [];
    for (let i = 0; i < Math.min(rows, this.count); i++) points.push(this.point(i));
    return points;
  }

  /** The row holding the point with sweep index `index`, or −1 (rows arrive in index order). */
  rowOf(index: number): number {
    const indices = this.place('index');
    let lo = 0;
    let hi = this.count - 1;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const at = indices[mid] ?? Number.NaN;
      if (at === index) return mid;
      if (at < index) lo = mid + 1;
      else hi = mid - 1;
    }
    return -1;
  }
}
