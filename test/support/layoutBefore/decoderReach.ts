import { abutmentSpan, type Side } from '../../../src/geometry/abutment';
import {
  BLOCK_TYPE_CODES,
  kindAt,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../../src/geometry/blockTable';
import { bitlineEndSides } from '../../../src/geometry/stripFit';
import { DecoderEdges } from './decoderEdges';
import { groupLabel } from '../../../src/engine/evaluation/findingText';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import {
  isReached,
  reachComponents,
  reachedMats,
  type ReachComponents,
  type ServingPart,
} from './reachComponents';
import type { Finding } from '../../../src/engine/evaluation/report';

const ROW_DECODER = BLOCK_TYPE_CODES.indexOf('rowDecoder');
const COLUMN_DECODER = BLOCK_TYPE_CODES.indexOf('columnDecoder');
const ALL_SIDES: readonly Side[] = ['top', 'bottom', 'left', 'right'];
const scratch = new Float64Array(2);

/** True when boxes i and j share a stretch of edge on any side of i. */
function abutting(table: BlockTable, i: number, j: number): boolean {
  for (const side of ALL_SIDES) if (abutmentSpan(table, i, j, side, scratch, 0)) return true;
  return false;
}

/**
 * Where the lines of decoders of type `decoderCode` enter the stack of mats and strips, per table position:
 * the decoders themselves, the strips of type `stripCode` abutting one, and (for column decoders) mats
 * with a bit-line end against one. Found by binary search on the decoders' sorted edges, one pass in all.
 */
export function reachSeeds(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges | null,
  decoderCode: number,
  stripCode: number,
): Uint8Array {
  const seed = new Uint8Array(table.count);
  if (edges === null) return seed;
  for (let i = 0; i < table.count; i++) {
    const type = table.type[i];
    if (type === decoderCode) seed[i] = 1;
    else if (
      (type === stripCode || (decoderCode === COLUMN_DECODER && (matIndexAt[i] as number) >= 0)) &&
      edges.mayAbut(table, i)
    )
      seed[i] = seedAt(table, matIndexAt, edges, i, decoderCode, stripCode) ? 1 : 0;
  }
  return seed;
}

/** True when the block at table position `i` is a seed of {@link reachSeeds}. */
export function seedAt(
  table: BlockTable,
  matIndexAt: Int32Array,
  edges: DecoderEdges | null,
  i: number,
  decoderCode: number,
  stripCode: number,
): boolean {
  if (edges === null) return false;
  const type = table.type[i];
  if (type === decoderCode) return true;
  const isStrip = type === stripCode;
  if (!isStrip && !(decoderCode === COLUMN_DECODER && (matIndexAt[i] as number) >= 0)) return false;
  const found = edges.near(table, i);
  const candidates = edges.candidates;
  for (let c = 0; c < found; c++) {
    const d = candidates[c] as number;
    if (isStrip) {
      if (abutting(table, d, i)) return true;
      continue;
    }
    for (const side of bitlineEndSides(kindAt(table, i).block.bitlineAxis))
      if (abutmentSpan(table, i, d, side, scratch, 0)) return true;
  }
  return false;
}

/** For each table position, the index of its mat in the report, or −1. */
export function matIndexByPosition(mats: MatTable, count: number): Int32Array {
  const index = new Int32Array(count).fill(-1);
  for (let k = 0; k < mats.count; k++) index[mats.position[k] as number] = k;
  return index;
}

/**
 * Mats (by report index) that a decoder of type `decoderCode` reaches through the strips that serve them:
 * a decoder abutting a serving strip reaches every mat that strip serves, each of those mats reaches the
 * other strips serving it, and so on (a global word line crosses every mat and driver strip of its row; a
 * column-select line every mat and sense-amplifier strip of its column). A mat whose serving list holds the
 * decoder itself (a row decoder driving a small mat directly) is reached too, and so is a mat with a bit-line
 * end against a column decoder. Common practice (no source): the decoder's lines run along the stack of
 * mats and strips it sits beside.
 */
export function matsReachedBy(
  table: BlockTable,
  mats: MatTable,
  decoderCode: number,
  stripCode: number,
  part: ServingPart,
): Uint8Array {
  const matIndexAt = matIndexByPosition(mats, table.count);
  const seed = reachSeeds(table, matIndexAt, DecoderEdges.of(table, decoderCode), decoderCode, stripCode);
  return reachedMats(reachComponents(mats, matIndexAt, part, seed), mats);
}

/** One of the two reach checks: which decoders, along which strips and part of the serving lists. */
interface ReachCheck {
  readonly decoderCode: number;
  readonly stripCode: number;
  readonly part: ServingPart;
  readonly kind: Finding['kind'];
  readonly detail: string;
}

const REACH_CHECKS: readonly ReachCheck[] = [
  {
    decoderCode: ROW_DECODER,
    stripCode: WORDLINE_DRIVER_STRIP_CODE,
    part: 1,
    kind: 'noRowDecoder',
    detail: 'word lines reach no row decoder through their driver strips',
  },
  {
    decoderCode: COLUMN_DECODER,
    stripCode: SENSE_AMP_STRIP_CODE,
    part: 0,
    kind: 'noColumnDecoder',
    detail: 'bit lines reach no column decoder through their sense-amplifier strips',
  },
];

/** A mat with no serving strip in `part` already has an error for its unserved lines. */
function hasServing(mats: MatTable, k: number, part: ServingPart): boolean {
  return mats.servingOffsets[3 * k + part] !== mats.servingOffsets[3 * k + part + 1];
}

/** Mats with at least one serving strip in the check's part that no decoder reaches, as one grouped finding. */
function unreachedFinding(mats: MatTable, reach: ReachComponents, check: ReachCheck): Finding | null {
  const ids: string[] = [];
  const labels: string[] = [];
  for (let k = 0; k < mats.count; k++) {
    const at = mats.position[k] as number;
    if (isReached(reach, at) || !hasServing(mats, k, check.part)) continue;
    const block = mats.blocks[at];
    ids.push(block?.id ?? '');
    if (labels.length < 3) labels.push(block?.name || block?.id || '');
  }
  if (ids.length === 0) return null;
  return {
    kind: check.kind,
    severity: 'warning',
    blockIds: ids,
    message: `${groupLabel(ids.length, labels)}: ${check.detail}`,
  };
}

/** One reach check's components, the decoders' edges they were seeded from, and its finding. */
interface ReachResult {
  readonly check: ReachCheck;
  readonly edges: DecoderEdges | null;
  readonly reach: ReachComponents;
  readonly finding: Finding | null;
}

/** What the decoder-reach checks leave for the next edit. */
export interface DecoderReachState {
  readonly results: readonly ReachResult[];
}

function reachResult(
  table: BlockTable,
  mats: MatTable,
  matIndexAt: Int32Array,
  check: ReachCheck,
): ReachResult {
  const edges = DecoderEdges.of(table, check.decoderCode);
  const seed = reachSeeds(table, matIndexAt, edges, check.decoderCode, check.stripCode);
  const reach = reachComponents(mats, matIndexAt, check.part, seed);
  return { check, edges, reach, finding: unreachedFinding(mats, reach, check) };
}

/**
 * Warnings for mats cut off from the decoders: word lines whose driver strips lead to no row decoder,
 * and bit lines whose sense-amplifier strips (the column path) lead to no column decoder.
 */
export function decoderReach(table: BlockTable, mats: MatTable, matIndexAt: Int32Array): DecoderReachState {
  return { results: REACH_CHECKS.map((check) => reachResult(table, mats, matIndexAt, check)) };
}

export function decoderReachFindings(state: DecoderReachState): Finding[] {
  const findings: Finding[] = [];
  for (const r of state.results) if (r.finding) findings.push(r.finding);
  return findings;
}
