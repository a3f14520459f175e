import type { Block } from '../../../src/model/block';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import type { MatFigures } from '../../../src/engine/evaluation/report';

/** The mat table builder as it was before the mat loop became one pass (src/engine/evaluation/matTable.ts). */

class OracleFilledMatTable implements MatTable {
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
  ) {}
}

/** Fills a mat table, mat by mat in any order, or by copying mats of an earlier table over the same blocks. */
export class OracleMatTableBuilder {
  private readonly position: Int32Array;
  private readonly figureIndex: Int32Array;
  private readonly figures: MatFigures[];
  private readonly figureIndexOf: Map<MatFigures, number>;
  private readonly unsensed: Float64Array;
  private readonly undriven: Int32Array;
  private servingPositions: Int32Array;
  private servingUsed = 0;
  private readonly servingOffsets: Int32Array;
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
    // A tiled mat has two sense-amplifier strips and two drivers; the list grows if a design has more.
    this.servingPositions = new Int32Array(Math.max(16, 4 * count));
    this.servingOffsets = new Int32Array(3 * count);
  }

  /** Records mat k: design position, figures, unserved lines. */
  set(k: number, position: number, figures: MatFigures, unsensed: number, undriven: number): void {
    this.position[k] = position;
    // Mats in a row nearly always share their figures: the last answer saves a map lookup per mat.
    let index = figures === this.lastFigures ? this.lastIndex : this.figureIndexOf.get(figures);
    if (index === undefined) {
      index = this.figures.length;
      this.figures.push(figures);
      this.figureIndexOf.set(figures, index);
    }
    this.lastFigures = figures;
    this.lastIndex = index;
    this.figureIndex[k] = index;
    this.unsensed[k] = unsensed;
    this.undriven[k] = undriven;
  }

  /** Records mat k's serving strips: the first `senseAmpCount` of `senseAmps`, then the first `driverCount` of `drivers` (design positions). */
  setServing(
    k: number,
    senseAmps: Int32Array,
    senseAmpCount: number,
    drivers: Int32Array,
    driverCount: number,
  ): void {
    this.servingOffsets[3 * k] = this.servingUsed;
    for (let s = 0; s < senseAmpCount; s++) this.appendServing(senseAmps[s] as number);
    this.servingOffsets[3 * k + 1] = this.servingUsed;
    for (let d = 0; d < driverCount; d++) this.appendServing(drivers[d] as number);
    this.servingOffsets[3 * k + 2] = this.servingUsed;
  }

  /**
   * Records mat k as mat k of `earlier`, a table over the same blocks built with `earlierFigures`, or with
   * other figures (computed for other design-wide values) and the same position, lines and strips.
   */
  copy(k: number, earlier: MatTable, figures?: MatFigures): void {
    if (figures) {
      this.set(
        k,
        earlier.position[k] ?? 0,
        figures,
        earlier.unsensedBitlines[k] ?? 0,
        earlier.undrivenWordlines[k] ?? 0,
      );
    } else {
      this.position[k] = earlier.position[k] ?? 0;
      this.figureIndex[k] = earlier.figureIndex[k] ?? 0;
      this.unsensed[k] = earlier.unsensedBitlines[k] ?? 0;
      this.undriven[k] = earlier.undrivenWordlines[k] ?? 0;
    }
    const a = earlier.servingOffsets[3 * k] ?? 0;
    const b = earlier.servingOffsets[3 * k + 1] ?? 0;
    const c = earlier.servingOffsets[3 * k + 2] ?? 0;
    this.servingOffsets[3 * k] = this.servingUsed;
    for (let p = a; p < b; p++) this.appendServing(earlier.servingPositions[p] as number);
    this.servingOffsets[3 * k + 1] = this.servingUsed;
    for (let p = b; p < c; p++) this.appendServing(earlier.servingPositions[p] as number);
    this.servingOffsets[3 * k + 2] = this.servingUsed;
  }

  finish(): MatTable {
    return new OracleFilledMatTable(
      this.count,
      this.blocks,
      this.position,
      this.figureIndex,
      this.figures,
      this.unsensed,
      this.undriven,
      this.servingPositions.subarray(0, this.servingUsed),
      this.servingOffsets,
    );
  }

  private appendServing(position: number): void {
    if (this.servingUsed === this.servingPositions.length) {
      const bigger = new Int32Array(2 * this.servingPositions.length);
      bigger.set(this.servingPositions);
      this.servingPositions = bigger;
    }
    this.servingPositions[this.servingUsed++] = position;
  }
}
