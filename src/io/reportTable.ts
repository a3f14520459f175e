import { allMats } from '../engine/matTable';
import type { MatReport, Report } from '../engine/report';
import type { Design } from '../model/design';
import { formatQuantity, formatScaled } from '../model/units';
import { countFindings, REPORT_CAUTION } from './summary';

/**
 * The report as plain text for a terminal (`npm run evaluate`): one row per mat, the totals in
 * engineering notation, the findings, then the caution. The JSON form is reportSummary() in summary.ts.
 */

/** Lays out rows under headers: the first `leftAligned` columns padded right, the rest right-aligned. */
function columns(
  headers: readonly string[],
  rows: readonly (readonly string[])[],
  leftAligned: number,
): string[] {
  const widths = headers.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: readonly string[]) =>
    cells
      .map((cell, i) => (i < leftAligned ? cell.padEnd(widths[i] ?? 0) : cell.padStart(widths[i] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(headers), ...rows.map(line)];
}

/**
 * Per-mat columns. For a gain cell there is no charge-transfer ratio, and ΔV1 / ΔV0 are the read-bit-line
 * drops for a stored 1 and a stored 0.
 */
const MAT_HEADERS = [
  'mat',
  'cells/BL',
  'cells/WL',
  'bits',
  'Cbl (fF)',
  'CTR',
  'ΔV1 (mV)',
  'ΔV0 (mV)',
  'signal (mV)',
  'margin (mV)',
  'unsensed BL',
  'undriven WL',
] as const;

function matRow(m: MatReport): string[] {
  const r = m.figures.read;
  const [ctr, high, low] =
    r.kind === 'chargeSharing'
      ? [formatScaled(r.chargeTransferRatio, '', 4), r.signalHigh, r.signalLow]
      : ['—', r.dropHigh, r.dropLow];
  return [
    m.matId,
    formatQuantity(m.figures.cellsPerBitline, 'count'),
    formatQuantity(m.figures.cellsPerWordline, 'count'),
    formatQuantity(m.figures.bits, 'count'),
    formatScaled(m.figures.bitlineCapacitance.total, 'f', 2),
    ctr,
    formatScaled(high, 'm', 1),
    formatScaled(low, 'm', 1),
    formatScaled(m.figures.senseSignal, 'm', 1),
    formatScaled(m.figures.senseMarginAtRefresh, 'm', 1),
    formatQuantity(m.unsensedBitlines, 'count'),
    formatQuantity(m.undrivenWordlines, 'count'),
  ];
}

function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? '' : 's'}`;
}

/** A worst-case figure with the mat it comes from, or a dash when there are no mats. */
function worstOf(value: string, matId: string | null): string {
  return matId === null ? '— (no mats)' : `${value} (${matId})`;
}

function totalsRows(design: Design, report: Report): [string, string][] {
  const t = report.totals;
  const r = t.refresh;
  const s = report.storedHigh;
  const q = formatQuantity;
  const stored = s.limitedByWordline
    ? `${q(s.level, 'voltage')}, limited by the word line (needs VPP ≥ ${q(s.wordlineHighNeeded, 'voltage')})`
    : `${q(s.level, 'voltage')} (full array voltage)`;
  return [
    ['mats', q(t.matCount, 'count')],
    ['bits', q(t.bits, 'count')],
    ['usable bits', q(t.usableBits, 'count')],
    ['total area (bounding box)', q(t.totalArea, 'area')],
    ['placed area (blocks summed)', q(t.placedArea, 'area')],
    ['cell area', q(t.cellArea, 'area')],
    ['array efficiency', q(t.arrayEfficiency, 'percent')],
    ['area per bit', q(t.areaPerBit, 'area')],
    ['area per bit in F²', `${q(t.areaPerBitInF2, 'ratio')} F²`],
    ['stored 1 level', stored],
    ['worst sense signal', worstOf(q(t.worstSenseSignal, 'voltage'), t.worstSenseSignalMatId)],
    ['worst margin after refresh window', worstOf(q(t.worstSenseMargin, 'voltage'), t.worstSenseMarginMatId)],
    ['shortest retention', t.matCount === 0 ? '— (no mats)' : q(t.shortestRetention, 'time')],
    ['worst word-line delay', t.matCount === 0 ? '— (no mats)' : q(t.worstWordlineDelay, 'time')],
    ['operating temperature', q(design.operating.temperature, 'temperature')],
    ['refresh interval tREFI', q(r.interval, 'time')],
    ['rows per refresh command', q(r.rowsPerCommand, 'count')],
    ['refresh cycle time tRFC', q(r.cycleTime, 'time')],
    ['refresh busy fraction', q(r.busyFraction, 'percent')],
    ['refresh power', q(r.power, 'power')],
  ];
}

/**
 * The report of `design` as plain text: a header, the mat table, the totals, the findings and the
 * caution, lines joined with "\n" and no trailing newline.
 */
export function reportTable(design: Design, report: Report): string {
  const out: string[] = [];
  const p = design.process;
  out.push(design.name);
  out.push(`process ${p.name} (${p.id}), F = ${formatQuantity(p.featureSize, 'length')}`);
  out.push('');
  out.push(`Mats (${formatQuantity(report.mats.count, 'count')})`);
  if (report.mats.count === 0) out.push('  none');
  else out.push(...columns(MAT_HEADERS, allMats(report.mats).map(matRow), 1).map((l) => `  ${l}`));
  out.push('');
  out.push('Totals');
  out.push(...columns(['figure', 'value'], totalsRows(design, report), 2).map((l) => `  ${l}`));
  out.push('');
  const { errors, warnings } = countFindings(report.findings);
  if (report.findings.length === 0) {
    out.push('Findings: none');
  } else {
    out.push(`Findings (${plural(errors, 'error')}, ${plural(warnings, 'warning')})`);
    for (const f of report.findings) out.push(`  ${f.severity.padEnd(7)}  ${f.kind}: ${f.message}`);
  }
  out.push('');
  out.push(`Caution: ${REPORT_CAUTION}`);
  return out.join('\n');
}
