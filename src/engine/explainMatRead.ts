import type { Design } from '../model/design';
import { input, SOURCES, type Explanation } from './explanation';
import type { MatReport, Report } from './report';

/** Read figures whose meaning depends on the read style: charge sharing (1T1C) or current (gain cells). */
export type ReadFigureKey =
  'chargeTransferRatio' | 'signalHigh' | 'signalLow' | 'readCurrent' | 'dropHigh' | 'dropLow' | 'senseSignal';

/** Explains one read figure of a mat; undefined when it does not apply to the mat's read style. */
export function explainReadFigure(
  key: ReadFigureKey,
  mat: MatReport,
  design: Design,
  report: Report,
): Explanation | undefined {
  const f = mat.figures;
  const p = design.process;
  const read = f.read;
  const cbl = f.bitlineCapacitance;
  const v1 = input('V1', 'stored-1 level', report.storedHigh.level, 'voltage');
  switch (key) {
    case 'chargeTransferRatio':
      if (read.kind !== 'chargeSharing') return undefined;
      return {
        title: 'Charge-transfer ratio',
        symbol: 'CTR',
        formula: 'CTR = Cs / (Cs + Cbl)',
        inputs: [
          input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
          input('Cbl', 'bit-line capacitance', cbl.total, 'capacitance'),
        ],
        value: read.chargeTransferRatio,
        quantity: 'ratio',
        method: 'Charge sharing between the cell and the precharged bit line.',
        source: SOURCES.westeHarris,
      };
    case 'signalHigh':
      if (read.kind !== 'chargeSharing') return undefined;
      return {
        title: 'Signal reading a stored 1',
        symbol: 'ΔV1',
        formula: 'ΔV1 = (V1 − Vpre) · CTR',
        inputs: [
          v1,
          input('Vpre', 'precharge level', p.prechargeVoltage, 'voltage'),
          input('CTR', 'charge-transfer ratio', read.chargeTransferRatio, 'ratio'),
        ],
        value: read.signalHigh,
        quantity: 'voltage',
        method:
          'Charge conservation on Cs + Cbl; V1 = min(VDD, VPP − Vt(V1)) with body effect, solved by bisection.',
        source: SOURCES.westeHarris,
      };
    case 'signalLow':
      if (read.kind !== 'chargeSharing') return undefined;
      return {
        title: 'Signal reading a stored 0',
        symbol: 'ΔV0',
        formula: 'ΔV0 = (Vpre − 0) · CTR',
        inputs: [
          input('Vpre', 'precharge level', p.prechargeVoltage, 'voltage'),
          input('CTR', 'charge-transfer ratio', read.chargeTransferRatio, 'ratio'),
        ],
        value: read.signalLow,
        quantity: 'voltage',
        method: 'Charge conservation on Cs + Cbl with the cell at 0 V.',
        source: SOURCES.westeHarris,
      };
    case 'readCurrent':
      if (read.kind !== 'gainRead') return undefined;
      return {
        title: 'Read current (stored 1)',
        symbol: 'I_read',
        formula: 'I_read = (β/2)·(V1 − Vt_read)²',
        inputs: [v1],
        value: read.readCurrent,
        quantity: 'current',
        method: 'Square-law saturation current of the storage transistor gated by the stored level.',
        source: 'Shichman–Hodges square law (from memory)',
      };
    case 'dropHigh':
      if (read.kind !== 'gainRead') return undefined;
      return {
        title: 'Read-bit-line drop, stored 1',
        symbol: 'ΔV1',
        formula: 'ΔV1 = min(VDD, I_read · t_sense / C_RBL)',
        inputs: [
          input('I_read', 'read current', read.readCurrent, 'current'),
          input('t_sense', 'sense time', p.gainCellSenseTime, 'time'),
          input('C_RBL', 'read-bit-line capacitance', cbl.total, 'capacitance'),
        ],
        value: read.dropHigh,
        quantity: 'voltage',
        method: 'Non-destructive, inverting read: a stored 1 discharges the read bit line precharged to VDD.',
        source: SOURCES.gainCells,
      };
    case 'dropLow':
      if (read.kind !== 'gainRead') return undefined;
      return {
        title: 'Read-bit-line drop, stored 0',
        symbol: 'ΔV0',
        formula: 'ΔV0 = min(VDD, (I_off + (N − 1)·I_unsel) · t_sense / C_RBL)',
        inputs: [
          input('N', 'cells per bit line', f.cellsPerBitline, 'count'),
          input('t_sense', 'sense time', p.gainCellSenseTime, 'time'),
          input('C_RBL', 'read-bit-line capacitance', cbl.total, 'capacitance'),
        ],
        value: read.dropLow,
        quantity: 'voltage',
        method: 'Worst case: every unselected cell on the line holds a 1 and leaks onto it.',
        source: SOURCES.gainCells,
      };
    case 'senseSignal':
      return read.kind === 'chargeSharing'
        ? {
            title: 'Sense signal',
            symbol: 'ΔV',
            formula: 'ΔV = min(ΔV1, ΔV0)',
            inputs: [
              input('ΔV1', 'signal for a stored 1', read.signalHigh, 'voltage'),
              input('ΔV0', 'signal for a stored 0', read.signalLow, 'voltage'),
            ],
            value: f.senseSignal,
            quantity: 'voltage',
            method: 'The sense amplifier must resolve the weaker of the two data states.',
            source: SOURCES.keethBaker,
          }
        : {
            title: 'Sense signal',
            symbol: 'ΔV',
            formula: 'ΔV = (ΔV1 − ΔV0) / 2',
            inputs: [
              input('ΔV1', 'drop for a stored 1', read.dropHigh, 'voltage'),
              input('ΔV0', 'drop for a stored 0', read.dropLow, 'voltage'),
            ],
            value: f.senseSignal,
            quantity: 'voltage',
            method: 'Single-ended read against a reference set midway between the two drops.',
            source: SOURCES.gainCells,
          };
  }
}
