// Runs inside a Node worker thread: the same chunked loop as the app's Web Worker (src/explore/sweepWorker.ts).
import { parentPort } from 'node:worker_threads';
import { ProcessCache } from '../../src/explore/partitionFigures';
import { runSweepRange } from '../../src/explore/sweep';
import { BENCH_CHUNK, BENCH_POINTS, BENCH_REQUEST } from './sweepRequest';

parentPort?.on('message', (runs: number) => {
  const times: number[] = [];
  let feasible = 0;
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    const cache = new ProcessCache();
    feasible = 0;
    for (let s = 0; s < BENCH_POINTS; s += BENCH_CHUNK) {
      const points = runSweepRange(BENCH_REQUEST, s, s + BENCH_CHUNK, cache);
      // The worker posts each chunk; a structured clone of it is part of the cost.
      const copy = structuredClone(points);
      for (const p of copy) if (p.figures && p.figures.errorKinds.length === 0) feasible++;
    }
    times.push(performance.now() - start);
  }
  parentPort?.postMessage({ times, feasible });
});
