import { z } from 'zod';
import {
  BITLINE_ARCHITECTURES,
  CELL_KIND_LABEL,
  CELL_KINDS,
  isDifferentialCell,
  readsByCurrent,
} from './cellBasics';
import { nonNegative, positive } from './schemaParts';

// The schema of cell definitions; cell.ts and cellBasics.ts hold what code that only computes needs.

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
  /**
   * Gate-to-storage-node overlap of the write transistor (F): when the write word line falls after a write
   * it pulls the stored level down by V_WWL·Cc/(Cc + Cs). Gain cells only; 0 for 4T and 6T.
   */
  writeCouplingCapacitance: nonNegative('write word-line coupling capacitance', 1e-12).default(0),
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
    /** Read-path devices; required for cells read by current (gain, 4T, 6T), null for 1T1C. */
    gainRead: gainReadSchema.nullable(),
    /** Standby current one static (6T) cell draws from the supply (A); 0 for dynamic cells. */
    holdCurrent: nonNegative('hold current', 1e-3).default(0),
  })
  .superRefine((cell, ctx) => {
    if (readsByCurrent(cell.kind) && cell.gainRead === null) {
      ctx.addIssue({
        code: 'custom',
        path: ['gainRead'],
        message: `a ${CELL_KIND_LABEL[cell.kind]} needs its read-path values`,
      });
    }
    if (isDifferentialCell(cell.kind) !== (cell.bitlineArchitecture === 'paired')) {
      ctx.addIssue({
        code: 'custom',
        path: ['bitlineArchitecture'],
        message: isDifferentialCell(cell.kind)
          ? `a ${CELL_KIND_LABEL[cell.kind]} holds both lines of its pair: its bit lines are "paired"`
          : 'only 4T and 6T cells hold both lines of a pair ("paired" bit lines)',
      });
    }
  });

export type CellDefinition = z.infer<typeof cellDefinitionSchema>;
