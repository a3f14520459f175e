import type { FigureKey } from '../engine';
import { axisDirection, type ChartModel, type FeasibilityFigures, type FeasibilityLimits } from './chartData';
import { FamilyTallier, type TallierState } from './familyTally';
import { paretoFront, type Direction } from './pareto';
import type { SweepTable } from './sweepColumns';

/**
 * The scatter's model in columns, built as the sweep's points arrive: which rows are plotted (planned,
 * finite on both axes) with their coordinates, series and feasibility, the axes' extents and the Pareto
 * front. Adding a chunk costs in proportion to the chunk and the front, never to the whole sweep, so a
 * running sweep's chart update has no pass over every point. It equals chartModel() (chartData.ts) on the
 * same points; test/explore/chartModelBuilder.test.ts holds the two together.
 */
export interface ColumnChartModel {
  /** The builder this snapshot came from: the same source means the rows below only ever grew. */
  readonly source: object;
  /** Plotted points; every array below is valid for the first `count` entries. */
  readonly count: number;
  /** Row of the sweep table each plotted point is. */
  readonly row: Int32Array;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly cellIndex: Int32Array;
  readonly processIndex: Int32Array;
  /** 1 where the point misses a check or a chart limit. */
  readonly infeasible: Uint8Array;
  /** Plotted indices of the front, along x from best to worst. */
  readonly front: readonly number[];
  readonly counts: ChartModel['counts'];
  /** Least and greatest plotted coordinate on each axis (Infinity / −Infinity when none). */
  readonly extent: { readonly x: readonly [number, number]; readonly y: readonly [number, number] };
}

/**
 * The points of a chart model as the scatter chart draws them (charts/chartStyle.ts ScatterPoints, without
 * a picture): colour by the cell, marker shape by the process. The page's chart and the sweep worker's
 * drawing both read it.
 */
export function scatterInputOf(model: ColumnChartModel, colourOf: (series: number) => string) {
  return {
    source: model.source,
    count: model.count,
    x: model.x,
    y: model.y,
    infeasible: model.infeasible,
    series: model.cellIndex,
    shape: model.processIndex,
    colourOf,
    extent: model.extent,
  };
}

/**
 * A builder's whole state as plain data (typed arrays, numbers, maps): what the sweep worker hands the
 * page for a finished sweep, so the page's builder goes on from it instead of taking in every row again.
 */
export interface ChartModelState {
  readonly rows: number;
  readonly plotted: number;
  readonly feasible: number;
  readonly unplanned: number;
  readonly row: Int32Array<ArrayBuffer>;
  readonly x: Float64Array<ArrayBuffer>;
  readonly y: Float64Array<ArrayBuffer>;
  readonly cellIndex: Int32Array<ArrayBuffer>;
  readonly processIndex: Int32Array<ArrayBuffer>;
  readonly infeasible: Uint8Array<ArrayBuffer>;
  readonly front: readonly number[];
  /** xMin, xMax, yMin, yMax. */
  readonly extent: readonly [number, number, number, number];
  readonly tallies: TallierState;
}

export class ChartModelBuilder {
  private rows = 0;
  private plotted = 0;
  private feasible = 0;
  private unplanned = 0;
  private row = new Int32Array(0);
  private x = new Float64Array(0);
  private y = new Float64Array(0);
  private cellIndex = new Int32Array(0);
  private processIndex = new Int32Array(0);
  private infeasible = new Uint8Array(0);
  private front: number[] = [];
  private xMin = Infinity;
  private xMax = -Infinity;
  private yMin = Infinity;
  private yMax = -Infinity;
  private readonly dx: Direction;
  private readonly dy: Direction;
  /** Why families are infeasible, tallied over every row taken in (familyTally.ts). */
  readonly tallies: FamilyTallier;

  /**
   * `state`: a builder's state() for the same table, axes and limits taken elsewhere (the sweep worker
   * builds the model of a finished sweep), to go on from; its arrays are used, not copied.
   */
  constructor(
    readonly table: SweepTable,
    readonly xAxis: FigureKey,
    readonly yAxis: FigureKey,
    readonly limits: FeasibilityLimits,
    state?: ChartModelState,
  ) {
    this.dx = axisDirection(xAxis);
    this.dy = axisDirection(yAxis);
    this.tallies = new FamilyTallier(limits, state?.tallies);
    if (state) {
      this.rows = state.rows;
      this.plotted = state.plotted;
      this.feasible = state.feasible;
      this.unplanned = state.unplanned;
      this.row = state.row;
      this.x = state.x;
      this.y = state.y;
      this.cellIndex = state.cellIndex;
      this.processIndex = state.processIndex;
      this.infeasible = state.infeasible;
      this.front = [...state.front];
      [this.xMin, this.xMax, this.yMin, this.yMax] = state.extent;
    }
  }

  /** The whole state as plain data (shares the arrays: hand them over, then stop using this builder). */
  state(): ChartModelState {
    return {
      rows: this.rows,
      plotted: this.plotted,
      feasible: this.feasible,
      unplanned: this.unplanned,
      row: this.row,
      x: this.x,
      y: this.y,
      cellIndex: this.cellIndex,
      processIndex: this.processIndex,
      infeasible: this.infeasible,
      front: this.front,
      extent: [this.xMin, this.xMax, this.yMin, this.yMax],
      tallies: this.tallies.state(),
    };
  }

  /** The buffers of a state, to transfer rather than copy. */
  static buffers(state: ChartModelState): ArrayBuffer[] {
    return [state.row, state.x, state.y, state.cellIndex, state.processIndex, state.infeasible].map(
      (a) => a.buffer,
    );
  }

  /** Rows of the table taken in so far. */
  get taken(): number {
    return this.rows;
  }

  /** Takes in the table's rows up to `rows` (all that have arrived, by default) not taken in before. */
  update(rows = this.table.count): void {
    const table = this.table;
    const end = Math.min(rows, table.count);
    if (end <= this.rows) return;
    this.reserve(this.plotted + (end - this.rows));
    const xs = table.figure(this.xAxis);
    const ys = table.figure(this.yAxis);
    const margin = table.figure('senseMargin');
    const delay = table.figure('wordlineDelay');
    const cells = table.place('cellIndex');
    const processes = table.place('processIndex');
    const { minMargin, maxDelay } = this.limits;
    const candidates: number[] = [];
    // One object reused for every row's tally (read at once, never kept).
    const figures = { errorKinds: [], senseMargin: 0, wordlineDelay: 0 } as {
      -readonly [K in keyof FeasibilityFigures]: FeasibilityFigures[K];
    };
    const tallied = { cellIndex: 0, processIndex: 0, figures: null as FeasibilityFigures | null };
    for (let r = this.rows; r < end; r++) {
      const planned = table.planned(r);
      tallied.cellIndex = cells[r] ?? 0;
      tallied.processIndex = processes[r] ?? 0;
      if (planned) {
        figures.errorKinds = table.errorKinds(r);
        figures.senseMargin = margin[r] ?? Number.NaN;
        figures.wordlineDelay = delay[r] ?? Number.NaN;
      }
      tallied.figures = planned ? figures : null;
      this.tallies.add(tallied);
      if (!planned) {
        this.unplanned++;
        continue;
      }
      const x = xs[r] ?? Number.NaN;
      const y = ys[r] ?? Number.NaN;
      if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
      // isFeasible() (chartData.ts) on columns.
      const ok =
        table.errorKinds(r).length === 0 &&
        (margin[r] ?? Number.NaN) >= minMargin &&
        (delay[r] ?? Number.NaN) <= maxDelay;
      const i = this.plotted++;
      this.row[i] = r;
      this.x[i] = x;
      this.y[i] = y;
      this.cellIndex[i] = cells[r] ?? 0;
      this.processIndex[i] = processes[r] ?? 0;
      this.infeasible[i] = ok ? 0 : 1;
      if (x < this.xMin) this.xMin = x;
      if (x > this.xMax) this.xMax = x;
      if (y < this.yMin) this.yMin = y;
      if (y > this.yMax) this.yMax = y;
      if (ok) {
        this.feasible++;
        candidates.push(i);
      }
    }
    this.rows = end;
    if (candidates.length > 0) this.mergeFront(candidates);
  }

  /**
   * The front of (old front ∪ new feasible points) is the front of every point so far: a point the old
   * front left out is dominated by a point on it. Candidates go in plotted order, as chartModel() hands
   * them to paretoFront(), so equal points come out in the same order.
   */
  private mergeFront(added: number[]): void {
    const candidates = [...this.front].sort((a, b) => a - b).concat(added);
    const coordinates = candidates.map((i) => ({ x: this.x[i] ?? Number.NaN, y: this.y[i] ?? Number.NaN }));
    this.front = paretoFront(coordinates, this.dx, this.dy).map((k) => candidates[k] ?? -1);
  }

  private reserve(size: number): void {
    if (size <= this.row.length) return;
    const capacity = Math.max(size, this.row.length * 2, 64);
    const grow = <T extends Int32Array | Float64Array | Uint8Array>(old: T, next: T): T => {
      next.set(old);
      return next;
    };
    this.row = grow(this.row, new Int32Array(capacity));
    this.x = grow(this.x, new Float64Array(capacity));
    this.y = grow(this.y, new Float64Array(capacity));
    this.cellIndex = grow(this.cellIndex, new Int32Array(capacity));
    this.processIndex = grow(this.processIndex, new Int32Array(capacity));
    this.infeasible = grow(this.infeasible, new Uint8Array(capacity));
  }

  /** The model as it stands (a new object each call; the arrays are shared and only grow). */
  snapshot(): ColumnChartModel {
    return {
      source: this,
      count: this.plotted,
      row: this.row,
      x: this.x,
      y: this.y,
      cellIndex: this.cellIndex,
      processIndex: this.processIndex,
      infeasible: this.infeasible,
      front: this.front,
      counts: {
        points: this.rows,
        plotted: this.plotted,
        feasible: this.feasible,
        unplanned: this.unplanned,
      },
      extent: { x: [this.xMin, this.xMax], y: [this.yMin, this.yMax] },
    };
  }
}
