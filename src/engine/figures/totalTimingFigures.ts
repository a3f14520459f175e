import { formatQuantity } from '../../model/units';
import { findMatReport } from '../evaluation/evaluate';
import type { MatFigures, Report } from '../evaluation/report';
import { input, SOURCES } from './explanation';
import { totalFigure } from './totalFigure';

const CHAIN = `JEDEC JESD79-4 (tRCD, tRAS, tRP, tRC); the first-order chain: ${SOURCES.common}`;
const HAMAMOTO =
  'T. Hamamoto, S. Sugiura, S. Sawada, IEEE Trans. Electron Devices 45(6), 1998 (from memory); G. Blom, 1958 (from memory)';

/** The figures of the mat a worst-case total comes from, or undefined when there is none. */
function matOf(report: Report, matId: string | null): MatFigures | undefined {
  return matId === null ? undefined : findMatReport(report, matId)?.figures;
}

/** Which mat a worst case comes from, for the explanation's method line. */
const fromMat = (name: string | null) => (name === null ? 'No mat has it.' : `Slowest mat: ${name}.`);

/** A worst-case figure with its mat for the CLI, or the dash when it does not exist. */
const withMat = (r: Report, value: number, name: string | null) => {
  if (r.totals.matCount === 0) return '— (no mats)';
  return name === null || Number.isNaN(value) ? '—' : `${formatQuantity(value, 'time')} (${name})`;
};

/**
 * Whole-floorplan row timing and weakest-cell retention: the slowest mat's tRCD and tRC, each explained by
 * the steps of the mat that has it, and the shortest weakest-cell retention of the die. NaN (shown "—" with
 * its reason) when no mat is sensed, or when a mat has no margin to lose.
 */
export const TOTAL_TIMING_FIGURES = [
  totalFigure({
    key: 'worstRowToColumnDelay',
    label: 'Slowest tRCD',
    quantity: 'time',
    group: 'Worst case',
    exportKey: 'worstRowToColumnDelay_s',
    cli: {
      label: 'slowest tRCD (array core)',
      text: (r) => withMat(r, r.totals.worstRowToColumnDelay, r.totals.worstRowToColumnDelayMatName),
    },
    value: (r) => r.totals.worstRowToColumnDelay,
    explain: (r) => {
      const t = matOf(r, r.totals.worstRowToColumnDelayMatId)?.timing;
      const nan = Number.NaN;
      return {
        symbol: 'tRCD_max',
        formula: 'tRCD_max = max over sensed mats of (t_on + t_fire + t_latch)',
        inputs: [
          input('t_on', 'word line to turn-on (that mat)', t?.wordlineOn ?? nan, 'time'),
          input('t_fire', 'development until the sense amplifier fires', t?.development ?? nan, 'time'),
          input('t_latch', 'latch (that mat)', t?.latch ?? nan, 'time'),
          input('mats', 'mats compared', r.totals.matCount, 'count'),
        ],
        method: `${fromMat(r.totals.worstRowToColumnDelayMatName)} First-order array core only (no decoding, no margins).`,
        source: CHAIN,
      };
    },
  }),
  totalFigure({
    key: 'worstRowCycleTime',
    label: 'Slowest tRC',
    quantity: 'time',
    group: 'Worst case',
    exportKey: 'worstRowCycleTime_s',
    cli: {
      label: 'slowest tRC (array core)',
      text: (r) => withMat(r, r.totals.worstRowCycleTime, r.totals.worstRowCycleTimeMatName),
    },
    value: (r) => r.totals.worstRowCycleTime,
    explain: (r) => {
      const t = matOf(r, r.totals.worstRowCycleTimeMatId)?.timing;
      const nan = Number.NaN;
      return {
        symbol: 'tRC_max',
        formula: 'tRC_max = max over sensed mats of (tRAS + tRP)',
        inputs: [
          input('tRAS', 'row active time (that mat)', t?.ras ?? nan, 'time'),
          input('tRP', 'row precharge time (that mat)', t?.rp ?? nan, 'time'),
          input('mats', 'mats compared', r.totals.matCount, 'count'),
        ],
        method: `${fromMat(r.totals.worstRowCycleTimeMatName)} ${
          r.totals.refresh.rowCycleTimeOverridden
            ? 'The refresh figures use the process’s tRC override instead.'
            : 'The refresh figures (tRFC, busy fraction) use it.'
        }`,
        source: CHAIN,
      };
    },
  }),
  totalFigure({
    key: 'shortestWeakestRetention',
    label: 'Shortest retention, weakest cell in the die',
    quantity: 'time',
    group: 'Worst case',
    exportKey: 'shortestWeakestRetention_s',
    cli: {
      label: 'shortest retention, weakest cell',
      text: (r) => withMat(r, r.totals.shortestWeakestRetention, r.totals.shortestWeakestRetentionMatName),
    },
    value: (r) => r.totals.shortestWeakestRetention,
    explain: (r, design) => {
      const f = matOf(r, r.totals.shortestWeakestRetentionMatId);
      const nan = Number.NaN;
      return {
        symbol: 't_ret,weak,min',
        formula: 't_ret,weak,min = min over refreshed mats of Cs·ΔV_allowed / I_weak',
        inputs: [
          input('Cs', 'storage capacitance (that mat)', f?.storageCapacitance ?? nan, 'capacitance'),
          input('ΔV_allowed', 'droop until its margin is zero', f?.allowedDroop ?? nan, 'voltage'),
          input('I_weak', 'weakest cell leakage in the die', f?.weakestLeakage ?? nan, 'current'),
          input('tREFW', 'refresh window it must exceed', design.operating.refreshWindow, 'time'),
        ],
        method: `${
          r.totals.shortestWeakestRetentionMatName === null
            ? 'No refreshed mat has it.'
            : `Mat: ${r.totals.shortestWeakestRetentionMatName}.`
        } The retention check compares it with the refresh window.`,
        source: HAMAMOTO,
      };
    },
  }),
] as const;
