import type { FeasibilityLimits } from '../../explore/chartData';
import type { SweepRequest } from '../../explore/sweep';
import type { SweepChartPlan } from '../../explore/sweepProtocol';
import type { FigureKey } from '../../engine';
import { seriesColour } from './seriesStyle';

/**
 * The chart the explorer shows for a sweep, for the sweep worker to draw when the sweep ends: axes,
 * limits, the chart's size and pixel ratio, the cells' series colours.
 */
export function sweepChartPlan(
  request: SweepRequest,
  axes: { readonly xAxis: FigureKey; readonly yAxis: FigureKey },
  limits: FeasibilityLimits,
  size: { readonly width: number; readonly height: number },
): SweepChartPlan {
  return {
    ...axes,
    limits,
    width: size.width,
    height: size.height,
    ratio: window.devicePixelRatio || 1,
    colours: request.cells.map((_, i) => seriesColour(i)),
  };
}
