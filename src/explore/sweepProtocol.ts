import type { FigureKey } from '../engine';
import type { FeasibilityLimits } from './chartData';
import type { ChartModelState } from './chartModelBuilder';
import type { SweepRequest } from './sweep';
import type { SweepChunk, SweepTableState } from './sweepColumns';

/**
 * What the page's chart shows and at what size, so the worker can build the chart's model and draw its
 * points for a finished sweep (the page then only puts the pixels on its canvas).
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
      /**
       * The points assessed since the last message, chunk by chunk as columns (sweepColumns.ts); their
       * buffers are transferred, not copied.
       */
      readonly chunks: readonly SweepChunk[];
    }
  | {
      readonly type: 'done';
      readonly runId: number;
      readonly total: number;
      readonly elapsed: number;
      /** The finished chart for the last plan the worker had, if it had one; buffers transferred. */
      readonly chart?: SweepChart;
      /**
       * Every point of the sweep as the worker's table holds them (buffers transferred): the page takes
       * them over instead of appending the chunks it has not appended yet.
       */
      readonly table?: SweepTableState;
    }
  | { readonly type: 'failed'; readonly runId: number; readonly error: string };

/** Points the worker assesses between looks at the clock. */
export const SWEEP_CHUNK = 500;
/**
 * The worker posts the points assessed so far at most this often (ms), and the rest at the end: often
 * enough for the progress bar and the chart's updates (every 200 and 250 ms or more on the page), while
 * a sweep of a tenth of a second costs the page two or three messages rather than one per chunk.
 */
export const SWEEP_POST_INTERVAL = 50;
