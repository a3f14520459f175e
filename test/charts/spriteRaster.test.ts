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
});
