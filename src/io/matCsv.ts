import { matAt, MAT_FIGURE_CATALOGUE, type MatFigureEntry, type MatReport, type Report } from '../engine';

/** One CSV column: header (with its unit) and how to read it from a mat (SI). */
interface Column {
  readonly header: string;
  readonly value: (m: MatReport) => string | number;
}

/**
 * The figure columns come from the catalogue (engine/figures): every entry with a `csvHeader`, in catalogue
 * order. Entries that share a header share the column, each filling it for the mats of its read style
 * (a 1T1C mat's signal, a gain cell's drop); a figure the mat does not have leaves the field empty.
 */
function figureColumns(): Column[] {
  const byHeader = new Map<string, MatFigureEntry[]>();
  for (const entry of MAT_FIGURE_CATALOGUE) {
    if (entry.csvHeader === undefined) continue;
    const shared = byHeader.get(entry.csvHeader);
    if (shared) shared.push(entry);
    else byHeader.set(entry.csvHeader, [entry]);
  }
  return [...byHeader].map(([header, entries]) => ({
    header,
    value: (m) => {
      const entry = entries.find((e) => e.read === undefined || e.read === m.figures.read.kind);
      return entry ? entry.value(m.figures) : '';
    },
  }));
}

const COLUMNS: readonly Column[] = [
  { header: 'name', value: (m) => m.name || m.matId },
  { header: 'mat_id', value: (m) => m.matId },
  { header: 'cell_id', value: (m) => m.figures.cellId },
  { header: 'architecture', value: (m) => m.figures.architecture },
  ...figureColumns(),
  { header: 'unsensed_bitlines', value: (m) => m.unsensedBitlines },
  { header: 'undriven_wordlines', value: (m) => m.undrivenWordlines },
];

/** Quotes a field when it holds a comma, quote or line break (RFC 4180). */
function field(value: string | number): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/**
 * Per-mat figures as CSV (RFC 4180, CRLF line ends), SI units named in each header; a non-finite figure
 * is left empty.
 */
export function matFiguresCsv(report: Report): string {
  const lines = [COLUMNS.map((c) => c.header).join(',')];
  for (let k = 0; k < report.mats.count; k++) {
    const m = matAt(report.mats, k);
    lines.push(COLUMNS.map((c) => field(c.value(m))).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}
