import { placedDesign } from '../../geometry/placedIndex';
import type { Rect } from '../../geometry/rect';
import type { Design } from '../../model/design';
import { blocksEditedInPlace } from '../../model/designEdit';
import { MARKER_MIN_PX, paintBlockShapes, paintMarkers } from './paintBlocks';
import { pxPerMetre, type Scene } from './scene';

/** Most blocks an edit may change for the bitmaps to be repainted around them only. */
const MOST_REPAINTED_BLOCKS = 64;
/** Margin around a changed block that is repainted (px): markers and outlines reach this far out. */
const REPAINT_MARGIN_PX = 6;
/** How far a marker may reach beyond a small block's own edges (px): half the smallest marker size. */
const MARKER_REACH_PX = MARKER_MIN_PX / 2;
/** Past this share of the bitmap, a repaint in place costs as much as painting all of it. */
const MOST_REPAINTED_SHARE = 0.5;

interface CacheKey {
  readonly design: Design;
  readonly hidden: ReadonlySet<string>;
  readonly scale: number;
  readonly width: number;
  readonly height: number;
  readonly ratio: number;
}

function sameKey(a: CacheKey | null, b: CacheKey): boolean {
  return (
    !!a &&
    a.design === b.design &&
    a.hidden === b.hidden &&
    a.scale === b.scale &&
    a.width === b.width &&
    a.height === b.height &&
    a.ratio === b.ratio
  );
}

/**
 * The painted blocks kept as a bitmap half a screen larger than the view on every side. Panning only
 * moves the bitmap, so a pan over 12,000 blocks costs one image copy per frame; the bitmap is painted
 * again when the document, the zoom or the set of moving blocks changes, or when a pan runs past its
 * edge. Finding markers have a second bitmap of the same size and origin, painted again only when the
 * markers change (checks can change during a drag without repainting the blocks, and a pan never
 * strokes a marker).
 */
export class BlocksCache {
  private canvas: HTMLCanvasElement | null = null;
  private markerCanvas: HTMLCanvasElement | null = null;
  private key: CacheKey | null = null;
  /** The marker version the marker bitmap shows, or null when it must be painted whole. */
  private markersPainted: number | null = null;
  private originX = 0;
  private originY = 0;
  private marginX = 0;
  private marginY = 0;

  paint(ctx: CanvasRenderingContext2D, scene: Scene): void {
    if (scene.width <= 0 || scene.height <= 0) return;
    const ratio = window.devicePixelRatio || 1;
    const key: CacheKey = {
      design: scene.design,
      hidden: scene.hidden,
      scale: scene.viewport.scale,
      width: scene.width,
      height: scene.height,
      ratio,
    };
    let dx = scene.viewport.offsetX - this.originX;
    let dy = scene.viewport.offsetY - this.originY;
    const pannedOut = Math.abs(dx) > this.marginX || Math.abs(dy) > this.marginY;
    if (!this.canvas || pannedOut || !sameKey(this.key, key)) {
      if (!pannedOut && this.repaintEdited(scene, key)) return this.show(ctx, scene, key, dx, dy);
      this.render(scene, key);
      this.markersPainted = null;
      dx = 0;
      dy = 0;
    }
    this.show(ctx, scene, key, dx, dy);
  }

  private show(ctx: CanvasRenderingContext2D, scene: Scene, key: CacheKey, dx: number, dy: number): void {
    const ratio = key.ratio;
    if (this.markersPainted !== scene.markerVersion && !this.repaintMarkers(scene, key))
      this.renderMarkers(scene, key);
    for (const canvas of [this.canvas, this.markerCanvas]) {
      if (canvas && canvas.width > 0 && canvas.height > 0) {
        ctx.drawImage(
          canvas,
          dx - this.marginX,
          dy - this.marginY,
          canvas.width / ratio,
          canvas.height / ratio,
        );
      }
    }
  }

  /**
   * After an edit of a few blocks in place (or when the blocks a gesture hides change), repaints the
   * bitmaps only around the old and new places of those blocks. False when that does not apply (zoom
   * or size changed, another kind of change, too many blocks): then everything is painted again.
   */
  private repaintEdited(scene: Scene, key: CacheKey): boolean {
    const was = this.key;
    const canvas = this.canvas;
    if (!was || !canvas || was.scale !== key.scale || was.width !== key.width) return false;
    if (was.height !== key.height || was.ratio !== key.ratio) return false;
    const changed =
      was.design === key.design ? [] : blocksEditedInPlace(was.design, key.design, MOST_REPAINTED_BLOCKS);
    if (!changed) return false;
    const before = placedDesign(was.design);
    const after = placedDesign(key.design);
    const positions = new Set(changed);
    if (was.hidden !== key.hidden) {
      for (const id of [...was.hidden, ...key.hidden]) {
        const i = after.positionOf.get(id);
        if (i !== undefined) positions.add(i);
      }
    }
    if (positions.size > MOST_REPAINTED_BLOCKS) return false;
    const k = pxPerMetre(scene.viewport);
    const left = this.originX + this.marginX;
    const top = this.originY + this.marginY;
    let x0 = Infinity;
    let y0 = Infinity;
    let x1 = -Infinity;
    let y1 = -Infinity;
    const include = (r: Rect | undefined) => {
      if (!r) return;
      x0 = Math.min(x0, r.x * k + left);
      y0 = Math.min(y0, r.y * k + top);
      x1 = Math.max(x1, (r.x + r.width) * k + left);
      y1 = Math.max(y1, (r.y + r.height) * k + top);
    };
    for (const i of positions) {
      include(before.placed[i]?.rect);
      include(after.placed[i]?.rect);
    }
    const width = scene.width + 2 * this.marginX;
    const height = scene.height + 2 * this.marginY;
    const region = {
      x: Math.max(0, Math.floor(x0) - REPAINT_MARGIN_PX),
      y: Math.max(0, Math.floor(y0) - REPAINT_MARGIN_PX),
      width: 0,
      height: 0,
    };
    region.width = Math.min(width, Math.ceil(x1) + REPAINT_MARGIN_PX) - region.x;
    region.height = Math.min(height, Math.ceil(y1) + REPAINT_MARGIN_PX) - region.y;
    this.key = key;
    if (region.width <= 0 || region.height <= 0) return true;
    if (region.width * region.height > MOST_REPAINTED_SHARE * width * height) return false;
    const inRegion: Scene = {
      ...scene,
      viewport: { scale: scene.viewport.scale, offsetX: left - region.x, offsetY: top - region.y },
      width: region.width,
      height: region.height,
    };
    repaintRegion(canvas, key.ratio, region, (ctx) => paintBlockShapes(ctx, inRegion));
    // With today's markers: those that changed elsewhere are repainted by repaintMarkers.
    if (this.markerCanvas && this.markersPainted !== null)
      repaintRegion(this.markerCanvas, key.ratio, region, (ctx) => paintMarkers(ctx, inRegion, true));
    return true;
  }

  /**
   * Repaints the marker bitmap only around the blocks whose marker changed since it was painted. False
   * when that does not apply (no bitmap yet, or too many changes): then it is painted whole.
   */
  private repaintMarkers(scene: Scene, key: CacheKey): boolean {
    const canvas = this.markerCanvas;
    if (!canvas || !this.canvas || this.markersPainted === null) return false;
    const changed = scene.markerChanges(this.markersPainted);
    if (!changed || changed.size > MOST_REPAINTED_BLOCKS) return false;
    const k = pxPerMetre(scene.viewport);
    const left = this.originX + this.marginX;
    const top = this.originY + this.marginY;
    const width = scene.width + 2 * this.marginX;
    const height = scene.height + 2 * this.marginY;
    // A small flagged block's marker is drawn at least MARKER_MIN_PX wide around its centre.
    const reach = REPAINT_MARGIN_PX + MARKER_REACH_PX;
    for (const id of changed) {
      const i = scene.placed.positionOf.get(id);
      const r = i === undefined ? undefined : scene.placed.placed[i]?.rect;
      if (!r) continue;
      const x0 = Math.max(0, Math.floor(r.x * k + left) - reach);
      const y0 = Math.max(0, Math.floor(r.y * k + top) - reach);
      const x1 = Math.min(width, Math.ceil((r.x + r.width) * k + left) + reach);
      const y1 = Math.min(height, Math.ceil((r.y + r.height) * k + top) + reach);
      if (x1 <= x0 || y1 <= y0) continue;
      const region = { x: x0, y: y0, width: x1 - x0, height: y1 - y0 };
      const inRegion: Scene = {
        ...scene,
        viewport: { scale: scene.viewport.scale, offsetX: left - region.x, offsetY: top - region.y },
        width: region.width,
        height: region.height,
      };
      repaintRegion(canvas, key.ratio, region, (ctx) => paintMarkers(ctx, inRegion, true));
    }
    this.markersPainted = scene.markerVersion;
    return true;
  }

  /** The markers on their own bitmap, with the same size and origin as the blocks' one. */
  private renderMarkers(scene: Scene, key: CacheKey): void {
    this.markerCanvas ??= document.createElement('canvas');
    const canvas = this.markerCanvas;
    const base = this.canvas;
    if (!base) return;
    if (canvas.width !== base.width || canvas.height !== base.height) {
      canvas.width = base.width;
      canvas.height = base.height;
    }
    const ctx = canvas.getContext('2d');
    if (!ctx) return;
    const width = scene.width + 2 * this.marginX;
    const height = scene.height + 2 * this.marginY;
    ctx.setTransform(key.ratio, 0, 0, key.ratio, 0, 0);
    ctx.clearRect(0, 0, width, height);
    const v = scene.viewport;
    paintMarkers(ctx, {
      ...scene,
      viewport: { ...v, offsetX: this.originX + this.marginX, offsetY: this.originY + this.marginY },
      width,
      height,
    });
    this.markersPainted = scene.markerVersion;
  }

  private render(scene: Scene, key: CacheKey): void {
    this.canvas ??= document.createElement('canvas');
    const canvas = this.canvas;
    this.marginX = Math.ceil(scene.width / 2);
    this.marginY = Math.ceil(scene.height / 2);
    const width = scene.width + 2 * this.marginX;
    const height = scene.height + 2 * this.marginY;
    canvas.width = Math.ceil(width * key.ratio);
    canvas.height = Math.ceil(height * key.ratio);
    const ctx = canvas.getContext('2d');
    if (!ctx) return;
    ctx.setTransform(key.ratio, 0, 0, key.ratio, 0, 0);
    ctx.clearRect(0, 0, width, height);
    const v = scene.viewport;
    paintBlockShapes(ctx, {
      ...scene,
      viewport: { ...v, offsetX: v.offsetX + this.marginX, offsetY: v.offsetY + this.marginY },
      width,
      height,
    });
    this.key = key;
    this.originX = v.offsetX;
    this.originY = v.offsetY;
  }
}

/** Clears one region of a bitmap (px) and paints it again, with the origin moved to the region's corner. */
function repaintRegion(
  canvas: HTMLCanvasElement,
  ratio: number,
  region: Rect,
  paint: (ctx: CanvasRenderingContext2D) => void,
): void {
  const ctx = canvas.getContext('2d');
  if (!ctx) return;
  ctx.save();
  ctx.setTransform(ratio, 0, 0, ratio, 0, 0);
  ctx.beginPath();
  ctx.rect(region.x, region.y, region.width, region.height);
  ctx.clip();
  ctx.clearRect(region.x, region.y, region.width, region.height);
  ctx.translate(region.x, region.y);
  paint(ctx);
  ctx.restore();
}
