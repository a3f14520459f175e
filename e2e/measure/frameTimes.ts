/**
 * Frame times of the floorplan canvas while panning and dragging a mat on a 4,096-mat floorplan,
 * measured in Debian's Chromium. This is a measurement, not a test: it prints figures and asserts
 * nothing. Run with `npm run bench:canvas` (builds first), or `npx tsx e2e/measure/frameTimes.ts`
 * against an existing build. The server port comes from E2E_PORT (default 4173).
 *
 * How: the page records the time between animation frames (requestAnimationFrame) while the script
 * feeds real mouse input through the DevTools protocol every 8 ms without waiting for the page, so
 * the browser receives input faster than it paints and every frame has work to do. The app's own
 * probe (`?perf`) adds the time from each pointer event to the live report reaching the panels.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { chromium, type CDPSession, type Page } from '@playwright/test';

const port = Number(process.env.E2E_PORT ?? 4173);
const base = `http://127.0.0.1:${port}`;
const GRID = process.env.FRAME_GRID ?? '64x64';
/** Mouse moves per gesture and the pause between them (ms). */
const MOVES = 240;
const MOVE_INTERVAL_MS = 8;

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

async function serverUp(): Promise<boolean> {
  try {
    return (await fetch(base)).ok;
  } catch {
    return false;
  }
}

/** Vite's own entry script, run with this Node so that stopping the child stops the server. */
const VITE = fileURLToPath(new URL('../../node_modules/vite/bin/vite.js', import.meta.url));

async function startServer(): Promise<ChildProcess | null> {
  if (await serverUp()) return null;
  const server = spawn(
    process.execPath,
    [VITE, 'preview', '--host', '127.0.0.1', '--port', String(port), '--strictPort'],
    { stdio: 'ignore' },
  );
  for (let i = 0; i < 100; i++) {
    if (await serverUp()) return server;
    await sleep(200);
  }
  server.kill();
  throw new Error(`vite preview did not start on port ${port}`);
}

interface Stats {
  frames: number;
  median: number;
  p95: number;
  max: number;
  over16_7: number;
}

function stats(samples: readonly number[]): Stats {
  const sorted = [...samples].sort((a, b) => a - b);
  const at = (q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? NaN;
  return {
    frames: sorted.length,
    median: at(0.5),
    p95: at(0.95),
    max: sorted[sorted.length - 1] ?? NaN,
    over16_7: sorted.filter((t) => t > 17.5).length,
  };
}

// The in-page code is passed as text: tsx compiles functions with helpers that do not exist in the page.

/** Starts recording frame deltas in the page. */
async function startFrames(page: Page): Promise<void> {
  await page.evaluate(`(() => {
    window.frameDeltas = [];
    window.recording = true;
    let last = performance.now();
    const tick = (now) => {
      window.frameDeltas.push(now - last);
      last = now;
      if (window.recording) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  })()`);
}

/** Stops recording; the first delta spans the time before recording began and is dropped. */
async function stopFrames(page: Page): Promise<number[]> {
  return page.evaluate(`(() => {
    window.recording = false;
    return window.frameDeltas.slice(1);
  })()`);
}

/** The app's probe samples since the last call (and clears them). */
interface Probe {
  latency: number[];
  compute: number[];
  paintBlocks: number[];
  paintOverlay: number[];
}

async function probe(page: Page): Promise<Probe> {
  return page.evaluate(`(() => {
    const perf = window.matloomPerf;
    const take = (a) => (a ? a.splice(0, a.length) : []);
    return {
      latency: take(perf?.liveReportLatency),
      compute: take(perf?.liveReportCompute),
      paintBlocks: take(perf?.paintBlocks),
      paintOverlay: take(perf?.paintOverlay),
    };
  })()`);
}

/** Presses at `from`, moves along `step` MOVES times at a steady pace without waiting for frames, releases. */
async function gesture(
  page: Page,
  cdp: CDPSession,
  from: { x: number; y: number },
  step: { x: number; y: number },
): Promise<{ frames: number[]; dropMs: number }> {
  const mouse = (
    type: 'mouseMoved' | 'mousePressed' | 'mouseReleased',
    x: number,
    y: number,
    buttons: number,
  ) => cdp.send('Input.dispatchMouseEvent', { type, x, y, button: 'left', buttons, clickCount: 1 });
  await mouse('mouseMoved', from.x, from.y, 0);
  await mouse('mousePressed', from.x, from.y, 1);
  await startFrames(page);
  const sent: Promise<unknown>[] = [];
  for (let i = 1; i <= MOVES; i++) {
    sent.push(mouse('mouseMoved', from.x + step.x * i, from.y + step.y * i, 1));
    await sleep(MOVE_INTERVAL_MS);
  }
  await Promise.all(sent);
  const frames = await stopFrames(page);
  // The release commits the gesture (one command, a full evaluation): time it to the next frame.
  await page.evaluate(`(() => {
    window.dropMs = NaN;
    window.addEventListener('pointerup', () => {
      const start = performance.now();
      requestAnimationFrame(() => { window.dropMs = performance.now() - start; });
    }, { once: true, capture: true });
  })()`);
  await mouse('mouseReleased', from.x + step.x * MOVES, from.y + step.y * MOVES, 0);
  await sleep(700);
  const dropMs = Number(await page.evaluate('window.dropMs'));
  return { frames, dropMs };
}

async function view(page: Page) {
  const canvas = page.getByTestId('floorplan');
  const box = await canvas.boundingBox();
  if (!box) throw new Error('no canvas');
  const attr = async (name: string) => Number(await canvas.getAttribute(name));
  return {
    box,
    scale: await attr('data-view-scale'),
    x: await attr('data-view-x'),
    y: await attr('data-view-y'),
  };
}

/** Screen centre of mat r,c of the generated grid (the demo's spacing: 36.864 µm mats, 3 µm and 6 µm strips). */
async function matCentre(page: Page, row: number, column: number) {
  const v = await view(page);
  const xUm = 18 + 3 + column * (36.864 + 3) + 18.432;
  const yUm = 6 + row * (36.864 + 6) + 18.432;
  return { x: v.box.x + v.x + xUm * v.scale, y: v.box.y + v.y + yUm * v.scale };
}

function line(label: string, s: Stats): string {
  const f = (n: number) => n.toFixed(1).padStart(6);
  return `${label.padEnd(34)} ${String(s.frames).padStart(6)} ${f(s.median)} ${f(s.p95)} ${f(s.max)} ${String(s.over16_7).padStart(8)}`;
}

async function main() {
  const server = await startServer();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run'],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1400, height: 860 } });
    const started = Date.now();
    await page.goto(`${base}/?generate=${GRID}&perf`);
    await page.getByTestId('floorplan').locator('canvas').first().waitFor();
    await page.waitForFunction(() =>
      document.querySelector('[data-testid="block-count"]')?.textContent?.includes(','),
    );
    const loadMs = Date.now() - started;
    const blocks = await page.getByTestId('block-count').textContent();
    const cdp = await page.context().newCDPSession(page);
    const rows: string[] = [];
    const probes: string[] = [];

    const scenario = async (
      label: string,
      tool: string,
      from: { x: number; y: number },
      step: { x: number; y: number },
    ) => {
      await page.keyboard.press(tool);
      await probe(page);
      const result = await gesture(page, cdp, from, step);
      const s = stats(result.frames);
      rows.push(`${line(label, s)} ${result.dropMs.toFixed(0).padStart(8)}`);
      const p = await probe(page);
      const paint = stats(p.paintBlocks);
      const overlay = stats(p.paintOverlay);
      probes.push(
        `${label.padEnd(34)} paints: blocks layer ${p.paintBlocks.length}× median ${paint.median.toFixed(1)} ms ` +
          `(p95 ${paint.p95.toFixed(1)}), overlay ${p.paintOverlay.length}× median ${overlay.median.toFixed(2)} ms`,
      );
      if (p.latency.length > 0) {
        const lat = stats(p.latency);
        const comp = stats(p.compute);
        probes.push(
          `${label.padEnd(34)} live reports ${p.latency.length}: compute median ${comp.median.toFixed(2)} ms, ` +
            `p95 ${comp.p95.toFixed(2)} ms; pointer event → figures median ${lat.median.toFixed(1)} ms, p95 ${lat.p95.toFixed(1)} ms`,
        );
      }
    };

    // 1. Whole floorplan in view: every one of the 12,418 blocks is painted each frame of a pan.
    const whole = await view(page);
    const centre = { x: whole.box.x + whole.box.width / 2, y: whole.box.y + whole.box.height / 2 };
    await scenario('pan, whole floorplan in view', '2', centre, { x: 0.5, y: 0.3 });
    await page.getByTestId('zoom-fit').click();
    await sleep(300);
    await scenario('drag a mat, whole floorplan in view', '1', await matCentre(page, 30, 30), {
      x: 0.6,
      y: 0.25,
    });
    await page.keyboard.press('Control+z');
    await sleep(500);

    // 2. Zoomed in so that mats carry labels and line hints (about 160 px per mat).
    const m = await matCentre(page, 20, 20);
    await page.mouse.move(m.x, m.y);
    for (let i = 0; i < 14; i++) {
      await page.mouse.wheel(0, -100);
      await sleep(30);
    }
    await sleep(300);
    const close = await view(page);
    const closeCentre = { x: close.box.x + close.box.width / 2, y: close.box.y + close.box.height / 2 };
    await scenario(`pan, zoomed in (${close.scale.toFixed(2)} px/µm)`, '2', closeCentre, { x: 1.2, y: 0.6 });
    await scenario(`drag a mat, zoomed in`, '1', await matCentre(page, 20, 20), { x: 1.5, y: 0.4 });

    console.log(`Matloom canvas frame times: ${GRID} mats (${blocks}), page ready in ${loadMs} ms`);
    console.log(
      `Chromium headless, software rendering; ${MOVES} mouse moves every ${MOVE_INTERVAL_MS} ms per gesture.`,
    );
    console.log(
      `${'gesture'.padEnd(34)} ${'frames'.padStart(6)} ${'median'.padStart(6)} ${'p95'.padStart(6)} ${'max'.padStart(6)} ${'>16.7ms'.padStart(8)}`,
    );
    for (const r of rows) console.log(r);
    console.log(
      'Frame times in ms between animation frames; "release" is the time from letting go to the next frame ' +
        '(the one command and the full evaluation). Where the time goes:',
    );
    for (const p of probes) console.log(p);
  } finally {
    await browser.close();
    server?.kill();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
