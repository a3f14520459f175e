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
 *
 * PROFILE=1 also takes a CPU profile of the page's main thread over each run (the profiler slows the
 * page, so the times printed then are not the bench's), writes the last one to
 * /tmp/matloom-sweep.cpuprofile and prints where the time went (build with `npx vite build --minify
 * false` to keep the names).
 */
import { writeFileSync } from 'node:fs';
import type { CDPSession } from '@playwright/test';
import { base, launchChromium, startServer } from './benchPage';
import { profiled, summarise, type Profile } from './cpuProfile';
import { prepareSweepPage, runSweepToPaint, SWEEP_TIMES_SCRIPT, TARGET_POINTS } from './sweepPage';
import { benchLine, HEADER, loadAverage, stats } from './paintTiming';

const RUNS = Number(process.env.SWEEP_RUNS ?? 5);
const PROFILE = process.env.PROFILE === '1';
const GOAL_TOTAL_MS = 500;
const GOAL_MAIN_THREAD_MS = 100;

/**
 * The main thread's task time (TaskDuration: wall time inside its tasks, what the goal counts) and its
 * CPU time (ThreadTime: less disturbed by other processes on a busy machine), both in ms.
 */
async function mainThreadMs(cdp: CDPSession): Promise<{ tasks: number; cpu: number }> {
  const { metrics } = (await cdp.send('Performance.getMetrics')) as {
    metrics: { name: string; value: number }[];
  };
  const ms = (name: string) => (metrics.find((m) => m.name === name)?.value ?? Number.NaN) * 1000;
  return { tasks: ms('TaskDuration'), cpu: ms('ThreadTime') };
}

async function main() {
  const server = await startServer();
  const browser = await launchChromium();
  const totals: number[] = [];
  const mainThread: number[] = [];
  const mainThreadCpu: number[] = [];
  const workerSweep: number[] = [];
  let points = 0;
  let profile: Profile | null = null;
  try {
    for (let r = 0; r < RUNS; r++) {
      const context = await browser.newContext({ viewport: { width: 1400, height: 860 } });
      const page = await context.newPage();
      await page.goto(`${base}/`);
      points = await prepareSweepPage(page);
      await page.evaluate(SWEEP_TIMES_SCRIPT);
      const cdp = await context.newCDPSession(page);
      await cdp.send('Performance.enable');
      const before = await mainThreadMs(cdp);
      const sweep = () => runSweepToPaint(page);
      if (PROFILE) profile = await profiled(cdp, sweep);
      else await sweep();
      const after = await mainThreadMs(cdp);
      const t = (await page.evaluate('window.__sweepTimes')) as {
        start: number;
        painted: number;
        workerSweep: number;
      };
      totals.push(t.painted - t.start);
      workerSweep.push(t.workerSweep);
      mainThread.push(after.tasks - before.tasks);
      mainThreadCpu.push(after.cpu - before.cpu);
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
  // The same span's CPU time of the main thread (no goal of its own: a check on the line above when the
  // machine is busy, where task times also count the time other processes held the core).
  console.log(benchLine(`sweep, ${n} points: main-thread CPU in that time`, stats(mainThreadCpu), {}));
  // Part of the total, no goal of its own: from the worker's start message to the end of its sweep (the
  // chart model and points picture it then builds for the page are not in it).
  console.log(benchLine(`sweep, ${n} points: the worker's own sweep`, stats(workerSweep), {}));
  console.log(`load average at the end ${loadAverage()}`);
  if (profile) {
    writeFileSync('/tmp/matloom-sweep.cpuprofile', JSON.stringify(profile));
    console.log('CPU profile of the last run (main thread) in /tmp/matloom-sweep.cpuprofile');
    summarise(profile);
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
