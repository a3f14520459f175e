import { readFileSync } from 'node:fs';
import type { Locator, Page } from '@playwright/test';
import { blockRect } from '../src/geometry/placedBlocks';
import { DEMO_FILE_NAME } from '../src/designs/demoDesign';
import { restoreDesign } from '../src/io/restore';
import type { Design } from '../src/model/design';

/** The demo design exactly as the app loads it, read through the one restore path. */
export function loadDemoDesign(): Design {
  const restored = restoreDesign(
    readFileSync(new URL(`../public/${DEMO_FILE_NAME}`, import.meta.url), 'utf8'),
  );
  if (!restored.ok) throw new Error(restored.errors.join('\n'));
  return restored.design;
}

/** Page object for the floorplan view: turns block ids into screen clicks through the live camera. */
export class FloorplanPage {
  readonly canvasArea: Locator;

  constructor(readonly page: Page) {
    this.canvasArea = page.getByTestId('floorplan');
  }

  async open() {
    await this.page.goto('/');
    await this.canvasArea.locator('canvas').first().waitFor();
  }

  /** Screen point (page px) at the centre of a block. */
  async centreOf(design: Design, blockId: string): Promise<{ x: number; y: number }> {
    const block = design.blocks.find((b) => b.id === blockId);
    if (!block) throw new Error(`no block ${blockId}`);
    const rect = blockRect(design, block);
    const box = await this.canvasArea.boundingBox();
    if (!box) throw new Error('floorplan has no box');
    const scale = Number(await this.canvasArea.getAttribute('data-view-scale'));
    const ox = Number(await this.canvasArea.getAttribute('data-view-x'));
    const oy = Number(await this.canvasArea.getAttribute('data-view-y'));
    return {
      x: box.x + ox + (rect.x + rect.width / 2) * 1e6 * scale,
      y: box.y + oy + (rect.y + rect.height / 2) * 1e6 * scale,
    };
  }

  async clickBlock(design: Design, blockId: string) {
    const p = await this.centreOf(design, blockId);
    await this.page.mouse.click(p.x, p.y);
  }

  metricValue(key: string): Locator {
    return this.page.getByTestId(`metric-${key}-value`);
  }

  totalValue(key: string): Locator {
    return this.page.getByTestId(`total-${key}-value`);
  }
}
