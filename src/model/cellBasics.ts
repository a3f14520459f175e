import type { CellDefinition } from './cell';

// The plain facts about cells, apart from their schema (cell.ts), so that code which only computes
// (the engine, the sweep worker) does not load the validation library.

/**
 * Cell families the engine knows:
 * - dram-1t1c: one access transistor and a storage capacitor; destructive charge-sharing read.
 * - gain-3t: write transistor, storage transistor and read-access transistor; the charge sits on the
 *   storage transistor's gate and the write transistor's junction; separate read and write word lines
 *   and bit lines; non-destructive, inverting read onto a read bit line precharged to the array voltage.
 *   The read-access transistor keeps unselected cells off the read bit line.
 * - gain-2t: write transistor and storage/read transistor whose source is driven by the read word line;
 *   with no read-access device, every unselected cell's storage transistor hangs on the read bit line, and
 *   the write word line couples onto the storage node when it falls.
 * - dram-4t: two cross-coupled storage transistors and two access transistors, no load devices: the pair
 *   reads differentially by cell current without destroying the data, but nothing replaces the charge the
 *   high node leaks, so it is refreshed.
 * - sram-6t: the six-transistor static cell, as the reference the dynamic cells are weighed against: read
 *   by cell current into a precharged pair, no refresh, a standby leakage current per cell.
 */
export const CELL_KINDS = ['dram-1t1c', 'gain-3t', 'gain-2t', 'dram-4t', 'sram-6t'] as const;
export type CellKind = (typeof CELL_KINDS)[number];

export const CELL_KIND_LABEL: Record<CellKind, string> = {
  'dram-1t1c': '1T1C',
  'gain-3t': '3T gain cell',
  'gain-2t': '2T gain cell',
  'dram-4t': '4T dynamic cell',
  'sram-6t': '6T SRAM (reference)',
};

/** Gain cells: single-ended read by the storage transistor's current against a reference. */
export function isGainCell(kind: CellKind): boolean {
  return kind === 'gain-3t' || kind === 'gain-2t';
}

/** Cells that read by a transistor's current (gain cells, 4T, 6T) and so need read-path values. */
export function readsByCurrent(kind: CellKind): boolean {
  return kind !== 'dram-1t1c';
}

/** Cells that hold both lines of their pair (4T, 6T): the sense amplifier compares the cell's own two lines. */
export function isDifferentialCell(kind: CellKind): boolean {
  return kind === 'dram-4t' || kind === 'sram-6t';
}

/** Cells whose data leaks away and must be refreshed (every kind but the static 6T cell). */
export function needsRefresh(kind: CellKind): boolean {
  return kind !== 'sram-6t';
}

/**
 * Transistors in series on the read current's path: the 3T cell's read-access and storage devices, the
 * 4T and 6T cells' access and pull-down devices; the 2T cell's storage device alone (its source is the
 * read word line). 0 for 1T1C, which reads by charge sharing.
 */
export function seriesReadDevices(kind: CellKind): number {
  switch (kind) {
    case 'dram-1t1c':
      return 0;
    case 'gain-2t':
      return 1;
    default:
      return 2;
  }
}

/**
 * Folded: the sense amplifier compares two neighbouring bit lines of the same mat, and a word line
 * holds a cell at every other bit line. Open: it compares a bit line with one in the neighbouring mat
 * (or, for gain cells, a reference), and every word-line / bit-line crossing holds a cell. Paired: the
 * cell itself spans both lines of its pair (4T, 6T), so one column is one pair and one sense amplifier.
 */
export const BITLINE_ARCHITECTURES = ['folded', 'open', 'paired'] as const;
export type BitlineArchitecture = (typeof BITLINE_ARCHITECTURES)[number];

/**
 * Share of word-line / bit-line crossings that hold a cell: ½ for folded bit lines (a word line passes
 * every other bit line without a cell), 1 for open and paired (a paired column counts as one line). Common practice (no source); see Weste & Harris,
 * CMOS VLSI Design, 4th ed., 2011, §12.3 (DRAM) for the two array styles.
 */
export function crossingOccupancy(architecture: BitlineArchitecture): number {
  return architecture === 'folded' ? 0.5 : 1;
}

/** Bit-line and word-line pitch of a cell (m): the override when given, else multiples of F. */
export function cellPitches(
  cell: CellDefinition,
  featureSize: number,
): { bitlinePitch: number; wordlinePitch: number } {
  if (cell.pitchOverride) return cell.pitchOverride;
  return {
    bitlinePitch: cell.bitlinePitchInF * featureSize,
    wordlinePitch: cell.wordlinePitchInF * featureSize,
  };
}

/** Cell footprint (m²): bit-line pitch × word-line pitch / occupancy. */
export function cellFootprint(cell: CellDefinition, featureSize: number): number {
  const { bitlinePitch, wordlinePitch } = cellPitches(cell, featureSize);
  return (bitlinePitch * wordlinePitch) / crossingOccupancy(cell.bitlineArchitecture);
}

/** Cell footprint in F² (8 for 2F×2F folded, 6 for 3F×2F open, 4 for 2F×2F open). */
export function footprintInF2(cell: CellDefinition, featureSize: number): number {
  return cellFootprint(cell, featureSize) / (featureSize * featureSize);
}
