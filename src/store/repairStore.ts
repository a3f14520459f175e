import { create } from 'zustand';
import type { RepairMonteCarloRequest, RepairMonteCarloResult } from '../engine';
import type { RepairCommand, RepairReport } from '../explore/repairProtocol';

/**
 * Session state of the yield panel's Monte-Carlo repair estimate: not part of the document. The panel
 * schedules a run after every edit (debounced); a new run replaces the last one, and until its first
 * chunk arrives the last result stays shown, marked stale (it belongs to another request).
 */
export type RepairRunStatus = 'idle' | 'waiting' | 'running' | 'done' | 'failed';

/** Quiet time after an edit before the automatic estimate starts (ms). */
export const REPAIR_DEBOUNCE_MS = 500;

export interface RepairRun {
  readonly id: number;
  readonly status: RepairRunStatus;
  /** The request being estimated (waiting, running) or last estimated. */
  readonly request: RepairMonteCarloRequest | null;
  /** The request the shown result belongs to (compared by identity to say whether it is stale). */
  readonly resultRequest: RepairMonteCarloRequest | null;
  readonly trials: number;
  readonly result: RepairMonteCarloResult | null;
  readonly elapsed: number | null;
  readonly error: string | null;
}

/** What the store needs of a Web Worker, so tests can run the estimate in-process. */
export interface RepairWorker {
  postMessage(command: RepairCommand): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<RepairReport>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
}
export type RepairWorkerFactory = () => RepairWorker;

export const browserRepairWorker: RepairWorkerFactory = () =>
  new Worker(new URL('../explore/repairWorker.ts', import.meta.url), {
    type: 'module',
  }) as unknown as RepairWorker;

export interface RepairState {
  readonly run: RepairRun;
  /** Starts an estimate now, replacing any waiting or running one. */
  start(request: RepairMonteCarloRequest, trials: number): void;
  /**
   * Starts an estimate of `request` after `delay` ms unless another schedule or start comes first; does
   * nothing when this request already has (or is getting) at least `trials` trials.
   */
  schedule(request: RepairMonteCarloRequest, trials: number, delay?: number): void;
  /** Stops a waiting or running estimate; the last result stays. */
  cancel(): void;
}

const IDLE: RepairRun = {
  id: 0,
  status: 'idle',
  request: null,
  resultRequest: null,
  trials: 0,
  result: null,
  elapsed: null,
  error: null,
};

export function createRepairStore(workerFactory: RepairWorkerFactory = browserRepairWorker) {
  let worker: RepairWorker | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;
  const stop = () => {
    if (timer !== null) clearTimeout(timer);
    timer = null;
    worker?.terminate();
    worker = null;
  };
  return create<RepairState>((set, get) => ({
    run: IDLE,
    start(request, trials) {
      stop();
      const last = get().run;
      const id = last.id + 1;
      // The last result stays, stale, until this run's first chunk replaces it.
      set({
        run: {
          ...IDLE,
          id,
          status: 'running',
          request,
          trials,
          result: last.result,
          resultRequest: last.resultRequest,
        },
      });
      const w = workerFactory();
      worker = w;
      w.onmessage = (event) => {
        const message = event.data;
        if (message.runId !== id || get().run.id !== id) return;
        if (message.type === 'progress') {
          set({ run: { ...get().run, result: message.result, resultRequest: request } });
        } else if (message.type === 'done') {
          set({
            run: {
              ...get().run,
              status: 'done',
              result: message.result,
              resultRequest: request,
              elapsed: message.elapsed,
            },
          });
          stop();
        } else {
          set({ run: { ...get().run, status: 'failed', error: message.error } });
          stop();
        }
      };
      w.onerror = (event) => {
        set({ run: { ...get().run, status: 'failed', error: event.message || 'the repair worker failed' } });
        stop();
      };
      w.postMessage({ type: 'start', runId: id, request, trials });
    },
    schedule(request, trials, delay = REPAIR_DEBOUNCE_MS) {
      const run = get().run;
      const busy = run.status === 'waiting' || run.status === 'running' || run.status === 'done';
      if (run.request === request && busy && run.trials >= trials) return;
      stop();
      set({ run: { ...run, id: run.id + 1, status: 'waiting', request, trials, error: null } });
      timer = setTimeout(() => {
        timer = null;
        get().start(request, trials);
      }, delay);
    },
    cancel() {
      stop();
      const status = get().run.status;
      if (status === 'running' || status === 'waiting') set({ run: { ...get().run, status: 'idle' } });
    },
  }));
}

export type RepairStore = ReturnType<typeof createRepairStore>;

/** The app's one repair store. */
export const useRepairStore = createRepairStore();
