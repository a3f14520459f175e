/**
 * Times a 10,000-trial Monte-Carlo repair estimate for a 4,096-mat die (speed is never a unit test).
 * Budget: at most 1 s inside a worker. Prints load, runs, min, median and the goal; exits with 1 when the
 * median is over budget.
 */
import { cpus, loadavg } from 'node:os';
import { Worker } from 'node:worker_threads';
import { RepairSimulation } from '../../src/engine/physics/repairMonteCarlo';
import { BENCH_MATS, BENCH_REPAIR_REQUEST, BENCH_TRIALS } from './repairRequest';

const RUNS = 5;
const BUDGET_MS = 1000;

const median = (values: readonly number[]) =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)] ?? Number.NaN;
const min = (values: readonly number[]) => Math.min(...values);

function mainThread(): number[] {
  const times: number[] = [];
  for (let r = 0; r < RUNS + 1; r++) {
    const start = performance.now();
    new RepairSimulation(BENCH_REPAIR_REQUEST).run(BENCH_TRIALS);
    times.push(performance.now() - start);
  }
  return times;
}

interface WorkerAnswer {
  times: number[];
  last?: { result?: { estimate: number; low: number; high: number; trials: number; undecided: number } };
}

function inWorker(): Promise<WorkerAnswer> {
  return new Promise((resolve, reject) => {
    const worker = new Worker(new URL('./tsWorker.mjs', import.meta.url), {
      workerData: { entry: new URL('./repairBenchWorker.ts', import.meta.url).href },
    });
    worker.once('message', (answer: WorkerAnswer) => {
      void worker.terminate();
      resolve(answer);
    });
    worker.once('error', reject);
    worker.postMessage(RUNS + 1);
  });
}

const load = (loadavg()[0] ?? 0).toFixed(2);
const main = mainThread();
const worker = await inWorker();
const line = (label: string, all: readonly number[]) => {
  const warm = all.slice(1);
  return (
    `${label.padEnd(30)} cold ${(all[0] as number).toFixed(0)} ms, warm runs ${warm.length}: ` +
    `min ${min(warm).toFixed(0)} ms, median ${median(warm).toFixed(0)} ms (goal ≤ ${BUDGET_MS} ms)`
  );
};
console.log(
  `repair Monte Carlo: ${BENCH_TRIALS.toLocaleString('en-US')} trials, ${BENCH_MATS.toLocaleString('en-US')}-mat die ` +
    `(load ${load} on ${cpus().length} cores)`,
);
console.log(line('main thread', main));
console.log(line('worker thread, chunks cloned', worker.times));
const result = worker.last?.result;
if (result)
  console.log(
    `estimate ${result.estimate.toFixed(4)} [${result.low.toFixed(4)}, ${result.high.toFixed(4)}] ` +
      `over ${result.trials} trials, ${result.undecided} undecided`,
  );
const workerMedian = median(worker.times.slice(1));
if (workerMedian > BUDGET_MS) {
  console.error(`OVER BUDGET: ${workerMedian.toFixed(0)} ms in a worker (budget ${BUDGET_MS} ms)`);
  process.exit(1);
}
console.log(`within budget: ${workerMedian.toFixed(0)} ms ≤ ${BUDGET_MS} ms in a worker`);
