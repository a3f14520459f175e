/**
 * Matloom's physics engine: pure functions from a validated design to figures in SI units. Nothing here
 * knows about React, Konva, zustand or the DOM. Three parts: `physics/` (one law per file, plain numbers
 * in and out), `evaluation/` (evaluate(), the live preview, connectivity, checks, totals, the mat table)
 * and `figures/` (the one figure catalogue every panel, export and table loops over). Every other folder
 * imports the engine through this file only.
 */

// physics: plain numbers in, plain numbers out
export { bitlineCapacitance, type BitlineCapacitance } from './physics/bitline';
export { chargeTransferRatio, chargeSharingSignal, readSignals, type ReadSignals } from './physics/sensing';
export { storedHighLevel, thresholdWithBodyEffect, type StoredHighLevel } from './physics/storedLevel';
export { pelgromSigma, offsetSigmaMultiplier, stackOffsets } from './physics/offset';
export { couplingNoise } from './physics/noise';
export {
  leakageAtTemperature,
  activationEnergyForRatio,
  retentionTime,
  leakageDroop,
  BOLTZMANN,
} from './physics/retention';
export {
  refreshInterval,
  rowsPerRefreshCommand,
  refreshCycleTime,
  refreshBusyFraction,
  refreshPower,
} from './physics/refresh';
export { drivenLineDelay, chargeSharingDelay, LUMPED_RC_50, DISTRIBUTED_RC_50 } from './physics/delay';
export { bitlinePairEnergy, chargingEnergy } from './physics/energy';
export { gainReadCurrent, gainReadSignals } from './physics/gainRead';
export { inverseNormal, upperTailQuantile } from './physics/statistics';
export { poissonYield, negativeBinomialYield, grossDiesPerWafer, goodDiesPerWafer } from './physics/yield';
export {
  RepairSimulation,
  estimateRepairProbability,
  type RepairMonteCarloRequest,
  type RepairMonteCarloResult,
} from './physics/repairMonteCarlo';
export { drivenLineTime } from './physics/rcLine';
export { LineTimeMemo } from './physics/lineTimeMemo';
export {
  wordlineCapacitance,
  wordlineTiming,
  type WordlineCapacitance,
  type WordlineTiming,
} from './physics/wordline';
export {
  developedShare,
  developmentTimeConstant,
  equaliseTime,
  latchTime,
  restoreTime,
  rowTiming,
  type RowTiming,
} from './physics/rowTiming';

// evaluation: a design in, a report out
export { evaluate, findMatReport } from './evaluation/evaluate';
export { FULLY_SERVED, matPhysics, senseAmpsOfMat, type MatService } from './evaluation/matPhysics';
export {
  cellLeakage,
  designContext,
  MINIMUM_LEAKAGE,
  retentionTailAt,
  type DesignContext,
} from './evaluation/designContext';
export { refreshRowCycle } from './evaluation/totals';
export {
  firingKinds,
  checkLabel,
  CHECK_LABELS,
  MAT_RULES,
  storedHighSeverity,
  type CheckedFigures,
  type CheckLimits,
  type MatRule,
} from './evaluation/checkRules';
export { preparePreview, previewReport, type PreviewBase } from './evaluation/preview';
export { editReport } from './evaluation/editReport';
export { prepareForEdits } from './evaluation/reportState';
export {
  computeYieldFigures,
  matDomainShare,
  repairSettingsOf,
  yieldFiguresOf,
  yieldOfDomains,
  type YieldFigures,
} from './evaluation/yieldFigures';
export {
  gridRepairPlan,
  reportRepairPlan,
  type MatShare,
  type RepairDomainClass,
  type RepairPlan,
} from './evaluation/repairDomains';
export { sharedDomainLayout, type RepairLayout, type RepairTile } from './physics/repairLayout';
export {
  FINDING_KINDS,
  type ActivationEnergy,
  type ChargeSharingRead,
  type Finding,
  type FindingKind,
  type GainCellRead,
  type MatFigures,
  type MatReport,
  type RefreshFigures,
  type Report,
  type Severity,
  type Totals,
} from './evaluation/report';
export { figuresAt, matAt, matIdAt, matIndexOf, type MatTable } from './evaluation/matTable';
export { allMats, senseAmpStripIdsOf, wordlineDriverIdsOf } from './evaluation/matExports';

// figures: the one catalogue
export type { Explanation, ExplanationInput } from './figures/explanation';
export type { FigureEntry, ScaledColumn, Working } from './figures/figure';
export { MAT_FIGURE_GROUPS, type MatFigureEntry, type MatFigureGroup } from './figures/matFigure';
export {
  explainMatFigure,
  matFigureApplies,
  matFigureEntry,
  MAT_FIGURE_CATALOGUE,
  MAT_FIGURE_PANEL,
  MAT_FIGURES,
  type MatFigureKey,
} from './figures/matFigures';
export { TOTAL_FIGURE_GROUPS, type TotalFigureEntry, type TotalFigureGroup } from './figures/totalFigure';
export {
  explainTotal,
  totalFigureEntry,
  TOTAL_FIGURE_CATALOGUE,
  TOTAL_FIGURE_PANEL,
  TOTAL_FIGURES,
  type TotalFigureKey,
} from './figures/totalFigures';
export type {
  BankFigureEntry,
  FigureContext,
  FigureKey,
  FigureView,
  PartitionFigures,
} from './figures/bankFigure';
export {
  AXIS_FIGURES,
  BANK_FIGURE_CATALOGUE,
  bankFigureEntry,
  explainFigure,
  figuresOfferedIn,
  pointCardFigures,
  TABLE_FIGURES,
} from './figures/bankFigures';
export { figuresFromReport } from './figures/bankFromReport';
export { bankMissingReason, MISSING_REASONS } from './figures/missingReasons';
