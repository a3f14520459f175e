/**
 * evaluate() cold: the first three calls on 4,096-mat floorplans in a fresh Node process (no JIT
 * warm-up; a different design each call, see evaluateColdChild.ts), over several processes (`npm run
 * bench`). Goal: each of the first three calls ≤ 15 ms.
 * Prints load average, process count, min and median per call (wall), CPU time of the whole process
 * (V8 compiles on other threads, so CPU can exceed wall) and the collector's pauses within each call;
 * never fails the build. Two runs of processes: as the process finds itself after building the designs,
 * and with the collector's and the compiler's work left from building them done before call 1 (a full
 * collection, idle time for V8's background compiles, another collection; see evaluateColdChild.ts),
 * which shows what evaluate() itself costs cold; the first is what a caller that has just built a large
 * design waits for.
 */
import { spawnSync } from 'node:child_process';
import { cpus, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';

const PROCESSES = 7;
const GOAL_MS = 15;
const CHILD = fileURLToPath(new URL('./evaluateColdChild.ts', import.meta.url));

const median = (v: readonly number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)] ?? NaN;
const loadNow = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

/** Runs the child PROCESSES times (each a fresh process) and prints calls 1–3. */
function measure(title: string, nodeOptions: readonly string[], childOptions: readonly string[]): void {
  const loadBefore = loadNow();
  const calls: number[][] = [[], [], []];
  const cpuCalls: number[][] = [[], [], []];
  const gcCalls: number[][] = [[], [], []];
  for (let p = 0; p < PROCESSES; p++) {
    const child = spawnSync(process.execPath, [...nodeOptions, '--import', 'tsx', CHILD, ...childOptions], {
      encoding: 'utf8',
    });
    if (child.status !== 0) throw new Error(`cold child failed: ${child.stderr}`);
    const { times, cpu, gc } = JSON.parse(child.stdout.trim().split('\n').pop() ?? '{}') as {
      times: number[];
      cpu: number[];
      gc: number[];
    };
    times.forEach((t, i) => calls[i]?.push(t));
    cpu.forEach((t, i) => cpuCalls[i]?.push(t));
    gc.forEach((t, i) => gcCalls[i]?.push(t));
  }
  console.log(`${title} (${cpus().length} CPUs, load before ${loadBefore}, after ${loadNow()})`);
  calls.forEach((times, i) => {
    const med = median(times);
    console.log(
      `cold call ${i + 1}: ${PROCESSES} processes  min ${Math.min(...times).toFixed(1)} ms  median ` +
        `${med.toFixed(1)} ms  (goal ≤ ${GOAL_MS} ms: ${med <= GOAL_MS ? 'met' : 'NOT met'}); ` +
        `CPU min ${Math.min(...(cpuCalls[i] ?? [])).toFixed(1)} ms, median ${median(cpuCalls[i] ?? []).toFixed(1)} ms ` +
        `(all threads); GC pauses median ${median(gcCalls[i] ?? []).toFixed(1)} ms`,
    );
  });
}

measure('evaluate() cold, 4,096 mats, first three calls in a fresh process, a different design each', [], []);
measure(
  "evaluate() cold, the same, with the collector's and compiler's work left from building the designs done before call 1",
  ['--expose-gc'],
  ['--debt-paid'],
);
