/**
 * Optional timing probe for the frame-time measurement script (e2e/measure/frameTimes.ts). Off unless
 * the page was opened with `?perf` in its address; then it keeps the latest samples in
 * `window.matloomPerf` for the script to read. Nothing else reads it.
 */
export interface PerfSamples {
  /** Time from a pointer event to the live report reaching the panels (ms). */
  readonly liveReportLatency: number[];
  /** Time to compute one live report (ms). */
  readonly liveReportCompute: number[];
  /** Time to paint the blocks layer once (ms). */
  readonly paintBlocks: number[];
  /** Time to paint the overlay layer once (ms). */
  readonly paintOverlay: number[];
}

declare global {
  interface Window {
    matloomPerf?: PerfSamples;
  }
}

const enabled = typeof window !== 'undefined' && new URLSearchParams(window.location.search).has('perf');
if (enabled)
  window.matloomPerf = { liveReportLatency: [], liveReportCompute: [], paintBlocks: [], paintOverlay: [] };

/** Runs `work` and records how long it took under `kind` (only when the probe is on). */
export function timed<T>(kind: keyof PerfSamples, work: () => T): T {
  if (!enabled) return work();
  const start = performance.now();
  const result = work();
  recordPerf(kind, performance.now() - start);
  return result;
}

export function recordPerf(kind: keyof PerfSamples, ms: number): void {
  const samples = enabled ? window.matloomPerf?.[kind] : undefined;
  if (!samples) return;
  samples.push(ms);
  if (samples.length > 5000) samples.splice(0, samples.length - 5000);
}
