/**
 * A DevTools trace of one sweep (Run click to painted result), summarised: the main thread's time by
 * trace event (script, style, layout, paint, collection, message handling) and how many of each ran.
 * For finding where the sweep bench's main-thread time goes; not a bench (tracing slows the page).
 *
 *   E2E_PORT=4213 npx tsx e2e/measure/traceSweep.ts   (BENCH_DIST=<dir> for another build)
 */
import { writeFileSync } from 'node:fs';
import { base, launchChromium, startServer } from './benchPage';
import { prepareSweepPage, runSweepToPaint, SWEEP_TIMES_SCRIPT } from './sweepPage';

interface TraceEvent {
  readonly name: string;
  readonly ph: string;
  readonly ts: number;
  readonly dur?: number;
  /** Thread (CPU) time of the event, µs. */
  readonly tdur?: number;
  readonly pid: number;
  readonly tid: number;
  readonly args?: { readonly name?: string };
}

async function main() {
  const server = await startServer();
  const browser = await launchChromium();
  try {
    const context = await browser.newContext({ viewport: { width: 1400, height: 860 } });
    const page = await context.newPage();
    await page.goto(`${base}/`);
    const points = await prepareSweepPage(page);
    await page.evaluate(SWEEP_TIMES_SCRIPT);
    const cdp = await context.newCDPSession(page);
    const events: TraceEvent[] = [];
    cdp.on('Tracing.dataCollected', (data) => {
      events.push(...(data.value as unknown as TraceEvent[]));
    });
    const complete = new Promise<void>((resolve) => cdp.once('Tracing.tracingComplete', () => resolve()));
    await cdp.send('Tracing.start', {
      categories: 'devtools.timeline,v8,disabled-by-default-devtools.timeline,blink.user_timing',
      transferMode: 'ReportEvents',
    });
    await runSweepToPaint(page);
    await cdp.send('Tracing.end');
    await complete;
    writeFileSync('/tmp/matloom-sweep-trace.json', JSON.stringify({ traceEvents: events }));
    const main = events.find((e) => e.name === 'thread_name' && e.args?.name === 'CrRendererMain');
    if (!main) throw new Error('no renderer main thread in the trace');
    const onMain = events.filter((e) => e.pid === main.pid && e.tid === main.tid && e.ph === 'X');
    // Self time per event name: an event's duration less its children's on the same thread.
    onMain.sort((a, b) => a.ts - b.ts || (b.dur ?? 0) - (a.dur ?? 0));
    const self = new Map<string, { ms: number; count: number }>();
    const stack: { e: TraceEvent; end: number; child: number }[] = [];
    const close = (upTo: number) => {
      while (stack.length > 0 && (stack.at(-1)?.end ?? 0) <= upTo) {
        const top = stack.pop();
        if (!top) break;
        const entry = self.get(top.e.name) ?? { ms: 0, count: 0 };
        entry.ms += ((top.e.dur ?? 0) - top.child) / 1000;
        entry.count++;
        self.set(top.e.name, entry);
        const parent = stack.at(-1);
        if (parent) parent.child += top.e.dur ?? 0;
      }
    };
    for (const e of onMain) {
      close(e.ts);
      stack.push({ e, end: e.ts + (e.dur ?? 0), child: 0 });
    }
    close(Infinity);
    const tasks = onMain.filter((e) => e.name === 'RunTask');
    const taskMs = tasks.reduce((sum, e) => sum + (e.dur ?? 0), 0) / 1000;
    // CPU time: on a busy machine a task's wall time also counts the time other processes held the core.
    const taskCpuMs = tasks.reduce((sum, e) => sum + (e.tdur ?? 0), 0) / 1000;
    console.log(
      `${points} points; ${tasks.length} main-thread tasks, ${taskMs.toFixed(0)} ms (CPU ${taskCpuMs.toFixed(0)} ms); self time by event:`,
    );
    for (const [name, { ms, count }] of [...self].sort((a, b) => b[1].ms - a[1].ms).slice(0, 25))
      console.log(`${ms.toFixed(1).padStart(8)} ms ${String(count).padStart(6)}×  ${name}`);
    console.log('trace in /tmp/matloom-sweep-trace.json');
    await context.close();
  } finally {
    await browser.close();
    server?.kill();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
