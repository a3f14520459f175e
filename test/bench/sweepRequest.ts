import { demoDesign } from '../../src/designs/demoDesign';
import { steppedValues, sweepSize, type SweepRequest } from '../../src/explore/sweep';
import { DEFAULT_SPARE_SWEEP, defaultSweepSettings, sweepRequestFor } from '../../src/explore/sweepSettings';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';
import { DEMO_STRIPS } from '../../src/designs/demoSizes';

/** The benchmark sweep: 32 × 18 cell counts × every built-in cell × 3 processes for a 256 Mib bank. */
export const BENCH_REQUEST: SweepRequest = {
  targetBits: 256 * 2 ** 20,
  strips: DEMO_STRIPS,
  operating: DEFAULT_OPERATING,
  cellsPerBitline: steppedValues(32, 1024, 32),
  cellsPerWordline: steppedValues(128, 2304, 128),
  cells: BUILTIN_CELLS,
  processes: BUILTIN_PROCESSES,
};

export const BENCH_POINTS = sweepSize(BENCH_REQUEST);

/** Points per chunk, as the app's worker posts them. */
export const BENCH_CHUNK = 512;

/**
 * The sweep `npm run bench:sweep` runs in Chromium (e2e/measure/sweepInBrowser.ts), built the same way:
 * the explorer's defaults on the demo design, cells per bit line 8 … 1024 by 8, and word-line counts
 * 64, 128, … until the sweep has at least 10,000 points (12,288 with the built-in cells and processes).
 */
function explorerRequest(): SweepRequest {
  const design = demoDesign();
  const settings = { ...defaultSweepSettings(design), cellsPerBitline: { from: 8, to: 1024, step: 8 } };
  const withCounts = (counts: number) =>
    sweepRequestFor({ ...settings, cellsPerWordline: { from: 64, to: 64 * counts, step: 64 } }, design);
  const perWordlineCount = sweepSize(withCounts(2)) / 2;
  return withCounts(Math.max(1, Math.ceil(10_000 / perWordlineCount)));
}

export const EXPLORER_REQUEST: SweepRequest = explorerRequest();
export const EXPLORER_POINTS = sweepSize(EXPLORER_REQUEST);

/**
 * A sweep with spares, as the explorer makes it when the spare sweep is on (0 … 4 spare rows × 0 … 4
 * spare columns, 25 pairs per partition) on the demo design, with cell counts 64 … 1024 by 128 per bit
 * line and 128 … 2048 by 256 per word line (a quarter of the explorer's default grid, so a run takes
 * seconds, not half a minute).
 */
function spareRequest(): SweepRequest {
  const design = demoDesign();
  return sweepRequestFor(
    {
      ...defaultSweepSettings(design),
      cellsPerBitline: { from: 64, to: 1024, step: 128 },
      cellsPerWordline: { from: 128, to: 2048, step: 256 },
      spares: DEFAULT_SPARE_SWEEP,
    },
    design,
  );
}

export const SPARE_REQUEST: SweepRequest = spareRequest();
export const SPARE_POINTS = sweepSize(SPARE_REQUEST);
