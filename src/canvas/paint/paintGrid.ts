import { CANVAS_BACKGROUND } from '../blockStyle';
import { niceStep, ticksBetween } from '../rulerMath';
import { pxPerMetre, visibleWorld, type Scene } from './scene';

/** Grid lines are at least this far apart on screen (px). */
export const GRID_MIN_SPACING_PX = 16;

/**
 * The background and the grid: minor lines at a nice step at least 16 px apart, and every fifth line
 * darker. Lines sit on whole pixels so they stay crisp.
 */
export function paintGrid(ctx: CanvasRenderingContext2D, scene: Scene): void {
  ctx.fillStyle = CANVAS_BACKGROUND;
  ctx.fillRect(0, 0, scene.width, scene.height);
  if (!scene.gridVisible) return;
  const k = pxPerMetre(scene.viewport);
  const step = niceStep(GRID_MIN_SPACING_PX / k);
  const view = visibleWorld(scene.viewport, scene.width, scene.height);
  const { offsetX, offsetY } = scene.viewport;
  const major = step * 5;
  const isMajor = (v: number) => Math.abs(v / major - Math.round(v / major)) < 1e-6;
  for (const pass of [false, true]) {
    ctx.beginPath();
    for (const x of ticksBetween(view.x, view.x + view.width, step)) {
      if (isMajor(x) !== pass) continue;
      const sx = Math.round(x * k + offsetX) + 0.5;
      ctx.moveTo(sx, 0);
      ctx.lineTo(sx, scene.height);
    }
    for (const y of ticksBetween(view.y, view.y + view.height, step)) {
      if (isMajor(y) !== pass) continue;
      const sy = Math.round(y * k + offsetY) + 0.5;
      ctx.moveTo(0, sy);
      ctx.lineTo(scene.width, sy);
    }
    ctx.strokeStyle = pass ? '#dedad0' : '#ebe8e0';
    ctx.lineWidth = 1;
    ctx.stroke();
  }
}
