import {
  BLOCK_TYPE_CODES,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import { DecoderEdges } from './decoderEdges';
import { groupLabel } from './findingText';
import type { MatTable } from './matTable';
import { ComponentsOnDemand, type ReachComponents, type ServingPart } from './reachComponents';
import { seedsOfChecks, type SeedCheck } from './reachSeeds';
import { ServingForest } from './servingForest';
import type { Finding } from './report';

const ROW_DECODER = BLOCK_TYPE_CODES.indexOf('rowDecoder');
const COLUMN_DECODER = BLOCK_TYPE_CODES.indexOf('columnDecoder');

/** For each table position, the index of its mat in the report, or −1. */
export function matIndexByPosition(mats: MatTable, count: number): Int32Array {
  const index = new Int32Array(count).fill(-1);
  for (let k = 0; k < mats.count; k++) index[mats.position[k] as number] = k;
  return index;
}

/** One of the two reach checks: which decoders, along which strips and part of the serving lists. */
interface ReachCheck extends SeedCheck {
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
export function hasServing(mats: MatTable, k: number, part: ServingPart): boolean {
  return mats.servingOffsets[3 * k + part] !== mats.servingOffsets[3 * k + part + 1];
}

/** Mats with at least one serving strip in the check's part that no decoder reaches, as one grouped finding. */
export function unreachedFinding(mats: MatTable, reached: Uint8Array, check: ReachCheck): Finding | null {
  const ids: string[] = [];
  const labels: string[] = [];
  for (let k = 0; k < mats.count; k++) {
    const at = mats.position[k] as number;
    if (reached[k] === 1 || !hasServing(mats, k, check.part)) continue;
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

/**
 * One reach check of the whole design: the seeds, which trees of the serving forest hold one, and the mats
 * in the others. The components block by block are labelled only when an edit asks for them.
 */
export function reachResult(
  mats: MatTable,
  matIndexAt: Int32Array,
  check: ReachCheck,
  edges: DecoderEdges | null,
  seed: Uint8Array,
  forest: ServingForest,
): ReachResult {
  const reach = new ComponentsOnDemand(check.part, seed, mats, matIndexAt);
  const seededRoots = seededTrees(forest, check.part, seed);
  const finding = seededRoots === null ? null : unreachedInForest(mats, forest, check, seededRoots);
  return { check, edges, reach, finding };
}

/**
 * Per table position, 1 at the roots of the trees holding a seed; null when every tree holds one (then
 * every mat is reached). The seeds are found by the native search of the seed array: they are few.
 */
function seededTrees(forest: ServingForest, part: ServingPart, seed: Uint8Array): Uint8Array | null {
  const seededRoot = new Uint8Array(seed.length);
  let seeded = 0;
  for (let i = seed.indexOf(1); i >= 0; i = seed.indexOf(1, i + 1)) {
    const r = forest.rootOf(part, i);
    if (r < 0 || seededRoot[r] !== 0) continue;
    seededRoot[r] = 1;
    seeded++;
  }
  return seeded === forest.trees[part] ? null : seededRoot;
}

/** {@link unreachedFinding} with the reach read from the forest: a mat is reached when its root is seeded. */
function unreachedInForest(
  mats: MatTable,
  forest: ServingForest,
  check: ReachCheck,
  seededRoot: Uint8Array,
): Finding | null {
  const reached = new Uint8Array(mats.count);
  for (let k = 0; k < mats.count; k++)
    reached[k] = seededRoot[forest.rootOf(check.part, mats.position[k] as number)] as number;
  return unreachedFinding(mats, reached, check);
}

/**
 * Warnings for mats cut off from the decoders: word lines whose driver strips lead to no row decoder,
 * and bit lines whose sense-amplifier strips (the column path) lead to no column decoder.
 *
 * A decoder abutting a serving strip reaches every mat that strip serves, each of those mats reaches the
 * other strips serving it, and so on (a global word line crosses every mat and driver strip of its row; a
 * column-select line every mat and sense-amplifier strip of its column). A mat whose serving list holds the
 * decoder itself (a row decoder driving a small mat directly) is reached too, and so is a mat with a bit-line
 * end against a column decoder. Common practice (no source): the decoder's lines run along the stack of
 * mats and strips it sits beside.
 */
export function decoderReach(
  table: BlockTable,
  mats: MatTable,
  matIndexAt: Int32Array,
  forest: ServingForest = ServingForest.of(mats, table),
  /** The table's runs by block type with the margin ABUTMENT_TOLERANCE (as evaluate's neighbours cut them). */
  runs: BlockRuns | null = null,
): DecoderReachState {
  const rows = REACH_CHECKS[0] as ReachCheck;
  const columns = REACH_CHECKS[1] as ReachCheck;
  const rowEdges = DecoderEdges.of(table, rows.decoderCode);
  const columnEdges = DecoderEdges.of(table, columns.decoderCode);
  const [rowSeeds, columnSeeds] = seedsOfChecks(
    table,
    matIndexAt,
    rows,
    rowEdges,
    columns,
    columnEdges,
    runs,
  );
  return {
    results: [
      reachResult(mats, matIndexAt, rows, rowEdges, rowSeeds, forest),
      reachResult(mats, matIndexAt, columns, columnEdges, columnSeeds, forest),
    ],
  };
}

export function decoderReachFindings(state: DecoderReachState): Finding[] {
  const findings: Finding[] = [];
  for (const r of state.results) if (r.finding) findings.push(r.finding);
  return findings;
}
