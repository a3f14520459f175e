import { csvField } from './csvField';
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

/** Mats written per piece of CSV text. */
const MATS_PER_PIECE = 2000;

/**
 * Per-mat figures as CSV (RFC 4180, CRLF line ends), SI units named in each header; a non-finite figure
 * is left empty. With `variant`, a first column names the variant (the CLI's --all). In pieces of a few
 * thousand rows, so that a whole die never needs one huge string; join them or make a Blob of them.
 */
export function* matFiguresCsvPieces(report: Report, variant?: string): Generator<string> {
  const lead = variant === undefined ? '' : `${csvField(variant)},`;
  yield `${variant === undefined ? '' : 'variant,'}${COLUMNS.map((c) => c.header).join(',')}\r\n`;
  for (let start = 0; start < report.mats.count; start += MATS_PER_PIECE) {
    let piece = '';
    const end = Math.min(report.mats.count, start + MATS_PER_PIECE);
    for (let k = start; k < end; k++) {
      const m = matAt(report.mats, k);
      piece += `${lead}${COLUMNS.map((c) => csvField(c.value(m))).join(',')}\r\n`;
    }
    yield piece;
  }
}

/** The whole CSV as one string (small designs, tests). */
export function matFiguresCsv(report: Report, variant?: string): string {
  return Array.from(matFiguresCsvPieces(report, variant)).join('');
}
