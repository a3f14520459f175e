import { abutmentSpan, type Side } from '../../geometry/abutment';
import { kindAt, MAT_CODE, type BlockTable } from '../../geometry/blockTable';
import { uncoveredLineCount } from '../../geometry/interval';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import type { CellDefinition } from '../../model/cell';
import type { SenseAmpContacts } from './connectivity';

/**
 * Open-bit-line 1T1C arrays pair a bit line of one mat with one of the mat beyond the sense-amplifier
 * strip. Counting rules, so that a floorplan never reads more bits than its pairs allow:
 * - half of a mat's bit lines (every other one) go to each of its two bit-line edges, whether or not a
 *   strip is there: lines whose edge has no strip are unsensed;
 * - at a strip, pairs = min(lines offered by this mat, lines offered by the mat beyond), stretch by stretch
 *   along the strip; the rest of this mat's lines there have no partner and are lost.
 * So three open mats with strips only between them read at most 2/3 of their bits, and a chain of n mats
 * reads (n − 1)/n with or without end strips. Source: Takahashi et al., IEEE JSSC 36(11), 2001, and
 * Sekiguchi, Itoh et al., "A low-impedance open-bitline array for multigigabit DRAM", IEEE JSSC 2002
 * (dummy halves at the array edge) (published); the counting is common practice (no source).
 */
export function pairsAcrossStrips(cell: CellDefinition): boolean {
  return cell.bitlineArchitecture === 'open' && cell.kind === 'dram-1t1c';
}

/** Share of a mat's bit lines that go to each of its two bit-line edges. */
export const SHARE_PER_EDGE = 0.5;

/** Line centres (k + ½)·pitch from `origin`, k in [0, count), that fall in [from, to] (m). */
export function linesWithin(from: number, to: number, origin: number, pitch: number, count: number): number {
  if (!(to > from) || pitch <= 0) return 0;
  const first = Math.max(0, Math.ceil((from - origin - ABUTMENT_TOLERANCE) / pitch - 0.5));
  const last = Math.min(count - 1, Math.floor((to - origin + ABUTMENT_TOLERANCE) / pitch - 0.5));
  return Math.max(0, last - first + 1);
}

/** Scratch for the spans of one edge (pairs of start and end, m); grows when needed. */
let edgeSpans = new Float64Array(32);

/**
 * Bit lines of an open-bit-line mat that reach no strip: half of the lines go to each edge, and on each
 * edge the lines that no strip covers are unsensed.
 *
 * @param ends the mat's two bit-line sides.
 */
export function unsensedOpenBitlines(
  contacts: SenseAmpContacts,
  ends: readonly Side[],
  wordlineLength: number,
  pitch: number,
  lineCount: number,
): number {
  let unsensed = 0;
  for (const side of ends) {
    let count = 0;
    for (let c = 0; c < contacts.count; c++) {
      if (contacts.side[c] !== side) continue;
      if (2 * count === edgeSpans.length) {
        const bigger = new Float64Array(2 * edgeSpans.length);
        bigger.set(edgeSpans);
        edgeSpans = bigger;
      }
      edgeSpans[2 * count] = contacts.span[2 * c] as number;
      edgeSpans[2 * count + 1] = contacts.span[2 * c + 1] as number;
      count++;
    }
    unsensed +=
      SHARE_PER_EDGE *
      uncoveredLineCount(edgeSpans, count, wordlineLength, ABUTMENT_TOLERANCE, pitch, lineCount);
  }
  return unsensed;
}

/** Scratch for one partner's stretch along a strip. */
const stretch = new Float64Array(2);

/**
 * Bit lines of an open-bit-line mat that reach a strip but find no partner beyond it: on each contact,
 * this mat offers half of its lines there, each partner mat half of its own over the stretch they share,
 * and the pairs are the smaller of the two.
 *
 * @returns bit lines without a partner (a count, possibly fractional by the ½ share).
 */
export function unpartneredBitlines(
  table: BlockTable,
  /** The mat's position in the table. */
  at: number,
  contacts: SenseAmpContacts,
  neighbours: NeighbourTable,
  /** pairsAcrossStrips of the mat's cell, when the caller knows it already (read once per kind). */
  open?: boolean,
): number {
  const { cell, block, geometry: g } = kindAt(table, at);
  if (!(open ?? pairsAcrossStrips(cell)) || contacts.count === 0) return 0;
  let lost = 0;
  for (let c = 0; c < contacts.count; c++) {
    const side = contacts.side[c] as Side;
    const strip = contacts.strip[c] as number;
    const from = contacts.span[2 * c] as number;
    const to = contacts.span[2 * c + 1] as number;
    const offered = SHARE_PER_EDGE * linesWithin(from, to, 0, g.bitlinePitch, g.bitlineCount);
    const horizontal = side === 'top' || side === 'bottom';
    const shift = horizontal
      ? (table.x[strip] as number) - (table.x[at] as number)
      : (table.y[strip] as number) - (table.y[at] as number);
    let paired = 0;
    const end = neighbours.end[strip] as number;
    for (let k = neighbours.start[strip] as number; k < end; k++) {
      const j = neighbours.list[k] as number;
      if (j === at || table.type[j] !== MAT_CODE) continue;
      const other = kindAt(table, j);
      if (!pairsAcrossStrips(other.cell) || other.block.bitlineAxis !== block.bitlineAxis) continue;
      // The partner touches the strip on the same side as the strip touches our mat (beyond the strip).
      if (!abutmentSpan(table, strip, j, side, stretch, 0)) continue;
      const u = Math.max(from, (stretch[0] as number) + shift);
      const v = Math.min(to, (stretch[1] as number) + shift);
      if (!(v > u)) continue;
      const origin = horizontal
        ? (table.x[j] as number) - (table.x[at] as number)
        : (table.y[j] as number) - (table.y[at] as number);
      const ours = linesWithin(u, v, 0, g.bitlinePitch, g.bitlineCount);
      const theirs = linesWithin(u, v, origin, other.geometry.bitlinePitch, other.geometry.bitlineCount);
      paired += SHARE_PER_EDGE * Math.min(ours, theirs);
    }
    lost += Math.max(0, offered - paired);
  }
  return lost;
}
