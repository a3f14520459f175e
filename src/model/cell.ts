import { z } from 'zod';
import { nonNegative, positive } from './schemaParts';

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

/** Read-path devices of a gain cell (SI units). */
export const gainReadSchema = z.object({
  /** β = µ·Cox·W/L of the storage (read) transistor (A/V²). */
  readTransconductance: positive('read transconductance β', 1e-9, 1),
  /** Threshold of the storage (read) transistor (V). */
  readThresholdVoltage: positive('read threshold voltage', 1e-3, 3),
  /** Read current of the selected cell holding a 0 (A). */
  readOffCurrent: nonNegative('read off-current', 1e-3),
  /** Leakage each unselected cell adds to the read bit line (A). */
  unselectedLeakageCurrent: nonNegative('unselected-cell read-bit-line leakage', 1e-3),
});
export type GainRead = z.infer<typeof gainReadSchema>;

export const cellDefinitionSchema = z
  .object({
    id: z.string().min(1).max(80),
    name: z.string().min(1).max(120),
    kind: z.enum(CELL_KINDS),
    bitlineArchitecture: z.enum(BITLINE_ARCHITECTURES),
    /** Bit-line pitch in multiples of F (the cell's extent along the word line per bit line). */
    bitlinePitchInF: positive('bit-line pitch in F', 0.5, 100),
    /** Word-line pitch in multiples of F (the cell's extent along the bit line per word line). */
    wordlinePitchInF: positive('word-line pitch in F', 0.5, 100),
    /** Absolute pitches (m) that replace the F-based ones, e.g. from a drawn cell; null to derive from F. */
    pitchOverride: z
      .object({
        bitlinePitch: positive('bit-line pitch', 1e-10, 1e-4),
        wordlinePitch: positive('word-line pitch', 1e-10, 1e-4),
      })
      .nullable(),
    /** Storage capacitance of one cell (F): the capacitor for 1T1C, the storage node for gain cells. */
    storageCapacitance: positive('storage capacitance', 1e-18, 1e-12),
    /** Read-path devices; required for gain cells, null for 1T1C. */
    gainRead: gainReadSchema.nullable(),
  })
  .superRefine((cell, ctx) => {
    if (isGainCell(cell.kind) && cell.gainRead === null) {
      ctx.addIssue({ code: 'custom', path: ['gainRead'], message: 'a gain cell needs its read-path values' });
    }
  });

export type CellDefinition = z.infer<typeof cellDefinitionSchema>;

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
