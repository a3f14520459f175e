/**
 * In-page timing for the canvas benches: times are taken at the next paint, not at the first
 * animation frame. A frame's work (our rAF callbacks and Konva's batched draws) runs in the animation
 * frame; the browser then paints; a task posted from the animation frame (MessageChannel) runs after
 * that paint. So "paint mark" = the time that task runs, and a frame lasts from one paint mark to the
 * next. An edit is timed from the input event to the paint mark of the first frame after it.
 *
 * The functions run inside the page; they are passed as text because tsx compiles functions with
 * helpers that do not exist in the page.
 */
import { loadavg } from 'node:os';
import type { Page } from '@playwright/test';

/** Installs window.__paint: a loop that records a paint mark every frame while recording is on. */
export const PAINT_MARKS_SCRIPT = `(() => {
  if (window.__paint) return;
  const channel = new MessageChannel();
  const state = { marks: [], recording: false, waiters: [] };
  channel.port1.onmessage = () => {
    const now = performance.now();
    if (state.recording) state.marks.push(now);
    const waiters = state.waiters.splice(0);
    for (const w of waiters) w(now);
  };
  const frame = () => {
    channel.port2.postMessage(0);
    requestAnimationFrame(frame);
  };
  requestAnimationFrame(frame);
  window.__paint = state;
  /** Resolves with the paint mark of the first frame that starts after this call. */
  window.__nextPaint = () => new Promise((resolve) => {
    requestAnimationFrame(() => state.waiters.push(resolve));
  });
})()`;

export async function installPaintMarks(page: Page): Promise<void> {
  await page.evaluate(PAINT_MARKS_SCRIPT);
}

export async function startRecording(page: Page): Promise<void> {
  await page.evaluate('(() => { window.__paint.marks = []; window.__paint.recording = true; })()');
}

/** Frame durations (ms) between consecutive paint marks since startRecording. */
export async function stopRecording(page: Page): Promise<number[]> {
  return page.evaluate(`(() => {
    const p = window.__paint;
    p.recording = false;
    // Two marks under 1 ms apart are one paint whose task ran late behind input: count it once.
    const d = [];
    let last = p.marks[0];
    for (let i = 1; i < p.marks.length; i++) {
      if (p.marks[i] - last < 1) continue;
      d.push(p.marks[i] - last);
      last = p.marks[i];
    }
    return d;
  })()`);
}

/**
 * Arms a one-shot timer: the next `eventType` event on window (capture phase, so before the app's own
 * handlers) starts it, the paint mark of the first frame after the app handled the event stops it.
 * Read the result with {@link armedResult}.
 */
export async function armEditTimer(page: Page, eventType: string): Promise<void> {
  await page.evaluate(`(() => {
    window.__edit = NaN;
    window.addEventListener(${JSON.stringify(eventType)}, () => {
      const start = performance.now();
      // The app handles the event synchronously after this listener; the frame after it paints it.
      window.__nextPaint().then((at) => { window.__edit = at - start; });
    }, { once: true, capture: true });
  })()`);
}

export async function armedResult(page: Page): Promise<number> {
  await page.waitForFunction('!Number.isNaN(window.__edit)', undefined, { timeout: 30_000 });
  return Number(await page.evaluate('window.__edit'));
}

export interface Stats {
  readonly runs: number;
  readonly min: number;
  readonly median: number;
  readonly p95: number;
  readonly max: number;
}

export function stats(samples: readonly number[]): Stats {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
  return {
    runs: sorted.length,
    min: sorted[0] ?? NaN,
    median: at(0.5),
    p95: at(0.95),
    max: sorted[sorted.length - 1] ?? NaN,
  };
}

export function loadAverage(): string {
  return loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');
}

/** Goals a line is checked against (ms); undefined where the line has no goal. */
export interface Goal {
  readonly median?: number;
  readonly p95?: number;
}

const fmt = (n: number) => (Number.isFinite(n) ? n.toFixed(1) : '—').padStart(7);

export const HEADER =
  `${'measurement'.padEnd(52)} ${'runs'.padStart(5)} ${'min'.padStart(7)} ${'median'.padStart(7)} ` +
  `${'p95'.padStart(7)} ${'max'.padStart(7)}  goal                      load`;

/** One bench line: what, how many runs, min / median / p95 / max (ms), the goal and whether it held. */
export function benchLine(label: string, s: Stats, goal: Goal): string {
  const parts: string[] = [];
  let met = true;
  if (goal.median !== undefined) {
    parts.push(`median ≤ ${goal.median}`);
    met &&= s.median <= goal.median;
  }
  if (goal.p95 !== undefined) {
    parts.push(`p95 ≤ ${goal.p95}`);
    met &&= s.p95 <= goal.p95;
  }
  const verdict = parts.length === 0 ? '(no goal)' : `${parts.join(', ')}: ${met ? 'met' : 'NOT met'}`;
  return (
    `${label.padEnd(52)} ${String(s.runs).padStart(5)} ${fmt(s.min)} ${fmt(s.median)} ${fmt(s.p95)} ` +
    `${fmt(s.max)}  ${verdict.padEnd(25)} ${loadAverage()}`
  );
}
