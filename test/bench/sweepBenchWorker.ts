// Runs inside a Node worker thread, bundled by sweep.bench.ts as the app's build bundles its worker: the
// same chunked loop as the app's Web Worker (src/explore/sweepWorker.ts). Asked for
// { request: 'bench' | 'explorer', runs }, it answers with each run's wall time and process CPU time (ms)
// and the last run's feasible points. A fresh thread's first run is a cold sweep, as in a new browser
// worker.
import { parentPort } from 'node:worker_threads';
import { ProcessCache } from '../../src/explore/partitionFigures';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { BENCH_CHUNK, BENCH_REQUEST, EXPLORER_REQUEST } from './sweepRequest';

parentPort?.on('message', ({ request: which, runs }: { request: 'bench' | 'explorer'; runs: number }) => {
  const request = which === 'bench' ? BENCH_REQUEST : EXPLORER_REQUEST;
  const total = sweepSize(request);
  const wall: number[] = [];
  const cpu: number[] = [];
  let feasible = 0;
  for (let r = 0; r < runs; r++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    const cache = new ProcessCache();
    feasible = 0;
    for (let s = 0; s < total; s += BENCH_CHUNK) {
      const points = runSweepRange(request, s, s + BENCH_CHUNK, cache);
      // The worker posts each chunk; a structured clone of it is part of the cost.
      const copy = structuredClone(points);
      for (const p of copy) if (p.figures && p.figures.errorKinds.length === 0) feasible++;
    }
    wall.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  parentPort?.postMessage({ wall, cpu, feasible });
});
