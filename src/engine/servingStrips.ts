import type { Block } from '../model/block';

/**
 * Which strips serve each mat of a report, stored column-wise: the design positions of all serving strips
 * in one typed list, and three offsets per mat. Mat k (its index in `report.mats`) is sensed by the blocks
 * at `positions[offsets[3k]]` … `positions[offsets[3k + 1]] − 1` and driven by those up to
 * `offsets[3k + 2] − 1`, each group in the order its neighbours were found (ascending design position).
 *
 * Why not two arrays of ids on every mat report: a 65,536-mat die would carry 131,072 small arrays that
 * the garbage collector copies and traces for as long as the report lives, and even one list of ids as
 * long as four per mat is a large object that the heap must map afresh on every evaluation.
 */
export interface ServingStrips {
  /** The evaluated design's blocks, in design order. */
  readonly blocks: readonly Block[];
  readonly positions: Int32Array;
  readonly offsets: Int32Array;
}

function idsBetween(serving: ServingStrips, from: number, to: number): string[] {
  const ids = new Array<string>(Math.max(0, to - from));
  for (let p = from; p < to; p++) ids[p - from] = serving.blocks[serving.positions[p] ?? -1]?.id ?? '';
  return ids;
}

/** Ids of the sense-amplifier strips abutting mat k's bit-line ends. */
export function senseAmpStripIdsOf(serving: ServingStrips, k: number): string[] {
  return idsBetween(serving, serving.offsets[3 * k] ?? 0, serving.offsets[3 * k + 1] ?? 0);
}

/** Ids of the driver strips or row decoders abutting mat k's word-line ends. */
export function wordlineDriverIdsOf(serving: ServingStrips, k: number): string[] {
  return idsBetween(serving, serving.offsets[3 * k + 1] ?? 0, serving.offsets[3 * k + 2] ?? 0);
}

/** Collects the serving strips of a report's mats, in any order of mats. */
export class ServingStripsBuilder {
  private positions: Int32Array;
  private used = 0;
  private readonly offsets: Int32Array;

  constructor(
    private readonly blocks: readonly Block[],
    matCount: number,
  ) {
    // A tiled mat has two sense-amplifier strips and two drivers; the list grows if a design has more.
    this.positions = new Int32Array(Math.max(16, 4 * matCount));
    this.offsets = new Int32Array(3 * matCount);
  }

  /** Records mat k's strips: the first `senseAmpCount` of `senseAmps`, then the first `driverCount` of `drivers` (design positions). */
  set(
    k: number,
    senseAmps: Int32Array,
    senseAmpCount: number,
    drivers: Int32Array,
    driverCount: number,
  ): void {
    this.offsets[3 * k] = this.used;
    for (let s = 0; s < senseAmpCount; s++) this.append(senseAmps[s] as number);
    this.offsets[3 * k + 1] = this.used;
    for (let d = 0; d < driverCount; d++) this.append(drivers[d] as number);
    this.offsets[3 * k + 2] = this.used;
  }

  /** Records mat k's strips as another report over the same blocks lists them for its mat `from`. */
  copy(k: number, other: ServingStrips, from: number): void {
    const a = other.offsets[3 * from] ?? 0;
    const b = other.offsets[3 * from + 1] ?? 0;
    const c = other.offsets[3 * from + 2] ?? 0;
    this.offsets[3 * k] = this.used;
    for (let p = a; p < b; p++) this.append(other.positions[p] as number);
    this.offsets[3 * k + 1] = this.used;
    for (let p = b; p < c; p++) this.append(other.positions[p] as number);
    this.offsets[3 * k + 2] = this.used;
  }

  finish(): ServingStrips {
    return { blocks: this.blocks, positions: this.positions.subarray(0, this.used), offsets: this.offsets };
  }

  private append(position: number): void {
    if (this.used === this.positions.length) {
      const bigger = new Int32Array(2 * this.positions.length);
      bigger.set(this.positions);
      this.positions = bigger;
    }
    this.positions[this.used++] = position;
  }
}
