import type { FigureKey } from '../engine';
import type { FeasibilityLimits } from './chartData';
import type { ChartModelState } from './chartModelBuilder';
import type { SweepRequest } from './sweep';
import type { SweepChunk } from './sweepColumns';

/**
 * What the page's chart shows and at what size, so the worker can build the chart's model and draw its
 * points for a finished sweep (the page then only puts the pixels on its canvas). The sprites are the
 * page's own (drawn by its canvas), so the worker's pixels are the ones the page would stamp.
 */
export interface SweepChartPlan {
  readonly xAxis: FigureKey;
  readonly yAxis: FigureKey;
  readonly limits: FeasibilityLimits;
  /** The chart's size (CSS px) and the page's device pixel ratio. */
  readonly width: number;
  readonly height: number;
  readonly ratio: number;
  /** Series colour of each cell of the request, by cell index. */
  readonly colours: readonly string[];
  /** Marker sprites by fill, shape and feasibility (charts/pointsRaster.ts MarkerSprite). */
  readonly sprites: readonly {
    readonly fill: string;
    readonly shape: number;
    readonly infeasible: boolean;
    readonly width: number;
    readonly height: number;
    readonly data: Uint8ClampedArray;
  }[];
}

/** The chart of a finished sweep as the worker built it for a plan (charts/pointsPicture.ts PointsPicture). */
export interface SweepChart {
  readonly xAxis: FigureKey;
  readonly yAxis: FigureKey;
  readonly limits: FeasibilityLimits;
  readonly model: ChartModelState;
  readonly picture: {
    readonly key: string;
    readonly placement: string;
    readonly ratio: number;
    readonly w: number;
    readonly h: number;
    readonly pixels: Uint8ClampedArray;
    readonly count: number;
    readonly x: Float64Array;
    readonly y: Float64Array;
  };
}

/** Messages between the app and the sweep worker. */
export type SweepCommand =
  | { readonly type: 'start'; readonly runId: number; readonly request: SweepRequest }
  /**
   * The chart the page shows for the run (sent when the chart has its size, again when it changes): the
   * worker draws the last one it has when the sweep ends.
   */
  | { readonly type: 'plan'; readonly runId: number; readonly plan: SweepChartPlan };

export type SweepReport =
  | {
      readonly type: 'progress';
      readonly runId: number;
      readonly done: number;
      readonly total: number;
      /** The chunk's points as columns (sweepColumns.ts); its buffers are transferred, not copied. */
      readonly chunk: SweepChunk;
    }
  | {
      readonly type: 'done';
      readonly runId: number;
      readonly total: number;
      readonly elapsed: number;
      /** The finished chart for the last plan the worker had, if it had one; buffers transferred. */
      readonly chart?: SweepChart;
    }
  | { readonly type: 'failed'; readonly runId: number; readonly error: string };

/** Points per progress message: small enough for a smooth bar, large enough to keep messages few. */
export const SWEEP_CHUNK = 500;
