import { expect, test, type Page } from '@playwright/test';
import { evaluate, findMatReport } from '../src/engine';
import { formatQuantity } from '../src/model/units';
import { FloorplanPage, loadDemoDesign } from './floorplanPage';

/** Decodes a PNG inside the page and counts its distinct colours, so a blank canvas fails. */
async function distinctColours(page: Page, png: Buffer): Promise<number> {
  return page.evaluate(async (base64) => {
    const image = new Image();
    image.src = `data:image/png;base64,${base64}`;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = image.width;
    canvas.height = image.height;
    const context = canvas.getContext('2d');
    if (!context) return 0;
    context.drawImage(image, 0, 0);
    const data = context.getImageData(0, 0, image.width, image.height).data;
    const colours = new Set<number>();
    for (let i = 0; i + 2 < data.length; i += 4) {
      colours.add(((data[i] ?? 0) << 16) | ((data[i + 1] ?? 0) << 8) | (data[i + 2] ?? 0));
    }
    return colours.size;
  }, png.toString('base64'));
}

test('select a mat, change its cells per bit line, and see the engine’s figures', async ({ page }) => {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  const app = new FloorplanPage(page);
  const demo = loadDemoDesign();
  await app.open();
  await expect(page.getByTestId('design-name')).toHaveText(demo.name);
  await expect(page.getByTestId('checks-clear')).toBeVisible();

  await app.clickBlock(demo, 'mat-r1c2');
  await expect(page.getByTestId('selection-summary')).toContainText('Mat 2.3');
  const before = findMatReport(evaluate(demo), 'mat-r1c2');
  if (!before) throw new Error('demo lacks mat-r1c2');
  await expect(app.metricValue('bitlineCapacitance')).toHaveText(
    formatQuantity(before.figures.bitlineCapacitance.total, 'capacitance'),
  );
  await expect(app.metricValue('senseSignal')).toHaveText(
    formatQuantity(before.figures.senseSignal, 'voltage'),
  );

  const field = page.getByTestId('cells-per-bitline');
  await field.fill('256');
  await field.press('Enter');

  const edited = {
    ...demo,
    blocks: demo.blocks.map((b) =>
      b.id === 'mat-r1c2' && b.type === 'mat' ? { ...b, cellsPerBitline: 256 } : b,
    ),
  };
  const after = findMatReport(evaluate(edited), 'mat-r1c2');
  if (!after) throw new Error('edited design lacks mat-r1c2');
  expect(after.figures.bitlineCapacitance.total).toBeLessThan(before.figures.bitlineCapacitance.total);
  await expect(app.metricValue('bitlineCapacitance')).toHaveText(
    formatQuantity(after.figures.bitlineCapacitance.total, 'capacitance'),
  );
  await expect(app.metricValue('senseSignal')).toHaveText(
    formatQuantity(after.figures.senseSignal, 'voltage'),
  );
  // The shorter mat still meets the strip above it, so its bit lines stay sensed, but its sense
  // amplifiers can no longer alternate between two strips and overflow their pitch.
  await expect(page.getByTestId('findings')).toContainText('pitch budget');
  await expect(page.getByTestId('findings')).not.toContainText('reach no sense-amplifier');

  // The figure explains itself.
  await page.getByTestId('metric-senseSignal').click();
  await expect(page.getByTestId('explanation')).toContainText('min(ΔV1, ΔV0)');

  // Undo restores the original figures; redo brings the edit back.
  await page.getByTestId('undo').click();
  await expect(app.metricValue('bitlineCapacitance')).toHaveText(
    formatQuantity(before.figures.bitlineCapacitance.total, 'capacitance'),
  );
  await page.getByTestId('redo').click();
  await expect(app.metricValue('bitlineCapacitance')).toHaveText(
    formatQuantity(after.figures.bitlineCapacitance.total, 'capacitance'),
  );

  const shot = await page.screenshot({ path: test.info().outputPath('edited.png') });
  expect(await distinctColours(page, shot)).toBeGreaterThan(50);
  expect(errors).toEqual([]);
});

test('a refused value is explained and loses nothing', async ({ page }) => {
  const app = new FloorplanPage(page);
  const demo = loadDemoDesign();
  await app.open();
  await app.clickBlock(demo, 'mat-r0c0');
  const before = await app.metricValue('bitlineCapacitance').textContent();
  const field = page.getByTestId('cells-per-bitline');
  for (const bad of ['-5', 'abc', '1e9', '12.5']) {
    await field.fill(bad);
    await field.press('Enter');
    await expect(page.getByRole('alert')).toBeVisible();
    await expect(field).toHaveValue(bad);
    await expect(app.metricValue('bitlineCapacitance')).toHaveText(before ?? '');
  }
  await expect(page.getByTestId('undo')).toBeDisabled();
});

test('the overview screenshot for the README is not blank', async ({ page }) => {
  const app = new FloorplanPage(page);
  const demo = loadDemoDesign();
  await app.open();
  await app.clickBlock(demo, 'mat-r1c1');
  await page.getByTestId('metric-chargeTransferRatio').click();
  const shot = await page.screenshot({ path: 'public/screenshot.png' });
  expect(await distinctColours(page, shot)).toBeGreaterThan(50);
});
