import type { GainRead } from './cell';
import type { OperatingConditions } from './operating';
import type { ProcessProfile } from './process';
import type { RepairSettings } from './repair';
import type { Quantity } from './units';

/** A numeric field people can edit, with how to show and read it. */
export interface FieldInfo<K extends string> {
  readonly key: K;
  readonly label: string;
  readonly quantity: Quantity;
}

type NumericKeys<T> = { [K in keyof T]: T[K] extends number ? K : never }[keyof T] & string;

export type ProcessNumericField = NumericKeys<ProcessProfile>;
export type OperatingNumericField = NumericKeys<OperatingConditions>;
export type GainReadField = NumericKeys<GainRead>;
export type RepairNumericField = NumericKeys<RepairSettings>;

/** Process fields in the order the process panel shows them. */
export const PROCESS_FIELDS: readonly FieldInfo<ProcessNumericField>[] = [
  { key: 'featureSize', label: 'Feature size F', quantity: 'length' },
  { key: 'arrayVoltage', label: 'Array voltage VDD', quantity: 'voltage' },
  { key: 'wordlineHighVoltage', label: 'Word-line high VPP', quantity: 'voltage' },
  { key: 'prechargeVoltage', label: 'Bit-line precharge', quantity: 'voltage' },
  { key: 'accessThresholdVoltage', label: 'Access Vt0', quantity: 'voltage' },
  { key: 'bodyEffectCoefficient', label: 'Body effect γ', quantity: 'sqrtVoltage' },
  { key: 'surfacePotential', label: 'Surface potential 2φF', quantity: 'voltage' },
  { key: 'bitlineJunctionCapacitancePerCell', label: 'BL junction C per cell', quantity: 'capacitance' },
  {
    key: 'bitlineToWordlineCapacitancePerCrossing',
    label: 'BL–WL coupling per crossing',
    quantity: 'capacitance',
  },
  {
    key: 'bitlineToBitlineCapacitancePerCrossing',
    label: 'BL–BL coupling per crossing',
    quantity: 'capacitance',
  },
  { key: 'bitlineWireCapacitancePerLength', label: 'BL wire C per length', quantity: 'capacitancePerLength' },
  { key: 'bitlineResistancePerLength', label: 'BL resistance per length', quantity: 'resistancePerLength' },
  {
    key: 'wordlineGateCapacitancePerActiveCrossing',
    label: 'WL gate C per active crossing',
    quantity: 'capacitance',
  },
  {
    key: 'wordlinePassingCapacitancePerCrossing',
    label: 'WL C per passing crossing',
    quantity: 'capacitance',
  },
  {
    key: 'wordlineWireCapacitancePerLength',
    label: 'WL wire C per length',
    quantity: 'capacitancePerLength',
  },
  { key: 'wordlineResistancePerLength', label: 'WL resistance per length', quantity: 'resistancePerLength' },
  { key: 'wordlineDriverResistance', label: 'WL driver resistance', quantity: 'resistance' },
  { key: 'accessTransistorResistance', label: 'Access transistor R_on', quantity: 'resistance' },
  { key: 'senseAmpInputCapacitance', label: 'Sense-amp input C', quantity: 'capacitance' },
  { key: 'senseAmpSwitchedCapacitance', label: 'Sense-amp switched C', quantity: 'capacitance' },
  { key: 'senseAmpLatchResistance', label: 'Sense-amp latch 1/gm', quantity: 'resistance' },
  { key: 'equaliserResistance', label: 'Equaliser R_on', quantity: 'resistance' },
  { key: 'senseAmpMatchingCoefficient', label: 'Sense-amp A_VT', quantity: 'matchingCoefficient' },
  { key: 'senseAmpTransistorWidth', label: 'Sense-amp W', quantity: 'length' },
  { key: 'senseAmpTransistorLength', label: 'Sense-amp L', quantity: 'length' },
  { key: 'senseAmpWidth', label: 'Sense-amp layout width', quantity: 'length' },
  { key: 'foldedNoiseFactor', label: 'Noise factor, folded', quantity: 'ratio' },
  { key: 'openNoiseFactor', label: 'Noise factor, open', quantity: 'ratio' },
  { key: 'gainCellSenseTime', label: 'Gain-cell sense time', quantity: 'time' },
  { key: 'rowCycleTimeOverride', label: 'tRC for refresh (0 = computed)', quantity: 'time' },
  { key: 'cellLeakageCurrent', label: 'Cell leakage', quantity: 'current' },
  { key: 'leakageReferenceTemperature', label: 'Leakage given at', quantity: 'temperature' },
  { key: 'leakageActivationEnergy', label: 'Leakage activation energy', quantity: 'activationEnergy' },
  { key: 'tailCellFraction', label: 'Weak-cell tail fraction', quantity: 'ratio' },
  { key: 'tailLeakageMultiplier', label: 'Tail leakage × typical', quantity: 'ratio' },
  { key: 'tailLeakageSpread', label: 'Tail spread σ(ln I)', quantity: 'ratio' },
  { key: 'tailActivationEnergy', label: 'Tail activation energy', quantity: 'activationEnergy' },
];

/** Operating conditions in panel order. */
export const OPERATING_FIELDS: readonly FieldInfo<OperatingNumericField>[] = [
  { key: 'temperature', label: 'Temperature', quantity: 'temperature' },
  { key: 'refreshWindow', label: 'Refresh window tREFW', quantity: 'time' },
  { key: 'refreshCommandsPerWindow', label: 'Refresh commands per window', quantity: 'count' },
  { key: 'refreshRowsInParallel', label: 'Rows refreshed in parallel', quantity: 'count' },
  { key: 'minimumSenseMargin', label: 'Minimum sense margin', quantity: 'voltage' },
  { key: 'allowedSenseFailures', label: 'Allowed failing sense amps', quantity: 'ratio' },
  { key: 'floorplanCopiesPerDie', label: 'Floorplan copies per die', quantity: 'count' },
  { key: 'senseFireTime', label: 'Sense fires after WL on', quantity: 'time' },
  { key: 'restoreFraction', label: 'Restore to share of 1', quantity: 'ratio' },
  { key: 'equaliseResidual', label: 'Equalise residual', quantity: 'voltage' },
];

/** Gain-cell read-path fields. */
export const GAIN_READ_FIELDS: readonly FieldInfo<GainReadField>[] = [
  { key: 'readTransconductance', label: 'Read β', quantity: 'transconductance' },
  { key: 'readThresholdVoltage', label: 'Read Vt', quantity: 'voltage' },
  { key: 'readOffCurrent', label: 'Read off-current', quantity: 'current' },
  { key: 'unselectedLeakageCurrent', label: 'Unselected-cell leakage', quantity: 'current' },
];

/** Yield inputs (defects, redundancy, die and wafer) in panel order. */
export const REPAIR_FIELDS: readonly FieldInfo<RepairNumericField>[] = [
  { key: 'defectDensity', label: 'Killing-defect density D0', quantity: 'defectDensity' },
  { key: 'defectClustering', label: 'Defect clustering α', quantity: 'ratio' },
  { key: 'killRatioCell', label: 'Kill ratio, single cell', quantity: 'ratio' },
  { key: 'killRatioWordline', label: 'Kill ratio, word line', quantity: 'ratio' },
  { key: 'killRatioBitline', label: 'Kill ratio, bit-line pair', quantity: 'ratio' },
  { key: 'killRatioPeriphery', label: 'Kill ratio, periphery', quantity: 'ratio' },
  { key: 'spareRows', label: 'Spare rows per row domain', quantity: 'count' },
  { key: 'spareColumns', label: 'Spare columns per strip segment', quantity: 'count' },
  { key: 'fuseArea', label: 'Fuse area', quantity: 'area' },
  { key: 'compareBitArea', label: 'Compare-bit area', quantity: 'area' },
  { key: 'dieArea', label: 'Die area', quantity: 'area' },
  { key: 'waferDiameter', label: 'Wafer diameter', quantity: 'length' },
];
