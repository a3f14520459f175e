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

/** What the canvas holds: its pixels and which points they show. */
interface Drawn {
  readonly image: ImageData;
  readonly ratio: number;
  /** The scales' domains and the size the points were placed with; another key means a full redraw. */
  readonly placement: string;
  /** Whether each drawn point was drawn infeasible (1) or not (0). */
  readonly infeasible: Uint8Array;
  readonly count: number;
}

/**
 * The scatter's points on a canvas between the chart's two SVG layers. Tens of thousands of SVG elements
 * would make every update of a running sweep slow; here each marker is a sprite stamped into one pixel
 * buffer (see spriteRaster.ts), infeasible points first so the feasible ones lie on top.
 *
 * While the data only grows at its end (`growing`, a running sweep) and the placement (scales and size)
 * stays the same, only the new points are stamped onto the kept pixels; any other change, and the final
 * update, redraw every point in the order above, so the finished chart does not depend on how the points
 * arrived.
 */
export function PointsCanvas(props: {
  readonly data: readonly ScatterDatum[];
  readonly screen: readonly [number, number][];
  readonly width: number;
  readonly height: number;
  /** Identifies the scales the screen positions come from. */
  readonly placement: string;
  readonly growing: boolean;
}) {
  const { data, screen, width, height, placement, growing } = props;
  const ref = useRef<HTMLCanvasElement>(null);
  const drawn = useRef<Drawn | null>(null);
  useEffect(() => {
    const canvas = ref.current;
    const context = canvas?.getContext('2d');
    if (!canvas || !context) return;
    const ratio = window.devicePixelRatio || 1;
    const w = Math.round(width * ratio);
    const h = Math.round(height * ratio);
    const key = `${placement}|${w}x${h}`;
    const kept = drawn.current;
    const from =
      growing && kept && kept.ratio === ratio && kept.placement === key && keptStillHolds(kept, data)
        ? kept.count
        : 0;
    const image = from > 0 && kept ? kept.image : context.createImageData(w, h);
    if (canvas.width !== w) canvas.width = w;
    if (canvas.height !== h) canvas.height = h;
    const clip = {
      x0: Math.round(MARGIN.left * ratio),
      y0: Math.round(MARGIN.top * ratio),
      x1: Math.round((width - MARGIN.right) * ratio),
      y1: Math.round((height - MARGIN.bottom) * ratio),
    };
    const infeasibleFlags = new Uint8Array(data.length);
    if (from > 0 && kept) infeasibleFlags.set(kept.infeasible.subarray(0, from));
    // Sprites by colour and shape for this draw, so the shared cache's text key is not built per point.
    const local = new Map<string, Sprite[]>();
    const spriteFor = (fill: string, shape: number, infeasible: boolean): Sprite => {
      let byShape = local.get(fill);
      if (!byShape) local.set(fill, (byShape = []));
      return (byShape[shape] ??= markerSprite(fill, shape, infeasible, ratio));
    };
    for (const infeasible of [true, false]) {
      for (let i = from; i < data.length; i++) {
        const d = data[i];
        if (!d || (d.state === 'infeasible') !== infeasible) continue;
        infeasibleFlags[i] = infeasible ? 1 : 0;
        const p = screen[i];
        if (!p || !Number.isFinite(p[0]) || !Number.isFinite(p[1])) continue;
        // Infeasible points share one grey sprite set; INFEASIBLE_FILL is no series colour.
        const sprite = spriteFor(
          infeasible ? INFEASIBLE_FILL : d.colour,
          d.shape % MARKER_SHAPES.length,
          infeasible,
        );
        const left = Math.round((MARGIN.left + p[0]) * ratio - sprite.width / 2);
        const top = Math.round((MARGIN.top + p[1]) * ratio - sprite.height / 2);
        stampSprite(image.data, w, clip, sprite, left, top);
      }
    }
    context.putImageData(image, 0, 0);
    drawn.current = { image, ratio, placement: key, infeasible: infeasibleFlags, count: data.length };
  }, [data, screen, width, height, placement, growing]);
  return (
    <canvas ref={ref} className="layer points-canvas" style={{ width, height }} data-testid="points-canvas" />
  );
}

/** Whether the kept pixels still show the first points of `data`: as many or more, each as feasible as before. */
function keptStillHolds(kept: Drawn, data: readonly ScatterDatum[]): boolean {
  if (data.length < kept.count) return false;
  for (let i = 0; i < kept.count; i++) {
    if ((data[i]?.state === 'infeasible' ? 1 : 0) !== kept.infeasible[i]) return false;
  }
  return true;
}
