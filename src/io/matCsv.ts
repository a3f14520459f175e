import type { MatReport, Report } from '../engine/report';

/** One CSV column: header (with its unit) and how to read it from a mat's figures (SI). */
interface Column {
  readonly header: string;
  readonly value: (m: MatReport) => string | number;
}

const read = (m: MatReport, pick: 'high' | 'low'): number =>
  m.read.kind === 'chargeSharing'
    ? pick === 'high'
      ? m.read.signalHigh
      : m.read.signalLow
    : pick === 'high'
      ? m.read.dropHigh
      : m.read.dropLow;

const COLUMNS: readonly Column[] = [
  { header: 'mat_id', value: (m) => m.matId },
  { header: 'name', value: (m) => m.name },
  { header: 'cell_id', value: (m) => m.cellId },
  { header: 'architecture', value: (m) => m.architecture },
  { header: 'cells_per_bitline', value: (m) => m.cellsPerBitline },
  { header: 'cells_per_wordline', value: (m) => m.cellsPerWordline },
  { header: 'bits', value: (m) => m.bits },
  { header: 'usable_bits', value: (m) => m.usableBits },
  { header: 'area_m2', value: (m) => m.area },
  { header: 'bitline_capacitance_F', value: (m) => m.bitlineCapacitance.total },
  {
    header: 'charge_transfer_ratio',
    value: (m) => (m.read.kind === 'chargeSharing' ? m.read.chargeTransferRatio : ''),
  },
  { header: 'signal_or_drop_1_V', value: (m) => read(m, 'high') },
  { header: 'signal_or_drop_0_V', value: (m) => read(m, 'low') },
  { header: 'sense_signal_V', value: (m) => m.senseSignal },
  { header: 'offset_budget_V', value: (m) => m.offsetBudget },
  { header: 'noise_allowance_V', value: (m) => m.noiseAllowance },
  { header: 'sense_margin_at_refresh_V', value: (m) => m.senseMarginAtRefresh },
  { header: 'retention_s', value: (m) => m.retentionTime },
  { header: 'wordline_delay_s', value: (m) => m.wordlineDelay },
  { header: 'bitline_delay_s', value: (m) => m.bitlineDelay },
  { header: 'activation_energy_J', value: (m) => m.activationEnergy.total },
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
  for (const m of report.mats) lines.push(COLUMNS.map((c) => field(c.value(m))).join(','));
  return `${lines.join('\r\n')}\r\n`;
}
