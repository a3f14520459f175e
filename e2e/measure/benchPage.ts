/**
 * The page side of the canvas benches and the profiler: the preview server, a generated grid opened with
 * the timing probe, mouse input through the DevTools protocol, and the camera read from the canvas.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type CDPSession, type Page } from '@playwright/test';
import { armEditTimer, armedResult, installPaintMarks, startRecording, stopRecording } from './paintTiming';

export const port = Number(process.env.E2E_PORT ?? 4173);
export const base = `http://127.0.0.1:${port}`;
/** Mouse moves per gesture and the pause between them (ms). */
export const MOVES = 240;
export const MOVE_INTERVAL_MS = 8;

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export async function serverUp(): Promise<boolean> {
  try {
    return (await fetch(base)).ok;
  } catch {
    return false;
  }
}

/** Vite's own entry script, run with this Node so that stopping the child stops the server. */
export const VITE = fileURLToPath(new URL('../../node_modules/vite/bin/vite.js', import.meta.url));

/** The build to measure: BENCH_DIST, or the project's dist/. */
const DIST = process.env.BENCH_DIST ?? fileURLToPath(new URL('../../dist', import.meta.url));

/**
 * Throws unless the server on the port serves the build to measure: a server left running on the port
 * (a Playwright run, another bench) would otherwise be measured in its place.
 */
async function expectServedBuild(): Promise<void> {
  const served = await (await fetch(base)).text();
  const built = readFileSync(`${DIST}/index.html`, 'utf8');
  const entry = (html: string) => /assets\/index-[\w-]+\.js/.exec(html)?.[0] ?? html;
  if (entry(served) !== entry(built))
    throw new Error(`port ${port} serves another build than ${DIST}: stop that server first`);
}

export async function startServer(): Promise<ChildProcess | null> {
  if (await serverUp()) {
    await expectServedBuild();
    return null;
  }
  const server = spawn(
    process.execPath,
    [
      VITE,
      'preview',
      '--host',
      '127.0.0.1',
      '--port',
      String(port),
      '--strictPort',
      // BENCH_DIST serves another build (say, main's) for a before/after comparison.
      ...(process.env.BENCH_DIST ? ['--outDir', process.env.BENCH_DIST] : []),
    ],
    { stdio: 'ignore' },
  );
  for (let i = 0; i < 100; i++) {
    if (await serverUp()) return server;
    await sleep(200);
  }
  server.kill();
  throw new Error(`vite preview did not start on port ${port}`);
}

/**
 * Runs before the app: once the status bar shows the block count, waits for the first idle moment
 * and records its time since navigation start (ms) in window.__loadIdle.
 */
export const LOAD_IDLE_SCRIPT = `(() => {
  window.__loadIdle = NaN;
  const poll = () => {
    const text = document.querySelector('[data-testid="block-count"]')?.textContent ?? '';
    if (!text.includes(',')) return requestAnimationFrame(poll);
    requestIdleCallback(() => { window.__loadIdle = performance.now(); });
  };
  requestAnimationFrame(poll);
})()`;

/** Opens a generated grid; returns the time to the first idle moment after it is shown (ms). */
export async function openGrid(page: Page, side: number): Promise<number> {
  await page.goto(`${base}/?generate=${side}x${side}&perf`);
  await page.waitForFunction('!Number.isNaN(window.__loadIdle)', undefined, { timeout: 60_000 });
  const idle = Number(await page.evaluate('window.__loadIdle'));
  await installPaintMarks(page);
  return idle;
}

export type Mouse = (
  type: 'mouseMoved' | 'mousePressed' | 'mouseReleased',
  x: number,
  y: number,
  buttons: number,
) => Promise<unknown>;

export function mouseOf(cdp: CDPSession): Mouse {
  return (type, x, y, buttons) =>
    cdp.send('Input.dispatchMouseEvent', { type, x, y, button: 'left', buttons, clickCount: 1 });
}

/**
 * Presses at `from`, moves along `step` MOVES times at a steady pace without waiting for frames,
 * then releases; returns the frame durations during the moves and the release's time to paint.
 */
export async function gesture(
  page: Page,
  mouse: Mouse,
  from: { x: number; y: number },
  step: { x: number; y: number },
): Promise<{ frames: number[]; releaseMs: number }> {
  await mouse('mouseMoved', from.x, from.y, 0);
  await mouse('mousePressed', from.x, from.y, 1);
  await startRecording(page);
  const sent: Promise<unknown>[] = [];
  for (let i = 1; i <= MOVES; i++) {
    sent.push(mouse('mouseMoved', from.x + step.x * i, from.y + step.y * i, 1));
    await sleep(MOVE_INTERVAL_MS);
  }
  await Promise.all(sent);
  const frames = await stopRecording(page);
  await armEditTimer(page, 'pointerup');
  await mouse('mouseReleased', from.x + step.x * MOVES, from.y + step.y * MOVES, 0);
  const releaseMs = await armedResult(page);
  await sleep(300);
  return { frames, releaseMs };
}

export async function view(page: Page) {
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
export async function matCentre(page: Page, row: number, column: number) {
  const v = await view(page);
  const xUm = 18 + 3 + column * (36.864 + 3) + 18.432;
  const yUm = 6 + row * (36.864 + 6) + 18.432;
  return { x: v.box.x + v.x + xUm * v.scale, y: v.box.y + v.y + yUm * v.scale };
}

/** Times `act` from its input event to the next paint, `runs` times. */
export async function timedEdits(
  page: Page,
  eventType: string,
  runs: number,
  act: (run: number) => Promise<void>,
) {
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    await armEditTimer(page, eventType);
    await act(r);
    times.push(await armedResult(page));
    await sleep(400);
  }
  return times;
}

/** Debian's Chromium, headless, software rendering (CHROMIUM_PATH to use another). */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run'],
  });
}
