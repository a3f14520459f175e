import { symbol, symbolCircle } from 'd3';
import { MARKER_OUTLINE, MARKER_SHAPES, MARKER_SIZE } from './chartStyle';
import type { SpriteLookup } from './pointsRaster';
import type { Sprite } from './spriteRaster';

/** Side of the square sprite holding one marker (CSS px). */
const SPRITE_PX = 12;

/** A 2D context on a scratch canvas of `side` × `side` px, cleared (the page's canvas or an OffscreenCanvas). */
export type SpriteSurface = (
  side: number,
) => CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D | null;

/**
 * Draws scatter markers once each with the canvas API and reads them back as pixels: feasible markers
 * filled at 0.9 alpha with a dark outline, infeasible ones at 0.45 without; kept by colour, shape,
 * feasibility and pixel ratio. The page and the sweep worker each have one (the same code on the same
 * software rasteriser: scratch contexts are made for reading back, so neither is drawn on the GPU).
 */
export function spriteMaker(surface: SpriteSurface) {
  const sprites = new Map<string, Sprite>();
  return (fill: string, shape: number, infeasible: boolean, ratio: number): Sprite => {
    const key = `${fill}|${shape}|${infeasible}|${ratio}`;
    const known = sprites.get(key);
    if (known) return known;
    const side = Math.ceil(SPRITE_PX * ratio);
    const context = surface(side);
    let sprite: Sprite = { width: side, height: side, data: new Uint8ClampedArray(side * side * 4) };
    if (context) {
      context.setTransform(ratio, 0, 0, ratio, side / 2, side / 2);
      const path = new Path2D(symbol(MARKER_SHAPES[shape] ?? symbolCircle, MARKER_SIZE)() ?? '');
      context.globalAlpha = infeasible ? 0.45 : 0.9;
      context.fillStyle = fill;
      context.fill(path);
      if (!infeasible) {
        context.globalAlpha = 1;
        context.strokeStyle = MARKER_OUTLINE;
        context.lineWidth = 0.7;
        context.stroke(path);
      }
      sprite = { width: side, height: side, data: context.getImageData(0, 0, side, side).data };
    }
    sprites.set(key, sprite);
    return sprite;
  };
}

/** The sprites of a maker at one pixel ratio, as stampPoints looks them up. */
export const spriteLookup =
  (make: ReturnType<typeof spriteMaker>, ratio: number): SpriteLookup =>
  (fill, shape, infeasible) =>
    make(fill, shape, infeasible, ratio);

/**
 * One scratch canvas for every sprite of a maker: setting its size clears it and resets its context's
 * state, as a new canvas would be, without a new canvas and context per sprite.
 */
export function scratchSurface(make: (side: number) => HTMLCanvasElement | OffscreenCanvas): SpriteSurface {
  let canvas: HTMLCanvasElement | OffscreenCanvas | null = null;
  return (side) => {
    canvas ??= make(side);
    canvas.width = side;
    canvas.height = side;
    return canvas.getContext('2d', { willReadFrequently: true }) as
      CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D | null;
  };
}
