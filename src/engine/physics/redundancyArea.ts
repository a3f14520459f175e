/**
 * Area cost of the spares of one repair domain: the spare lines themselves and the fuses and address
 * comparators that steer accesses to them. Plain numbers, SI units (m²).
 */

export interface SpareSetArea {
  /** The spare lines (with their sense amplifiers, for columns). */
  readonly lines: number;
  /** Fuses and address comparators of every spare. */
  readonly fuseAndCompare: number;
}

/** Address bits that name one of `lines` lines: ⌈log2(lines)⌉ (0 for a single line). */
export function addressBits(lines: number): number {
  return lines > 1 ? Math.ceil(Math.log2(lines)) : 0;
}

/**
 * Area of one domain's spares of one kind. Each spare line costs `lineArea` (a spare row: one word line's
 * row of the domain's cells; a spare column: one column of cells in every mat its strip senses and one
 * sense amplifier). Each spare is programmed by ⌈log2(lines)⌉ address fuses and one enable fuse, and
 * compares ⌈log2(lines)⌉ address bits on every access.
 * Source: common practice (no source); the fuse-set-and-comparator organisation of row and column
 * redundancy is described in K. Itoh, "VLSI Memory Chip Design", Springer, 2001, ch. on redundancy
 * [from memory].
 *
 * @param lines lines of the domain a spare may replace.
 * @param lineArea area of one spare line (m²).
 */
export function spareSetArea(
  spares: number,
  lines: number,
  lineArea: number,
  fuseArea: number,
  compareBitArea: number,
): SpareSetArea {
  const bits = addressBits(lines);
  return {
    lines: spares * lineArea,
    fuseAndCompare: spares * ((bits + 1) * fuseArea + bits * compareBitArea),
  };
}
