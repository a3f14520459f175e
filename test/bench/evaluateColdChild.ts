/**
 * One fresh process for evaluateCold.bench.ts: times the first three evaluate() calls, prints wall and
 * CPU times (ms) as JSON. Each call gets a different 4,096-mat design (cells per bit line 512, 256, 384:
 * other mat kinds, other physics), built before the first call, so that no result kept from an earlier
 * call can answer a later one; only what the engine and V8 learnt on the way carries over. CPU time is
 * the whole process's (V8's compiler and collector threads included), read around each call; GC is the
 * collector's pauses on this thread during the call (part of the wall time), as V8 reports them.
 *
 * With the argument `--debt-paid` (and Node's --expose-gc) the work left over from building three designs
 * is done before the first call: a full collection (copying them out of the young generation, finishing
 * the marking their growth started), then IDLE_MS of idle time, in which V8's background compiles of the
 * code that built them (the floorplan generator, the module loader) finish, then another full
 * collection. Without it, call 1 also pays for that: both are printed.
 */
import { performance, PerformanceObserver } from 'node:perf_hooks';
import { evaluate } from '../../src/engine/evaluation/evaluate';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith } from '../support/designs';
import { benchGridSpec } from './benchGrid';

const designs = [512, 256, 384].map((cellsPerBitline) =>
  designWith(
    gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      ...benchGridSpec(64, cellsPerBitline),
    }),
  ),
);
// Garbage-collection pauses of this process (ms), as V8 reports them; read around each call.
let gcTotal = 0;
const gcWatch = new PerformanceObserver((list) => {
  for (const entry of list.getEntries()) gcTotal += entry.duration;
});
gcWatch.observe({ entryTypes: ['gc'] });
/** Lets the observer deliver the pauses so far (entries arrive in a later task). */
const settle = () => new Promise((resolve) => setTimeout(resolve, 0));

/** Idle time (ms) before call 1 with `--debt-paid`: the harness's background compiles take 8–33 ms each. */
const IDLE_MS = 250;
if (process.argv.includes('--debt-paid')) {
  const gc = (globalThis as { gc?: () => void }).gc;
  if (!gc) throw new Error('--debt-paid needs node --expose-gc');
  gc();
  await new Promise((resolve) => setTimeout(resolve, IDLE_MS));
  gc();
}
const times: number[] = [];
const cpu: number[] = [];
const gc: number[] = [];
let bits = 0;
for (const design of designs) {
  await settle();
  const gcBefore = gcTotal;
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  bits += evaluate(design).totals.bits;
  times.push(performance.now() - start);
  const used = process.cpuUsage(cpuStart);
  cpu.push((used.user + used.system) / 1000);
  await settle();
  gc.push(gcTotal - gcBefore);
}
gcWatch.disconnect();
if (bits === 0) throw new Error('evaluate() returned no bits');
console.log(JSON.stringify({ times, cpu, gc }));
