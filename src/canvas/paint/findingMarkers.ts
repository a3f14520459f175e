import type { Severity } from '../../engine';

/** What a marker needs of a finding. */
export interface MarkedFinding {
  readonly kind: string;
  readonly severity: Severity;
  readonly message: string;
  readonly blockIds: readonly string[];
}

/** Change sets kept for painters that missed some updates; past this many ids, they repaint everything. */
const MOST_LOGGED_IDS = 512;

/**
 * The worst finding severity per block id, kept up to date from one findings list to the next without
 * rebuilding it: findings that stayed the same (by identity, or by kind, severity, message and ids) are
 * skipped, and a finding that changed is compared with the one it replaced, so only the ids that came or
 * went are counted again. A drag on a whole die whose every mat carries one warning then touches a few
 * ids per frame, not tens of thousands. Painters ask which ids changed since the version they painted
 * and repaint only around those blocks.
 */
export class FindingMarkers {
  private readonly severity = new Map<string, Severity>();
  private readonly errors = new Map<string, number>();
  private readonly warnings = new Map<string, number>();
  private shown: readonly MarkedFinding[] = [];
  private log: { version: number; ids: ReadonlySet<string> }[] = [];
  private loggedIds = 0;
  /** Bumped on every update that changed a marker. */
  version = 0;

  /** Worst severity per block id. */
  get markers(): ReadonlyMap<string, Severity> {
    return this.severity;
  }

  /** Shows `findings` instead of the previous list; true when a marker changed. */
  update(findings: readonly MarkedFinding[]): boolean {
    if (findings === this.shown) return false;
    const previous = this.shown;
    this.shown = findings;
    const { added, removed } = changedFindings(previous, findings);
    if (added.length === 0 && removed.length === 0) return false;
    const touched = new Set<string>();
    // A changed finding is paired with one of its kind and severity that went away: only their difference counts.
    const removedByKind = new Map<string, MarkedFinding[]>();
    for (const f of removed) {
      const key = `${f.kind}|${f.severity}`;
      const list = removedByKind.get(key);
      if (list) list.push(f);
      else removedByKind.set(key, [f]);
    }
    for (const f of added) {
      const old = removedByKind.get(`${f.kind}|${f.severity}`)?.pop();
      if (old) this.count(old.severity, ...idDifference(old.blockIds, f.blockIds), touched);
      else this.count(f.severity, [], f.blockIds, touched);
    }
    for (const list of removedByKind.values())
      for (const f of list) this.count(f.severity, f.blockIds, [], touched);
    const changed = new Set<string>();
    for (const id of touched) {
      const now: Severity | undefined =
        (this.errors.get(id) ?? 0) > 0 ? 'error' : (this.warnings.get(id) ?? 0) > 0 ? 'warning' : undefined;
      if (now === this.severity.get(id)) continue;
      if (now) this.severity.set(id, now);
      else this.severity.delete(id);
      changed.add(id);
    }
    if (changed.size === 0) return false;
    this.version++;
    this.log.push({ version: this.version, ids: changed });
    this.loggedIds += changed.size;
    while (this.loggedIds > MOST_LOGGED_IDS && this.log.length > 0)
      this.loggedIds -= this.log.shift()?.ids.size ?? 0;
    return true;
  }

  /** Ids whose marker changed after `version`, or null when too many changed to say (repaint everything). */
  changedSince(version: number): ReadonlySet<string> | null {
    if (version === this.version) return new Set();
    const first = this.log[0];
    if (!first || first.version > version + 1) return null;
    const ids = new Set<string>();
    for (const entry of this.log) if (entry.version > version) for (const id of entry.ids) ids.add(id);
    return ids;
  }

  private count(
    severity: Severity,
    gone: readonly string[],
    come: readonly string[],
    touched: Set<string>,
  ): void {
    const counts = severity === 'error' ? this.errors : this.warnings;
    for (const id of gone) {
      const n = (counts.get(id) ?? 0) - 1;
      if (n > 0) counts.set(id, n);
      else counts.delete(id);
      touched.add(id);
    }
    for (const id of come) {
      counts.set(id, (counts.get(id) ?? 0) + 1);
      touched.add(id);
    }
  }
}

function sameIds(a: readonly string[], b: readonly string[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Findings of `next` not in `previous` and the reverse, matched by identity or by what they say. */
function changedFindings(
  previous: readonly MarkedFinding[],
  next: readonly MarkedFinding[],
): { added: MarkedFinding[]; removed: MarkedFinding[] } {
  const unmatched = new Map<string, MarkedFinding[]>();
  const same = new Set<MarkedFinding>(previous);
  const kept = new Set<MarkedFinding>();
  for (const f of previous) {
    const key = `${f.kind}|${f.severity}|${f.message}`;
    const list = unmatched.get(key);
    if (list) list.push(f);
    else unmatched.set(key, [f]);
  }
  const added: MarkedFinding[] = [];
  for (const f of next) {
    if (same.has(f) && !kept.has(f)) {
      kept.add(f);
      continue;
    }
    const list = unmatched.get(`${f.kind}|${f.severity}|${f.message}`);
    const at = list ? list.findIndex((g) => !kept.has(g) && sameIds(g.blockIds, f.blockIds)) : -1;
    if (list && at >= 0) kept.add(list[at] as MarkedFinding);
    else added.push(f);
  }
  const removed = previous.filter((f) => !kept.has(f));
  return { added, removed };
}

/**
 * The ids that left and came between two lists of one finding. Grouped findings list their mats in
 * design order, so a change is mostly a short stretch: the common start and end are skipped and only
 * the middles are compared.
 */
function idDifference(before: readonly string[], after: readonly string[]): [string[], string[]] {
  let start = 0;
  const shorter = Math.min(before.length, after.length);
  while (start < shorter && before[start] === after[start]) start++;
  let end = 0;
  while (end < shorter - start && before[before.length - 1 - end] === after[after.length - 1 - end]) end++;
  const middleBefore = before.slice(start, before.length - end);
  const middleAfter = after.slice(start, after.length - end);
  const inBefore = new Set(middleBefore);
  const inAfter = new Set(middleAfter);
  return [middleBefore.filter((id) => !inAfter.has(id)), middleAfter.filter((id) => !inBefore.has(id))];
}
