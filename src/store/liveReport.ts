import { create } from 'zustand';
import type { Report } from '../engine';
import { useAppStore } from './useAppStore';

/**
 * The report of a gesture in progress (a drag or a resize), computed by the canvas with the engine's
 * live preview on each animation frame. It is ephemeral: it never enters the document or its history,
 * and it is cleared when the gesture commits or is cancelled.
 */
export const useLiveReport = create<{ readonly report: Report | null }>()(() => ({ report: null }));

export function setLiveReport(report: Report | null): void {
  if (useLiveReport.getState().report !== report) useLiveReport.setState({ report });
}

/** The report panels show: the live one during a gesture, the document's otherwise. */
export function useShownReport(): Report {
  const live = useLiveReport((s) => s.report);
  const committed = useAppStore((s) => s.report);
  return live ?? committed;
}
