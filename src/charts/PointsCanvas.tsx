import { useEffect, useRef } from 'react';
import type { ScatterPoints } from './chartStyle';
import { scratchSurface, spriteLookup, spriteMaker } from './markerSprites';
import { devicePixels, pictureKey, plotClip, stampPoints } from './pointsRaster';
import type { ScreenPositions } from './screenPositions';

/** The page's marker sprites (drawn on one scratch canvas of the page). */
const pageSprites = spriteMaker(scratchSurface(() => document.createElement('canvas')));

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
 * buffer (see pointsRaster.ts), infeasible points first so the feasible ones lie on top.
 *
 * While the data only grows at its end (`growing`, a running sweep: same source, more points) and the
 * placement (scales and size) stays the same, only the new points are stamped onto the kept pixels; any
 * other change, and the final update, redraw every point in the order above, so the finished chart does
 * not depend on how the points arrived. A full redraw takes the data's picture instead when one was
 * drawn off the page for this very placement, size and pixel ratio (the same pixels: the same code
 * drew them with this page's sprites).
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
    const { w, h } = devicePixels(width, height, ratio);
    const key = pictureKey(screen.placement, w, h);
    const kept = drawn.current;
    const count = Math.min(data.count, screen.count);
    const from =
      growing &&
      kept &&
      kept.ratio === ratio &&
      kept.placement === key &&
      kept.source === data.source &&
      kept.count <= data.count
        ? kept.count
        : 0;
    if (canvas.width !== w) canvas.width = w;
    if (canvas.height !== h) canvas.height = h;
    if (count === 0) {
      // Nothing to draw (a sweep's first frame): clear rather than put a whole empty buffer.
      context.clearRect(0, 0, w, h);
      drawn.current = null;
      return;
    }
    const picture = data.picture;
    let image: ImageData;
    if (from === 0 && picture && picture.key === key && picture.ratio === ratio && picture.count === count) {
      image = new ImageData(picture.pixels as Uint8ClampedArray<ArrayBuffer>, w, h);
    } else {
      // A full redraw clears the kept buffer rather than allocating another of the same size.
      const old = kept?.image;
      if (!old || old.width !== w || old.height !== h) image = context.createImageData(w, h);
      else {
        image = old;
        if (from === 0) image.data.fill(0);
      }
      stampPoints(
        image.data,
        w,
        plotClip(width, height, ratio),
        data,
        screen,
        from,
        ratio,
        spriteLookup(pageSprites, ratio),
      );
    }
    context.putImageData(image, 0, 0);
    drawn.current = { image, ratio, placement: key, source: data.source, count };
  }, [data, screen, width, height, growing]);
  return (
    <canvas ref={ref} className="layer points-canvas" style={{ width, height }} data-testid="points-canvas" />
  );
}
