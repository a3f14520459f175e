/** One fresh process for evaluateCold.bench.ts: times the first three evaluate() calls, prints wall and CPU times (ms) as JSON. */
import { performance } from 'node:perf_hooks';
import { evaluate } from '../../src/engine/evaluation/evaluate';
import { gridFloorplan } from '../../src/designs/gridFloorplan';
import { DEMO_PROCESS, FOLDED_8F2_CELL } from '../../src/model/builtins';
import { designWith } from '../support/designs';

const design = designWith(
  gridFloorplan({
    cell: FOLDED_8F2_CELL,
    featureSize: DEMO_PROCESS.featureSize,
    matRows: 64,
    matColumns: 64,
    cellsPerBitline: 512,
    cellsPerWordline: 512,
    senseAmpStripHeight: 6e-6,
    wordlineDriverStripWidth: 3e-6,
    rowDecoderWidth: 18e-6,
    columnDecoderHeight: 14e-6,
  }),
);
const times: number[] = [];
const cpu: number[] = [];
let bits = 0;
for (let i = 0; i < 3; i++) {
  const cpuStart = process.cpuUsage();
  const start = performance.now();
  bits += evaluate(design).totals.bits;
  times.push(performance.now() - start);
  const used = process.cpuUsage(cpuStart);
  cpu.push((used.user + used.system) / 1000);
}
if (bits === 0) throw new Error('evaluate() returned no bits');
console.log(JSON.stringify({ times, cpu }));
