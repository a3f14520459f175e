import { ABUTMENT_TOLERANCE, type Rect } from './rect';

/**
 * Resizing mats in place without opening gaps or overlaps: each resized mat's old span along an axis is
 * stretched to its new length, and every coordinate of the floorplan moves with it (coordinates past the
 * span shift by the change, coordinates inside it scale). Because one monotone map moves every edge, two
 * edges that met before meet after: a strip along the mat's edge takes its new length, a strip beyond it
 * moves with the edge, and a decoder spanning the stack stretches with it. Lengths in metres.
 */

/** Which corner of a resized mat stays put. */
export type AnchorCorner = 'topLeft' | 'topRight' | 'bottomLeft' | 'bottomRight';

export const ANCHOR_CORNERS: readonly AnchorCorner[] = ['topLeft', 'topRight', 'bottomLeft', 'bottomRight'];

/** One stretched span along an axis: [start, end] becomes `length` long, fixed at its start or end. */
interface Stretch {
  readonly start: number;
  readonly end: number;
  readonly change: number;
  readonly fixedAtStart: boolean;
}

/** A monotone map of one axis built from the stretches of the resized mats. */
export class AxisStretch {
  private readonly stretches: Stretch[] = [];
  private readonly seen = new Map<string, number>();

  /**
   * Adds a span [start, end] that becomes `newLength` long, fixed at its start (or its end). A span already
   * added (mats in one column share their horizontal span) counts once; the same span with another new
   * length is refused, since one column cannot take two widths.
   */
  add(start: number, end: number, newLength: number, fixedAtStart: boolean): boolean {
    const change = newLength - (end - start);
    const key = `${Math.round(start / ABUTMENT_TOLERANCE)}|${Math.round(end / ABUTMENT_TOLERANCE)}|${fixedAtStart}`;
    const earlier = this.seen.get(key);
    if (earlier !== undefined) return Math.abs(earlier - change) <= ABUTMENT_TOLERANCE;
    this.seen.set(key, change);
    if (Math.abs(change) > 0) this.stretches.push({ start, end, change, fixedAtStart });
    return true;
  }

  get empty(): boolean {
    return this.stretches.length === 0;
  }

  /** Where coordinate `v` goes (m). */
  map(v: number): number {
    let shift = 0;
    for (const s of this.stretches) {
      const tol = ABUTMENT_TOLERANCE;
      // Fraction of the span lying before v: 0 before it, 1 past it, in between inside.
      const t = v <= s.start + tol ? 0 : v >= s.end - tol ? 1 : (v - s.start) / (s.end - s.start);
      shift += s.fixedAtStart ? s.change * t : -s.change * (1 - t);
    }
    return v + shift;
  }

  /** A rectangle's interval [start, start + size] mapped. */
  mapSpan(start: number, size: number): { start: number; size: number } {
    const a = this.map(start);
    return { start: a, size: this.map(start + size) - a };
  }
}

/** Whether the corner fixes the left edge (else the right) and the top edge (else the bottom). */
export function anchorSides(corner: AnchorCorner): { left: boolean; top: boolean } {
  return {
    left: corner === 'topLeft' || corner === 'bottomLeft',
    top: corner === 'topLeft' || corner === 'topRight',
  };
}

/** The rectangle of a mat resized to `width` × `height` with `corner` kept where it was. */
export function resizedAt(rect: Rect, width: number, height: number, corner: AnchorCorner): Rect {
  const { left, top } = anchorSides(corner);
  return {
    x: left ? rect.x : rect.x + rect.width - width,
    y: top ? rect.y : rect.y + rect.height - height,
    width,
    height,
  };
}
