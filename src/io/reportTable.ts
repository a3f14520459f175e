import {
  allMats,
  MAT_FIGURE_CATALOGUE,
  TOTAL_FIGURE_CATALOGUE,
  type MatFigureEntry,
  type MatReport,
  type Report,
} from '../engine';
import type { Design } from '../model/design';
import { escapeControlCharacters } from '../model/messageText';
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
  // A loop, not Math.max(...rows): spreading 300,000 rows overflows the call stack.
  const widths = headers.map((h) => h.length);
  for (const row of rows) {
    for (let i = 0; i < widths.length; i++) widths[i] = Math.max(widths[i] ?? 0, (row[i] ?? '').length);
  }
  const line = (cells: readonly string[]) =>
    cells
      .map((cell, i) => (i < leftAligned ? cell.padEnd(widths[i] ?? 0) : cell.padStart(widths[i] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(headers), ...rows.map(line)];
}

/**
 * Per-mat columns: the mat, then every catalogue entry with a `cli` column (engine/figures), then how it is
 * served. Entries sharing a header share the column: for a gain cell ΔV1 / ΔV0 are the read-bit-line
 * drops for a stored 1 and a stored 0, and a figure the mat does not have (its charge-transfer ratio) is a dash.
 */
interface MatColumn {
  readonly header: string;
  readonly text: (m: MatReport) => string;
}

function figureColumns(): MatColumn[] {
  const byHeader = new Map<string, MatFigureEntry[]>();
  for (const entry of MAT_FIGURE_CATALOGUE) {
    if (entry.cli === undefined) continue;
    const shared = byHeader.get(entry.cli.header);
    if (shared) shared.push(entry);
    else byHeader.set(entry.cli.header, [entry]);
  }
  return [...byHeader].map(([header, entries]) => ({
    header,
    text: (m) => {
      const entry = entries.find((e) => e.read === undefined || e.read === m.figures.read.kind);
      if (!entry) return '—';
      const value = entry.value(m.figures);
      const scale = entry.cli?.scale;
      return scale
        ? formatScaled(value, scale.prefix, scale.decimals)
        : formatQuantity(value, entry.quantity);
    },
  }));
}

const MAT_COLUMNS: readonly MatColumn[] = [
  { header: 'mat', text: (m) => m.name || m.matId },
  { header: 'id', text: (m) => m.matId },
  ...figureColumns(),
  { header: 'unsensed BL', text: (m) => formatQuantity(m.unsensedBitlines, 'count') },
  { header: 'undriven WL', text: (m) => formatQuantity(m.undrivenWordlines, 'count') },
];

function matRow(m: MatReport): string[] {
  return MAT_COLUMNS.map((c) => c.text(m));
}

function plural(count: number, word: string): string {
  return `${count} ${word}${count === 1 ? '' : 's'}`;
}

/** Every catalogue entry with a `cli` row (engine/figures), in catalogue order. */
function totalsRows(design: Design, report: Report): [string, string][] {
  const rows: [string, string][] = [];
  for (const entry of TOTAL_FIGURE_CATALOGUE) {
    if (!entry.cli) continue;
    const text = entry.cli.text
      ? entry.cli.text(report, design)
      : formatQuantity(entry.value(report, design), entry.quantity);
    rows.push([entry.cli.label, text]);
  }
  return rows;
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
  else {
    // A loop, not out.push(...lines): spreading 300,000 lines overflows the call stack.
    const lines = columns(
      MAT_COLUMNS.map((c) => c.header),
      allMats(report.mats).map(matRow),
      1,
    );
    for (const line of lines) out.push(`  ${line}`);
  }
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
  // Names and ids are the person's text: control characters in them are shown, never obeyed by the terminal.
  return out.map(escapeControlCharacters).join('\n');
}
