import type { Design } from '../../../src/model/design';
import { formatQuantity } from '../../../src/model/units';
import { MAT_RULES, storedHighSeverity } from '../../../src/engine/evaluation/checkRules';
import { groupLabel } from '../../../src/engine/evaluation/findingText';
import type { Block } from '../../../src/model/block';
import type { PositionedOverlap } from '../../../src/engine/evaluation/overlaps';
import { figuresAt, matIdAt, matLabelAt, type MatTable } from '../../../src/engine/evaluation/matTable';
import type { Finding, FindingKind, MatFigures, Severity } from '../../../src/engine/evaluation/report';
import type { StoredHighLevel } from '../../../src/engine/physics/storedLevel';

/** A finding about one mat before grouping: what is wrong, without the mat's name. */
interface MatIssue {
  readonly kind: FindingKind;
  readonly severity: Severity;
  readonly detail: string;
}

/** Issues that follow from a mat's physics alone (the shared rules); the same for every mat of one kind. */
function physicsIssues(figures: MatFigures, design: Design): MatIssue[] {
  const issues: MatIssue[] = [];
  for (const rule of MAT_RULES) {
    const severity = rule.check(figures, design);
    if (severity) issues.push({ kind: rule.kind, severity, detail: rule.detail(figures, design, severity) });
  }
  return issues;
}

/** Issues of a mat's connections, which differ from mat to mat. */
function connectionIssues(unsensed: number, undriven: number, figures: MatFigures): MatIssue[] {
  const issues: MatIssue[] = [];
  if (unsensed > 0) {
    issues.push({
      kind: 'unsensedBitlines',
      severity: 'error',
      detail: `${unsensed} of ${figures.bitlineCount} bit lines reach no sense-amplifier strip`,
    });
  }
  if (undriven > 0) {
    issues.push({
      kind: 'undrivenWordlines',
      severity: 'error',
      detail: `${undriven} of ${figures.wordlineCount} word lines reach no driver`,
    });
  }
  return issues;
}

/** Mats named in a grouped finding's message; the finding's block ids name them all. */
const NAMED_IN_MESSAGE = 3;

/** User-visible name of the block at a design position (its id when unnamed). */
function nameAt(blocks: readonly Block[], i: number): string {
  const b = blocks[i];
  return b?.name || b?.id || '';
}

interface IssueGroup {
  readonly issue: MatIssue;
  /** Mats counted so far. */
  count: number;
  ids: string[];
  /** The first few mats' names, for the message. */
  readonly labels: string[];
}

/**
 * Turns geometry and physics into findings, each naming its blocks. Mats with the same issue and the
 * same figures are grouped into one finding that names them all, so a regular array with one weakness
 * gives one line, not thousands.
 */
export function collectFindings(
  mats: MatTable,
  overlaps: readonly PositionedOverlap[],
  storedHigh: StoredHighLevel,
  design: Design,
  /** The blocks as they stand (a live preview's, when they differ from the design's), for names. */
  blocks: readonly Block[] = design.blocks,
): Finding[] {
  const groups = new Map<string, IssueGroup>();
  // Mats of one kind share their issue objects, so most lookups go by identity, not by building a key.
  const groupOfIssue = new Map<MatIssue, IssueGroup>();
  const physicsCache = new Map<MatFigures, readonly MatIssue[]>();
  const issuesOf = (k: number): readonly MatIssue[] => {
    // Mats of one kind share one figures object (evaluate computes it once per kind), so format it once.
    const figures = figuresAt(mats, k);
    let physics = physicsCache.get(figures);
    if (!physics) {
      physics = physicsIssues(figures, design);
      physicsCache.set(figures, physics);
    }
    const unsensed = mats.unsensedBitlines[k] ?? 0;
    const undriven = mats.undrivenWordlines[k] ?? 0;
    if (unsensed === 0 && undriven === 0) return physics;
    return [...connectionIssues(unsensed, undriven, figures), ...physics];
  };
  const groupOf = (issue: MatIssue): IssueGroup => {
    let group = groupOfIssue.get(issue);
    if (!group) {
      const key = `${issue.kind}|${issue.severity}|${issue.detail}`;
      group = groups.get(key);
      if (!group) {
        group = { issue, count: 0, ids: [], labels: [] };
        groups.set(key, group);
      }
      groupOfIssue.set(issue, group);
    }
    return group;
  };
  // Mats of one kind with every line served fall in the same groups; a die lists them in runs, so the
  // groups of the mat before are tried first.
  let lastFigures: MatFigures | null = null;
  let lastGroups: readonly IssueGroup[] = [];
  const groupsOf = (k: number): readonly IssueGroup[] => {
    const figures = figuresAt(mats, k);
    const served = (mats.unsensedBitlines[k] ?? 0) === 0 && (mats.undrivenWordlines[k] ?? 0) === 0;
    if (served && figures === lastFigures) return lastGroups;
    const found = issuesOf(k).map(groupOf);
    if (served) {
      lastFigures = figures;
      lastGroups = found;
    }
    return found;
  };
  // Two passes: count each group's mats, then fill lists of exactly that length (growing a list of tens
  // of thousands of ids by push costs several times more).
  for (let k = 0; k < mats.count; k++) {
    for (const group of groupsOf(k)) {
      group.count++;
      if (group.labels.length < NAMED_IN_MESSAGE) group.labels.push(matLabelAt(mats, k));
    }
  }
  for (const group of groups.values()) group.ids = new Array<string>(group.count);
  for (const group of groups.values()) group.count = 0;
  for (let k = 0; k < mats.count; k++) {
    for (const group of groupsOf(k)) group.ids[group.count++] = matIdAt(mats, k);
  }
  const findings: Finding[] = [];
  for (const { issue, ids, labels } of groups.values()) {
    findings.push({
      kind: issue.kind,
      severity: issue.severity,
      blockIds: ids,
      message: `${groupLabel(ids.length, labels)}: ${issue.detail}`,
    });
  }
  for (const { overlap: o, first, second } of overlaps) {
    findings.push({
      kind: 'overlap',
      severity: 'error',
      blockIds: [o.firstId, o.secondId],
      message: `${nameAt(blocks, first)} and ${nameAt(blocks, second)} overlap by ${formatQuantity(o.area, 'area')}`,
    });
  }
  const storedHighLimited = storedHighSeverity(storedHigh);
  if (storedHighLimited) {
    findings.push({
      kind: 'storedHighLimited',
      severity: storedHighLimited,
      blockIds: [],
      message:
        `word-line high level stores a 1 at only ${formatQuantity(storedHigh.level, 'voltage')} of ` +
        `${formatQuantity(design.process.arrayVoltage, 'voltage')}; a full 1 needs VPP ≥ ${formatQuantity(storedHigh.wordlineHighNeeded, 'voltage')}`,
    });
  }
  return findings;
}
