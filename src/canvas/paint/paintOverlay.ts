import { handlePosition, RESIZE_HANDLES } from '../../geometry/resize';
import type { Rect } from '../../geometry/rect';
import { BLOCK_STYLE, GUIDE_STROKE, SELECTION_STROKE } from '../blockStyle';
import type { GesturePreview } from '../gestures/gesture';
import { pxPerMetre, toScreen, type Scene } from './scene';

/** Selected blocks smaller than this on screen get an outline this size (px). */
const SELECTION_MIN_PX = 6;
/** Side of a resize handle (px). */
export const HANDLE_SIZE_PX = 7;

export interface OverlayState {
  readonly selection: readonly string[];
  /** Show resize handles (one block selected and no gesture running). */
  readonly handles: boolean;
  readonly preview: GesturePreview | null;
  /** Pointer on screen (px), where labels go. */
  readonly pointer: { x: number; y: number } | null;
}

/** The overlay layer: selection, handles, and the preview of the gesture in progress. */
export function paintOverlay(ctx: CanvasRenderingContext2D, scene: Scene, state: OverlayState): void {
  const { placed, viewport } = scene;
  const selected: Rect[] = [];
  for (const id of state.selection) {
    if (scene.hidden.has(id)) continue;
    const i = placed.positionOf.get(id);
    const p = i === undefined ? undefined : placed.placed[i];
    // Drawn just outside the block, so that a finding's outline stays visible inside it.
    if (p) selected.push(outset(grown(toScreen(viewport, p.rect), SELECTION_MIN_PX), 2));
  }
  ctx.beginPath();
  let inView = 0;
  for (const r of selected) {
    if (r.x > scene.width || r.y > scene.height || r.x + r.width < 0 || r.y + r.height < 0) continue;
    ctx.rect(r.x, r.y, r.width, r.height);
    inView++;
  }
  if (inView > 0) {
    ctx.fillStyle = 'rgba(29, 95, 209, 0.1)';
    ctx.fill();
    ctx.strokeStyle = SELECTION_STROKE;
    ctx.lineWidth = 2;
    ctx.stroke();
  }
  const only = selected[0];
  if (state.handles && selected.length === 1 && only) {
    ctx.fillStyle = '#ffffff';
    ctx.strokeStyle = SELECTION_STROKE;
    ctx.lineWidth = 1.5;
    for (const handle of RESIZE_HANDLES) {
      const at = handlePosition(only, handle);
      const h = HANDLE_SIZE_PX;
      ctx.fillRect(at.x - h / 2, at.y - h / 2, h, h);
      ctx.strokeRect(at.x - h / 2, at.y - h / 2, h, h);
    }
  }
  if (state.preview) paintPreview(ctx, scene, state.preview, state.pointer);
}

function outset(r: Rect, by: number): Rect {
  return { x: r.x - by, y: r.y - by, width: r.width + 2 * by, height: r.height + 2 * by };
}

function grown(r: Rect, min: number): Rect {
  const w = Math.max(r.width, min);
  const h = Math.max(r.height, min);
  return { x: r.x - (w - r.width) / 2, y: r.y - (h - r.height) / 2, width: w, height: h };
}

function paintPreview(
  ctx: CanvasRenderingContext2D,
  scene: Scene,
  preview: GesturePreview,
  pointer: { x: number; y: number } | null,
): void {
  const { viewport } = scene;
  const k = pxPerMetre(viewport);
  ctx.save();
  ctx.globalAlpha = 0.85;
  for (const ghost of preview.ghosts) {
    const r = grown(toScreen(viewport, ghost.rect), 2);
    ctx.fillStyle = BLOCK_STYLE[ghost.type].fill;
    ctx.fillRect(r.x, r.y, r.width, r.height);
  }
  ctx.globalAlpha = 1;
  ctx.setLineDash([6, 3]);
  ctx.strokeStyle = SELECTION_STROKE;
  ctx.lineWidth = 1.5;
  ctx.beginPath();
  for (const ghost of preview.ghosts) {
    const r = grown(toScreen(viewport, ghost.rect), 2);
    ctx.rect(r.x, r.y, r.width, r.height);
  }
  ctx.stroke();
  if (preview.band) {
    const r = toScreen(viewport, preview.band);
    ctx.fillStyle = 'rgba(29, 95, 209, 0.08)';
    ctx.fillRect(r.x, r.y, r.width, r.height);
    ctx.strokeRect(r.x + 0.5, r.y + 0.5, r.width, r.height);
  }
  ctx.strokeStyle = GUIDE_STROKE;
  ctx.lineWidth = 1;
  ctx.setLineDash([3, 3]);
  ctx.beginPath();
  if (preview.guideX !== undefined && preview.guideX !== null) {
    const sx = Math.round(preview.guideX * k + viewport.offsetX) + 0.5;
    ctx.moveTo(sx, 0);
    ctx.lineTo(sx, scene.height);
  }
  if (preview.guideY !== undefined && preview.guideY !== null) {
    const sy = Math.round(preview.guideY * k + viewport.offsetY) + 0.5;
    ctx.moveTo(0, sy);
    ctx.lineTo(scene.width, sy);
  }
  ctx.stroke();
  ctx.restore();
  if (preview.label && pointer) paintLabel(ctx, scene, preview.label, pointer);
}

/** A readable tag beside the pointer, kept inside the canvas. */
function paintLabel(
  ctx: CanvasRenderingContext2D,
  scene: Scene,
  text: string,
  pointer: { x: number; y: number },
): void {
  ctx.font = '12px system-ui, sans-serif';
  const w = ctx.measureText(text).width + 12;
  const h = 20;
  const x = Math.min(Math.max(pointer.x + 14, 24), scene.width - w - 4);
  const y = Math.min(Math.max(pointer.y + 16, 24), scene.height - h - 4);
  ctx.fillStyle = 'rgba(35, 49, 63, 0.92)';
  ctx.fillRect(x, y, w, h);
  ctx.fillStyle = '#f4f1ea';
  ctx.textAlign = 'left';
  ctx.textBaseline = 'middle';
  ctx.fillText(text, x + 6, y + h / 2 + 0.5);
}
