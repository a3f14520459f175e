import type { PreviewBase } from '../engine';
import type { AppStore } from '../store/appStore';
import { loadEditPath, loadedEditPath } from '../store/editPathOnDemand';
import { setLiveReport, useLiveReport } from '../store/liveReport';
import { sameVisibleFigures } from './sameFigures';
import type { Gesture } from './gestures/gesture';
import { recordPerf } from './perfProbe';

/**
 * Keeps the figures in step with a drag: at most once per animation frame it asks the gesture what it
 * would change and publishes the engine's live preview report, which only re-evaluates the changed
 * blocks and their neighbours (engine/editPath.ts, loaded after the first paint). The report is ephemeral
 * and is cleared when the gesture ends.
 */
export class LiveReportLoop {
  private base: PreviewBase | null = null;
  private frame: number | null = null;
  private gesture: Gesture | null = null;
  private eventTime = 0;

  constructor(private readonly app: AppStore) {}

  /** The gesture moved; `eventTime` is the pointer event's time stamp (ms). */
  schedule(gesture: Gesture, eventTime: number): void {
    this.gesture = gesture;
    this.eventTime = eventTime;
    if (this.frame !== null) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = null;
      this.publish();
    });
  }

  private publish(): void {
    const gesture = this.gesture;
    if (!gesture) return;
    const changed = gesture.changedBlocks();
    if (!changed) {
      setLiveReport(null);
      return;
    }
    const path = loadedEditPath();
    if (!path) {
      // Just after the first paint: the figures from before the drag stay until the edit path has
      // loaded; the next pointer move after that shows the preview.
      loadEditPath().catch(() => undefined);
      return;
    }
    const start = performance.now();
    const s = this.app.getState();
    this.base ??= path.preparePreview(s.history.present, s.report, gesture.hiddenIds);
    const next = path.previewReport(this.base, changed);
    // Panels re-render only when a figure or a finding they show has changed.
    const shown = useLiveReport.getState().report ?? s.report;
    if (!sameVisibleFigures(shown, next, s.selectedIds)) setLiveReport(next);
    const end = performance.now();
    recordPerf('liveReportCompute', end - start);
    recordPerf('liveReportLatency', end - this.eventTime);
  }

  stop(): void {
    if (this.frame !== null) cancelAnimationFrame(this.frame);
    this.frame = null;
    this.base = null;
    this.gesture = null;
    setLiveReport(null);
  }
}
