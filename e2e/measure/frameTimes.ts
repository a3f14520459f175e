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
import { cpus } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { Browser } from '@playwright/test';
import { initialJsLine } from './initialJs';
import {
  gesture,
  launchChromium,
  LOAD_IDLE_SCRIPT,
  matCentre,
  mouseOf,
  MOVE_INTERVAL_MS,
  MOVES,
  openGrid,
  sleep,
  startServer,
  timedEdits,
  view,
} from './benchPage';
import { benchLine, HEADER, loadAverage, stats, type Goal } from './paintTiming';

/** Repetitions of each timed edit and of each load. */
const EDIT_RUNS = Number(process.env.EDIT_RUNS ?? 5);
const LOAD_RUNS = Number(process.env.LOAD_RUNS ?? 3);
/** Grids to measure: side × side mats (FRAME_GRIDS=64,256). */
const SIDES = (process.env.FRAME_GRIDS ?? '64,256').split(',').map(Number);

const FRAME_GOALS: Record<number, { pan: Goal; drag: Goal; edit: Goal; load: Goal }> = {
  64: { pan: { median: 16.7, p95: 33 }, drag: { median: 16.7, p95: 33 }, edit: { median: 50 }, load: {} },
  256: { pan: { median: 33 }, drag: {}, edit: { median: 100 }, load: { median: 1200 } },
};

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
  const browser = await launchChromium();
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
  console.log(initialJsLine(fileURLToPath(new URL('../../dist', import.meta.url))));
  console.log(HEADER);
  for (const line of lines) console.log(line);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
