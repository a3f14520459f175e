import { steppedValues, sweepSize, type SweepRequest } from '../../src/explore/sweep';
import { BUILTIN_CELLS, BUILTIN_PROCESSES, DEFAULT_OPERATING } from '../../src/model/builtins';

/** The benchmark sweep: 32 × 18 cell counts × 6 cells × 3 processes = 10,368 points for a 256 Mib bank. */
export const BENCH_REQUEST: SweepRequest = {
  targetBits: 256 * 2 ** 20,
  strips: {
    senseAmpStripHeight: 6e-6,
    wordlineDriverStripWidth: 3e-6,
    rowDecoderWidth: 18e-6,
    columnDecoderHeight: 14e-6,
  },
  operating: DEFAULT_OPERATING,
  cellsPerBitline: steppedValues(32, 1024, 32),
  cellsPerWordline: steppedValues(128, 2304, 128),
  cells: BUILTIN_CELLS,
  processes: BUILTIN_PROCESSES,
};

export const BENCH_POINTS = sweepSize(BENCH_REQUEST);

/** Points per chunk, as the app's worker posts them. */
export const BENCH_CHUNK = 512;
