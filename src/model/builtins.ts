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

/**
 * Invented commodity DRAM node, F = 18 nm, buried-gate (recessed) access transistors, folded or open
 * arrays. Every value is invented, inside the published range of its class of node noted beside it.
 * Ranges marked "derived" follow from published resistivities and the node's dimensions (arithmetic).
 */
export const DEMO_PROCESS: ProcessProfile = {
  id: 'halden-d18',
  name: 'Halden D18 (invented commodity DRAM node)',
  description:
    'An invented 18 nm DRAM process for the demo floorplan. Not a real foundry profile: replace every value with your own extracted data.',
  featureSize: 18e-9,
  // 1.0–1.2 V array supply at DDR4/LPDDR4 class nodes (JEDEC JESD79-4 VDD = 1.2 V; published).
  arrayVoltage: 1.1,
  // VPP 2.5–3.0 V (Micron DDR4 datasheets: VPP = 2.5 V; published); must exceed VDD + Vt(VDD).
  wordlineHighVoltage: 2.6,
  prechargeVoltage: 0.55,
  // Access-device Vt0 0.5–0.9 V: kept high for low sub-threshold leakage (Keeth & Baker, DRAM Circuit
  // Design, IEEE Press 2001, ch. 2; from memory).
  accessThresholdVoltage: 0.75,
  // γ 0.3–0.6 V^½ for heavily doped array wells (Sedra & Smith body-effect range; from memory).
  bodyEffectCoefficient: 0.45,
  surfacePotential: 0.85,
  // Bit-line capacitance 40–100 fF per 512-cell bit line at 2x/1x nm, Cbl/Cs ≈ 3–10 (REFERENCES item 4,
  // common practice; bit-line-to-node-contact coupling the largest part: Coventor/SemiEngineering
  // "A Comparative Evaluation of DRAM Bit-Line Spacer Integration Schemes", 2021; published). Split here:
  // 0.03 fF per contact, 0.02 fF per word-line crossing, 0.012 fF per pitch to the neighbours.
  bitlineJunctionCapacitancePerCell: 0.03e-15,
  bitlineToWordlineCapacitancePerCrossing: 0.02e-15,
  bitlineToBitlineCapacitancePerCrossing: 0.012e-15,
  bitlineWireCapacitancePerLength: 6e-11,
  // Tungsten bit line ~15 nm × 30 nm with ρ(W) 15–30 µΩ·cm at that width: 300–700 Ω/µm derived;
  // "well above 25 Ω/µm" at 18 nm. Chosen 150 Ω/µm, the low end for a wider, taller line.
  bitlineResistancePerLength: 1.5e8,
  // Buried-gate word line: active gate 0.05–0.12 fF per crossing (recess perimeter ≈ 100 nm × 18 nm,
  // EOT ≈ 4–6 nm, plus overlap; derived), passing gate in the isolation about half of it.
  wordlineGateCapacitancePerActiveCrossing: 0.08e-15,
  wordlinePassingCapacitancePerCrossing: 0.04e-15,
  wordlineWireCapacitancePerLength: 1.5e-10,
  // Buried TiN/W word line ≈ 18 nm × 50 nm: several hundred Ω/µm to about 1.5 kΩ/µm (derived from
  // ρ(W) 20–40 µΩ·cm in narrow trenches and the TiN liner; REFERENCES item 28, common practice).
  wordlineResistancePerLength: 8e8,
  senseAmpInputCapacitance: 4e-15,
  senseAmpSwitchedCapacitance: 3e-15,
  // 1/gm of the latch pair 5–20 kΩ (gm 50–200 µS for minimum-length array sense amplifiers; from memory).
  senseAmpLatchResistance: 10e3,
  equaliserResistance: 3e3,
  // A_VT 1.5–3 mV·µm at 2x nm (Pelgrom et al., IEEE JSSC 24(5), 1989 scaling of A_VT with tox; from memory).
  senseAmpMatchingCoefficient: 2e-9,
  senseAmpTransistorWidth: 0.5e-6,
  senseAmpTransistorLength: 0.09e-6,
  senseAmpWidth: 0.1e-6,
  offsetStacking: 'linear',
  foldedNoiseFactor: 0.1,
  openNoiseFactor: 0.4,
  wordlineDriverResistance: 3e3,
  // Cell on-current 10–40 µA at VPP (1x nm buried-channel access devices; from memory) → 15–60 kΩ.
  accessTransistorResistance: 25e3,
  gainCellSenseTime: 2e-9,
  rowCycleTimeOverride: 0,
  // Typical cell leakage 0.1–10 fA at 85 °C (IEICE Trans. Electron. E79-C(12):1707, 1996: femtoamperes;
  // published); retention of typical cells is seconds at 85 °C.
  cellLeakageCurrent: 1e-15,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.79 * ELECTRON_CHARGE,
  // Two-population retention (Hamamoto, Sugiura, Sawada, IEEE Trans. Electron Devices 45(6), 1998; from
  // memory): a tail of 1e-5–1e-3 of the cells with trap-assisted leakage, Ea ≈ 0.5–0.6 eV (≈ Eg/2),
  // against ≈ 1 eV for the main population's diffusion current.
  tailCellFraction: 1e-4,
  tailLeakageMultiplier: 5,
  tailLeakageSpread: 0.35,
  tailActivationEnergy: 0.55 * ELECTRON_CHARGE,
};

/**
 * Invented embedded-DRAM option of a 28 nm logic node (deep-trench or stacked capacitor, fast cycle).
 * Word lines are silicided poly or metal gates strapped in metal: tens to a few hundred Ω/µm.
 */
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
  bitlineToWordlineCapacitancePerCrossing: 0.05e-15,
  bitlineToBitlineCapacitancePerCrossing: 0.03e-15,
  bitlineWireCapacitancePerLength: 1.5e-10,
  // Lower-metal bit line at 28 nm: 5–20 Ω/µm (logic BEOL M1/M2 at 28 nm; from memory).
  bitlineResistancePerLength: 1e7,
  wordlineGateCapacitancePerActiveCrossing: 0.1e-15,
  wordlinePassingCapacitancePerCrossing: 0.05e-15,
  wordlineWireCapacitancePerLength: 1.5e-10,
  // Metal-gate word line strapped every few cells: 20–200 Ω/µm effective (from memory).
  wordlineResistancePerLength: 5e7,
  senseAmpInputCapacitance: 3e-15,
  senseAmpSwitchedCapacitance: 4e-15,
  senseAmpLatchResistance: 5e3,
  equaliserResistance: 2e3,
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
  rowCycleTimeOverride: 0,
  // eDRAM retention is tens to hundreds of µs at 85–105 °C (IBM eDRAM, IEDM 2014; from memory).
  cellLeakageCurrent: 1e-13,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.6 * ELECTRON_CHARGE,
  tailCellFraction: 1e-4,
  tailLeakageMultiplier: 4,
  tailLeakageSpread: 0.4,
  tailActivationEnergy: 0.5 * ELECTRON_CHARGE,
};

/**
 * Invented 16 nm logic node for gain-cell and SRAM macros: no capacitor option, leaky storage node.
 * Word and bit lines are lower metal at 16 nm: 30–100 Ω/µm (BEOL M1/M2 at 14/16 nm; from memory).
 */
export const LOGIC_PROCESS: ProcessProfile = {
  id: 'tamsin-l16',
  name: 'Tamsin L16 (invented logic node for gain cells)',
  description:
    'An invented 16 nm logic process without a DRAM capacitor, for gain-cell and SRAM macros. Demonstration values only.',
  featureSize: 16e-9,
  arrayVoltage: 0.8,
  wordlineHighVoltage: 1.3,
  prechargeVoltage: 0.4,
  accessThresholdVoltage: 0.35,
  bodyEffectCoefficient: 0.2,
  surfacePotential: 0.8,
  bitlineJunctionCapacitancePerCell: 0.05e-15,
  bitlineToWordlineCapacitancePerCrossing: 0.03e-15,
  bitlineToBitlineCapacitancePerCrossing: 0.04e-15,
  bitlineWireCapacitancePerLength: 1.8e-10,
  bitlineResistancePerLength: 5e7,
  wordlineGateCapacitancePerActiveCrossing: 0.06e-15,
  wordlinePassingCapacitancePerCrossing: 0.03e-15,
  wordlineWireCapacitancePerLength: 1.8e-10,
  wordlineResistancePerLength: 5e7,
  senseAmpInputCapacitance: 1e-15,
  senseAmpSwitchedCapacitance: 1.5e-15,
  senseAmpLatchResistance: 5e3,
  equaliserResistance: 2e3,
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
  rowCycleTimeOverride: 0,
  // Gain-cell storage nodes hold for µs to ms in logic processes (Meinerzhagen et al., Gain-Cell
  // Embedded DRAMs, Springer 2018; from memory): leakage pA-class at 85 °C for ≈1 fF.
  cellLeakageCurrent: 5e-12,
  leakageReferenceTemperature: 358.15,
  leakageActivationEnergy: 0.4 * ELECTRON_CHARGE,
  tailCellFraction: 1e-4,
  tailLeakageMultiplier: 3,
  tailLeakageSpread: 0.4,
  tailActivationEnergy: 0.35 * ELECTRON_CHARGE,
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
  // 10–25 fF per cell below 30 nm (ITRS PIDS DRAM tables; industry below the 20 fF target; from memory).
  storageCapacitance: 11e-15,
  gainRead: null,
  holdCurrent: 0,
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
  holdCurrent: 0,
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
  holdCurrent: 0,
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
  holdCurrent: 0,
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
    writeCouplingCapacitance: 0.05e-15,
  },
  holdCurrent: 0,
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
    writeCouplingCapacitance: 0.05e-15,
  },
  holdCurrent: 0,
};

/**
 * 4T dynamic cell: two cross-coupled storage transistors and two access transistors, no loads.
 * Footprint ≈ 60F²: the same four devices as the loadless 4T cell of K. Noda et al., "A 1.9-µm² loadless
 * CMOS four-transistor SRAM cell in a 0.18-µm logic technology", IEDM 1998 (1.9 µm² at F = 0.18 µm =
 * 58.6F²; from memory). The storage node is the gate of one transistor plus the drain of the other
 * (≈ 1–3 fF at these nodes; from memory).
 */
export const DYNAMIC_4T_CELL: CellDefinition = {
  id: 'dram-4t',
  name: '4T dynamic cell',
  kind: 'dram-4t',
  bitlineArchitecture: 'paired',
  bitlinePitchInF: 10,
  wordlinePitchInF: 6,
  pitchOverride: null,
  storageCapacitance: 2e-15,
  gainRead: {
    readTransconductance: 40e-6,
    readThresholdVoltage: 0.35,
    readOffCurrent: 1e-9,
    unselectedLeakageCurrent: 1e-9,
    writeCouplingCapacitance: 0,
  },
  holdCurrent: 0,
};

/**
 * 6T SRAM reference cell: ≈ 140F² (Table 2 of "Memory characteristics of silicon nanowire transistors
 * generated by weak impact ionization", Scientific Reports 7, 2017: standard 6T SRAM 140 F² and
 * ~1 nW standby per cell at an older node; published), i.e. 0.036 µm² at F = 16 nm; 6T cells of 0.06–0.1 µm² at
 * 22–14 nm logic nodes (IBM trigate 0.06 µm², IEDM 2009; published). Standby current 10–100 pA per cell
 * at 0.8 V in FinFET logic (from memory).
 */
export const SRAM_6T_CELL: CellDefinition = {
  id: 'sram-6t',
  name: '6T SRAM (reference)',
  kind: 'sram-6t',
  bitlineArchitecture: 'paired',
  bitlinePitchInF: 14,
  wordlinePitchInF: 10,
  pitchOverride: null,
  // The 6T cell's nodes (≈ 0.5 fF) never need refresh; kept for the schema.
  storageCapacitance: 0.5e-15,
  gainRead: {
    readTransconductance: 60e-6,
    readThresholdVoltage: 0.3,
    readOffCurrent: 1e-9,
    unselectedLeakageCurrent: 1e-9,
    writeCouplingCapacitance: 0,
  },
  holdCurrent: 50e-12,
};

export const BUILTIN_CELLS: readonly CellDefinition[] = [
  FOLDED_8F2_CELL,
  OPEN_6F2_CELL,
  VERTICAL_4F2_CELL,
  EDRAM_CELL,
  GAIN_3T_CELL,
  GAIN_2T_CELL,
  DYNAMIC_4T_CELL,
  SRAM_6T_CELL,
];

/** Commodity conditions: 85 °C, 64 ms window, 8192 refresh commands (DDR3/DDR4 practice). */
export const DEFAULT_OPERATING: OperatingConditions = {
  temperature: 358.15,
  refreshWindow: 64e-3,
  refreshCommandsPerWindow: 8192,
  refreshRowsInParallel: 4,
  minimumSenseMargin: 0.02,
  allowedSenseFailures: 1,
  floorplanCopiesPerDie: 1,
  // Sense-amplifier firing 2–5 ns after the word line turns the cells on (common practice (no source)).
  senseFireTime: 3e-9,
  restoreFraction: 0.95,
  equaliseResidual: 5e-3,
};

/**
 * Invented yield scenario, inside published ranges: D0 = 1 /cm² (textbook die-yield examples use
 * 0.016–1.25 /cm²), clustering α = 2 (textbook examples use α = 2–4), 2 spare rows per mat row and 2 spare
 * columns per sense-amplifier strip segment (common practice: a few spares per sub-array, no source),
 * 30 mm² die (the floorplan copies on it come from the operating conditions), 300 mm wafer.
 * Demo inputs with NO published value behind them: the kill ratios (a few tens of per cent for single
 * cells, a few per cent for whole lines, half for the periphery), the 6 µm² fuse with its program device
 * and latch and the 1 µm² compare bit. A search of public pages and documentation (eFuse bit-cell
 * area at a node, laser-fuse pitch, critical-area kill ratios) found descriptions of fuses and of how
 * kill ratios are set from defect classification, but no number to cite; set them from your process.
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
  dieArea: 30e-6,
  waferDiameter: 0.3,
};
