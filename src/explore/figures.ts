import {
  figuresAt,
  findMatReport,
  type FindingKind,
  type MatFigures,
  type MatTable,
  type Report,
} from '../engine';
import type { Quantity } from '../model/units';

/**
 * The figures that compare one partition with another: the explorer computes them for every sweep point
 * (fast, in closed form) and the variants table reads them from evaluate()'s report, and a test keeps
 * the two equal. SI units throughout.
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
  /** Shortest retention (s). */
  readonly retentionTime: number;
  /** tRFC (s), tREFI (s) and tRFC / tREFI. */
  readonly refreshCycleTime: number;
  readonly refreshInterval: number;
  readonly refreshBusyFraction: number;
  /** Average refresh power (W). */
  readonly refreshPower: number;
  /** Kinds of check that report an error, and a warning, sorted. */
  readonly errorKinds: readonly FindingKind[];
  readonly warningKinds: readonly FindingKind[];
}

export type FigureKey = {
  [K in keyof PartitionFigures]: PartitionFigures[K] extends number ? K : never;
}[keyof PartitionFigures];

/** How to show a figure and which way is better. */
export interface FigureInfo {
  readonly label: string;
  readonly quantity: Quantity;
  /** Which way is better; 'neither' for sizes that only describe a partition (mats, bits, bank area). */
  readonly better: 'lower' | 'higher' | 'neither';
}

export const FIGURE_INFO: Readonly<Record<FigureKey, FigureInfo>> = {
  matCount: { label: 'Mats', quantity: 'count', better: 'neither' },
  usableBits: { label: 'Usable bits', quantity: 'count', better: 'neither' },
  totalArea: { label: 'Bank area', quantity: 'area', better: 'neither' },
  cellArea: { label: 'Cell area', quantity: 'area', better: 'neither' },
  areaPerBit: { label: 'Area per bit', quantity: 'area', better: 'lower' },
  areaPerBitInF2: { label: 'Area per bit in F²', quantity: 'ratio', better: 'lower' },
  arrayEfficiency: { label: 'Array efficiency', quantity: 'percent', better: 'higher' },
  senseMargin: { label: 'Net sense margin', quantity: 'voltage', better: 'higher' },
  senseSignalAtRefresh: { label: 'Signal at refresh', quantity: 'voltage', better: 'higher' },
  requiredSignal: { label: 'Offset and noise', quantity: 'voltage', better: 'lower' },
  wordlineDelay: { label: 'Word-line delay', quantity: 'time', better: 'lower' },
  wordlineResistance: { label: 'Word-line resistance', quantity: 'resistance', better: 'lower' },
  wordlineCapacitance: { label: 'Word-line capacitance', quantity: 'capacitance', better: 'lower' },
  activationEnergyPerBit: { label: 'Activation energy per bit', quantity: 'energy', better: 'lower' },
  activationEnergy: { label: 'Energy per mat activation', quantity: 'energy', better: 'lower' },
  cellsPerWordline: { label: 'Cells per word line', quantity: 'count', better: 'neither' },
  retentionTime: { label: 'Shortest retention', quantity: 'time', better: 'higher' },
  refreshCycleTime: { label: 'Refresh cycle tRFC', quantity: 'time', better: 'lower' },
  refreshInterval: { label: 'Refresh interval tREFI', quantity: 'time', better: 'higher' },
  refreshBusyFraction: { label: 'Refresh busy fraction', quantity: 'percent', better: 'lower' },
  refreshPower: { label: 'Refresh power', quantity: 'power', better: 'lower' },
};

/** Figures the explorer can put on an axis, in menu order. */
export const AXIS_FIGURES = [
  'areaPerBit',
  'senseMargin',
  'wordlineDelay',
  'activationEnergyPerBit',
  'arrayEfficiency',
  'refreshBusyFraction',
  'areaPerBitInF2',
  'retentionTime',
  'refreshPower',
] as const satisfies readonly FigureKey[];
export type AxisFigure = (typeof AXIS_FIGURES)[number];

/** Figures the variants table compares, in row order. */
export const TABLE_FIGURES = [
  'areaPerBit',
  'areaPerBitInF2',
  'arrayEfficiency',
  'totalArea',
  'usableBits',
  'matCount',
  'senseMargin',
  'wordlineDelay',
  'activationEnergyPerBit',
  'retentionTime',
  'refreshBusyFraction',
  'refreshPower',
] as const satisfies readonly FigureKey[];

/** The figures of the mat with the largest value of `pick` (the first such mat), or undefined without mats. */
function largest(mats: MatTable, pick: (f: MatFigures) => number): MatFigures | undefined {
  let best: MatFigures | undefined;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    if (!best || pick(f) > pick(best)) best = f;
  }
  return best;
}

/** The comparison figures of an evaluated design. */
export function figuresFromReport(report: Report): PartitionFigures {
  const t = report.totals;
  const worstMargin = findMatReport(report, t.worstSenseMarginMatId ?? '');
  const slowest = largest(report.mats, (f) => f.wordlineDelay);
  const hungriest = largest(report.mats, (f) => f.activationEnergy.perBit);
  const kinds = (severity: 'error' | 'warning') =>
    [...new Set(report.findings.filter((f) => f.severity === severity).map((f) => f.kind))].sort();
  return {
    matCount: t.matCount,
    usableBits: t.usableBits,
    totalArea: t.totalArea,
    cellArea: t.cellArea,
    areaPerBit: t.usableBits > 0 ? t.areaPerBit : Number.NaN,
    areaPerBitInF2: t.usableBits > 0 ? t.areaPerBitInF2 : Number.NaN,
    arrayEfficiency: t.arrayEfficiency,
    senseMargin: t.worstSenseMargin,
    senseSignalAtRefresh: worstMargin?.figures.senseSignalAfterRefresh ?? Number.NaN,
    requiredSignal: worstMargin?.figures.requiredSignal ?? Number.NaN,
    wordlineDelay: t.worstWordlineDelay,
    wordlineResistance: slowest?.wordlineResistance ?? Number.NaN,
    wordlineCapacitance: slowest?.wordlineCapacitance ?? Number.NaN,
    activationEnergyPerBit: hungriest?.activationEnergy.perBit ?? Number.NaN,
    activationEnergy: hungriest?.activationEnergy.total ?? Number.NaN,
    cellsPerWordline: hungriest?.cellsPerWordline ?? Number.NaN,
    retentionTime: t.shortestRetention,
    refreshCycleTime: t.refresh.cycleTime,
    refreshInterval: t.refresh.interval,
    refreshBusyFraction: t.refresh.busyFraction,
    refreshPower: t.refresh.power,
    errorKinds: kinds('error'),
    warningKinds: kinds('warning'),
  };
}
