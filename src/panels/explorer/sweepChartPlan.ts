import { markerSpriteSet } from '../../charts/markerSprites';
import type { FeasibilityLimits } from '../../explore/chartData';
import type { SweepRequest } from '../../explore/sweep';
import type { SweepChartPlan } from '../../explore/sweepProtocol';
import type { FigureKey } from '../../engine';
import { seriesColour } from './seriesStyle';

/**
 * The chart the explorer shows for a sweep, for the sweep worker to draw when the sweep ends: axes,
 * limits, the chart's size and pixel ratio, the cells' series colours and this page's marker sprites.
 */
export function sweepChartPlan(
  request: SweepRequest,
  axes: { readonly xAxis: FigureKey; readonly yAxis: FigureKey },
  limits: FeasibilityLimits,
  size: { readonly width: number; readonly height: number },
): SweepChartPlan {
  const ratio = window.devicePixelRatio || 1;
  const colours = request.cells.map((_, i) => seriesColour(i));
  return {
    ...axes,
    limits,
    width: size.width,
    height: size.height,
    ratio,
    colours,
    sprites: markerSpriteSet(colours, request.processes.length, ratio),
  };
}
