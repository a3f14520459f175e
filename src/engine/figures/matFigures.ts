import { matMissingReason } from './missingReasons';
import type { Design } from '../../model/design';
import type { MatReport, Report } from '../evaluation/report';
import { explanationOf } from './figure';
import { input, SOURCES, type Explanation } from './explanation';
import { isGainCell } from '../../model/cellBasics';
import { matFigure, MAT_FIGURE_GROUPS, type MatFigureEntry, type MatFigureGroup } from './matFigure';
import { READ_FIGURES } from './matReadFigures';
import { MAT_SIZE_FIGURES, MAT_PARASITIC_FIGURES } from './matSizeFigures';
import { MAT_TIMING_FIGURES } from './matTimingFigures';
import { RETENTION_FIGURES } from './matRetentionFigures';
import { LINE_FIGURES } from './matLineFigures';
import { ENERGY_FIGURES } from './matEnergyFigures';

/**
 * The catalogue of per-mat figures, in the order of the JSON summary; the panel shows the entries that
 * have a group, group by group in {@link MAT_FIGURE_GROUPS} order and in this order within a group.
 */
export const MAT_FIGURE_CATALOGUE = [
  ...MAT_SIZE_FIGURES,
  matFigure({
    key: 'bitlineCapacitance',
    label: 'Bit-line capacitance',
    quantity: 'capacitance',
    group: 'Sensing',
    exportKey: 'bitlineCapacitance_F',
    csvHeader: 'bitline_capacitance_F',
    cli: { header: 'Cbl (fF)', scale: { prefix: 'f', decimals: 2 } },
    value: (f) => f.bitlineCapacitance.total,
    explain: (mat) => {
      const f = mat.figures;
      const cbl = f.bitlineCapacitance;
      return {
        title: f.read.kind === 'gainRead' ? 'Read-bit-line capacitance' : undefined,
        symbol: 'Cbl',
        formula: 'Cbl = N·Cj + N_wl·(Cbw + Cbb) + c_wire·L_bl + C_sa  (N_wl word lines crossed)',
        inputs: [
          input('N', 'cells per bit line', f.cellsPerBitline, 'count'),
          input('N_wl', 'word lines crossed', f.wordlineCount, 'count'),
          input('N·Cj', 'junction/contact', cbl.junction, 'capacitance'),
          input('N_wl·Cbw', 'coupling to word lines crossed', cbl.wordlineCoupling, 'capacitance'),
          input('N_wl·Cbb', 'coupling to bit lines', cbl.bitlineCoupling, 'capacitance'),
          input('c·L', `wire (L_bl = ${(f.bitlineLength * 1e6).toPrecision(4)} µm)`, cbl.wire, 'capacitance'),
          input('C_sa', 'sense-amplifier input', cbl.senseAmp, 'capacitance'),
        ],
        method: 'Sum of parallel parasitic capacitances (lumped), shown as a breakdown.',
        source: SOURCES.keethBaker,
      };
    },
  }),
  ...MAT_PARASITIC_FIGURES,
  ...READ_FIGURES,
  matFigure({
    key: 'senseAmpCount',
    label: 'Sense amplifiers',
    quantity: 'count',
    group: null,
    exportKey: 'senseAmps',
    value: (f) => f.senseAmpCount,
  }),
  matFigure({
    key: 'offsetSigma',
    label: 'Offset standard deviation',
    quantity: 'voltage',
    group: null,
    exportKey: 'offsetSigma_V',
    value: (f) => f.offsetSigma,
  }),
  matFigure({
    key: 'offsetBudget',
    label: 'Sense-amplifier offset budget',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'offsetBudget_V',
    csvHeader: 'offset_budget_V',
    value: (f) => f.offsetBudget,
    explain: (mat, design, report) => {
      const p = design.process;
      return {
        symbol: 'k·σ',
        formula: 'σ = A_VT / √(W·L);  k = Q⁻¹(failures / (2 · sense amps on the die))',
        inputs: [
          input('A_VT', 'matching coefficient', p.senseAmpMatchingCoefficient, 'matchingCoefficient'),
          input('W', 'transistor width', p.senseAmpTransistorWidth, 'length'),
          input('L', 'transistor length', p.senseAmpTransistorLength, 'length'),
          input('σ', 'offset standard deviation', mat.figures.offsetSigma, 'voltage'),
          input('k', 'σ multiplier', report.totals.offsetSigmaMultiplier, 'ratio'),
          input(
            'f',
            'sense amplifiers allowed to fail per die',
            design.operating.allowedSenseFailures,
            'count',
          ),
          input('n_sa', 'sense amplifiers in this floorplan', report.totals.senseAmpCount, 'count'),
          input('copies', 'floorplan copies per die', design.operating.floorplanCopiesPerDie, 'count'),
          input('N', 'sense amplifiers on the die', report.totals.senseAmpsOnDie, 'count'),
        ],
        method: `Pelgrom mismatch; k so that on average ${design.operating.allowedSenseFailures} amplifier(s) of the die fail; an offset beyond k·σ either way opposes one datum, so both tails count.`,
        source: `${SOURCES.pelgrom}; ${SOURCES.acklam}`,
      };
    },
  }),
  matFigure({
    key: 'noiseAllowance',
    label: 'Coupling-noise allowance',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'noiseAllowance_V',
    csvHeader: 'noise_allowance_V',
    value: (f) => f.noiseAllowance,
    explain: (mat, design) => {
      const f = mat.figures;
      const p = design.process;
      // As matPhysics: open bit lines and gain cells' single read lines reject less coupling as common mode.
      const folded = f.architecture !== 'open' && !isGainCell(f.cellKind);
      return {
        symbol: 'V_noise',
        formula: 'V_noise = κ · (Cbb / Cbl) · VDD / 2',
        inputs: [
          input(
            'κ',
            `unrejected share (${folded ? 'folded or paired' : 'open or single read line'})`,
            folded ? p.foldedNoiseFactor : p.openNoiseFactor,
            'ratio',
          ),
          input('Cbb', 'coupling to bit lines', f.bitlineCapacitance.bitlineCoupling, 'capacitance'),
          input('Cbl', 'bit-line capacitance', f.bitlineCapacitance.total, 'capacitance'),
          input('VDD', 'array voltage', p.arrayVoltage, 'voltage'),
        ],
        method:
          'Neighbours swing by VDD/2 and couple through Cbb; folded pairs reject more as common mode than open ones.',
        source: `capacitive divider (common practice); ${SOURCES.westeHarris}`,
      };
    },
  }),
  matFigure({
    key: 'requiredSignal',
    label: 'Offset and noise stacked',
    quantity: 'voltage',
    group: null,
    exportKey: 'requiredSignal_V',
    value: (f) => f.requiredSignal,
  }),
  matFigure({
    key: 'senseMargin',
    label: 'Net sense margin (fresh)',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'senseMargin_V',
    value: (f) => f.senseMargin,
    explain: (mat, design) => {
      const p = design.process;
      return {
        symbol: 'M',
        formula: `M = ΔV − V_req,  V_req = ${p.offsetStacking === 'linear' ? 'k·σ + V_noise' : '√((k·σ)² + V_noise²)'}`,
        inputs: [
          input('ΔV', 'sense signal', mat.figures.senseSignal, 'voltage'),
          input('V_req', 'offset and noise stacked', mat.figures.requiredSignal, 'voltage'),
        ],
        method: `Offset and noise stacked ${p.offsetStacking === 'linear' ? 'linearly (worst case)' : 'as a root sum of squares'}.`,
        source: 'H. Geib et al., IEEE JSSC, July 1992 (offset plus asymmetry stacking); common practice',
      };
    },
  }),
  matFigure({
    key: 'senseMarginAtRefresh',
    label: 'Net sense margin at refresh',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'senseMarginAtRefresh_V',
    csvHeader: 'sense_margin_at_refresh_V',
    cli: { header: 'margin (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: (f) => f.senseMarginAtRefresh,
    explain: (mat, design) => {
      const f = mat.figures;
      return {
        symbol: 'M_ref',
        formula: 'M_ref = ΔV(after droop I·tREFW/Cs) − V_req',
        inputs: [
          input('I', 'cell leakage at temperature', f.leakage, 'current'),
          input('tREFW', 'refresh window', design.operating.refreshWindow, 'time'),
          input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
          input('ΔV′', 'signal after the window', f.senseSignalAfterRefresh, 'voltage'),
          input('V_req', 'offset and noise stacked', f.requiredSignal, 'voltage'),
        ],
        method: 'A stored 1 leaks for a whole refresh window at constant current before it is read.',
        source: SOURCES.common,
      };
    },
  }),
  ...RETENTION_FIGURES,
  ...LINE_FIGURES,
  ...MAT_TIMING_FIGURES,
  ...ENERGY_FIGURES,
  matFigure({
    key: 'senseAmpPitchBudget',
    label: 'Sense-amplifier pitch budget',
    quantity: 'length',
    group: 'Area',
    exportKey: 'senseAmpPitchBudget_m',
    value: (f) => f.senseAmpPitchBudget,
    explain: (mat, design) => ({
      symbol: 'w_sa',
      formula: 'w_sa = BL pitch × (folded pair ? 2 : 1) × (strips at both ends ? 2 : 1)',
      inputs: [input('W_needed', 'width one amplifier needs', design.process.senseAmpWidth, 'length')],
      method: mat.figures.senseAmpFits
        ? 'The amplifier fits its pitch.'
        : 'The amplifier does NOT fit its pitch.',
      source: SOURCES.keethBaker,
    }),
  }),
] as const;

/** Every per-mat figure's key. */
export type MatFigureKey = (typeof MAT_FIGURE_CATALOGUE)[number]['key'];

const BY_KEY: ReadonlyMap<string, MatFigureEntry> = new Map(MAT_FIGURE_CATALOGUE.map((e) => [e.key, e]));

/** The catalogue entry of a per-mat figure. */
export function matFigureEntry(key: MatFigureKey): MatFigureEntry {
  const entry = BY_KEY.get(key);
  if (!entry) throw new Error(`no mat figure "${key}"`);
  return entry;
}

/** The per-mat figures a panel shows, group by group in display order. */
export const MAT_FIGURE_PANEL: readonly {
  readonly title: MatFigureGroup;
  readonly keys: readonly MatFigureKey[];
}[] = MAT_FIGURE_GROUPS.map((title) => ({
  title,
  keys: MAT_FIGURE_CATALOGUE.filter((e) => e.group === title).map((e) => e.key),
}));

/** Keys of the per-mat figures a panel shows, in display order. */
export const MAT_FIGURES: readonly MatFigureKey[] = MAT_FIGURE_PANEL.flatMap((g) => g.keys);

/** Whether a figure applies to this mat's read style. */
export function matFigureApplies(key: MatFigureKey, mat: MatReport): boolean {
  const read = matFigureEntry(key).read;
  return read === undefined || read === mat.figures.read.kind;
}

/** Explains one figure of one mat; undefined when it does not apply to the mat's read style or is only exported. */
export function explainMatFigure(
  key: MatFigureKey,
  mat: MatReport,
  design: Design,
  report: Report,
): Explanation | undefined {
  const entry = matFigureEntry(key);
  if (!entry.explain || !matFigureApplies(key, mat)) return undefined;
  const value = entry.value(mat.figures);
  return explanationOf(
    entry,
    value,
    entry.explain(mat, design, report),
    Number.isNaN(value) ? matMissingReason(key, mat.figures) : undefined,
  );
}
