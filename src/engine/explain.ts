import type { Design } from '../model/design';
import type { Quantity } from '../model/units';
import type { MatReport, Report, Totals } from './report';

/** One input of a formula, in SI units. */
export interface ExplanationInput {
  readonly symbol: string;
  readonly label: string;
  readonly value: number;
  readonly quantity: Quantity;
}

/** How a figure was computed: formula, inputs, result and where the method comes from. */
export interface Explanation {
  readonly title: string;
  readonly symbol: string;
  readonly formula: string;
  readonly inputs: readonly ExplanationInput[];
  readonly value: number;
  readonly quantity: Quantity;
  readonly method: string;
  readonly source: string;
}

const KEETH_BAKER = 'B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001, ch. 1–2';
const WESTE_HARRIS = 'N. Weste, D. Harris, CMOS VLSI Design, 4th ed., Addison-Wesley, 2011, §12.3';
const TAKAHASHI =
  'T. Takahashi et al., "A Multigigabit DRAM Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (efficiency = cell area / total area)';

/** The per-mat figures that can explain themselves, in the order panels show them. */
export const MAT_FIGURES = [
  'bitlineCapacitance',
  'chargeTransferRatio',
  'signalHigh',
  'signalLow',
  'senseSignal',
  'bits',
  'area',
] as const;
export type MatFigureKey = (typeof MAT_FIGURES)[number];

/** The whole-design figures that can explain themselves. */
export const TOTAL_FIGURES = [
  'bits',
  'totalArea',
  'cellArea',
  'arrayEfficiency',
  'areaPerBit',
  'areaPerBitInF2',
  'worstSenseSignal',
] as const satisfies readonly (keyof Totals)[];
export type TotalFigureKey = (typeof TOTAL_FIGURES)[number];

const input = (symbol: string, label: string, value: number, quantity: Quantity): ExplanationInput => ({
  symbol,
  label,
  value,
  quantity,
});

/** Explains one figure of one mat. */
export function explainMatFigure(
  key: MatFigureKey,
  mat: MatReport,
  design: Design,
  report: Report,
): Explanation {
  const p = design.process;
  const cbl = mat.bitlineCapacitance;
  const ctrInputs = [
    input('Cs', 'storage capacitance', mat.storageCapacitance, 'capacitance'),
    input('Cbl', 'bit-line capacitance', cbl.total, 'capacitance'),
  ];
  const signalInputs = [
    input('V1', 'stored-1 level', report.storedHigh.level, 'voltage'),
    input('Vpre', 'precharge level', p.prechargeVoltage, 'voltage'),
    input('CTR', 'charge-transfer ratio', mat.chargeTransferRatio, 'ratio'),
  ];
  switch (key) {
    case 'bitlineCapacitance':
      return {
        title: 'Bit-line capacitance',
        symbol: 'Cbl',
        formula: 'Cbl = N·(Cj + Cbw + Cbb) + c_wire·L_bl + C_sa',
        inputs: [
          input('N', 'cells per bit line', mat.cellsPerBitline, 'count'),
          input('Cj', 'junction/contact per cell', p.bitlineJunctionCapacitancePerCell, 'capacitance'),
          input(
            'Cbw',
            'bit-line to word-line coupling per cell',
            p.bitlineToWordlineCapacitancePerCell,
            'capacitance',
          ),
          input(
            'Cbb',
            'bit-line to bit-line coupling per cell',
            p.bitlineToBitlineCapacitancePerCell,
            'capacitance',
          ),
          input(
            'c_wire',
            'wire capacitance per length',
            p.bitlineWireCapacitancePerLength,
            'capacitancePerLength',
          ),
          input('L_bl', 'bit-line length', mat.bitlineLength, 'length'),
          input('C_sa', 'sense-amplifier input', cbl.senseAmp, 'capacitance'),
        ],
        value: cbl.total,
        quantity: 'capacitance',
        method: 'Sum of parallel parasitic capacitances (lumped).',
        source: `${KEETH_BAKER} (from memory)`,
      };
    case 'chargeTransferRatio':
      return {
        title: 'Charge-transfer ratio',
        symbol: 'CTR',
        formula: 'CTR = Cs / (Cs + Cbl)',
        inputs: ctrInputs,
        value: mat.chargeTransferRatio,
        quantity: 'ratio',
        method: 'Charge sharing between the cell and the precharged bit line.',
        source: WESTE_HARRIS,
      };
    case 'signalHigh':
      return {
        title: 'Signal reading a stored 1',
        symbol: 'ΔV1',
        formula: 'ΔV1 = (V1 − Vpre) · CTR',
        inputs: signalInputs,
        value: mat.signalHigh,
        quantity: 'voltage',
        method: 'Charge conservation on Cs + Cbl; V1 = min(VDD, VPP − Vt(V1)) with body effect.',
        source: WESTE_HARRIS,
      };
    case 'signalLow':
      return {
        title: 'Signal reading a stored 0',
        symbol: 'ΔV0',
        formula: 'ΔV0 = (Vpre − 0) · CTR',
        inputs: signalInputs.filter((i) => i.symbol !== 'V1'),
        value: mat.signalLow,
        quantity: 'voltage',
        method: 'Charge conservation on Cs + Cbl with the cell at 0 V.',
        source: WESTE_HARRIS,
      };
    case 'senseSignal':
      return {
        title: 'Sense signal',
        symbol: 'ΔV',
        formula: 'ΔV = min(ΔV1, ΔV0)',
        inputs: [
          input('ΔV1', 'signal for a stored 1', mat.signalHigh, 'voltage'),
          input('ΔV0', 'signal for a stored 0', mat.signalLow, 'voltage'),
        ],
        value: mat.senseSignal,
        quantity: 'voltage',
        method: 'The sense amplifier must resolve the weaker of the two data states.',
        source: `${KEETH_BAKER} (from memory)`,
      };
    case 'bits':
      return {
        title: 'Bits in the mat',
        symbol: 'bits',
        formula: 'bits = N · BL, BL = M / occupancy',
        inputs: [
          input('N', 'cells per bit line', mat.cellsPerBitline, 'count'),
          input('M', 'cells per word line', mat.cellsPerWordline, 'count'),
          input('BL', 'bit lines', mat.bitlineCount, 'count'),
        ],
        value: mat.bits,
        quantity: 'count',
        method:
          'Folded bit lines hold a cell at every other word-line crossing (occupancy ½); open at every one.',
        source: `${WESTE_HARRIS} (array styles); common practice (no source) for the counting`,
      };
    case 'area':
      return {
        title: 'Mat area',
        symbol: 'A_mat',
        formula: 'A_mat = L_wl · L_bl',
        inputs: [
          input('L_wl', 'word-line length', mat.wordlineLength, 'length'),
          input('L_bl', 'bit-line length', mat.bitlineLength, 'length'),
        ],
        value: mat.area,
        quantity: 'area',
        method: 'Mat outline: bit lines × bit-line pitch by word lines × word-line pitch.',
        source: 'common practice (no source)',
      };
  }
}

/** Explains one whole-design figure. */
export function explainTotal(key: TotalFigureKey, totals: Totals, design: Design): Explanation {
  const F = design.process.featureSize;
  const base = {
    bitsInput: input('bits', 'bits in all mats', totals.bits, 'count'),
    totalInput: input('A_total', 'bounding box of all blocks', totals.totalArea, 'area'),
    cellInput: input('A_cells', 'cell footprints summed', totals.cellArea, 'area'),
  };
  switch (key) {
    case 'bits':
      return {
        title: 'Total bits',
        symbol: 'bits',
        formula: 'bits = Σ bits of each mat',
        inputs: [input('mats', 'mats', totals.matCount, 'count')],
        value: totals.bits,
        quantity: 'count',
        method: 'Sum over mats.',
        source: 'common practice (no source)',
      };
    case 'totalArea':
      return {
        title: 'Total area',
        symbol: 'A_total',
        formula: 'A_total = width × height of the bounding box of all blocks',
        inputs: [input('A_placed', 'blocks summed (without gaps)', totals.placedArea, 'area')],
        value: totals.totalArea,
        quantity: 'area',
        method: 'Gaps between blocks count as used die area.',
        source: 'common practice (no source)',
      };
    case 'cellArea':
      return {
        title: 'Cell area',
        symbol: 'A_cells',
        formula: 'A_cells = Σ bits × cell footprint',
        inputs: [base.bitsInput],
        value: totals.cellArea,
        quantity: 'area',
        method: 'Cell footprint = bit-line pitch × word-line pitch / occupancy.',
        source: 'common practice (no source)',
      };
    case 'arrayEfficiency':
      return {
        title: 'Array efficiency',
        symbol: 'η',
        formula: 'η = A_cells / A_total',
        inputs: [base.cellInput, base.totalInput],
        value: totals.arrayEfficiency,
        quantity: 'percent',
        method: 'Share of the floorplan taken by storage cells.',
        source: TAKAHASHI,
      };
    case 'areaPerBit':
      return {
        title: 'Area per bit',
        symbol: 'A_bit',
        formula: 'A_bit = A_total / bits',
        inputs: [base.totalInput, base.bitsInput],
        value: totals.areaPerBit,
        quantity: 'area',
        method: 'Total area spread over every bit, periphery included.',
        source: TAKAHASHI,
      };
    case 'areaPerBitInF2':
      return {
        title: 'Area per bit in F²',
        symbol: 'A_bit/F²',
        formula: 'A_bit / F²',
        inputs: [
          input('A_bit', 'area per bit', totals.areaPerBit, 'area'),
          input('F', 'feature size', F, 'length'),
        ],
        value: totals.areaPerBitInF2,
        quantity: 'ratio',
        method: 'Area per bit normalised to the feature size, comparable across nodes.',
        source: 'common practice (no source)',
      };
    case 'worstSenseSignal':
      return {
        title: 'Worst sense signal',
        symbol: 'ΔV_min',
        formula: 'ΔV_min = min over mats of min(ΔV1, ΔV0)',
        inputs: [input('mats', 'mats', totals.matCount, 'count')],
        value: totals.worstSenseSignal,
        quantity: 'voltage',
        method: `Smallest sense signal of any mat (mat ${totals.worstSenseSignalMatId ?? '—'}).`,
        source: WESTE_HARRIS,
      };
  }
}
