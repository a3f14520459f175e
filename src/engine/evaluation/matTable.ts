import type { Block } from '../../model/block';
import type { MatFigures, MatReport } from './report';

/**
 * The mats of a report, stored column-wise. Mat k (in design order of the mats) is the design block at
 * `position[k]`; its physics is `figures[figureIndex[k]]`, shared by every mat of its kind; it leaves
 * `unsensedBitlines[k]` bit lines and `undrivenWordlines[k]` word lines unserved. The strips serving it
 * are the blocks at `servingPositions[servingOffsets[3k]]` … before `servingOffsets[3k + 1]` (sense
 * amplifiers) and from there to before `servingOffsets[3k + 2]` (drivers), in ascending design position.
 *
 * Why columns, not one object per mat: on a 65,536-mat die, making and keeping that many small objects
 * costs more than all the physics (the garbage collector copies and traces each one), while a panel
 * shows a handful. {@link matAt} makes the object for one mat when it is wanted.
 */
export interface MatTable {
  readonly count: number;
  /** The evaluated design's blocks, in design order. */
  readonly blocks: readonly Block[];
  readonly position: Int32Array;
  readonly figureIndex: Int32Array;
  readonly figures: readonly MatFigures[];
  readonly unsensedBitlines: Float64Array;
  readonly undrivenWordlines: Int32Array;
  readonly servingPositions: Int32Array;
  readonly servingOffsets: Int32Array;
  /** What the connection pass knows of the serving lists of whole runs of mats, when it worked by runs. */
  readonly runLists?: RunLists | null;
}

/**
 * Serving lists of runs of mats laid out alike (servedRuns.ts), per block run r of the table the report
 * was evaluated from (geometry/blockRuns.ts): when `regular[r]` is 1, mat `firstMat[r]` + i is the block
 * at runs.start[r] + i, and it has as many sense-amplifier strips and as many drivers as mat firstMat[r],
 * each the one in the same place of mat firstMat[r]'s lists plus i. 0 promises nothing.
 */
export class RunLists {
  readonly regular: Uint8Array;
  readonly firstMat: Int32Array;

  constructor(runs: number) {
    this.regular = new Uint8Array(runs);
    this.firstMat = new Int32Array(runs);
  }
}

/** Id of mat k. */
export function matIdAt(mats: MatTable, k: number): string {
  return mats.blocks[mats.position[k] ?? -1]?.id ?? '';
}

/** Name of mat k as panels and findings show it: its name, or its id when it has none. */
export function matLabelAt(mats: MatTable, k: number): string {
  const block = mats.blocks[mats.position[k] ?? -1];
  return block?.name || block?.id || '';
}

/** The figures of mat k. */
export function figuresAt(mats: MatTable, k: number): MatFigures {
  const figures = mats.figures[mats.figureIndex[k] ?? -1];
  if (!figures) throw new Error(`no mat ${k} in a report of ${mats.count}`);
  return figures;
}

/** The report of mat k as one object. */
export function matAt(mats: MatTable, k: number): MatReport {
  const block = mats.blocks[mats.position[k] ?? -1];
  return {
    matId: block?.id ?? '',
    name: block?.name ?? '',
    unsensedBitlines: mats.unsensedBitlines[k] ?? 0,
    undrivenWordlines: mats.undrivenWordlines[k] ?? 0,
    figures: figuresAt(mats, k),
  };
}

const indexById = new WeakMap<MatTable, ReadonlyMap<string, number>>();

/**
 * Lets `next` answer {@link matIndexOf} with the map `previous` built (or builds it first): for a table of
 * the same mats under the same ids in the same order, as an edit in place leaves it.
 */
export function shareIdIndex(previous: MatTable, next: MatTable): void {
  if (previous.count !== next.count) return;
  matIndexOf(previous, '');
  const index = indexById.get(previous);
  if (index) indexById.set(next, index);
}

/** Index of the mat with this id, or −1; the lookup map is built once per table. */
export function matIndexOf(mats: MatTable, id: string): number {
  let index = indexById.get(mats);
  if (!index) {
    const map = new Map<string, number>();
    for (let k = 0; k < mats.count; k++) map.set(matIdAt(mats, k), k);
    indexById.set(mats, map);
    index = map;
  }
  return index.get(id) ?? -1;
}

/**
 * A finished table as a class, so that it keeps one shape from call to call (see geometry/blockTable.ts,
 * TableRows): the layout checks and totals read it in their hot loops.
 */
class FilledMatTable implements MatTable {
  constructor(
    readonly count: number,
    readonly blocks: readonly Block[],
    readonly position: Int32Array,
    readonly figureIndex: Int32Array,
    readonly figures: readonly MatFigures[],
    readonly unsensedBitlines: Float64Array,
    readonly undrivenWordlines: Int32Array,
    readonly servingPositions: Int32Array,
    readonly servingOffsets: Int32Array,
    readonly runLists: RunLists | null,
  ) {}
}

/**
 * The serving strips of a table's mats while it is filled: mat k's sense amplifiers are
 * `positions[offsets[3k]]` … before `offsets[3k + 1]`, its drivers from there to before `offsets[3k + 2]`;
 * `used` positions are filled. A whole-die pass may write them itself (servedRuns.ts), keeping `used`.
 */
export class ServingLists {
  positions: Int32Array;
  used = 0;
  readonly offsets: Int32Array;

  constructor(count: number) {
    // A tiled mat has two sense-amplifier strips and two drivers; the list grows if a design has more.
    this.positions = new Int32Array(Math.max(16, 4 * count));
    this.offsets = new Int32Array(3 * count);
  }

  /** The positions list, with room for `extra` more after the used ones. */
  room(extra: number): Int32Array {
    if (this.used + extra > this.positions.length) {
      const bigger = new Int32Array(Math.max(this.used + extra, 2 * this.positions.length));
      bigger.set(this.positions);
      this.positions = bigger;
    }
    return this.positions;
  }

  /** Records mat k's serving strips: the first `senseAmpCount` of `senseAmps`, then the first `driverCount` of `drivers`. */
  set(
    k: number,
    senseAmps: Int32Array,
    senseAmpCount: number,
    drivers: Int32Array,
    driverCount: number,
  ): void {
    const positions = this.room(senseAmpCount + driverCount);
    let used = this.used;
    this.offsets[3 * k] = used;
    for (let s = 0; s < senseAmpCount; s++) positions[used++] = senseAmps[s] as number;
    this.offsets[3 * k + 1] = used;
    for (let d = 0; d < driverCount; d++) positions[used++] = drivers[d] as number;
    this.offsets[3 * k + 2] = used;
    this.used = used;
  }
}

/**
 * Fills a mat table: a whole die at once (evaluate.ts), or mat by mat in any order and by copying mats of
 * an earlier table over the same blocks (the edit path, matEvaluation.ts).
 */
export class MatTableBuilder {
  // Columns the edit path (matEvaluation.ts setMat, copyMat) fills mat by mat too.
  readonly position: Int32Array;
  readonly figureIndex: Int32Array;
  private readonly figures: MatFigures[];
  private readonly figureIndexOf: Map<MatFigures, number>;
  readonly unsensed: Float64Array;
  readonly undriven: Int32Array;
  /** The mats' serving strips. */
  readonly serving: ServingLists;
  /** Set by a connection pass that works by runs (servedRuns.ts). */
  runLists: RunLists | null = null;
  private lastFigures: MatFigures | null = null;
  private lastIndex = -1;

  constructor(
    private readonly blocks: readonly Block[],
    private readonly count: number,
    /** Figures of an earlier table whose mats will be copied, so that their indices stay valid. */
    earlierFigures: readonly MatFigures[] = [],
  ) {
    this.position = new Int32Array(count);
    this.figureIndex = new Int32Array(count);
    this.figures = earlierFigures.slice();
    this.figureIndexOf = new Map(this.figures.map((f, i) => [f, i]));
    this.unsensed = new Float64Array(count);
    this.undriven = new Int32Array(count);
    this.serving = new ServingLists(count);
  }

  /**
   * Records the design position and unserved lines of mats 0 … count − 1 at once (columns of at least
   * `count`); their figures follow with {@link setFigures}.
   */
  setLines(count: number, position: Int32Array, unsensed: Float64Array, undriven: Float64Array): void {
    this.position.set(position.subarray(0, count));
    this.unsensed.set(unsensed.subarray(0, count));
    this.undriven.set(undriven.subarray(0, count));
  }

  /** Gives mats from … to − 1 (whose lines are recorded) these figures, as {@link set} would one by one. */
  setFigures(from: number, to: number, figures: MatFigures): void {
    this.figureIndex.fill(this.indexOfFigures(figures), from, to);
  }

  /** The index of `figures` in the table's list, added when new. */
  indexOfFigures(figures: MatFigures): number {
    // Mats in a row nearly always share their figures: the last answer saves a map lookup per mat.
    let index = figures === this.lastFigures ? this.lastIndex : this.figureIndexOf.get(figures);
    if (index === undefined) {
      index = this.figures.length;
      this.figures.push(figures);
      this.figureIndexOf.set(figures, index);
    }
    this.lastFigures = figures;
    this.lastIndex = index;
    return index;
  }

  /** Records mat k's serving strips: the first `senseAmpCount` of `senseAmps`, then the first `driverCount` of `drivers` (design positions). */
  setServing(
    k: number,
    senseAmps: Int32Array,
    senseAmpCount: number,
    drivers: Int32Array,
    driverCount: number,
  ): void {
    this.serving.set(k, senseAmps, senseAmpCount, drivers, driverCount);
  }

  finish(): MatTable {
    return new FilledMatTable(
      this.count,
      this.blocks,
      this.position,
      this.figureIndex,
      this.figures,
      this.unsensed,
      this.undriven,
      this.serving.positions.subarray(0, this.serving.used),
      this.serving.offsets,
      this.runLists,
    );
  }
}
