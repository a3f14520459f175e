import { BLOCK_TYPE_CODES, MAT_CODE, type BlockTable } from '../../geometry/blockTable';
import type { BlockRuns } from '../../geometry/blockRuns';
import type { BlockType } from '../../model/block';
import type { Design } from '../../model/design';
import type { DesignContext } from './designContext';
import type { PositionedOverlap } from './overlaps';
import {
  refreshBusyFraction,
  refreshCycleTime,
  refreshInterval,
  refreshPower,
  rowsPerRefreshCommand,
} from '../physics/refresh';
import { figuresEnd } from './figureRuns';
import { figuresAt, matIdAt, matLabelAt, type MatTable } from './matTable';
import { refreshRows } from './refreshRows';
import { repeatedSum } from '../../geometry/repeatedSum';
import type { MatFigures, RefreshFigures, Totals } from './report';

export { refreshRows } from './refreshRows';

/**
 * The tRC the refresh figures use: the process override when it is set (> 0), else the computed tRC of
 * the slowest sensed mat (NaN when no mat is sensed).
 */
export function refreshRowCycle(
  override: number,
  computed: number,
): { rowCycleTime: number; rowCycleTimeOverridden: boolean } {
  return override > 0
    ? { rowCycleTime: override, rowCycleTimeOverridden: true }
    : { rowCycleTime: computed, rowCycleTimeOverridden: false };
}

function refreshFigures(
  table: BlockTable,
  design: Design,
  computedRowCycle: number,
  /** Activation energy of every word line of every refreshed mat, once each (J): one window's refresh. */
  energyOfAllRows: number,
  runs: BlockRuns | null,
): RefreshFigures {
  const o = design.operating;
  const rows = refreshRows(table, runs);
  const interval = refreshInterval(o.refreshWindow, o.refreshCommandsPerWindow);
  const rowsPerCommand = rowsPerRefreshCommand(rows, o.refreshCommandsPerWindow);
  const cycle = refreshRowCycle(design.process.rowCycleTimeOverride, computedRowCycle);
  const cycleTime =
    rows > 0 ? refreshCycleTime(rowsPerCommand, o.refreshRowsInParallel, cycle.rowCycleTime) : 0;
  return {
    rows,
    interval,
    rowsPerCommand,
    cycleTime,
    ...cycle,
    busyFraction: refreshBusyFraction(cycleTime, interval),
    power: refreshPower(energyOfAllRows, o.refreshWindow),
  };
}

/** The extreme mats of a floorplan: NaN and null without mats (or without a sensed mat). */
interface Extremes {
  worstSenseSignal: number;
  worstSenseSignalMatId: string | null;
  worstSenseSignalMatName: string | null;
  worstSenseMargin: number;
  worstSenseMarginMatId: string | null;
  worstSenseMarginMatName: string | null;
  shortestRetention: number;
  shortestWeakestRetention: number;
  worstWordlineDelay: number;
  worstWordlineDelayMatId: string | null;
  worstWordlineDelayMatName: string | null;
  worstWordlineTurnOn: number;
  worstWordlineNinety: number;
  worstRowToColumnDelay: number;
  worstRowToColumnDelayMatId: string | null;
  worstRowToColumnDelayMatName: string | null;
  worstRowCycleTime: number;
  worstRowCycleTimeMatId: string | null;
  worstRowCycleTimeMatName: string | null;
  shortestWeakestRetentionMatId: string | null;
  shortestWeakestRetentionMatName: string | null;
  standbyPower: number;
  heldBits: number;
}

/** Whether `value` is a new minimum, NaN ignored (a figure that does not exist for that mat). */
function isLower(current: number, value: number): boolean {
  return value < current || (Number.isNaN(current) && !Number.isNaN(value));
}

/** Whether `value` is a new maximum, NaN ignored. */
function isHigher(current: number, value: number): boolean {
  return value > current || (Number.isNaN(current) && !Number.isNaN(value));
}

/** min that ignores NaN. */
function lower(current: number, value: number): number {
  return isLower(current, value) ? value : current;
}

/** max that ignores NaN. */
function higher(current: number, value: number): number {
  return isHigher(current, value) ? value : current;
}

/**
 * Smallest signal, margin and retention and largest word-line delay over all mats, first mat winning ties,
 * in one pass over the runs of mats sharing figures (`runs`: the first mat of each run) that reads the
 * fields directly (a callback per figure would box every value it returns).
 */
function extremes(mats: MatTable, runs: Int32Array, runCount: number, sums: Float64Array): Extremes {
  const nan = Number.NaN;
  const e: Extremes = {
    worstSenseSignal: nan,
    worstSenseSignalMatId: null,
    worstSenseSignalMatName: null,
    worstSenseMargin: nan,
    worstSenseMarginMatId: null,
    worstSenseMarginMatName: null,
    shortestRetention: nan,
    shortestWeakestRetention: nan,
    worstWordlineDelay: nan,
    worstWordlineDelayMatId: null,
    worstWordlineDelayMatName: null,
    worstWordlineTurnOn: nan,
    worstWordlineNinety: nan,
    worstRowToColumnDelay: nan,
    worstRowToColumnDelayMatId: null,
    worstRowToColumnDelayMatName: null,
    worstRowCycleTime: nan,
    worstRowCycleTimeMatId: null,
    worstRowCycleTimeMatName: null,
    shortestWeakestRetentionMatId: null,
    shortestWeakestRetentionMatName: null,
    standbyPower: sums[STANDBY_POWER] as number,
    heldBits: sums[HELD_BITS] as number,
  };
  // A sensed, refreshed mat with no margin to lose has no retention: then the shortest does not exist.
  let noMarginToLose = false;
  let signalMat = -1;
  let marginMat = -1;
  let rcdMat = -1;
  let rcMat = -1;
  let weakestMat = -1;
  let wordlineMat = -1;
  // Mats of one kind share their figures: only the first mat of each run needs a look.
  for (let r = 0; r < runCount; r++) {
    const k = runs[r] as number;
    const f = figuresAt(mats, k);
    // Only a mat with a sensed bit line has a signal and a margin to report.
    if (f.usableBits > 0) {
      if (signalMat < 0 || f.senseSignal < e.worstSenseSignal) {
        e.worstSenseSignal = f.senseSignal;
        signalMat = k;
      }
      if (marginMat < 0 || f.senseMarginAtRefresh < e.worstSenseMargin) {
        e.worstSenseMargin = f.senseMarginAtRefresh;
        marginMat = k;
      }
    }
    if (f.usableBits > 0 && f.needsRefresh && !(f.allowedDroop > 0)) noMarginToLose = true;
    e.shortestRetention = lower(e.shortestRetention, f.retentionTime);
    if (isLower(e.shortestWeakestRetention, f.weakestRetentionTime)) {
      e.shortestWeakestRetention = f.weakestRetentionTime;
      weakestMat = k;
    }
    if (isHigher(e.worstWordlineDelay, f.wordlineDelay)) {
      e.worstWordlineDelay = f.wordlineDelay;
      wordlineMat = k;
    }
    e.worstWordlineTurnOn = higher(e.worstWordlineTurnOn, f.wordlineTiming.toTurnOn);
    e.worstWordlineNinety = higher(e.worstWordlineNinety, f.wordlineTiming.toNinetyPercent);
    if (isHigher(e.worstRowToColumnDelay, f.timing.rcd)) {
      e.worstRowToColumnDelay = f.timing.rcd;
      rcdMat = k;
    }
    if (isHigher(e.worstRowCycleTime, f.timing.rc)) {
      e.worstRowCycleTime = f.timing.rc;
      rcMat = k;
    }
  }
  if (noMarginToLose) {
    e.shortestRetention = nan;
    e.shortestWeakestRetention = nan;
    weakestMat = -1;
  }
  if (wordlineMat >= 0) {
    e.worstWordlineDelayMatId = matIdAt(mats, wordlineMat);
    e.worstWordlineDelayMatName = matLabelAt(mats, wordlineMat);
  }
  if (rcdMat >= 0) {
    e.worstRowToColumnDelayMatId = matIdAt(mats, rcdMat);
    e.worstRowToColumnDelayMatName = matLabelAt(mats, rcdMat);
  }
  if (rcMat >= 0) {
    e.worstRowCycleTimeMatId = matIdAt(mats, rcMat);
    e.worstRowCycleTimeMatName = matLabelAt(mats, rcMat);
  }
  if (weakestMat >= 0) {
    e.shortestWeakestRetentionMatId = matIdAt(mats, weakestMat);
    e.shortestWeakestRetentionMatName = matLabelAt(mats, weakestMat);
  }
  if (signalMat >= 0) {
    e.worstSenseSignalMatId = matIdAt(mats, signalMat);
    e.worstSenseSignalMatName = matLabelAt(mats, signalMat);
  }
  if (marginMat >= 0) {
    e.worstSenseMarginMatId = matIdAt(mats, marginMat);
    e.worstSenseMarginMatName = matLabelAt(mats, marginMat);
  }
  return e;
}

/** Area where two mats overlap (m²), summed over pairs: those cells exist once, not twice. */
function matOverlapArea(table: BlockTable, overlaps: readonly PositionedOverlap[]): number {
  let area = 0;
  for (const o of overlaps)
    if (table.type[o.first] === MAT_CODE && table.type[o.second] === MAT_CODE) area += o.overlap.area;
  return area;
}

/** Slots of the sums over all mats (see {@link matSums}). */
const BITS = 0;
const USABLE_BITS = 1;
const CELL_AREA = 2;
const STANDBY_POWER = 3;
const HELD_BITS = 4;
const REFRESH_ENERGY = 5;
const SUM_SLOTS = 6;

/**
 * What each figures object of a mat table adds to the sums for each of its mats, in the slots of
 * {@link matSums} (computed once per figures object; each product is the one a per-mat sum would form):
 * bits, usable bits, usable cell area (usable bits · cell footprint, m²), standby power (W), bits held
 * by standby power, and the activation energy of all its word lines when it is refreshed (J).
 */
function addendsOf(figures: readonly MatFigures[]): Float64Array {
  const addends = new Float64Array(SUM_SLOTS * figures.length);
  for (let i = 0; i < figures.length; i++) {
    const f = figures[i] as MatFigures;
    const at = SUM_SLOTS * i;
    addends[at + BITS] = f.bits;
    addends[at + USABLE_BITS] = f.usableBits;
    addends[at + CELL_AREA] = f.usableBits * f.cellFootprint;
    addends[at + STANDBY_POWER] = f.standbyPower;
    // Adding 0 for the others leaves each sum as skipping them would (the sums start at +0).
    addends[at + HELD_BITS] = f.standbyPower > 0 ? f.bits : 0;
    addends[at + REFRESH_ENERGY] = f.needsRefresh ? f.activationEnergy.total * f.wordlineCount : 0;
  }
  return addends;
}

/** Where each run of mats sharing one figures object starts; reused between calls. */
let runStarts = new Int32Array(1024);

/**
 * The sums over all mats, mat by mat in design order (so each floating-point sum is the same to the
 * bit), into `out` (slots above, starting at +0), and the first mat of each run of mats sharing figures
 * into `runs` (returns how many runs). Mats follow each other in runs of one figures index; each run adds
 * its addends once per mat (see {@link addRun}).
 */
function matSums(
  count: number,
  figureIndex: Int32Array,
  figures: readonly MatFigures[],
  addends: Float64Array,
  runs: Int32Array,
  out: Float64Array,
): number {
  let runCount = 0;
  for (let k = 0; k < count;) {
    const i = figureIndex[k] as number;
    const end = figuresEnd(figureIndex, k, count, i, figures.length);
    addRun(out, addends, SUM_SLOTS * i, end - k);
    if (k === 0 || figures[i] !== figures[figureIndex[k - 1] as number]) runs[runCount++] = k;
    k = end;
  }
  return runCount;
}

/** Runs at least this long are summed by {@link repeatedSum}; shorter ones by a loop (cheaper for a few). */
const LONG_RUN = 16;

/**
 * Adds the addends at `at` (one per slot) to the sums `out`, `mats` times each, one addition after the
 * other: the sums a loop over the run's mats forms.
 */
function addRun(out: Float64Array, addends: Float64Array, at: number, mats: number): void {
  for (let slot = 0; slot < SUM_SLOTS; slot++) {
    const v = addends[at + slot] as number;
    let sum = out[slot] as number;
    if (mats >= LONG_RUN) sum = repeatedSum(sum, v, mats);
    else for (let m = 0; m < mats; m++) sum += v;
    out[slot] = sum;
  }
}

/**
 * Whole-floorplan figures. Array efficiency η = usable bits·A_cell / A_total and area per bit =
 * A_total / usable bits (= A_cell / η). Source: the definition used by Takahashi et al., "A Multigigabit
 * DRAM Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (cell area over die area).
 * The total is the bounding box of every block, so gaps count against efficiency. Where mats overlap
 * (an error the checks report) their shared area is counted once, so η never exceeds 100 %.
 */
export function computeTotals(
  table: BlockTable,
  mats: MatTable,
  design: Design,
  ctx: DesignContext,
  senseAmpCount: number,
  overlaps: readonly PositionedOverlap[],
  /** The table's runs by block type, when the neighbour pass found them (refresh bands go run by run). */
  runs: BlockRuns | null = null,
): Totals {
  const sums = new Float64Array(SUM_SLOTS);
  if (runStarts.length < mats.count) runStarts = new Int32Array(mats.count);
  const runCount = matSums(
    mats.count,
    mats.figureIndex,
    mats.figures,
    addendsOf(mats.figures),
    runStarts,
    sums,
  );
  const bits = sums[BITS] as number;
  const usableBits = sums[USABLE_BITS] as number;
  const cellArea = sums[CELL_AREA] as number;
  // Placed area per type and the bounding box were summed while the table was laid out.
  const { placedArea, areaByCode, bounds } = table.sums;
  const minX = bounds[0] as number;
  const minY = bounds[1] as number;
  const maxX = bounds[2] as number;
  const maxY = bounds[3] as number;
  const sum = (type: BlockType) => areaByCode[BLOCK_TYPE_CODES.indexOf(type)] as number;
  const areaByType: Record<BlockType, number> = {
    mat: sum('mat'),
    senseAmpStrip: sum('senseAmpStrip'),
    wordlineDriverStrip: sum('wordlineDriverStrip'),
    rowDecoder: sum('rowDecoder'),
    columnDecoder: sum('columnDecoder'),
    spacer: sum('spacer'),
  };
  // The bounding box of every block (rect.ts boundingBox, read from the table).
  const totalArea = table.count > 0 ? (maxX - minX) * (maxY - minY) : 0;
  // Area per bit does not exist without a usable bit: NaN, shown as "—" with the reason.
  const areaPerBit = usableBits > 0 ? totalArea / usableBits : Number.NaN;
  const F = design.process.featureSize;
  const overlapArea = matOverlapArea(table, overlaps);
  const cellAreaOnce = Math.max(0, cellArea - overlapArea);
  const e = extremes(mats, runStarts, runCount, sums);
  return {
    matCount: mats.count,
    bits,
    usableBits,
    lostBits: bits - usableBits,
    totalArea,
    placedArea,
    areaByType,
    cellArea: cellAreaOnce,
    arrayEfficiency: totalArea > 0 ? Math.min(1, cellAreaOnce / totalArea) : Number.NaN,
    areaPerBit,
    areaPerBitInF2: areaPerBit / (F * F),
    senseAmpCount,
    senseAmpsOnDie: ctx.senseAmpsOnDie,
    offsetSigmaMultiplier: ctx.sigmaMultiplier,
    ...e,
    matOverlapArea: overlapArea,
    refresh: refreshFigures(table, design, e.worstRowCycleTime, sums[REFRESH_ENERGY] as number, runs),
  };
}
