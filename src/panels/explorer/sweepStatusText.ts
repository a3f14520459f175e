import type { SweepRun } from '../../store/exploreStore';
import { formatQuantity, formatWholeNumber } from '../../model/units';

/** What the sweep is doing, in words; the status line and the screen-reader announcement share it. */
export function sweepStatusText(run: SweepRun): string {
  const n = formatWholeNumber;
  switch (run.status) {
    case 'idle':
      return 'No sweep yet.';
    case 'running':
      return `Sweeping… ${n(run.done)} of ${n(run.total)} points`;
    case 'cancelled':
      return `Cancelled after ${n(run.done)} of ${n(run.total)} points.`;
    case 'failed':
      return `The sweep failed: ${run.error ?? 'unknown error'}`;
    case 'done':
      return `${n(run.total)} points in ${formatQuantity(run.elapsed ?? 0, 'time', 3)}`;
  }
}

/**
 * The announcement for a screen reader: said when the sweep starts and when it ends, not at every
 * progress step (that would talk over everything else).
 */
export function sweepAnnouncement(
  run: SweepRun,
  feasible: number,
  onFront: number,
  whyInfeasible: readonly string[] = [],
): string {
  const n = formatWholeNumber;
  switch (run.status) {
    case 'idle':
      return '';
    case 'running':
      return 'Sweep started.';
    case 'done':
      return [
        `Sweep done: ${n(run.total)} points, ${n(feasible)} feasible, ${n(onFront)} on the Pareto front.`,
        ...whyInfeasible,
      ].join(' ');
    default:
      return sweepStatusText(run);
  }
}
