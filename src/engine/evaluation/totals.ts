import { BLOCK_TYPE_CODES, MAT_CODE, type BlockTable } from '../../geometry/blockTable';
import type { BlockType } from '../../model/block';
import type { Design } from '../../model/design';
import {
  refreshBusyFraction,
  refreshCycleTime,
  refreshInterval,
  refreshPower,
  rowsPerRefreshCommand,
} from '../physics/refresh';
import { figuresAt, matIdAt, matLabelAt, type MatTable } from './matTable';
import type { RefreshFigures, Totals } from './report';

/** Positions closer than this are the same band edge (m). */
const BAND_GRID = 1e-9;

/**
 * Rows to refresh. Mats side by side along the word-line direction, with the same extent across it,
 * form one band that a row activation crosses together (one global word line), so a band contributes
 * the largest word-line count among its mats, not the sum. Common practice (no source).
 */
export function refreshRows(table: BlockTable): number {
  // Bands by axis and start (on a 1 nm grid, as one exact integer), then by extent. Mats of one band
  // mostly follow each other in a tiled design, so the band of the previous mat is tried first.
  const bands = new Map<number, Map<number, number>>();
  let lastKey = Number.NaN;
  let lastExtent = Number.NaN;
  let lastBand: Map<number, number> | null = null;
  let lastRows = 0;
  for (let i = 0; i < table.count; i++) {
    if (table.type[i] !== MAT_CODE) continue;
    const kind = table.kinds[table.kindOf[i] as number];
    if (!kind) continue;
    const vertical = kind.block.bitlineAxis === 'vertical';
    const start = Math.round((vertical ? (table.y[i] as number) : (table.x[i] as number)) / BAND_GRID);
    const extent = Math.round(
      (vertical ? (table.height[i] as number) : (table.width[i] as number)) / BAND_GRID,
    );
    const key = start * 2 + (vertical ? 1 : 0);
    const wordlines = kind.geometry.wordlineCount;
    if (key === lastKey && extent === lastExtent && lastBand) {
      if (wordlines > lastRows) {
        lastRows = wordlines;
        lastBand.set(extent, wordlines);
      }
      continue;
    }
    let byExtent = bands.get(key);
    if (!byExtent) {
      byExtent = new Map();
      bands.set(key, byExtent);
    }
    const rows = Math.max(byExtent.get(extent) ?? 0, wordlines);
    byExtent.set(extent, rows);
    lastKey = key;
    lastExtent = extent;
    lastBand = byExtent;
    lastRows = rows;
  }
  let rows = 0;
  for (const byExtent of bands.values()) for (const r of byExtent.values()) rows += r;
  return rows;
}

function refreshFigures(table: BlockTable, mats: MatTable, design: Design): RefreshFigures {
  const o = design.operating;
  const rows = refreshRows(table);
  const interval = refreshInterval(o.refreshWindow, o.refreshCommandsPerWindow);
  const rowsPerCommand = rowsPerRefreshCommand(rows, o.refreshCommandsPerWindow);
  const cycleTime = refreshCycleTime(rowsPerCommand, o.refreshRowsInParallel, design.process.rowCycleTime);
  // Every word line of every mat is activated once per window.
  let energyOfAllRows = 0;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    energyOfAllRows += f.activationEnergy.total * f.wordlineCount;
  }
  return {
    rows,
    interval,
    rowsPerCommand,
    cycleTime,
    busyFraction: refreshBusyFraction(cycleTime, interval),
    power: refreshPower(energyOfAllRows, o.refreshWindow),
  };
}

/** The extreme mats of a floorplan: NaN and null without mats. */
interface Extremes {
  worstSenseSignal: number;
  worstSenseSignalMatId: string | null;
  worstSenseSignalMatName: string | null;
  worstSenseMargin: number;
  worstSenseMarginMatId: string | null;
  worstSenseMarginMatName: string | null;
  shortestRetention: number;
  worstWordlineDelay: number;
}

/**
 * Smallest signal, margin and retention and largest word-line delay over all mats, first mat winning ties,
 * in one pass that reads the fields directly (a callback per figure would box every value it returns).
 */
function extremes(mats: MatTable): Extremes {
  const e: Extremes = {
    worstSenseSignal: Number.NaN,
    worstSenseSignalMatId: null,
    worstSenseSignalMatName: null,
    worstSenseMargin: Number.NaN,
    worstSenseMarginMatId: null,
    worstSenseMarginMatName: null,
    shortestRetention: Number.NaN,
    worstWordlineDelay: Number.NaN,
  };
  let signal = Infinity;
  let margin = Infinity;
  let retention = Infinity;
  let delay = -Infinity;
  let first = true;
  let signalMat = -1;
  let marginMat = -1;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    if (first || f.senseSignal < signal) {
      signal = f.senseSignal;
      signalMat = k;
    }
    if (first || f.senseMarginAtRefresh < margin) {
      margin = f.senseMarginAtRefresh;
      marginMat = k;
    }
    if (first || f.retentionTime < retention) retention = f.retentionTime;
    if (first || f.wordlineDelay > delay) delay = f.wordlineDelay;
    first = false;
  }
  if (!first) {
    e.worstSenseSignalMatId = matIdAt(mats, signalMat);
    e.worstSenseMarginMatId = matIdAt(mats, marginMat);
    e.worstSenseSignalMatName = matLabelAt(mats, signalMat);
    e.worstSenseMarginMatName = matLabelAt(mats, marginMat);
    e.worstSenseSignal = signal;
    e.worstSenseMargin = margin;
    e.shortestRetention = retention;
    e.worstWordlineDelay = delay;
  }
  return e;
}

/**
 * Whole-floorplan figures. Array efficiency η = usable bits·A_cell / A_total and area per bit =
 * A_total / usable bits (= A_cell / η). Source: the definition used by Takahashi et al., "A Multigigabit
 * DRAM Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (cell area over die area).
 * The total is the bounding box of every block, so gaps count against efficiency.
 */
export function computeTotals(
  table: BlockTable,
  mats: MatTable,
  design: Design,
  offsetSigmaMultiplier: number,
  senseAmpCount: number,
): Totals {
  let bits = 0;
  let usableBits = 0;
  let cellArea = 0;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    bits += f.bits;
    usableBits += f.usableBits;
    cellArea += f.usableBits * f.cellFootprint;
  }
  let placedArea = 0;
  // Summed per type code in a typed array: adding to a record field would box a new number each time.
  const areaByCode = new Float64Array(BLOCK_TYPE_CODES.length);
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
  const areaPerBit = usableBits > 0 ? totalArea / usableBits : 0;
  const F = design.process.featureSize;
  return {
    matCount: mats.count,
    bits,
    usableBits,
    lostBits: bits - usableBits,
    totalArea,
    placedArea,
    areaByType,
    cellArea,
    arrayEfficiency: totalArea > 0 ? cellArea / totalArea : 0,
    areaPerBit,
    areaPerBitInF2: areaPerBit / (F * F),
    senseAmpCount,
    offsetSigmaMultiplier,
    ...extremes(mats),
    refresh: refreshFigures(table, mats, design),
  };
}
