import { expect, test } from '@playwright/test';
import { EditorPage } from './editorPage';
import { loadDemoDesign } from './floorplanPage';

test('a right-click on a block opens the block menu; Shift+F10 opens it from the keyboard', async ({
  page,
}) => {
  const app = new EditorPage(page);
  const demo = loadDemoDesign();
  await app.open();
  const p = await app.centreOf(demo, 'mat-r0c0');
  await page.mouse.click(p.x, p.y, { button: 'right' });
  const menu = page.getByTestId('block-menu');
  await expect(menu).toBeVisible();
  await expect(app.selectedCount()).toHaveText('1 selected');
  await expect(page.getByTestId('menu-edit.duplicate')).toBeFocused();
  await page.screenshot({ path: test.info().outputPath('block-menu.png') });
  await page.getByTestId('menu-edit.rotate').click();
  await expect(menu).toBeHidden();
  await expect(page.getByTestId('undo')).toBeEnabled();

  // From the keyboard: the canvas has the selection; Shift+F10 opens the menu, Down moves, Escape closes.
  await page.getByTestId('floorplan').focus();
  await page.keyboard.press('Shift+F10');
  await expect(menu).toBeVisible();
  await page.keyboard.press('ArrowDown');
  await expect(page.getByTestId('menu-edit.copy')).toBeFocused();
  await page.keyboard.press('Escape');
  await expect(menu).toBeHidden();
  await expect(page.getByTestId('floorplan')).toBeFocused();
  await page.keyboard.press('Shift+F10');
  await page.keyboard.press('End');
  await expect(page.getByTestId('menu-edit.delete')).toBeFocused();
  await page.keyboard.press('Enter');
  await expect(app.blockCount()).toHaveText(`${demo.blocks.length - 1} blocks`);
});

test('two-finger scroll pans, pinch (Ctrl+wheel) zooms, and a touch pinch zooms', async ({
  page,
  browser,
}) => {
  const app = new EditorPage(page);
  await app.open();
  const box = await app.canvasArea.boundingBox();
  if (!box) throw new Error('no canvas');
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  const before = await app.camera();
  await page.mouse.wheel(6, 14.5);
  await expect.poll(async () => (await app.camera()).offsetY).toBeCloseTo(before.offsetY - 14.5, 1);
  expect((await app.camera()).scale).toBe(before.scale);
  await page.keyboard.down('Control');
  await page.mouse.wheel(0, -8);
  await page.keyboard.up('Control');
  await expect.poll(async () => (await app.camera()).scale).toBeGreaterThan(before.scale);

  // Touch: two fingers spread apart on the canvas.
  const context = await browser.newContext({ hasTouch: true, viewport: { width: 1400, height: 860 } });
  const touchPage = await context.newPage();
  const touchApp = new EditorPage(touchPage);
  await touchApp.open();
  const c = await touchApp.camera();
  const cx = c.box.x + c.box.width / 2;
  const cy = c.box.y + c.box.height / 2;
  const cdp = await context.newCDPSession(touchPage);
  const touch = async (type: 'touchStart' | 'touchMove' | 'touchEnd', spread: number) =>
    cdp.send('Input.dispatchTouchEvent', {
      type,
      touchPoints:
        type === 'touchEnd'
          ? []
          : [
              { x: cx - spread, y: cy, id: 1 },
              { x: cx + spread, y: cy, id: 2 },
            ],
    });
  await touch('touchStart', 40);
  for (const spread of [50, 60, 70, 80]) await touch('touchMove', spread);
  await touch('touchEnd', 0);
  await expect.poll(async () => (await touchApp.camera()).scale).toBeGreaterThan(c.scale * 1.8);
  await context.close();
});

test('the view and the selection live in the address: Back and reload behave', async ({ page }) => {
  const app = new EditorPage(page);
  await app.open();
  await page.getByTestId('view-explorer').click();
  await expect(page).toHaveURL(/view=explorer/);
  await page.getByTestId('view-variants').click();
  await expect(page).toHaveURL(/view=variants/);
  await page.goBack();
  await expect(page.getByTestId('view-explorer')).toHaveAttribute('aria-selected', 'true');
  await page.goBack();
  await expect(page.getByTestId('view-floorplan')).toHaveAttribute('aria-selected', 'true');

  const fitted = (await app.camera()).scale;
  await page.getByTestId('outline-mat-r1c2').click();
  await expect(page).toHaveURL(/select=mat-r1c2/);
  await page.reload();
  await app.canvasArea.locator('canvas').first().waitFor();
  await expect(app.selectedCount()).toHaveText('1 selected');
  await expect(page.getByTestId('outline-mat-r1c2')).toHaveAttribute('aria-selected', 'true');
  await expect.poll(async () => (await app.camera()).scale).toBeGreaterThan(fitted * 1.5);
});

test('dark mode follows the system and the toggle', async ({ page }) => {
  await page.emulateMedia({ colorScheme: 'dark' });
  const app = new EditorPage(page);
  await app.open();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await page.screenshot({ path: test.info().outputPath('dark.png') });
  await page.getByTestId('theme-choice').selectOption('light');
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'light');
  await page.reload();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'light');
  await page.getByTestId('theme-choice').selectOption('system');
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
});

test('at 1024 px wide everything is reachable; the sidebar and the block list fold away', async ({
  page,
}) => {
  await page.setViewportSize({ width: 1024, height: 720 });
  const app = new EditorPage(page);
  await app.open();
  const outside = await page.evaluate(() =>
    Array.from(document.querySelectorAll('button, select, input'))
      .filter((el) => (el as HTMLElement).offsetParent !== null)
      .filter((el) => {
        const r = el.getBoundingClientRect();
        const scroller = el.closest('.sidebar, .outline-list, .add-block, .tool-options, .explorer-controls');
        return !scroller && (r.right > window.innerWidth + 1 || r.bottom > window.innerHeight + 1);
      })
      .map((el) => el.outerHTML.slice(0, 100)),
  );
  expect(outside).toEqual([]);
  const before = (await app.canvasArea.boundingBox())?.width ?? 0;
  expect(before).toBeGreaterThan(300);
  await page.screenshot({ path: test.info().outputPath('width-1024.png') });
  await page.getByTestId('collapse-sidebar').click();
  await page.getByTestId('collapse-outline').click();
  await expect
    .poll(async () => (await app.canvasArea.boundingBox())?.width ?? 0)
    .toBeGreaterThan(before + 400);
  await page.screenshot({ path: test.info().outputPath('width-1024-folded.png') });
  await page.getByTestId('expand-sidebar').click();
  await page.getByTestId('expand-outline').click();
  await expect(page.getByTestId('tab-floorplan')).toBeVisible();
});
