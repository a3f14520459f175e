import type { Finding, MatReport, Report } from '../engine';

function sameFinding(a: Finding, b: Finding): boolean {
  return (
    a.kind === b.kind &&
    a.severity === b.severity &&
    a.message === b.message &&
    a.blockIds.length === b.blockIds.length &&
    a.blockIds.every((id, i) => b.blockIds[i] === id)
  );
}

/** The figures the panels show for a mat; mats of one kind share their physics, so this is cheap. */
function sameMatFigures(m: MatReport, n: MatReport): boolean {
  return (
    m.figures.bitlineCapacitance.total === n.figures.bitlineCapacitance.total &&
    m.figures.senseSignal === n.figures.senseSignal &&
    m.figures.senseSignalAfterRefresh === n.figures.senseSignalAfterRefresh &&
    m.figures.senseMargin === n.figures.senseMargin &&
    m.figures.senseMarginAtRefresh === n.figures.senseMarginAtRefresh &&
    m.figures.requiredSignal === n.figures.requiredSignal &&
    m.figures.retentionTime === n.figures.retentionTime &&
    m.figures.wordlineDelay === n.figures.wordlineDelay &&
    m.figures.bitlineDelay === n.figures.bitlineDelay &&
    m.figures.activationEnergy.total === n.figures.activationEnergy.total &&
    m.figures.senseAmpPitchBudget === n.figures.senseAmpPitchBudget &&
    m.figures.bits === n.figures.bits &&
    m.figures.usableBits === n.figures.usableBits &&
    m.figures.area === n.figures.area &&
    m.figures.cellId === n.figures.cellId &&
    m.figures.read.kind === n.figures.read.kind
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
  const selected = new Set(selectedIds);
  for (let i = 0; i < a.mats.length; i++) {
    const m = a.mats[i];
    const n = b.mats[i];
    if (!m || !n || !selected.has(m.matId)) continue;
    if (!sameMatFigures(m, n)) return false;
  }
  return true;
}
