/**
 * `npm run evaluate` on the demo as a user waits for it, against `npm run env` (npm's own start-up,
 * which is not ours): both whole commands, run alternately so that load drifts hit both alike.
 * Goal (issue #11): evaluate's median wall time ≤ env's median + 0.25 s. The first evaluate run after a
 * source change builds the CLI bundle; that run is timed and printed on its own line (the cold case),
 * then the bundle is reused. Prints load, runs, min and median; never fails the build.
 */
import { spawnSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';

const RUNS = Number(process.env.CLI_RUNS ?? 9);
const GOAL_EXTRA_S = 0.25;
const root = fileURLToPath(new URL('../..', import.meta.url));
const DEMO = 'public/wren-demo-bank.json';
const BUNDLE = 'node_modules/.cache/matloom/evaluate.mjs';

/** Wall time (s) of one whole npm command; throws when it fails in a way a user would see. */
function timed(args: readonly string[], okCodes: readonly number[]): number {
  const start = performance.now();
  const run = spawnSync('npm', ['run', '--silent', ...args], { cwd: root, encoding: 'utf8' });
  const seconds = (performance.now() - start) / 1000;
  if (!okCodes.includes(run.status ?? -1))
    throw new Error(`npm run ${args.join(' ')} exited ${run.status}: ${run.stderr}`);
  return seconds;
}

const env = () => timed(['env'], [0]);
// Exit 1 means the design has error findings: still a full evaluation.
const evaluate = () => timed(['evaluate', '--', DEMO], [0, 1]);

const median = (v: readonly number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)] ?? NaN;
const fmt = (s: number) => `${s.toFixed(3)} s`;
const loadBefore = loadavg()
  .map((l) => l.toFixed(2))
  .join(' ');

rmSync(`${root}/${BUNDLE}`, { force: true });
const firstRun = evaluate();
const envTimes: number[] = [];
const evaluateTimes: number[] = [];
for (let i = 0; i < RUNS; i++) {
  envTimes.push(env());
  evaluateTimes.push(evaluate());
}
const load = loadavg()
  .map((l) => l.toFixed(2))
  .join(' ');
const extra = median(evaluateTimes) - median(envTimes);
console.log(
  `npm run evaluate on the demo vs npm run env, whole commands alternately (${cpus().length} CPUs, ` +
    `load before ${loadBefore}, after ${load})`,
);
console.log(`first run after a source change (builds the CLI bundle): ${fmt(firstRun)}`);
console.log(
  `npm run env:      ${RUNS} runs  min ${fmt(Math.min(...envTimes))}  median ${fmt(median(envTimes))}`,
);
console.log(
  `npm run evaluate: ${RUNS} runs  min ${fmt(Math.min(...evaluateTimes))}  median ${fmt(median(evaluateTimes))}`,
);
console.log(
  `evaluate − env (medians): ${fmt(extra)}  (goal ≤ ${GOAL_EXTRA_S} s: ${extra <= GOAL_EXTRA_S ? 'met' : 'NOT met'})`,
);
