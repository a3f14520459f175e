import type { Quantity } from '../../model/units';
import type { Explanation } from './explanation';

/**
 * The shape every entry of the figure catalogue shares. A figure is written once, as one entry: its key,
 * the label people read, its quantity (which sets the unit everywhere), the panel group it is shown in,
 * the key it has in the JSON summary, and how it explains itself. Panels, the explorer, the variants
 * table, the JSON summary, the CSV and the CLI table all loop over the catalogue.
 */
export interface FigureEntry<Key extends string = string> {
  readonly key: Key;
  /** What a person reads beside the value: panel rows, menus, tables. */
  readonly label: string;
  /** Sets the unit and the formatting everywhere (SI inside, see model/units.ts). */
  readonly quantity: Quantity;
  /**
   * Key in the JSON summary, with its SI unit at the end (`senseMargin_V`); counts carry no suffix.
   * null: not exported.
   */
  readonly exportKey: string | null;
}

/** What an entry's explain() gives: the title, value and quantity come from the entry itself. */
export interface Working {
  /** Title when it differs from the entry's label for this subject (a gain cell's read bit line). */
  readonly title?: string;
  readonly symbol: string;
  readonly formula: string;
  readonly inputs: Explanation['inputs'];
  readonly method: string;
  readonly source: string;
}

/**
 * The full explanation of one figure from its entry, its value and its working; a NaN value (the figure
 * does not exist) carries `missingReason`.
 */
export function explanationOf(
  entry: FigureEntry,
  value: number,
  working: Working,
  missingReason?: string,
): Explanation {
  return {
    ...(Number.isNaN(value) && missingReason !== undefined ? { missingReason } : {}),
    title: working.title ?? entry.label,
    symbol: working.symbol,
    formula: working.formula,
    inputs: working.inputs,
    value,
    quantity: entry.quantity,
    method: working.method,
    source: working.source,
  };
}

/** A column of a people's table (the CLI): header and, when it is not formatQuantity(), the scale. */
export interface ScaledColumn {
  readonly header: string;
  /** SI prefix and decimals for a fixed scale (`'f', 2` prints fF with two decimals). */
  readonly scale?: { readonly prefix: string; readonly decimals: number };
}
