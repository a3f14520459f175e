import { abutmentSpan, type Side } from '../../geometry/abutment';
import {
  BLOCK_TYPE_CODES,
  kindAt,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
  type BlockTable,
} from '../../geometry/blockTable';
import { bitlineEndSides } from '../../geometry/stripFit';
import { DecoderEdges } from './decoderEdges';
import { groupLabel } from './findingText';
import type { MatTable } from './matTable';
import type { Finding } from './report';

const ROW_DECODER = BLOCK_TYPE_CODES.indexOf('rowDecoder');
const COLUMN_DECODER = BLOCK_TYPE_CODES.indexOf('columnDecoder');
const ALL_SIDES: readonly Side[] = ['top', 'bottom', 'left', 'right'];
const scratch = new Float64Array(2);

/** True when boxes i and j share a stretch of edge on any side of i. */
function abutting(table: BlockTable, i: number, j: number): boolean {
  for (const side of ALL_SIDES) if (abutmentSpan(table, i, j, side, scratch, 0)) return true;
  return false;
}

/** Which mat rows of the serving list a path follows: the sense-amplifier part (0) or the driver part (1). */
type ServingPart = 0 | 1;

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
  const reachedMat = new Uint8Array(mats.count);
  const reachedBlock = new Uint8Array(table.count);
  const edges = DecoderEdges.of(table, decoderCode);
  if (edges === null) return reachedMat;
  const matOfPosition = new Int32Array(table.count).fill(-1);
  for (let k = 0; k < mats.count; k++) matOfPosition[mats.position[k] as number] = k;
  // Seeds: the decoders, the serving strips abutting them, and mats whose bit-line ends meet a column decoder.
  const stripQueue: number[] = [];
  const matQueue: number[] = [];
  for (const d of edges.decoders) {
    reachedBlock[d] = 1;
    stripQueue.push(d);
  }
  const seedMats = decoderCode === COLUMN_DECODER;
  const candidates = edges.candidates;
  for (let i = 0; i < table.count; i++) {
    const type = table.type[i];
    const k = matOfPosition[i] as number;
    const isStrip = type === stripCode;
    if (!isStrip && !(seedMats && k >= 0)) continue;
    const found = edges.near(table, i);
    for (let c = 0; c < found; c++) {
      const d = candidates[c] as number;
      if (isStrip) {
        if (reachedBlock[i] === 0 && abutting(table, d, i)) {
          reachedBlock[i] = 1;
          stripQueue.push(i);
        }
      } else if (reachedMat[k] === 0) {
        for (const side of bitlineEndSides(kindAt(table, i).block.bitlineAxis)) {
          if (!abutmentSpan(table, i, d, side, scratch, 0)) continue;
          reachedMat[k] = 1;
          matQueue.push(k);
          break;
        }
      }
    }
  }
  // Which mats each strip serves: the report lists strips per mat, so count, then fill, per strip.
  const { servingOffsets, servingPositions } = mats;
  const served = new Int32Array(table.count + 1);
  for (let k = 0; k < mats.count; k++) {
    const from = servingOffsets[3 * k + part] as number;
    const to = servingOffsets[3 * k + part + 1] as number;
    for (let p = from; p < to; p++) (served[(servingPositions[p] as number) + 1] as number)++;
  }
  for (let i = 0; i < table.count; i++) served[i + 1] = (served[i + 1] as number) + (served[i] as number);
  const fill = served.slice(0, table.count);
  const servedMats = new Int32Array(served[table.count] as number);
  for (let k = 0; k < mats.count; k++) {
    const from = servingOffsets[3 * k + part] as number;
    const to = servingOffsets[3 * k + part + 1] as number;
    for (let p = from; p < to; p++) {
      const strip = servingPositions[p] as number;
      servedMats[(fill[strip] as number)++] = k;
    }
  }
  // Breadth-first over mats and strips.
  while (stripQueue.length > 0 || matQueue.length > 0) {
    const strip = stripQueue.pop();
    if (strip !== undefined) {
      for (let q = served[strip] as number; q < (served[strip + 1] as number); q++) {
        const k = servedMats[q] as number;
        if (reachedMat[k] === 0) {
          reachedMat[k] = 1;
          matQueue.push(k);
        }
      }
      continue;
    }
    const k = matQueue.pop() as number;
    const from = servingOffsets[3 * k + part] as number;
    const to = servingOffsets[3 * k + part + 1] as number;
    for (let p = from; p < to; p++) {
      const s = servingPositions[p] as number;
      if (reachedBlock[s] === 0) {
        reachedBlock[s] = 1;
        stripQueue.push(s);
      }
    }
  }
  return reachedMat;
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
