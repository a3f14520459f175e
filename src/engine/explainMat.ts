import type { Design } from '../model/design';
import { input, SOURCES, type Explanation } from './explanation';
import { explainReadFigure } from './explainMatRead';
import type { MatReport, Report } from './report';

/**
 * Per-mat figures in their panel groups, in display order; some apply to one read style only. The key
 * list and its type derive from the groups, so a figure cannot be explained but left out of the panel.
 */
export const MAT_FIGURE_GROUPS = [
  {
    title: 'Sensing',
    keys: [
      'bitlineCapacitance',
      'chargeTransferRatio',
      'signalHigh',
      'signalLow',
      'readCurrent',
      'dropHigh',
      'dropLow',
      'senseSignal',
      'offsetBudget',
      'noiseAllowance',
      'senseMargin',
      'senseMarginAtRefresh',
    ],
  },
  { title: 'Retention and speed', keys: ['retentionTime', 'wordlineDelay', 'bitlineDelay'] },
  { title: 'Energy', keys: ['activationEnergy', 'energyPerBit'] },
  { title: 'Area', keys: ['bits', 'area', 'senseAmpPitchBudget'] },
] as const;

export type MatFigureKey = (typeof MAT_FIGURE_GROUPS)[number]['keys'][number];
export const MAT_FIGURES: readonly MatFigureKey[] = MAT_FIGURE_GROUPS.flatMap((g) => g.keys);

const CHARGE_SHARING_ONLY: ReadonlySet<MatFigureKey> = new Set([
  'chargeTransferRatio',
  'signalHigh',
  'signalLow',
]);
const GAIN_ONLY: ReadonlySet<MatFigureKey> = new Set(['readCurrent', 'dropHigh', 'dropLow']);

/** Whether a figure applies to this mat's read style. */
export function matFigureApplies(key: MatFigureKey, mat: MatReport): boolean {
  if (mat.figures.read.kind === 'chargeSharing') return !GAIN_ONLY.has(key);
  return !CHARGE_SHARING_ONLY.has(key);
}

/** Explains one figure of one mat; undefined when the figure does not apply to its read style. */
export function explainMatFigure(
  key: MatFigureKey,
  mat: MatReport,
  design: Design,
  report: Report,
): Explanation | undefined {
  if (!matFigureApplies(key, mat)) return undefined;
  const f = mat.figures;
  const p = design.process;
  const o = design.operating;
  const read = f.read;
  const cbl = f.bitlineCapacitance;
  const required = input('V_req', 'offset and noise stacked', f.requiredSignal, 'voltage');
  switch (key) {
    case 'bitlineCapacitance':
      return {
        title: f.read.kind === 'gainRead' ? 'Read-bit-line capacitance' : 'Bit-line capacitance',
        symbol: 'Cbl',
        formula: 'Cbl = N·(Cj + Cbw + Cbb) + c_wire·L_bl + C_sa',
        inputs: [
          input('N', 'cells per bit line', f.cellsPerBitline, 'count'),
          input('N·Cj', 'junction/contact', cbl.junction, 'capacitance'),
          input('N·Cbw', 'coupling to word lines', cbl.wordlineCoupling, 'capacitance'),
          input('N·Cbb', 'coupling to bit lines', cbl.bitlineCoupling, 'capacitance'),
          input('c·L', `wire (L_bl = ${(f.bitlineLength * 1e6).toPrecision(4)} µm)`, cbl.wire, 'capacitance'),
          input('C_sa', 'sense-amplifier input', cbl.senseAmp, 'capacitance'),
        ],
        value: cbl.total,
        quantity: 'capacitance',
        method: 'Sum of parallel parasitic capacitances (lumped), shown as a breakdown.',
        source: SOURCES.keethBaker,
      };
    case 'chargeTransferRatio':
    case 'signalHigh':
    case 'signalLow':
    case 'readCurrent':
    case 'dropHigh':
    case 'dropLow':
    case 'senseSignal':
      return explainReadFigure(key, mat, design, report);
    case 'offsetBudget':
      return {
        title: 'Sense-amplifier offset budget',
        symbol: 'k·σ',
        formula: 'σ = A_VT / √(W·L);  k = Φ⁻¹(1 − failures / sense amps)',
        inputs: [
          input('A_VT', 'matching coefficient', p.senseAmpMatchingCoefficient, 'matchingCoefficient'),
          input('W', 'transistor width', p.senseAmpTransistorWidth, 'length'),
          input('L', 'transistor length', p.senseAmpTransistorLength, 'length'),
          input('σ', 'offset standard deviation', f.offsetSigma, 'voltage'),
          input('k', 'σ multiplier', report.totals.offsetSigmaMultiplier, 'ratio'),
          input('n_sa', 'sense amplifiers in the design', report.totals.senseAmpCount, 'count'),
        ],
        value: f.offsetBudget,
        quantity: 'voltage',
        method: `Pelgrom mismatch; k so that on average ${o.allowedSenseFailures} amplifier(s) fail (one-sided normal tail).`,
        source: `${SOURCES.pelgrom}; ${SOURCES.acklam}`,
      };
    case 'noiseAllowance':
      return {
        title: 'Coupling-noise allowance',
        symbol: 'V_noise',
        formula: 'V_noise = κ · (Cbb / Cbl) · VDD / 2',
        inputs: [
          input(
            'κ',
            `unrejected share (${f.architecture === 'folded' && f.read.kind === 'chargeSharing' ? 'folded' : 'open'})`,
            f.architecture === 'folded' && f.read.kind === 'chargeSharing'
              ? p.foldedNoiseFactor
              : p.openNoiseFactor,
            'ratio',
          ),
          input('Cbb', 'coupling to bit lines', cbl.bitlineCoupling, 'capacitance'),
          input('Cbl', 'bit-line capacitance', cbl.total, 'capacitance'),
          input('VDD', 'array voltage', p.arrayVoltage, 'voltage'),
        ],
        value: f.noiseAllowance,
        quantity: 'voltage',
        method:
          'Neighbours swing by VDD/2 and couple through Cbb; folded pairs reject more as common mode than open ones.',
        source: `capacitive divider (common practice); ${SOURCES.westeHarris}`,
      };
    case 'senseMargin':
      return {
        title: 'Net sense margin (fresh)',
        symbol: 'M',
        formula: `M = ΔV − V_req,  V_req = ${p.offsetStacking === 'linear' ? 'k·σ + V_noise' : '√((k·σ)² + V_noise²)'}`,
        inputs: [input('ΔV', 'sense signal', f.senseSignal, 'voltage'), required],
        value: f.senseMargin,
        quantity: 'voltage',
        method: `Offset and noise stacked ${p.offsetStacking === 'linear' ? 'linearly (worst case)' : 'as a root sum of squares'}.`,
        source: 'H. Geib et al., IEEE JSSC, July 1992 (offset plus asymmetry stacking); common practice',
      };
    case 'senseMarginAtRefresh':
      return {
        title: 'Net sense margin at refresh',
        symbol: 'M_ref',
        formula: 'M_ref = ΔV(after droop I·tREFW/Cs) − V_req',
        inputs: [
          input('I', 'cell leakage at temperature', f.leakage, 'current'),
          input('tREFW', 'refresh window', o.refreshWindow, 'time'),
          input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
          input('ΔV′', 'signal after the window', f.senseSignalAfterRefresh, 'voltage'),
          required,
        ],
        value: f.senseMarginAtRefresh,
        quantity: 'voltage',
        method: 'A stored 1 leaks for a whole refresh window at constant current before it is read.',
        source: SOURCES.common,
      };
    case 'retentionTime':
      return {
        title: 'Retention time',
        symbol: 't_ret',
        formula: 't_ret = Cs · ΔV_allowed / I(T),  I(T) = I_ref·exp(−Ea/k·(1/T − 1/T_ref))',
        inputs: [
          input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
          input('ΔV_allowed', 'droop until margin is zero', f.allowedDroop, 'voltage'),
          input('I_ref', 'leakage at reference', p.cellLeakageCurrent, 'current'),
          input('T_ref', 'reference temperature', p.leakageReferenceTemperature, 'temperature'),
          input('T', 'operating temperature', o.temperature, 'temperature'),
          input('I(T)', 'leakage at temperature', f.leakage, 'current'),
        ],
        value: f.retentionTime,
        quantity: 'time',
        method: 'Constant-current leakage scaled with temperature by Arrhenius.',
        source: SOURCES.arrhenius,
      };
    case 'wordlineDelay':
      return {
        title: 'Word-line delay (50 %)',
        symbol: 't_wl',
        formula: 't_wl = 0.69·R_drv·C_wl + 0.38·R_wl·C_wl',
        inputs: [
          input('R_drv', 'driver resistance', p.wordlineDriverResistance, 'resistance'),
          input('R_wl', 'sub-word-line resistance', f.wordlineResistance, 'resistance'),
          input('C_wl', 'sub-word-line capacitance', f.wordlineCapacitance, 'capacitance'),
        ],
        value: f.wordlineDelay,
        quantity: 'time',
        method: 'Driver as lumped RC plus the line as distributed RC; 50 % point convention.',
        source: SOURCES.rabaey,
      };
    case 'bitlineDelay':
      return read.kind === 'chargeSharing'
        ? {
            title: 'Bit-line development (50 %)',
            symbol: 't_bl',
            formula: 't_bl = 0.69·R_acc·(Cs·Cbl/(Cs+Cbl)) + 0.38·R_bl·Cbl',
            inputs: [
              input('R_acc', 'access transistor', p.accessTransistorResistance, 'resistance'),
              input('R_bl', 'bit-line resistance', f.bitlineResistance, 'resistance'),
              input('Cbl', 'bit-line capacitance', cbl.total, 'capacitance'),
            ],
            value: f.bitlineDelay,
            quantity: 'time',
            method:
              'Cell discharge through the access device plus distributed bit-line RC; 50 % point convention.',
            source: SOURCES.rabaey,
          }
        : {
            title: 'Read-bit-line sense time',
            symbol: 't_sense',
            formula: 't_sense (process input)',
            inputs: [],
            value: f.bitlineDelay,
            quantity: 'time',
            method: 'The read bit line develops for a fixed time before sensing.',
            source: SOURCES.gainCells,
          };
    case 'activationEnergy':
      return {
        title: 'Energy per activation',
        symbol: 'E_act',
        formula: 'E_act = E_bl + C_wl·V_wl² + M·C_sa·VDD²',
        inputs: [
          input(
            'E_bl',
            read.kind === 'chargeSharing' ? 'bit lines: M·Cbl·VDD²/2' : 'read bit lines: M·C·VDD·ΔV1',
            f.activationEnergy.bitlines,
            'energy',
          ),
          input('E_wl', 'word line', f.activationEnergy.wordline, 'energy'),
          input('E_sa', 'sense-amplifier latches', f.activationEnergy.senseAmps, 'energy'),
          input('M', 'cells per word line', f.cellsPerWordline, 'count'),
        ],
        value: f.activationEnergy.total,
        quantity: 'energy',
        method: 'One word line of the mat activated; half-VDD precharge with equalisation.',
        source: `${SOURCES.common}; C·V² charging energy, ${SOURCES.rabaey}`,
      };
    case 'energyPerBit':
      return {
        title: 'Activation energy per bit',
        symbol: 'E_bit',
        formula: 'E_bit = E_act / M',
        inputs: [
          input('E_act', 'energy per activation', f.activationEnergy.total, 'energy'),
          input('M', 'cells per word line', f.cellsPerWordline, 'count'),
        ],
        value: f.activationEnergy.perBit,
        quantity: 'energy',
        method: 'Activation energy spread over the cells the word line opens.',
        source: SOURCES.common,
      };
    case 'senseAmpPitchBudget':
      return {
        title: 'Sense-amplifier pitch budget',
        symbol: 'w_sa',
        formula: 'w_sa = BL pitch × (folded pair ? 2 : 1) × (strips at both ends ? 2 : 1)',
        inputs: [input('W_needed', 'width one amplifier needs', p.senseAmpWidth, 'length')],
        value: f.senseAmpPitchBudget,
        quantity: 'length',
        method: f.senseAmpFits ? 'The amplifier fits its pitch.' : 'The amplifier does NOT fit its pitch.',
        source: SOURCES.keethBaker,
      };
    case 'bits':
      return {
        title: 'Bits in the mat',
        symbol: 'bits',
        formula: 'bits = N · BL, BL = M / occupancy; usable = bits − lost open-edge bits',
        inputs: [
          input('N', 'cells per bit line', f.cellsPerBitline, 'count'),
          input('M', 'cells per word line', f.cellsPerWordline, 'count'),
          input('BL', 'bit lines', f.bitlineCount, 'count'),
          input('lost', 'bits without an open-bit-line partner', f.lostBits, 'count'),
        ],
        value: f.bits,
        quantity: 'count',
        method:
          'Folded bit lines hold a cell at every other word-line crossing (occupancy ½); open at every one.',
        source: `${SOURCES.westeHarris} (array styles); ${SOURCES.common} for the counting`,
      };
    case 'area':
      return {
        title: 'Mat area',
        symbol: 'A_mat',
        formula: 'A_mat = L_wl · L_bl',
        inputs: [
          input('L_wl', 'word-line length', f.wordlineLength, 'length'),
          input('L_bl', 'bit-line length', f.bitlineLength, 'length'),
        ],
        value: f.area,
        quantity: 'area',
        method: 'Mat outline: bit lines × bit-line pitch by word lines × word-line pitch.',
        source: SOURCES.common,
      };
  }
}
