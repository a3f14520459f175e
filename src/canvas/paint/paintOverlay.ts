import { handlePosition, RESIZE_HANDLES } from '../../geometry/resize';
import type { Rect } from '../../geometry/rect';
import { isPlacedMat, type PlacedMat } from '../../geometry/placedBlocks';
import { cellPitches } from '../../model/cellBasics';
import { formatQuantity } from '../../model/units';
import { repairSettingsOf } from '../../engine';
import { REPAIR_DOMAIN_LABEL } from '../../model/repair';
import {
  BITLINE_STROKE,
  BLOCK_STYLE,
  GUIDE_STROKE,
  SELECTION_STROKE,
  STORAGE_NODE_FILL,
  WORDLINE_STROKE,
} from '../blockStyle';
import { LINES_MIN_PITCH_PX } from './paintMatDetail';
import { SPARE_FILL, SPARE_STROKE } from './spareLines';
import type { GesturePreview } from '../gestures/gesture';
import { pxPerMetre, RULER_SIZE, toScreen, visibleWorld, type Scene } from './scene';

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
  paintCellKey(ctx, scene);
  if (state.preview) paintPreview(ctx, scene, state.preview, state.pointer);
}

/**
 * When the view is close enough to show single cells, a key in the corner says which lines are bit
 * lines and which are word lines, and what the dots are.
 */
function paintCellKey(ctx: CanvasRenderingContext2D, scene: Scene): void {
  const k = pxPerMetre(scene.viewport);
  // Far from cell scale no mat can show its lines: skip the search over the visible blocks.
  const F = scene.design.process.featureSize;
  const finestPitch = Math.min(
    ...scene.design.cells.map((c) => {
      const { bitlinePitch, wordlinePitch } = cellPitches(c, F);
      return Math.min(bitlinePitch, wordlinePitch);
    }),
  );
  if (finestPitch * k < LINES_MIN_PITCH_PX) return;
  const view = visibleWorld(scene.viewport, scene.width, scene.height);
  let shown: PlacedMat | null = null;
  for (const i of scene.placed.index.near(view, 0)) {
    const p = scene.placed.placed[i];
    if (
      p &&
      isPlacedMat(p) &&
      Math.min(p.geometry.bitlinePitch, p.geometry.wordlinePitch) * k >= LINES_MIN_PITCH_PX
    ) {
      shown = p;
      break;
    }
  }
  if (!shown) return;
  const vertical = shown.block.bitlineAxis === 'vertical';
  const rows: [string, string, number][] = [
    [
      BITLINE_STROKE,
      `bit lines ${vertical ? '↕' : '↔'}, pitch ${formatQuantity(shown.geometry.bitlinePitch, 'length')}`,
      2,
    ],
    [
      WORDLINE_STROKE,
      `word lines ${vertical ? '↔' : '↕'}, pitch ${formatQuantity(shown.geometry.wordlinePitch, 'length')}`,
      1,
    ],
    [STORAGE_NODE_FILL, `storage nodes (${shown.cell.name})`, 0],
  ];
  const repair = repairSettingsOf(scene.design);
  if (repair.spareRows + repair.spareColumns > 0)
    rows.push([
      SPARE_FILL,
      `spares: ${repair.spareRows} rows per ${REPAIR_DOMAIN_LABEL[repair.repairDomain].replace(/^each /, '')}, ${repair.spareColumns} columns per sense-amp strip (Yield tab)`,
      -1,
    ]);
  ctx.font = '12px system-ui, sans-serif';
  const w = Math.max(...rows.map(([, text]) => ctx.measureText(text).width)) + 40;
  const h = rows.length * 18 + 10;
  const x = RULER_SIZE + 10;
  const y = scene.height - h - 10;
  ctx.fillStyle = 'rgba(251, 250, 247, 0.94)';
  ctx.fillRect(x, y, w, h);
  ctx.strokeStyle = '#b9b3a6';
  ctx.lineWidth = 1;
  ctx.strokeRect(x + 0.5, y + 0.5, w, h);
  rows.forEach(([colour, text, width], i) => {
    const cy = y + 14 + i * 18;
    if (width < 0) {
      ctx.fillStyle = colour;
      ctx.fillRect(x + 9, cy - 5, 16, 10);
      ctx.strokeStyle = SPARE_STROKE;
      ctx.lineWidth = 1;
      ctx.strokeRect(x + 9, cy - 5, 16, 10);
    } else if (width > 0) {
      ctx.strokeStyle = colour;
      ctx.lineWidth = width;
      ctx.beginPath();
      ctx.moveTo(x + 8, cy);
      ctx.lineTo(x + 26, cy);
      ctx.stroke();
    } else {
      ctx.fillStyle = colour;
      ctx.beginPath();
      ctx.arc(x + 17, cy, 3.5, 0, 2 * Math.PI);
      ctx.fill();
    }
    ctx.fillStyle = '#27303c';
    ctx.textAlign = 'left';
    ctx.textBaseline = 'middle';
    ctx.fillText(text, x + 32, cy);
  });
  ctx.lineWidth = 1;
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
