import { blockAt } from '../geometry/placedIndex';
import type { ResizeHandle } from '../geometry/resize';
import type { Tool } from '../commands/tools';
import type { EditorContext } from './gestures/gesture';
import { handleAt, HANDLE_REACH_PX, HIT_MARGIN_PX } from './gestures/selectPress';

const HANDLE_CURSOR: Record<ResizeHandle, string> = {
  n: 'ns-resize',
  s: 'ns-resize',
  e: 'ew-resize',
  w: 'ew-resize',
  ne: 'nesw-resize',
  sw: 'nesw-resize',
  nw: 'nwse-resize',
  se: 'nwse-resize',
};

export interface CursorInput {
  readonly tool: Tool;
  readonly spaceHeld: boolean;
  readonly panning: boolean;
  readonly at: { x: number; y: number } | null;
  readonly ctx: EditorContext | null;
}

/** The pointer shape over the canvas: what a press would do here. */
export function cursorFor(input: CursorInput): string {
  if (input.panning) return 'grabbing';
  if (input.spaceHeld || input.tool === 'pan') return 'grab';
  if (input.tool !== 'select') return 'crosshair';
  const { ctx, at } = input;
  if (!ctx || !at) return 'default';
  const only = ctx.selection.length === 1 ? ctx.selection[0] : undefined;
  const position = only === undefined ? undefined : ctx.placed.positionOf.get(only);
  const placed = position === undefined ? undefined : ctx.placed.placed[position];
  if (placed) {
    const handle = handleAt(placed.rect, at, HANDLE_REACH_PX * ctx.metresPerPixel);
    if (handle) return HANDLE_CURSOR[handle];
  }
  return blockAt(ctx.placed, at.x, at.y, HIT_MARGIN_PX * ctx.metresPerPixel) ? 'move' : 'default';
}

/** Sets the element's cursor only when it changes. */
export class CanvasCursor {
  private current = '';

  set(element: HTMLElement | null, cursor: string): void {
    if (!element || cursor === this.current) return;
    this.current = cursor;
    element.style.cursor = cursor;
  }

  update(element: HTMLElement | null, input: CursorInput): void {
    this.set(element, cursorFor(input));
  }
}
