import type { MatTable } from './matTable';

/** Which rows of a mat's serving list a path follows: the sense-amplifier part (0) or the driver part (1). */
export type ServingPart = 0 | 1;

/** Past this many strips listed again beside the table-wide list, the list is built again. */
export const MOST_PATCHED = 4096;

/**
 * Which mats (report indices, ascending) each block serves in one part of the mats' serving lists. The
 * report lists strips per mat; this turns it around once for the whole table, and after an edit lists
 * only the strips the edit touched again, beside the table-wide list.
 */
export class ServedMats {
  constructor(
    /** Block i's mats are `list[start[i]]` … `list[start[i + 1] − 1]`, unless it has a patched list. */
    readonly start: Int32Array,
    readonly list: Int32Array,
    /** The lists edits wrote, by block (see layoutAfterEdit.ts servedAfterEdit). */
    readonly patched: ReadonlyMap<number, Int32Array>,
  ) {}

  /**
   * The list an edit wrote for block `i`, or undefined when its mats are still those of {@link start} and
   * {@link list}. Hot loops read those two directly: a view per block would allocate.
   */
  patchedMats(i: number): Int32Array | undefined {
    return this.patched.size === 0 ? undefined : this.patched.get(i);
  }

  /** Counts, then fills, per block: two passes over the serving lists. */
  static of(tableCount: number, mats: MatTable, part: ServingPart): ServedMats {
    const { servingOffsets, servingPositions } = mats;
    const start = new Int32Array(tableCount + 1);
    for (let k = 0; k < mats.count; k++) {
      const to = servingOffsets[3 * k + part + 1] as number;
      for (let p = servingOffsets[3 * k + part] as number; p < to; p++)
        (start[(servingPositions[p] as number) + 1] as number)++;
    }
    for (let i = 0; i < tableCount; i++) start[i + 1] = (start[i + 1] as number) + (start[i] as number);
    const fill = start.slice(0, tableCount);
    const list = new Int32Array(start[tableCount] as number);
    for (let k = 0; k < mats.count; k++) {
      const to = servingOffsets[3 * k + part + 1] as number;
      for (let p = servingOffsets[3 * k + part] as number; p < to; p++)
        list[(fill[servingPositions[p] as number] as number)++] = k;
    }
    return new ServedMats(start, list, new Map());
  }

  /** The mats block `i` serves, ascending. */
  mats(i: number): Int32Array {
    return this.patched.get(i) ?? this.list.subarray(this.start[i] as number, this.start[i + 1] as number);
  }
}

/** The positions of one component, and whether a decoder's lines enter it there. */
interface Component {
  readonly members: Int32Array;
  readonly seeded: boolean;
}

/**
 * Mats and the blocks serving them (one part of the serving lists) split into connected components: a
 * decoder reaches every mat of a component that holds one of its seeds, and none outside. Kept with the
 * report, so that an edit labels again only the components it touched.
 */
export interface ReachComponents {
  readonly part: ServingPart;
  readonly served: ServedMats;
  /** Per table position: 1 where a decoder's lines enter (the decoder, a strip against it, a mat end). */
  readonly seed: Uint8Array;
  /** Per table position: its component, or −1 for a block no mat lists. */
  readonly label: Int32Array;
  readonly components: readonly (Component | undefined)[];
  /** How many components the last full labelling made; past that plus {@link MOST_PATCHED}, label again. */
  readonly built: number;
}

/** Mats (report indices) in components with a seed, as 1, others 0. */
export function reachedMats(reach: ReachComponents, mats: MatTable): Uint8Array {
  const reached = new Uint8Array(mats.count);
  for (let k = 0; k < mats.count; k++) reached[k] = isReached(reach, mats.position[k] as number) ? 1 : 0;
  return reached;
}

/** True when the block at table position `i` lies in a component a decoder reaches. */
export function isReached(reach: ReachComponents, i: number): boolean {
  const l = reach.label[i] as number;
  return l >= 0 && reach.components[l]?.seeded === true;
}

/** Scratch for the breadth-first walks, as long as the largest table walked so far. */
let queue = new Int32Array(1024);

/**
 * Labels the component of table position `from` (a mat) with `labelNo`: breadth-first from a mat to the
 * blocks its serving list names, from a block to the mats it serves.
 */
export function walk(
  from: number,
  labelNo: number,
  label: Int32Array,
  seed: Uint8Array,
  mats: MatTable,
  matIndexAt: Int32Array,
  served: ServedMats,
  part: ServingPart,
): Component {
  // A walk labels each block once, so the queue never holds more than the table: no growth checks below,
  // and no helper called per block (the first evaluations run before V8 has compiled anything).
  if (queue.length < label.length) queue = new Int32Array(label.length);
  const q = queue;
  let head = 0;
  let tail = 0;
  let seeded = false;
  label[from] = labelNo;
  q[tail++] = from;
  const { servingOffsets, servingPositions, position } = mats;
  while (head < tail) {
    const i = q[head++] as number;
    if (seed[i] !== 0) seeded = true;
    const k = matIndexAt[i] as number;
    if (k >= 0) {
      const to = servingOffsets[3 * k + part + 1] as number;
      for (let p = servingOffsets[3 * k + part] as number; p < to; p++) {
        const s = servingPositions[p] as number;
        if (label[s] === labelNo) continue;
        label[s] = labelNo;
        q[tail++] = s;
      }
    } else {
      // The block's mats: its patched list after an edit, else its stretch of the table-wide list.
      const patched = served.patchedMats(i);
      const list = patched ?? served.list;
      const to = patched ? patched.length : (served.start[i + 1] as number);
      for (let n = patched ? 0 : (served.start[i] as number); n < to; n++) {
        const m = position[list[n] as number] as number;
        if (label[m] === labelNo) continue;
        label[m] = labelNo;
        q[tail++] = m;
      }
    }
  }
  return { members: q.slice(0, tail), seeded };
}

/** Labels every mat's component from scratch. `seed` is per table position. */
export function reachComponents(
  mats: MatTable,
  matIndexAt: Int32Array,
  part: ServingPart,
  seed: Uint8Array,
): ReachComponents {
  const served = ServedMats.of(matIndexAt.length, mats, part);
  const label = new Int32Array(matIndexAt.length).fill(-1);
  const components: Component[] = [];
  for (let k = 0; k < mats.count; k++) {
    const at = mats.position[k] as number;
    if ((label[at] as number) < 0)
      components.push(walk(at, components.length, label, seed, mats, matIndexAt, served, part));
  }
  return { part, served, seed, label, components, built: components.length };
}

/**
 * {@link reachComponents} labelled on first use. A whole evaluation needs only which mats a decoder reaches
 * (see servingForest.ts); the components block by block, and the served lists behind them, are what an
 * edit starts from, so the report keeps the inputs and labels them when the first edit asks.
 */
export class ComponentsOnDemand implements ReachComponents {
  private labelled: ReachComponents | null = null;

  constructor(
    readonly part: ServingPart,
    readonly seed: Uint8Array,
    private readonly mats: MatTable,
    private readonly matIndexAt: Int32Array,
  ) {}

  /** The components, labelled now if no edit has asked yet (the app does it in idle time). */
  labelNow(): ReachComponents {
    if (this.labelled === null)
      this.labelled = reachComponents(this.mats, this.matIndexAt, this.part, this.seed);
    return this.labelled;
  }

  /** True once the components are labelled. */
  get isLabelled(): boolean {
    return this.labelled !== null;
  }

  get served(): ServedMats {
    return this.labelNow().served;
  }

  get label(): Int32Array {
    return this.labelNow().label;
  }

  get components(): readonly (Component | undefined)[] {
    return this.labelNow().components;
  }

  get built(): number {
    return this.labelNow().built;
  }
}

/** What an edit in place changed, as the layout checks need it. */
export interface LayoutEdit {
  /** Table positions of the blocks the edit replaced. */
  readonly changed: readonly number[];
  /** Mats (report indices) evaluated again: every mat whose serving lists may differ. */
  readonly redone: ReadonlySet<number>;
  /** For each table position, the index of its mat in the report, or −1 (the same before and after). */
  readonly matIndexAt: Int32Array;
}
