import { expect, type Locator, type Page } from '@playwright/test';

/** Page object for the explorer and variants views. */
export class ExplorerPage {
  constructor(readonly page: Page) {}

  async open() {
    await this.page.goto('/');
    await this.page.getByTestId('view-explorer').click();
    await expect(this.page.getByTestId('explorer')).toBeVisible();
  }

  /** Sets a swept cell-count range ("bl" or "wl"). */
  async setRange(which: 'bl' | 'wl', from: number, to: number, step: number) {
    for (const [key, value] of [
      ['from', from],
      ['to', to],
      ['step', step],
    ] as const) {
      const input = this.page.getByTestId(`sweep-${which}-${key}`);
      await input.fill(String(value));
      await input.press('Enter');
    }
  }

  /** Number of points the sweep settings make. */
  async sweepSize(): Promise<number> {
    const text = (await this.page.getByTestId('sweep-size').textContent()) ?? '';
    return Number(text.replace(/[^\d]/g, ''));
  }

  status(): Locator {
    return this.page.getByTestId('sweep-status');
  }

  async runSweep() {
    await this.page.getByTestId('run-sweep').click();
    await expect(this.status()).toHaveAttribute('data-status', 'done', { timeout: 30_000 });
  }

  /** Moves the pointer onto the centre of a Pareto-front marker. */
  async hoverFrontPoint(n: number) {
    const marker = this.page.getByTestId('front-point').nth(n);
    const box = await marker.boundingBox();
    if (!box) throw new Error('front point has no box');
    const x = box.x + box.width / 2;
    const y = box.y + box.height / 2;
    await this.page.mouse.move(x - 30, y - 30);
    await this.page.mouse.move(x, y, { steps: 4 });
    await expect(this.page.getByTestId('chart-tooltip')).toBeVisible();
    return { x, y };
  }

  /** The text of one figure on a point card ("hover-point" or "built-point"). */
  figure(card: string, key: string): Locator {
    return this.page.getByTestId(`${card}-${key}`);
  }
}
