import type { GainRead } from '../../model/cell';
import { isGainCell } from '../../model/cellBasics';
import type { Design } from '../../model/design';
import type { ChargeSharingRead, GainCellRead, MatFigures, MatReport, Report } from '../evaluation/report';
import type { FigureEntry, ScaledColumn, Working } from './figure';

/** Panel groups of the per-mat figures, in display order. */
export const MAT_FIGURE_GROUPS = ['Sensing', 'Retention and speed', 'Energy', 'Area'] as const;
export type MatFigureGroup = (typeof MAT_FIGURE_GROUPS)[number];

/** Read style a figure belongs to, when it belongs to one: 1T1C charge sharing or a gain cell's read current. */
export type ReadStyle = MatFigures['read']['kind'];

interface MatFigureBase<Key extends string> extends FigureEntry<Key> {
  /** The figure of one mat (SI). */
  readonly value: (figures: MatFigures) => number;
  /** Only mats of this read style have the figure; the JSON summary puts it under `read`. */
  readonly read?: ReadStyle;
  /** Column header in the per-mat CSV; entries sharing a header share the column (one applies per mat). */
  readonly csvHeader?: string;
  /** Column in the CLI's mat table; entries sharing a header share the column. */
  readonly cli?: ScaledColumn;
}

/** A per-mat figure: shown in a panel group with its explanation, or (group null) only exported. */
export type MatFigureEntry<Key extends string = string> = MatFigureBase<Key> &
  (
    | {
        readonly group: MatFigureGroup;
        readonly explain: (mat: MatReport, design: Design, report: Report) => Working;
      }
    | { readonly group: null; readonly explain?: undefined }
  );

/** Declares one catalogue entry, keeping its key as a literal type. */
export const matFigure = <const Key extends string>(entry: MatFigureEntry<Key>): MatFigureEntry<Key> => entry;

/** The 1T1C read of a mat; only called for figures whose entry says `read: 'chargeSharing'`. */
export function chargeSharingRead(f: MatFigures): ChargeSharingRead {
  if (f.read.kind !== 'chargeSharing') throw new Error('a charge-sharing figure asked of a gain cell');
  return f.read;
}

/** The gain-cell read of a mat; only called for figures whose entry says `read: 'gainRead'`. */
export function gainCellRead(f: MatFigures): GainCellRead {
  if (f.read.kind !== 'gainRead') throw new Error('a gain-cell figure asked of a 1T1C mat');
  return f.read;
}

/** A 1T1C read value, NaN for a gain cell. */
export const chargeSharingValue =
  (pick: (r: ChargeSharingRead) => number) =>
  (f: MatFigures): number =>
    f.read.kind === 'chargeSharing' ? pick(f.read) : Number.NaN;

/** A gain-cell read value, NaN for a 1T1C mat. */
export const gainCellValue =
  (pick: (r: GainCellRead) => number) =>
  (f: MatFigures): number =>
    f.read.kind === 'gainRead' ? pick(f.read) : Number.NaN;

/**
 * How long a cell read by current drives its line before sensing (s): a gain cell's own sense time, or
 * the array's sense-fire time for 4T and 6T cells (as matPhysics reads it).
 */
export function currentReadTime(f: MatFigures, design: Design): number {
  return isGainCell(f.cellKind) ? design.process.gainCellSenseTime : design.operating.senseFireTime;
}

/** The read-path values of a mat's cell (cells read by current), or undefined. */
export function readPathOf(f: MatFigures, design: Design): GainRead | undefined {
  return design.cells.find((c) => c.id === f.cellId)?.gainRead ?? undefined;
}

/**
 * The level a cell read by current holds for a 1 (V): the full supply for a static 6T cell, else the
 * stored-1 level less the write word line's coupling (gain cells).
 */
export function currentReadLevel(f: MatFigures, design: Design, storedHigh: number): number {
  if (f.cellKind === 'sram-6t') return design.process.arrayVoltage;
  const coupling = f.read.kind === 'gainRead' ? f.read.writeCouplingLoss : 0;
  return Math.max(0, storedHigh - coupling);
}
