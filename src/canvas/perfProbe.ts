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
}

declare global {
  interface Window {
    matloomPerf?: PerfSamples;
  }
}

const enabled = typeof window !== 'undefined' && new URLSearchParams(window.location.search).has('perf');
if (enabled) window.matloomPerf = { liveReportLatency: [], liveReportCompute: [] };

export function recordPerf(kind: keyof PerfSamples, ms: number): void {
  const samples = enabled ? window.matloomPerf?.[kind] : undefined;
  if (!samples) return;
  samples.push(ms);
  if (samples.length > 5000) samples.splice(0, samples.length - 5000);
}
