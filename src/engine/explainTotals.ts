import type { Design } from '../model/design';
import { input, SOURCES, type Explanation } from './explanation';
import type { Report } from './report';

/**
 * Whole-design figures in their panel groups, in display order. The key list and its type derive from
 * the groups, so a figure cannot be explained but left out of the panel.
 */
export const TOTAL_FIGURE_GROUPS = [
  {
    title: 'Area',
    keys: [
      'bits',
      'usableBits',
      'totalArea',
      'blockAreas',
      'cellArea',
      'arrayEfficiency',
      'areaPerBit',
      'areaPerBitInF2',
    ],
  },
  {
    title: 'Worst case',
    keys: ['storedHigh', 'worstSenseSignal', 'worstSenseMargin', 'shortestRetention', 'worstWordlineDelay'],
  },
  {
    title: 'Refresh',
    keys: ['refreshInterval', 'rowsPerCommand', 'refreshCycleTime', 'refreshBusyFraction', 'refreshPower'],
  },
] as const;
export type TotalFigureKey = (typeof TOTAL_FIGURE_GROUPS)[number]['keys'][number];
export const TOTAL_FIGURES: readonly TotalFigureKey[] = TOTAL_FIGURE_GROUPS.flatMap((g) => g.keys);

/** Explains one whole-design figure. */
export function explainTotal(key: TotalFigureKey, report: Report, design: Design): Explanation {
  const t = report.totals;
  const r = t.refresh;
  const p = design.process;
  const o = design.operating;
  const usable = input('bits', 'usable bits', t.usableBits, 'count');
  const total = input('A_total', 'bounding box of all blocks', t.totalArea, 'area');
  const interval = input('tREFI', 'refresh interval', r.interval, 'time');
  const worstOf = (id: string | null) => `Smallest over all mats (mat ${id ?? '—'}).`;
  switch (key) {
    case 'bits':
      return {
        title: 'Total bits',
        symbol: 'bits',
        formula: 'bits = Σ bits of each mat',
        inputs: [input('mats', 'mats', t.matCount, 'count')],
        value: t.bits,
        quantity: 'count',
        method: 'Sum over mats.',
        source: SOURCES.common,
      };
    case 'usableBits':
      return {
        title: 'Usable bits',
        symbol: 'bits_u',
        formula: 'bits_u = bits − bits on unpartnered open bit lines',
        inputs: [
          input('bits', 'all bits', t.bits, 'count'),
          input('lost', 'lost at open-array edges', t.lostBits, 'count'),
        ],
        value: t.usableBits,
        quantity: 'count',
        method: 'Outermost open-bit-line mats have no partner for the bit lines that end at the array edge.',
        source: 'Takahashi et al., IEEE JSSC 36(11), 2001; Sekiguchi, Itoh et al., IEEE JSSC, 2002',
      };
    case 'totalArea':
      return {
        title: 'Total area',
        symbol: 'A_total',
        formula: 'A_total = width × height of the bounding box of all blocks',
        inputs: [input('A_placed', 'blocks summed (without gaps)', t.placedArea, 'area')],
        value: t.totalArea,
        quantity: 'area',
        method: 'Gaps between blocks count as used die area.',
        source: SOURCES.common,
      };
    case 'blockAreas':
      return {
        title: 'Area of the blocks',
        symbol: 'A_placed',
        formula: 'A_placed = Σ block areas, by type',
        inputs: [
          input('A_mats', 'mats', t.areaByType.mat, 'area'),
          input('A_sa', 'sense-amplifier strips', t.areaByType.senseAmpStrip, 'area'),
          input('A_swd', 'sub-word-line driver strips', t.areaByType.wordlineDriverStrip, 'area'),
          input('A_rdec', 'row decoders', t.areaByType.rowDecoder, 'area'),
          input('A_cdec', 'column decoders', t.areaByType.columnDecoder, 'area'),
          input('A_sp', 'spacers', t.areaByType.spacer, 'area'),
        ],
        value: t.placedArea,
        quantity: 'area',
        method: 'Each block’s own rectangle; gaps between blocks are not included.',
        source: SOURCES.common,
      };
    case 'cellArea':
      return {
        title: 'Cell area',
        symbol: 'A_cells',
        formula: 'A_cells = Σ usable bits × cell footprint',
        inputs: [usable],
        value: t.cellArea,
        quantity: 'area',
        method: 'Cell footprint = bit-line pitch × word-line pitch / occupancy.',
        source: SOURCES.common,
      };
    case 'arrayEfficiency':
      return {
        title: 'Array efficiency',
        symbol: 'η',
        formula: 'η = A_cells / A_total',
        inputs: [input('A_cells', 'usable cell footprints', t.cellArea, 'area'), total],
        value: t.arrayEfficiency,
        quantity: 'percent',
        method: 'Share of the floorplan taken by usable storage cells.',
        source: SOURCES.takahashi,
      };
    case 'areaPerBit':
      return {
        title: 'Area per bit',
        symbol: 'A_bit',
        formula: 'A_bit = A_total / usable bits',
        inputs: [total, usable],
        value: t.areaPerBit,
        quantity: 'area',
        method: 'Total area spread over every usable bit, periphery included.',
        source: SOURCES.takahashi,
      };
    case 'areaPerBitInF2':
      return {
        title: 'Area per bit in F²',
        symbol: 'A_bit/F²',
        formula: 'A_bit / F²',
        inputs: [
          input('A_bit', 'area per bit', t.areaPerBit, 'area'),
          input('F', 'feature size', p.featureSize, 'length'),
        ],
        value: t.areaPerBitInF2,
        quantity: 'ratio',
        method: 'Area per bit normalised to the feature size, comparable across nodes.',
        source: SOURCES.common,
      };
    case 'storedHigh':
      return {
        title: 'Stored-1 level',
        symbol: 'V1',
        formula: 'V1 = min(VDD, VPP − Vt(V1)),  Vt(V) = Vt0 + γ(√(2φF + V) − √2φF)',
        inputs: [
          input('VDD', 'array voltage', p.arrayVoltage, 'voltage'),
          input('VPP', 'word-line high', p.wordlineHighVoltage, 'voltage'),
          input('Vt0', 'zero-bias threshold', p.accessThresholdVoltage, 'voltage'),
          input('γ', 'body-effect coefficient', p.bodyEffectCoefficient, 'sqrtVoltage'),
          input('2φF', 'surface potential', p.surfacePotential, 'voltage'),
          input('Vt(V1)', 'threshold at the stored level', report.storedHigh.threshold, 'voltage'),
          input('VPP_min', 'VPP for a full 1', report.storedHigh.wordlineHighNeeded, 'voltage'),
        ],
        value: report.storedHigh.level,
        quantity: 'voltage',
        method: 'Solved by bisection, since the threshold rises with the stored level (body effect).',
        source:
          'body-effect equation, Weste & Harris, CMOS VLSI Design, 4th ed., 2011, §2.4; VPP ≥ VDD + Vt rule (common practice)',
      };
    case 'worstSenseSignal':
      return {
        title: 'Worst sense signal',
        symbol: 'ΔV_min',
        formula: 'ΔV_min = min over mats of the sense signal',
        inputs: [input('mats', 'mats', t.matCount, 'count')],
        value: t.worstSenseSignal,
        quantity: 'voltage',
        method: worstOf(t.worstSenseSignalMatId),
        source: SOURCES.westeHarris,
      };
    case 'worstSenseMargin':
      return {
        title: 'Worst margin at refresh',
        symbol: 'M_min',
        formula: 'M_min = min over mats of (ΔV after a refresh window − V_req)',
        inputs: [input('target', 'minimum margin target', o.minimumSenseMargin, 'voltage')],
        value: t.worstSenseMargin,
        quantity: 'voltage',
        method: worstOf(t.worstSenseMarginMatId),
        source: SOURCES.common,
      };
    case 'shortestRetention':
      return {
        title: 'Shortest retention',
        symbol: 't_ret,min',
        formula: 't_ret,min = min over mats of Cs·ΔV_allowed / I(T)',
        inputs: [
          input('tREFW', 'refresh window', o.refreshWindow, 'time'),
          input('T', 'temperature', o.temperature, 'temperature'),
        ],
        value: t.shortestRetention,
        quantity: 'time',
        method: 'Must exceed the refresh window.',
        source: SOURCES.arrhenius,
      };
    case 'worstWordlineDelay':
      return {
        title: 'Slowest word line',
        symbol: 't_wl,max',
        formula: 't_wl,max = max over mats of 0.69·R_drv·C_wl + 0.38·R_wl·C_wl',
        inputs: [input('R_drv', 'driver resistance', p.wordlineDriverResistance, 'resistance')],
        value: t.worstWordlineDelay,
        quantity: 'time',
        method: 'Longest sub-word line.',
        source: SOURCES.rabaey,
      };
    case 'refreshInterval':
      return {
        title: 'Refresh interval',
        symbol: 'tREFI',
        formula: 'tREFI = tREFW / commands per window',
        inputs: [
          input('tREFW', 'refresh window', o.refreshWindow, 'time'),
          input('n_cmd', 'commands per window', o.refreshCommandsPerWindow, 'count'),
        ],
        value: r.interval,
        quantity: 'time',
        method: 'Refresh commands spread evenly over the window.',
        source: SOURCES.jedec,
      };
    case 'rowsPerCommand':
      return {
        title: 'Rows per refresh command',
        symbol: 'rows/cmd',
        formula: 'rows/cmd = ⌈rows / commands per window⌉',
        inputs: [
          input('rows', 'rows (mats in a band share a row)', r.rows, 'count'),
          input('n_cmd', 'commands per window', o.refreshCommandsPerWindow, 'count'),
        ],
        value: r.rowsPerCommand,
        quantity: 'count',
        method: 'Every row once per window.',
        source: SOURCES.jedec,
      };
    case 'refreshCycleTime':
      return {
        title: 'Refresh cycle time',
        symbol: 'tRFC',
        formula: 'tRFC = ⌈rows/cmd / rows in parallel⌉ · tRC',
        inputs: [
          input('rows/cmd', 'rows per command', r.rowsPerCommand, 'count'),
          input('n_par', 'rows refreshed in parallel', o.refreshRowsInParallel, 'count'),
          input('tRC', 'row cycle time', p.rowCycleTime, 'time'),
        ],
        value: r.cycleTime,
        quantity: 'time',
        method: 'Rows of one command go in parallel groups, one row cycle each.',
        source: SOURCES.common,
      };
    case 'refreshBusyFraction':
      return {
        title: 'Refresh busy fraction',
        symbol: 'tRFC/tREFI',
        formula: 'busy = tRFC / tREFI',
        inputs: [input('tRFC', 'refresh cycle time', r.cycleTime, 'time'), interval],
        value: r.busyFraction,
        quantity: 'percent',
        method: 'Share of time the array cannot serve accesses.',
        source: SOURCES.jedec,
      };
    case 'refreshPower':
      return {
        title: 'Refresh power',
        symbol: 'P_ref',
        formula: 'P_ref = Σ (E_act × word lines) / tREFW',
        inputs: [input('tREFW', 'refresh window', o.refreshWindow, 'time')],
        value: r.power,
        quantity: 'power',
        method: 'Every word line of every mat activated once per window.',
        source: SOURCES.common,
      };
  }
}
