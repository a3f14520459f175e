import { matAt } from '../engine/matTable';
import type { MatReport, Report } from '../engine/report';

/** One CSV column: header (with its unit) and how to read it from a mat's figures (SI). */
interface Column {
  readonly header: string;
  readonly value: (m: MatReport) => string | number;
}

const read = (m: MatReport, pick: 'high' | 'low'): number =>
  m.figures.read.kind === 'chargeSharing'
    ? pick === 'high'
      ? m.figures.read.signalHigh
      : m.figures.read.signalLow
    : pick === 'high'
      ? m.figures.read.dropHigh
      : m.figures.read.dropLow;

const COLUMNS: readonly Column[] = [
  { header: 'mat_id', value: (m) => m.matId },
  { header: 'name', value: (m) => m.name },
  { header: 'cell_id', value: (m) => m.figures.cellId },
  { header: 'architecture', value: (m) => m.figures.architecture },
  { header: 'cells_per_bitline', value: (m) => m.figures.cellsPerBitline },
  { header: 'cells_per_wordline', value: (m) => m.figures.cellsPerWordline },
  { header: 'bits', value: (m) => m.figures.bits },
  { header: 'usable_bits', value: (m) => m.figures.usableBits },
  { header: 'area_m2', value: (m) => m.figures.area },
  { header: 'bitline_capacitance_F', value: (m) => m.figures.bitlineCapacitance.total },
  {
    header: 'charge_transfer_ratio',
    value: (m) => (m.figures.read.kind === 'chargeSharing' ? m.figures.read.chargeTransferRatio : ''),
  },
  { header: 'signal_or_drop_1_V', value: (m) => read(m, 'high') },
  { header: 'signal_or_drop_0_V', value: (m) => read(m, 'low') },
  { header: 'sense_signal_V', value: (m) => m.figures.senseSignal },
  { header: 'offset_budget_V', value: (m) => m.figures.offsetBudget },
  { header: 'noise_allowance_V', value: (m) => m.figures.noiseAllowance },
  { header: 'sense_margin_at_refresh_V', value: (m) => m.figures.senseMarginAtRefresh },
  { header: 'retention_s', value: (m) => m.figures.retentionTime },
  { header: 'wordline_delay_s', value: (m) => m.figures.wordlineDelay },
  { header: 'bitline_delay_s', value: (m) => m.figures.bitlineDelay },
  { header: 'activation_energy_J', value: (m) => m.figures.activationEnergy.total },
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
