import { afterEach, describe, expect, it, vi } from 'vitest';
import { runSweepRange, sweepSize, type SweepRequest } from '../../src/explore/sweep';
import type { SweepCommand, SweepReport } from '../../src/explore/sweepProtocol';
import { encodeSweepChunk, SweepTable, SweepTextTables } from '../../src/explore/sweepColumns';
import { defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { demoDesign } from '../../src/designs/demoDesign';
import { createExploreStore, type SweepWorker } from '../../src/store/exploreStore';

/** A worker that runs in-process: each step() delivers one chunk, as the real one posts them. */
class StepWorker implements SweepWorker {
  onmessage: ((event: MessageEvent<SweepReport>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  terminated = false;
  private pending: SweepReport[] = [];

  /** `withTable`: the done message brings every row, as the app's worker sends its own table. */
  constructor(readonly withTable = false) {}

  postMessage(command: SweepCommand) {
    if (command.type !== 'start') return;
    const total = sweepSize(command.request);
    const tables = new SweepTextTables();
    const rows = new SweepTable();
    for (let s = 0; s < total; s += 100) {
      const chunk = encodeSweepChunk(runSweepRange(command.request, s, s + 100), tables);
      rows.append(chunk);
      this.pending.push({
        type: 'progress',
        runId: command.runId,
        done: Math.min(total, s + 100),
        total,
        chunks: [chunk],
      });
    }
    this.pending.push({
      type: 'done',
      runId: command.runId,
      total,
      elapsed: 0.01,
      ...(this.withTable ? { table: structuredClone(rows.state()) } : {}),
    });
  }
  terminate() {
    this.terminated = true;
  }
  /** Delivers the next message even after termination, to show stale messages are ignored. */
  step(): boolean {
    const next = this.pending.shift();
    if (!next) return false;
    this.onmessage?.({ data: next } as MessageEvent<SweepReport>);
    return true;
  }
}

function smallRequest(): SweepRequest {
  const design = demoDesign();
  const settings = defaultSweepSettings(design);
  return sweepRequestFor(
    {
      ...settings,
      cellsPerBitline: { from: 128, to: 512, step: 128 },
      cellsPerWordline: { from: 256, to: 1024, step: 256 },
    },
    design,
  );
}

describe('explorer store', () => {
  it('collects a sweep chunk by chunk and finishes with every point', () => {
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 0);
    const request = smallRequest();
    store.getState().startSweep(request, new SweepTable());
    expect(store.getState().run.status).toBe('running');
    const w = workers[0];
    if (!w) throw new Error('no worker');
    w.step();
    expect(store.getState().run.shown).toBe(100);
    expect(store.getState().run.done).toBe(100);
    expect(store.getState().progress).toEqual({ done: 100, total: sweepSize(request) });
    while (w.step());
    const run = store.getState().run;
    expect(run.status).toBe('done');
    expect(run.shown).toBe(sweepSize(request));
    expect(run.table?.points()).toEqual(runSweepRange(request, 0, sweepSize(request)));
    expect(w.terminated).toBe(true);
  });

  it('with the size given at the start, shows it at once and the first chunk changes no run state', () => {
    vi.useFakeTimers();
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 150);
    const request = smallRequest();
    store.getState().startSweep(request, new SweepTable(), sweepSize(request));
    const started = store.getState().run;
    expect(started.total).toBe(sweepSize(request));
    expect(store.getState().progress).toEqual({ done: 0, total: sweepSize(request) });
    const w = workers[0];
    if (!w) throw new Error('no worker');
    w.step();
    // Same object: no render until the timers show the points.
    expect(store.getState().run).toBe(started);
    vi.advanceTimersByTime(1000);
    expect(store.getState().run.shown).toBe(100);
    while (w.step());
    expect(store.getState().run.status).toBe('done');
    expect(store.getState().run.total).toBe(sweepSize(request));
    vi.useRealTimers();
  });

  it('cancels: the worker is terminated and late messages change nothing', () => {
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 0);
    store.getState().startSweep(smallRequest(), new SweepTable());
    const w = workers[0];
    if (!w) throw new Error('no worker');
    w.step();
    store.getState().cancelSweep();
    expect(w.terminated).toBe(true);
    expect(store.getState().run.status).toBe('cancelled');
    w.step();
    expect(store.getState().run.shown).toBe(100);
  });

  it('a new sweep replaces a running one and ignores the old run', () => {
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 0);
    store.getState().startSweep(smallRequest(), new SweepTable());
    store.getState().startSweep(smallRequest(), new SweepTable());
    const [first, second] = workers;
    if (!first || !second) throw new Error('expected two workers');
    expect(first.terminated).toBe(true);
    first.step();
    expect(store.getState().run.shown).toBe(0);
    second.step();
    expect(store.getState().run.shown).toBe(100);
    expect(store.getState().run.id).toBe(2);
  });

  it('while a sweep runs, gathers chunks and shows them a few times a second', () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'performance'] });
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 150);
    store.getState().startSweep(smallRequest(), new SweepTable());
    const w = workers[0];
    if (!w) throw new Error('no worker');
    w.step();
    expect(store.getState().run.shown).toBe(0);
    vi.advanceTimersByTime(160);
    // A quarter of the points in 160 ms: the rest is due in about 480 ms, so this flush shows them.
    expect(store.getState().run.shown).toBe(100);
    expect(store.getState().run.done).toBe(100);
    w.step();
    vi.advanceTimersByTime(10);
    expect(store.getState().run.shown).toBe(100);
    while (w.step());
    // The last message flushes at once.
    expect(store.getState().run.status).toBe('done');
    expect(store.getState().run.shown).toBe(store.getState().run.total);
  });

  it('takes the worker’s table over at the end instead of appending the chunks no flush showed', () => {
    vi.useFakeTimers();
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker(true);
      workers.push(w);
      return w;
    }, 10_000);
    const request = smallRequest();
    const table = new SweepTable();
    store.getState().startSweep(request, table, sweepSize(request));
    const w = workers[0];
    if (!w) throw new Error('no worker');
    w.step();
    w.step();
    // Nothing shown yet: nothing appended.
    expect(table.count).toBe(0);
    while (w.step());
    expect(store.getState().run.status).toBe('done');
    expect(store.getState().run.shown).toBe(sweepSize(request));
    expect(table.points()).toEqual(runSweepRange(request, 0, sweepSize(request)));
  });

  it('skips a flush when, at the rate so far, the sweep is due to end within another interval', () => {
    vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout', 'performance'] });
    const workers: StepWorker[] = [];
    const store = createExploreStore(() => {
      const w = new StepWorker();
      workers.push(w);
      return w;
    }, 150);
    const request = smallRequest();
    const total = sweepSize(request);
    store.getState().startSweep(request, new SweepTable(), total);
    const w = workers[0];
    if (!w) throw new Error('no worker');
    // All but the last chunk within the first 160 ms: the rest is due in well under 150 ms.
    const chunks = Math.ceil(total / 100);
    for (let c = 0; c < chunks - 1; c++) w.step();
    vi.advanceTimersByTime(160);
    expect(store.getState().run.shown).toBe(0);
    w.step();
    w.step();
    expect(store.getState().run.status).toBe('done');
    expect(store.getState().run.shown).toBe(total);
  });
});

afterEach(() => {
  vi.useRealTimers();
});
