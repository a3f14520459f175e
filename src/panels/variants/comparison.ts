import type { FigureKey } from '../../engine';

/**
 * How the variants table compares a value with the edited variant's: a plain percentage (never
 * scientific notation), a direction arrow and a verdict in words, so the comparison reads without colour.
 */

/**
 * Figures that grow with the size of a design; "per bit" divides them by its usable bits, and says which
 * way is better per bit (less area and power per bit is better; mats per bit is neither).
 */
export const PER_BIT_FIGURES: ReadonlyMap<FigureKey, 'lower' | 'neither'> = new Map<
  FigureKey,
  'lower' | 'neither'
>([
  ['totalArea', 'lower'],
  ['matCount', 'neither'],
  ['refreshPower', 'lower'],
  ['redundancyArea', 'lower'],
]);

/** Mats are counted per this many usable bits when "per bit" is on (1 Mib): per bit would be a millionth. */
export const MATS_PER = 2 ** 20;

/**
 * The change from `reference` to `value` as a plain percentage: "+12.3 %", "−0.4 %", "+1,250 %"; one
 * decimal below 100 %, none above; empty when either is not a finite number or the reference is zero.
 */
export function percentChange(value: number, reference: number): string {
  if (!Number.isFinite(value) || !Number.isFinite(reference) || reference === 0) return '';
  const percent = ((value - reference) / Math.abs(reference)) * 100;
  const size = Math.abs(percent);
  const digits = size < 100 ? 1 : 0;
  const text = size.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
  if (text === (0).toFixed(digits)) return '±0.0 %';
  return `${percent > 0 ? '+' : '−'}${text} %`;
}

export type Verdict = 'better' | 'worse' | 'changed' | 'none';

/**
 * Whether `value` is better than `reference` for a figure where lower (or higher) is better. A variant
 * with no usable bits has nothing to compare: its verdict is none, whatever its numbers.
 */
export function verdictOf(
  better: 'lower' | 'higher' | 'neither',
  value: number,
  reference: number,
  comparable: boolean,
): Verdict {
  if (!comparable || !Number.isFinite(value) || !Number.isFinite(reference)) return 'none';
  if (better === 'neither') return 'changed';
  if (value === reference) return 'none';
  return (better === 'lower' ? value < reference : value > reference) ? 'better' : 'worse';
}

/** The delta line: arrow of the change, the percentage and the verdict in words. */
export function deltaLine(value: number, reference: number, verdict: Verdict): string {
  const percent = percentChange(value, reference);
  if (!percent || verdict === 'none') return '';
  const arrow = value > reference ? '↑' : value < reference ? '↓' : '';
  return `${arrow} ${percent}${verdict === 'better' || verdict === 'worse' ? ` · ${verdict}` : ''}`;
}
