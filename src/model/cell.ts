import { z } from 'zod';
import { positive } from './schemaParts';

/** Cell families the engine knows. Gain cells arrive with the array-physics work. */
export const CELL_KINDS = ['dram-1t1c'] as const;
export type CellKind = (typeof CELL_KINDS)[number];

/**
 * Folded: the sense amplifier compares two neighbouring bit lines of the same mat, and a word line
 * holds a cell at every other bit line. Open: it compares a bit line with one in the neighbouring mat,
 * and every word-line / bit-line crossing holds a cell.
 */
export const BITLINE_ARCHITECTURES = ['folded', 'open'] as const;
export type BitlineArchitecture = (typeof BITLINE_ARCHITECTURES)[number];

export const cellDefinitionSchema = z.object({
  id: z.string().min(1).max(80),
  name: z.string().min(1).max(120),
  kind: z.enum(CELL_KINDS),
  bitlineArchitecture: z.enum(BITLINE_ARCHITECTURES),
  /** Bit-line pitch in multiples of F (the cell's extent along the word line per bit line). */
  bitlinePitchInF: positive('bit-line pitch in F', 0.5, 100),
  /** Word-line pitch in multiples of F (the cell's extent along the bit line per word line). */
  wordlinePitchInF: positive('word-line pitch in F', 0.5, 100),
  /** Storage capacitance of one cell (F). */
  storageCapacitance: positive('storage capacitance', 1e-18, 1e-12),
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

/** Cell footprint in F²: bit-line pitch × word-line pitch / occupancy (8 for 2F×2F folded, 6 for 3F×2F open). */
export function footprintInF2(cell: CellDefinition): number {
  return (cell.bitlinePitchInF * cell.wordlinePitchInF) / crossingOccupancy(cell.bitlineArchitecture);
}
