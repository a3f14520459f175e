import type { BuildSpec } from '../designs/buildPartition';
import type { StripSizes } from '../designs/partitionPlan';
import type { CellDefinition } from '../model/cell';
import type { OperatingConditions } from '../model/operating';
import type { ProcessProfile } from '../model/process';
import type { PartitionFigures } from '../engine';
import { DEFAULT_REPAIR } from '../model/builtins';
import { partitionFigures, ProcessCache } from './partitionFigures';

/**
 * A design-space sweep: every combination of cells per bit line × cells per word line × cell × process,
 * each assessed as the bank the partition builder would make for the target capacity.
 */
export interface SweepRequest {
  readonly targetBits: number;
  readonly strips: StripSizes;
  readonly operating: OperatingConditions;
  readonly cellsPerBitline: readonly number[];
  readonly cellsPerWordline: readonly number[];
  readonly cells: readonly CellDefinition[];
  readonly processes: readonly ProcessProfile[];
  /**
   * Spare rows and columns per repair domain to sweep; each partition is assessed with every pair and
   * the yield figures are computed (about a millisecond a point). Absent: no yield figures (NaN).
   */
  readonly spares?: { readonly rows: readonly number[]; readonly columns: readonly number[] };
}

/** One assessed combination. Indices point into the request's lists. */
export interface SweepPoint {
  readonly index: number;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  readonly cellIndex: number;
  readonly processIndex: number;
  readonly matRows: number;
  readonly matColumns: number;
  /** The spares this point assumes, or null when the sweep does not assess yield. */
  readonly spareRows: number | null;
  readonly spareColumns: number | null;
  /** Null when no bank could be planned (see `problem`). */
  readonly figures: PartitionFigures | null;
  readonly problem: string | null;
}

/** Most points one sweep may have; a sweep holds every point in memory. */
export const MAX_SWEEP_POINTS = 100_000;

/**
 * Why MAX_SWEEP_POINTS exists, in words shown next to the point count (a design choice, common
 * practice (no source), not a measured bound): the page keeps every point with all its figures and
 * draws each one on the chart, and the background worker assesses them one after another.
 */
export const SWEEP_POINT_LIMIT_REASON =
  'the page keeps every point with all its figures in memory and draws each on the chart, and the background worker assesses them one by one';

/** Partitions of a sweep (every combination but the spares). */
function partitionCount(request: SweepRequest): number {
  return (
    request.cellsPerBitline.length *
    request.cellsPerWordline.length *
    request.cells.length *
    request.processes.length
  );
}

export function sweepSize(request: SweepRequest): number {
  const spares = request.spares ? request.spares.rows.length * request.spares.columns.length : 1;
  return partitionCount(request) * spares;
}

/**
 * Which values point `index` combines: cells per word line vary fastest, then cells per bit line, cell,
 * process, spare columns and spare rows (slowest).
 */
export function sweepCoordinates(request: SweepRequest, index: number) {
  const nWl = request.cellsPerWordline.length;
  const nBl = request.cellsPerBitline.length;
  const nCell = request.cells.length;
  const wl = index % nWl;
  const bl = Math.floor(index / nWl) % nBl;
  const cellIndex = Math.floor(index / (nWl * nBl)) % nCell;
  const nProcess = request.processes.length;
  const processIndex = Math.floor(index / (nWl * nBl * nCell)) % Math.max(1, nProcess);
  const spareIndex = Math.floor(index / Math.max(1, partitionCount(request)));
  const spares = request.spares;
  const nColumns = spares ? Math.max(1, spares.columns.length) : 1;
  return {
    cellsPerBitline: request.cellsPerBitline[bl] ?? Number.NaN,
    cellsPerWordline: request.cellsPerWordline[wl] ?? Number.NaN,
    cellIndex,
    processIndex,
    spareRows: spares ? (spares.rows[Math.floor(spareIndex / nColumns)] ?? null) : null,
    spareColumns: spares ? (spares.columns[spareIndex % nColumns] ?? null) : null,
  };
}

/** The build spec of one point, for building it as a design. */
export function pointBuildSpec(request: SweepRequest, point: SweepPoint): Omit<BuildSpec, 'cells' | 'name'> {
  const cell = request.cells[point.cellIndex];
  const process = request.processes[point.processIndex];
  if (!cell || !process) throw new Error(`point ${point.index} is outside the sweep`);
  const repair = request.operating.repair ?? DEFAULT_REPAIR;
  return {
    targetBits: request.targetBits,
    cell,
    process,
    operating:
      point.spareRows === null || point.spareColumns === null
        ? request.operating
        : {
            ...request.operating,
            repair: { ...repair, spareRows: point.spareRows, spareColumns: point.spareColumns },
          },
    cellsPerBitline: point.cellsPerBitline,
    cellsPerWordline: point.cellsPerWordline,
    strips: request.strips,
  };
}

/** Assesses points [start, end) of a sweep. Pure; the worker calls it chunk by chunk. */
export function runSweepRange(
  request: SweepRequest,
  start: number,
  end: number,
  cache: ProcessCache = new ProcessCache(),
): SweepPoint[] {
  const points: SweepPoint[] = [];
  const last = Math.min(end, sweepSize(request));
  for (let index = start; index < last; index++) {
    const c = sweepCoordinates(request, index);
    const cell = request.cells[c.cellIndex];
    const process = request.processes[c.processIndex];
    if (!cell || !process) continue;
    const result = partitionFigures(
      {
        targetBits: request.targetBits,
        cell,
        process,
        operating: request.operating,
        cellsPerBitline: c.cellsPerBitline,
        cellsPerWordline: c.cellsPerWordline,
        strips: request.strips,
      },
      cache,
      {
        withYield: c.spareRows !== null && c.spareColumns !== null,
        spareRows: c.spareRows ?? undefined,
        spareColumns: c.spareColumns ?? undefined,
      },
    );
    // Field by field rather than a spread of the coordinates: thousands of points per sweep.
    points.push({
      index,
      cellsPerBitline: c.cellsPerBitline,
      cellsPerWordline: c.cellsPerWordline,
      cellIndex: c.cellIndex,
      processIndex: c.processIndex,
      spareRows: c.spareRows,
      spareColumns: c.spareColumns,
      matRows: result.ok ? result.plan.matRows : 0,
      matColumns: result.ok ? result.plan.matColumns : 0,
      figures: result.ok ? result.figures : null,
      problem: result.ok ? null : result.error,
    });
  }
  return points;
}

/** Whole numbers from `from` to `to` in steps of `step` (both ends included when they fall on a step). */
export function steppedValues(from: number, to: number, step: number): number[] {
  if (!(step > 0) || !Number.isFinite(from) || !Number.isFinite(to) || to < from) return [];
  const values: number[] = [];
  for (let v = from; v <= to + 1e-9 && values.length <= MAX_SWEEP_POINTS; v += step)
    values.push(Math.round(v));
  return [...new Set(values)];
}
