/**
 * Times a 10,368-point design-space sweep in Node (speed is never a unit test): the sweep code alone, on
 * Node's main thread and in a Node worker thread, without the browser, the page or the chart. What a
 * user waits for in the app (Chromium, the app's worker build, the chart's main-thread work) is
 * `npm run bench:sweep` (e2e/measure/sweepInBrowser.ts). Budget here: 10,000 points in at most 1 s
 * inside a worker. Prints one line per measurement and exits with 1 when over budget.
 */
import { Worker } from 'node:worker_threads';
import { ProcessCache } from '../../src/explore/partitionFigures';
import { runSweepRange } from '../../src/explore/sweep';
import { BENCH_CHUNK, BENCH_POINTS, BENCH_REQUEST } from './sweepRequest';

const RUNS = 5;
const BUDGET_MS_PER_10K = 1000;

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)] ?? Number.NaN;
}

function mainThread(): number[] {
  const times: number[] = [];
  for (let r = 0; r < RUNS + 1; r++) {
    const start = performance.now();
    const cache = new ProcessCache();
    for (let s = 0; s < BENCH_POINTS; s += BENCH_CHUNK)
      runSweepRange(BENCH_REQUEST, s, s + BENCH_CHUNK, cache);
    times.push(performance.now() - start);
  }
  return times.slice(1); // the first run warms the JIT up
}

function inWorker(): Promise<{ times: number[]; feasible: number }> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./tsWorker.mjs', import.meta.url), {
      workerData: { entry: new URL('./sweepBenchWorker.ts', import.meta.url).href },
    });
    worker.once('message', (result: { times: number[]; feasible: number }) => {
      void worker.terminate();
      resolve(result);
    });
    worker.once('error', reject);
    worker.postMessage(RUNS + 1);
  });
}

const main = mainThread();
const worker = await inWorker();
const workerTimes = worker.times.slice(1);
const per10k = (ms: number) => (ms * 10_000) / BENCH_POINTS;
const line = (label: string, times: readonly number[]) =>
  `${label.padEnd(36)} ${BENCH_POINTS.toLocaleString('en-US')} points  median ${median(times).toFixed(0)} ms` +
  `  (${per10k(median(times)).toFixed(0)} ms per 10,000; ${Math.round((BENCH_POINTS / median(times)) * 1000).toLocaleString('en-US')} points/s)`;
console.log(
  'sweep code in Node (not the browser; see npm run bench:sweep): cells per BL × cells per WL × 6 cells × 3 processes, 256 Mib bank',
);
console.log(line('sweep code, Node main thread', main));
console.log(line('sweep code, Node worker thread, chunks cloned', workerTimes));
console.log(`feasible points (no failing check): ${worker.feasible.toLocaleString('en-US')}`);
const worst = per10k(median(workerTimes));
if (worst > BUDGET_MS_PER_10K) {
  console.error(
    `OVER BUDGET: ${worst.toFixed(0)} ms per 10,000 points in a worker (budget ${BUDGET_MS_PER_10K} ms)`,
  );
  process.exit(1);
}
console.log(`within budget: ${worst.toFixed(0)} ms ≤ ${BUDGET_MS_PER_10K} ms per 10,000 points in a worker`);
