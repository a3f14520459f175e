import { crossingOccupancy } from '../../model/cell';
import type { PlacedMat } from '../../geometry/placedBlocks';
import { formatMatSize } from '../../model/matSize';
import { formatBits, formatQuantity } from '../../model/units';
import { BITLINE_STROKE, BLOCK_STYLE, STORAGE_NODE_FILL, WORDLINE_STROKE } from '../blockStyle';
import { pxPerMetre, visibleWorld, type Scene } from './scene';
import { paintSpareLines } from './spareLines';

/** Individual lines are drawn once neighbouring lines are this far apart on screen (px). */
export const LINES_MIN_PITCH_PX = 4;
/** Storage nodes are drawn once lines are this far apart (px). */
const NODES_MIN_PITCH_PX = 9;

/**
 * Level of detail inside one mat: at high zoom its bit lines, word lines and storage nodes (only the
 * visible part is drawn); at medium zoom a few strokes and an arrow along the bit lines; labels with
 * the mat's name, its size (cells/BL × cells/WL, see model/matSize.ts) and capacity when they fit; and a corner mark showing its handedness.
 */
export function paintMatDetail(ctx: CanvasRenderingContext2D, mat: PlacedMat, scene: Scene): void {
  const { viewport } = scene;
  const k = pxPerMetre(viewport);
  const x = mat.rect.x * k + viewport.offsetX;
  const y = mat.rect.y * k + viewport.offsetY;
  const w = mat.rect.width * k;
  const h = mat.rect.height * k;
  const g = mat.geometry;
  const vertical = mat.block.bitlineAxis === 'vertical';
  const style = BLOCK_STYLE.mat;
  ctx.save();
  ctx.beginPath();
  ctx.rect(x, y, w, h);
  ctx.clip();
  const minPitchPx = Math.min(g.bitlinePitch, g.wordlinePitch) * k;
  if (minPitchPx >= LINES_MIN_PITCH_PX) {
    paintCells(ctx, mat, scene, minPitchPx >= NODES_MIN_PITCH_PX);
    paintSpareLines(ctx, mat, scene);
  } else if (Math.min(w, h) >= 40) paintDirectionHint(ctx, x, y, w, h, vertical);

  if (Math.min(w, h) >= 16) {
    // Handedness: a small triangle in the corner where the first cell sits.
    const s = Math.min(10, Math.min(w, h) / 4);
    const mirrored = mat.block.mirrored ?? false;
    const cx = mirrored ? x + w : x;
    const dir = mirrored ? -1 : 1;
    ctx.beginPath();
    ctx.moveTo(cx, y);
    ctx.lineTo(cx + dir * s, y);
    ctx.lineTo(cx, y + s);
    ctx.closePath();
    ctx.fillStyle = style.stroke;
    ctx.fill();
  }

  if (w >= 96 && h >= 44) {
    const size = Math.max(10, Math.min(13, Math.floor(h / 6)));
    ctx.font = `${size}px system-ui, sans-serif`;
    const long = formatMatSize(mat.block.cellsPerBitline, mat.block.cellsPerWordline);
    const short = `${formatQuantity(mat.block.cellsPerBitline, 'count')} × ${formatQuantity(mat.block.cellsPerWordline, 'count')}`;
    const lines = [
      mat.block.name || mat.block.id,
      ctx.measureText(long).width < w - 32 ? long : short,
      `${formatBits(g.bits)} · BL ${vertical ? '↕' : '↔'}`,
    ];
    ctx.textAlign = 'left';
    ctx.textBaseline = 'top';
    const pad = 12;
    const boxW = Math.max(...lines.map((l) => ctx.measureText(l).width)) + 8;
    const boxH = lines.length * (size + 3) + 5;
    ctx.fillStyle = 'rgba(247, 251, 249, 0.85)';
    ctx.fillRect(x + pad - 4, y + pad - 3, boxW, boxH);
    ctx.fillStyle = style.text;
    lines.forEach((line, i) => ctx.fillText(line, x + pad, y + pad + i * (size + 3)));
  }
  ctx.restore();
}

function paintDirectionHint(
  ctx: CanvasRenderingContext2D,
  x: number,
  y: number,
  w: number,
  h: number,
  vertical: boolean,
): void {
  ctx.beginPath();
  for (const t of [0.2, 0.4, 0.6, 0.8]) {
    if (vertical) {
      ctx.moveTo(x + w * t, y + h * 0.06);
      ctx.lineTo(x + w * t, y + h * 0.94);
    } else {
      ctx.moveTo(x + w * 0.06, y + h * t);
      ctx.lineTo(x + w * 0.94, y + h * t);
    }
  }
  ctx.strokeStyle = 'rgba(47, 111, 94, 0.28)';
  ctx.lineWidth = 1;
  ctx.stroke();
}

/** Bit lines, word lines and (when there is room) storage nodes over the visible part of the mat. */
function paintCells(ctx: CanvasRenderingContext2D, mat: PlacedMat, scene: Scene, nodes: boolean): void {
  const { viewport } = scene;
  const k = pxPerMetre(viewport);
  const ox = viewport.offsetX;
  const oy = viewport.offsetY;
  const view = visibleWorld(viewport, scene.width, scene.height);
  const g = mat.geometry;
  const r = mat.rect;
  const vertical = mat.block.bitlineAxis === 'vertical';
  // Along x: bit lines when they are vertical (spaced by the bit-line pitch), word lines otherwise.
  const pitchX = vertical ? g.bitlinePitch : g.wordlinePitch;
  const pitchY = vertical ? g.wordlinePitch : g.bitlinePitch;
  const countX = vertical ? g.bitlineCount : g.wordlineCount;
  const countY = vertical ? g.wordlineCount : g.bitlineCount;
  const firstX = Math.max(0, Math.floor((view.x - r.x) / pitchX));
  const lastX = Math.min(countX - 1, Math.ceil((view.x + view.width - r.x) / pitchX));
  const firstY = Math.max(0, Math.floor((view.y - r.y) / pitchY));
  const lastY = Math.min(countY - 1, Math.ceil((view.y + view.height - r.y) / pitchY));
  if (lastX < firstX || lastY < firstY) return;
  const top = Math.max(r.y, view.y) * k + oy;
  const bottom = Math.min(r.y + r.height, view.y + view.height) * k + oy;
  const left = Math.max(r.x, view.x) * k + ox;
  const right = Math.min(r.x + r.width, view.x + view.width) * k + ox;

  // Bit lines heavier than word lines, so the two directions read apart even without colour.
  ctx.beginPath();
  for (let i = firstX; i <= lastX; i++) {
    const sx = (r.x + (i + 0.5) * pitchX) * k + ox;
    ctx.moveTo(sx, top);
    ctx.lineTo(sx, bottom);
  }
  ctx.strokeStyle = vertical ? BITLINE_STROKE : WORDLINE_STROKE;
  ctx.lineWidth = vertical ? 1.6 : 1;
  ctx.globalAlpha = 0.6;
  ctx.stroke();
  ctx.beginPath();
  for (let j = firstY; j <= lastY; j++) {
    const sy = (r.y + (j + 0.5) * pitchY) * k + oy;
    ctx.moveTo(left, sy);
    ctx.lineTo(right, sy);
  }
  ctx.strokeStyle = vertical ? WORDLINE_STROKE : BITLINE_STROKE;
  ctx.lineWidth = vertical ? 1 : 1.6;
  ctx.stroke();
  ctx.globalAlpha = 1;
  ctx.lineWidth = 1;

  if (!nodes) return;
  // Folded arrays hold a cell at every other crossing (a checkerboard); open arrays at every one.
  const folded = crossingOccupancy(mat.cell.bitlineArchitecture) < 1;
  const phase = mat.block.mirrored ? 1 : 0;
  // A storage node is a dot on its crossing, a third of the pitch across but never a blot (px).
  const radius = Math.max(1, Math.min(Math.min(pitchX, pitchY) * k * 0.17, 7));
  ctx.fillStyle = STORAGE_NODE_FILL;
  ctx.beginPath();
  for (let i = firstX; i <= lastX; i++) {
    for (let j = firstY; j <= lastY; j++) {
      if (folded && (i + j + phase) % 2 !== 0) continue;
      const sx = (r.x + (i + 0.5) * pitchX) * k + ox;
      const sy = (r.y + (j + 0.5) * pitchY) * k + oy;
      ctx.moveTo(sx + radius, sy);
      ctx.arc(sx, sy, radius, 0, 2 * Math.PI);
    }
  }
  ctx.fill();
}
