import { create } from 'zustand';
import type { FigureKey } from '../engine';
import { DEFAULT_MAX_WORDLINE_DELAY } from '../explore/feasibilityLimits';
import type { SweepRequest } from '../explore/sweep';
import type { SweepChunk, SweepTable } from '../explore/sweepColumns';
import type { SweepChart, SweepChartPlan, SweepCommand, SweepReport } from '../explore/sweepProtocol';
import type { SweepSettings } from '../explore/sweepSettings';

/**
 * Session state of the explorer and the variants view: which main view shows, the sweep settings and
 * its results, the chart's axes and constraints. None of it is part of the document or its undo
 * history; a sweep's points are recomputed, not saved.
 */
export type MainView = 'floorplan' | 'explorer' | 'variants';
export type SweepStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface SweepRun {
  readonly id: number;
  readonly status: SweepStatus;
  readonly request: SweepRequest | null;
  /**
   * Every point received so far, as columns; it only grows while the run lasts (a new run gets a new
   * table); null before the first run. Build a point object with `table.point(row)` where one is needed.
   */
  readonly table: SweepTable | null;
  /** Rows of the table the view shows: changes at each flush, a few times a second while running. */
  readonly shown: number;
  /** Points assessed when the view last flushed (the live count is in `progress`). */
  readonly done: number;
  readonly total: number;
  /** Wall time from start to the last point (s), once done. */
  readonly elapsed: number | null;
  readonly error: string | null;
  /**
   * The finished sweep's chart model and points picture as the worker built them for the last chart
   * plan it had (planSweepChart), once done; null without one. The view takes them over when its axes,
   * limits and size still match.
   */
  readonly chart: SweepChart | null;
}

/** Chart limits; points outside them are infeasible. */
export interface Constraints {
  /** Least net sense margin (V); null follows the design's minimum-margin target. */
  readonly minMargin: number | null;
  /** Longest word-line delay (s). */
  readonly maxDelay: number;
}

/** What the store needs of a Web Worker, so tests can run the sweep in-process. */
export interface SweepWorker {
  postMessage(command: SweepCommand): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<SweepReport>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}
export type SweepWorkerFactory = () => SweepWorker;

/** The app's worker: bundled by Vite from the module next to the sweep core. */
export const browserSweepWorker: SweepWorkerFactory = () =>
  new Worker(new URL('../workers/sweepWorker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as SweepWorker;

export interface ExploreState {
  readonly view: MainView;
  /** Null until someone changes a setting: the defaults then follow the active design. */
  readonly settings: SweepSettings | null;
  readonly xAxis: FigureKey;
  readonly yAxis: FigureKey;
  readonly constraints: Constraints;
  readonly run: SweepRun;
  /** Points assessed so far, updated with every chunk the worker posts (the progress bar reads it). */
  readonly progress: { readonly done: number; readonly total: number };
  /** The variant last built from a point, to confirm what happened. */
  readonly lastBuilt: { readonly pointIndex: number; readonly name: string } | null;

  setView(view: MainView): void;
  setSettings(settings: SweepSettings): void;
  setAxes(axes: { xAxis?: FigureKey; yAxis?: FigureKey }): void;
  setConstraints(patch: Partial<Constraints>): void;
  /**
   * Starts a sweep whose points go into `table` (an empty one; the caller makes it, so the column code
   * loads with the explorer rather than with the app). `total` is the sweep's size where the caller
   * knows it (sweepSize(request)): the running state then shows it from the start, and the worker's
   * first message, which reports it too, costs no render.
   */
  startSweep(request: SweepRequest, table: SweepTable, total?: number): void;
  cancelSweep(): void;
  /**
   * Tells the running sweep's worker what chart the view shows and at what size, so that it draws the
   * finished chart (the last plan it has when the sweep ends); nothing when no sweep runs.
   */
  planSweepChart(plan: SweepChartPlan): void;
  noteBuilt(built: { pointIndex: number; name: string } | null): void;
}

const IDLE: SweepRun = {
  id: 0,
  status: 'idle',
  request: null,
  table: null,
  shown: 0,
  done: 0,
  total: 0,
  elapsed: null,
  error: null,
  chart: null,
};

/**
 * Points arriving while a sweep runs are gathered and shown at most every this many ms, plus 1 ms per
 * 50 points already shown (the chart's model and its new points cost about 10 µs a point on a loaded
 * machine, so this keeps the chart's share of the main thread near a third), so a running sweep
 * re-renders the chart a few times a second rather than once per chunk and leaves the page most of its
 * time. The last points are shown at once when the sweep ends; a flush is skipped when, at the rate so
 * far, the sweep is due to end within another interval (its chart would be replaced at once).
 */
export const SWEEP_FLUSH_INTERVAL = 250;
const FLUSH_MS_PER_POINT = 1 / 50;
/**
 * The progress bar moves at most this often (ms). Each move is a frame of its own (style, layers,
 * compositing: a few ms on a loaded machine), so moving it at each of a sweep's chunks would cost more
 * than the chart's updates.
 */
export const SWEEP_PROGRESS_INTERVAL = 200;

export function createExploreStore(
  workerFactory: SweepWorkerFactory = browserSweepWorker,
  flushInterval = SWEEP_FLUSH_INTERVAL,
) {
  let worker: SweepWorker | null = null;
  let startedAt = 0;
  let pendingDone = 0;
  let pendingTotal = 0;
  let flushTimer: ReturnType<typeof setTimeout> | null = null;
  /**
   * Chunks received but not yet appended to the run's table: they are appended when the view shows
   * them (a flush, a cancel), or dropped when the done message brings the worker's whole table.
   */
  let pendingChunks: SweepChunk[] = [];
  let progressTimer: ReturnType<typeof setTimeout> | null = null;
  const stopWorker = () => {
    worker?.terminate();
    worker = null;
    if (flushTimer !== null) clearTimeout(flushTimer);
    if (progressTimer !== null) clearTimeout(progressTimer);
    flushTimer = null;
    progressTimer = null;
  };

  return create<ExploreState>()((set, get) => {
    const showProgress = () => {
      progressTimer = null;
      set({ progress: { done: pendingDone, total: pendingTotal } });
    };
    const appendPending = (table: SweepTable | null) => {
      if (table && pendingChunks.length > 0) {
        table.reserve(pendingTotal);
        for (const chunk of pendingChunks) table.append(chunk);
      }
      pendingChunks = [];
    };
    const flush = () => {
      flushTimer = null;
      const run = get().run;
      appendPending(run.table);
      const count = run.table?.count ?? 0;
      if (run.shown === count && pendingDone === run.done) return;
      set({ run: { ...run, done: pendingDone, shown: count } });
    };
    // A partial chart the whole one would replace within one more interval is not worth drawing: at
    // the rate so far, the sweep is due sooner than that (the done message then shows every point).
    const flushUnlessDueSoon = () => {
      const elapsed = performance.now() - startedAt;
      const dueIn = pendingDone > 0 ? (elapsed * (pendingTotal - pendingDone)) / pendingDone : Infinity;
      if (dueIn < flushInterval) flushTimer = null;
      else flush();
    };
    return {
      view: 'floorplan',
      settings: null,
      xAxis: 'areaPerBit',
      yAxis: 'senseMargin',
      constraints: { minMargin: null, maxDelay: DEFAULT_MAX_WORDLINE_DELAY },
      run: IDLE,
      progress: { done: 0, total: 0 },
      lastBuilt: null,

      setView(view) {
        set({ view });
      },
      setSettings(settings) {
        set({ settings });
      },
      setAxes(axes) {
        set(axes);
      },
      setConstraints(patch) {
        set({ constraints: { ...get().constraints, ...patch } });
      },
      startSweep(request, table, total = 0) {
        stopWorker();
        const id = get().run.id + 1;
        startedAt = performance.now();
        pendingDone = 0;
        pendingTotal = total;
        pendingChunks = [];
        set({
          run: { ...IDLE, id, status: 'running', request, table, total },
          progress: { done: 0, total },
          lastBuilt: null,
        });
        const w = workerFactory();
        worker = w;
        w.onmessage = (event) => {
          const report = event.data;
          const run = get().run;
          if (report.runId !== run.id || run.status !== 'running') return;
          if (report.type === 'progress') {
            for (const chunk of report.chunks) pendingChunks.push(chunk);
            pendingDone = report.done;
            pendingTotal = report.total;
            if (run.total !== report.total) set({ run: { ...run, total: report.total } });
            if (flushInterval <= 0) {
              showProgress();
              flush();
            } else {
              progressTimer ??= setTimeout(showProgress, SWEEP_PROGRESS_INTERVAL);
              flushTimer ??= setTimeout(flushUnlessDueSoon, flushInterval + run.shown * FLUSH_MS_PER_POINT);
            }
          } else if (report.type === 'done') {
            stopWorker();
            if (report.table) {
              table.adopt(report.table);
              pendingChunks = [];
            } else appendPending(table);
            // The last points and the done state in one update: one render, one full redraw.
            set({
              run: {
                ...run,
                status: 'done',
                done: pendingDone,
                shown: table.count,
                elapsed: (performance.now() - startedAt) / 1000,
                chart: report.chart ?? null,
              },
            });
          } else {
            stopWorker();
            set({ run: { ...run, status: 'failed', error: report.error } });
          }
        };
        w.onerror = (event) => {
          stopWorker();
          set({ run: { ...get().run, status: 'failed', error: event.message || 'the sweep worker failed' } });
        };
        w.postMessage({ type: 'start', runId: id, request });
      },
      cancelSweep() {
        if (get().run.status !== 'running') return;
        stopWorker();
        flush();
        set({ run: { ...get().run, status: 'cancelled' } });
      },
      planSweepChart(plan) {
        const run = get().run;
        if (run.status === 'running') worker?.postMessage({ type: 'plan', runId: run.id, plan });
      },
      noteBuilt(built) {
        set({ lastBuilt: built });
      },
    };
  });
}

export type ExploreStore = ReturnType<typeof createExploreStore>;
