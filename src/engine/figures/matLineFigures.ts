import { input, SOURCES } from './explanation';
import { FORMULAS } from './formulas';
import { isGainCell } from '../../model/cellBasics';
import { currentReadTime, matFigure } from './matFigure';

/** Catalogue entries of a mat's word and bit lines as RC lines: resistance, capacitance, delay. */
export const LINE_FIGURES = [
  matFigure({
    key: 'wordlineResistance',
    label: 'Sub-word-line resistance',
    quantity: 'resistance',
    group: null,
    exportKey: 'wordlineResistance_ohm',
    value: (f) => f.wordlineResistance,
  }),
  matFigure({
    key: 'wordlineCapacitance',
    label: 'Sub-word-line capacitance',
    quantity: 'capacitance',
    group: null,
    exportKey: 'wordlineCapacitance_F',
    value: (f) => f.wordlineCapacitance,
  }),
  matFigure({
    key: 'wordlineDelay',
    label: 'Word-line delay (50 %)',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'wordlineDelay_s',
    csvHeader: 'wordline_delay_s',
    value: (f) => f.wordlineDelay,
    explain: (mat, design) => ({
      symbol: 't_wl',
      formula: FORMULAS.wordlineDelay,
      inputs: [
        input('R_drv', 'driver resistance', design.process.wordlineDriverResistance, 'resistance'),
        input('R_wl', 'sub-word-line resistance', mat.figures.wordlineResistance, 'resistance'),
        input(
          'C_wl',
          'sub-word-line capacitance (gates, passing, BL crossings, wire)',
          mat.figures.wordlineCapacitance,
          'capacitance',
        ),
        input('t_on', 'far end to turn-on Vpre + Vt(Vpre)', mat.figures.wordlineTiming.toTurnOn, 'time'),
        input(
          't_90',
          'far end to 90 % of the high level',
          mat.figures.wordlineTiming.toNinetyPercent,
          'time',
        ),
      ],
      method:
        'Exact step response of a distributed RC line driven through R_drv (eigen-series); 50 % point shown, turn-on and 90 % beside it.',
      source: SOURCES.rabaey,
    }),
  }),
  matFigure({
    key: 'bitlineResistance',
    label: 'Bit-line resistance',
    quantity: 'resistance',
    group: null,
    exportKey: 'bitlineResistance_ohm',
    value: (f) => f.bitlineResistance,
  }),
  matFigure({
    key: 'bitlineDelay',
    label: 'Bit-line development (50 %)',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'bitlineDelay_s',
    csvHeader: 'bitline_delay_s',
    value: (f) => f.bitlineDelay,
    explain: (mat, design) => {
      const f = mat.figures;
      return f.read.kind === 'chargeSharing'
        ? {
            symbol: 't_bl',
            formula: 't_bl = τ·ln 2,  τ = R_acc·Cs·Cbl/(Cs+Cbl) + R_bl·Cbl/2',
            inputs: [
              input('R_acc', 'access transistor', design.process.accessTransistorResistance, 'resistance'),
              input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
              input('R_bl', 'bit-line resistance', f.bitlineResistance, 'resistance'),
              input('Cbl', 'bit-line capacitance', f.bitlineCapacitance.total, 'capacitance'),
              input('τ', 'development time constant', f.read.developmentTimeConstant, 'time'),
            ],
            method:
              'Single-pole development of the charge-sharing signal: half of it after τ·ln 2 (Elmore time constant of the access device into Cs in series with Cbl, plus the distributed bit line).',
            source: SOURCES.elmore,
          }
        : {
            title: 'Read-bit-line sense time',
            symbol: 't_sense',
            formula: 't_sense: the read develops for as long as it is sensed',
            inputs: [
              input(
                't_sense',
                isGainCell(f.cellKind)
                  ? 'gain-cell sense time (process)'
                  : 'sense fires after turn-on (operating)',
                currentReadTime(f, design),
                'time',
              ),
            ],
            method: 'The read bit line develops for a fixed time before sensing.',
            source: SOURCES.gainCells,
          };
    },
  }),
] as const;
