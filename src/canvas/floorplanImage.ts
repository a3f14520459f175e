import { fitText } from './fitText';
import type { Report } from '../engine';
import { placeBlocks } from '../geometry/placedBlocks';
import { boundingBox } from '../geometry/rect';
import type { Design } from '../model/design';
import { formatMatSize } from '../model/matSize';
import { formatQuantity } from '../model/units';
import type { Viewport } from '../store/appStore';
import { BLOCK_STYLE, CANVAS_BACKGROUND, ERROR_STROKE, LEGEND_ROWS } from './blockStyle';
import { imageLayout, NAMED_STRIPS_FROM_SCALE, scaleBar, SIDE_PANEL_WIDTH } from './imageLayout';
import { fitViewport, MICROMETRES_PER_METRE } from './viewportMath';

/** What a PNG export shows. */
export interface ImageOptions {
  /** The whole floorplan, or what the canvas shows now. */
  readonly region: 'all' | 'view';
  /** Device pixels per CSS pixel, 1 to 4. */
  readonly scale: number;
  readonly legend: boolean;
  readonly titleBlock: boolean;
}

/** Size of the image at 1× when exporting the whole floorplan (CSS px). */
export const WHOLE_FLOORPLAN_WIDTH = 1200;
const TITLE_BLOCK_HEIGHT = 92;

/** Output size in CSS px (before scale) for the chosen region. */
export function imageFrame(
  design: Design,
  options: ImageOptions,
  view: { viewport: Viewport; width: number; height: number },
) {
  const box = boundingBox(placeBlocks(design).map((p) => p.rect));
  if (options.region === 'view') return { width: view.width, height: view.height, viewport: view.viewport };
  const aspect = box && box.width > 0 ? box.height / box.width : 1;
  const width = WHOLE_FLOORPLAN_WIDTH;
  const height = Math.max(200, Math.min(1600, Math.round(width * aspect)));
  return { width, height, viewport: fitViewport(box, width, height, 24) };
}

/**
 * Draws the floorplan with the 2D canvas API (independent of the live Konva stage, so any region and
 * resolution can be drawn), optionally with a legend and a title block of key figures.
 */
export function renderFloorplanImage(
  design: Design,
  report: Report,
  options: ImageOptions,
  view: { viewport: Viewport; width: number; height: number },
): HTMLCanvasElement {
  const frame = imageFrame(design, options, view);
  const scale = Math.min(4, Math.max(1, Math.round(options.scale)));
  const titleHeight = options.titleBlock ? TITLE_BLOCK_HEIGHT : 0;
  const layout = imageLayout(frame.width);
  const canvas = document.createElement('canvas');
  canvas.width = layout.width * scale;
  canvas.height = (frame.height + titleHeight) * scale;
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('this browser cannot draw on a canvas');
  ctx.scale(scale, scale);
  ctx.fillStyle = CANVAS_BACKGROUND;
  ctx.fillRect(0, 0, layout.width, frame.height + titleHeight);

  const flagged = new Set(report.findings.filter((f) => f.severity === 'error').flatMap((f) => f.blockIds));
  const v = frame.viewport;
  const k = MICROMETRES_PER_METRE * v.scale;
  ctx.save();
  ctx.beginPath();
  ctx.rect(0, 0, frame.width, frame.height);
  ctx.clip();
  for (const p of placeBlocks(design)) {
    const style = BLOCK_STYLE[p.block.type];
    const x = p.rect.x * k + v.offsetX;
    const y = p.rect.y * k + v.offsetY;
    const w = p.rect.width * k;
    const h = p.rect.height * k;
    if (x > frame.width || y > frame.height || x + w < 0 || y + h < 0) continue;
    ctx.fillStyle = style.fill;
    ctx.fillRect(x, y, w, h);
    const bad = flagged.has(p.block.id);
    ctx.strokeStyle = bad ? ERROR_STROKE : style.stroke;
    ctx.lineWidth = bad ? 2.5 : 1;
    ctx.strokeRect(x, y, w, h);
    if (p.block.type === 'mat' && Math.min(w, h) > 60) {
      ctx.fillStyle = style.text;
      ctx.font = '12px sans-serif';
      ctx.fillText(fitText(ctx, p.block.name || p.block.id, w - 12), x + 6, y + 16);
      ctx.fillText(formatMatSize(p.block.cellsPerBitline, p.block.cellsPerWordline), x + 6, y + 31);
    } else if (p.block.type !== 'mat' && scale >= NAMED_STRIPS_FROM_SCALE) {
      drawStripName(ctx, p.block.name || p.block.id, x, y, w, h, style.text);
    }
  }
  ctx.restore();
  // The side panel: the legend at its top, the scale bar under it; both beside the floorplan, never on it.
  let panelY = 10;
  if (options.legend) panelY = drawLegend(ctx, layout.panelX, panelY) + 14;
  drawScaleBar(ctx, layout.panelX, panelY, k);
  if (options.titleBlock) drawTitleBlock(ctx, design, report, frame.height, layout.width);
  return canvas;
}

/** A strip's or decoder's name along its length, when it fits (9 px text; turned for standing strips). */
function drawStripName(
  ctx: CanvasRenderingContext2D,
  name: string,
  x: number,
  y: number,
  w: number,
  h: number,
  colour: string,
) {
  ctx.font = '9px sans-serif';
  const standing = h > w;
  const length = standing ? h : w;
  const thickness = standing ? w : h;
  if (thickness < 10 || ctx.measureText(name).width > length - 6) return;
  ctx.save();
  ctx.fillStyle = colour;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.translate(x + w / 2, y + h / 2);
  if (standing) ctx.rotate(-Math.PI / 2);
  ctx.fillText(name, 0, 0);
  ctx.restore();
}

/** A scale bar of a round length with its label, at (x0, y0) in the side panel. */
function drawScaleBar(ctx: CanvasRenderingContext2D, x0: number, y0: number, pixelsPerMetre: number) {
  const bar = scaleBar(pixelsPerMetre);
  const x = x0 + 18;
  const y = y0 + 18;
  ctx.strokeStyle = '#1f2328';
  ctx.lineWidth = 2;
  ctx.beginPath();
  ctx.moveTo(x, y - 5);
  ctx.lineTo(x, y);
  ctx.lineTo(x + bar.pixels, y);
  ctx.lineTo(x + bar.pixels, y - 5);
  ctx.stroke();
  ctx.fillStyle = '#1f2328';
  ctx.font = '12px sans-serif';
  ctx.textAlign = 'left';
  ctx.textBaseline = 'alphabetic';
  ctx.fillText(formatQuantity(bar.length, 'length'), x, y + 16);
}

/** Draws the legend in the side panel from its top (x0, y0); returns where it ends (px). */
function drawLegend(ctx: CanvasRenderingContext2D, x0: number, y0: number): number {
  const boxW = SIDE_PANEL_WIDTH - 20;
  const boxH = LEGEND_ROWS.length * 17 + 10;
  x0 += 10;
  ctx.fillStyle = 'rgba(255,255,255,0.92)';
  ctx.fillRect(x0, y0, boxW, boxH);
  ctx.strokeStyle = '#d4d0c6';
  ctx.strokeRect(x0, y0, boxW, boxH);
  ctx.font = '12px sans-serif';
  LEGEND_ROWS.forEach((row, i) => {
    const y = y0 + 8 + i * 17;
    ctx.fillStyle = row.fill;
    ctx.fillRect(x0 + 8, y, 14, 10);
    ctx.strokeStyle = row.stroke;
    ctx.lineWidth = row.marker ? 2 : 1;
    ctx.strokeRect(x0 + 8, y, 14, 10);
    ctx.lineWidth = 1;
    ctx.fillStyle = '#1f2328';
    // The image has room for the full words; the status bar shows the short ones.
    ctx.fillText(row.title, x0 + 30, y + 10);
  });
  return y0 + boxH;
}

function drawTitleBlock(
  ctx: CanvasRenderingContext2D,
  design: Design,
  report: Report,
  top: number,
  width: number,
) {
  const t = report.totals;
  ctx.fillStyle = '#23313f';
  ctx.fillRect(0, top, width, TITLE_BLOCK_HEIGHT);
  ctx.fillStyle = '#f4f1ea';
  ctx.font = 'bold 15px sans-serif';
  // A long name is cut to the picture's width rather than running off its edge.
  ctx.fillText(fitText(ctx, `${design.name} — ${design.process.name}`, width - 28), 14, top + 22);
  ctx.font = '12px sans-serif';
  const errors = report.findings.filter((f) => f.severity === 'error').length;
  const figures = [
    `usable bits ${formatQuantity(t.usableBits, 'count')}`,
    `area ${formatQuantity(t.totalArea, 'area')}`,
    `efficiency ${formatQuantity(t.arrayEfficiency, 'percent', 3)}`,
    `area/bit ${formatQuantity(t.areaPerBitInF2, 'ratio', 3)} F²`,
    `worst margin ${formatQuantity(t.worstSenseMargin, 'voltage', 3)}`,
    `refresh busy ${formatQuantity(t.refresh.busyFraction, 'percent', 3)}`,
    `${errors} error${errors === 1 ? '' : 's'}`,
  ];
  ctx.fillText(figures.join('   ·   '), 14, top + 46);
  ctx.fillStyle = '#c8d2dc';
  ctx.fillText(
    'Matloom first-order estimates: confirm with extracted parasitics, foundry rules and measured silicon.',
    14,
    top + 72,
  );
}

/** The canvas as PNG bytes. */
export function canvasToPngBlob(canvas: HTMLCanvasElement): Promise<Blob> {
  return new Promise((resolve, reject) => {
    canvas.toBlob(
      (blob) => (blob ? resolve(blob) : reject(new Error('the browser produced no PNG'))),
      'image/png',
    );
  });
}
