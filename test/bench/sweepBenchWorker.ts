// Runs inside a Node worker thread, bundled by sweep.bench.ts as the app's build bundles its worker: the
// same chunked loop as the app's Web Worker (src/workers/sweepWorker.ts), each chunk encoded as typed-array
// columns and cloned with its buffers handed over, as the worker posts it. Asked for
// { request: 'bench' | 'explorer' | 'spares', runs }, it answers with each run's wall time and process CPU time (ms)
// and the last run's feasible points. A fresh thread's first run is a cold sweep, as in a new browser
// worker.
import { parentPort } from 'node:worker_threads';
import { ProcessCache } from '../../src/explore/partitionFigures';
import { runSweepRange, sweepSize } from '../../src/explore/sweep';
import { chunkBuffers, encodeSweepChunk, SweepTextTables } from '../../src/explore/sweepColumns';
import { BENCH_CHUNK, BENCH_REQUEST, EXPLORER_REQUEST, SPARE_REQUEST } from './sweepRequest';

type Which = 'bench' | 'explorer' | 'spares';
const REQUESTS = { bench: BENCH_REQUEST, explorer: EXPLORER_REQUEST, spares: SPARE_REQUEST };

parentPort?.on('message', ({ request: which, runs }: { request: Which; runs: number }) => {
  // A copy, as the app's worker receives its request (postMessage clones it): every cell and process
  // object then has the shape the deserialiser gives it, as in the app.
  const request = structuredClone(REQUESTS[which]);
  const total = sweepSize(request);
  const wall: number[] = [];
  const cpu: number[] = [];
  // The longest chunk of each run (a spare sweep computes a partition's pairs at its first chunk).
  const slowestChunk: number[] = [];
  let feasible = 0;
  for (let r = 0; r < runs; r++) {
    const cpuStart = process.cpuUsage();
    const start = performance.now();
    const cache = new ProcessCache();
    const tables = new SweepTextTables();
    feasible = 0;
    let slowest = 0;
    for (let s = 0; s < total; s += BENCH_CHUNK) {
      const chunkStart = performance.now();
      const points = runSweepRange(request, s, s + BENCH_CHUNK, cache);
      const chunk = encodeSweepChunk(points, tables);
      // Posting a chunk clones it and hands its buffers over: part of the cost.
      structuredClone(chunk, { transfer: chunkBuffers(chunk) });
      for (const p of points) if (p.figures && p.figures.errorKinds.length === 0) feasible++;
      slowest = Math.max(slowest, performance.now() - chunkStart);
    }
    slowestChunk.push(slowest);
    wall.push(performance.now() - start);
    const used = process.cpuUsage(cpuStart);
    cpu.push((used.user + used.system) / 1000);
  }
  parentPort?.postMessage({ wall, cpu, slowestChunk, feasible });
});
