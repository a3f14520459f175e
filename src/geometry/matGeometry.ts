import type { CellDefinition } from '../model/cell';
import { cellPitches, crossingOccupancy } from '../model/cellBasics';
import type { BitlineAxis, Mat } from '../model/block';
import type { Rect } from './rect';

/** Everything about a mat's shape that follows from its cell, its cell counts and F. Lengths in metres. */
export interface MatGeometry {
  /** Distance between neighbouring bit lines (m). */
  readonly bitlinePitch: number;
  /** Distance between neighbouring word lines (m). */
  readonly wordlinePitch: number;
  /** Bit lines crossing the mat: cells per word line ÷ crossing occupancy. */
  readonly bitlineCount: number;
  /** Word lines crossing the mat: cells per bit line ÷ crossing occupancy. */
  readonly wordlineCount: number;
  /** Length of one bit line = word lines × word-line pitch (m). */
  readonly bitlineLength: number;
  /** Length of one (sub-)word line = bit lines × bit-line pitch (m). */
  readonly wordlineLength: number;
  /** Cells in the mat = cells per bit line × bit lines. */
  readonly bits: number;
  /** Footprint of one cell = bit-line pitch × word-line pitch ÷ occupancy (m²). */
  readonly cellArea: number;
  readonly width: number;
  readonly height: number;
}

export function matGeometry(mat: Mat, cell: CellDefinition, featureSize: number): MatGeometry {
  const occupancy = crossingOccupancy(cell.bitlineArchitecture);
  const { bitlinePitch, wordlinePitch } = cellPitches(cell, featureSize);
  const bitlineCount = Math.ceil(mat.cellsPerWordline / occupancy);
  const wordlineCount = Math.ceil(mat.cellsPerBitline / occupancy);
  const bitlineLength = wordlineCount * wordlinePitch;
  const wordlineLength = bitlineCount * bitlinePitch;
  const vertical = mat.bitlineAxis === 'vertical';
  return {
    bitlinePitch,
    wordlinePitch,
    bitlineCount,
    wordlineCount,
    bitlineLength,
    wordlineLength,
    bits: mat.cellsPerBitline * bitlineCount,
    cellArea: (bitlinePitch * wordlinePitch) / occupancy,
    width: vertical ? wordlineLength : bitlineLength,
    height: vertical ? bitlineLength : wordlineLength,
  };
}

/**
 * The shape of a mat of `cell` with these counts before any such mat exists: what a drag shows and the
 * grid tiler and the partition planner size their grids by (their bit lines run vertically).
 */
export function unplacedMatGeometry(
  cell: CellDefinition,
  cellsPerBitline: number,
  cellsPerWordline: number,
  featureSize: number,
  bitlineAxis: BitlineAxis = 'vertical',
): MatGeometry {
  const mat: Mat = {
    id: 'probe',
    name: '',
    type: 'mat',
    x: 0,
    y: 0,
    cellId: cell.id,
    cellsPerBitline,
    cellsPerWordline,
    bitlineAxis,
  };
  return matGeometry(mat, cell, featureSize);
}

export function matRect(mat: Mat, geometry: MatGeometry): Rect {
  return { x: mat.x, y: mat.y, width: geometry.width, height: geometry.height };
}
