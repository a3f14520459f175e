import { abutmentSpan, type Side } from '../../../src/geometry/abutment';
import {
  BLOCK_TYPE_CODES,
  kindAt,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../../src/geometry/blockTable';
import { bitlineEndSides } from '../../../src/geometry/stripFit';
import { groupLabel } from '../../../src/engine/evaluation/findingText';
import { matIndexByPosition } from '../../../src/engine/evaluation/decoderReach';
import type { MatTable } from '../../../src/engine/evaluation/matTable';
import {
  reachComponents,
  reachedMats,
  type ServingPart,
} from '../../../src/engine/evaluation/reachComponents';
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
 * The seeds the way the first implementation found them: for each decoder, a scan of the whole table for
 * the strips of type `stripCode` abutting it (and, for column decoders, mats with a bit-line end against
 * it), O(n · decoders). The spread from the seeds is the engine's own (reachComponents), so only the
 * seeding is checked against an independent version here.
 */
function oracleSeeds(
  table: BlockTable,
  matIndexAt: Int32Array,
  decoderCode: number,
  stripCode: number,
): Uint8Array {
  const seed = new Uint8Array(table.count);
  for (let d = 0; d < table.count; d++) {
    if (table.type[d] !== decoderCode) continue;
    seed[d] = 1;
    for (let i = 0; i < table.count; i++) {
      if (table.type[i] === stripCode && abutting(table, d, i)) seed[i] = 1;
      else if (decoderCode === COLUMN_DECODER && (matIndexAt[i] as number) >= 0) {
        for (const side of bitlineEndSides(kindAt(table, i).block.bitlineAxis))
          if (abutmentSpan(table, i, d, side, scratch, 0)) seed[i] = 1;
      }
    }
  }
  return seed;
}

/** Mats (by report index) a decoder of type `decoderCode` reaches: the oracle's seeds, the engine's spread. */
export function matsReachedBy(
  table: BlockTable,
  mats: MatTable,
  decoderCode: number,
  stripCode: number,
  part: ServingPart,
): Uint8Array {
  const matIndexAt = matIndexByPosition(mats, table.count);
  const seed = oracleSeeds(table, matIndexAt, decoderCode, stripCode);
  return reachedMats(reachComponents(mats, matIndexAt, part, seed), mats);
}

/** Mats with at least one serving strip in `part` that no decoder reaches, as one grouped finding. */
function unreachedFinding(
  mats: MatTable,
  reached: Uint8Array,
  part: ServingPart,
  kind: Finding['kind'],
  detail: string,
): Finding | null {
  const ids: string[] = [];
  const labels: string[] = [];
  for (let k = 0; k < mats.count; k++) {
    if (reached[k] !== 0) continue;
    // A mat with no serving strip at all already has an error for its unserved lines.
    if (mats.servingOffsets[3 * k + part] === mats.servingOffsets[3 * k + part + 1]) continue;
    const block = mats.blocks[mats.position[k] as number];
    ids.push(block?.id ?? '');
    if (labels.length < 3) labels.push(block?.name || block?.id || '');
  }
  if (ids.length === 0) return null;
  return {
    kind,
    severity: 'warning',
    blockIds: ids,
    message: `${groupLabel(ids.length, labels)}: ${detail}`,
  };
}

/**
 * Warnings for mats cut off from the decoders: word lines whose driver strips lead to no row decoder,
 * and bit lines whose sense-amplifier strips (the column path) lead to no column decoder.
 */
export function decoderReachFindings(table: BlockTable, mats: MatTable): Finding[] {
  const findings: Finding[] = [];
  const rows = matsReachedBy(table, mats, ROW_DECODER, WORDLINE_DRIVER_STRIP_CODE, 1);
  const rowFinding = unreachedFinding(
    mats,
    rows,
    1,
    'noRowDecoder',
    'word lines reach no row decoder through their driver strips',
  );
  if (rowFinding) findings.push(rowFinding);
  const columns = matsReachedBy(table, mats, COLUMN_DECODER, SENSE_AMP_STRIP_CODE, 0);
  const columnFinding = unreachedFinding(
    mats,
    columns,
    0,
    'noColumnDecoder',
    'bit lines reach no column decoder through their sense-amplifier strips',
  );
  if (columnFinding) findings.push(columnFinding);
  return findings;
}
