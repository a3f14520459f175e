import type { FindingKind } from '../evaluation/report';
import type { FigureEntry, Working } from './figure';

/**
 * The figures that compare one partition (a bank) with another: the explorer computes them for every
 * sweep point (fast, in closed form) and the variants table reads them from evaluate()'s report, and a
 * test keeps the two equal. SI units throughout.
 */
export interface PartitionFigures {
  readonly matCount: number;
  readonly usableBits: number;
  /** Bounding box of the whole bank (m²). */
  readonly totalArea: number;
  /** Usable bits × cell footprint (m²). */
  readonly cellArea: number;
  /** totalArea / usableBits (m²). */
  readonly areaPerBit: number;
  readonly areaPerBitInF2: number;
  /** cellArea / totalArea. */
  readonly arrayEfficiency: number;
  /** Worst net sense margin after a refresh window (V). */
  readonly senseMargin: number;
  /** Sense signal left after a refresh window, of the worst mat (V). */
  readonly senseSignalAtRefresh: number;
  /** Offset and noise stacked, of the worst mat (V). */
  readonly requiredSignal: number;
  /** Slowest word line (s). */
  readonly wordlineDelay: number;
  /** Its resistance (Ω) and capacitance (F). */
  readonly wordlineResistance: number;
  readonly wordlineCapacitance: number;
  /** Highest activation energy per bit of any mat (J), and that mat's activation energy (J) and cells per word line. */
  readonly activationEnergyPerBit: number;
  readonly activationEnergy: number;
  readonly cellsPerWordline: number;
  /** Longest tRCD of any mat (s), and the steps it adds up in that mat (s). */
  readonly rowToColumnDelay: number;
  readonly wordlineTurnOn: number;
  readonly senseFireWait: number;
  readonly latchTime: number;
  /** Longest tRC of any mat (s), and its tRAS and tRP (s). */
  readonly rowCycleTime: number;
  readonly rowActiveTime: number;
  readonly rowPrechargeTime: number;
  /** Shortest retention (s). */
  readonly retentionTime: number;
  /** Shortest weakest-cell retention of the die (s): what the retention check compares with tREFW. */
  readonly weakestRetentionTime: number;
  /** tRFC (s), tREFI (s) and tRFC / tREFI. */
  readonly refreshCycleTime: number;
  readonly refreshInterval: number;
  readonly refreshBusyFraction: number;
  /** Average refresh power (W). */
  readonly refreshPower: number;
  /** Die yield with the repair settings (NaN when the sweep did not ask for yield). */
  readonly dieYield: number;
  /** Probability that every repair domain of the die is repaired. */
  readonly repairProbability: number;
  /** Redundancy area of the bank: spares, fuses and comparators (m²). */
  readonly redundancyArea: number;
  /** (bank area + redundancy) / usable bits (m²). */
  readonly areaPerBitWithRedundancy: number;
  readonly goodDiesPerWafer: number;
  /** Spare rows and columns per repair domain the yield figures assume. */
  readonly spareRows: number;
  readonly spareColumns: number;
  /** Kinds of check that report an error, and a warning, sorted. */
  readonly errorKinds: readonly FindingKind[];
  readonly warningKinds: readonly FindingKind[];
}

/** The numeric comparison figures. */
export type FigureKey = {
  [K in keyof PartitionFigures]: PartitionFigures[K] extends number ? K : never;
}[keyof PartitionFigures];

/** Values of the design (or sweep) a figure came from that its explanation names. */
export interface FigureContext {
  readonly featureSize: number;
  readonly wordlineDriverResistance: number;
  readonly refreshWindow: number;
}

/**
 * Where the app offers a comparison figure: an explorer chart axis, a row of the explorer's point card, a
 * row of the variants table. The sweep's points CSV writes every figure of the catalogue.
 */
export type FigureView = 'chartAxis' | 'pointCard' | 'variantsTable';

/** Offered on a chart axis, on the point card and in the variants table. */
export const EVERY_VIEW: readonly FigureView[] = ['chartAxis', 'pointCard', 'variantsTable'];

/** A comparison figure of a bank: how to show it, where, which way is better, and how it explains itself. */
export interface BankFigureEntry<Key extends FigureKey = FigureKey> extends FigureEntry<Key> {
  /** Which way is better; 'neither' for sizes that only describe a partition (mats, bits, bank area). */
  readonly better: 'lower' | 'higher' | 'neither';
  /** The views that list it, each in catalogue order; empty for figures only explanations and the CSV read. */
  readonly offeredIn: readonly FigureView[];
  /**
   * A yield figure: a sweep has it only when it assessed yield (spares swept), so the point card lists it
   * only then. The variants table always has it (the design's repair settings).
   */
  readonly needsYield?: true;
  readonly explain: (figures: PartitionFigures, context: FigureContext) => Working;
}

/** Declares one catalogue entry, keeping its key as a literal type. */
export const bankFigure = <const Key extends FigureKey>(entry: BankFigureEntry<Key>): BankFigureEntry<Key> =>
  entry;
