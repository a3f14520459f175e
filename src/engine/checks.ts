import type { Design } from '../model/design';
import { formatQuantity } from '../model/units';
import type { Overlap } from './overlaps';
import type { Finding, FindingKind, MatReport, Severity } from './report';
import type { StoredHighLevel } from './storedLevel';

/** A finding about one mat before grouping: what is wrong, without the mat's name. */
interface MatIssue {
  readonly kind: FindingKind;
  readonly severity: Severity;
  readonly detail: string;
}

/** Issues that follow from a mat's physics alone; the same for every mat of one kind. */
function physicsIssues(mat: MatReport, design: Design): MatIssue[] {
  const v = (x: number) => formatQuantity(x, 'voltage');
  const issues: MatIssue[] = [];
  const margin = mat.senseMarginAtRefresh;
  const minimum = design.operating.minimumSenseMargin;
  if (margin < 0) {
    issues.push({
      kind: 'senseMargin',
      severity: 'error',
      detail: `sense margin ${v(margin)} after a refresh window (signal ${v(mat.senseSignalAfterRefresh)} < offset and noise ${v(mat.requiredSignal)})`,
    });
  } else if (margin < minimum) {
    issues.push({
      kind: 'senseMargin',
      severity: 'warning',
      detail: `sense margin ${v(margin)} is below the ${v(minimum)} target`,
    });
  }
  if (!mat.senseAmpFits) {
    issues.push({
      kind: 'senseAmpPitch',
      severity: 'error',
      detail: `a sense amplifier needs ${formatQuantity(design.process.senseAmpWidth, 'length')} but its bit-line pitch budget is ${formatQuantity(mat.senseAmpPitchBudget, 'length')}`,
    });
  }
  if (mat.retentionTime < design.operating.refreshWindow) {
    issues.push({
      kind: 'retention',
      severity: 'error',
      detail: `retention ${formatQuantity(mat.retentionTime, 'time')} is shorter than the ${formatQuantity(design.operating.refreshWindow, 'time')} refresh window`,
    });
  }
  if (mat.lostBits > 0) {
    issues.push({
      kind: 'openBitlineEdge',
      severity: 'warning',
      detail: `${formatQuantity(mat.lostBits, 'count')} bits on open bit lines have no partner mat beyond their sense-amplifier strip and are lost`,
    });
  }
  return issues;
}

/** Issues of a mat's connections, which differ from mat to mat. */
function connectionIssues(mat: MatReport): MatIssue[] {
  const issues: MatIssue[] = [];
  if (mat.unsensedBitlines > 0) {
    issues.push({
      kind: 'unsensedBitlines',
      severity: 'error',
      detail: `${mat.unsensedBitlines} of ${mat.bitlineCount} bit lines reach no sense-amplifier strip`,
    });
  }
  if (mat.undrivenWordlines > 0) {
    issues.push({
      kind: 'undrivenWordlines',
      severity: 'error',
      detail: `${mat.undrivenWordlines} of ${mat.wordlineCount} word lines reach no driver`,
    });
  }
  return issues;
}

/** Names shown before a grouped finding's detail: one name, or the count and the first few. */
function groupLabel(labels: readonly string[]): string {
  if (labels.length === 1) return labels[0] ?? '';
  const shown = labels.slice(0, 3).join(', ');
  return `${labels.length} mats (${shown}${labels.length > 3 ? ', …' : ''})`;
}

/**
 * Turns geometry and physics into findings, each naming its blocks. Mats with the same issue and the
 * same figures are grouped into one finding that names them all, so a regular array with one weakness
 * gives one line, not thousands.
 */
export function collectFindings(
  mats: readonly MatReport[],
  overlaps: readonly Overlap[],
  storedHigh: StoredHighLevel,
  design: Design,
): Finding[] {
  const groups = new Map<string, { issue: MatIssue; ids: string[]; labels: string[] }>();
  const physicsCache = new Map<string, MatIssue[]>();
  const add = (issue: MatIssue, mat: MatReport) => {
    const key = `${issue.kind}|${issue.severity}|${issue.detail}`;
    const group = groups.get(key);
    if (group) {
      group.ids.push(mat.matId);
      group.labels.push(mat.name || mat.matId);
    } else {
      groups.set(key, { issue, ids: [mat.matId], labels: [mat.name || mat.matId] });
    }
  };
  for (const mat of mats) {
    for (const issue of connectionIssues(mat)) add(issue, mat);
    // Mats of one kind share their physics (evaluate computes it once per kind), so format it once.
    const kind = `${mat.cellId}|${mat.cellsPerBitline}|${mat.cellsPerWordline}|${mat.senseAmpPitchBudget}|${mat.senseAmpFits}|${mat.lostBits}`;
    let issues = physicsCache.get(kind);
    if (!issues) {
      issues = physicsIssues(mat, design);
      physicsCache.set(kind, issues);
    }
    for (const issue of issues) add(issue, mat);
  }
  const findings: Finding[] = [];
  for (const { issue, ids, labels } of groups.values()) {
    findings.push({
      kind: issue.kind,
      severity: issue.severity,
      blockIds: ids,
      message: `${groupLabel(labels)}: ${issue.detail}`,
    });
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
        `${formatQuantity(design.process.arrayVoltage, 'voltage')}; a full 1 needs VPP ≥ ${formatQuantity(storedHigh.wordlineHighNeeded, 'voltage')}`,
    });
  }
  return findings;
}
