import type { Finding, Report } from '../engine';

function sameFinding(a: Finding, b: Finding): boolean {
  return (
    a.kind === b.kind &&
    a.severity === b.severity &&
    a.message === b.message &&
    a.blockIds.length === b.blockIds.length &&
    a.blockIds.every((id, i) => b.blockIds[i] === id)
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
    if (!Object.is(a.totals[key], b.totals[key])) return false;
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
    if (m.bitlineCapacitance.total !== n.bitlineCapacitance.total || m.senseSignal !== n.senseSignal)
      return false;
    if (m.bits !== n.bits || m.area !== n.area || m.chargeTransferRatio !== n.chargeTransferRatio)
      return false;
  }
  return true;
}
