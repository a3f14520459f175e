import type { CellDefinition } from './cell';

// The plain facts about cells, apart from their schema (cell.ts), so that code which only computes
// (the engine, the sweep worker) does not load the validation library.

/**
 * Cell families the engine knows:
 * - dram-1t1c: one access transistor and a storage capacitor; destructive charge-sharing read.
 * - gain-3t: write transistor, storage transistor and read-access transistor; the charge sits on the
 *   storage transistor's gate and the write transistor's junction; separate read and write word lines
 *   and bit lines; non-destructive, inverting read onto a read bit line precharged to the array voltage.
 * - gain-2t: write transistor and storage/read transistor whose source is driven by the read word line.
 */
export const CELL_KINDS = ['dram-1t1c', 'gain-3t', 'gain-2t'] as const;
export type CellKind = (typeof CELL_KINDS)[number];

export const CELL_KIND_LABEL: Record<CellKind, string> = {
  'dram-1t1c': '1T1C',
  'gain-3t': '3T gain cell',
  'gain-2t': '2T gain cell',
};

export function isGainCell(kind: CellKind): boolean {
  return kind !== 'dram-1t1c';
}

/**
 * Folded: the sense amplifier compares two neighbouring bit lines of the same mat, and a word line
 * holds a cell at every other bit line. Open: it compares a bit line with one in the neighbouring mat
 * (or, for gain cells, a reference), and every word-line / bit-line crossing holds a cell.
 */
export const BITLINE_ARCHITECTURES = ['folded', 'open'] as const;
export type BitlineArchitecture = (typeof BITLINE_ARCHITECTURES)[number];

/**
 * Share of word-line / bit-line crossings that hold a cell: ½ for folded bit lines (a word line passes
 * every other bit line without a cell), 1 for open. Common practice (no source); see Weste & Harris,
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
