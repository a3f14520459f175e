import type { Design } from '../../src/model/design';
import type { Quantity } from '../../src/model/units';
import { MAT_FIGURE_CATALOGUE, TOTAL_FIGURE_CATALOGUE, type MatFigures, type Report } from '../../src/engine';
import { matMissingReason, totalMissingReason } from '../../src/engine/figures/missingReasons';

// Source for every rule here: common practice (no source). A figure of an accepted design is a finite
// number, or NaN meaning "does not exist" with a specific reason from engine/figures/missingReasons.ts;
// never ±Infinity. Quantities that cannot be negative in a physical circuit are never negative, and
// shares are within their bounds.

/** The reasons missingReasons.ts falls back to when it knows no specific cause: a NaN with these is a bug. */
const GENERIC_MAT_REASON = 'this figure does not exist for this mat';
const GENERIC_TOTAL_REASON = 'no mat has this figure';

/** Quantities that are never negative (a length, an area, a charge store, a duration, an energy …). */
const NON_NEGATIVE: ReadonlySet<Quantity> = new Set<Quantity>([
  'length',
  'area',
  'capacitance',
  'capacitancePerLength',
  'time',
  'current',
  'resistance',
  'resistancePerLength',
  'energy',
  'power',
  'temperature',
  'count',
  'percent',
]);

/** Figures whose quantity alone does not say they are never negative. */
const ALSO_NON_NEGATIVE: ReadonlySet<string> = new Set([
  'chargeTransferRatio',
  'offsetSigma',
  'offsetBudget',
  'noiseAllowance',
  'requiredSignal',
  'areaPerBitInF2',
  'offsetSigmaMultiplier',
  'expectedFaultyCells',
  'expectedFaultyRows',
  'expectedFaultyColumns',
]);

/** Shares that cannot exceed one (1 = 100 %). */
const AT_MOST_ONE: ReadonlySet<string> = new Set([
  'chargeTransferRatio',
  'arrayEfficiency',
  'dieYield',
  'repairProbability',
]);

/**
 * Numbers in the report's totals object that may be NaN for a valid design (those the catalogue does not
 * show are read by the bank comparison): no usable bit (area per bit), no sensed mat or no signal to latch
 * (row timing, margin), no refreshed mat or no margin to lose (retention), a word line that never reaches
 * the turn-on level or an access device that never turns off (row timing), nothing placed (efficiency).
 */
const TOTALS_THAT_MAY_NOT_EXIST: ReadonlySet<string> = new Set([
  'worstSenseSignal',
  'worstSenseMargin',
  'shortestRetention',
  'shortestWeakestRetention',
  'worstWordlineTurnOn',
  'worstRowToColumnDelay',
  'worstRowCycleTime',
  'areaPerBit',
  'areaPerBitInF2',
  'arrayEfficiency',
  'refresh.cycleTime',
  'refresh.rowCycleTime',
  'refresh.busyFraction',
]);

/** Totals that only exist with a mat placed. */
const TOTALS_UNDEFINED_WITHOUT_MATS: ReadonlySet<string> = new Set([
  'worstWordlineDelay',
  'worstWordlineNinety',
]);

/** Rounding slack on the upper bounds (relative). */
const SLACK = 1e-12;

function valueProblems(
  where: string,
  key: string,
  quantity: Quantity,
  value: number,
  reason: () => string,
  generic: string,
): string[] {
  if (Number.isNaN(value)) {
    return reason() === generic ? [`${where}${key} is NaN without a reason`] : [];
  }
  if (!Number.isFinite(value)) return [`${where}${key} = ${value}`];
  const problems: string[] = [];
  if ((NON_NEGATIVE.has(quantity) || ALSO_NON_NEGATIVE.has(key)) && value < 0)
    problems.push(`${where}${key} = ${value} < 0`);
  if (AT_MOST_ONE.has(key) && value > 1 + SLACK) problems.push(`${where}${key} = ${value} > 1`);
  return problems;
}

/** Calls `visit` with every number nested in `node` and its dotted path. */
function eachNumber(node: unknown, path: string, visit: (path: string, value: number) => void): void {
  if (typeof node === 'number') {
    visit(path, node);
    return;
  }
  if (typeof node !== 'object' || node === null) return;
  for (const [key, value] of Object.entries(node)) eachNumber(value, path ? `${path}.${key}` : key, visit);
}

/** Every number nested in a figures object that is ±Infinity (NaN is judged by the catalogue). */
function infiniteLeaves(node: unknown, path: string, out: string[]): void {
  eachNumber(node, path, (where, value) => {
    if (value === Infinity || value === -Infinity) out.push(`${where} = ${value}`);
  });
}

/** What is wrong with one kind of mat's figures (shared by every mat of that kind). */
export function matFigureProblems(f: MatFigures, where = ''): string[] {
  const problems: string[] = [];
  for (const entry of MAT_FIGURE_CATALOGUE) {
    if (entry.read !== undefined && entry.read !== f.read.kind) continue;
    problems.push(
      ...valueProblems(
        where,
        entry.key,
        entry.quantity,
        entry.value(f),
        () => matMissingReason(entry.key, f),
        GENERIC_MAT_REASON,
      ),
    );
  }
  if (f.usableBits > f.bits) problems.push(`${where}usableBits ${f.usableBits} > bits ${f.bits}`);
  if (f.lostBits > f.bits) problems.push(`${where}lostBits ${f.lostBits} > bits ${f.bits}`);
  infiniteLeaves(f, where.replace(/: $/, ''), problems);
  return problems;
}

/**
 * Every violation of the figure rules in a report: each kind of mat's figures, then the whole-design
 * figures of the catalogue and every number in the totals. Empty when the report is sound.
 */
export function figureProblems(report: Report, design: Design): string[] {
  const problems: string[] = [];
  report.mats.figures.forEach((f, i) => {
    problems.push(...matFigureProblems(f, `mat kind ${i} (${f.cellId}): `));
  });
  const t = report.totals;
  for (const entry of TOTAL_FIGURE_CATALOGUE) {
    problems.push(
      ...valueProblems(
        'totals: ',
        entry.key,
        entry.quantity,
        entry.value(report, design),
        () => totalMissingReason(entry.key, t),
        GENERIC_TOTAL_REASON,
      ),
    );
  }
  if (t.usableBits > t.bits) problems.push(`totals: usableBits ${t.usableBits} > bits ${t.bits}`);
  eachNumber(t, '', (where, value) => {
    if (Number.isFinite(value)) return;
    if (Number.isNaN(value)) {
      if (TOTALS_THAT_MAY_NOT_EXIST.has(where)) return;
      if (t.matCount === 0 && TOTALS_UNDEFINED_WITHOUT_MATS.has(where)) return;
    }
    problems.push(`totals.${where} = ${value}`);
  });
  return problems;
}
