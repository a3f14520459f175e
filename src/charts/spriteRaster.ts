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
  const y0 = Math.max(clip.y0, top);
  const y1 = Math.min(clip.y1, top + sprite.height);
  const s = sprite.data;
  const spans = spansOf(sprite);
  for (let y = y0; y < y1; y++) {
    // Only the row's stretch holding any colour: a marker fills about a third of its square.
    const row = y - top;
    const x0 = Math.max(clip.x0, left + (spans[2 * row] ?? 0));
    const x1 = Math.min(clip.x1, left + (spans[2 * row + 1] ?? 0));
    let si = (row * sprite.width + (x0 - left)) * 4;
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

/** Per sprite, each row's first and one-past-last pixel with any alpha (an empty row: 0, 0). */
const rowSpans = new WeakMap<Sprite, Int32Array>();

function spansOf(sprite: Sprite): Int32Array {
  const known = rowSpans.get(sprite);
  if (known) return known;
  const spans = new Int32Array(2 * sprite.height);
  for (let y = 0; y < sprite.height; y++) {
    let first = -1;
    let end = 0;
    for (let x = 0; x < sprite.width; x++) {
      if ((sprite.data[(y * sprite.width + x) * 4 + 3] ?? 0) === 0) continue;
      if (first < 0) first = x;
      end = x + 1;
    }
    spans[2 * y] = Math.max(0, first);
    spans[2 * y + 1] = end;
  }
  rowSpans.set(sprite, spans);
  return spans;
}
