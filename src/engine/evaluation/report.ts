import type { BlockType } from '../../model/block';
import type { BitlineArchitecture, CellKind } from '../../model/cell';
import type { BitlineCapacitance } from '../physics/bitline';
import type { MatTable } from './matTable';
import type { RowTiming } from '../physics/rowTiming';
import type { StoredHighLevel } from '../physics/storedLevel';
import type { WordlineCapacitance, WordlineTiming } from '../physics/wordline';

/** 1T1C read: charge sharing between cell and bit line. Voltages in V. */
export interface ChargeSharingRead {
  readonly kind: 'chargeSharing';
  readonly chargeTransferRatio: number;
  /** Full rise of the bit line reading a stored 1, once charge sharing has settled (negative: the 1 reads as a 0). */
  readonly signalHigh: number;
  /** Full fall of the bit line reading a stored 0. */
  readonly signalLow: number;
  /** Full rise for a stored 1 that has leaked for a whole refresh window. */
  readonly signalHighAfterRefresh: number;
  /** Charge-sharing time constant τ (s). */
  readonly developmentTimeConstant: number;
  /** Share of the full signal developed when the sense amplifier fires: 1 − e^(−t/τ). */
  readonly developedShare: number;
}

/** Read by cell current (gain cells, 4T, 6T): current into a read bit line precharged to VDD. */
export interface GainCellRead {
  readonly kind: 'gainRead';
  /** True for 4T and 6T: the cell pulls one line of its own pair, the other sees leakage only. */
  readonly differential: boolean;
  /** Transistors in series on the read path (2T: 1; 3T, 4T, 6T: 2). */
  readonly seriesDevices: number;
  /** Stored-level loss when the write word line falls (gain cells) (V). */
  readonly writeCouplingLoss: number;
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
  /**
   * Cells that can be read: on bit lines that reach a sense amplifier (with a partner, for open arrays)
   * and on word lines that reach a driver; never negative.
   */
  readonly usableBits: number;
  /** bits − usableBits. */
  readonly lostBits: number;
  /** Bits on open bit lines whose sense amplifier has no partner line beyond its strip. */
  readonly unpartneredBits: number;
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
  /**
   * Signal once fully developed (V): min(ΔV1, ΔV0) of charge sharing for 1T1C; for current reads it grows
   * for as long as the sense time lasts, so full = developed.
   */
  readonly fullSenseSignal: number;
  /**
   * Signal developed when the sense amplifier fires, the one the margin uses (V): the full signal ×
   * (1 − e^(−t/τ)) for 1T1C, (ΔV1 − ΔV0)/2 for gain cells, ΔV1 − ΔV0 for 4T and 6T.
   */
  readonly senseSignal: number;
  /** Developed sense signal at the end of a refresh window of typical leakage (V). */
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
  /** senseSignal − requiredSignal (V); NaN when no bit line of the mat is sensed. */
  readonly senseMargin: number;
  /** senseSignalAfterRefresh − requiredSignal (V): the figure the margin check uses; NaN when unsensed. */
  readonly senseMarginAtRefresh: number;
  /** Typical cell leakage at the operating temperature (A). */
  readonly leakage: number;
  /** Leakage of the weakest cell on the die (two-population model) (A). */
  readonly weakestLeakage: number;
  /** How far a stored 1 may droop before the margin reaches zero (V). */
  readonly allowedDroop: number;
  /** Whether the cell's data leaks away (every kind but 6T SRAM). */
  readonly needsRefresh: boolean;
  /** Typical cell's time to that droop (s); NaN for a static cell or an unsensed mat. */
  readonly retentionTime: number;
  /** Weakest cell's time to that droop (s), checked against the refresh window; NaN as above. */
  readonly weakestRetentionTime: number;
  readonly wordlineResistance: number;
  /** Total word-line capacitance (F); its parts in wordlineCapacitanceParts. */
  readonly wordlineCapacitance: number;
  readonly wordlineCapacitanceParts: WordlineCapacitance;
  /** Level the word line rises to (V): VPP for 1T1C and 4T, VDD for gain-cell read lines and 6T. */
  readonly wordlineHighLevel: number;
  /** 50 % far-end word-line delay, driver plus distributed RC (s). */
  readonly wordlineDelay: number;
  /** Far-end word-line times to turn-on, 90 % and fall-off (s). */
  readonly wordlineTiming: WordlineTiming;
  readonly bitlineResistance: number;
  /** 50 % point of the bit-line development (τ·ln 2) for 1T1C; the sense time for current reads (s). */
  readonly bitlineDelay: number;
  /** The row timing chain; NaN steps when no bit line of the mat is sensed. */
  readonly timing: RowTiming;
  /** Standby power of the mat's cells (6T: bits × I_hold × VDD; 0 for dynamic cells) (W). */
  readonly standbyPower: number;
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
  /** The tRC used: computed (slowest mat's) or the process override (s). */
  readonly rowCycleTime: number;
  readonly rowCycleTimeOverridden: boolean;
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
  /** Sense amplifiers in the floorplan. */
  readonly senseAmpCount: number;
  /** Sense amplifiers the offset budget is spread over: senseAmpCount × floorplan copies per die. */
  readonly senseAmpsOnDie: number;
  /** k in k·σ, two-tailed over senseAmpsOnDie. */
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
  /** Shortest typical-cell retention time of any refreshed mat (s), or NaN without one. */
  readonly shortestRetention: number;
  /** Shortest weakest-cell retention time of any refreshed mat (s), or NaN without one. */
  readonly shortestWeakestRetention: number;
  /** The mat with the shortest weakest-cell retention (first of equals), or null without one. */
  readonly shortestWeakestRetentionMatId: string | null;
  readonly shortestWeakestRetentionMatName: string | null;
  /** Longest 50 % word-line delay (s), or NaN without mats. */
  readonly worstWordlineDelay: number;
  /** The mat with the slowest word line (first of equals), or null without mats. */
  readonly worstWordlineDelayMatId: string | null;
  readonly worstWordlineDelayMatName: string | null;
  /** Longest word-line delay to the access turn-on (s), or NaN without mats. */
  readonly worstWordlineTurnOn: number;
  /** Longest word-line delay to 90 % (s), or NaN without mats. */
  readonly worstWordlineNinety: number;
  /** Slowest sensed mat's tRCD (s), or NaN without one. */
  readonly worstRowToColumnDelay: number;
  /** The mat with that tRCD (first of equals), or null without a sensed mat. */
  readonly worstRowToColumnDelayMatId: string | null;
  readonly worstRowToColumnDelayMatName: string | null;
  /** Slowest sensed mat's tRC (s), or NaN without one: the row cycle refresh uses unless overridden. */
  readonly worstRowCycleTime: number;
  /** The mat with that tRC (first of equals), or null without a sensed mat. */
  readonly worstRowCycleTimeMatId: string | null;
  readonly worstRowCycleTimeMatName: string | null;
  /** Standby power of static (6T) cells (W): Σ bits·I_hold·VDD. */
  readonly standbyPower: number;
  /** Bits whose cells draw a hold current (static cells), the bits standbyPower is summed over. */
  readonly heldBits: number;
  /** Overlap area between mats, counted once in the cell area (m²). */
  readonly matOverlapArea: number;
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
