import { INFEASIBLE_FILL, MARGIN, MARKER_SHAPES, type ScatterPoints } from './chartStyle';
import type { ScreenPositions } from './screenPositions';
import { stampSprite, type PixelBox, type Sprite } from './spriteRaster';

/**
 * The scatter's points as pixels: every marker a sprite stamped into one RGBA buffer, infeasible points
 * first so the feasible ones lie on top. Pure (no DOM): the chart's canvas runs it on the page, and the
 * sweep worker runs it for a finished sweep so the page only puts the pixels on its canvas.
 */

/** The sprite of a marker by its fill, shape (index into MARKER_SHAPES) and feasibility. */
export type SpriteLookup = (fill: string, shape: number, infeasible: boolean) => Sprite | undefined;

/** Device pixels of a chart `width` × `height` CSS px at pixel ratio `ratio`. */
export function devicePixels(width: number, height: number, ratio: number) {
  return { w: Math.round(width * ratio), h: Math.round(height * ratio) };
}

/** The plot area in device pixels: markers are clipped to it. */
export function plotClip(width: number, height: number, ratio: number): PixelBox {
  return {
    x0: Math.round(MARGIN.left * ratio),
    y0: Math.round(MARGIN.top * ratio),
    x1: Math.round((width - MARGIN.right) * ratio),
    y1: Math.round((height - MARGIN.bottom) * ratio),
  };
}

/**
 * What a picture of the points was drawn for: the scales and plot size of the placement, the canvas
 * size in device pixels. Two drawings with the same key have the same pixels.
 */
export const pictureKey = (placement: string, w: number, h: number) => `${placement}|${w}x${h}`;

/**
 * Stamps points `from` … count−1 into `target` (RGBA, `w` device px wide): the infeasible ones, then the
 * feasible ones, each in index order. Points without a finite position, or whose sprite `spriteOf` does
 * not know, are skipped.
 */
export function stampPoints(
  target: Uint8ClampedArray,
  w: number,
  clip: PixelBox,
  data: ScatterPoints,
  screen: ScreenPositions,
  from: number,
  ratio: number,
  spriteOf: SpriteLookup,
): void {
  const count = Math.min(data.count, screen.count);
  // Sprites by series and shape for this draw, so the lookup's text key is not built per point.
  const feasibleSprites: (Sprite | undefined)[][] = [];
  const infeasibleSprites: (Sprite | undefined)[] = [];
  const shapes = MARKER_SHAPES.length;
  for (let pass = 1; pass >= 0; pass--) {
    for (let i = from; i < count; i++) {
      if ((data.infeasible[i] ?? 0) !== pass) continue;
      const px = screen.x[i] ?? Number.NaN;
      const py = screen.y[i] ?? Number.NaN;
      if (!Number.isFinite(px) || !Number.isFinite(py)) continue;
      const shape = (data.shape[i] ?? 0) % shapes;
      let sprite: Sprite | undefined;
      if (pass === 1) {
        // Infeasible points share one grey sprite set; INFEASIBLE_FILL is no series colour.
        sprite = infeasibleSprites[shape] ??= spriteOf(INFEASIBLE_FILL, shape, true);
      } else {
        const series = data.series[i] ?? 0;
        const byShape = (feasibleSprites[series] ??= []);
        sprite = byShape[shape] ??= spriteOf(data.colourOf(series), shape, false);
      }
      if (!sprite) continue;
      const left = Math.round((MARGIN.left + px) * ratio - sprite.width / 2);
      const top = Math.round((MARGIN.top + py) * ratio - sprite.height / 2);
      stampSprite(target, w, clip, sprite, left, top);
    }
  }
}
