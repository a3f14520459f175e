import { findMatReport, type Finding, type MatReport, type Report } from '../engine';

function sameFinding(a: Finding, b: Finding): boolean {
  return (
    a.kind === b.kind &&
    a.severity === b.severity &&
    a.message === b.message &&
    a.blockIds.length === b.blockIds.length &&
    a.blockIds.every((id, i) => b.blockIds[i] === id)
  );
}

/** The figures the panels show for a mat; mats of one kind share one figures object, so mostly one comparison. */
function sameMatFigures(m: MatReport, n: MatReport): boolean {
  const a = m.figures;
  const b = n.figures;
  return (
    a === b ||
    (a.bitlineCapacitance.total === b.bitlineCapacitance.total &&
      a.senseSignal === b.senseSignal &&
      a.senseSignalAfterRefresh === b.senseSignalAfterRefresh &&
      a.senseMargin === b.senseMargin &&
      a.senseMarginAtRefresh === b.senseMarginAtRefresh &&
      a.requiredSignal === b.requiredSignal &&
      a.retentionTime === b.retentionTime &&
      a.wordlineDelay === b.wordlineDelay &&
      a.bitlineDelay === b.bitlineDelay &&
      a.activationEnergy.total === b.activationEnergy.total &&
      a.senseAmpPitchBudget === b.senseAmpPitchBudget &&
      a.bits === b.bits &&
      a.usableBits === b.usableBits &&
      a.area === b.area &&
      a.cellId === b.cellId &&
      a.read.kind === b.read.kind)
  );
}

/**
 * True when two reports show the same in the panels: the same totals, the same findings, and the same
 * figures for the selected mats. Used to skip re-rendering the panels on pointer moves that change
 * nothing anyone can see (most moves of a drag in open space).
 */
export function sameVisibleFigures(a: Report, b: Report, selectedIds: readonly string[]): boolean {
  if (a === b) return true;
  for (const key of Object.keys(a.totals) as (keyof Report['totals'])[]) {
    if (key === 'refresh' || key === 'areaByType') continue;
    if (!Object.is(a.totals[key], b.totals[key])) return false;
  }
  for (const key of Object.keys(a.totals.areaByType) as (keyof Report['totals']['areaByType'])[]) {
    if (!Object.is(a.totals.areaByType[key], b.totals.areaByType[key])) return false;
  }
  for (const key of Object.keys(a.totals.refresh) as (keyof Report['totals']['refresh'])[]) {
    if (!Object.is(a.totals.refresh[key], b.totals.refresh[key])) return false;
  }
  // In order: a finding that moved in the list moves in the panel too.
  if (a.findings.length !== b.findings.length) return false;
  for (let i = 0; i < a.findings.length; i++) {
    const f = a.findings[i];
    const g = b.findings[i];
    if (!f || !g || !sameFinding(f, g)) return false;
  }
  for (const id of selectedIds) {
    const m = findMatReport(a, id);
    const n = findMatReport(b, id);
    if (!m && !n) continue;
    if (!m || !n || !sameMatFigures(m, n)) return false;
  }
  return true;
}
