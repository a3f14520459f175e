/**
 * Which strips serve each mat of a report, stored column-wise: one list of ids for the whole report and
 * three offsets per mat. Mat k (its index in `report.mats`) is sensed by the strips
 * `ids[senseAmpStart[k]]` … `ids[driverStart[k] − 1]` and driven by `ids[driverStart[k]]` …
 * `ids[end[k] − 1]`, each group in the order its neighbours were found (ascending design position).
 *
 * Why not two arrays on every mat report: a 65,536-mat die would carry 131,072 small arrays that the
 * garbage collector copies and traces for as long as the report lives; one list costs a single object.
 */
export interface ServingStrips {
  readonly ids: readonly string[];
  readonly senseAmpStart: Int32Array;
  readonly driverStart: Int32Array;
  readonly end: Int32Array;
}

/** Ids of the sense-amplifier strips abutting mat k's bit-line ends. */
export function senseAmpStripIdsOf(serving: ServingStrips, k: number): string[] {
  return serving.ids.slice(serving.senseAmpStart[k] ?? 0, serving.driverStart[k] ?? 0);
}

/** Ids of the driver strips or row decoders abutting mat k's word-line ends. */
export function wordlineDriverIdsOf(serving: ServingStrips, k: number): string[] {
  return serving.ids.slice(serving.driverStart[k] ?? 0, serving.end[k] ?? 0);
}

/** Collects the serving strips of a report's mats, in any order of mats. */
export class ServingStripsBuilder {
  private readonly ids: string[];
  private used = 0;
  private readonly senseAmpStart: Int32Array;
  private readonly driverStart: Int32Array;
  private readonly end: Int32Array;

  constructor(matCount: number) {
    // A tiled mat has two sense-amplifier strips and two drivers; the list grows if a design has more.
    this.ids = new Array<string>(4 * matCount);
    this.senseAmpStart = new Int32Array(matCount);
    this.driverStart = new Int32Array(matCount);
    this.end = new Int32Array(matCount);
  }

  /** Records mat k's strips: the first `senseAmpCount` of `senseAmpIds`, then the first `driverCount` of `driverIds`. */
  set(
    k: number,
    senseAmpIds: readonly string[],
    senseAmpCount: number,
    driverIds: readonly string[],
    driverCount: number,
  ): void {
    this.senseAmpStart[k] = this.used;
    for (let s = 0; s < senseAmpCount; s++) this.append(senseAmpIds[s] as string);
    this.driverStart[k] = this.used;
    for (let d = 0; d < driverCount; d++) this.append(driverIds[d] as string);
    this.end[k] = this.used;
  }

  /** Records mat k's strips as another report lists them for its mat `from`. */
  copy(k: number, other: ServingStrips, from: number): void {
    const a = other.senseAmpStart[from] ?? 0;
    const b = other.driverStart[from] ?? 0;
    const c = other.end[from] ?? 0;
    this.senseAmpStart[k] = this.used;
    for (let s = a; s < b; s++) this.append(other.ids[s] as string);
    this.driverStart[k] = this.used;
    for (let d = b; d < c; d++) this.append(other.ids[d] as string);
    this.end[k] = this.used;
  }

  finish(): ServingStrips {
    this.ids.length = this.used;
    return { ids: this.ids, senseAmpStart: this.senseAmpStart, driverStart: this.driverStart, end: this.end };
  }

  private append(id: string): void {
    if (this.used < this.ids.length) this.ids[this.used] = id;
    else this.ids.push(id);
    this.used++;
  }
}
