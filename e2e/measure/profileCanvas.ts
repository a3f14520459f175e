/**
 * A CPU profile of canvas work in Debian's Chromium, taken through the DevTools protocol
 * (`Profiler.start` / `Profiler.stop`), to find where a frame or an edit spends its time. Not a bench:
 * the profiler slows the page. Run against a build (`npx vite build --minify false` keeps the names):
 *
 *   E2E_PORT=4212 PROFILE=drag FRAME_GRIDS=64 npx tsx e2e/measure/profileCanvas.ts
 *
 * PROFILE is `drag` (frames of a drag at whole view), `move` (drags released: the commit) or `cells`
 * (cells per bit line typed into the properties panel). Writes the profile to PROFILE_OUT (default
 * /tmp/matloom-<profile>-<mats>.cpuprofile, opens in Chromium's DevTools) and prints the functions with
 * the most time of their own and the most time including what they call.
 */
import { writeFileSync } from 'node:fs';
import type { CDPSession, Page } from '@playwright/test';
import {
  gesture,
  launchChromium,
  LOAD_IDLE_SCRIPT,
  matCentre,
  mouseOf,
  openGrid,
  sleep,
  startServer,
  view,
} from './benchPage';
import { profiled, summarise, type Profile } from './cpuProfile';

const PROFILE = process.env.PROFILE ?? 'drag';
const SIDE = Number(process.env.FRAME_GRIDS ?? 64);
const RUNS = Number(process.env.EDIT_RUNS ?? 3);

async function dragOnce(page: Page, cdp: CDPSession, release: boolean) {
  const mid = Math.floor(SIDE / 2);
  await page.keyboard.press('Escape');
  const from = await matCentre(page, mid, mid);
  const stepPx = SIDE <= 64 ? 1 : 0.1;
  await gesture(page, mouseOf(cdp), from, { x: 0.6 * stepPx, y: 0.25 * stepPx });
  if (release) await page.keyboard.press('Control+z');
}

async function main() {
  const server = await startServer();
  const browser = await launchChromium();
  try {
    const context = await browser.newContext({ viewport: { width: 1400, height: 860 } });
    await context.addInitScript(LOAD_IDLE_SCRIPT);
    const page = await context.newPage();
    await openGrid(page, SIDE);
    const cdp = await context.newCDPSession(page);
    await page.keyboard.press('1');
    await sleep(500);
    let profile: Profile;
    if (PROFILE === 'drag' || PROFILE === 'move') {
      profile = await profiled(cdp, async () => {
        for (let r = 0; r < RUNS; r++) await dragOnce(page, cdp, PROFILE === 'move');
      });
    } else if (PROFILE === 'cells') {
      const mid = Math.floor(SIDE / 2);
      if (SIDE > 64) {
        const m = await matCentre(page, mid, mid);
        await page.mouse.move(m.x, m.y);
        for (let i = 0; i < 24; i++) await page.mouse.wheel(0, -100);
        await sleep(500);
      }
      const at = await matCentre(page, mid, mid);
      await page.mouse.click(at.x, at.y);
      const field = page.locator('#cells-per-bitline');
      await field.waitFor({ timeout: 5000 });
      profile = await profiled(cdp, async () => {
        for (let r = 0; r < RUNS; r++) {
          await field.fill(r % 2 === 0 ? '256' : '512');
          await field.press('Enter');
          await sleep(400);
        }
      });
    } else {
      throw new Error(`PROFILE must be drag, move or cells, not ${PROFILE}`);
    }
    void (await view(page));
    const out = process.env.PROFILE_OUT ?? `/tmp/matloom-${PROFILE}-${SIDE * SIDE}.cpuprofile`;
    writeFileSync(out, JSON.stringify(profile));
    console.log(`${PROFILE}, ${(SIDE * SIDE).toLocaleString('en-US')} mats, ${RUNS} runs: profile in ${out}`);
    summarise(profile);
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
