import { blockAt } from '../../geometry/placedIndex';
import { handlePosition, RESIZE_HANDLES, type ResizeHandle } from '../../geometry/resize';
import type { Rect } from '../../geometry/rect';
import { BandGesture } from './bandGesture';
import { NO_RESULT, type EditorContext, type Gesture, type GesturePreview, type WorldPoint } from './gesture';
import { MoveGesture } from './moveGesture';
import { ResizeGesture } from './resizeGesture';

/** Handles are grabbed within this distance on screen (px). */
export const HANDLE_REACH_PX = 6;
/** Blocks are hit this far outside their edges on screen (px), so thin strips stay easy to click. */
export const HIT_MARGIN_PX = 2;

/** The handle of `rect` within `reach` (m) of the point, nearest first, or null. */
export function handleAt(rect: Rect, point: WorldPoint, reach: number): ResizeHandle | null {
  let best: ResizeHandle | null = null;
  let bestDistance = reach;
  for (const handle of RESIZE_HANDLES) {
    const at = handlePosition(rect, handle);
    const distance = Math.max(Math.abs(at.x - point.x), Math.abs(at.y - point.y));
    if (distance <= bestDistance) {
      best = handle;
      bestDistance = distance;
    }
  }
  return best;
}

/** A press that changes the selection and drags nothing. */
class IdleGesture implements Gesture {
  readonly hiddenIds: ReadonlySet<string> = new Set();
  move(): void {}
  finish() {
    return NO_RESULT;
  }
  preview(): GesturePreview {
    return { ghosts: [] };
  }
  changedBlocks(): null {
    return null;
  }
}

/** What a press with the select tool starts. */
export interface SelectPress {
  readonly gesture: Gesture;
  /** Selection to show at once, on the press. */
  readonly selectNow?: readonly string[];
  /** Selection for a click that never became a drag. */
  readonly selectOnClick?: readonly string[];
  /** The handle grabbed, when the press resizes. */
  readonly handle?: ResizeHandle;
}

/**
 * The select tool's press: a handle of the single selected block resizes it; a block moves the
 * selection (selecting the block first if it was not selected; Shift toggles it); empty canvas starts a
 * rubber band. Clicking one block of a larger selection narrows the selection to it.
 */
export function pressWithSelectTool(ctx: EditorContext, point: WorldPoint, shift: boolean): SelectPress {
  const only = ctx.selection.length === 1 ? ctx.selection[0] : undefined;
  if (only !== undefined && !shift) {
    const position = ctx.placed.positionOf.get(only);
    const placed = position === undefined ? undefined : ctx.placed.placed[position];
    if (placed) {
      const handle = handleAt(placed.rect, point, HANDLE_REACH_PX * ctx.metresPerPixel);
      if (handle) return { gesture: new ResizeGesture(ctx, placed, handle, point), handle };
    }
  }
  const hit = blockAt(ctx.placed, point.x, point.y, HIT_MARGIN_PX * ctx.metresPerPixel);
  if (hit === null) return { gesture: new BandGesture(ctx, point, shift) };
  const selected = ctx.selection.includes(hit);
  if (shift) {
    const next = selected ? ctx.selection.filter((id) => id !== hit) : [...ctx.selection, hit];
    const gesture = selected ? new IdleGesture() : new MoveGesture({ ...ctx, selection: next }, next, point);
    return { gesture, selectNow: next };
  }
  if (selected) return { gesture: new MoveGesture(ctx, ctx.selection, point), selectOnClick: [hit] };
  return { gesture: new MoveGesture({ ...ctx, selection: [hit] }, [hit], point), selectNow: [hit] };
}
