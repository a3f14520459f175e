import { readFileSync, writeFileSync } from 'node:fs';
import { expect, test, type Page } from '@playwright/test';
import { restoreDesign } from '../src/io/restore';
import { FloorplanPage, loadDemoDesign } from './floorplanPage';
import { withoutSavePicker } from './savePicker';

// These journeys check the download each button offers where the browser has no save picker.
test.beforeEach(async ({ page }) => withoutSavePicker(page));

/** Clicks a button that downloads, and returns the file's text or bytes. */
async function download(page: Page, testId: string): Promise<Buffer> {
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByTestId(testId).click()]);
  const path = await file.path();
  return readFileSync(path);
}

/** Width and height from a PNG's IHDR chunk. */
function pngSize(bytes: Buffer): { width: number; height: number } {
  expect(bytes.subarray(0, 8).toString('hex')).toBe('89504e470d0a1a0a');
  return { width: bytes.readUInt32BE(16), height: bytes.readUInt32BE(20) };
}

test('save then open gives the identical design; a bad file changes nothing', async ({ page }) => {
  const app = new FloorplanPage(page);
  await app.open();
  const saved = await download(page, 'save-file');
  const restored = restoreDesign(saved.toString('utf8'));
  expect(restored.ok).toBe(true);
  if (restored.ok) expect(restored.design).toEqual(loadDemoDesign());

  await page.getByTestId('open-file-input').setInputFiles({
    name: 'broken.json',
    mimeType: 'application/json',
    buffer: Buffer.from(
      '{"format":"matloom-design","version":1,"name":"x","blocks":[{"type":"mat","cellsPerBitline":-4}]}',
    ),
  });
  await expect(page.getByTestId('notice')).toContainText('broken.json was not opened');
  await expect(page.getByTestId('design-name')).toHaveText(loadDemoDesign().name);

  const other = { ...loadDemoDesign(), name: 'Opened variant' };
  await page.getByTestId('open-file-input').setInputFiles({
    name: 'other.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(other)),
  });
  // An opened file is a new document with its own history; the demo stays under Recent.
  await expect(page.getByTestId('design-name')).toHaveText('Opened variant');
  await expect(page.getByTestId('undo')).toBeDisabled();
});

test('PNG export decodes at the requested size; summary JSON and CSV carry the figures', async ({ page }) => {
  const app = new FloorplanPage(page);
  await app.open();
  await page.getByTestId('export-png-menu').click();
  await page.getByTestId('png-scale').selectOption('3');
  const wholeBytes = await download(page, 'export-png');
  writeFileSync(test.info().outputPath('floorplan-3x.png'), wholeBytes);
  const whole = pngSize(wholeBytes);
  // The floorplan's 1,200 px and a 250 px side panel (legend and scale bar beside it, never on it).
  expect(whole.width).toBe((1200 + 250) * 3);

  await page.getByTestId('export-png-menu').click();
  await page.getByTestId('png-region-view').check();
  await page.getByTestId('png-scale').selectOption('1');
  await page.getByTestId('png-title').uncheck();
  const view = pngSize(await download(page, 'export-png'));
  const box = await app.canvasArea.boundingBox();
  expect(view.width).toBe(Math.round(box?.width ?? 0) + 250);
  expect(view.height).toBe(Math.round(box?.height ?? 0));

  const summary = JSON.parse((await download(page, 'export-summary')).toString('utf8'));
  expect(restoreDesign(summary.design).ok).toBe(true);
  expect(summary.report.format).toBe('matloom-report');
  expect(summary.report.mats).toHaveLength(16);

  const csv = (await download(page, 'export-csv')).toString('utf8').trimEnd().split('\r\n');
  expect(csv).toHaveLength(17);
  expect(csv[0]).toContain('sense_margin_at_refresh_V');
});
