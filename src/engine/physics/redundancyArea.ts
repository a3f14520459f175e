/**
 * Area cost of redundancy in one repair domain: the spare lines themselves and the fuses and address
 * comparators that steer accesses to them. Plain numbers, SI units (m²).
 */

export interface RedundancyArea {
  /** Spare word lines: R rows of cells, each one domain row's worth of area. */
  readonly spareRows: number;
  /** Spare bit-line pairs with their sense amplifiers: C columns of cells plus their strip share. */
  readonly spareColumns: number;
  /** Fuses and address comparators of every spare. */
  readonly fuseAndCompare: number;
  readonly total: number;
}

/** Address bits that name one of `lines` lines: ⌈log2(lines)⌉ (0 for a single line). */
export function addressBits(lines: number): number {
  return lines > 1 ? Math.ceil(Math.log2(lines)) : 0;
}

/**
 * Area of a domain's redundancy. A spare row costs the area of one row of the domain's cells
 * (A_domain / rows); a spare column one column of cells (A_domain / columns) plus its sense amplifier,
 * taken as the strip area per column (the strip-to-mat area ratio times the column's cell area). Each
 * spare is programmed by ⌈log2(lines)⌉ address fuses and one enable fuse and compares ⌈log2(lines)⌉
 * address bits on every access.
 * Source: common practice (no source); the fuse-set-and-comparator organisation of row and column
 * redundancy is described in K. Itoh, "VLSI Memory Chip Design", Springer, 2001, ch. on redundancy
 * [from memory].
 *
 * @param domainArea area of the domain's mats (m²).
 * @param stripShare sense-amplifier strip area over mat area (ratio).
 */
export function redundancyArea(
  domainArea: number,
  rows: number,
  columns: number,
  spareRows: number,
  spareColumns: number,
  stripShare: number,
  fuseArea: number,
  compareBitArea: number,
): RedundancyArea {
  const rowArea = rows > 0 ? (spareRows * domainArea) / rows : 0;
  const columnArea = columns > 0 ? ((spareColumns * domainArea) / columns) * (1 + stripShare) : 0;
  const rowBits = addressBits(rows);
  const columnBits = addressBits(columns);
  const fuseAndCompare =
    spareRows * ((rowBits + 1) * fuseArea + rowBits * compareBitArea) +
    spareColumns * ((columnBits + 1) * fuseArea + columnBits * compareBitArea);
  return {
    spareRows: rowArea,
    spareColumns: columnArea,
    fuseAndCompare,
    total: rowArea + columnArea + fuseAndCompare,
  };
}
