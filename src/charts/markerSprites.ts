import { symbol, symbolCircle } from 'd3';
import { INFEASIBLE_FILL, MARKER_OUTLINE, MARKER_SHAPES, MARKER_SIZE } from './chartStyle';
import type { MarkerSprite } from './pointsRaster';
import type { Sprite } from './spriteRaster';

/** Side of the square sprite holding one marker (CSS px). */
const SPRITE_PX = 12;

/** Sprites drawn so far, by colour, shape, feasibility and pixel ratio. */
const sprites = new Map<string, Sprite>();

let spriteCanvas: HTMLCanvasElement | null = null;

/**
 * One scatter marker drawn once with the canvas API and read back as pixels (the page's canvas draws
 * it, so it has the page's anti-aliasing): feasible markers filled at 0.9 alpha with a dark outline,
 * infeasible ones at 0.45 without.
 */
export function markerSprite(fill: string, shape: number, infeasible: boolean, ratio: number): Sprite {
  const key = `${fill}|${shape}|${infeasible}|${ratio}`;
  const known = sprites.get(key);
  if (known) return known;
  const side = Math.ceil(SPRITE_PX * ratio);
  // One scratch canvas for every sprite: setting its size clears it and resets its context's state, as
  // a new canvas would be, without a new canvas and context per sprite.
  spriteCanvas ??= document.createElement('canvas');
  const canvas = spriteCanvas;
  canvas.width = side;
  canvas.height = side;
  const context = canvas.getContext('2d');
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
}

/**
 * Every sprite a scatter can need whose series have `colours` and whose points have the first `shapes`
 * marker shapes: each colour × shape feasible, each shape infeasible (grey). Copies: the set may be
 * transferred.
 */
export function markerSpriteSet(colours: readonly string[], shapes: number, ratio: number): MarkerSprite[] {
  const set: MarkerSprite[] = [];
  const add = (fill: string, shape: number, infeasible: boolean) => {
    const sprite = markerSprite(fill, shape, infeasible, ratio);
    set.push({ ...sprite, data: sprite.data.slice(), fill, shape, infeasible });
  };
  const shapeCount = Math.min(shapes, MARKER_SHAPES.length);
  for (let shape = 0; shape < shapeCount; shape++) {
    add(INFEASIBLE_FILL, shape, true);
    for (const colour of new Set(colours)) add(colour, shape, false);
  }
  return set;
}
