import { create } from 'zustand';
import type { RepairMonteCarloRequest, RepairMonteCarloResult } from '../engine';
import type { RepairCommand, RepairReport } from '../explore/repairProtocol';

/**
 * Session state of the yield panel's Monte-Carlo repair estimate: not part of the document; a new run
 * replaces the last one and a changed design makes the shown estimate stale (the panel says so).
 */
export type RepairRunStatus = 'idle' | 'running' | 'done' | 'failed';

export interface RepairRun {
  readonly id: number;
  readonly status: RepairRunStatus;
  /** The request the result belongs to (compared by identity to say whether it is stale). */
  readonly request: RepairMonteCarloRequest | null;
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
  start(request: RepairMonteCarloRequest, trials: number): void;
  cancel(): void;
}

const IDLE: RepairRun = {
  id: 0,
  status: 'idle',
  request: null,
  trials: 0,
  result: null,
  elapsed: null,
  error: null,
};

export function createRepairStore(workerFactory: RepairWorkerFactory = browserRepairWorker) {
  let worker: RepairWorker | null = null;
  const stop = () => {
    worker?.terminate();
    worker = null;
  };
  return create<RepairState>((set, get) => ({
    run: IDLE,
    start(request, trials) {
      stop();
      const id = get().run.id + 1;
      set({ run: { ...IDLE, id, status: 'running', request, trials } });
      const w = workerFactory();
      worker = w;
      w.onmessage = (event) => {
        const message = event.data;
        if (message.runId !== id || get().run.id !== id) return;
        if (message.type === 'progress') set({ run: { ...get().run, result: message.result } });
        else if (message.type === 'done') {
          set({ run: { ...get().run, status: 'done', result: message.result, elapsed: message.elapsed } });
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
    cancel() {
      stop();
      if (get().run.status === 'running') set({ run: { ...get().run, status: 'idle' } });
    },
  }));
}

export type RepairStore = ReturnType<typeof createRepairStore>;

/** The app's one repair store. */
export const useRepairStore = createRepairStore();
