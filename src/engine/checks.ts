import { formatQuantity } from '../model/units';
import type { Overlap } from './overlaps';
import type { Finding, MatReport } from './report';
import type { StoredHighLevel } from './storedLevel';

/** Turns geometry and physics into findings: errors first, then warnings, each naming its blocks. */
export function collectFindings(
  mats: readonly MatReport[],
  overlaps: readonly Overlap[],
  storedHigh: StoredHighLevel,
  arrayVoltage: number,
): Finding[] {
  const findings: Finding[] = [];
  for (const mat of mats) {
    const label = mat.name || mat.matId;
    if (mat.unsensedBitlines > 0) {
      findings.push({
        kind: 'unsensedBitlines',
        severity: 'error',
        blockIds: [mat.matId],
        message: `${label}: ${mat.unsensedBitlines} of ${mat.bitlineCount} bit lines reach no sense-amplifier strip`,
      });
    }
    if (mat.undrivenWordlines > 0) {
      findings.push({
        kind: 'undrivenWordlines',
        severity: 'error',
        blockIds: [mat.matId],
        message: `${label}: ${mat.undrivenWordlines} of ${mat.wordlineCount} word lines reach no driver`,
      });
    }
  }
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
        `${formatQuantity(arrayVoltage, 'voltage')}; a full 1 needs VPP ≥ ${formatQuantity(storedHigh.wordlineHighNeeded, 'voltage')}`,
    });
  }
  return findings;
}
