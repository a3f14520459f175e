/**
 * Stamps small RGBA sprites into an RGBA pixel buffer with source-over blending. Drawing 100,000 markers
 * this way costs a few tens of milliseconds, where a canvas path per marker costs about half a second
 * on a machine without a GPU. Pure: tested in Node.
 */
export interface Sprite {
  readonly width: number;
  readonly height: number;
  /** RGBA, not premultiplied, rows top to bottom (as getImageData gives them). */
  readonly data: Uint8ClampedArray;
}

/** A pixel rectangle [x0, x1) × [y0, y1). */
export interface PixelBox {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

/**
 * Blends `sprite` over `target` (width `targetWidth`) with its top-left corner at (left, top), writing
 * only inside `clip`. Source-over for straight (not premultiplied) alpha:
 *   a = as + ad·(1 − as),  c = (cs·as + cd·ad·(1 − as)) / a  (Porter and Duff, "Compositing Digital
 *   Images", SIGGRAPH 1984, the "over" operator; from memory).
 */
export function stampSprite(
  target: Uint8ClampedArray,
  targetWidth: number,
  clip: PixelBox,
  sprite: Sprite,
  left: number,
  top: number,
): void {
  const x0 = Math.max(clip.x0, left);
  const y0 = Math.max(clip.y0, top);
  const x1 = Math.min(clip.x1, left + sprite.width);
  const y1 = Math.min(clip.y1, top + sprite.height);
  const s = sprite.data;
  for (let y = y0; y < y1; y++) {
    let si = ((y - top) * sprite.width + (x0 - left)) * 4;
    let ti = (y * targetWidth + x0) * 4;
    for (let x = x0; x < x1; x++, si += 4, ti += 4) {
      const as = (s[si + 3] ?? 0) / 255;
      if (as === 0) continue;
      const ad = (target[ti + 3] ?? 0) / 255;
      if (ad === 0 || as === 1) {
        target[ti] = s[si] ?? 0;
        target[ti + 1] = s[si + 1] ?? 0;
        target[ti + 2] = s[si + 2] ?? 0;
        target[ti + 3] = s[si + 3] ?? 0;
        continue;
      }
      const keep = ad * (1 - as);
      const a = as + keep;
      target[ti] = ((s[si] ?? 0) * as + (target[ti] ?? 0) * keep) / a;
      target[ti + 1] = ((s[si + 1] ?? 0) * as + (target[ti + 1] ?? 0) * keep) / a;
      target[ti + 2] = ((s[si + 2] ?? 0) * as + (target[ti + 2] ?? 0) * keep) / a;
      target[ti + 3] = a * 255;
    }
  }
}
