// Limits on blocks, apart from their schema (block.ts), so that code which only computes (the partition
// planner in the sweep worker) does not load the validation library.

/** Cells on one bit line or one word line; large enough for any real mat, small enough to stay sane. */
export const MAX_CELLS_PER_LINE = 16384;
