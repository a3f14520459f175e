import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { RepairSimulation, sharedDomainLayout, type RepairMonteCarloRequest } from '../../src/engine';
import { runRepairChunks, type RepairCommand, type RepairReport } from '../../src/explore/repairProtocol';
import { createRepairStore, REPAIR_DEBOUNCE_MS, type RepairWorker } from '../../src/store/repairStore';

// The automatic Monte-Carlo estimate: debounced after edits, cancellable, and a result shown for another
// request is stale. The worker runs in-process (the same pure chunk loop the Web Worker shell calls).

/** A worker that answers on a later timer tick, so a run can be replaced before it finishes. */
function fakeWorkers() {
  const started: RepairCommand[] = [];
  let terminated = 0;
  const factory = (): RepairWorker => {
    const worker: RepairWorker = {
      onmessage: null,
      onerror: null,
      postMessage(command: RepairCommand) {
        started.push(command);
        setTimeout(() => {
          runRepairChunks(
            command,
            (message: RepairReport) => worker.onmessage?.({ data: message } as MessageEvent<RepairReport>),
            new RepairSimulation(command.request),
          );
        }, 10);
      },
      terminate() {
        terminated++;
        worker.onmessage = null;
      },
    };
    return worker;
  };
  return { factory, started, terminatedCount: () => terminated };
}

const request = (spareRows: number): RepairMonteCarloRequest => ({
  layout: sharedDomainLayout(
    16,
    64,
    64,
    { cells: 0.01, rows: 0.01, columns: 0.01 },
    { cells: 0, rows: 0, columns: 0 },
  ),
  copies: 1,
  spareRows,
  spareColumns: 1,
  fatalDefects: 0,
  clustering: 2,
  seed: 1,
});

describe('automatic repair estimate', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('waits for edits to settle, then runs once for the last request', () => {
    const workers = fakeWorkers();
    const store = createRepairStore(workers.factory);
    const first = request(1);
    const second = request(2);
    store.getState().schedule(first, 2000);
    expect(store.getState().run.status).toBe('waiting');
    vi.advanceTimersByTime(REPAIR_DEBOUNCE_MS / 2);
    store.getState().schedule(second, 2000);
    vi.advanceTimersByTime(REPAIR_DEBOUNCE_MS - 1);
    expect(workers.started).toHaveLength(0);
    vi.advanceTimersByTime(1);
    expect(workers.started).toHaveLength(1);
    expect(workers.started[0]?.request).toBe(second);
    expect(store.getState().run.status).toBe('running');
    vi.advanceTimersByTime(20);
    const run = store.getState().run;
    expect(run.status).toBe('done');
    expect(run.resultRequest).toBe(second);
    expect(run.result?.trials).toBe(2000);
    // The same request again (the panel re-mounted) does not rerun.
    store.getState().schedule(second, 2000);
    expect(store.getState().run.status).toBe('done');
  });

  it('an edit during a run stops it; the old result stays, stale, until the new one arrives', () => {
    const workers = fakeWorkers();
    const store = createRepairStore(workers.factory);
    const first = request(1);
    store.getState().schedule(first, 1000);
    vi.advanceTimersByTime(REPAIR_DEBOUNCE_MS + 20);
    expect(store.getState().run.resultRequest).toBe(first);
    const second = request(0);
    store.getState().schedule(second, 1000);
    const waiting = store.getState().run;
    expect(waiting.status).toBe('waiting');
    expect(waiting.result?.trials).toBe(1000);
    expect(waiting.resultRequest).toBe(first);
    vi.advanceTimersByTime(REPAIR_DEBOUNCE_MS);
    // Replaced before its answer: the running worker of the next schedule is terminated.
    store.getState().schedule(request(2), 1000);
    expect(workers.terminatedCount()).toBeGreaterThanOrEqual(1);
    store.getState().cancel();
    expect(store.getState().run.status).toBe('idle');
    expect(store.getState().run.resultRequest).toBe(first);
    vi.advanceTimersByTime(1000);
    expect(store.getState().run.resultRequest).toBe(first);
  });
});
