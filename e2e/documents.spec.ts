import { readFileSync } from 'node:fs';
import { expect, test } from '@playwright/test';
import { restoreDesign } from '../src/io/restore';
import { DocumentsPage, installStoreAccess } from './documentsPage';
import { loadDemoDesign } from './floorplanPage';
import { withoutSavePicker } from './savePicker';

test.beforeEach(async ({ page }) => {
  await installStoreAccess(page);
  // Saving without a file handle downloads here (the save picker has its own journeys: saveFiles.spec.ts).
  await withoutSavePicker(page);
});

test('an edited design survives opening a generated one; both are kept, and the first reopens intact', async ({
  page,
}) => {
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  await app.waitUntilKept();

  await app.openAt('/?generate=64x64');
  await expect(page.getByTestId('design-name')).toContainText('Generated 64 × 64');
  // One key press edits the generated design (select all, then nudge).
  await page.keyboard.press('Control+a');
  await page.keyboard.press('ArrowRight');
  await app.waitUntilKept();
  const designs = (await app.storedKeys()).filter((k) => k.startsWith('design:'));
  expect(designs).toHaveLength(2);

  await app.reopenRecent(demo.name);
  await expect(page.getByTestId('design-name')).toHaveText(demo.name);
  await app.clickBlock(demo, 'mat-r0c1');
  await expect(page.getByTestId('cells-per-wordline')).toHaveValue('384');
});

test('a reload reopens the tab’s design; a stored design that no longer restores is kept aside every time', async ({
  page,
}) => {
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  await app.waitUntilKept();
  await page.reload();
  await app.canvasArea.locator('canvas').first().waitFor();
  await app.clickBlock(demo, 'mat-r0c1');
  await expect(page.getByTestId('cells-per-wordline')).toHaveValue('384');

  for (const round of [1, 2]) {
    const [key] = (await app.storedKeys()).filter((k) => k.startsWith('design:'));
    expect(key).toBeDefined();
    const broken = `{"format":"matloom-design","version":1,"round":${round}`;
    await app.putStored(key as string, broken);
    await page.reload();
    await expect(page.getByTestId('notice')).toContainText('could not be restored');
    await expect(page.getByTestId('notice')).toContainText('kept aside unchanged under "unreadable:');
    const aside = (await app.storedKeys()).filter((k) => k.startsWith('unreadable:'));
    expect(aside).toHaveLength(round);
    const texts = await Promise.all(aside.map((k) => app.storedText(k)));
    expect(texts).toContain(broken);
    // Make a fresh stored design for the next round.
    await app.clickBlock(demo, 'mat-r0c1');
    await app.setCellsPerWordline(String(300 + round));
    await app.waitUntilKept();
  }

  // Recent lists the two kept-aside designs: one saves to a file exactly as stored, one is discarded.
  await page.getByTestId('recent-menu').click();
  await expect(page.getByTestId('kept-aside-entry')).toHaveCount(2);
  await page.screenshot({ path: test.info().outputPath('kept-aside.png') });
  const downloaded = page.waitForEvent('download');
  await page.getByTestId('kept-aside-save').first().click();
  const file = await downloaded;
  expect(file.suggestedFilename()).toMatch(/^kept-aside-.*\.json$/);
  const path = await file.path();
  const { readFile } = await import('node:fs/promises');
  expect(await readFile(path, 'utf8')).toMatch(/^\{"format":"matloom-design","version":1,"round":[12]$/);
  page.once('dialog', (dialog) => void dialog.accept());
  await page.getByTestId('kept-aside-discard').first().click();
  await expect(page.getByTestId('kept-aside-entry')).toHaveCount(1);
  await expect(page.getByTestId('notice')).toContainText('Discarded the kept-aside design');
  expect((await app.storedKeys()).filter((k) => k.startsWith('unreadable:'))).toHaveLength(1);
});

test('a 65,536-mat design is kept and survives a reload', async ({ page }) => {
  test.setTimeout(240_000);
  const app = new DocumentsPage(page);
  await page.goto('/?generate=256x256');
  await app.canvasArea.locator('canvas').first().waitFor({ timeout: 120_000 });
  await page.keyboard.press('Control+a');
  await page.keyboard.press('ArrowRight');
  await app.waitUntilKept(120_000);
  await expect(page).toHaveURL(/\/$/);
  await page.reload();
  await app.canvasArea.locator('canvas').first().waitFor({ timeout: 120_000 });
  await expect(page.getByTestId('design-name')).toContainText('Generated 256 × 256');
  await expect(page.getByTestId('notice')).toHaveCount(0);
  const [key] = (await app.storedKeys()).filter((k) => k.startsWith('design:'));
  const size = await page.evaluate(
    (k) => withStore('readonly', (s) => s.get(k)).then((b) => (b as Blob).size),
    key as string,
  );
  expect(size).toBeGreaterThan(20_000_000);
});

test('Ctrl+S downloads a file that restores; Ctrl+O writes back to the picked file; a dropped file opens', async ({
  page,
}) => {
  const app = new DocumentsPage(page);
  await app.openAt('/');
  const [download] = await Promise.all([page.waitForEvent('download'), page.keyboard.press('Control+s')]);
  const saved = readFileSync(await download.path(), 'utf8');
  expect(restoreDesign(saved).ok).toBe(true);

  // A file picker that hands over a file with a writable handle, as Chromium's does.
  await page.evaluate(
    (text) => {
      const written: string[] = [];
      (window as unknown as { written: string[] }).written = written;
      const handle = {
        kind: 'file',
        name: 'picked.matloom.json',
        getFile: async () => new File([text], 'picked.matloom.json', { type: 'application/json' }),
        createWritable: async () => {
          let data = '';
          return {
            // Like the real stream, it takes text or Blobs, appended in order.
            write: async (chunk: string | Blob) =>
              void (data += typeof chunk === 'string' ? chunk : await chunk.text()),
            close: async () => void written.push(data),
          };
        },
      };
      (window as unknown as { showOpenFilePicker: () => Promise<unknown[]> }).showOpenFilePicker =
        async () => [handle];
    },
    JSON.stringify({ ...loadDemoDesign(), name: 'Picked design' }),
  );
  await page.keyboard.press('Control+o');
  await expect(page.getByTestId('design-name')).toHaveText('Picked design');
  await page.keyboard.press('Control+s');
  await expect(page.getByTestId('notice')).toContainText('Saved to picked.matloom.json');
  const written = await page.evaluate(() => (window as unknown as { written: string[] }).written);
  expect(written).toHaveLength(1);
  expect(JSON.parse(written[0] as string).name).toBe('Picked design');

  // Drop a UTF-16 file with a byte-order mark on the page.
  const dropped = JSON.stringify({ ...loadDemoDesign(), name: 'Dropped design' });
  const utf16 = [0xff, 0xfe, ...Array.from(Buffer.from(dropped, 'utf16le'))];
  await page.evaluate((bytes) => {
    const transfer = new DataTransfer();
    transfer.items.add(new File([new Uint8Array(bytes)], 'dropped.json', { type: 'application/json' }));
    window.dispatchEvent(new DragEvent('dragover', { dataTransfer: transfer, cancelable: true }));
    window.dispatchEvent(new DragEvent('drop', { dataTransfer: transfer, cancelable: true }));
  }, utf16);
  await expect(page.getByTestId('design-name')).toHaveText('Dropped design');
});

test('the tab asks before closing while changes are in no file, and not after Save', async ({ page }) => {
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  const asked: string[] = [];
  page.on('dialog', (dialog) => void asked.push(dialog.type()));
  await page.reload();
  expect(asked).toEqual(['beforeunload']);
  await app.canvasArea.locator('canvas').first().waitFor();
  await Promise.all([page.waitForEvent('download'), page.getByTestId('save-file').click()]);
  await page.reload();
  expect(asked).toEqual(['beforeunload']);
});

test('when storage fails, the notice stays until the design is saved to a file', async ({ page }) => {
  await page.addInitScript(() => {
    IDBObjectStore.prototype.put = function () {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    };
  });
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  const problem = page.getByTestId('storage-problem');
  await expect(problem).toContainText('QuotaExceededError');
  await app.clickBlock(demo, 'mat-r0c0');
  await expect(problem).toBeVisible();
  await Promise.all([page.waitForEvent('download'), page.getByTestId('storage-problem-save').click()]);
  await expect(problem).toHaveCount(0);
});

test('a share link carries the design and opens as a new document', async ({ page, context }) => {
  await context.grantPermissions(['clipboard-read', 'clipboard-write']);
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  await page.getByTestId('share-link').click();
  await expect(page.getByTestId('share-link')).toHaveAttribute('data-link', /#design=/);
  const link = (await page.getByTestId('share-link').getAttribute('data-link')) as string;

  const other = await context.newPage();
  const viewer = new DocumentsPage(other);
  await viewer.openAt(link);
  await expect(other.getByTestId('notice')).toContainText('Opened a shared design as a new document');
  await viewer.clickBlock(demo, 'mat-r0c1');
  await expect(other.getByTestId('cells-per-wordline')).toHaveValue('384');
});

test('a design with a formula-like name opens safely and its CSV keeps the name as text', async ({
  page,
}) => {
  const app = new DocumentsPage(page);
  await app.openAt('/');
  const demo = loadDemoDesign();
  const hostile = {
    ...demo,
    name: `=HYPERLINK("http://example.invalid","x") ${'long '.repeat(30)}`.slice(0, 200),
    blocks: demo.blocks.map((b) => (b.id === 'mat-r0c0' ? { ...b, name: '@SUM(1+1)' } : b)),
  };
  await page.getByTestId('open-file-input').setInputFiles({
    name: 'formula.json',
    mimeType: 'application/json',
    buffer: Buffer.from(JSON.stringify(hostile)),
  });
  await expect(page.getByTestId('design-name')).toHaveAttribute('title', hostile.name);
  // The long name is cut in the toolbar, which stays within the window.
  const toolbar = await page.locator('header.toolbar').boundingBox();
  expect((toolbar?.width ?? 0) <= 1400).toBe(true);
  const nameBox = await page.getByTestId('design-name').boundingBox();
  expect(nameBox?.width ?? 0).toBeLessThan(400);
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByTestId('export-csv').click()]);
  const csv = readFileSync(await file.path(), 'utf8');
  // Names lead each CSV row; the formula-like one is neutralised with a leading apostrophe.
  expect(csv).toMatch(/^'@SUM\(1\+1\),mat-r0c0,/m);
  expect(csv).not.toMatch(/(^|,)@SUM/m);
});

test('Recent forgets a stored design (never the open one), and Undo puts it back', async ({ page }) => {
  const app = new DocumentsPage(page);
  const demo = loadDemoDesign();
  await app.openAt('/');
  await app.clickBlock(demo, 'mat-r0c1');
  await app.setCellsPerWordline('384');
  await app.waitUntilKept();
  await app.openAt('/?generate=8x8');
  await page.keyboard.press('Control+a');
  await page.keyboard.press('ArrowRight');
  await app.waitUntilKept();
  const storedDesigns = async () => (await app.storedKeys()).filter((k) => k.startsWith('design:')).sort();
  const both = await storedDesigns();
  expect(both).toHaveLength(2);

  await page.getByTestId('recent-menu').click();
  await expect(page.getByTestId('recent-entry')).toHaveCount(2);
  // The open design has no Forget button; the edited demo has one.
  const forget = page.getByTestId('recent-forget');
  await expect(forget).toHaveCount(1);
  await page.getByTestId('recent-list').screenshot({ path: 'test-results/recent-forget.png' });
  await forget.click();
  await expect(page.getByTestId('notice')).toContainText(`Forgot “${demo.name}”`);
  await expect(page.getByTestId('recent-entry')).toHaveCount(1);
  expect(await storedDesigns()).toHaveLength(1);

  await page.getByTestId('notice-action').click();
  await expect(page.getByTestId('notice')).toContainText('kept again');
  expect(await storedDesigns()).toEqual(both);
  // The open list shows it again; reopening it gives the edited design.
  await expect(page.getByTestId('recent-entry')).toHaveCount(2);
  await page.getByTestId('recent-entry').filter({ hasText: demo.name }).click();
  await expect(page.getByTestId('design-name')).toHaveText(demo.name);
  const texts = await Promise.all(both.map((k) => app.storedText(k)));
  const edited = texts.map((t) => restoreDesign(t ?? '')).find((r) => r.ok && r.design.name === demo.name);
  expect(edited?.ok && edited.design.blocks.find((b) => b.id === 'mat-r0c1')).toMatchObject({
    cellsPerWordline: 384,
  });
});
