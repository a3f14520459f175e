import { BLOCK_TYPE_CODES, MAT_CODE, type BlockTable } from '../../../src/geometry/blockTable';
import type { BlockType } from '../../../src/model/block';
import type { Design } from '../../../src/model/design';
import type { DesignContext } from '../../../src/engine/evaluation/designContext';
import type { PositionedOverlap } from '../../../src/engine/evaluation/overlaps';
import {
  refreshBusyFraction,
  refreshCycleTime,
  refreshInterval,
  refreshPower,
  rowsPerRefreshCommand,
} from '../../../src/engine/physics/refresh';
import { figuresAt, matIdAt, matLabelAt, type MatTable } from '../../../src/engine/evaluation/matTable';
import { refreshRows } from './refreshRows';
import type { MatFigures, RefreshFigures, Totals } from '../../../src/engine/evaluation/report';

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
  mats: MatTable,
  design: Design,
  computedRowCycle: number,
): RefreshFigures {
  const o = design.operating;
  const rows = refreshRows(table);
  const interval = refreshInterval(o.refreshWindow, o.refreshCommandsPerWindow);
  const rowsPerCommand = rowsPerRefreshCommand(rows, o.refreshCommandsPerWindow);
  const cycle = refreshRowCycle(design.process.rowCycleTimeOverride, computedRowCycle);
  const cycleTime =
    rows > 0 ? refreshCycleTime(rowsPerCommand, o.refreshRowsInParallel, cycle.rowCycleTime) : 0;
  // Every word line of every refreshed mat is activated once per window.
  let energyOfAllRows = 0;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    if (f.needsRefresh) energyOfAllRows += f.activationEnergy.total * f.wordlineCount;
  }
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
 * in one pass that reads the fields directly (a callback per figure would box every value it returns).
 */
function extremes(mats: MatTable): Extremes {
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
    standbyPower: 0,
    heldBits: 0,
  };
  // A sensed, refreshed mat with no margin to lose has no retention: then the shortest does not exist.
  let noMarginToLose = false;
  let signalMat = -1;
  let marginMat = -1;
  let rcdMat = -1;
  let rcMat = -1;
  let weakestMat = -1;
  let wordlineMat = -1;
  let previous: MatFigures | null = null;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    e.standbyPower += f.standbyPower;
    if (f.standbyPower > 0) e.heldBits += f.bits;
    // Mats of one kind share their figures: the extremes of the others need no second look.
    if (f === previous) continue;
    previous = f;
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

/**
 * Bits, usable bits and usable cell area (m²) over all mats, into `out[0 … 2]`. (Each hot loop ends its
 * function: code after a loop V8 compiled while it ran has no type feedback and is thrown away.)
 */
function matSums(mats: MatTable, out: Float64Array): void {
  let bits = 0;
  let usableBits = 0;
  let cellArea = 0;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    bits += f.bits;
    usableBits += f.usableBits;
    cellArea += f.usableBits * f.cellFootprint;
  }
  out[0] = bits;
  out[1] = usableBits;
  out[2] = cellArea;
}

/**
 * Area placed (m², returned), per block type code (added into `areaByCode`) and the bounding box of every
 * block (`box`: left, top, right, bottom, m; ±Infinity without blocks).
 */
function blockSums(table: BlockTable, areaByCode: Float64Array, box: Float64Array): number {
  let placedArea = 0;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < table.count; i++) {
    const x = table.x[i] as number;
    const y = table.y[i] as number;
    const w = table.width[i] as number;
    const h = table.height[i] as number;
    placedArea += w * h;
    const code = table.type[i] as number;
    areaByCode[code] = (areaByCode[code] as number) + w * h;
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x + w);
    maxY = Math.max(maxY, y + h);
  }
  box[0] = minX;
  box[1] = minY;
  box[2] = maxX;
  box[3] = maxY;
  return placedArea;
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
): Totals {
  const sums = new Float64Array(3);
  matSums(mats, sums);
  const bits = sums[0] as number;
  const usableBits = sums[1] as number;
  const cellArea = sums[2] as number;
  // Summed per type code in a typed array: adding to a record field would box a new number each time.
  const areaByCode = new Float64Array(BLOCK_TYPE_CODES.length);
  const box = new Float64Array(4);
  const placedArea = blockSums(table, areaByCode, box);
  const minX = box[0] as number;
  const minY = box[1] as number;
  const maxX = box[2] as number;
  const maxY = box[3] as number;
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
  const e = extremes(mats);
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
    refresh: refreshFigures(table, mats, design, e.worstRowCycleTime),
  };
}
