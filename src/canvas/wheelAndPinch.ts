import type { Viewport } from '../store/appStore';
import { zoomAround } from './viewportMath';

/** What a wheel event asks of the camera: zoom around the pointer, or pan by screen pixels. */
export type WheelIntent =
  | { readonly kind: 'zoom'; readonly factor: number }
  | { readonly kind: 'pan'; readonly dx: number; readonly dy: number };

/** The parts of a wheel event this reads. */
export interface WheelInput {
  readonly deltaX: number;
  readonly deltaY: number;
  /** 0 pixels, 1 lines, 2 pages (WheelEvent.deltaMode). */
  readonly deltaMode: number;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
}

/** Pixels per line and per page for wheels that count in lines or pages. */
const LINE_PX = 33;
const PAGE_PX = 800;
/** Zoom per pixel of a mouse wheel: a 100-px notch zooms by about 16 %. */
const WHEEL_ZOOM_PER_PX = 0.0015;
/** Zoom per pixel of a pinch (Ctrl+wheel), whose steps are small; one step is capped at 50 px. */
const PINCH_ZOOM_PER_PX = 0.01;
const PINCH_STEP_CAP_PX = 50;
/** A pixel-mode step at least this large, whole and purely vertical, comes from a notched mouse wheel. */
const NOTCH_PX = 40;

/**
 * How a wheel event moves the camera, the way web editors do it: a trackpad's two-finger scroll pans;
 * a pinch on the trackpad (which browsers send as a wheel event with Ctrl held) or Ctrl+wheel zooms; a
 * notched mouse wheel zooms around the pointer; Shift turns a wheel's vertical turn into a sideways pan.
 * Browsers do not say which device sent a wheel event, so a mouse wheel is told by its steps: counted in
 * lines or pages, or whole pixel steps of 40 px or more with no sideways part (common practice, no
 * source).
 */
export function wheelIntent(e: WheelInput): WheelIntent {
  const unit = e.deltaMode === 1 ? LINE_PX : e.deltaMode === 2 ? PAGE_PX : 1;
  const dx = e.deltaX * unit;
  const dy = e.deltaY * unit;
  if (e.ctrlKey || e.metaKey) {
    const step = Math.max(-PINCH_STEP_CAP_PX, Math.min(PINCH_STEP_CAP_PX, dy));
    return { kind: 'zoom', factor: Math.exp(-step * PINCH_ZOOM_PER_PX) };
  }
  if (e.shiftKey) return { kind: 'pan', dx: -(dx || dy), dy: 0 };
  const notched = e.deltaMode !== 0 || (dx === 0 && Number.isInteger(dy) && Math.abs(dy) >= NOTCH_PX);
  if (notched) return { kind: 'zoom', factor: Math.exp(-dy * WHEEL_ZOOM_PER_PX) };
  return { kind: 'pan', dx: -dx, dy: -dy };
}

/** Applies a wheel intent to the camera, zooming around the pointer at (px, py). */
export function applyWheel(viewport: Viewport, intent: WheelIntent, px: number, py: number): Viewport {
  if (intent.kind === 'zoom') return zoomAround(viewport, intent.factor, px, py);
  return { ...viewport, offsetX: viewport.offsetX + intent.dx, offsetY: viewport.offsetY + intent.dy };
}

export interface ScreenPoint {
  readonly x: number;
  readonly y: number;
}

/**
 * The camera after a two-finger pinch: the fingers started at a0, b0 with the camera at `start` and are
 * now at a1, b1. The zoom follows the change of the distance between them, and the world point that
 * was under their midpoint stays under their midpoint, so the drawing moves with the fingers.
 */
export function pinchViewport(
  start: Viewport,
  a0: ScreenPoint,
  b0: ScreenPoint,
  a1: ScreenPoint,
  b1: ScreenPoint,
): Viewport {
  const d0 = Math.hypot(b0.x - a0.x, b0.y - a0.y);
  const d1 = Math.hypot(b1.x - a1.x, b1.y - a1.y);
  const factor = d0 > 0 && d1 > 0 ? d1 / d0 : 1;
  const m0 = { x: (a0.x + b0.x) / 2, y: (a0.y + b0.y) / 2 };
  const m1 = { x: (a1.x + b1.x) / 2, y: (a1.y + b1.y) / 2 };
  const zoomed = zoomAround(start, factor, m0.x, m0.y);
  return { ...zoomed, offsetX: zoomed.offsetX + m1.x - m0.x, offsetY: zoomed.offsetY + m1.y - m0.y };
}
