/**
 * `npm run bench`: every benchmark in this folder, one after another, each in its own process so one
 * cannot warm up or slow down another. A benchmark fails the run by exiting non-zero.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const BENCHES = [
  'evaluate.bench.ts',
  'evaluateBaseline.bench.ts',
  'layoutChecks.bench.ts',
  'evaluateCold.bench.ts',
  'sweep.bench.ts',
  'repair.bench.ts',
  'cliStart.bench.ts',
];

let failed = false;
for (const name of BENCHES) {
  const path = fileURLToPath(new URL(`./${name}`, import.meta.url));
  if (!existsSync(path)) {
    console.log(`(${name} not present, skipped)`);
    continue;
  }
  console.log(`\n== ${name}`);
  const result = spawnSync(process.execPath, ['--import', 'tsx', path], { stdio: 'inherit' });
  if (result.status !== 0) failed = true;
}
process.exit(failed ? 1 : 0);
