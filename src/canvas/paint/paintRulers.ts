import { micrometreLabel, niceStep, ticksBetween } from '../rulerMath';
import { pxPerMetre, RULER_SIZE, visibleWorld, type Scene } from './scene';

/** Labelled ticks on the rulers are at least this far apart (px). */
const LABEL_SPACING_PX = 80;

/**
 * Rulers along the top and left edges, in micrometres, with a mark at the pointer position
 * (screen px, or null when the pointer is off the canvas).
 */
export function paintRulers(
  ctx: CanvasRenderingContext2D,
  scene: Scene,
  pointer: { x: number; y: number } | null,
): void {
  const k = pxPerMetre(scene.viewport);
  const view = visibleWorld(scene.viewport, scene.width, scene.height);
  const labelStep = niceStep(LABEL_SPACING_PX / k);
  const tickStep = labelStep / (labelStep / niceStep(10 / k) >= 5 ? 5 : 2);
  const { offsetX, offsetY } = scene.viewport;

  ctx.fillStyle = 'rgba(236, 234, 228, 0.96)';
  ctx.fillRect(0, 0, scene.width, RULER_SIZE);
  ctx.fillRect(0, 0, RULER_SIZE, scene.height);
  ctx.strokeStyle = '#b9b3a6';
  ctx.lineWidth = 1;
  ctx.beginPath();
  ctx.moveTo(0, RULER_SIZE - 0.5);
  ctx.lineTo(scene.width, RULER_SIZE - 0.5);
  ctx.moveTo(RULER_SIZE - 0.5, 0);
  ctx.lineTo(RULER_SIZE - 0.5, scene.height);
  ctx.stroke();

  ctx.beginPath();
  for (const x of ticksBetween(view.x, view.x + view.width, tickStep)) {
    const sx = Math.round(x * k + offsetX) + 0.5;
    if (sx < RULER_SIZE) continue;
    const labelled = Math.abs(x / labelStep - Math.round(x / labelStep)) < 1e-6;
    ctx.moveTo(sx, labelled ? 4 : 13);
    ctx.lineTo(sx, RULER_SIZE);
  }
  for (const y of ticksBetween(view.y, view.y + view.height, tickStep)) {
    const sy = Math.round(y * k + offsetY) + 0.5;
    if (sy < RULER_SIZE) continue;
    const labelled = Math.abs(y / labelStep - Math.round(y / labelStep)) < 1e-6;
    ctx.moveTo(labelled ? 4 : 13, sy);
    ctx.lineTo(RULER_SIZE, sy);
  }
  ctx.strokeStyle = '#7d766a';
  ctx.stroke();

  ctx.fillStyle = '#3f3a32';
  ctx.font = '10px system-ui, sans-serif';
  ctx.textBaseline = 'top';
  ctx.textAlign = 'left';
  for (const x of ticksBetween(view.x, view.x + view.width, labelStep)) {
    const sx = x * k + offsetX;
    if (sx < RULER_SIZE + 2) continue;
    ctx.fillText(micrometreLabel(x, labelStep), sx + 3, 2);
  }
  for (const y of ticksBetween(view.y, view.y + view.height, labelStep)) {
    const sy = y * k + offsetY;
    if (sy < RULER_SIZE + 2) continue;
    ctx.save();
    ctx.translate(2, sy - 3);
    ctx.rotate(-Math.PI / 2);
    ctx.fillText(micrometreLabel(y, labelStep), 0, 0);
    ctx.restore();
  }

  if (pointer) {
    ctx.strokeStyle = '#c2185b';
    ctx.beginPath();
    ctx.moveTo(Math.round(pointer.x) + 0.5, 0);
    ctx.lineTo(Math.round(pointer.x) + 0.5, RULER_SIZE);
    ctx.moveTo(0, Math.round(pointer.y) + 0.5);
    ctx.lineTo(RULER_SIZE, Math.round(pointer.y) + 0.5);
    ctx.stroke();
  }
  ctx.fillStyle = '#d8d3c8';
  ctx.fillRect(0, 0, RULER_SIZE, RULER_SIZE);
  ctx.fillStyle = '#3f3a32';
  ctx.font = '9px system-ui, sans-serif';
  ctx.textBaseline = 'middle';
  ctx.textAlign = 'center';
  ctx.fillText('µm', RULER_SIZE / 2, RULER_SIZE / 2);
}
