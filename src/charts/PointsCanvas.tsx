import { symbol, symbolCircle } from 'd3';
import { useEffect, useRef } from 'react';
import {
  INFEASIBLE_FILL,
  MARGIN,
  MARKER_OUTLINE,
  MARKER_SHAPES,
  MARKER_SIZE,
  type ScatterPoints,
} from './chartStyle';
import type { ScreenPositions } from './screenPositions';
import { stampSprite, type Sprite } from './spriteRaster';

/** Side of the square sprite holding one marker (px). */
const SPRITE_PX = 12;

/** Sprites drawn so far, by colour, shape, feasibility and pixel ratio. */
const sprites = new Map<string, Sprite>();

let spriteCanvas: HTMLCanvasElement | null = null;

/** One marker drawn once with the canvas API and read back as pixels. */
function markerSprite(fill: string, shape: number, infeasible: boolean, ratio: number): Sprite {
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

/** What the canvas holds: its pixels and which points they show. */
interface Drawn {
  readonly image: ImageData;
  readonly ratio: number;
  /** The scales' domains and the size the points were placed with; another key means a full redraw. */
  readonly placement: string;
  /** The points' source and how many of them are drawn. */
  readonly source: object;
  readonly count: number;
}

/**
 * The scatter's points on a canvas between the chart's two SVG layers. Tens of thousands of SVG elements
 * would make every update of a running sweep slow; here each marker is a sprite stamped into one pixel
 * buffer (see spriteRaster.ts), infeasible points first so the feasible ones lie on top.
 *
 * While the data only grows at its end (`growing`, a running sweep: same source, more points) and the
 * placement (scales and size) stays the same, only the new points are stamped onto the kept pixels; any
 * other change, and the final update, redraw every point in the order above, so the finished chart does
 * not depend on how the points arrived.
 */
export function PointsCanvas(props: {
  readonly data: ScatterPoints;
  readonly screen: ScreenPositions;
  readonly width: number;
  readonly height: number;
  readonly growing: boolean;
}) {
  const { data, screen, width, height, growing } = props;
  const ref = useRef<HTMLCanvasElement>(null);
  const drawn = useRef<Drawn | null>(null);
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const ratio = window.devicePixelRatio || 1;
    const w = Math.round(width * ratio);
    const h = Math.round(height * ratio);
    const key = `${screen.placement}|${w}x${h}`;
    const kept = drawn.current;
    const from =
      growing &&
      kept &&
      kept.ratio === ratio &&
      kept.placement === key &&
      kept.source === data.source &&
      kept.count <= data.count
        ? kept.count
        : 0;
    // A full redraw clears the kept buffer rather than allocating another of the same size.
    let image = kept?.image;
    if (!image || image.width !== w || image.height !== h) image = context.createImageData(w, h);
    else if (from === 0) image.data.fill(0);
    if (canvas.width !== w) canvas.width = w;
    if (canvas.height !== h) canvas.height = h;
    const clip = {
      x0: Math.round(MARGIN.left * ratio),
      y0: Math.round(MARGIN.top * ratio),
      x1: Math.round((width - MARGIN.right) * ratio),
      y1: Math.round((height - MARGIN.bottom) * ratio),
    };
    // Sprites by colour and shape for this draw, so the shared cache's text key is not built per point.
    const local = new Map<string, Sprite[]>();
    const spriteFor = (fill: string, shape: number, infeasible: boolean): Sprite => {
      let byShape = local.get(fill);
      if (!byShape) local.set(fill, (byShape = []));
      return (byShape[shape] ??= markerSprite(fill, shape, infeasible, ratio));
    };
    const count = Math.min(data.count, screen.count);
    for (const infeasible of [1, 0]) {
      for (let i = from; i < count; i++) {
        if ((data.infeasible[i] ?? 0) !== infeasible) continue;
        const px = screen.x[i] ?? Number.NaN;
        const py = screen.y[i] ?? Number.NaN;
        if (!Number.isFinite(px) || !Number.isFinite(py)) continue;
        // Infeasible points share one grey sprite set; INFEASIBLE_FILL is no series colour.
        const sprite = spriteFor(
          infeasible ? INFEASIBLE_FILL : data.colourOf(data.series[i] ?? 0),
          (data.shape[i] ?? 0) % MARKER_SHAPES.length,
          infeasible === 1,
        );
        const left = Math.round((MARGIN.left + px) * ratio - sprite.width / 2);
        const top = Math.round((MARGIN.top + py) * ratio - sprite.height / 2);
        stampSprite(image.data, w, clip, sprite, left, top);
      }
    }
    context.putImageData(image, 0, 0);
    drawn.current = { image, ratio, placement: key, source: data.source, count };
  }, [data, screen, width, height, growing]);
  return (
    <canvas ref={ref} className="layer points-canvas" style={{ width, height }} data-testid="points-canvas" />
  );
}
