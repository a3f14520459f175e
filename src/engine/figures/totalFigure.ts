import type { Design } from '../../model/design';
import type { Report } from '../evaluation/report';
import type { FigureEntry, Working } from './figure';

/** Panel groups of the whole-design figures, in display order. */
export const TOTAL_FIGURE_GROUPS = ['Area', 'Worst case', 'Die scale', 'Refresh', 'Yield'] as const;
export type TotalFigureGroup = (typeof TOTAL_FIGURE_GROUPS)[number];

interface TotalFigureBase<Key extends string> extends FigureEntry<Key> {
  /** The figure of the whole design (SI). */
  readonly value: (report: Report, design: Design) => number;
  /** Row in the CLI's totals table: its label and, when formatQuantity() of the value is not enough, its text. */
  readonly cli?: { readonly label: string; readonly text?: (report: Report, design: Design) => string };
}

/** A whole-design figure: shown in a panel group with its explanation, or (group null) only exported/printed. */
export type TotalFigureEntry<Key extends string = string> = TotalFigureBase<Key> &
  (
    | { readonly group: TotalFigureGroup; readonly explain: (report: Report, design: Design) => Working }
    | { readonly group: null; readonly explain?: undefined }
  );

/** Declares one catalogue entry, keeping its key as a literal type. */
export const totalFigure = <const Key extends string>(entry: TotalFigureEntry<Key>): TotalFigureEntry<Key> =>
  entry;
