/**
 * Matloom's physics engine: pure functions from a validated design to figures in SI units.
 * Nothing here knows about React, Konva, zustand or the DOM.
 */
export { evaluate, findMatReport } from './evaluate';
export { bitlineCapacitance, type BitlineCapacitance } from './bitline';
export { chargeTransferRatio, chargeSharingSignal, readSignals, type ReadSignals } from './sensing';
export { storedHighLevel, thresholdWithBodyEffect, type StoredHighLevel } from './storedLevel';
export { pelgromSigma, offsetSigmaMultiplier, stackOffsets } from './offset';
export { couplingNoise } from './noise';
export {
  leakageAtTemperature,
  activationEnergyForRatio,
  retentionTime,
  leakageDroop,
  BOLTZMANN,
} from './retention';
export {
  refreshInterval,
  rowsPerRefreshCommand,
  refreshCycleTime,
  refreshBusyFraction,
  refreshPower,
} from './refresh';
export { drivenLineDelay, chargeSharingDelay, LUMPED_RC_50, DISTRIBUTED_RC_50 } from './delay';
export { bitlinePairEnergy, chargingEnergy } from './energy';
export { gainReadCurrent, gainReadSignals } from './gainRead';
export { inverseNormal, upperTailQuantile } from './statistics';
export {
  explainMatFigure,
  matFigureApplies,
  MAT_FIGURES,
  MAT_FIGURE_GROUPS,
  type MatFigureKey,
} from './explainMat';
export { explainTotal, TOTAL_FIGURES, TOTAL_FIGURE_GROUPS, type TotalFigureKey } from './explainTotals';
export type { Explanation, ExplanationInput } from './explanation';
export type {
  ActivationEnergy,
  ChargeSharingRead,
  Finding,
  FindingKind,
  GainCellRead,
  MatFigures,
  MatReport,
  RefreshFigures,
  Report,
  Severity,
  Totals,
} from './report';
export { preparePreview, previewReport, type PreviewBase } from './preview';
export {
  allMats,
  figuresAt,
  matAt,
  matIdAt,
  matIndexOf,
  senseAmpStripIdsOf,
  wordlineDriverIdsOf,
  type MatTable,
} from './matTable';
