import { input, SOURCES, type Explanation } from '../engine/explanation';
import { FIGURE_INFO, type FigureKey, type PartitionFigures } from './figures';

/** Values of the design (or sweep) a figure came from that its explanation names. */
export interface FigureContext {
  readonly featureSize: number;
  readonly wordlineDriverResistance: number;
  readonly refreshWindow: number;
}

/**
 * Formula, inputs and source of one comparison figure, for the variants table and the explorer's point
 * card. The formulas are the engine's (see engine/explainTotals.ts and engine/explainMat.ts); the
 * explorer reaches the same numbers in closed form and a test keeps them equal.
 */
export function explainFigure(key: FigureKey, f: PartitionFigures, ctx: FigureContext): Explanation {
  const info = FIGURE_INFO[key];
  const base = { title: info.label, value: f[key], quantity: info.quantity };
  const area = input('A_total', 'bank bounding box', f.totalArea, 'area');
  const bits = input('bits', 'usable bits', f.usableBits, 'count');
  switch (key) {
    case 'areaPerBit':
      return {
        ...base,
        symbol: 'A_bit',
        formula: 'A_bit = A_total / usable bits',
        inputs: [area, bits],
        method: 'Whole bank, periphery included, over every bit that can be read.',
        source: SOURCES.takahashi,
      };
    case 'areaPerBitInF2':
      return {
        ...base,
        symbol: 'A_bit/F²',
        formula: 'A_bit / F²',
        inputs: [
          input('A_bit', 'area per bit', f.areaPerBit, 'area'),
          input('F', 'feature size', ctx.featureSize, 'length'),
        ],
        method: 'Area per bit normalised to the feature size, comparable across nodes.',
        source: SOURCES.common,
      };
    case 'arrayEfficiency':
      return {
        ...base,
        symbol: 'η',
        formula: 'η = A_cells / A_total',
        inputs: [input('A_cells', 'usable bits × cell footprint', f.cellArea, 'area'), area],
        method: 'Share of the bank taken by usable storage cells.',
        source: SOURCES.takahashi,
      };
    case 'senseMargin':
      return {
        ...base,
        symbol: 'M',
        formula: 'M = ΔV after a refresh window − (k·σ_offset ⊕ noise)',
        inputs: [
          input('ΔV', 'sense signal at the end of the window', f.senseSignalAtRefresh, 'voltage'),
          input('V_req', 'offset and noise stacked', f.requiredSignal, 'voltage'),
          input('tREFW', 'refresh window', ctx.refreshWindow, 'time'),
        ],
        method: 'Worst mat: the signal left after a window of leakage, less what the sense amplifier needs.',
        source: `${SOURCES.westeHarris}; ${SOURCES.pelgrom}`,
      };
    case 'wordlineDelay':
      return {
        ...base,
        symbol: 't_wl',
        formula: 't_wl = 0.69·R_drv·C_wl + 0.38·R_wl·C_wl',
        inputs: [
          input('R_drv', 'driver resistance', ctx.wordlineDriverResistance, 'resistance'),
          input('R_wl', 'word-line resistance', f.wordlineResistance, 'resistance'),
          input('C_wl', 'word-line capacitance', f.wordlineCapacitance, 'capacitance'),
        ],
        method: 'Slowest sub-word line; driver plus distributed RC, 50 % point.',
        source: SOURCES.rabaey,
      };
    case 'activationEnergyPerBit':
      return {
        ...base,
        symbol: 'E_bit',
        formula: 'E_bit = E_act / M',
        inputs: [
          input('E_act', 'energy of one mat activation', f.activationEnergy, 'energy'),
          input('M', 'cells per word line', f.cellsPerWordline, 'count'),
        ],
        method: 'Bit lines, word line and sense-amplifier latches of one activation, over the bits it opens.',
        source: `${SOURCES.common}; C·V² charging energy, ${SOURCES.rabaey}`,
      };
    case 'refreshBusyFraction':
      return {
        ...base,
        symbol: 'tRFC/tREFI',
        formula: 'busy = tRFC / tREFI',
        inputs: [
          input('tRFC', 'refresh cycle time', f.refreshCycleTime, 'time'),
          input('tREFI', 'refresh interval', f.refreshInterval, 'time'),
        ],
        method: 'Share of time the bank cannot serve accesses.',
        source: SOURCES.jedec,
      };
    case 'retentionTime':
      return {
        ...base,
        symbol: 't_ret',
        formula: 't_ret = Cs·ΔV_allowed / I(T)',
        inputs: [input('tREFW', 'refresh window (must be shorter)', ctx.refreshWindow, 'time')],
        method: 'Shortest over the mats: time until the stored 1 droops to zero margin.',
        source: SOURCES.arrhenius,
      };
    case 'refreshPower':
      return {
        ...base,
        symbol: 'P_ref',
        formula: 'P_ref = Σ (E_act × word lines) / tREFW',
        inputs: [
          input('E_act', 'energy of one mat activation', f.activationEnergy, 'energy'),
          input('tREFW', 'refresh window', ctx.refreshWindow, 'time'),
        ],
        method: 'Every word line of every mat activated once per window.',
        source: SOURCES.common,
      };
    default:
      return {
        ...base,
        symbol: key,
        formula: key === 'totalArea' ? 'A_total = width × height of the bank' : `${info.label} (counted)`,
        inputs: [input('mats', 'mats', f.matCount, 'count')],
        method: 'Counted or measured from the floorplan.',
        source: SOURCES.common,
      };
  }
}
