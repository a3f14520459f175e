import { input, SOURCES } from './explanation';
import {
  chargeSharingRead,
  chargeSharingValue,
  currentReadLevel,
  currentReadTime,
  gainCellRead,
  gainCellValue,
  matFigure,
  readPathOf,
} from './matFigure';

/**
 * Catalogue entries of the read figures, whose meaning depends on the read style: charge sharing (1T1C)
 * or read current into a precharged line (gain cells). In the JSON summary they sit under `read`.
 */
export const READ_FIGURES = [
  matFigure({
    key: 'chargeTransferRatio',
    label: 'Charge-transfer ratio',
    quantity: 'ratio',
    group: 'Sensing',
    read: 'chargeSharing',
    exportKey: 'chargeTransferRatio_ratio',
    csvHeader: 'charge_transfer_ratio',
    cli: { header: 'CTR', scale: { prefix: '', decimals: 4 } },
    value: chargeSharingValue((r) => r.chargeTransferRatio),
    explain: (mat) => ({
      symbol: 'CTR',
      formula: 'CTR = Cs / (Cs + Cbl)',
      inputs: [
        input('Cs', 'storage capacitance', mat.figures.storageCapacitance, 'capacitance'),
        input('Cbl', 'bit-line capacitance', mat.figures.bitlineCapacitance.total, 'capacitance'),
      ],
      method: 'Charge sharing between the cell and the precharged bit line.',
      source: SOURCES.westeHarris,
    }),
  }),
  matFigure({
    key: 'signalHigh',
    label: 'Signal reading a stored 1',
    quantity: 'voltage',
    group: 'Sensing',
    read: 'chargeSharing',
    exportKey: 'signalHigh_V',
    csvHeader: 'signal_or_drop_1_V',
    cli: { header: 'ΔV1 (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: chargeSharingValue((r) => r.signalHigh),
    explain: (mat, design, report) => ({
      symbol: 'ΔV1',
      formula: 'ΔV1 = (V1 − Vpre) · CTR',
      inputs: [
        input('V1', 'stored-1 level', report.storedHigh.level, 'voltage'),
        input('Vpre', 'precharge level', design.process.prechargeVoltage, 'voltage'),
        input('CTR', 'charge-transfer ratio', chargeSharingRead(mat.figures).chargeTransferRatio, 'ratio'),
      ],
      method:
        'Charge conservation on Cs + Cbl; V1 = min(VDD, VPP − Vt(V1)) with body effect, solved by bisection.',
      source: SOURCES.westeHarris,
    }),
  }),
  matFigure({
    key: 'signalLow',
    label: 'Signal reading a stored 0',
    quantity: 'voltage',
    group: 'Sensing',
    read: 'chargeSharing',
    exportKey: 'signalLow_V',
    csvHeader: 'signal_or_drop_0_V',
    cli: { header: 'ΔV0 (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: chargeSharingValue((r) => r.signalLow),
    explain: (mat, design) => ({
      symbol: 'ΔV0',
      formula: 'ΔV0 = (Vpre − 0) · CTR',
      inputs: [
        input('Vpre', 'precharge level', design.process.prechargeVoltage, 'voltage'),
        input('CTR', 'charge-transfer ratio', chargeSharingRead(mat.figures).chargeTransferRatio, 'ratio'),
      ],
      method: 'Charge conservation on Cs + Cbl with the cell at 0 V.',
      source: SOURCES.westeHarris,
    }),
  }),
  matFigure({
    key: 'signalHighAfterRefresh',
    label: 'Signal reading a stored 1 after a refresh window',
    quantity: 'voltage',
    group: null,
    read: 'chargeSharing',
    exportKey: 'signalHighAfterRefresh_V',
    value: chargeSharingValue((r) => r.signalHighAfterRefresh),
  }),
  matFigure({
    key: 'readCurrent',
    label: 'Read current (stored 1)',
    quantity: 'current',
    group: 'Sensing',
    read: 'gainRead',
    exportKey: 'readCurrent_A',
    value: gainCellValue((r) => r.readCurrent),
    explain: (mat, design, report) => {
      const f = mat.figures;
      const path = readPathOf(f, design);
      const nan = Number.NaN;
      return {
        symbol: 'I_read',
        formula: 'I_read = (β / (2·n))·(V1 − Vt_read)²  (n devices in series act as one n times as long)',
        inputs: [
          input(
            'β',
            'read transistor transconductance',
            path?.readTransconductance ?? nan,
            'transconductance',
          ),
          input('n', 'devices in series on the read path', gainCellRead(f).seriesDevices, 'count'),
          input('Vt_read', 'read transistor threshold', path?.readThresholdVoltage ?? nan, 'voltage'),
          input(
            'V1',
            f.cellKind === 'sram-6t' ? 'stored 1 (full supply)' : 'stored 1 less write word-line coupling',
            currentReadLevel(f, design, report.storedHigh.level),
            'voltage',
          ),
        ],
        method: 'Square-law saturation current of the storage transistor gated by the stored level.',
        source: 'Shichman–Hodges square law (from memory)',
      };
    },
  }),
  matFigure({
    key: 'dropHigh',
    label: 'Read-bit-line drop, stored 1',
    quantity: 'voltage',
    group: 'Sensing',
    read: 'gainRead',
    exportKey: 'dropHigh_V',
    csvHeader: 'signal_or_drop_1_V',
    cli: { header: 'ΔV1 (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: gainCellValue((r) => r.dropHigh),
    explain: (mat, design) => ({
      symbol: 'ΔV1',
      formula: 'ΔV1 = min(VDD, I_read · t_sense / C_RBL)',
      inputs: [
        input('I_read', 'read current', gainCellRead(mat.figures).readCurrent, 'current'),
        input('t_sense', 'sense time', currentReadTime(mat.figures, design), 'time'),
        input('C_RBL', 'read-bit-line capacitance', mat.figures.bitlineCapacitance.total, 'capacitance'),
        input('VDD', 'precharge level, the largest drop', design.process.arrayVoltage, 'voltage'),
      ],
      method: 'Non-destructive, inverting read: a stored 1 discharges the read bit line precharged to VDD.',
      source: SOURCES.gainCells,
    }),
  }),
  matFigure({
    key: 'dropLow',
    label: 'Read-bit-line drop, stored 0',
    quantity: 'voltage',
    group: 'Sensing',
    read: 'gainRead',
    exportKey: 'dropLow_V',
    csvHeader: 'signal_or_drop_0_V',
    cli: { header: 'ΔV0 (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: gainCellValue((r) => r.dropLow),
    explain: (mat, design) => ({
      symbol: 'ΔV0',
      formula: 'ΔV0 = min(VDD, (I_off + (N − 1)·I_unsel) · t_sense / C_RBL)',
      inputs: [
        input(
          'I_off',
          'read current of a stored 0',
          readPathOf(mat.figures, design)?.readOffCurrent ?? Number.NaN,
          'current',
        ),
        input(
          'I_unsel',
          'leakage of each unselected cell',
          readPathOf(mat.figures, design)?.unselectedLeakageCurrent ?? Number.NaN,
          'current',
        ),
        input('N', 'cells per bit line', mat.figures.cellsPerBitline, 'count'),
        input('t_sense', 'sense time', currentReadTime(mat.figures, design), 'time'),
        input('C_RBL', 'read-bit-line capacitance', mat.figures.bitlineCapacitance.total, 'capacitance'),
        input('VDD', 'precharge level, the largest drop', design.process.arrayVoltage, 'voltage'),
      ],
      method: 'Worst case: every unselected cell on the line holds a 1 and leaks onto it.',
      source: SOURCES.gainCells,
    }),
  }),
  matFigure({
    key: 'dropHighAfterRefresh',
    label: 'Read-bit-line drop, stored 1, after a refresh window',
    quantity: 'voltage',
    group: null,
    read: 'gainRead',
    exportKey: 'dropHighAfterRefresh_V',
    value: gainCellValue((r) => r.dropHighAfterRefresh),
  }),
  matFigure({
    key: 'senseSignal',
    label: 'Sense signal',
    quantity: 'voltage',
    group: 'Sensing',
    exportKey: 'senseSignal_V',
    csvHeader: 'sense_signal_V',
    cli: { header: 'signal (mV)', scale: { prefix: 'm', decimals: 1 } },
    value: (f) => f.senseSignal,
    explain: (mat, design) => {
      const read = mat.figures.read;
      return read.kind === 'chargeSharing'
        ? {
            symbol: 'ΔV_dev',
            formula: 'ΔV = min(ΔV1, ΔV0) · (1 − e^(−t_fire/τ))  (developed when the sense amplifier fires)',
            inputs: [
              input('ΔV1', 'signal for a stored 1', read.signalHigh, 'voltage'),
              input('ΔV0', 'signal for a stored 0', read.signalLow, 'voltage'),
              input('t_fire', 'sense fires after word-line turn-on', design.operating.senseFireTime, 'time'),
              input('τ', 'development time constant', read.developmentTimeConstant, 'time'),
              input('share', 'developed share 1 − e^(−t_fire/τ)', read.developedShare, 'ratio'),
            ],
            method:
              'The sense amplifier must resolve the weaker of the two data states, as far as it has developed when it fires.',
            source: SOURCES.keethBaker,
          }
        : {
            symbol: 'ΔV',
            formula: read.differential
              ? 'ΔV = (ΔV1 − ΔV0) / n_ref,  n_ref = 1: the pair’s own lines are compared'
              : 'ΔV = (ΔV1 − ΔV0) / n_ref,  n_ref = 2: a reference midway between the drops',
            inputs: [
              input('ΔV1', 'drop for a stored 1', read.dropHigh, 'voltage'),
              input('ΔV0', 'drop for a stored 0', read.dropLow, 'voltage'),
              input(
                'n_ref',
                read.differential ? 'differential pair' : 'single-ended',
                read.differential ? 1 : 2,
                'count',
              ),
            ],
            method: read.differential
              ? 'Differential read: one line of the pair is pulled, the other sees only leakage.'
              : 'Single-ended read against a reference set midway between the two drops.',
            source: SOURCES.gainCells,
          };
    },
  }),
  matFigure({
    key: 'senseSignalAfterRefresh',
    label: 'Sense signal after a refresh window',
    quantity: 'voltage',
    group: null,
    exportKey: 'senseSignalAfterRefresh_V',
    value: (f) => f.senseSignalAfterRefresh,
  }),
] as const;
