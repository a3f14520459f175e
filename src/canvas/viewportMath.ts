import type { Rect } from '../geometry/rect';
import type { Viewport } from '../store/appStore';

/** Metres to the micrometres the canvas draws in. */
export const MICROMETRES_PER_METRE = 1e6;

/** Zoom limits in pixels per micrometre: from a whole die on screen to single cells. */
export const MIN_SCALE = 1e-4;
export const MAX_SCALE = 2e4;

/** Screen position (px) of a world point given in metres. */
export function worldToScreen(viewport: Viewport, x: number, y: number): { x: number; y: number } {
  return {
    x: x * MICROMETRES_PER_METRE * viewport.scale + viewport.offsetX,
    y: y * MICROMETRES_PER_METRE * viewport.scale + viewport.offsetY,
  };
}

/** World position (m) under a screen point (px). */
export function screenToWorld(viewport: Viewport, sx: number, sy: number): { x: number; y: number } {
  return {
    x: (sx - viewport.offsetX) / viewport.scale / MICROMETRES_PER_METRE,
    y: (sy - viewport.offsetY) / viewport.scale / MICROMETRES_PER_METRE,
  };
}

/** Zooms by `factor` keeping the world point under the screen point (sx, sy) fixed. */
export function zoomAround(viewport: Viewport, factor: number, sx: number, sy: number): Viewport {
  const scale = Math.min(MAX_SCALE, Math.max(MIN_SCALE, viewport.scale * factor));
  const applied = scale / viewport.scale;
  return {
    scale,
    offsetX: sx - (sx - viewport.offsetX) * applied,
    offsetY: sy - (sy - viewport.offsetY) * applied,
  };
}

/** The viewport that shows `box` (m) centred in a screen of the given size with a margin (px). */
export function fitViewport(box: Rect | null, width: number, height: number, margin = 24): Viewport {
  if (!box || box.width <= 0 || box.height <= 0 || width <= 2 * margin || height <= 2 * margin) {
    return { scale: 1, offsetX: margin, offsetY: margin };
  }
  const wUm = box.width * MICROMETRES_PER_METRE;
  const hUm = box.height * MICROMETRES_PER_METRE;
  const scale = Math.min(
    MAX_SCALE,
    Math.max(MIN_SCALE, Math.min((width - 2 * margin) / wUm, (height - 2 * margin) / hUm)),
  );
  return {
    scale,
    offsetX: (width - wUm * scale) / 2 - box.x * MICROMETRES_PER_METRE * scale,
    offsetY: (height - hUm * scale) / 2 - box.y * MICROMETRES_PER_METRE * scale,
  };
}
