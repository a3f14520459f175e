import type { CellDefinition } from './cell';
import type { OperatingConditions } from './operating';
import type { RepairSettings } from './repair';
import type { ProcessProfile } from './process';

/**
 * Built-in processes, cells and operating conditions. Every process here is INVENTED for demonstration:
 * no real foundry's numbers. Values sit in ranges typical of their class of node so that figures look
 * familiar; replace them with extracted data before trusting a result.
 */

/** Electron charge (C), exact since the 2019 SI redefinition; converts eV to J. */
export const ELECTRON_CHARGE = 1.602176634e-19;

/** Invented commodity DRAM node, F = 18 nm. */
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
  senseAmpSwitchedCapacitance: 3e-15,
  senseAmpMatchingCoefficient: 2e-9,
  senseAmpTransistorWidth: 0.5e-6,
  senseAmpTransistorLength: 0.09e-6,
  senseAmpWidth: 0.1e-6,
  offsetStacking: 'linear',
  foldedNoiseFactor: 0.1,
  openNoiseFactor: 0.4,
  wordlineDriverResistance: 3e3,
  accessTransistorResistance: 20e3,
  gainCellSenseTime: 2e-9,
  rowCycleTime: 46e-9,
  cellLeakageCurrent: 1e-14,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.79 * ELECTRON_CHARGE,
};

/** Invented embedded-DRAM option of a 28 nm logic node (large trench capacitor, fast cycle). */
export const EDRAM_PROCESS: ProcessProfile = {
  id: 'orrin-e28',
  name: 'Orrin E28 (invented embedded-DRAM logic node)',
  description:
    'An invented 28 nm logic process with an embedded-DRAM capacitor option. Demonstration values only.',
  featureSize: 28e-9,
  arrayVoltage: 1.0,
  wordlineHighVoltage: 1.9,
  prechargeVoltage: 0.5,
  accessThresholdVoltage: 0.55,
  bodyEffectCoefficient: 0.35,
  surfacePotential: 0.8,
  bitlineJunctionCapacitancePerCell: 0.1e-15,
  bitlineToWordlineCapacitancePerCell: 0.08e-15,
  bitlineToBitlineCapacitancePerCell: 0.06e-15,
  bitlineWireCapacitancePerLength: 1.5e-10,
  bitlineResistancePerLength: 1e7,
  wordlineGateCapacitancePerCell: 0.1e-15,
  wordlineWireCapacitancePerLength: 1.5e-10,
  wordlineResistancePerLength: 2e7,
  senseAmpInputCapacitance: 3e-15,
  senseAmpSwitchedCapacitance: 4e-15,
  senseAmpMatchingCoefficient: 2e-9,
  senseAmpTransistorWidth: 0.6e-6,
  senseAmpTransistorLength: 0.06e-6,
  senseAmpWidth: 0.5e-6,
  offsetStacking: 'linear',
  foldedNoiseFactor: 0.1,
  openNoiseFactor: 0.4,
  wordlineDriverResistance: 1.5e3,
  accessTransistorResistance: 15e3,
  gainCellSenseTime: 1e-9,
  rowCycleTime: 4e-9,
  cellLeakageCurrent: 1e-13,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.6 * ELECTRON_CHARGE,
};

/** Invented 16 nm logic node for gain-cell macros: no capacitor option, leaky storage node. */
export const LOGIC_PROCESS: ProcessProfile = {
  id: 'tamsin-l16',
  name: 'Tamsin L16 (invented logic node for gain cells)',
  description:
    'An invented 16 nm logic process without a DRAM capacitor, for gain-cell macros. Demonstration values only.',
  featureSize: 16e-9,
  arrayVoltage: 0.8,
  wordlineHighVoltage: 1.3,
  prechargeVoltage: 0.4,
  accessThresholdVoltage: 0.35,
  bodyEffectCoefficient: 0.2,
  surfacePotential: 0.8,
  bitlineJunctionCapacitancePerCell: 0.05e-15,
  bitlineToWordlineCapacitancePerCell: 0.03e-15,
  bitlineToBitlineCapacitancePerCell: 0.04e-15,
  bitlineWireCapacitancePerLength: 1.8e-10,
  bitlineResistancePerLength: 5e7,
  wordlineGateCapacitancePerCell: 0.06e-15,
  wordlineWireCapacitancePerLength: 1.8e-10,
  wordlineResistancePerLength: 5e7,
  senseAmpInputCapacitance: 1e-15,
  senseAmpSwitchedCapacitance: 1.5e-15,
  senseAmpMatchingCoefficient: 1.2e-9,
  senseAmpTransistorWidth: 0.2e-6,
  senseAmpTransistorLength: 0.03e-6,
  senseAmpWidth: 0.24e-6,
  offsetStacking: 'linear',
  foldedNoiseFactor: 0.1,
  openNoiseFactor: 0.4,
  wordlineDriverResistance: 2e3,
  accessTransistorResistance: 30e3,
  gainCellSenseTime: 1e-9,
  rowCycleTime: 2e-9,
  cellLeakageCurrent: 5e-12,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.4 * ELECTRON_CHARGE,
};

export const BUILTIN_PROCESSES: readonly ProcessProfile[] = [DEMO_PROCESS, EDRAM_PROCESS, LOGIC_PROCESS];

/** 1T1C cell with folded bit lines: 2F bit-line pitch × 2F word-line pitch at half occupancy = 8F². */
export const FOLDED_8F2_CELL: CellDefinition = {
  id: 'dram-folded-8f2',
  name: '1T1C folded 8F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'folded',
  bitlinePitchInF: 2,
  wordlinePitchInF: 2,
  pitchOverride: null,
  storageCapacitance: 11e-15,
  gainRead: null,
};

/** 1T1C cell with open bit lines: 3F bit-line pitch × 2F word-line pitch at full occupancy = 6F². */
export const OPEN_6F2_CELL: CellDefinition = {
  id: 'dram-open-6f2',
  name: '1T1C open 6F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'open',
  bitlinePitchInF: 3,
  wordlinePitchInF: 2,
  pitchOverride: null,
  storageCapacitance: 11e-15,
  gainRead: null,
};

/** 1T1C cell on a vertical access transistor, open bit lines: 2F × 2F = 4F². */
export const VERTICAL_4F2_CELL: CellDefinition = {
  id: 'dram-vertical-4f2',
  name: '1T1C vertical 4F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'open',
  bitlinePitchInF: 2,
  wordlinePitchInF: 2,
  pitchOverride: null,
  storageCapacitance: 8e-15,
  gainRead: null,
};

/** Embedded-DRAM trench cell, folded: 5F × 5F at half occupancy = 50F². */
export const EDRAM_CELL: CellDefinition = {
  id: 'edram-folded-50f2',
  name: '1T1C eDRAM folded 50F²',
  kind: 'dram-1t1c',
  bitlineArchitecture: 'folded',
  bitlinePitchInF: 5,
  wordlinePitchInF: 5,
  pitchOverride: null,
  storageCapacitance: 18e-15,
  gainRead: null,
};

/** 3T gain cell: storage on the read transistor's gate and the write junction; 10F × 13F = 130F². */
export const GAIN_3T_CELL: CellDefinition = {
  id: 'gain-3t',
  name: '3T gain cell',
  kind: 'gain-3t',
  bitlineArchitecture: 'open',
  bitlinePitchInF: 10,
  wordlinePitchInF: 13,
  pitchOverride: null,
  storageCapacitance: 1.2e-15,
  gainRead: {
    readTransconductance: 20e-6,
    readThresholdVoltage: 0.3,
    readOffCurrent: 10e-9,
    unselectedLeakageCurrent: 2e-9,
  },
};

/** 2T gain cell: the read word line drives the storage transistor's source; 10F × 10F = 100F². */
export const GAIN_2T_CELL: CellDefinition = {
  id: 'gain-2t',
  name: '2T gain cell',
  kind: 'gain-2t',
  bitlineArchitecture: 'open',
  bitlinePitchInF: 10,
  wordlinePitchInF: 10,
  pitchOverride: null,
  storageCapacitance: 1.0e-15,
  gainRead: {
    readTransconductance: 20e-6,
    readThresholdVoltage: 0.3,
    readOffCurrent: 10e-9,
    unselectedLeakageCurrent: 5e-9,
  },
};

export const BUILTIN_CELLS: readonly CellDefinition[] = [
  FOLDED_8F2_CELL,
  OPEN_6F2_CELL,
  VERTICAL_4F2_CELL,
  EDRAM_CELL,
  GAIN_3T_CELL,
  GAIN_2T_CELL,
];

/** Commodity conditions: 85 °C, 64 ms window, 8192 refresh commands (DDR3/DDR4 practice). */
export const DEFAULT_OPERATING: OperatingConditions = {
  temperature: 358.15,
  refreshWindow: 64e-3,
  refreshCommandsPerWindow: 8192,
  refreshRowsInParallel: 4,
  minimumSenseMargin: 0.02,
  allowedSenseFailures: 1,
};

/**
 * Invented yield scenario, inside published ranges: D0 = 1 /cm² (textbook die-yield examples use
 * 0.016–1.25 /cm²), clustering α = 2 (textbook examples use α = 2–4), kill ratios of a few tens of
 * per cent for single cells and a few per cent for whole lines (invented), 2 spare rows and 2 spare columns
 * per mat row (common practice: a few spares per sub-array), a 6 µm² fuse with its program device and latch
 * and a 1 µm² compare bit (invented), 512 copies of the demo's 8 Mib floorplan (a 4 Gib die) on
 * 30 mm², about 59 % of it arrays (commodity DRAM dies are about half array), 300 mm wafer.
 */
export const DEFAULT_REPAIR: RepairSettings = {
  defectDensity: 10_000,
  defectClustering: 2,
  killRatioCell: 0.3,
  killRatioWordline: 0.05,
  killRatioBitline: 0.05,
  killRatioPeriphery: 0.5,
  spareRows: 2,
  spareColumns: 2,
  repairDomain: 'matRow',
  fuseArea: 6e-12,
  compareBitArea: 1e-12,
  floorplanCopiesPerDie: 512,
  dieArea: 30e-6,
  waferDiameter: 0.3,
};
