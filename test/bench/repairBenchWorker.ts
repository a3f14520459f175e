// Runs inside a Node worker thread: the same chunked loop as the app's Web Worker (src/explore/repairWorker.ts).
import { parentPort } from 'node:worker_threads';
import { RepairSimulation } from '../../src/engine/physics/repairMonteCarlo';
import { runRepairChunks, type RepairReport } from '../../src/explore/repairProtocol';
import { BENCH_REPAIR_REQUEST, BENCH_TRIALS } from './repairRequest';

parentPort?.on('message', (runs: number) => {
  const times: number[] = [];
  let last: RepairReport | undefined;
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    runRepairChunks(
      { type: 'start', runId: r, request: BENCH_REPAIR_REQUEST, trials: BENCH_TRIALS },
      // The worker posts each report; a structured clone of it is part of the cost.
      (message) => (last = structuredClone(message)),
      new RepairSimulation(BENCH_REPAIR_REQUEST),
    );
    times.push(performance.now() - start);
  }
  parentPort?.postMessage({ times, last });
});
