import type { OperatingConditions } from '../../model/operating';
import type { ProcessProfile } from '../../model/process';
import { formatQuantity } from '../../model/units';
import type { StoredHighLevel } from '../physics/storedLevel';
import type { FindingKind, MatFigures, Severity } from './report';

/**
 * The check rules that follow from a mat's physics, written once: evaluate() turns them into grouped
 * findings (checks.ts) and the explorer into the error and warning kinds of a sweep point
 * (explore/partitionFigures.ts), so the two cannot disagree.
 */

/** The figures a mat rule reads (SI); a bank reports the unpartnered bits of the whole bank. */
export type CheckedFigures = Pick<
  MatFigures,
  | 'senseMarginAtRefresh'
  | 'senseSignalAfterRefresh'
  | 'requiredSignal'
  | 'senseAmpFits'
  | 'senseAmpPitchBudget'
  | 'retentionTime'
  | 'weakestRetentionTime'
  | 'unpartneredBits'
>;

/**
 * Each check's name in words, the one home every view reads (explorer point cards, the sweep's
 * "why infeasible" summary): lower case, to sit inside a sentence.
 */
export const CHECK_LABELS: Readonly<Record<FindingKind, string>> = {
  unsensedBitlines: 'unsensed bit lines',
  undrivenWordlines: 'undriven word lines',
  overlap: 'overlap',
  storedHighLimited: 'stored 1 limited',
  senseMargin: 'sense margin',
  senseAmpPitch: 'sense-amplifier pitch',
  retention: 'retention',
  openBitlineEdge: 'open-array edge',
  noRowDecoder: 'no row decoder',
  noColumnDecoder: 'no column decoder',
  backToBackStrips: 'strips back to back',
};

export function checkLabel(kind: FindingKind): string {
  return CHECK_LABELS[kind];
}

/** Process and operating values the rules compare against. */
export interface CheckLimits {
  readonly process: Pick<ProcessProfile, 'senseAmpWidth'>;
  readonly operating: Pick<OperatingConditions, 'minimumSenseMargin' | 'refreshWindow'>;
}

/** One rule: whether it fires (and how badly), and what it says about the mat. */
export interface MatRule {
  readonly kind: FindingKind;
  /** The severity when the rule fires, else null. */
  readonly check: (f: CheckedFigures, limits: CheckLimits) => Severity | null;
  /** What is wrong, without the mat's name (only asked when the rule fired). */
  readonly detail: (f: CheckedFigures, limits: CheckLimits, severity: Severity) => string;
}

const v = (x: number) => formatQuantity(x, 'voltage');

export const MAT_RULES: readonly MatRule[] = [
  {
    kind: 'senseMargin',
    check: (f, { operating }) =>
      f.senseMarginAtRefresh < 0
        ? 'error'
        : f.senseMarginAtRefresh < operating.minimumSenseMargin
          ? 'warning'
          : null,
    detail: (f, { operating }, severity) =>
      severity === 'error'
        ? `sense margin ${v(f.senseMarginAtRefresh)} after a refresh window (signal ${v(f.senseSignalAfterRefresh)} < offset and noise ${v(f.requiredSignal)})`
        : `sense margin ${v(f.senseMarginAtRefresh)} is below the ${v(operating.minimumSenseMargin)} target`,
  },
  {
    kind: 'senseAmpPitch',
    check: (f) => (f.senseAmpFits ? null : 'error'),
    detail: (f, { process }) =>
      `a sense amplifier needs ${formatQuantity(process.senseAmpWidth, 'length')} but its bit-line pitch budget is ${formatQuantity(f.senseAmpPitchBudget, 'length')}`,
  },
  {
    // The refresh window is set by the weakest cell on the die, not by a typical one.
    kind: 'retention',
    check: (f, { operating }) => (f.weakestRetentionTime < operating.refreshWindow ? 'error' : null),
    detail: (f, { operating }) =>
      `the weakest cell's retention ${formatQuantity(f.weakestRetentionTime, 'time')} (typical cell ${formatQuantity(f.retentionTime, 'time')}) is shorter than the ${formatQuantity(operating.refreshWindow, 'time')} refresh window`,
  },
  {
    kind: 'openBitlineEdge',
    check: (f) => (f.unpartneredBits > 0 ? 'warning' : null),
    detail: (f) =>
      `${formatQuantity(f.unpartneredBits, 'count')} bits on open bit lines have no partner mat beyond their sense-amplifier strip and are lost`,
  },
];

/** The stored-1 rule: a word-line high level too low to store a full 1 (design-wide). */
export function storedHighSeverity(storedHigh: StoredHighLevel): Severity | null {
  return storedHigh.limitedByWordline ? 'warning' : null;
}

/** Kinds of the mat rules and the stored-1 rule that fire, by severity, each list sorted. */
export function firingKinds(
  f: CheckedFigures,
  limits: CheckLimits,
  storedHigh: StoredHighLevel,
): { errorKinds: FindingKind[]; warningKinds: FindingKind[] } {
  const errorKinds: FindingKind[] = [];
  const warningKinds: FindingKind[] = [];
  const add = (kind: FindingKind, severity: Severity | null) => {
    if (severity === 'error') errorKinds.push(kind);
    else if (severity === 'warning') warningKinds.push(kind);
  };
  for (const rule of MAT_RULES) add(rule.kind, rule.check(f, limits));
  add('storedHighLimited', storedHighSeverity(storedHigh));
  return { errorKinds: errorKinds.sort(), warningKinds: warningKinds.sort() };
}
