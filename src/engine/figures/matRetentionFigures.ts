import { input, SOURCES } from './explanation';
import { FORMULAS } from './formulas';
import { matFigure } from './matFigure';

/** Catalogue entries of a mat's retention: cell leakage, the droop the sense margin allows, retention time. */
export const RETENTION_FIGURES = [
  matFigure({
    key: 'leakage',
    label: 'Cell leakage at temperature',
    quantity: 'current',
    group: null,
    exportKey: 'leakage_A',
    value: (f) => f.leakage,
  }),
  matFigure({
    key: 'allowedDroop',
    label: 'Droop until the margin is zero',
    quantity: 'voltage',
    group: null,
    exportKey: 'allowedDroop_V',
    value: (f) => f.allowedDroop,
  }),
  matFigure({
    key: 'retentionTime',
    label: 'Retention time',
    quantity: 'time',
    group: 'Retention and speed',
    exportKey: 'retentionTime_s',
    csvHeader: 'retention_s',
    value: (f) => f.retentionTime,
    explain: (mat, design) => {
      const f = mat.figures;
      const p = design.process;
      return {
        symbol: 't_ret',
        formula: `${FORMULAS.retention},  ${FORMULAS.leakageAtTemperature}`,
        inputs: [
          input('Cs', 'storage capacitance', f.storageCapacitance, 'capacitance'),
          input('ΔV_allowed', 'droop until margin is zero', f.allowedDroop, 'voltage'),
          input('I_ref', 'leakage at reference', p.cellLeakageCurrent, 'current'),
          input('T_ref', 'reference temperature', p.leakageReferenceTemperature, 'temperature'),
          input('T', 'operating temperature', design.operating.temperature, 'temperature'),
          input('I(T)', 'leakage at temperature', f.leakage, 'current'),
        ],
        method: 'Constant-current leakage scaled with temperature by Arrhenius.',
        source: SOURCES.arrhenius,
      };
    },
  }),
] as const;
