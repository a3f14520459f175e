import { checkLabel, type FindingKind } from '../engine';
import { infeasibleReasons, LIMIT_LABELS, type FeasibilityLimits, type InfeasibleReason } from './chartData';
import type { SweepPoint } from './sweep';

/**
 * Why whole families of a sweep are infeasible. A family is one cell of the sweep (one series colour
 * on the chart), over every process, partition and spare count swept with it.
 */
export interface FamilyTally {
  /** Index into the request's cells. */
  readonly cellIndex: number;
  readonly points: number;
  readonly feasible: number;
  /** Points with no plan (too many mats for the capacity). */
  readonly unplanned: number;
  /** Infeasible points each failing check rule (error severity) ruled out; a point may count under several. */
  readonly checks: ReadonlyMap<FindingKind, number>;
  /** Infeasible points each missed chart limit ruled out. */
  readonly limits: ReadonlyMap<keyof typeof LIMIT_LABELS, number>;
}

/** Tallies every family of the points, in cell order; families without points are left out. */
export function familyTallies(points: readonly SweepPoint[], limits: FeasibilityLimits): FamilyTally[] {
  const byCell = new Map<
    number,
    {
      points: number;
      feasible: number;
      unplanned: number;
      checks: Map<FindingKind, number>;
      limits: Map<keyof typeof LIMIT_LABELS, number>;
    }
  >();
  for (const p of points) {
    let t = byCell.get(p.cellIndex);
    if (!t) {
      t = { points: 0, feasible: 0, unplanned: 0, checks: new Map(), limits: new Map() };
      byCell.set(p.cellIndex, t);
    }
    t.points++;
    if (!p.figures) {
      t.unplanned++;
      continue;
    }
    const reasons: InfeasibleReason[] = infeasibleReasons(p.figures, limits);
    if (reasons.length === 0) t.feasible++;
    for (const r of reasons) {
      if ('check' in r) t.checks.set(r.check, (t.checks.get(r.check) ?? 0) + 1);
      else t.limits.set(r.limit, (t.limits.get(r.limit) ?? 0) + 1);
    }
  }
  return [...byCell.entries()].sort(([a], [b]) => a - b).map(([cellIndex, t]) => ({ cellIndex, ...t }));
}

/**
 * One sentence for a family with no feasible point, naming the check rules (by their own labels) and
 * limits that ruled its points out, with counts when they differ; null when the family has a feasible
 * point. E.g. "1T1C vertical 4F²: every point fails the sense-amplifier pitch check."
 */
export function familyInfeasibleSentence(name: string, t: FamilyTally): string | null {
  if (t.feasible > 0 || t.points === 0) return null;
  const n = (v: number) => v.toLocaleString('en-US');
  const causes: { words: string; count: number }[] = [
    ...[...t.checks.entries()].map(([kind, count]) => ({ words: `the ${checkLabel(kind)} check`, count })),
    ...[...t.limits.entries()].map(([limit, count]) => ({
      words: `the chart limit (${LIMIT_LABELS[limit]})`,
      count,
    })),
  ].sort((a, b) => b.count - a.count || a.words.localeCompare(b.words));
  const everyPoint = causes.filter((c) => c.count === t.points);
  if (t.unplanned === t.points) return `${name}: no point can be planned (too many mats for the capacity).`;
  if (everyPoint.length > 0 && t.unplanned === 0) {
    const words = everyPoint.map((c) => c.words);
    const list = words.length === 1 ? words[0] : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
    return `${name}: every point fails ${list}.`;
  }
  const parts = causes.map((c) => `${n(c.count)} ${c.count === 1 ? 'fails' : 'fail'} ${c.words}`);
  if (t.unplanned > 0) parts.push(`${n(t.unplanned)} cannot be planned (too many mats)`);
  return `${name}: no feasible point of ${n(t.points)} — ${parts.join(', ')}.`;
}

/** The sentences for every family of a sweep that has no feasible point, in cell order. */
export function infeasibleFamilySentences(
  points: readonly SweepPoint[],
  cellNames: readonly string[],
  limits: FeasibilityLimits,
): string[] {
  return familyTallies(points, limits)
    .map((t) => familyInfeasibleSentence(cellNames[t.cellIndex] ?? `cell ${t.cellIndex + 1}`, t))
    .filter((s): s is string => s !== null);
}
