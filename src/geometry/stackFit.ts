import type { BlockType, StripType } from '../model/block';
import { abutmentOnSide, sideLength, type Side } from './abutment';
import { boxesOf } from './blockTable';
import { neighbourTable } from './neighbourGrid';
import type { PlacedDesign } from './placedIndex';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from './rect';
import { stripAlongSide } from './stripFit';

/**
 * Decoders fit to stacks: a stack is a group of mats and the sense-amplifier and driver strips serving
 * them that touch one another, as a bank is. A row decoder fits along a stack's left or right side, a
 * column decoder along its top or bottom, taking the whole length of that side, the way the partition
 * builder places them. Positions in metres.
 */

/** A stack's outline and how many mats it holds. */
export interface StackOutline {
  readonly rect: Rect;
  readonly matCount: number;
}

/** A fitted decoder: where it goes and which side of which stack it lies along. */
export interface StackFit {
  readonly rect: Rect;
  readonly side: Side;
  readonly stack: StackOutline;
}

/** Blocks that make up a stack; decoders and spacers sit beside stacks and do not join them. */
const IN_STACK: ReadonlySet<BlockType> = new Set(['mat', 'senseAmpStrip', 'wordlineDriverStrip']);

/** The sides of a stack a decoder type fits along, or none for other types. */
export function decoderSides(type: StripType): readonly Side[] {
  if (type === 'rowDecoder') return ['left', 'right'];
  if (type === 'columnDecoder') return ['top', 'bottom'];
  return [];
}

const cache = new WeakMap<PlacedDesign, readonly StackOutline[]>();

/**
 * The stacks of a placed design: mats and strips grouped by touching (abutting, overlapping or meeting
 * at a corner), one outline per group. Kept per placed design, which lives as long as its document.
 */
export function stackOutlines(placed: PlacedDesign): readonly StackOutline[] {
  const cached = cache.get(placed);
  if (cached) return cached;
  const members: number[] = [];
  placed.placed.forEach((p, i) => {
    if (IN_STACK.has(p.block.type)) members.push(i);
  });
  const boxes = boxesOf(members.map((i) => (placed.placed[i] as { rect: Rect }).rect));
  const pairs = neighbourTable(boxes, ABUTMENT_TOLERANCE);
  const parent = Int32Array.from(members, (_, k) => k);
  const root = (k: number): number => {
    let r = k;
    while (parent[r] !== r) r = parent[r] as number;
    while (parent[k] !== r) {
      const next = parent[k] as number;
      parent[k] = r;
      k = next;
    }
    return r;
  };
  for (let a = 0; a < members.length; a++) {
    for (let q = pairs.start[a] as number; q < (pairs.end[a] as number); q++) {
      const ra = root(a);
      const rb = root(pairs.list[q] as number);
      if (ra !== rb) parent[Math.max(ra, rb)] = Math.min(ra, rb);
    }
  }
  const groups = new Map<number, { x0: number; y0: number; x1: number; y1: number; mats: number }>();
  members.forEach((i, k) => {
    const p = placed.placed[i];
    if (!p) return;
    const r = root(k);
    const g = groups.get(r) ?? { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity, mats: 0 };
    g.x0 = Math.min(g.x0, p.rect.x);
    g.y0 = Math.min(g.y0, p.rect.y);
    g.x1 = Math.max(g.x1, right(p.rect));
    g.y1 = Math.max(g.y1, bottom(p.rect));
    if (p.block.type === 'mat') g.mats++;
    groups.set(r, g);
  });
  const outlines: StackOutline[] = [];
  for (const g of groups.values()) {
    // A group of strips alone is not a stack: a decoder serves mats.
    if (g.mats === 0) continue;
    outlines.push({ rect: { x: g.x0, y: g.y0, width: g.x1 - g.x0, height: g.y1 - g.y0 }, matCount: g.mats });
  }
  cache.set(placed, outlines);
  return outlines;
}

/** The coordinate of a side's line (m). */
function sideLine(r: Rect, side: Side): number {
  return side === 'top' ? r.y : side === 'bottom' ? bottom(r) : side === 'left' ? r.x : right(r);
}

/**
 * The fitted decoder for a click at `point`: the nearest suitable stack side whose line passes within
 * `reach` (m) of the point, with the point beside that side (not past its ends). The decoder keeps its
 * `thickness` across and spans the whole side, lying outside the stack against it.
 */
export function fitDecoderAtPoint(
  type: StripType,
  point: { x: number; y: number },
  stacks: readonly StackOutline[],
  thickness: number,
  reach: number,
): StackFit | null {
  let best: (StackFit & { distance: number }) | null = null;
  for (const stack of stacks) {
    const r = stack.rect;
    for (const side of decoderSides(type)) {
      const horizontalEdge = side === 'top' || side === 'bottom';
      const along = horizontalEdge ? point.x : point.y;
      const start = horizontalEdge ? r.x : r.y;
      if (along < start || along > start + sideLength(r, side)) continue;
      const distance = Math.abs((horizontalEdge ? point.y : point.x) - sideLine(r, side));
      if (distance > reach || (best && distance >= best.distance)) continue;
      best = { rect: stripAlongSide(r, side, thickness), side, stack, distance };
    }
  }
  return best && { rect: best.rect, side: best.side, stack: best.stack };
}

/**
 * A decoder dropped against a stack takes that side's length: when `decoder` abuts a suitable side of a
 * stack with its middle beside the side, it keeps its thickness (its extent across the side) and spans
 * the side. Returns null when it abuts none.
 */
export function fitDroppedDecoder(
  type: StripType,
  decoder: Rect,
  stacks: readonly StackOutline[],
): StackFit | null {
  for (const stack of stacks) {
    for (const side of decoderSides(type)) {
      if (!abutmentOnSide(stack.rect, decoder, side)) continue;
      const horizontalEdge = side === 'top' || side === 'bottom';
      const middle = horizontalEdge ? decoder.x + decoder.width / 2 : decoder.y + decoder.height / 2;
      const start = horizontalEdge ? stack.rect.x : stack.rect.y;
      if (middle < start - ABUTMENT_TOLERANCE || middle > start + sideLength(stack.rect, side)) continue;
      const thickness = horizontalEdge ? decoder.height : decoder.width;
      return { rect: stripAlongSide(stack.rect, side, thickness), side, stack };
    }
  }
  return null;
}
