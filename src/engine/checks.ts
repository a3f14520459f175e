import type { Design } from '../model/design';
import { formatQuantity } from '../model/units';
import type { Overlap } from './overlaps';
import type { Finding, MatReport } from './report';
import type { StoredHighLevel } from './storedLevel';

/** Per-mat checks: connectivity, margin, sense-amplifier pitch, retention and open-bit-line edges. */
function matFindings(mat: MatReport, design: Design): Finding[] {
  const label = mat.name || mat.matId;
  const ids = [mat.matId];
  const v = (x: number) => formatQuantity(x, 'voltage');
  const found: Finding[] = [];
  if (mat.unsensedBitlines > 0) {
    found.push({
      kind: 'unsensedBitlines',
      severity: 'error',
      blockIds: ids,
      message: `${label}: ${mat.unsensedBitlines} of ${mat.bitlineCount} bit lines reach no sense-amplifier strip`,
    });
  }
  if (mat.undrivenWordlines > 0) {
    found.push({
      kind: 'undrivenWordlines',
      severity: 'error',
      blockIds: ids,
      message: `${label}: ${mat.undrivenWordlines} of ${mat.wordlineCount} word lines reach no driver`,
    });
  }
  const margin = mat.senseMarginAtRefresh;
  const minimum = design.operating.minimumSenseMargin;
  if (margin < 0) {
    found.push({
      kind: 'senseMargin',
      severity: 'error',
      blockIds: ids,
      message: `${label}: sense margin ${v(margin)} after a refresh window (signal ${v(mat.senseSignalAfterRefresh)} < offset and noise ${v(mat.requiredSignal)})`,
    });
  } else if (margin < minimum) {
    found.push({
      kind: 'senseMargin',
      severity: 'warning',
      blockIds: ids,
      message: `${label}: sense margin ${v(margin)} is below the ${v(minimum)} target`,
    });
  }
  if (!mat.senseAmpFits) {
    found.push({
      kind: 'senseAmpPitch',
      severity: 'error',
      blockIds: ids,
      message: `${label}: a sense amplifier needs ${formatQuantity(design.process.senseAmpWidth, 'length')} but its bit-line pitch budget is ${formatQuantity(mat.senseAmpPitchBudget, 'length')}`,
    });
  }
  if (mat.retentionTime < design.operating.refreshWindow) {
    found.push({
      kind: 'retention',
      severity: 'error',
      blockIds: ids,
      message: `${label}: retention ${formatQuantity(mat.retentionTime, 'time')} is shorter than the ${formatQuantity(design.operating.refreshWindow, 'time')} refresh window`,
    });
  }
  if (mat.lostBits > 0) {
    found.push({
      kind: 'openBitlineEdge',
      severity: 'warning',
      blockIds: ids,
      message: `${label}: ${formatQuantity(mat.lostBits, 'count')} bits on open bit lines have no partner mat beyond their sense-amplifier strip and are lost`,
    });
  }
  return found;
}

/** Turns geometry and physics into findings, each naming its blocks. */
export function collectFindings(
  mats: readonly MatReport[],
  overlaps: readonly Overlap[],
  storedHigh: StoredHighLevel,
  design: Design,
): Finding[] {
  const findings: Finding[] = [];
  for (const mat of mats) findings.push(...matFindings(mat, design));
  for (const o of overlaps) {
    findings.push({
      kind: 'overlap',
      severity: 'error',
      blockIds: [o.firstId, o.secondId],
      message: `${o.firstId} and ${o.secondId} overlap by ${formatQuantity(o.area, 'area')}`,
    });
  }
  if (storedHigh.limitedByWordline) {
    findings.push({
      kind: 'storedHighLimited',
      severity: 'warning',
      blockIds: [],
      message:
        `word-line high level stores a 1 at only ${formatQuantity(storedHigh.level, 'voltage')} of ` +
        `${formatQuantity(design.process.arrayVoltage, 'voltage')}; a full 1 needs VPP ≥ ${formatQuantity(storedHigh.wordlineHighNeeded, 'voltage')}`,
    });
  }
  return findings;
}
