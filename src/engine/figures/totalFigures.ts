import { totalMissingReason } from './missingReasons';
import type { Design } from '../../model/design';
import { formatQuantity } from '../../model/units';
import { findMatReport } from '../evaluation/evaluate';
import type { Report } from '../evaluation/report';
import { explanationOf } from './figure';
import { input, SOURCES, type Explanation } from './explanation';
import { FORMULAS } from './formulas';
import { TOTAL_AREA_FIGURES } from './totalAreaFigures';
import { TOTAL_DIE_SCALE_FIGURES } from './totalDieScaleFigures';
import {
  totalFigure,
  TOTAL_FIGURE_GROUPS,
  type TotalFigureEntry,
  type TotalFigureGroup,
} from './totalFigure';
import { TOTAL_REFRESH_FIGURES } from './totalRefreshFigures';
import { TOTAL_TIMING_FIGURES } from './totalTimingFigures';
import { TOTAL_YIELD_FIGURES } from './totalYieldFigures';

const worstOf = (name: string | null, extreme = 'Smallest') => `${extreme} over all mats (${name ?? '—'}).`;

/** The figures of the mat a worst case comes from, or undefined when there is none. */
const worstMat = (r: Report, matId: string | null) =>
  matId === null ? undefined : findMatReport(r, matId)?.figures;

/** A worst-case figure with the mat it comes from, or a dash when there are no mats (CLI text). */
const worstText = (value: string, matName: string | null) =>
  matName === null ? '— (no mats)' : `${value} (${matName})`;

/**
 * The catalogue of whole-design figures, in the order of the JSON summary; the panel shows the entries
 * that have a group, group by group in {@link TOTAL_FIGURE_GROUPS} order, and the CLI prints those with
 * a `cli` row, in this order.
 */
export const TOTAL_FIGURE_CATALOGUE = [
  ...TOTAL_AREA_FIGURES,
  ...TOTAL_DIE_SCALE_FIGURES,
  totalFigure({
    key: 'storedHigh',
    label: 'Stored-1 level',
    quantity: 'voltage',
    group: 'Worst case',
    exportKey: 'storedHighLevel_V',
    cli: {
      label: 'stored 1 level',
      text: (r) => {
        const s = r.storedHigh;
        const level = formatQuantity(s.level, 'voltage');
        return s.limitedByWordline
          ? `${level}, limited by the word line (needs VPP ≥ ${formatQuantity(s.wordlineHighNeeded, 'voltage')})`
          : `${level} (full array voltage)`;
      },
    },
    value: (r) => r.storedHigh.level,
    explain: (r, design) => {
      const p = design.process;
      return {
        symbol: 'V1',
        formula: 'V1 = min(VDD, VPP − Vt(V1)),  Vt(V) = Vt0 + γ(√(2φF + V) − √2φF)',
        inputs: [
          input('VDD', 'array voltage', p.arrayVoltage, 'voltage'),
          input('VPP', 'word-line high', p.wordlineHighVoltage, 'voltage'),
          input('Vt0', 'zero-bias threshold', p.accessThresholdVoltage, 'voltage'),
          input('γ', 'body-effect coefficient', p.bodyEffectCoefficient, 'sqrtVoltage'),
          input('2φF', 'surface potential', p.surfacePotential, 'voltage'),
          input('Vt(V1)', 'threshold at the stored level', r.storedHigh.threshold, 'voltage'),
          input('VPP_min', 'VPP for a full 1', r.storedHigh.wordlineHighNeeded, 'voltage'),
        ],
        method: 'Solved by bisection, since the threshold rises with the stored level (body effect).',
        source:
          'body-effect equation, Weste & Harris, CMOS VLSI Design, 4th ed., 2011, §2.4; VPP ≥ VDD + Vt rule (common practice)',
      };
    },
  }),
  totalFigure({
    key: 'worstSenseSignal',
    label: 'Worst sense signal',
    quantity: 'voltage',
    group: 'Worst case',
    exportKey: 'worstSenseSignal_V',
    cli: {
      label: 'worst sense signal',
      text: (r) =>
        worstText(formatQuantity(r.totals.worstSenseSignal, 'voltage'), r.totals.worstSenseSignalMatName),
    },
    value: (r) => r.totals.worstSenseSignal,
    explain: (r) => ({
      symbol: 'ΔV_min',
      formula: 'ΔV_min = min over sensed mats of the developed sense signal',
      inputs: [
        input(
          'ΔV',
          'developed signal (that mat)',
          worstMat(r, r.totals.worstSenseSignalMatId)?.senseSignal ?? Number.NaN,
          'voltage',
        ),
        input('mats', 'mats compared', r.totals.matCount, 'count'),
      ],
      method: worstOf(r.totals.worstSenseSignalMatName),
      source: SOURCES.westeHarris,
    }),
  }),
  totalFigure({
    key: 'worstSenseMargin',
    label: 'Worst margin at refresh',
    quantity: 'voltage',
    group: 'Worst case',
    exportKey: 'worstSenseMargin_V',
    cli: {
      label: 'worst margin after refresh window',
      text: (r) =>
        worstText(formatQuantity(r.totals.worstSenseMargin, 'voltage'), r.totals.worstSenseMarginMatName),
    },
    value: (r) => r.totals.worstSenseMargin,
    explain: (r, design) => {
      const f = worstMat(r, r.totals.worstSenseMarginMatId);
      return {
        symbol: 'M_min',
        formula: 'M_min = min over sensed mats of (ΔV′ − V_req),  ΔV′ = signal after a refresh window',
        inputs: [
          input(
            'ΔV′',
            'signal after the window (that mat)',
            f?.senseSignalAfterRefresh ?? Number.NaN,
            'voltage',
          ),
          input('V_req', 'offset and noise stacked (that mat)', f?.requiredSignal ?? Number.NaN, 'voltage'),
          input('target', 'minimum margin target', design.operating.minimumSenseMargin, 'voltage'),
        ],
        method: worstOf(r.totals.worstSenseMarginMatName),
        source: SOURCES.common,
      };
    },
  }),
  totalFigure({
    key: 'shortestRetention',
    label: 'Shortest retention, typical cell',
    quantity: 'time',
    group: 'Worst case',
    exportKey: 'shortestRetention_s',
    cli: {
      label: 'shortest retention, typical cell',
      text: (r) =>
        r.totals.matCount === 0 ? '— (no mats)' : formatQuantity(r.totals.shortestRetention, 'time'),
    },
    value: (r) => r.totals.shortestRetention,
    explain: (r, design) => {
      // Every mat leaks the same typical current, so the mat with the shortest weakest-cell retention
      // (smallest Cs·ΔV_allowed) also has the shortest typical one.
      const f = worstMat(r, r.totals.shortestWeakestRetentionMatId);
      const nan = Number.NaN;
      return {
        symbol: 't_ret,min',
        formula: `t_ret,min = min over refreshed mats of ${FORMULAS.retention.replace('t_ret = ', '')}`,
        inputs: [
          input('Cs', 'storage capacitance (that mat)', f?.storageCapacitance ?? nan, 'capacitance'),
          input('ΔV_allowed', 'droop until its margin is zero', f?.allowedDroop ?? nan, 'voltage'),
          input('I(T)', 'typical leakage at temperature', f?.leakage ?? nan, 'current'),
          input('T', 'temperature', design.operating.temperature, 'temperature'),
          input('tREFW', 'refresh window', design.operating.refreshWindow, 'time'),
        ],
        method: `${worstOf(r.totals.shortestWeakestRetentionMatName)} The retention check uses the weakest cell (below).`,
        source: SOURCES.arrhenius,
      };
    },
  }),
  totalFigure({
    key: 'worstWordlineDelay',
    label: 'Slowest word line',
    quantity: 'time',
    group: 'Worst case',
    exportKey: 'worstWordlineDelay_s',
    cli: {
      label: 'worst word-line delay',
      text: (r) =>
        r.totals.matCount === 0 ? '— (no mats)' : formatQuantity(r.totals.worstWordlineDelay, 'time'),
    },
    value: (r) => r.totals.worstWordlineDelay,
    explain: (r, design) => {
      const f = worstMat(r, r.totals.worstWordlineDelayMatId);
      const nan = Number.NaN;
      return {
        symbol: 't_wl,max',
        formula: `max over mats of t_wl,  ${FORMULAS.wordlineDelay}`,
        inputs: [
          input('R_drv', 'driver resistance', design.process.wordlineDriverResistance, 'resistance'),
          input('R_wl', 'sub-word-line resistance (that mat)', f?.wordlineResistance ?? nan, 'resistance'),
          input('C_wl', 'sub-word-line capacitance (that mat)', f?.wordlineCapacitance ?? nan, 'capacitance'),
        ],
        method: `Longest sub-word line, 50 % point. ${worstOf(r.totals.worstWordlineDelayMatName, 'Largest')}`,
        source: SOURCES.rabaey,
      };
    },
  }),
  ...TOTAL_TIMING_FIGURES,
  totalFigure({
    key: 'operatingTemperature',
    label: 'Operating temperature',
    quantity: 'temperature',
    group: null,
    exportKey: null,
    cli: { label: 'operating temperature' },
    value: (_r, design) => design.operating.temperature,
  }),
  ...TOTAL_REFRESH_FIGURES,
  totalFigure({
    key: 'storedHighThreshold',
    label: 'Threshold at the stored-1 level',
    quantity: 'voltage',
    group: null,
    exportKey: 'storedHighThreshold_V',
    value: (r) => r.storedHigh.threshold,
  }),
  totalFigure({
    key: 'wordlineHighNeeded',
    label: 'Word-line high for a full 1',
    quantity: 'voltage',
    group: null,
    exportKey: 'wordlineHighNeeded_V',
    value: (r) => r.storedHigh.wordlineHighNeeded,
  }),
  ...TOTAL_YIELD_FIGURES,
] as const;

/** Every whole-design figure's key. */
export type TotalFigureKey = (typeof TOTAL_FIGURE_CATALOGUE)[number]['key'];

const BY_KEY: ReadonlyMap<string, TotalFigureEntry> = new Map(TOTAL_FIGURE_CATALOGUE.map((e) => [e.key, e]));

/** The catalogue entry of a whole-design figure. */
export function totalFigureEntry(key: TotalFigureKey): TotalFigureEntry {
  const entry = BY_KEY.get(key);
  if (!entry) throw new Error(`no total figure "${key}"`);
  return entry;
}

/** The whole-design figures a panel shows, group by group in display order. */
export const TOTAL_FIGURE_PANEL: readonly {
  readonly title: TotalFigureGroup;
  readonly keys: readonly TotalFigureKey[];
}[] = TOTAL_FIGURE_GROUPS.map((title) => ({
  title,
  keys: TOTAL_FIGURE_CATALOGUE.filter((e) => e.group === title).map((e) => e.key),
}));

/** Keys of the whole-design figures a panel shows, in display order. */
export const TOTAL_FIGURES: readonly TotalFigureKey[] = TOTAL_FIGURE_PANEL.flatMap((g) => g.keys);

/** Explains one whole-design figure; undefined for a figure that is only exported. */
export function explainTotal(key: TotalFigureKey, report: Report, design: Design): Explanation | undefined {
  const entry = totalFigureEntry(key);
  if (!entry.explain) return undefined;
  const value = entry.value(report, design);
  return explanationOf(
    entry,
    value,
    entry.explain(report, design),
    Number.isNaN(value) ? totalMissingReason(key, report.totals) : undefined,
  );
}
