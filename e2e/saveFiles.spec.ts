import { expect, test } from '@playwright/test';
import { restoreDesign } from '../src/io/restore';
import { DocumentsPage } from './documentsPage';
import { loadDemoDesign } from './floorplanPage';
import { pickedFiles, stubSavePicker } from './savePicker';

test('Ctrl+S without a file asks the save picker once, then writes back to the picked file', async ({
  page,
}) => {
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await stubSavePicker(page, 'chosen.matloom.json');
  await page.keyboard.press('Control+s');
  await expect(page.getByTestId('notice')).toContainText('Saved to chosen.matloom.json');
  let files = await pickedFiles(page);
  expect(files.asked).toBe(1);
  expect(files.suggested).toEqual(['wren-bank-section-invented-demo.matloom.json']);
  const first = restoreDesign(files.closed[0]?.text ?? '');
  expect(first.ok && first.design).toEqual(demo);

  // An edit, and Save again (the button: the focus is still in the field): the same file, not asked again.
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  await page.getByTestId('save-file').click();
  await expect.poll(async () => (await pickedFiles(page)).closed.length).toBe(2);
  files = await pickedFiles(page);
  expect(files.asked).toBe(1);
  const second = restoreDesign(files.closed[1]?.text ?? '');
  expect(second.ok && second.design.blocks.find((b) => b.id === 'mat-r0c1')).toMatchObject({
    cellsPerWordline: 384,
  });
});

test('a cancelled save picker saves nothing and says nothing', async ({ page }) => {
  const app = new DocumentsPage(page);
  await app.openAt('/');
  await stubSavePicker(page, 'never.json', true);
  let downloaded = false;
  page.on('download', () => void (downloaded = true));
  await page.keyboard.press('Control+s');
  await expect.poll(async () => (await pickedFiles(page)).asked).toBe(1);
  await page.getByTestId('export-summary').click();
  await expect.poll(async () => (await pickedFiles(page)).asked).toBe(2);
  expect((await pickedFiles(page)).closed).toEqual([]);
  await expect(page.getByTestId('notice')).toHaveCount(0);
  expect(downloaded).toBe(false);
});

test('the summary JSON of 4,096 mats streams into the picked file, piece by piece', async ({ page }) => {
  const app = new DocumentsPage(page);
  await app.openAt('/?generate=64x64');
  await stubSavePicker(page, 'die.summary.json');
  await page.getByTestId('export-summary').click();
  await expect(page.getByTestId('notice')).toContainText('Wrote the summary JSON to die.summary.json', {
    timeout: 60_000,
  });
  // Parsed in the page: only the counts come back.
  const written = await page.evaluate(() => {
    const file = window.pickedFiles.closed[0];
    const parsed = JSON.parse(file?.text ?? 'null') as {
      design: { blocks: unknown[] };
      report: { mats: unknown[]; format: string };
    };
    return {
      writes: file?.writes ?? 0,
      length: file?.text.length ?? 0,
      blocks: parsed.design.blocks.length,
      mats: parsed.report.mats.length,
      format: parsed.report.format,
      suggested: window.pickedFiles.suggested,
    };
  });
  expect(written.mats).toBe(4096);
  expect(written.blocks).toBeGreaterThan(4096);
  expect(written.format).toBe('matloom-report');
  expect(written.suggested[0]).toMatch(/\.summary\.json$/);
  // Written in many pieces, never as one string.
  expect(written.writes).toBeGreaterThan(20);
  expect(written.length).toBeGreaterThan(5_000_000);
});
