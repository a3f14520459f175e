import { describe, expect, it } from 'vitest';
import { stampSprite, type Sprite } from '../../src/charts/spriteRaster';

function solid(width: number, height: number, rgba: readonly number[]): Sprite {
  const data = new Uint8ClampedArray(width * height * 4);
  for (let i = 0; i < data.length; i += 4) data.set(rgba, i);
  return { width, height, data };
}
const pixel = (t: Uint8ClampedArray, w: number, x: number, y: number) => [
  ...t.slice((y * w + x) * 4, (y * w + x) * 4 + 4),
];

describe('sprite stamping', () => {
  it('copies onto empty pixels and clips to the box', () => {
    const target = new Uint8ClampedArray(4 * 4 * 4);
    stampSprite(target, 4, { x0: 0, y0: 0, x1: 3, y1: 4 }, solid(2, 2, [10, 20, 30, 255]), 2, -1);
    expect(pixel(target, 4, 2, 0)).toEqual([10, 20, 30, 255]);
    expect(pixel(target, 4, 3, 0)).toEqual([0, 0, 0, 0]); // outside the clip
    expect(pixel(target, 4, 2, 1)).toEqual([0, 0, 0, 0]); // below the sprite
  });

  it('blends half-transparent red over opaque blue as source-over (arithmetic)', () => {
    const target = new Uint8ClampedArray(4);
    target.set([0, 0, 255, 255]);
    stampSprite(target, 1, { x0: 0, y0: 0, x1: 1, y1: 1 }, solid(1, 1, [255, 0, 0, 128]), 0, 0);
    // as = 128/255, a = 1; c = 255·as, 255·(1 − as)
    expect(pixel(target, 1, 0, 0)).toEqual([128, 0, 127, 255]);
  });

  it('skips only transparent pixels: equals blending every pixel of the square (arithmetic)', () => {
    // Reference: source-over on every pixel of the sprite's square, transparent ones included.
    const blendEvery = (t: Uint8ClampedArray, tw: number, sprite: Sprite, left: number, top: number) => {
      for (let y = Math.max(0, top); y < Math.min(tw, top + sprite.height); y++)
        for (let x = Math.max(0, left); x < Math.min(tw, left + sprite.width); x++) {
          const si = ((y - top) * sprite.width + (x - left)) * 4;
          const ti = (y * tw + x) * 4;
          const as = (sprite.data[si + 3] ?? 0) / 255;
          const ad = (t[ti + 3] ?? 0) / 255;
          const keep = ad * (1 - as);
          const a = as + keep;
          if (a === 0) continue;
          for (let c = 0; c < 3; c++)
            t[ti + c] = ((sprite.data[si + c] ?? 0) * as + (t[ti + c] ?? 0) * keep) / a;
          t[ti + 3] = a * 255;
        }
    };
    let seed = 7;
    const random = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    const side = 16;
    const expected = new Uint8ClampedArray(side * side * 4);
    const actual = new Uint8ClampedArray(side * side * 4);
    for (let n = 0; n < 200; n++) {
      const w = 1 + Math.floor(random() * 9);
      const h = 1 + Math.floor(random() * 9);
      const data = new Uint8ClampedArray(w * h * 4);
      // A disc-like sprite: rows with transparent ends, some empty rows, alpha 0…255.
      for (let y = 0; y < h; y++)
        for (let x = 0; x < w; x++) {
          if (random() < 0.4) continue;
          for (let c = 0; c < 4; c++) data[(y * w + x) * 4 + c] = Math.floor(random() * 256);
          if (random() < 0.2) data[(y * w + x) * 4 + 3] = 255;
        }
      const sprite = { width: w, height: h, data };
      const left = Math.floor(random() * (side + 4)) - 4;
      const top = Math.floor(random() * (side + 4)) - 4;
      blendEvery(expected, side, sprite, left, top);
      stampSprite(actual, side, { x0: 0, y0: 0, x1: side, y1: side }, sprite, left, top);
      expect(actual).toEqual(expected);
    }
  });
});
