/**
 * Matloom's physics engine: pure functions from a validated design to figures in SI units.
 * Nothing here knows about React, Konva, zustand or the DOM.
 */
export { evaluate, evaluateMat, findMatReport } from './evaluate';
export { bitlineCapacitance, type BitlineCapacitance } from './bitline';
export { chargeTransferRatio, chargeSharingSignal, readSignals, type ReadSignals } from './sensing';
export { storedHighLevel, thresholdWithBodyEffect, type StoredHighLevel } from './storedLevel';
export { explainMatFigure, explainTotal, MAT_FIGURES, TOTAL_FIGURES } from './explain';
export type { Explanation, ExplanationInput, MatFigureKey, TotalFigureKey } from './explain';
export type { Finding, FindingKind, MatReport, Report, Severity, Totals } from './report';
export { preparePreview, previewReport, type PreviewBase } from './preview';
