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

const PROFILE = process.env.PROFILE ?? 'drag';
const SIDE = Number(process.env.FRAME_GRIDS ?? 64);
const RUNS = Number(process.env.EDIT_RUNS ?? 3);
const TOP = Number(process.env.TOP ?? 30);

interface CallFrame {
  readonly functionName: string;
  readonly url: string;
  readonly lineNumber: number;
  readonly columnNumber: number;
}

interface ProfileNode {
  readonly id: number;
  readonly callFrame: CallFrame;
  readonly children?: readonly number[];
}

interface Profile {
  readonly nodes: readonly ProfileNode[];
  readonly samples: readonly number[];
  readonly timeDeltas: readonly number[];
  readonly startTime: number;
  readonly endTime: number;
}

function nameOf(frame: CallFrame): string {
  const file = frame.url.split('/').pop() ?? '';
  return `${frame.functionName || '(anonymous)'} ${file}:${frame.lineNumber + 1}`;
}

/** Self and total time (ms) per function; total counts a function once per sample however deep it recurses. */
function summarise(profile: Profile): void {
  const parent = new Map<number, number>();
  const byId = new Map<number, ProfileNode>();
  for (const node of profile.nodes) {
    byId.set(node.id, node);
    for (const child of node.children ?? []) parent.set(child, node.id);
  }
  const self = new Map<string, number>();
  const total = new Map<string, number>();
  let all = 0;
  profile.samples.forEach((id, s) => {
    const ms = (profile.timeDeltas[s + 1] ?? 0) / 1000;
    all += ms;
    const leaf = byId.get(id);
    if (!leaf) return;
    const leafName = nameOf(leaf.callFrame);
    self.set(leafName, (self.get(leafName) ?? 0) + ms);
    const seen = new Set<string>();
    for (let n: number | undefined = id; n !== undefined; n = parent.get(n)) {
      const node = byId.get(n);
      if (!node) break;
      const name = nameOf(node.callFrame);
      if (seen.has(name)) continue;
      seen.add(name);
      total.set(name, (total.get(name) ?? 0) + ms);
    }
  });
  const print = (title: string, map: Map<string, number>) => {
    console.log(`\n${title}`);
    for (const [name, ms] of [...map].sort((a, b) => b[1] - a[1]).slice(0, TOP))
      console.log(`${ms.toFixed(1).padStart(9)} ms ${((100 * ms) / all).toFixed(1).padStart(5)} %  ${name}`);
  };
  console.log(`sampled ${all.toFixed(0)} ms`);
  print('self time', self);
  print('total time (including callees)', total);
}

async function profiled(cdp: CDPSession, work: () => Promise<void>): Promise<Profile> {
  await cdp.send('Profiler.enable');
  await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
  await cdp.send('Profiler.start');
  await work();
  const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: Profile };
  return profile;
}

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
