import type { BlockType } from '../../model/block';
import type { BitlineArchitecture, CellKind } from '../../model/cell';
import type { BitlineCapacitance } from '../physics/bitline';
import type { MatTable } from './matTable';
import type { StoredHighLevel } from '../physics/storedLevel';

/** 1T1C read: charge sharing between cell and bit line. Voltages in V. */
export interface ChargeSharingRead {
  readonly kind: 'chargeSharing';
  readonly chargeTransferRatio: number;
  /** Rise of the bit line reading a stored 1 (negative: the 1 reads as a 0). */
  readonly signalHigh: number;
  /** Fall of the bit line reading a stored 0. */
  readonly signalLow: number;
  /** Rise for a stored 1 that has leaked for a whole refresh window. */
  readonly signalHighAfterRefresh: number;
}

/** Gain-cell read: current into a read bit line precharged to VDD. */
export interface GainCellRead {
  readonly kind: 'gainRead';
  /** Read current of a cell holding a 1 (A). */
  readonly readCurrent: number;
  /** Read-bit-line drop for a stored 1 (V). */
  readonly dropHigh: number;
  /** Read-bit-line drop for a stored 0, with every unselected cell leaking (V). */
  readonly dropLow: number;
  /** Drop for a stored 1 that has leaked for a whole refresh window (V). */
  readonly dropHighAfterRefresh: number;
}

/** Energy of one activation of one word line in the mat (J). */
export interface ActivationEnergy {
  readonly bitlines: number;
  readonly wordline: number;
  readonly senseAmps: number;
  readonly total: number;
  /** total / cells on the word line. */
  readonly perBit: number;
}

/**
 * The physics of one kind of mat, all in SI units: everything that follows from its cell, its cell counts,
 * how many bit-line ends have sense amplifiers and how many open bit lines lack a partner. Mats of one
 * kind share one object, so a regular die holds a handful of these however many mats it has.
 */
export interface MatFigures {
  readonly cellId: string;
  readonly cellKind: CellKind;
  readonly architecture: BitlineArchitecture;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly bitlineCount: number;
  readonly wordlineCount: number;
  /** Cells in the mat. */
  readonly bits: number;
  /** Cells that can be read: bits less those on unpartnered open bit lines. */
  readonly usableBits: number;
  readonly lostBits: number;
  /** Mat outline area (m²). */
  readonly area: number;
  /** Area of its cells = bits × cell footprint (m²). */
  readonly cellArea: number;
  readonly cellFootprint: number;
  readonly bitlineLength: number;
  readonly wordlineLength: number;
  readonly storageCapacitance: number;
  readonly bitlineCapacitance: BitlineCapacitance;
  readonly read: ChargeSharingRead | GainCellRead;
  /** Signal the sense amplifier can count on (V): min(ΔV1, ΔV0) for 1T1C, (ΔV1 − ΔV0)/2 for gain cells. */
  readonly senseSignal: number;
  /** Sense signal at the end of a refresh window of leakage (V). */
  readonly senseSignalAfterRefresh: number;
  /** Sense amplifiers serving the mat's bit lines. */
  readonly senseAmpCount: number;
  /** Pelgrom σ of the sense-amplifier offset (V). */
  readonly offsetSigma: number;
  /** k·σ (V). */
  readonly offsetBudget: number;
  readonly noiseAllowance: number;
  /** Offset budget and noise stacked (V). */
  readonly requiredSignal: number;
  /** senseSignal − requiredSignal (V). */
  readonly senseMargin: number;
  /** senseSignalAfterRefresh − requiredSignal (V): the figure the margin check uses. */
  readonly senseMarginAtRefresh: number;
  /** Cell leakage at the operating temperature (A). */
  readonly leakage: number;
  /** How far a stored 1 may droop before the margin reaches zero (V). */
  readonly allowedDroop: number;
  /** Time to that droop (s). */
  readonly retentionTime: number;
  readonly wordlineResistance: number;
  readonly wordlineCapacitance: number;
  /** 50 % word-line delay, driver plus distributed RC (s). */
  readonly wordlineDelay: number;
  readonly bitlineResistance: number;
  /** 50 % bit-line development time (s); the sense time for gain cells. */
  readonly bitlineDelay: number;
  readonly activationEnergy: ActivationEnergy;
  /** Width available to one sense amplifier along its strip (m). */
  readonly senseAmpPitchBudget: number;
  readonly senseAmpFits: boolean;
}

/**
 * One mat of the floorplan: who it is, how well it is served, and its figures. Reports keep their mats
 * in a {@link MatTable}; this object is made for a mat when one is asked for.
 */
export interface MatReport {
  readonly matId: string;
  readonly name: string;
  /** Bit lines that reach no sense-amplifier strip. */
  readonly unsensedBitlines: number;
  /** Word lines that reach no driver. */
  readonly undrivenWordlines: number;
  /** Its physics, shared with every mat of the same kind. */
  readonly figures: MatFigures;
}

/** Refresh burden of the whole floorplan. */
export interface RefreshFigures {
  /** Rows to refresh: word lines of mats activated together counted once (mats in one band share a row). */
  readonly rows: number;
  /** tREFI (s). */
  readonly interval: number;
  readonly rowsPerCommand: number;
  /** tRFC (s). */
  readonly cycleTime: number;
  /** tRFC / tREFI. */
  readonly busyFraction: number;
  /** Average refresh power (W). */
  readonly power: number;
}

/** Whole-design figures (SI). */
export interface Totals {
  readonly matCount: number;
  readonly bits: number;
  readonly usableBits: number;
  readonly lostBits: number;
  /** Area of the bounding box of every block (m²): what the floorplan occupies on the die. */
  readonly totalArea: number;
  /** Sum of the blocks' own areas (m²); less than totalArea when there are gaps. */
  readonly placedArea: number;
  /** placedArea split by block type: mats, each kind of strip, decoders, spacers (m²). */
  readonly areaByType: Readonly<Record<BlockType, number>>;
  /** Sum of the usable cells' footprints (m²). */
  readonly cellArea: number;
  /** cellArea / totalArea. */
  readonly arrayEfficiency: number;
  /** totalArea / usable bits (m²). */
  readonly areaPerBit: number;
  /** areaPerBit / F². */
  readonly areaPerBitInF2: number;
  /** Sense amplifiers in the design; sets the k of the offset budget. */
  readonly senseAmpCount: number;
  /** k in k·σ. */
  readonly offsetSigmaMultiplier: number;
  /** Smallest sense signal of any mat (V), or NaN without mats. */
  readonly worstSenseSignal: number;
  readonly worstSenseSignalMatId: string | null;
  /** Its user-visible name (its id when unnamed), as messages and exports name mats. */
  readonly worstSenseSignalMatName: string | null;
  /** Smallest margin at the end of the refresh window (V), or NaN without mats. */
  readonly worstSenseMargin: number;
  readonly worstSenseMarginMatId: string | null;
  readonly worstSenseMarginMatName: string | null;
  /** Shortest retention time of any mat (s), or NaN without mats. */
  readonly shortestRetention: number;
  /** Longest word-line delay (s), or NaN without mats. */
  readonly worstWordlineDelay: number;
  readonly refresh: RefreshFigures;
}

export type Severity = 'error' | 'warning';

export const FINDING_KINDS = [
  'unsensedBitlines',
  'undrivenWordlines',
  'overlap',
  'storedHighLimited',
  'senseMargin',
  'senseAmpPitch',
  'retention',
  'openBitlineEdge',
  'noRowDecoder',
  'noColumnDecoder',
  'backToBackStrips',
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
  /** Every mat, column-wise (see matTable.ts); `matAt(report.mats, k)` gives one as an object. */
  readonly mats: MatTable;
  readonly totals: Totals;
  readonly storedHigh: StoredHighLevel;
  readonly findings: readonly Finding[];
}
