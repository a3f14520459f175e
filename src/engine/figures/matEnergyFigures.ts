import { input, SOURCES } from './explanation';
import { FORMULAS } from './formulas';
import { matFigure } from './matFigure';

/** Catalogue entries of one activation's energy: the whole, and its bit-line, word-line and sense-amplifier shares, per bit. */
export const ENERGY_FIGURES = [
  matFigure({
    key: 'activationEnergy',
    label: 'Energy per activation',
    quantity: 'energy',
    group: 'Energy',
    exportKey: 'activationEnergy_J',
    csvHeader: 'activation_energy_J',
    value: (f) => f.activationEnergy.total,
    explain: (mat) => {
      const f = mat.figures;
      return {
        symbol: 'E_act',
        formula: 'E_act = E_bl + C_wl·V_wl² + M·C_sa·VDD²',
        inputs: [
          input(
            'E_bl',
            f.read.kind === 'chargeSharing' ? 'bit lines: M·Cbl·VDD²/2' : 'read bit lines: M·C·VDD·ΔV1',
            f.activationEnergy.bitlines,
            'energy',
          ),
          input('E_wl', 'word line', f.activationEnergy.wordline, 'energy'),
          input('E_sa', 'sense-amplifier latches', f.activationEnergy.senseAmps, 'energy'),
          input('M', 'cells per word line', f.cellsPerWordline, 'count'),
        ],
        method: 'One word line of the mat activated; half-VDD precharge with equalisation.',
        source: `${SOURCES.common}; C·V² charging energy, ${SOURCES.rabaey}`,
      };
    },
  }),
  matFigure({
    key: 'activationEnergyBitlines',
    label: 'Activation energy of the bit lines',
    quantity: 'energy',
    group: null,
    exportKey: 'activationEnergyBitlines_J',
    value: (f) => f.activationEnergy.bitlines,
  }),
  matFigure({
    key: 'activationEnergyWordline',
    label: 'Activation energy of the word line',
    quantity: 'energy',
    group: null,
    exportKey: 'activationEnergyWordline_J',
    value: (f) => f.activationEnergy.wordline,
  }),
  matFigure({
    key: 'activationEnergySenseAmps',
    label: 'Activation energy of the sense amplifiers',
    quantity: 'energy',
    group: null,
    exportKey: 'activationEnergySenseAmps_J',
    value: (f) => f.activationEnergy.senseAmps,
  }),
  matFigure({
    key: 'energyPerBit',
    label: 'Activation energy per bit',
    quantity: 'energy',
    group: 'Energy',
    exportKey: 'activationEnergyPerBit_J',
    value: (f) => f.activationEnergy.perBit,
    explain: (mat) => ({
      symbol: 'E_bit',
      formula: FORMULAS.energyPerBit,
      inputs: [
        input('E_act', 'energy per activation', mat.figures.activationEnergy.total, 'energy'),
        input('M', 'cells per word line', mat.figures.cellsPerWordline, 'count'),
      ],
      method: 'Activation energy spread over the cells the word line opens.',
      source: SOURCES.common,
    }),
  }),
] as const;
