/**
 * The design-space sweep as a user waits for it (`npm run bench:sweep`, builds first; or `npx tsx
 * e2e/measure/sweepInBrowser.ts` against an existing build; port from E2E_PORT): Debian's Chromium, the
 * production build, the app's own sweep worker. Each run opens a fresh page, sets the sweep to about
 * 10,000 points in the explorer's own fields, and clicks Run. Timed from the click to the paint of the
 * first frame after the status says done, so it counts the worker's start (a new worker per sweep), the
 * sweep itself, the points crossing to the page and the chart drawing them. Beside it, the main
 * thread's work over the same span (the DevTools protocol's TaskDuration: every task the page's main
 * thread ran, script, style, layout and paint). A measurement, not a test: it prints figures beside
 * their goals and asserts nothing.
 */
import type { CDPSession, Page } from '@playwright/test';
import { base, launchChromium, startServer } from './benchPage';
import { benchLine, HEADER, loadAverage, stats } from './paintTiming';

const RUNS = Number(process.env.SWEEP_RUNS ?? 5);
/** The goal's sweep size. */
const TARGET_POINTS = 10_000;
const GOAL_TOTAL_MS = 500;
const GOAL_MAIN_THREAD_MS = 100;

/**
 * Records the click on Run, the paint after the status turns to done, and the worker's own sweep time
 * (the elapsed seconds its done message reports; a wrapped Worker listens in) in window.__sweepTimes.
 */
const SWEEP_TIMES_SCRIPT = `(() => {
  const times = { start: NaN, painted: NaN, workerSweep: NaN };
  window.__sweepTimes = times;
  const NativeWorker = window.Worker;
  window.Worker = class extends NativeWorker {
    constructor(...args) {
      super(...args);
      this.addEventListener('message', (event) => {
        if (event.data?.type === 'done') times.workerSweep = event.data.elapsed * 1000;
      });
    }
  };
  document.querySelector('[data-testid="run-sweep"]').addEventListener('click', () => {
    times.start = performance.now();
  }, { capture: true, once: true });
  const root = document.querySelector('[data-testid="explorer"]');
  const observer = new MutationObserver(() => {
    const status = root.querySelector('[data-testid="sweep-status"]');
    if (status?.getAttribute('data-status') !== 'done') return;
    observer.disconnect();
    // The frame after the done state paints; a task posted from its animation frame runs after the paint.
    requestAnimationFrame(() => {
      const channel = new MessageChannel();
      channel.port1.onmessage = () => { times.painted = performance.now(); };
      channel.port2.postMessage(0);
    });
  });
  observer.observe(root, { attributes: true, subtree: true, childList: true, attributeFilter: ['data-status'] });
})()`;

async function setRange(page: Page, which: 'bl' | 'wl', from: number, to: number, step: number) {
  for (const [key, value] of [
    ['from', from],
    ['to', to],
    ['step', step],
  ] as const) {
    const input = page.getByTestId(`sweep-${which}-${key}`);
    await input.fill(String(value));
    await input.press('Enter');
  }
}

async function sweepSize(page: Page): Promise<number> {
  const text = (await page.getByTestId('sweep-size').textContent()) ?? '';
  return Number(text.replace(/[^\d]/g, ''));
}

/** Cells per bit line 8…1024 by 8 (128 values), then as many word-line counts as bring the size to at least 10,000. */
async function aboutTenThousand(page: Page): Promise<number> {
  await setRange(page, 'bl', 8, 1024, 8);
  // Two word-line counts (a range of one value is not a range the field takes).
  await setRange(page, 'wl', 64, 128, 64);
  const perWordlineCount = (await sweepSize(page)) / 2;
  const counts = Math.max(1, Math.ceil(TARGET_POINTS / perWordlineCount));
  await setRange(page, 'wl', 64, 64 * counts, 64);
  return sweepSize(page);
}

async function mainThreadMs(cdp: CDPSession): Promise<number> {
  const { metrics } = (await cdp.send('Performance.getMetrics')) as {
    metrics: { name: string; value: number }[];
  };
  return (metrics.find((m) => m.name === 'TaskDuration')?.value ?? Number.NaN) * 1000;
}

async function main() {
  const server = await startServer();
  const browser = await launchChromium();
  const totals: number[] = [];
  const mainThread: number[] = [];
  const workerSweep: number[] = [];
  let points = 0;
  try {
    for (let r = 0; r < RUNS; r++) {
      const context = await browser.newContext({ viewport: { width: 1400, height: 860 } });
      const page = await context.newPage();
      await page.goto(`${base}/`);
      await page.getByTestId('view-explorer').click();
      await page.getByTestId('explorer').waitFor();
      points = await aboutTenThousand(page);
      await page.evaluate(SWEEP_TIMES_SCRIPT);
      const cdp = await context.newCDPSession(page);
      await cdp.send('Performance.enable');
      const before = await mainThreadMs(cdp);
      await page.getByTestId('run-sweep').click();
      await page.waitForFunction('!Number.isNaN(window.__sweepTimes.painted)', undefined, {
        timeout: 120_000,
      });
      const after = await mainThreadMs(cdp);
      const t = (await page.evaluate('window.__sweepTimes')) as {
        start: number;
        painted: number;
        workerSweep: number;
      };
      totals.push(t.painted - t.start);
      workerSweep.push(t.workerSweep);
      mainThread.push(after - before);
      await context.close();
    }
  } finally {
    await browser.close();
    server?.kill();
  }
  const n = points.toLocaleString('en-US');
  console.log(
    'Matloom sweep in Chromium headless, production build, the app’s sweep worker (a new one per sweep).',
  );
  console.log(
    `Each run a fresh page; ${n} points (goal stated for ${TARGET_POINTS.toLocaleString('en-US')}); times in ms.`,
  );
  console.log(HEADER);
  console.log(
    benchLine(`sweep, ${n} points: Run click to painted result`, stats(totals), { median: GOAL_TOTAL_MS }),
  );
  console.log(
    benchLine(`sweep, ${n} points: main-thread work in that time`, stats(mainThread), {
      median: GOAL_MAIN_THREAD_MS,
    }),
  );
  // Part of the total, no goal of its own: from the worker's start message to its done message.
  console.log(benchLine(`sweep, ${n} points: the worker's own sweep`, stats(workerSweep), {}));
  console.log(`load average at the end ${loadAverage()}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
