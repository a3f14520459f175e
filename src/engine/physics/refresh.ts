/**
 * Refresh interval between commands: tREFI = tREFW / commands per window.
 * Source: JEDEC JESD79-3 / JESD79-4 and the Micron DDR3 SDRAM datasheet refresh table
 * ("64 ms / 8192 = 7.8 µs") (published).
 */
export function refreshInterval(refreshWindow: number, commandsPerWindow: number): number {
  return refreshWindow / commandsPerWindow;
}

/** Rows each refresh command must cover: ⌈rows / commands per window⌉ (64 K rows / 8192 = 8). */
export function rowsPerRefreshCommand(rows: number, commandsPerWindow: number): number {
  return Math.ceil(rows / commandsPerWindow);
}

/**
 * Refresh cycle time: the rows of one command go in groups of `rowsInParallel`, one row cycle each:
 *   tRFC = ⌈rows per command / rows in parallel⌉ · tRC. Common practice (no source).
 */
export function refreshCycleTime(
  rowsPerCommand: number,
  rowsInParallel: number,
  rowCycleTime: number,
): number {
  return Math.ceil(rowsPerCommand / rowsInParallel) * rowCycleTime;
}

/**
 * Share of time the array is busy refreshing: tRFC / tREFI.
 * Source: Micron DDR3 SDRAM datasheet (tRFC and tREFI tables) (published).
 */
export function refreshBusyFraction(refreshCycle: number, interval: number): number {
  return refreshCycle / interval;
}

/** Average refresh power: every row's activation energy once per window, P = Σ E_row / tREFW (W). */
export function refreshPower(energyOfAllRows: number, refreshWindow: number): number {
  return energyOfAllRows / refreshWindow;
}
