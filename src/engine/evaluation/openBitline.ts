import { abutmentSpan, type Side } from '../../geometry/abutment';
import { kindAt, MAT_CODE, type BlockTable } from '../../geometry/blockTable';
import { uncoveredLineCount } from '../../geometry/interval';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import { isGainCell } from '../../model/cellBasics';
import type { SenseAmpContacts } from './connectivity';

/**
 * Bit lines of an open-bit-line mat that have no partner: each sense amplifier in a strip compares a bit
 * line of the mat on one side with one of the mat on the other side, so where a strip has no open mat
 * beyond it (the array edge) the bit lines that end there cannot be read and their bits are lost. With
 * strips at both ends, half of the bit lines go to each end; with one end, all go there.
 * Source: Takahashi et al., IEEE JSSC 36(11), 2001, and Sekiguchi, Itoh et al., "A low-impedance
 * open-bitline array for multigigabit DRAM", IEEE JSSC 2002 (dummy halves at the array edge) (published).
 *
 * @returns bit lines without a partner (a count, possibly fractional by the ½ share).
 */
export function unpartneredBitlines(
  table: BlockTable,
  /** The mat's position in the table. */
  at: number,
  contacts: SenseAmpContacts,
  senseAmpEnds: number,
  neighbours: NeighbourTable,
): number {
  const { cell, geometry: g } = kindAt(table, at);
  // Gain cells read single-ended against a reference, so they need no partner mat.
  if (cell.bitlineArchitecture !== 'open' || isGainCell(cell.kind) || contacts.count === 0) return 0;
  const share = senseAmpEnds >= 2 ? 0.5 : 1;
  let lost = 0;
  for (let c = 0; c < contacts.count; c++) {
    const count = partnerSpans(table, at, contacts.side[c] as Side, contacts.strip[c] as number, neighbours);
    lost +=
      share *
      uncoveredLineCount(
        partners,
        count,
        g.wordlineLength,
        ABUTMENT_TOLERANCE,
        g.bitlinePitch,
        g.bitlineCount,
        contacts.span[2 * c] as number,
        contacts.span[2 * c + 1] as number,
      );
  }
  return lost;
}

/** Scratch for the partner spans of one contact (pairs of start and end, m); grows when needed. */
let partners = new Float64Array(32);

/**
 * Writes to `partners` the stretches of the mat's edge (mat coordinates) across which an open mat with
 * the same bit-line axis lies beyond the strip, and returns how many there are.
 */
function partnerSpans(
  table: BlockTable,
  at: number,
  side: Side,
  strip: number,
  neighbours: NeighbourTable,
): number {
  const { block } = kindAt(table, at);
  const horizontal = side === 'top' || side === 'bottom';
  const shift = horizontal
    ? (table.x[strip] as number) - (table.x[at] as number)
    : (table.y[strip] as number) - (table.y[at] as number);
  let count = 0;
  const end = neighbours.end[strip] as number;
  for (let k = neighbours.start[strip] as number; k < end; k++) {
    const j = neighbours.list[k] as number;
    if (j === at || table.type[j] !== MAT_CODE) continue;
    const other = kindAt(table, j);
    if (other.cell.bitlineArchitecture !== 'open' || isGainCell(other.cell.kind)) continue;
    if (other.block.bitlineAxis !== block.bitlineAxis) continue;
    if (2 * count === partners.length) {
      const bigger = new Float64Array(2 * partners.length);
      bigger.set(partners);
      partners = bigger;
    }
    // The partner touches the strip on the same side as the strip touches our mat (beyond the strip).
    if (!abutmentSpan(table, strip, j, side, partners, 2 * count)) continue;
    partners[2 * count] = (partners[2 * count] as number) + shift;
    partners[2 * count + 1] = (partners[2 * count + 1] as number) + shift;
    count++;
  }
  return count;
}
