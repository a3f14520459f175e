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
 * die of tens of thousands of strips is one sort, not a comparison of every pair.
 */
export function backToBackStripFindings(table: BlockTable, mats: MatTable): Finding[] {
  const findings: Finding[] = [];
  const facing = servedEdgeOrientation(table, mats);
  for (const code of [SENSE_AMP_STRIP_CODE, WORDLINE_DRIVER_STRIP_CODE]) {
    const pairs = pairsOfType(table, code, facing);
    if (pairs.length === 0) continue;
    const blocks = table.blocks;
    const label = (i: number) => blocks[i]?.name || blocks[i]?.id || '';
    const named = pairs
      .slice(0, NAMED_PAIRS)
      .map(([a, b]) => `${label(a)} and ${label(b)}`)
      .join('; ');
    const ids = new Set<string>();
    for (const [a, b] of pairs) {
      ids.add(blocks[a]?.id ?? '');
      ids.add(blocks[b]?.id ?? '');
    }
    const kind = blocks[pairs[0]?.[0] ?? 0]?.type ?? 'senseAmpStrip';
    const count = pairs.length === 1 ? '' : `${pairs.length} pairs: `;
    findings.push({
      kind: 'backToBackStrips',
      severity: 'warning',
      blockIds: [...ids],
      message:
        `${count}${named}${pairs.length > NAMED_PAIRS ? '; …' : ''} are ${BLOCK_TYPE_LABEL[kind]}s back to back; ` +
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

/** Every back-to-back pair of serving strips of type `code`, the upper or left strip first. */
function pairsOfType(table: BlockTable, code: number, facing: Uint8Array): [number, number][] {
  const lying: number[] = [];
  const standing: number[] = [];
  for (let i = 0; i < table.count; i++) {
    if (table.type[i] !== code || facing[i] === UNSERVING) continue;
    if (facing[i] === ALONG_HORIZONTAL_EDGE) lying.push(i);
    else standing.push(i);
  }
  return [
    ...facingPairs(lying, table.y, table.height, table.x, table.width),
    ...facingPairs(standing, table.x, table.width, table.y, table.height),
  ];
}

/**
 * Pairs among `strips` where one's far edge (start + size across) meets the other's near edge and they
 * overlap along the strip by more than the tolerance.
 */
function facingPairs(
  strips: number[],
  across: Float64Array,
  thickness: Float64Array,
  along: Float64Array,
  length: Float64Array,
): [number, number][] {
  if (strips.length < 2) return [];
  const byStart = strips.slice().sort((a, b) => (across[a] as number) - (across[b] as number));
  const starts = Float64Array.from(byStart, (i) => across[i] as number);
  const pairs: [number, number][] = [];
  for (const i of strips) {
    const edge = (across[i] as number) + (thickness[i] as number);
    let lo = lowerBound(starts, edge - ABUTMENT_TOLERANCE);
    for (; lo < starts.length && (starts[lo] as number) <= edge + ABUTMENT_TOLERANCE; lo++) {
      const j = byStart[lo] as number;
      if (j === i) continue;
      const overlap =
        Math.min((along[i] as number) + (length[i] as number), (along[j] as number) + (length[j] as number)) -
        Math.max(along[i] as number, along[j] as number);
      if (overlap > ABUTMENT_TOLERANCE) pairs.push([i, j]);
    }
  }
  return pairs;
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
