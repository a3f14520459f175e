import type { BitlineCapacitance } from './bitline';
import type { StoredHighLevel } from './storedLevel';

/** Figures of one mat, all in SI units. */
export interface MatReport {
  readonly matId: string;
  readonly name: string;
  readonly cellId: string;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly bitlineCount: number;
  readonly wordlineCount: number;
  /** Cells in the mat. */
  readonly bits: number;
  /** Mat outline area (m²). */
  readonly area: number;
  /** Area of its cells = bits × cell footprint (m²). */
  readonly cellArea: number;
  readonly bitlineLength: number;
  readonly wordlineLength: number;
  readonly storageCapacitance: number;
  readonly bitlineCapacitance: BitlineCapacitance;
  readonly chargeTransferRatio: number;
  /** Rise of the bit line for a stored 1 (V). */
  readonly signalHigh: number;
  /** Fall of the bit line for a stored 0 (V). */
  readonly signalLow: number;
  /** The smaller of the two (V). */
  readonly senseSignal: number;
  readonly senseAmpStripIds: readonly string[];
  readonly wordlineDriverIds: readonly string[];
  readonly unsensedBitlines: number;
  readonly undrivenWordlines: number;
}

/** Whole-design figures (SI). */
export interface Totals {
  readonly matCount: number;
  readonly bits: number;
  /** Area of the bounding box of every block (m²): what the floorplan occupies on the die. */
  readonly totalArea: number;
  /** Sum of the blocks' own areas (m²); less than totalArea when there are gaps. */
  readonly placedArea: number;
  /** Sum of the cells' footprints (m²). */
  readonly cellArea: number;
  /** cellArea / totalArea. */
  readonly arrayEfficiency: number;
  /** totalArea / bits (m²). */
  readonly areaPerBit: number;
  /** areaPerBit / F². */
  readonly areaPerBitInF2: number;
  /** Smallest sense signal of any mat (V), or NaN without mats. */
  readonly worstSenseSignal: number;
  readonly worstSenseSignalMatId: string | null;
}

export type Severity = 'error' | 'warning';

export const FINDING_KINDS = [
  'unsensedBitlines',
  'undrivenWordlines',
  'overlap',
  'storedHighLimited',
] as const;
export type FindingKind = (typeof FINDING_KINDS)[number];

/** One thing the checks found, naming the blocks it concerns. */
export interface Finding {
  readonly kind: FindingKind;
  readonly severity: Severity;
  readonly blockIds: readonly string[];
  readonly message: string;
}

/** Everything evaluate() returns for a design. */
export interface Report {
  readonly mats: readonly MatReport[];
  readonly totals: Totals;
  readonly storedHigh: StoredHighLevel;
  readonly findings: readonly Finding[];
}
