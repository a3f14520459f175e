import { blocksInside } from '../../geometry/placedIndex';
import type { Rect } from '../../geometry/rect';
import type { EditorContext, Gesture, GestureResult, GesturePreview, WorldPoint } from './gesture';

/** The box between two points (m). */
export function boxBetween(a: WorldPoint, b: WorldPoint): Rect {
  return {
    x: Math.min(a.x, b.x),
    y: Math.min(a.y, b.y),
    width: Math.abs(a.x - b.x),
    height: Math.abs(a.y - b.y),
  };
}

/**
 * Rubber-band selection from empty canvas: the blocks wholly inside the band are selected, added to the
 * selection with Shift. A click on empty canvas clears the selection (Shift keeps it).
 */
export class BandGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string> = new Set();
  private current: WorldPoint;

  constructor(
    private readonly ctx: EditorContext,
    private readonly start: WorldPoint,
    private readonly additive: boolean,
  ) {
    this.current = start;
  }

  move(point: WorldPoint): void {
    this.current = point;
  }

  changedBlocks(): null {
    return null;
  }

  preview(): GesturePreview {
    return { ghosts: [], band: boxBetween(this.start, this.current) };
  }

  finish(point: WorldPoint, dragged: boolean): GestureResult {
    if (!dragged) return { call: null, select: this.additive ? this.ctx.selection : [] };
    const inside = blocksInside(this.ctx.placed, boxBetween(this.start, point));
    if (!this.additive) return { call: null, select: inside };
    const merged = [...this.ctx.selection];
    for (const id of inside) if (!merged.includes(id)) merged.push(id);
    return { call: null, select: merged };
  }
}
