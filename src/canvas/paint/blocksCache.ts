import type { Design } from '../../model/design';
import { paintBlockShapes, paintMarkers } from './paintBlocks';
import type { Scene } from './scene';

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
  private markersPainted: Scene['markers'] | null = null;
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
    if (
      !this.canvas ||
      !sameKey(this.key, key) ||
      Math.abs(dx) > this.marginX ||
      Math.abs(dy) > this.marginY
    ) {
      this.render(scene, key);
      this.markersPainted = null;
      dx = 0;
      dy = 0;
    }
    if (this.markersPainted !== scene.markers) this.renderMarkers(scene, key);
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
    this.markersPainted = scene.markers;
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
