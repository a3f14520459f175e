import type { SweepRun } from '../../store/exploreStore';
import { useExploreStore } from '../../store/useExploreStore';
import { sweepStatusText } from './sweepStatusText';

/**
 * The progress bar and status words of a sweep. The bar follows the progress the worker reports with
 * every chunk; it is scaled on its own compositing layer, so moving it repaints and lays out nothing.
 * The words change with the chart's updates (a few times a second): new text means layout and paint.
 */
export function SweepProgress({ run, counts }: { readonly run: SweepRun; readonly counts: string }) {
  const progress = useExploreStore((s) => s.progress);
  const live = run.status === 'running' ? { ...run, done: progress.done, total: progress.total } : run;
  const percent = live.total > 0 ? Math.round((live.done / live.total) * 100) : 0;
  return (
    <>
      <div
        className="progress"
        role="progressbar"
        aria-label="Sweep progress"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
      >
        <div
          className="progress-bar"
          style={{ transform: `scaleX(${percent / 100})` }}
          data-testid="sweep-progress"
        />
      </div>
      <span>
        {sweepStatusText(run)}
        {counts}
      </span>
    </>
  );
}
