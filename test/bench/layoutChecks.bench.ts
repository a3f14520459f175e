/**
 * Speed of the layout checks (decoder reach, back-to-back strips) and of a commit on the generated
 * 256 × 256-mat demo floorplan (`npm run bench`), run alternately: the checks of the whole design (what
 * every commit and every live-preview frame ran before the checks followed edits) as evaluate() runs
 * them (with its block runs) and on the general path (no runs), a one-mat move
 * committed through editReport() (which now checks again only around the moved mat), and evaluate() of
 * the moved design. Prints load, runs, min, median (wall and process CPU); never fails on time, because
 * timing depends on the machine. Fails if the commit's findings differ from evaluate()'s, or the checks
 * from the first implementation kept in test/support/layoutOracle.
 */
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { isDeepStrictEqual } from 'node:util';
import { generatedDemoGrid } from '../../src/designs/demoDesign';
import { editReport } from '../../src/engine/evaluation/editReport';
import { evaluate, evaluationNeighbours } from '../../src/engine/evaluation/evaluate';
import { layoutFindings, layoutState } from '../../src/engine/evaluation/layoutFindings';
import { blockTable } from '../../src/geometry/blockTable';
import { placedDesign } from '../../src/geometry/placedIndex';
import type { Design } from '../../src/model/design';
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

function timeOnce(work: () => unknown): [number, number] {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  work();
  const wall = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  return [wall, (cpu.user + cpu.system) / 1000];
}

const design = generatedDemoGrid(SIDE, SIDE);
const table = blockTable(design);
const report = evaluate(design);
const { mats } = report;
// The block runs evaluate() hands the checks (its neighbour pass cuts them), as evaluate() runs them; the
// same checks without runs are the path of floorplans not laid out in rows.
const runs = evaluationNeighbours(table).runs;
const checksAsEvaluateRunsThem = () => layoutState(table, mats, undefined, runs).findings;
const expected = oracleLayoutFindings(table, mats);
if (
  !isDeepStrictEqual(layoutFindings(table, mats), expected) ||
  !isDeepStrictEqual([...checksAsEvaluateRunsThem()], expected)
) {
  console.error('layout checks disagree with the oracle');
  process.exit(1);
}
placedDesign(design);
/** The middle mat moved by `dx` (m): an edit in place of one block, as a drag commits it. */
const middle = design.blocks.findIndex((b) => b.id === `mat-r${SIDE / 2}c${SIDE / 2}`);
function moved(dx: number): Design {
  const blocks = design.blocks.slice();
  const b = blocks[middle];
  if (!b) throw new Error('no middle mat');
  blocks[middle] = { ...b, x: b.x + dx };
  return { ...design, blocks };
}
const check = moved(5e-6);
const full = evaluate(check);
const committed = editReport(design, report, check, [middle]);
if (
  !isDeepStrictEqual(
    committed.findings.map((f) => f.message).sort(),
    full.findings.map((f) => f.message).sort(),
  )
) {
  console.error('the commit disagrees with evaluate()');
  process.exit(1);
}

const lines = { whole: [[], []], general: [[], []], commit: [[], []], evaluate: [[], []] } as Record<
  string,
  [number[], number[]]
>;
const record = (name: string, [wall, cpu]: [number, number]) => {
  lines[name]?.[0].push(wall);
  lines[name]?.[1].push(cpu);
};
for (let r = 0; r < RUNS; r++) {
  record('whole', timeOnce(checksAsEvaluateRunsThem));
  record(
    'general',
    timeOnce(() => layoutFindings(table, mats)),
  );
  const next = moved((r + 1) * 1e-7);
  record(
    'commit',
    timeOnce(() => editReport(design, report, next, [middle])),
  );
  record(
    'evaluate',
    timeOnce(() => evaluate(next)),
  );
}
const load = loadavg()
  .map((l) => l.toFixed(2))
  .join(' ');
console.log(`layout checks and a one-mat commit, ${mats.count} mats, ${table.count} blocks; load ${load}`);
const labels: Record<string, string> = {
  whole: 'layout checks of the whole design, with the block runs evaluate() passes',
  general: 'the same without runs (floorplans not laid out in rows)',
  commit: 'commit of a one-mat move (editReport)',
  evaluate: 'evaluate() of the moved design',
};
for (const [name, [w, c]] of Object.entries(lines)) {
  console.log(
    `  ${labels[name] ?? name}: runs ${w.length}, wall min ${Math.min(...w).toFixed(1)} ms, ` +
      `median ${median(w).toFixed(1)} ms; CPU min ${Math.min(...c).toFixed(1)} ms, median ${median(c).toFixed(1)} ms`,
  );
}
