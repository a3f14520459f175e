import type { BlockType } from '../model/block';
import { ABUTMENT_TOLERANCE, boundingBox, bottom, right, type Rect } from './rect';

/** A block as the pitch sees it: its type and rectangle (m). */
export interface PitchBlock {
  readonly type: BlockType;
  readonly rect: Rect;
}

/** Strips that neighbouring copies can share. */
const SHAREABLE: ReadonlySet<BlockType> = new Set(['senseAmpStrip', 'wordlineDriverStrip']);

/** Pitches for step and repeat (m): copies that abut, and copies that share their edge strips. */
export interface RepeatPitches {
  readonly abutting: { readonly x: number; readonly y: number };
  readonly sharing: { readonly x: number; readonly y: number };
  /** Whether sharing differs from abutting in x (a strip on both left and right) and in y. */
  readonly sharesX: boolean;
  readonly sharesY: boolean;
}

/**
 * The thickness of a strip the selection has along both opposite sides of its box, one of the same type
 * and thickness on each (a sense-amplifier strip above and below a mat, a driver strip left and right),
 * or 0 when it has no such pair.
 */
function sharedThickness(blocks: readonly PitchBlock[], box: Rect, across: 'x' | 'y'): number {
  const tol = ABUTMENT_TOLERANCE;
  for (const a of blocks) {
    if (!SHAREABLE.has(a.type)) continue;
    const thickness = across === 'y' ? a.rect.height : a.rect.width;
    const atStart = across === 'y' ? Math.abs(a.rect.y - box.y) <= tol : Math.abs(a.rect.x - box.x) <= tol;
    if (!atStart) continue;
    for (const b of blocks) {
      if (b.type !== a.type) continue;
      const atEnd =
        across === 'y'
          ? Math.abs(bottom(b.rect) - bottom(box)) <= tol && Math.abs(b.rect.height - thickness) <= tol
          : Math.abs(right(b.rect) - right(box)) <= tol && Math.abs(b.rect.width - thickness) <= tol;
      const sameSpan =
        across === 'y'
          ? Math.abs(b.rect.x - a.rect.x) <= tol && Math.abs(b.rect.width - a.rect.width) <= tol
          : Math.abs(b.rect.y - a.rect.y) <= tol && Math.abs(b.rect.height - a.rect.height) <= tol;
      if (atEnd && sameSpan) return thickness;
    }
  }
  return 0;
}

/**
 * Step-and-repeat pitches for a selection: abutting (the box's size) and sharing, where each copy's edge
 * strip lands on its neighbour's (the box less one strip), so one sense-amplifier strip lies between two
 * mat rows and one driver strip between two mat columns, as the partition builder lays a bank out.
 */
export function repeatPitches(blocks: readonly PitchBlock[]): RepeatPitches | null {
  const box = boundingBox(blocks.map((b) => b.rect));
  if (!box) return null;
  const tx = sharedThickness(blocks, box, 'x');
  const ty = sharedThickness(blocks, box, 'y');
  return {
    abutting: { x: box.width, y: box.height },
    sharing: { x: box.width - tx, y: box.height - ty },
    sharesX: tx > 0,
    sharesY: ty > 0,
  };
}

/** A key equal for two blocks of one type on the same rectangle (to the nanometre). */
export function placeKey(type: BlockType, rect: Rect): string {
  const nm = (v: number) => Math.round(v / ABUTMENT_TOLERANCE);
  return `${type}|${nm(rect.x)}|${nm(rect.y)}|${nm(rect.width)}|${nm(rect.height)}`;
}
