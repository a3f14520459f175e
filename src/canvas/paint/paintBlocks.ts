import { isPlacedMat, type PlacedBlock } from '../../geometry/placedBlocks';
import type { Rect } from '../../geometry/rect';
import type { BlockType } from '../../model/block';
import type { Severity } from '../../engine';
import { aggregateRuns } from './aggregateRuns';
import { BLOCK_STYLE, BLOCK_TAG, ERROR_STROKE, WARNING_STROKE } from '../blockStyle';
import { paintMatDetail } from './paintMatDetail';
import { pxPerMetre, visibleWorld, type Scene } from './scene';

/** Outlines are drawn on blocks at least this many pixels across; smaller ones are plain fills. */
const OUTLINE_MIN_PX = 3;
/** A flagged block smaller than this on screen still gets a marker this size (px). */
export const MARKER_MIN_PX = 8;

const TYPE_ORDER: readonly BlockType[] = [
  'mat',
  'spacer',
  'rowDecoder',
  'columnDecoder',
  'wordlineDriverStrip',
  'senseAmpStrip',
];

/** Blocks closer than this on screen merge into one run when they are too small to outline (px). */
const RUN_GAP_PX = 1;

function fillSnapped(ctx: CanvasRenderingContext2D, r: Rect, k: number, ox: number, oy: number): void {
  const x0 = Math.round(r.x * k + ox);
  const y0 = Math.round(r.y * k + oy);
  const x1 = Math.round((r.x + r.width) * k + ox);
  const y1 = Math.round((r.y + r.height) * k + oy);
  ctx.fillRect(x0, y0, Math.max(1, x1 - x0), Math.max(1, y1 - y0));
}

/** Up to this many markers of one severity are drawn one by one; more are merged into runs. */
const MERGE_MARKERS_FROM = 64;

/** The blocks layer without a cache: the blocks, then the finding markers on top. */
export function paintBlocks(ctx: CanvasRenderingContext2D, scene: Scene): void {
  paintBlockShapes(ctx, scene);
  paintMarkers(ctx, scene);
}

/**
 * Every visible block as a filled rectangle, grouped by type so that each colour is set once; outlines
 * where blocks are big enough; more detail (cells, line directions, labels) as they grow on screen; and
 * blocks a gesture is moving drawn faintly in their old place.
 */
export function paintBlockShapes(ctx: CanvasRenderingContext2D, scene: Scene): void {
  const { viewport, placed } = scene;
  const k = pxPerMetre(viewport);
  const ox = viewport.offsetX;
  const oy = viewport.offsetY;
  const view = visibleWorld(viewport, scene.width, scene.height);
  const visible = placed.index.near(view, 0);
  const byType = new Map<BlockType, PlacedBlock[]>();
  const ghosts: PlacedBlock[] = [];
  for (const i of visible) {
    const p = placed.placed[i];
    if (!p) continue;
    if (scene.hidden.has(p.block.id)) {
      ghosts.push(p);
      continue;
    }
    const list = byType.get(p.block.type);
    if (list) list.push(p);
    else byType.set(p.block.type, [p]);
  }

  // Rectangles are snapped to whole pixels and filled one by one: axis-aligned, pixel-aligned fills
  // need no anti-aliasing. Blocks too small for an outline are merged into runs first (level of
  // detail), so a whole-die view paints rows of mats, not every mat.
  const detailed: PlacedBlock[] = [];
  for (const type of TYPE_ORDER) {
    const list = byType.get(type);
    if (!list) continue;
    const style = BLOCK_STYLE[type];
    ctx.fillStyle = style.fill;
    const small: Rect[] = [];
    for (const p of list) {
      if (p.rect.width * k < OUTLINE_MIN_PX || p.rect.height * k < OUTLINE_MIN_PX) {
        small.push(p.rect);
        continue;
      }
      fillSnapped(ctx, p.rect, k, ox, oy);
    }
    for (const r of aggregateRuns(small, k, RUN_GAP_PX)) fillSnapped(ctx, r, k, ox, oy);
    ctx.beginPath();
    let outlined = 0;
    for (const p of list) {
      const w = p.rect.width * k;
      const h = p.rect.height * k;
      if (w < OUTLINE_MIN_PX || h < OUTLINE_MIN_PX) continue;
      outlined++;
      const x0 = Math.round(p.rect.x * k + ox);
      const y0 = Math.round(p.rect.y * k + oy);
      const x1 = Math.round((p.rect.x + p.rect.width) * k + ox);
      const y1 = Math.round((p.rect.y + p.rect.height) * k + oy);
      ctx.rect(x0 + 0.5, y0 + 0.5, Math.max(0, x1 - x0 - 1), Math.max(0, y1 - y0 - 1));
      if (w >= 24 && h >= 12) detailed.push(p);
    }
    if (outlined > 0) {
      ctx.strokeStyle = style.stroke;
      ctx.lineWidth = 1;
      ctx.stroke();
    }
  }

  for (const p of detailed) {
    if (isPlacedMat(p)) paintMatDetail(ctx, p, scene);
    else paintStripTag(ctx, p, k, ox, oy);
  }

  if (ghosts.length > 0) {
    ctx.save();
    ctx.setLineDash([4, 3]);
    ctx.strokeStyle = '#8a8478';
    ctx.beginPath();
    for (const p of ghosts)
      ctx.rect(p.rect.x * k + ox, p.rect.y * k + oy, p.rect.width * k, p.rect.height * k);
    ctx.fillStyle = 'rgba(120, 114, 104, 0.08)';
    ctx.fill();
    ctx.stroke();
    ctx.restore();
  }
}

function paintStripTag(
  ctx: CanvasRenderingContext2D,
  p: PlacedBlock,
  k: number,
  ox: number,
  oy: number,
): void {
  const w = p.rect.width * k;
  const h = p.rect.height * k;
  const tag = BLOCK_TAG[p.block.type];
  const upright = h > w;
  const long = upright ? h : w;
  const short = upright ? w : h;
  if (short < 12 || long < 40) return;
  ctx.save();
  ctx.beginPath();
  ctx.rect(p.rect.x * k + ox, p.rect.y * k + oy, w, h);
  ctx.clip();
  ctx.translate(p.rect.x * k + ox + w / 2, p.rect.y * k + oy + h / 2);
  if (upright) ctx.rotate(-Math.PI / 2);
  ctx.fillStyle = BLOCK_STYLE[p.block.type].text;
  ctx.font = `${Math.min(12, Math.floor(short * 0.7))}px system-ui, sans-serif`;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  const name = p.block.name || p.block.id;
  const text = ctx.measureText(name).width < long - 8 ? name : tag;
  ctx.fillText(text, 0, 0);
  ctx.restore();
}

/**
 * Outlines and tints on blocks named by findings, in the colour of the worst severity. A flagged block
 * smaller than the marker size is shown at that size; markers that touch merge into runs (a whole die
 * whose every mat has the same warning gets one marked area, not one outline per mat).
 */
export function paintMarkers(ctx: CanvasRenderingContext2D, scene: Scene, aroundVisibleOnly = false): void {
  const { viewport, placed } = scene;
  const k = pxPerMetre(viewport);
  const ox = viewport.offsetX;
  const oy = viewport.offsetY;
  // A small region asks the index for its blocks instead of going through every marker of the design.
  let flagged: Iterable<[string, Severity]> = scene.markers;
  if (aroundVisibleOnly) {
    const reach = MARKER_MIN_PX / k;
    const view = visibleWorld(viewport, scene.width, scene.height);
    const near: [string, Severity][] = [];
    for (const i of placed.index.near(view, reach)) {
      const id = placed.placed[i]?.block.id;
      const s = id === undefined ? undefined : scene.markers.get(id);
      if (id !== undefined && s) near.push([id, s]);
    }
    flagged = near;
  }
  for (const severity of ['warning', 'error'] as const) {
    const colour = severity === 'error' ? ERROR_STROKE : WARNING_STROKE;
    const marks: Rect[] = [];
    for (const [id, s] of flagged) {
      if (s !== severity || scene.hidden.has(id)) continue;
      const i = placed.positionOf.get(id);
      const p = i === undefined ? undefined : placed.placed[i];
      if (!p) continue;
      let x = p.rect.x * k + ox;
      let y = p.rect.y * k + oy;
      let w = p.rect.width * k;
      let h = p.rect.height * k;
      if (x > scene.width || y > scene.height || x + w < 0 || y + h < 0) continue;
      if (w < MARKER_MIN_PX) {
        x -= (MARKER_MIN_PX - w) / 2;
        w = MARKER_MIN_PX;
      }
      if (h < MARKER_MIN_PX) {
        y -= (MARKER_MIN_PX - h) / 2;
        h = MARKER_MIN_PX;
      }
      marks.push({ x, y, width: w, height: h });
    }
    if (marks.length === 0) continue;
    // Merging only where markers overlap or touch: separate findings stay separate outlines.
    const runs = marks.length > MERGE_MARKERS_FROM ? aggregateRuns(marks, 1, 0) : marks;
    ctx.beginPath();
    for (const r of runs) ctx.rect(r.x + 1, r.y + 1, r.width - 2, r.height - 2);
    ctx.fillStyle = severity === 'error' ? 'rgba(198, 40, 40, 0.16)' : 'rgba(201, 133, 0, 0.16)';
    ctx.fill();
    ctx.strokeStyle = colour;
    ctx.lineWidth = 2;
    ctx.stroke();
  }
}
