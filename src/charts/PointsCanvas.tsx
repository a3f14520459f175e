import { symbol, symbolCircle } from 'd3';
import { useEffect, useRef } from 'react';
import {
  INFEASIBLE_FILL,
  MARGIN,
  MARKER_OUTLINE,
  MARKER_SHAPES,
  MARKER_SIZE,
  type ScatterDatum,
} from './chartStyle';
import { stampSprite, type Sprite } from './spriteRaster';

/** Side of the square sprite holding one marker (px). */
const SPRITE_PX = 12;

/** Sprites drawn so far, by colour, shape, feasibility and pixel ratio. */
const sprites = new Map<string, Sprite>();

/** One marker drawn once with the canvas API and read back as pixels. */
function markerSprite(fill: string, shape: number, infeasible: boolean, ratio: number): Sprite {
  const key = `${fill}|${shape}|${infeasible}|${ratio}`;
  const known = sprites.get(key);
  if (known) return known;
  const side = Math.ceil(SPRITE_PX * ratio);
  const canvas = document.createElement('canvas');
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
 * The scatter's points on a canvas between the chart's two SVG layers. Tens of thousands of SVG elements
 * would make every update of a running sweep slow; here each marker is a sprite stamped into one pixel
 * buffer (see spriteRaster.ts), infeasible points first so the feasible ones lie on top.
 */
export function PointsCanvas(props: {
  readonly data: readonly ScatterDatum[];
  readonly screen: readonly [number, number][];
  readonly width: number;
  readonly height: number;
}) {
  const { data, screen, width, height } = props;
  const ref = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const ratio = window.devicePixelRatio || 1;
    const w = Math.round(width * ratio);
    const h = Math.round(height * ratio);
    canvas.width = w;
    canvas.height = h;
    const image = context.createImageData(w, h);
    const clip = {
      x0: Math.round(MARGIN.left * ratio),
      y0: Math.round(MARGIN.top * ratio),
      x1: Math.round((width - MARGIN.right) * ratio),
      y1: Math.round((height - MARGIN.bottom) * ratio),
    };
    for (const infeasible of [true, false]) {
      data.forEach((d, i) => {
        if ((d.state === 'infeasible') !== infeasible) return;
        const p = screen[i];
        if (!p || !Number.isFinite(p[0]) || !Number.isFinite(p[1])) return;
        const sprite = markerSprite(
          infeasible ? INFEASIBLE_FILL : d.colour,
          d.shape % MARKER_SHAPES.length,
          infeasible,
          ratio,
        );
        const left = Math.round((MARGIN.left + p[0]) * ratio - sprite.width / 2);
        const top = Math.round((MARGIN.top + p[1]) * ratio - sprite.height / 2);
        stampSprite(image.data, w, clip, sprite, left, top);
      });
    }
    context.putImageData(image, 0, 0);
  }, [data, screen, width, height]);
  return (
    <canvas ref={ref} className="layer points-canvas" style={{ width, height }} data-testid="points-canvas" />
  );
}
