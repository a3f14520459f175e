import type { BitlineAxis, StripType } from '../model/block';
import { abutmentOnSide, sideLength, type Side } from './abutment';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from './rect';

/**
 * Strips that fit themselves to a mat edge: a sense-amplifier strip on an edge where bit lines end,
 * a sub-word-line driver strip on an edge where word lines end. Positions in metres.
 */

/** A mat as the fitting sees it: its rectangle and which way its bit lines run. */
export interface MatOutline {
  readonly id: string;
  readonly rect: Rect;
  readonly bitlineAxis: BitlineAxis;
}

const ACROSS: readonly [Side, Side] = ['top', 'bottom'];
const ALONG: readonly [Side, Side] = ['left', 'right'];

/** The sides where a mat's bit lines end (top and bottom for vertical bit lines). */
export function bitlineEndSides(axis: BitlineAxis): readonly [Side, Side] {
  return axis === 'vertical' ? ACROSS : ALONG;
}

/** The sides where a mat's word lines end. */
export function wordlineEndSides(axis: BitlineAxis): readonly [Side, Side] {
  return axis === 'vertical' ? ALONG : ACROSS;
}

/** The mat sides a strip type fits against, or none for strips that do not fit themselves. */
export function fittingSides(type: StripType, axis: BitlineAxis): readonly Side[] {
  if (type === 'senseAmpStrip') return bitlineEndSides(axis);
  if (type === 'wordlineDriverStrip') return wordlineEndSides(axis);
  return [];
}

/** The strip rectangle of thickness `thickness` (m) lying outside `rect` along its whole `side`. */
export function stripAlongSide(rect: Rect, side: Side, thickness: number): Rect {
  switch (side) {
    case 'top':
      return { x: rect.x, y: rect.y - thickness, width: rect.width, height: thickness };
    case 'bottom':
      return { x: rect.x, y: bottom(rect), width: rect.width, height: thickness };
    case 'left':
      return { x: rect.x - thickness, y: rect.y, width: thickness, height: rect.height };
    case 'right':
      return { x: right(rect), y: rect.y, width: thickness, height: rect.height };
  }
}

/** A fitted strip: where it goes and the mat edge it serves. */
export interface StripFit {
  readonly rect: Rect;
  readonly matId: string;
  readonly side: Side;
}

/**
 * The fitted strip for a point near a mat edge: the nearest suitable side whose line passes within
 * `reach` (m) of the point, on either side of it, with the point beside the edge (not past its ends).
 */
export function fitStripAtPoint(
  type: StripType,
  point: { x: number; y: number },
  mats: Iterable<MatOutline>,
  thickness: number,
  reach: number,
): StripFit | null {
  let best: (StripFit & { distance: number }) | null = null;
  for (const mat of mats) {
    const r = mat.rect;
    for (const side of fittingSides(type, mat.bitlineAxis)) {
      const horizontalEdge = side === 'top' || side === 'bottom';
      const along = horizontalEdge ? point.x : point.y;
      const start = horizontalEdge ? r.x : r.y;
      if (along < start || along > start + sideLength(r, side)) continue;
      const line = side === 'top' ? r.y : side === 'bottom' ? bottom(r) : side === 'left' ? r.x : right(r);
      const distance = Math.abs((horizontalEdge ? point.y : point.x) - line);
      if (distance > reach || (best && distance >= best.distance)) continue;
      best = { rect: stripAlongSide(r, side, thickness), matId: mat.id, side, distance };
    }
  }
  return best && { rect: best.rect, matId: best.matId, side: best.side };
}

/**
 * A strip dropped against a mat takes the length of the edge it lands on: when `strip` abuts a suitable
 * side of a mat with its middle beside that side, the fitted rectangle keeps the strip's thickness (its
 * smaller extent) and spans the whole side. Returns null when the strip abuts no suitable side.
 */
export function fitDroppedStrip(type: StripType, strip: Rect, mats: Iterable<MatOutline>): StripFit | null {
  const thickness = Math.min(strip.width, strip.height);
  for (const mat of mats) {
    for (const side of fittingSides(type, mat.bitlineAxis)) {
      const touching = abutmentOnSide(mat.rect, strip, side);
      if (!touching) continue;
      const horizontalEdge = side === 'top' || side === 'bottom';
      const middle = horizontalEdge ? strip.x + strip.width / 2 : strip.y + strip.height / 2;
      const start = horizontalEdge ? mat.rect.x : mat.rect.y;
      if (middle < start - ABUTMENT_TOLERANCE || middle > start + sideLength(mat.rect, side)) continue;
      return { rect: stripAlongSide(mat.rect, side, thickness), matId: mat.id, side };
    }
  }
  return null;
}
