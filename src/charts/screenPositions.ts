import type { AxisScale } from './chartScale';
import type { ScatterPoints } from './chartStyle';

/** Where the points sit in the plot (px from its top-left corner): the first `count` entries. */
export interface ScreenPositions {
  readonly source: object;
  /** The scales and plot size the positions were computed with. */
  readonly placement: string;
  readonly count: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
}

/**
 * The points' screen positions. When the points come from the same source as `before` and the
 * placement is the same, the points `before` placed keep their positions and only the new ones are
 * placed (the arrays are shared: entries below a snapshot's count never change).
 */
export function placePoints(
  before: ScreenPositions | null,
  data: ScatterPoints,
  xs: AxisScale,
  ys: AxisScale,
  placement: string,
): ScreenPositions {
  const reuse =
    before !== null &&
    before.source === data.source &&
    before.placement === placement &&
    before.count <= data.count;
  let x = reuse ? before.x : new Float64Array(data.count);
  let y = reuse ? before.y : new Float64Array(data.count);
  if (x.length < data.count) {
    const capacity = Math.max(data.count, x.length * 2);
    const grownX = new Float64Array(capacity);
    const grownY = new Float64Array(capacity);
    grownX.set(x);
    grownY.set(y);
    x = grownX;
    y = grownY;
  }
  const fx = xs.scale;
  const fy = ys.scale;
  for (let i = reuse ? before.count : 0; i < data.count; i++) {
    x[i] = fx(data.x[i] ?? Number.NaN);
    y[i] = fy(data.y[i] ?? Number.NaN);
  }
  return { source: data.source, placement, count: data.count, x, y };
}
