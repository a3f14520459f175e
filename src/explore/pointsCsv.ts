import { shortProcessName } from '../designs/buildPartition';
import { BANK_FIGURE_CATALOGUE } from '../engine';
import { formatQuantity, QUANTITIES, type Quantity } from '../model/units';
import { infeasibleBecause, type FeasibilityLimits } from './chartData';
import type { SweepPoint, SweepRequest } from './sweep';

/** The unit a column is written in and the factor from SI to it. */
export interface DisplayUnit {
  readonly unit: string;
  readonly scale: number;
}

const NUMBER_THEN_UNIT = /^([-+]?\d[\d,]*\.?\d*(?:e[-+]?\d+)?)\s*(.*)$/i;

/**
 * The display unit of a column of SI values: the one units.ts would show their median in (so a column
 * of word-line delays reads in ns and one of retention times in ms), with the factor from SI to it.
 */
export function displayUnit(values: readonly number[], quantity: Quantity): DisplayUnit {
  if (quantity === 'count' || quantity === 'ratio') return { unit: '', scale: 1 };
  if (quantity === 'percent') return { unit: '%', scale: 100 };
  const magnitudes = values
    .filter((v) => Number.isFinite(v) && v !== 0)
    .map(Math.abs)
    .sort((a, b) => a - b);
  const median = magnitudes[Math.floor(magnitudes.length / 2)];
  const si = { unit: QUANTITIES[quantity].unit, scale: 1 };
  if (median === undefined) return si;
  const match = NUMBER_THEN_UNIT.exec(formatQuantity(median, quantity, 12));
  const shown = Number((match?.[1] ?? '').replace(/,/g, ''));
  if (!match || !(shown > 0)) return si;
  return { unit: match[2] ?? '', scale: 10 ** Math.round(Math.log10(shown / median)) };
}

/** Quotes a field when it holds a comma, quote or line break (RFC 4180). */
function field(value: string | number): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** Six significant digits: more than any first-order figure deserves, fewer than float noise. */
function rounded(value: number): number {
  return Number.isFinite(value) ? Number(value.toPrecision(6)) : Number.NaN;
}

/**
 * Every point of a sweep as CSV (RFC 4180, CRLF line ends): what partition it is, every figure in the
 * display unit its header names, whether it is feasible under the chart's limits and whether it is on the
 * Pareto front of the chart's axes, and why it is infeasible. A figure a point lacks is left empty.
 */
export function sweepPointsCsv(
  points: readonly SweepPoint[],
  request: SweepRequest,
  limits: FeasibilityLimits,
  onFront: ReadonlySet<number>,
): string {
  const units = new Map(
    BANK_FIGURE_CATALOGUE.map((entry) => [
      entry.key,
      displayUnit(
        points.map((p) => p.figures?.[entry.key] ?? Number.NaN),
        entry.quantity,
      ),
    ]),
  );
  const header = [
    'point',
    'cell',
    'process',
    'cells per bit line',
    'cells per word line',
    'mat rows',
    'mat columns',
    ...BANK_FIGURE_CATALOGUE.map((entry) => {
      const unit = units.get(entry.key)?.unit;
      return unit ? `${entry.label} (${unit})` : entry.label;
    }),
    'feasible',
    'on Pareto front',
    'why not feasible',
  ];
  const lines = [header.map(field).join(',')];
  for (const p of points) {
    const f = p.figures;
    const reasons = f ? infeasibleBecause(f, limits) : [p.problem ?? 'no plan'];
    const process = request.processes[p.processIndex];
    const row: (string | number)[] = [
      p.index,
      request.cells[p.cellIndex]?.name ?? '',
      process ? shortProcessName(process) : '',
      p.cellsPerBitline,
      p.cellsPerWordline,
      p.matRows,
      p.matColumns,
      ...BANK_FIGURE_CATALOGUE.map((entry) =>
        f ? rounded(f[entry.key] * (units.get(entry.key)?.scale ?? 1)) : Number.NaN,
      ),
      reasons.length === 0 ? 'yes' : 'no',
      onFront.has(p.index) ? 'yes' : 'no',
      reasons.join('; '),
    ];
    lines.push(row.map(field).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
