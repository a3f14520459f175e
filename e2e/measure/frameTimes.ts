/**
 * Canvas benches in Debian's Chromium (`npm run bench:canvas`, builds first; or `npx tsx
 * e2e/measure/frameTimes.ts` against an existing build; port from E2E_PORT). A measurement, not a
 * test: it prints figures beside their goals and asserts nothing.
 *
 * Every time is taken at the next paint (see paintTiming.ts): frames from paint to paint while the
 * script feeds real mouse input through the DevTools protocol every 8 ms without waiting for the page;
 * an edit from its input event to the paint of the frame after it; a load from navigation start to the
 * first idle moment after the floorplan is shown.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { cpus } from 'node:os';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type CDPSession, type Page } from '@playwright/test';
import {
  armEditTimer,
  armedResult,
  benchLine,
  HEADER,
  installPaintMarks,
  loadAverage,
  startRecording,
  stats,
  stopRecording,
  type Goal,
} from './paintTiming';

const port = Number(process.env.E2E_PORT ?? 4173);
const base = `http://127.0.0.1:${port}`;
/** Mouse moves per gesture and the pause between them (ms). */
const MOVES = 240;
const MOVE_INTERVAL_MS = 8;
/** Repetitions of each timed edit and of each load. */
const EDIT_RUNS = Number(process.env.EDIT_RUNS ?? 5);
const LOAD_RUNS = Number(process.env.LOAD_RUNS ?? 3);
/** Grids to measure: side × side mats (FRAME_GRIDS=64,256). */
const SIDES = (process.env.FRAME_GRIDS ?? '64,256').split(',').map(Number);

const FRAME_GOALS: Record<number, { pan: Goal; drag: Goal; edit: Goal; load: Goal }> = {
  64: { pan: { median: 16.7, p95: 33 }, drag: { median: 16.7, p95: 33 }, edit: { median: 50 }, load: {} },
  256: { pan: { median: 33 }, drag: {}, edit: { median: 100 }, load: { median: 1200 } },
};

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

/**
 * Runs before the app: once the status bar shows the block count, waits for the first idle moment
 * and records its time since navigation start (ms) in window.__loadIdle.
 */
const LOAD_IDLE_SCRIPT = `(() => {
  window.__loadIdle = NaN;
  const poll = () => {
    const text = document.querySelector('[data-testid="block-count"]')?.textContent ?? '';
    if (!text.includes(',')) return requestAnimationFrame(poll);
    requestIdleCallback(() => { window.__loadIdle = performance.now(); });
  };
  requestAnimationFrame(poll);
})()`;

/** Opens a generated grid; returns the time to the first idle moment after it is shown (ms). */
async function openGrid(page: Page, side: number): Promise<number> {
  await page.goto(`${base}/?generate=${side}x${side}&perf`);
  await page.waitForFunction('!Number.isNaN(window.__loadIdle)', undefined, { timeout: 60_000 });
  const idle = Number(await page.evaluate('window.__loadIdle'));
  await installPaintMarks(page);
  return idle;
}

type Mouse = (
  type: 'mouseMoved' | 'mousePressed' | 'mouseReleased',
  x: number,
  y: number,
  buttons: number,
) => Promise<unknown>;

function mouseOf(cdp: CDPSession): Mouse {
  return (type, x, y, buttons) =>
    cdp.send('Input.dispatchMouseEvent', { type, x, y, button: 'left', buttons, clickCount: 1 });
}

/**
 * Presses at `from`, moves along `step` MOVES times at a steady pace without waiting for frames,
 * then releases; returns the frame durations during the moves and the release's time to paint.
 */
async function gesture(
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

/** Times `act` from its input event to the next paint, `runs` times. */
async function timedEdits(page: Page, eventType: string, runs: number, act: (run: number) => Promise<void>) {
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    await armEditTimer(page, eventType);
    await act(r);
    times.push(await armedResult(page));
    await sleep(400);
  }
  return times;
}

async function measureGrid(browser: Browser, side: number, lines: string[]): Promise<void> {
  const mats = (side * side).toLocaleString('en-US');
  const goals = FRAME_GOALS[side] ?? { pan: {}, drag: {}, edit: {}, load: {} };
  const context = await browser.newContext({ viewport: { width: 1400, height: 860 } });
  await context.addInitScript(LOAD_IDLE_SCRIPT);
  const page = await context.newPage();
  const loads: number[] = [];
  for (let r = 0; r < LOAD_RUNS; r++) loads.push(await openGrid(page, side));
  lines.push(benchLine(`load until idle, ${mats} mats (cold page each run)`, stats(loads), goals.load));

  const cdp = await context.newCDPSession(page);
  const mouse = mouseOf(cdp);
  const whole = await view(page);
  const centre = { x: whole.box.x + whole.box.width / 2, y: whole.box.y + whole.box.height / 2 };

  await page.keyboard.press('2');
  const pan = await gesture(page, mouse, centre, { x: 0.5, y: 0.3 });
  lines.push(benchLine(`pan frame, ${mats} mats, whole floorplan in view`, stats(pan.frames), goals.pan));
  await page.getByTestId('zoom-fit').click();
  await sleep(300);

  await page.keyboard.press('1');
  const released: number[] = [];
  const dragFrames: number[] = [];
  const undos: number[] = [];
  const mid = Math.floor(side / 2);
  for (let r = 0; r < EDIT_RUNS; r++) {
    // Nothing selected, so the press never lands on a resize handle of the block moved last time.
    await page.keyboard.press('Escape');
    const from = await matCentre(page, mid, mid);
    // About 150 × 60 px at 4,096 mats (several mats); a few mats' width on a whole-die view.
    const stepPx = side <= 64 ? 1 : 0.1;
    const drag = await gesture(page, mouse, from, { x: 0.6 * stepPx, y: 0.25 * stepPx });
    dragFrames.push(...drag.frames);
    released.push(drag.releaseMs);
    undos.push(...(await timedEdits(page, 'keydown', 1, () => page.keyboard.press('Control+z'))));
    // The undo must have taken back the move, not the opening of the grid.
    const count = await page.getByTestId('block-count').textContent();
    if (!count?.includes(',')) throw new Error(`the move was not committed (undo reached "${count}")`);
  }
  lines.push(benchLine(`drag frame, ${mats} mats, whole floorplan in view`, stats(dragFrames), goals.drag));
  lines.push(
    benchLine(`edit to paint: move (drag release), ${mats} mats, whole view`, stats(released), goals.edit),
  );
  lines.push(benchLine(`edit to paint: undo (Ctrl+Z), ${mats} mats, whole view`, stats(undos), goals.edit));

  // Cells per bit line of the selected mat, typed into the properties panel and committed with Enter.
  // On a whole-die view a mat is a pixel or two wide and a press lands on a strip: zoom in to pick it.
  let where = 'whole floorplan in view';
  if (side > 64) {
    const m = await matCentre(page, mid, mid);
    await page.mouse.move(m.x, m.y);
    for (let i = 0; i < 24; i++) await page.mouse.wheel(0, -100);
    await sleep(500);
    where = `zoomed to the mat (${(await view(page)).scale.toFixed(2)} px/µm)`;
  }
  const at = await matCentre(page, mid, mid);
  await page.mouse.click(at.x, at.y);
  const field = page.locator('#cells-per-bitline');
  await field.waitFor({ timeout: 5000 }).catch(async (error: unknown) => {
    await page.screenshot({ path: '/tmp/speed/nofield.png' });
    throw error;
  });
  const counts = await timedEdits(page, 'keydown', EDIT_RUNS, async (r) => {
    await field.fill(r % 2 === 0 ? '256' : '512');
    await field.press('Enter');
  });
  lines.push(
    benchLine(`edit to paint: cells per bit line, ${mats} mats, ${where}`, stats(counts), goals.edit),
  );
  await context.close();
}

async function main() {
  const server = await startServer();
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run'],
  });
  const lines: string[] = [];
  try {
    for (const side of SIDES) await measureGrid(browser, side, lines);
  } finally {
    await browser.close();
    server?.kill();
  }
  console.log('Matloom canvas bench, Chromium headless (software rendering), production build.');
  console.log(
    `${cpus().length} CPUs, load average at the end ${loadAverage()}; ${MOVES} mouse moves every ` +
      `${MOVE_INTERVAL_MS} ms per gesture; times in ms, each taken at the next paint.`,
  );
  console.log(HEADER);
  for (const line of lines) console.log(line);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
