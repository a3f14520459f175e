import { checkLabel, type FindingKind } from '../engine';
import { formatWholeNumber } from '../model/units';
import { LIMIT_LABELS, type FeasibilityFigures, type FeasibilityLimits } from './chartData';

/** What a tally reads of a sweep point (a SweepPoint will do; SweepTable.tallyPoints() makes lighter ones). */
export interface TallyPoint {
  readonly cellIndex: number;
  readonly processIndex: number;
  /** Null when the point has no plan. */
  readonly figures: FeasibilityFigures | null;
}

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

export interface Counts {
  cellIndex: number;
  points: number;
  feasible: number;
  unplanned: number;
  checks: Map<FindingKind, number>;
  limits: Map<keyof typeof LIMIT_LABELS, number>;
}

/** A tallier's counts per cell and per cell × process key, as structured clone carries them. */
export interface TallierState {
  readonly byCell: Map<number, Counts>;
  readonly byCellProcess: Map<number, Counts>;
}

/** Room for process indices in a cell × process key. */
const PROCESS_KEY_SPAN = 1 << 16;

/**
 * The tallies of a sweep per cell and per cell × process, taken point by point: the chart model adds each
 * point as it arrives (chartModelBuilder.ts), so the sentences at the end need no pass over every point.
 */
export class FamilyTallier {
  private readonly byCell: Map<number, Counts>;
  private readonly byCellProcess: Map<number, Counts>;

  /** `state`: the counts of a tallier taken elsewhere (state(), e.g. in the sweep worker), to go on from. */
  constructor(
    readonly limits: FeasibilityLimits,
    state?: TallierState,
  ) {
    this.byCell = state?.byCell ?? new Map();
    this.byCellProcess = state?.byCellProcess ?? new Map();
  }

  /** The counts as plain maps (they survive a structured clone); the tallier keeps using them. */
  state(): TallierState {
    return { byCell: this.byCell, byCellProcess: this.byCellProcess };
  }

  add(point: TallyPoint): void {
    count(countsOf(this.byCell, point.cellIndex, point.cellIndex), point.figures, this.limits);
    count(
      countsOf(this.byCellProcess, point.cellIndex * PROCESS_KEY_SPAN + point.processIndex, point.cellIndex),
      point.figures,
      this.limits,
    );
  }

  /** Every family (cell) with points, in cell order. */
  cells(): FamilyTally[] {
    return sorted(this.byCell).map(([, t]) => ({ ...t }));
  }

  /** Every cell × process pair with points, in cell then process order. */
  cellProcesses(): CellProcessTally[] {
    return sorted(this.byCellProcess).map(([key, t]) => ({ ...t, processIndex: key % PROCESS_KEY_SPAN }));
  }
}

function countsOf(tallies: Map<number, Counts>, key: number, cellIndex: number): Counts {
  let t = tallies.get(key);
  if (!t) {
    t = { cellIndex, points: 0, feasible: 0, unplanned: 0, checks: new Map(), limits: new Map() };
    tallies.set(key, t);
  }
  return t;
}

/**
 * Counts one point under what infeasibleReasons() would give, in its order (failed checks, then the
 * margin limit, then the delay limit), without building the list: the chart model tallies every point.
 */
function count(t: Counts, figures: FeasibilityFigures | null, limits: FeasibilityLimits) {
  t.points++;
  if (figures === null) {
    t.unplanned++;
    return;
  }
  const marginMissed = !(figures.senseMargin >= limits.minMargin);
  const delayMissed = !(figures.wordlineDelay <= limits.maxDelay);
  if (figures.errorKinds.length === 0 && !marginMissed && !delayMissed) {
    t.feasible++;
    return;
  }
  for (const check of figures.errorKinds) t.checks.set(check, (t.checks.get(check) ?? 0) + 1);
  if (marginMissed) t.limits.set('minMargin', (t.limits.get('minMargin') ?? 0) + 1);
  if (delayMissed) t.limits.set('maxDelay', (t.limits.get('maxDelay') ?? 0) + 1);
}

const sorted = (tallies: Map<number, Counts>) => [...tallies.entries()].sort(([a], [b]) => a - b);

function tallierOf(points: readonly TallyPoint[], limits: FeasibilityLimits): FamilyTallier {
  const tallier = new FamilyTallier(limits);
  for (const p of points) tallier.add(p);
  return tallier;
}

/** Tallies every family of the points, in cell order; families without points are left out. */
export function familyTallies(points: readonly TallyPoint[], limits: FeasibilityLimits): FamilyTally[] {
  return tallierOf(points, limits).cells();
}

/** One cell on one process: a family's tally split by process. */
export interface CellProcessTally extends FamilyTally {
  /** Index into the request's processes. */
  readonly processIndex: number;
}

/** Tallies every cell × process pair of the points, in cell then process order. */
export function cellProcessTallies(
  points: readonly TallyPoint[],
  limits: FeasibilityLimits,
): CellProcessTally[] {
  return tallierOf(points, limits).cellProcesses();
}

/**
 * One sentence for a family with no feasible point, naming the check rules (by their own labels) and
 * limits that ruled its points out, with counts when they differ; null when the family has a feasible
 * point. E.g. "1T1C vertical 4F²: every point fails the sense-amplifier pitch check."
 */
export function familyInfeasibleSentence(name: string, t: FamilyTally): string | null {
  if (t.feasible > 0 || t.points === 0) return null;
  const n = formatWholeNumber;
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
    return `${name}: every point fails ${listWords(everyPoint.map((c) => c.words))}.`;
  }
  const parts = causes.map((c) => `${n(c.count)} ${c.count === 1 ? 'fails' : 'fail'} ${c.words}`);
  if (t.unplanned > 0) parts.push(`${n(t.unplanned)} cannot be planned (too many mats)`);
  return `${name}: no feasible point of ${n(t.points)} — ${parts.join(', ')}.`;
}

/**
 * The sentences for every family of a sweep that has no feasible point, in cell order. With more than one
 * process, a cell that is feasible on some process but on none of the points of another gets a sentence
 * for that cell on that process, saying where it is feasible ("3T gain cell on 28 nm: every point fails
 * the retention check; feasible on 40 nm."); processes on which it fails alike share one sentence.
 */
export function infeasibleFamilySentences(
  points: readonly TallyPoint[],
  cellNames: readonly string[],
  limits: FeasibilityLimits,
  processNames: readonly string[] = [],
): string[] {
  return familySentences(tallierOf(points, limits), cellNames, processNames);
}

/** infeasibleFamilySentences() from tallies already taken. */
export function familySentences(
  tallier: FamilyTallier,
  cellNames: readonly string[],
  processNames: readonly string[] = [],
): string[] {
  const cellName = (i: number) => cellNames[i] ?? `cell ${i + 1}`;
  const processName = (i: number) => processNames[i] ?? `process ${i + 1}`;
  const byProcess = processNames.length > 1 ? tallier.cellProcesses() : [];
  const sentences: string[] = [];
  for (const t of tallier.cells()) {
    const whole = familyInfeasibleSentence(cellName(t.cellIndex), t);
    if (whole !== null) {
      sentences.push(whole);
      continue;
    }
    const pairs = byProcess.filter((p) => p.cellIndex === t.cellIndex);
    const feasibleOn = pairs.filter((p) => p.feasible > 0).map((p) => processName(p.processIndex));
    // Processes on which the cell fails for the same reasons share one sentence.
    const processesByReason = new Map<string, string[]>();
    for (const pair of pairs) {
      const reason = familyInfeasibleSentence('', pair);
      if (reason === null) continue;
      const names = processesByReason.get(reason) ?? [];
      names.push(processName(pair.processIndex));
      processesByReason.set(reason, names);
    }
    for (const [reason, names] of processesByReason)
      sentences.push(
        `${cellName(t.cellIndex)} on ${listWords(names)}${reason.slice(0, -1)}; feasible on ${listWords(feasibleOn)}.`,
      );
  }
  return sentences;
}

/** "A", "A and B", "A, B and C". */
function listWords(words: readonly string[]): string {
  return words.length <= 1 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
}
