import type { CellDefinition } from './cell';
import type { ProcessProfile } from './process';

/**
 * Built-in process and cells. The process is invented for demonstration (no real foundry's numbers);
 * its values sit in ranges typical of a recent commodity DRAM node so that figures look familiar.
 */
export const DEMO_PROCESS: ProcessProfile = {
  id: 'halden-d18',
  name: 'Halden D18 (invented commodity DRAM node)',
  description:
    'An invented 18 nm DRAM process for the demo floorplan. Not a real foundry profile: replace every value with your own extracted data.',
  featureSize: 18e-9,
  arrayVoltage: 1.1,
  wordlineHighVoltage: 2.6,
  prechargeVoltage: 0.55,
  accessThresholdVoltage: 0.75,
  bodyEffectCoefficient: 0.45,
  surfacePotential: 0.85,
  bitlineJunctionCapacitancePerCell: 0.035e-15,
  bitlineToWordlineCapacitancePerCell: 0.045e-15,
  bitlineToBitlineCapacitancePerCell: 0.025e-15,
  bitlineWireCapacitancePerLength: 6e-11,
  bitlineResistancePerLength: 2.5e7,
  wordlineGateCapacitancePerCell: 0.05e-15,
  wordlineWireCapacitancePerLength: 1.2e-10,
  wordlineResistancePerLength: 1e8,
  senseAmpInputCapacitance: 4e-15,
  cellLeakageCurrent: 1e-15,
  leakageReferenceTemperature: 358.15,
};

/** 1T1C cell with folded bit lines: 2F bit-line pitch × 2F word-line pitch at half occupancy = 8F². */
export const FOLDED_8F2_CELL: CellDefinition = {
  id: 'dram-folded-8f2',
  name: '1T1C folded 8F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'folded',
  bitlinePitchInF: 2,
  wordlinePitchInF: 2,
  storageCapacitance: 11e-15,
};

/** 1T1C cell with open bit lines: 3F bit-line pitch × 2F word-line pitch at full occupancy = 6F². */
export const OPEN_6F2_CELL: CellDefinition = {
  id: 'dram-open-6f2',
  name: '1T1C open 6F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'open',
  bitlinePitchInF: 3,
  wordlinePitchInF: 2,
  storageCapacitance: 11e-15,
};

export const BUILTIN_CELLS: readonly CellDefinition[] = [FOLDED_8F2_CELL, OPEN_6F2_CELL];
