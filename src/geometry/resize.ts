import type { Mat } from '../model/block';
import { MAX_CELLS_PER_LINE } from '../model/blockBasics';
import type { CellDefinition } from '../model/cell';
import { matCellStep } from './cellPitch';
import { matGeometry } from './matGeometry';
import { bottom, right, type Rect } from './rect';

/** Resize handles: the four sides and the four corners, by compass direction (north is up). */
export const RESIZE_HANDLES = ['n', 's', 'e', 'w', 'ne', 'nw', 'se', 'sw'] as const;
export type ResizeHandle = (typeof RESIZE_HANDLES)[number];

/** Where a handle sits on a rectangle (m). */
export function handlePosition(rect: Rect, handle: ResizeHandle): { x: number; y: number } {
  const x = handle.includes('w') ? rect.x : handle.includes('e') ? right(rect) : rect.x + rect.width / 2;
  const y = handle.includes('n') ? rect.y : handle.includes('s') ? bottom(rect) : rect.y + rect.height / 2;
  return { x, y };
}

/**
 * The rectangle after dragging `handle` by (dx, dy) (m): the opposite sides stay put, and neither side
 * shrinks below `minSize`.
 */
export function resizeRect(rect: Rect, handle: ResizeHandle, dx: number, dy: number, minSize: number): Rect {
  let left = rect.x;
  let top = rect.y;
  let r = right(rect);
  let b = bottom(rect);
  if (handle.includes('w')) left = Math.min(left + dx, r - minSize);
  if (handle.includes('e')) r = Math.max(r + dx, left + minSize);
  if (handle.includes('n')) top = Math.min(top + dy, b - minSize);
  if (handle.includes('s')) b = Math.max(b + dy, top + minSize);
  return { x: left, y: top, width: r - left, height: b - top };
}

/** A mat's new corner and cell counts after a resize in whole cells. */
export interface MatResize {
  readonly x: number;
  readonly y: number;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
}

/**
 * Resizes a mat by dragging a handle, in whole cells: the dragged sides move to the nearest whole-cell
 * size and the opposite sides stay where they were.
 */
export function resizeMat(
  mat: Mat,
  cell: CellDefinition,
  featureSize: number,
  handle: ResizeHandle,
  dx: number,
  dy: number,
): MatResize {
  const g = matGeometry(mat, cell, featureSize);
  const rect = { x: mat.x, y: mat.y, width: g.width, height: g.height };
  const step = matCellStep(cell, featureSize, mat.bitlineAxis);
  const wanted = resizeRect(rect, handle, dx, dy, Math.min(step.x, step.y));
  const clamp = (n: number) => Math.min(MAX_CELLS_PER_LINE, Math.max(1, Math.round(n)));
  const cellsAlongX = clamp(wanted.width / step.x);
  const cellsAlongY = clamp(wanted.height / step.y);
  const vertical = mat.bitlineAxis === 'vertical';
  const cellsPerWordline = vertical ? cellsAlongX : cellsAlongY;
  const cellsPerBitline = vertical ? cellsAlongY : cellsAlongX;
  const next = matGeometry({ ...mat, cellsPerBitline, cellsPerWordline }, cell, featureSize);
  return {
    x: handle.includes('w') ? right(rect) - next.width : mat.x,
    y: handle.includes('n') ? bottom(rect) - next.height : mat.y,
    cellsPerBitline,
    cellsPerWordline,
  };
}
