/**
 * The engine's edit path: what a drag's live preview and a committed edit of a few blocks evaluate with
 * (only the changed blocks and the mats beside them), and the index the first edit starts from. The app
 * loads it after its first paint (store/editPathOnDemand.ts) — drawing a design needs only evaluate() —
 * and evaluates whole until it has arrived, which gives the same report (tested).
 */
export { preparePreview, previewReport, type PreviewBase } from './evaluation/preview';
export { editReport } from './evaluation/editReport';
export { prepareForEdits } from './evaluation/reportState';
