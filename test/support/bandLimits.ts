import type { BandLimits } from '../../src/geometry/bandedPairs';
import { BLOCK_TYPE_CODES, MAT_CODE } from '../../src/geometry/blockTable';

/** No fallback to the grid: the banded pass cuts runs on whatever boxes a test gives it. */
export const ANY_BOXES: BandLimits = {
  minRunLength: 0,
  runPairsPerRun: Infinity,
  visitsPerBlock: Infinity,
  repeatWalks: true,
};

/** The same, with every pair of runs walked (no pair repeats an earlier one's): the oracle of the repeats. */
export const NO_REPEATS: BandLimits = { ...ANY_BOXES, repeatWalks: false };

/** The group of each block type code as evaluate() groups them: 1 for mats, 0 for every other block. */
export const MAT_GROUP = Uint8Array.from(BLOCK_TYPE_CODES, (_, code) => (code === MAT_CODE ? 1 : 0));
