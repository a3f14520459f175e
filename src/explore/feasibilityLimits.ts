/**
 * The chart limits a partition must meet to count as feasible, and the word-line limit the chart starts
 * with. Kept apart from the chart's data (chartData.ts) so that the explorer's store, which the first load
 * needs, does not bring the figure catalogues of partitions with it.
 */

/** Limits a partition must meet to count as feasible. */
export interface FeasibilityLimits {
  /** Least net sense margin (V). */
  readonly minMargin: number;
  /** Longest word-line delay (s). */
  readonly maxDelay: number;
}

/**
 * The word-line limit the chart starts with (s), on the 50 % delay of the slowest sub-word line. Buried-gate
 * sub-word lines of commodity DRAM take about 1–3 ns to their far end, so 3 ns keeps the dense cells' usual
 * partitions and greys out the very long word lines (common practice, no source). The user changes it in the
 * chart controls.
 */
export const DEFAULT_MAX_WORDLINE_DELAY = 3e-9;
