import {
  kindAt,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../../src/geometry/blockTable';
import { ABUTMENT_TOLERANCE } from '../../../src/geometry/rect';
import { BLOCK_TYPE_LABEL } from '../../../src/model/blockBasics';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import type { Finding } from '../../../src/engine/evaluation/report';

/** Pairs named in a finding's message; its block ids name them all. */
const NAMED_PAIRS = 3;

/**
 * Strips of one kind laid along each other's long side: a sense-amplifier strip against another
 * sense-amplifier strip, or a driver strip against another driver strip. Between two mats that is what
 * copying a mat with its own strips gives, and one strip shared by both mats serves the same lines in
 * half the area (the partition builder shares them). Strips meeting end to end are fine (two strips may
 * cover one mat edge between them). Common practice (no source).
 *
 * Found by sorting: each strip's far long edge is looked up among the near long edges of the others, so a
 * die of tens of thousands of strips is one native sort of numbers, not a comparison of every pair.
 */
export function backToBackStrips(table: BlockTable, mats: MatTable): BackToBackState {
  const facing = servedEdgeOrientation(table, mats);
  const pairs = STRIP_CODES.map((code) => pairsOfType(table, code, facing).toArray());
  return { facing, pairs, findings: pairFindings(table, pairs) };
}

/** Strip types checked, in the order of their findings. */
const STRIP_CODES = [SENSE_AMP_STRIP_CODE, WORDLINE_DRIVER_STRIP_CODE] as const;

/** What the check leaves for the next edit: each strip's orientation and the pairs per strip type. */
export interface BackToBackState {
  readonly facing: Uint8Array;
  /** Per entry of {@link STRIP_CODES}: pairs as [first, second, …] table positions, in finding order. */
  readonly pairs: readonly Int32Array[];
  readonly findings: readonly Finding[];
}

function pairFindings(table: BlockTable, pairsByType: readonly Int32Array[]): Finding[] {
  const findings: Finding[] = [];
  for (const pairs of pairsByType) {
    const count = pairs.length / 2;
    if (count === 0) continue;
    const blocks = table.blocks;
    const label = (i: number) => blocks[i]?.name || blocks[i]?.id || '';
    const named: string[] = [];
    for (let n = 0; n < Math.min(NAMED_PAIRS, count); n++)
      named.push(`${label(pairs[2 * n] as number)} and ${label(pairs[2 * n + 1] as number)}`);
    const ids = new Set<string>();
    for (let n = 0; n < pairs.length; n++) ids.add(blocks[pairs[n] as number]?.id ?? '');
    const kind = blocks[pairs[0] as number]?.type ?? 'senseAmpStrip';
    const counted = count === 1 ? '' : `${count} pairs: `;
    findings.push({
      kind: 'backToBackStrips',
      severity: 'warning',
      blockIds: [...ids],
      message:
        `${counted}${named.join('; ')}${count > NAMED_PAIRS ? '; …' : ''} are ${BLOCK_TYPE_LABEL[kind]}s back to back; ` +
        'one strip shared by the mats on both sides serves the same lines in less area',
    });
  }
  return findings;
}

const UNSERVING = 0;
const ALONG_HORIZONTAL_EDGE = 1;
const ALONG_VERTICAL_EDGE = 2;

/**
 * For each block, the direction of the mat edge it serves: a strip along a top or bottom edge lies
 * across, one along a left or right edge stands. Strips serving no mat are left out: what lines they
 * would serve is unknown. A short piece of a strip may be taller than wide and still lie across.
 */
function servedEdgeOrientation(table: BlockTable, mats: MatTable): Uint8Array {
  const facing = new Uint8Array(table.count);
  for (let k = 0; k < mats.count; k++) {
    const vertical = kindAt(table, mats.position[k] as number).block.bitlineAxis === 'vertical';
    const a = mats.servingOffsets[3 * k] as number;
    const b = mats.servingOffsets[3 * k + 1] as number;
    const c = mats.servingOffsets[3 * k + 2] as number;
    for (let p = a; p < b; p++)
      facing[mats.servingPositions[p] as number] = vertical ? ALONG_HORIZONTAL_EDGE : ALONG_VERTICAL_EDGE;
    for (let p = b; p < c; p++)
      facing[mats.servingPositions[p] as number] = vertical ? ALONG_VERTICAL_EDGE : ALONG_HORIZONTAL_EDGE;
  }
  return facing;
}

/** Every back-to-back pair of serving strips of type `code`, the upper or left strip first, as [a, b] runs. */
function pairsOfType(table: BlockTable, code: number, facing: Uint8Array): PairList {
  let lyingCount = 0;
  let standingCount = 0;
  for (let i = 0; i < table.count; i++) {
    if (table.type[i] !== code || facing[i] === UNSERVING) continue;
    if (facing[i] === ALONG_HORIZONTAL_EDGE) lyingCount++;
    else standingCount++;
  }
  const lying = new Int32Array(lyingCount);
  const standing = new Int32Array(standingCount);
  for (let i = 0, l = 0, s = 0; i < table.count; i++) {
    if (table.type[i] !== code || facing[i] === UNSERVING) continue;
    if (facing[i] === ALONG_HORIZONTAL_EDGE) lying[l++] = i;
    else standing[s++] = i;
  }
  const pairs = new PairList();
  facingPairs(lying, table.y, table.height, table.x, table.width, pairs);
  facingPairs(standing, table.x, table.width, table.y, table.height, pairs);
  return pairs;
}

/** Pairs of table positions, two Int32 per pair, grown by doubling. */
class PairList {
  private data = new Int32Array(64);
  length = 0;

  push(a: number, b: number): void {
    if (2 * this.length + 2 > this.data.length) {
      const grown = new Int32Array(2 * this.data.length);
      grown.set(this.data);
      this.data = grown;
    }
    this.data[2 * this.length] = a;
    this.data[2 * this.length + 1] = b;
    this.length++;
  }

  /** The pairs as [first, second, …]. */
  toArray(): Int32Array {
    return this.data.slice(0, 2 * this.length);
  }
}

/**
 * Pairs among `strips` (ascending positions) where one's far edge (start + size across) meets the other's
 * near edge and they overlap along the strip by more than the tolerance, in the order: each strip in turn,
 * its partners by start across, then by position.
 *
 * The strips are bucketed by their distinct start values (a native numeric sort of the starts, then a
 * counting sort of the strips), so there is no comparison callback and no object per strip. A strip whose
 * start is not a number meets nothing and is left out.
 */
function facingPairs(
  strips: Int32Array,
  across: Float64Array,
  thickness: Float64Array,
  along: Float64Array,
  length: Float64Array,
  pairs: PairList,
): void {
  if (strips.length < 2) return;
  const starts = new Float64Array(strips.length);
  for (let s = 0; s < strips.length; s++) starts[s] = across[strips[s] as number] as number;
  const distinct = distinctSorted(starts);
  // Counting sort of the strips by the rank of their start; ranks ascend with position, so ties keep it.
  const rank = new Int32Array(strips.length);
  const bucket = new Int32Array(distinct.length + 1);
  let r = 0;
  for (let s = 0; s < strips.length; s++) {
    const start = starts[s] as number;
    // Strips of a tiled array come in rows whose starts repeat or step to the next value: try there first.
    r = start === start ? lowerBoundFrom(distinct, start, r) : -1;
    rank[s] = r;
    if (r >= 0) (bucket[r + 1] as number)++;
  }
  for (let r = 0; r < distinct.length; r++) bucket[r + 1] = (bucket[r + 1] as number) + (bucket[r] as number);
  const fill = bucket.slice(0, distinct.length);
  const byStart = new Int32Array(bucket[distinct.length] as number);
  for (let s = 0; s < strips.length; s++) {
    const r = rank[s] as number;
    if (r >= 0) byStart[(fill[r] as number)++] = strips[s] as number;
  }
  let first = 0;
  for (let s = 0; s < strips.length; s++) {
    const i = strips[s] as number;
    const edge = (across[i] as number) + (thickness[i] as number);
    const alongStart = along[i] as number;
    const alongEnd = alongStart + (length[i] as number);
    first = lowerBoundFrom(distinct, edge - ABUTMENT_TOLERANCE, first);
    for (let r = first; r < distinct.length; r++) {
      if (!((distinct[r] as number) <= edge + ABUTMENT_TOLERANCE)) break;
      for (let q = bucket[r] as number; q < (bucket[r + 1] as number); q++) {
        const j = byStart[q] as number;
        if (j === i) continue;
        const overlap =
          Math.min(alongEnd, (along[j] as number) + (length[j] as number)) -
          Math.max(alongStart, along[j] as number);
        if (overlap > ABUTMENT_TOLERANCE) pairs.push(i, j);
      }
    }
  }
}

/** The distinct numbers among `values` (NaN left out), ascending. */
function distinctSorted(values: Float64Array): Float64Array {
  const sorted = values.slice().sort();
  let n = 0;
  for (let s = 0; s < sorted.length; s++) {
    const v = sorted[s] as number;
    if (v !== v) break; // NaN sorts last
    if (n === 0 || v !== sorted[n - 1]) sorted[n++] = v;
  }
  return sorted.subarray(0, n);
}

/**
 * {@link lowerBound}, checking `guess` and `guess + 1` before searching: the same answer, found without a
 * search when consecutive lookups land on the same or the next value.
 */
function lowerBoundFrom(values: Float64Array, value: number, guess: number): number {
  const n = values.length;
  for (let g = guess < 0 ? 0 : guess; g <= guess + 1 && g <= n; g++) {
    if ((g === 0 || (values[g - 1] as number) < value) && (g === n || !((values[g] as number) < value)))
      return g;
  }
  return lowerBound(values, value);
}

/** First index whose value is ≥ `value` in an ascending array. */
function lowerBound(values: Float64Array, value: number): number {
  let lo = 0;
  let hi = values.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((values[mid] as number) < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
