/**
 * Speed of the layout checks (decoder reach, back-to-back strips) on the generated 256 × 256-mat demo
 * floorplan (`npm run bench`): the scan-everything version kept in test/support/layoutOracle against the
 * one in src, run alternately on the same table and mat table. Prints load, runs, min, median (wall and
 * process CPU); never fails on time, because timing depends on the machine. Fails if the two disagree.
 */
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { isDeepStrictEqual } from 'node:util';
import { generatedDemoGrid } from '../../src/designs/demoDesign';
import { evaluate } from '../../src/engine/evaluation/evaluate';
import { layoutFindings } from '../../src/engine/evaluation/layoutFindings';
import type { MatTable } from '../../src/engine/evaluation/matTable';
import { blockTable, type BlockTable } from '../../src/geometry/blockTable';
import { layoutFindings as oracleLayoutFindings } from '../support/layoutOracle/layoutFindings';

const SIDE = 256;
const RUNS = 15;

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1
    ? (sorted[mid] ?? NaN)
    : ((sorted[mid - 1] ?? NaN) + (sorted[mid] ?? NaN)) / 2;
}

type Check = (table: BlockTable, mats: MatTable) => unknown;

function timeOnce(check: Check, table: BlockTable, mats: MatTable): [number, number] {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  check(table, mats);
  const wall = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  return [wall, (cpu.user + cpu.system) / 1000];
}

const design = generatedDemoGrid(SIDE, SIDE);
const table = blockTable(design);
const { mats } = evaluate(design);
if (!isDeepStrictEqual(layoutFindings(table, mats), oracleLayoutFindings(table, mats))) {
  console.error('layout checks disagree with the oracle');
  process.exit(1);
}
const walls = { old: [] as number[], new: [] as number[] };
const cpus = { old: [] as number[], new: [] as number[] };
for (let r = 0; r < RUNS; r++) {
  const [ow, oc] = timeOnce(oracleLayoutFindings, table, mats);
  walls.old.push(ow);
  cpus.old.push(oc);
  const [nw, nc] = timeOnce(layoutFindings, table, mats);
  walls.new.push(nw);
  cpus.new.push(nc);
}
const load = loadavg()
  .map((l) => l.toFixed(2))
  .join(' ');
console.log(`layout checks, ${mats.count} mats, ${table.count} blocks; load ${load}`);
for (const which of ['old', 'new'] as const) {
  const w = walls[which];
  const c = cpus[which];
  console.log(
    `  ${which === 'old' ? 'before (oracle)' : 'after'}: runs ${w.length}, wall min ${Math.min(...w).toFixed(1)} ms, ` +
      `median ${median(w).toFixed(1)} ms; CPU min ${Math.min(...c).toFixed(1)} ms, median ${median(c).toFixed(1)} ms`,
  );
}
