import type { CellDefinition } from '../model/cell';
import { cellPitches, crossingOccupancy } from '../model/cellBasics';
import { matCellStep } from './cellPitch';
import { ABUTMENT_TOLERANCE, type Rect } from './rect';
import type { BitlineAxis, Mat } from '../model/block';

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
  /** Outline along the canvas axes (m): the cell array's, or the mat's slot in a grid (Mat.footprint). */
  readonly width: number;
  readonly height: number;
}

/**
 * A mat's length along one axis: its slot's when the slot holds the array with less than one cell to
 * spare (see Mat.footprint), else the array's own.
 */
function slotLength(array: number, slot: number | undefined, cellStep: number): number {
  if (slot === undefined) return array;
  return slot >= array - ABUTMENT_TOLERANCE && slot < array + cellStep - ABUTMENT_TOLERANCE ? slot : array;
}

export function matGeometry(mat: Mat, cell: CellDefinition, featureSize: number): MatGeometry {
  const occupancy = crossingOccupancy(cell.bitlineArchitecture);
  const { bitlinePitch, wordlinePitch } = cellPitches(cell, featureSize);
  const bitlineCount = Math.ceil(mat.cellsPerWordline / occupancy);
  const wordlineCount = Math.ceil(mat.cellsPerBitline / occupancy);
  const bitlineLength = wordlineCount * wordlinePitch;
  const wordlineLength = bitlineCount * bitlinePitch;
  const vertical = mat.bitlineAxis === 'vertical';
  const arrayWidth = vertical ? wordlineLength : bitlineLength;
  const arrayHeight = vertical ? bitlineLength : wordlineLength;
  const step = mat.footprint ? matCellStep(cell, featureSize, mat.bitlineAxis) : null;
  return {
    bitlinePitch,
    wordlinePitch,
    bitlineCount,
    wordlineCount,
    bitlineLength,
    wordlineLength,
    bits: mat.cellsPerBitline * bitlineCount,
    cellArea: (bitlinePitch * wordlinePitch) / occupancy,
    width: step ? slotLength(arrayWidth, mat.footprint?.width, step.x) : arrayWidth,
    height: step ? slotLength(arrayHeight, mat.footprint?.height, step.y) : arrayHeight,
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
