/**
 * The page side of the sweep bench and the sweep trace: the explorer set to about 10,000 points in its
 * own fields, and a probe that records the Run click and the paint after the sweep is done.
 */
import type { Page } from '@playwright/test';

/** The goal's sweep size. */
export const TARGET_POINTS = 10_000;

/**
 * Records the click on Run, the paint after the status turns to done, and the worker's own sweep time
 * (the elapsed seconds its done message reports; a wrapped Worker listens in) in window.__sweepTimes.
 */
export const SWEEP_TIMES_SCRIPT = `(() => {
  const times = { start: NaN, painted: NaN, workerSweep: NaN };
  window.__sweepTimes = times;
  // Resolves at the paint: waiting on it costs the page nothing, where polling would run a task per frame.
  let resolvePainted;
  window.__sweepPainted = new Promise((resolve) => { resolvePainted = resolve; });
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
      channel.port1.onmessage = () => { times.painted = performance.now(); resolvePainted(); };
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

/**
 * Clicks Run and waits for the paint of the finished sweep without polling the page (Playwright's
 * waitForFunction checks at every animation frame, which would add a task per frame to the page's
 * main-thread time being measured). The click's own checks run before it: the button is awaited first.
 */
export async function runSweepToPaint(page: Page): Promise<void> {
  const run = page.getByTestId('run-sweep');
  await run.click();
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    await Promise.race([
      page.evaluate('window.__sweepPainted'),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error('no painted sweep within 120 s')), 120_000);
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

/** Opens the explorer on a loaded page and sets the sweep to about 10,000 points; returns the count. */
export async function prepareSweepPage(page: Page): Promise<number> {
  await page.getByTestId('view-explorer').click();
  await page.getByTestId('explorer').waitFor();
  return aboutTenThousand(page);
}
