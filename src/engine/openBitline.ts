import { abutmentOnSide, type Side } from '../geometry/abutment';
import { linesInGaps, uncoveredParts, type Interval } from '../geometry/interval';
import type { NeighbourTable } from '../geometry/neighbourGrid';
import type { PlacedBlock, PlacedMat } from '../geometry/placedBlocks';
import { ABUTMENT_TOLERANCE } from '../geometry/rect';
import { isGainCell } from '../model/cell';
import type { SenseAmpContact } from './connectivity';

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
  mat: PlacedMat,
  contacts: readonly SenseAmpContact[],
  senseAmpEnds: number,
  placed: readonly PlacedBlock[],
  neighbours: NeighbourTable,
): number {
  // Gain cells read single-ended against a reference, so they need no partner mat.
  if (mat.cell.bitlineArchitecture !== 'open' || isGainCell(mat.cell.kind) || contacts.length === 0) return 0;
  const share = senseAmpEnds >= 2 ? 0.5 : 1;
  const g = mat.geometry;
  let lost = 0;
  for (const contact of contacts) {
    const strip = placed[contact.stripIndex];
    if (!strip) continue;
    const partnered = partnerStretches(mat, contact.side, strip, contact.stripIndex, placed, neighbours);
    const gaps = uncoveredParts(partnered, g.wordlineLength, ABUTMENT_TOLERANCE)
      .map((gap) => clip(gap, contact.stretch))
      .filter((gap): gap is Interval => gap !== null);
    lost += share * linesInGaps(gaps, g.bitlinePitch, g.bitlineCount);
  }
  return lost;
}

/** Stretches of the mat's edge (mat coordinates) across which an open mat lies beyond the strip. */
function partnerStretches(
  mat: PlacedMat,
  side: Side,
  strip: PlacedBlock,
  stripIndex: number,
  placed: readonly PlacedBlock[],
  neighbours: NeighbourTable,
): Interval[] {
  const horizontal = side === 'top' || side === 'bottom';
  const shift = horizontal ? strip.rect.x - mat.rect.x : strip.rect.y - mat.rect.y;
  const stretches: Interval[] = [];
  const end = neighbours.end[stripIndex] as number;
  for (let k = neighbours.start[stripIndex] as number; k < end; k++) {
    const other = placed[neighbours.list[k] as number];
    if (!other || other === mat || other.block.type !== 'mat' || !('cell' in other)) continue;
    if (other.cell.bitlineArchitecture !== 'open' || isGainCell(other.cell.kind)) continue;
    if (other.block.bitlineAxis !== mat.block.bitlineAxis) continue;
    // The partner touches the strip on the same side as the strip touches our mat (beyond the strip).
    const stretch = abutmentOnSide(strip.rect, other.rect, side);
    if (stretch) stretches.push({ start: stretch.start + shift, end: stretch.end + shift });
  }
  return stretches;
}

function clip(gap: Interval, within: Interval): Interval | null {
  const start = Math.max(gap.start, within.start);
  const end = Math.min(gap.end, within.end);
  return end > start ? { start, end } : null;
}
