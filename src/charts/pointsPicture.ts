import { extentScale, type AxisScale } from './chartScale';
import { MARGIN, type ScatterPoints } from './chartStyle';
import { devicePixels, pictureKey, plotClip, stampPoints, type SpriteLookup } from './pointsRaster';
import { placePoints } from './screenPositions';

/** The plot area inside a chart of `width` × `height` CSS px (at least 10 px each way). */
export function plotArea(width: number, height: number) {
  return {
    plotW: Math.max(10, width - MARGIN.left - MARGIN.right),
    plotH: Math.max(10, height - MARGIN.top - MARGIN.bottom),
  };
}

/** The scales' domains, log flags and the plot size: points placed with the same placement sit alike. */
export const placementOf = (xs: AxisScale, ys: AxisScale, plotW: number, plotH: number) =>
  `${String(xs.scale.domain())}|${String(ys.scale.domain())}|${xs.log}|${ys.log}|${plotW}x${plotH}`;

/**
 * A finished scatter's points drawn off the page (the sweep worker draws one as a sweep ends): the
 * pixels of the chart's points canvas and the points' screen positions, for the exact-fit scales the
 * chart shows once its points stop arriving. The chart uses it when its own placement and canvas size
 * give the same key, and draws the points itself otherwise.
 */
export interface PointsPicture {
  /** pictureKey(placement, w, h): what the pixels were drawn for. */
  readonly key: string;
  readonly placement: string;
  readonly ratio: number;
  /** Device pixels. */
  readonly w: number;
  readonly h: number;
  /** RGBA, w × h, rows top to bottom (as an ImageData holds them). */
  readonly pixels: Uint8ClampedArray;
  /** Points placed, and their positions in the plot (CSS px from its top-left corner). */
  readonly count: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/**
 * Draws `data` as ScatterChart and its canvas would once the data stops growing: scales fitted to the
 * data's extent (extentScale), positions from placePoints, every point stamped by stampPoints with the
 * sprites `spriteOf` gives. Pure: no DOM.
 */
export function drawPointsPicture(
  data: ScatterPoints,
  frame: { readonly width: number; readonly height: number; readonly ratio: number },
  spriteOf: SpriteLookup,
): PointsPicture {
  const { width, height, ratio } = frame;
  const { plotW, plotH } = plotArea(width, height);
  const xs = extentScale(data.extent.x[0], data.extent.x[1], 0, plotW);
  const ys = extentScale(data.extent.y[0], data.extent.y[1], plotH, 0);
  const placement = placementOf(xs, ys, plotW, plotH);
  const screen = placePoints(null, data, xs, ys, placement);
  const { w, h } = devicePixels(width, height, ratio);
  const pixels = new Uint8ClampedArray(w * h * 4);
  stampPoints(pixels, w, plotClip(width, height, ratio), data, screen, 0, ratio, spriteOf);
  return {
    key: pictureKey(placement, w, h),
    placement,
    ratio,
    w,
    h,
    pixels,
    count: screen.count,
    x: screen.x,
    y: screen.y,
  };
}
