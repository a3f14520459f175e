import { explanationOf } from './figure';
import { bankMissingReason } from './missingReasons';
import { input, SOURCES, type Explanation } from './explanation';
import { FORMULAS } from './formulas';
import {
  bankFigure,
  EVERY_VIEW,
  type BankFigureEntry,
  type FigureContext,
  type FigureKey,
  type FigureView,
  type PartitionFigures,
} from './bankFigure';
import { BANK_TIMING_FIGURES } from './bankTimingFigures';
import { BANK_YIELD_FIGURES } from './bankYieldFigures';

/** An entry for a figure that is counted or measured from the floorplan. */
function countedFigure<const Key extends FigureKey>(
  key: Key,
  label: string,
  quantity: BankFigureEntry['quantity'],
  better: BankFigureEntry['better'],
  offeredIn: readonly FigureView[],
  formula = `${label} (counted)`,
): BankFigureEntry<Key> {
  return bankFigure({
    key,
    label,
    quantity,
    better,
    offeredIn,
    exportKey: null,
    explain: (f) => ({
      symbol: key,
      formula,
      inputs: [input('mats', 'mats', f.matCount, 'count')],
      method: 'Counted or measured from the floorplan.',
      source: SOURCES.common,
    }),
  });
}

/**
 * The catalogue of a bank's comparison figures (explorer axes, point card, variants table). The explorer
 * reaches the same numbers in closed form as evaluate() does for a built bank, and a test keeps them equal.
 */
export const BANK_FIGURE_CATALOGUE = [
  countedFigure('matCount', 'Mats', 'count', 'neither', ['variantsTable']),
  countedFigure('usableBits', 'Usable bits', 'count', 'neither', ['pointCard', 'variantsTable']),
  countedFigure(
    'totalArea',
    'Bank area',
    'area',
    'neither',
    ['variantsTable'],
    'A_total = width × height of the bank',
  ),
  countedFigure('cellArea', 'Cell area', 'area', 'neither', []),
  bankFigure({
    key: 'areaPerBit',
    label: 'Area per bit',
    quantity: 'area',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'A_bit',
      formula: FORMULAS.areaPerBit,
      inputs: [
        input('A_total', 'bank bounding box', f.totalArea, 'area'),
        input('bits', 'usable bits', f.usableBits, 'count'),
      ],
      method: 'Whole bank, periphery included, over every bit that can be read.',
      source: SOURCES.takahashi,
    }),
  }),
  bankFigure({
    key: 'areaPerBitInF2',
    label: 'Area per bit in F²',
    quantity: 'ratio',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f, ctx) => ({
      symbol: 'A_bit/F²',
      formula: FORMULAS.areaPerBitInF2,
      inputs: [
        input('A_bit', 'area per bit', f.areaPerBit, 'area'),
        input('F', 'feature size', ctx.featureSize, 'length'),
      ],
      method: 'Area per bit normalised to the feature size, comparable across nodes.',
      source: SOURCES.common,
    }),
  }),
  bankFigure({
    key: 'arrayEfficiency',
    label: 'Array efficiency',
    quantity: 'percent',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'η',
      formula: FORMULAS.arrayEfficiency,
      inputs: [
        input('A_cells', 'usable bits × cell footprint', f.cellArea, 'area'),
        input('A_total', 'bank bounding box', f.totalArea, 'area'),
      ],
      method: 'Share of the bank taken by usable storage cells.',
      source: SOURCES.takahashi,
    }),
  }),
  bankFigure({
    key: 'senseMargin',
    label: 'Net sense margin',
    quantity: 'voltage',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f, ctx) => ({
      symbol: 'M',
      formula: 'M = ΔV after a refresh window − (k·σ_offset ⊕ noise)',
      inputs: [
        input('ΔV', 'sense signal at the end of the window', f.senseSignalAtRefresh, 'voltage'),
        input('V_req', 'offset and noise stacked', f.requiredSignal, 'voltage'),
        input('tREFW', 'refresh window', ctx.refreshWindow, 'time'),
      ],
      method: 'Worst mat: the signal left after a window of leakage, less what the sense amplifier needs.',
      source: `${SOURCES.westeHarris}; ${SOURCES.pelgrom}`,
    }),
  }),
  countedFigure('senseSignalAtRefresh', 'Signal at refresh', 'voltage', 'higher', []),
  countedFigure('requiredSignal', 'Offset and noise', 'voltage', 'lower', []),
  bankFigure({
    key: 'wordlineDelay',
    label: 'Word-line delay',
    quantity: 'time',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f, ctx) => ({
      symbol: 't_wl',
      formula: FORMULAS.wordlineDelay,
      inputs: [
        input('R_drv', 'driver resistance', ctx.wordlineDriverResistance, 'resistance'),
        input('R_wl', 'word-line resistance', f.wordlineResistance, 'resistance'),
        input('C_wl', 'word-line capacitance', f.wordlineCapacitance, 'capacitance'),
      ],
      method: 'Slowest sub-word line; driver plus distributed RC, 50 % point.',
      source: SOURCES.rabaey,
    }),
  }),
  countedFigure('wordlineResistance', 'Word-line resistance', 'resistance', 'lower', []),
  countedFigure('wordlineCapacitance', 'Word-line capacitance', 'capacitance', 'lower', []),
  ...BANK_TIMING_FIGURES,
  bankFigure({
    key: 'activationEnergyPerBit',
    label: 'Activation energy per bit',
    quantity: 'energy',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'E_bit',
      formula: FORMULAS.energyPerBit,
      inputs: [
        input('E_act', 'energy of one mat activation', f.activationEnergy, 'energy'),
        input('M', 'cells per word line', f.cellsPerWordline, 'count'),
      ],
      method: 'Bit lines, word line and sense-amplifier latches of one activation, over the bits it opens.',
      source: `${SOURCES.common}; C·V² charging energy, ${SOURCES.rabaey}`,
    }),
  }),
  countedFigure('activationEnergy', 'Energy per mat activation', 'energy', 'lower', []),
  countedFigure('cellsPerWordline', 'Cells per word line', 'count', 'neither', []),
  bankFigure({
    key: 'retentionTime',
    label: 'Shortest retention, typical cell',
    quantity: 'time',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (_f, ctx) => ({
      symbol: 't_ret',
      formula: FORMULAS.retention,
      inputs: [input('tREFW', 'refresh window (must be shorter)', ctx.refreshWindow, 'time')],
      method: 'Shortest over the mats: time until the stored 1 droops to zero margin.',
      source: SOURCES.arrhenius,
    }),
  }),
  bankFigure({
    key: 'weakestRetentionTime',
    label: 'Shortest retention, weakest cell in the die',
    quantity: 'time',
    better: 'higher',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (_f, ctx) => ({
      symbol: 't_ret,weak',
      formula: 't_ret,weak = Cs·ΔV_allowed / I_weak,  I_weak of the weakest tail cell among the die’s cells',
      inputs: [input('tREFW', 'refresh window (must be shorter)', ctx.refreshWindow, 'time')],
      method:
        'Shortest over the mats; the retention check compares it with the refresh window (two-population retention).',
      source:
        'T. Hamamoto, S. Sugiura, S. Sawada, IEEE Trans. Electron Devices 45(6), 1998 (from memory); G. Blom, 1958 (from memory)',
    }),
  }),
  countedFigure('refreshCycleTime', 'Refresh cycle tRFC', 'time', 'lower', []),
  countedFigure('refreshInterval', 'Refresh interval tREFI', 'time', 'higher', []),
  bankFigure({
    key: 'refreshBusyFraction',
    label: 'Refresh busy fraction',
    quantity: 'percent',
    better: 'lower',
    offeredIn: EVERY_VIEW,
    exportKey: null,
    explain: (f) => ({
      symbol: 'tRFC/tREFI',
      formula: FORMULAS.refreshBusyFraction,
      inputs: [
        input('tRFC', 'refresh cycle time', f.refreshCycleTime, 'time'),
        input('tREFI', 'refresh interval', f.refreshInterval, 'time'),
      ],
      method: 'Share of time the bank cannot serve accesses.',
      source: SOURCES.jedec,
    }),
  }),
  bankFigure({
    key: 'refreshPower',
    label: 'Refresh power',
    quantity: 'power',
    better: 'lower',
    offeredIn: ['chartAxis', 'variantsTable'],
    exportKey: null,
    explain: (f, ctx) => ({
      symbol: 'P_ref',
      formula: FORMULAS.refreshPower,
      inputs: [
        input('E_act', 'energy of one mat activation', f.activationEnergy, 'energy'),
        input('tREFW', 'refresh window', ctx.refreshWindow, 'time'),
      ],
      method: 'Every word line of every mat activated once per window.',
      source: SOURCES.common,
    }),
  }),
  ...BANK_YIELD_FIGURES,
] as const satisfies readonly BankFigureEntry[];

const BY_KEY = new Map<FigureKey, BankFigureEntry>(BANK_FIGURE_CATALOGUE.map((e) => [e.key, e]));

/** The catalogue entry of a comparison figure. */
export function bankFigureEntry(key: FigureKey): BankFigureEntry {
  const entry = BY_KEY.get(key);
  if (!entry) throw new Error(`no bank figure "${key}"`);
  return entry;
}

/** The keys of the catalogue's figures that `view` lists, in catalogue order. */
export function figuresOfferedIn(view: FigureView): readonly FigureKey[] {
  return BANK_FIGURE_CATALOGUE.filter((e) => e.offeredIn.includes(view)).map((e) => e.key);
}

/** Figures the explorer can put on an axis, in menu order. */
export const AXIS_FIGURES = figuresOfferedIn('chartAxis');

/** Figures the variants table compares, in row order. */
export const TABLE_FIGURES = figuresOfferedIn('variantsTable');

/** Figures the explorer's point card lists, in order; those that need yield only when the sweep assessed it. */
export function pointCardFigures(withYield: boolean): readonly FigureKey[] {
  return BANK_FIGURE_CATALOGUE.filter(
    (e) => e.offeredIn.includes('pointCard') && (withYield || !e.needsYield),
  ).map((e) => e.key);
}

/** Formula, inputs and source of one comparison figure, for the variants table and the explorer's point card. */
export function explainFigure(key: FigureKey, f: PartitionFigures, ctx: FigureContext): Explanation {
  const entry = bankFigureEntry(key);
  const value = f[key];
  return explanationOf(
    entry,
    value,
    entry.explain(f, ctx),
    Number.isNaN(value) ? bankMissingReason(key, f) : undefined,
  );
}
