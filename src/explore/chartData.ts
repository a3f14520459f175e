import {
  bankFigureEntry,
  checkLabel,
  type FigureKey,
  type FindingKind,
  type PartitionFigures,
} from '../engine';
import { paretoFront, type Direction } from './pareto';
import type { FeasibilityLimits } from './feasibilityLimits';
import type { SweepPoint } from './sweep';

export type { FeasibilityLimits } from './feasibilityLimits';

/** The chart limits a point can miss, in words (the limits live in the explorer's chart controls). */
export const LIMIT_LABELS = {
  minMargin: 'margin below the minimum',
  maxDelay: 'word line slower than the maximum',
} as const;

/** One reason a planned point is infeasible: a failing check rule or a missed chart limit. */
export type InfeasibleReason =
  { readonly check: FindingKind } | { readonly limit: keyof typeof LIMIT_LABELS };

/** The figures feasibility depends on. */
export type FeasibilityFigures = Pick<PartitionFigures, 'errorKinds' | 'senseMargin' | 'wordlineDelay'>;

/** Every reason a planned point is infeasible; empty when it is feasible. */
export function infeasibleReasons(
  figures: FeasibilityFigures,
  limits: FeasibilityLimits,
): InfeasibleReason[] {
  const reasons: InfeasibleReason[] = figures.errorKinds.map((check) => ({ check }));
  if (!(figures.senseMargin >= limits.minMargin)) reasons.push({ limit: 'minMargin' });
  if (!(figures.wordlineDelay <= limits.maxDelay)) reasons.push({ limit: 'maxDelay' });
  return reasons;
}

/** Whether a point meets every check rule and chart limit: infeasibleReasons() is empty, without building it. */
export function isFeasible(figures: PartitionFigures, limits: FeasibilityLimits): boolean {
  return (
    figures.errorKinds.length === 0 &&
    figures.senseMargin >= limits.minMargin &&
    figures.wordlineDelay <= limits.maxDelay
  );
}

/** Why a point is infeasible, in words; empty when it is feasible. */
export function infeasibleBecause(figures: PartitionFigures, limits: FeasibilityLimits): string[] {
  const reasons: string[] = [];
  if (figures.errorKinds.length > 0)
    reasons.push(`failing check: ${figures.errorKinds.map(checkLabel).join(', ')}`);
  for (const r of infeasibleReasons(figures, limits)) if ('limit' in r) reasons.push(LIMIT_LABELS[r.limit]);
  return reasons;
}

/** A check's name in words: the check rules' own label (engine/evaluation/checkRules.ts). */
export const checkName = checkLabel;

/** One plotted point: its place in the sweep and how it is drawn. */
export interface PlottedPoint {
  /** Index into the run's points. */
  readonly point: number;
  readonly x: number;
  readonly y: number;
  readonly cellIndex: number;
  readonly processIndex: number;
  readonly state: 'front' | 'feasible' | 'infeasible';
}

/** Which way an axis is better, from its catalogue entry: the Pareto front's direction on that axis. */
export function axisDirection(axis: FigureKey): Direction {
  return bankFigureEntry(axis).better === 'higher' ? 'max' : 'min';
}

export interface ChartModel {
  readonly plotted: readonly PlottedPoint[];
  /** Indices into `plotted`, along x from best to worst. */
  readonly front: readonly number[];
  readonly counts: {
    readonly points: number;
    readonly plotted: number;
    readonly feasible: number;
    readonly unplanned: number;
  };
}

/**
 * What the scatter shows: every planned point with finite values on both axes, each marked feasible or
 * not, and the Pareto front of the feasible ones for the axes' directions (lower area, higher margin…).
 */
export function chartModel(
  points: readonly SweepPoint[],
  xAxis: FigureKey,
  yAxis: FigureKey,
  limits: FeasibilityLimits,
): ChartModel {
  const plotted: PlottedPoint[] = [];
  let feasible = 0;
  let unplanned = 0;
  points.forEach((p, i) => {
    if (!p.figures) {
      unplanned++;
      return;
    }
    const x = p.figures[xAxis];
    const y = p.figures[yAxis];
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    const ok = isFeasible(p.figures, limits);
    if (ok) feasible++;
    plotted.push({
      point: i,
      x,
      y,
      cellIndex: p.cellIndex,
      processIndex: p.processIndex,
      state: ok ? 'feasible' : 'infeasible',
    });
  });
  const feasibleIndices = plotted.map((p, i) => (p.state === 'feasible' ? i : -1)).filter((i) => i >= 0);
  const front = paretoFront(
    feasibleIndices.map((i) => plotted[i] ?? { x: Number.NaN, y: Number.NaN }),
    axisDirection(xAxis),
    axisDirection(yAxis),
  ).map((k) => feasibleIndices[k] ?? -1);
  for (const i of front) {
    const p = plotted[i];
    if (p) plotted[i] = { ...p, state: 'front' };
  }
  return { plotted, front, counts: { points: points.length, plotted: plotted.length, feasible, unplanned } };
}
