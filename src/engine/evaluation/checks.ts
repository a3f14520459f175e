import { wordsOf } from '../../geometry/doubleWords';
import type { Design } from '../../model/design';
import { formatQuantity } from '../../model/units';
import { MAT_RULES, storedHighSeverity } from './checkRules';
import { figuresEnd } from './figureRuns';
import { groupLabel } from './findingText';
import type { Block } from '../../model/block';
import type { PositionedOverlap } from './overlaps';
import { figuresAt, matIdAt, matLabelAt, type MatTable } from './matTable';
import type { Finding, FindingKind, MatFigures, Severity } from './report';
import type { StoredHighLevel } from '../physics/storedLevel';

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
 * The issue groups of a report's mats, found once per figures object (mats of one kind share their
 * figures, so their issues and groups) and per mat with unserved lines. A class rather than closures
 * made per call: a closure is a new call target on every call, and the loops calling it were thrown
 * away on a later call.
 */
class IssueGrouping {
  /** Every group in the order first met: the findings' order. */
  readonly groups = new Map<string, IssueGroup>();
  private readonly groupOfIssue = new Map<MatIssue, IssueGroup>();
  private readonly physicsCache = new Map<MatFigures, readonly MatIssue[]>();
  private readonly servedCache = new Map<MatFigures, readonly IssueGroup[]>();

  constructor(
    private readonly mats: MatTable,
    private readonly design: Design,
  ) {}

  /** The groups mat k falls in (connection issues first, then its physics'). */
  groupsOf(k: number): readonly IssueGroup[] {
    const figures = figuresAt(this.mats, k);
    const unsensed = this.mats.unsensedBitlines[k] ?? 0;
    const undriven = this.mats.undrivenWordlines[k] ?? 0;
    if (unsensed === 0 && undriven === 0) {
      let groups = this.servedCache.get(figures);
      if (!groups) {
        groups = this.physicsOf(figures).map((issue) => this.groupOf(issue));
        this.servedCache.set(figures, groups);
      }
      return groups;
    }
    const issues = [...connectionIssues(unsensed, undriven, figures), ...this.physicsOf(figures)];
    return issues.map((issue) => this.groupOf(issue));
  }

  private physicsOf(figures: MatFigures): readonly MatIssue[] {
    // Mats of one kind share one figures object (evaluate computes it once per kind), so format it once.
    let physics = this.physicsCache.get(figures);
    if (!physics) {
      physics = physicsIssues(figures, this.design);
      this.physicsCache.set(figures, physics);
    }
    return physics;
  }

  private groupOf(issue: MatIssue): IssueGroup {
    // Mats of one kind share their issue objects, so most lookups go by identity, not by building a key.
    let group = this.groupOfIssue.get(issue);
    if (!group) {
      const key = `${issue.kind}|${issue.severity}|${issue.detail}`;
      group = this.groups.get(key);
      if (!group) {
        group = { issue, count: 0, ids: [], labels: [] };
        this.groups.set(key, group);
      }
      this.groupOfIssue.set(issue, group);
    }
    return group;
  }
}

/**
 * The first mat from k on with a line unserved, or `count`. Unsensed counts are read as the two 32-bit
 * words of their doubles (`unsensedWords`, see {@link wordsOf}): a double read in the interpreter is a
 * new heap number, a 32-bit integer is not. Both words 0 is +0; a −0 or any other value counts as
 * unserved, which at most splits a run whose mats would be grouped alike.
 */
function unservedFrom(count: number, unsensedWords: Int32Array, undriven: Int32Array, k: number): number {
  let i = k;
  while (
    i < count &&
    ((undriven[i] as number) | (unsensedWords[2 * i] as number) | (unsensedWords[2 * i + 1] as number)) === 0
  )
    i++;
  return i;
}

/**
 * Where runs of mats that fall in the same groups end: a run of mats with every line served and one
 * figures index, or one mat with a line unserved. Asked in mat order, never going back.
 */
class RunEnds {
  /** The first unserved mat at or after the last k asked (found again once k passes it). */
  private unserved = -1;

  constructor(
    private readonly mats: MatTable,
    private readonly unsensedWords: Int32Array,
  ) {}

  /** Where the run from mat k ends. */
  from(k: number): number {
    const { count, figureIndex } = this.mats;
    if (this.unserved < k)
      this.unserved = unservedFrom(count, this.unsensedWords, this.mats.undrivenWordlines, k);
    if (this.unserved === k) return k + 1;
    return Math.min(
      this.unserved,
      figuresEnd(figureIndex, k, count, figureIndex[k] as number, this.mats.figures.length),
    );
  }
}

/** First pass: each group's mat count and its first few names, run by run in mat order. */
function countGroups(mats: MatTable, grouping: IssueGrouping, unsensedWords: Int32Array): void {
  const ends = new RunEnds(mats, unsensedWords);
  for (let k = 0; k < mats.count;) {
    const end = ends.from(k);
    const groups = grouping.groupsOf(k);
    for (let g = 0; g < groups.length; g++) {
      const group = groups[g] as IssueGroup;
      group.count += end - k;
      for (let m = k; m < end && group.labels.length < NAMED_IN_MESSAGE; m++)
        group.labels.push(matLabelAt(mats, m));
    }
    k = end;
  }
}

/** Second pass: each group's mat ids, into lists of exactly the counted length (see collectFindings). */
function listGroupIds(mats: MatTable, grouping: IssueGrouping, unsensedWords: Int32Array): void {
  const ends = new RunEnds(mats, unsensedWords);
  for (let k = 0; k < mats.count;) {
    const end = ends.from(k);
    const groups = grouping.groupsOf(k);
    for (let g = 0; g < groups.length; g++) {
      const group = groups[g] as IssueGroup;
      for (let m = k; m < end; m++) group.ids[group.count++] = matIdAt(mats, m);
    }
    k = end;
  }
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
  const grouping = new IssueGrouping(mats, design);
  const groups = grouping.groups;
  // Two passes: count each group's mats, then fill lists of exactly that length (growing a list of tens
  // of thousands of ids by push costs several times more).
  const unsensedWords = wordsOf(mats.unsensedBitlines);
  countGroups(mats, grouping, unsensedWords);
  for (const group of groups.values()) group.ids = new Array<string>(group.count);
  for (const group of groups.values()) group.count = 0;
  // A die whose mats raise no issue has nothing to list (the second walk would find no group).
  if (groups.size > 0) listGroupIds(mats, grouping, unsensedWords);
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
