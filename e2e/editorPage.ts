import { expect, type Locator } from '@playwright/test';
import { FloorplanPage } from './floorplanPage';

export interface ScreenPoint {
  readonly x: number;
  readonly y: number;
}

/**
 * Page object for the floorplan editor: tools, canvas gestures in screen or world coordinates (metres,
 * through the live camera), and the panels and status bar that report what happened.
 */
export class EditorPage extends FloorplanPage {
  /** Opens the app with an address query such as "?blank" or "?generate=8x8". */
  async openWith(query: string) {
    await this.page.goto(`/${query}`);
    await this.canvasArea.locator('canvas').first().waitFor();
  }

  tool(name: string): Locator {
    return this.page.getByTestId(`tool-${name}`);
  }

  async camera() {
    const box = await this.canvasArea.boundingBox();
    if (!box) throw new Error('floorplan has no box');
    const read = async (name: string) => Number(await this.canvasArea.getAttribute(name));
    return {
      box,
      scale: await read('data-view-scale'),
      offsetX: await read('data-view-x'),
      offsetY: await read('data-view-y'),
    };
  }

  /** Page position of a point inside the canvas, given in canvas pixels from its top-left corner. */
  async canvasPoint(x: number, y: number): Promise<ScreenPoint> {
    const { box } = await this.camera();
    return { x: box.x + x, y: box.y + y };
  }

  /** Page position of a world point (m). */
  async worldPoint(x: number, y: number): Promise<ScreenPoint> {
    const c = await this.camera();
    return { x: c.box.x + c.offsetX + x * 1e6 * c.scale, y: c.box.y + c.offsetY + y * 1e6 * c.scale };
  }

  /** World position (m) under a page position. */
  async worldAt(p: ScreenPoint): Promise<{ x: number; y: number }> {
    const c = await this.camera();
    return { x: (p.x - c.box.x - c.offsetX) / c.scale / 1e6, y: (p.y - c.box.y - c.offsetY) / c.scale / 1e6 };
  }

  /** Presses at `from`, moves to `to` in steps, and releases (unless `release` is false). */
  async drag(from: ScreenPoint, to: ScreenPoint, release = true) {
    await this.page.mouse.move(from.x, from.y);
    await this.page.mouse.down();
    await this.page.mouse.move((from.x + to.x) / 2, (from.y + to.y) / 2, { steps: 5 });
    await this.page.mouse.move(to.x, to.y, { steps: 5 });
    if (release) await this.page.mouse.up();
  }

  async click(p: ScreenPoint, modifiers: ('Shift' | 'Alt')[] = []) {
    for (const key of modifiers) await this.page.keyboard.down(key);
    await this.page.mouse.click(p.x, p.y);
    for (const key of modifiers) await this.page.keyboard.up(key);
  }

  blockCount(): Locator {
    return this.page.getByTestId('block-count');
  }

  selectedCount(): Locator {
    return this.page.getByTestId('selected-count');
  }

  summary(): Locator {
    return this.page.getByTestId('selection-summary');
  }

  findings(): Locator {
    return this.page.getByTestId('findings').locator('li');
  }

  field(id: string): Locator {
    return this.page.getByTestId(id);
  }

  async expectChecksClear() {
    await expect(this.page.getByTestId('checks-clear')).toBeVisible();
  }
}
