import type { PlacedBlock, PlacedMat } from '../geometry/placedBlocks';
import { area, boundingBox } from '../geometry/rect';
import type { BlockType } from '../model/block';
import type { Design } from '../model/design';
import {
  refreshBusyFraction,
  refreshCycleTime,
  refreshInterval,
  refreshPower,
  rowsPerRefreshCommand,
} from './refresh';
import type { MatReport, RefreshFigures, Totals } from './report';

/** Positions closer than this are the same band edge (m). */
const BAND_GRID = 1e-9;

/**
 * Rows to refresh. Mats side by side along the word-line direction, with the same extent across it,
 * form one band that a row activation crosses together (one global word line), so a band contributes
 * the largest word-line count among its mats, not the sum. Common practice (no source).
 */
export function refreshRows(mats: readonly PlacedMat[]): number {
  const bands = new Map<string, number>();
  for (const m of mats) {
    const vertical = m.block.bitlineAxis === 'vertical';
    const start = vertical ? m.rect.y : m.rect.x;
    const extent = vertical ? m.rect.height : m.rect.width;
    const key = `${m.block.bitlineAxis}:${Math.round(start / BAND_GRID)}:${Math.round(extent / BAND_GRID)}`;
    bands.set(key, Math.max(bands.get(key) ?? 0, m.geometry.wordlineCount));
  }
  let rows = 0;
  for (const r of bands.values()) rows += r;
  return rows;
}

function refreshFigures(
  mats: readonly PlacedMat[],
  reports: readonly MatReport[],
  design: Design,
): RefreshFigures {
  const o = design.operating;
  const rows = refreshRows(mats);
  const interval = refreshInterval(o.refreshWindow, o.refreshCommandsPerWindow);
  const rowsPerCommand = rowsPerRefreshCommand(rows, o.refreshCommandsPerWindow);
  const cycleTime = refreshCycleTime(rowsPerCommand, o.refreshRowsInParallel, design.process.rowCycleTime);
  // Every word line of every mat is activated once per window.
  let energyOfAllRows = 0;
  for (const r of reports) energyOfAllRows += r.figures.activationEnergy.total * r.figures.wordlineCount;
  return {
    rows,
    interval,
    rowsPerCommand,
    cycleTime,
    busyFraction: refreshBusyFraction(cycleTime, interval),
    power: refreshPower(energyOfAllRows, o.refreshWindow),
  };
}

/** The mat with the smallest value of `pick`, as [value, id]; [NaN, null] without mats. */
function worst(reports: readonly MatReport[], pick: (m: MatReport) => number): [number, string | null] {
  let value = Number.NaN;
  let id: string | null = null;
  for (const m of reports) {
    const v = pick(m);
    if (id === null || v < value) {
      value = v;
      id = m.matId;
    }
  }
  return [value, id];
}

/**
 * Whole-floorplan figures. Array efficiency η = usable bits·A_cell / A_total and area per bit =
 * A_total / usable bits (= A_cell / η). Source: the definition used by Takahashi et al., "A Multigigabit
 * DRAM Technology With 6F² Open-Bitline Cell…", IEEE JSSC 36(11), 2001 (cell area over die area).
 * The total is the bounding box of every block, so gaps count against efficiency.
 */
export function computeTotals(
  placed: readonly PlacedBlock[],
  mats: readonly PlacedMat[],
  reports: readonly MatReport[],
  design: Design,
  offsetSigmaMultiplier: number,
  senseAmpCount: number,
): Totals {
  let bits = 0;
  let usableBits = 0;
  let cellArea = 0;
  for (const m of reports) {
    bits += m.figures.bits;
    usableBits += m.figures.usableBits;
    cellArea += m.figures.usableBits * m.figures.cellFootprint;
  }
  let placedArea = 0;
  const areaByType: Record<BlockType, number> = {
    mat: 0,
    senseAmpStrip: 0,
    wordlineDriverStrip: 0,
    rowDecoder: 0,
    columnDecoder: 0,
    spacer: 0,
  };
  for (const p of placed) {
    const a = area(p.rect);
    placedArea += a;
    areaByType[p.block.type] += a;
  }
  const box = boundingBox(placed.map((p) => p.rect));
  const totalArea = box ? area(box) : 0;
  const areaPerBit = usableBits > 0 ? totalArea / usableBits : 0;
  const F = design.process.featureSize;
  const [worstSenseSignal, worstSenseSignalMatId] = worst(reports, (m) => m.figures.senseSignal);
  const [worstSenseMargin, worstSenseMarginMatId] = worst(reports, (m) => m.figures.senseMarginAtRefresh);
  const [shortestRetention] = worst(reports, (m) => m.figures.retentionTime);
  const [negativeDelay] = worst(reports, (m) => -m.figures.wordlineDelay);
  return {
    matCount: reports.length,
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
    worstSenseSignal,
    worstSenseSignalMatId,
    worstSenseMargin,
    worstSenseMarginMatId,
    shortestRetention,
    worstWordlineDelay: -negativeDelay,
    refresh: refreshFigures(mats, reports, design),
  };
}
