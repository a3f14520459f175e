import { expect, test } from '@playwright/test';
import { KeyboardPage } from './keyboardPage';

test.beforeEach(async ({ page }) => {
  await page.goto('/');
  await page.getByTestId('floorplan').locator('canvas').first().waitFor();
});

test('keyboard only: build a bank, edit a mat from the block list, sweep, build a front point, compare', async ({
  page,
}) => {
  test.setTimeout(120_000);
  const keys = new KeyboardPage(page);

  // Build a bank in the explorer.
  await keys.showView('explorer');
  await keys.tabTo(page.getByTestId('build-partition'));
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('built-note')).toBeVisible();
  await expect(page.getByTestId('variant-switcher').locator('option')).toHaveCount(2);

  // Back on the floorplan, pick the third block from the list and change its cells per bit line.
  await keys.showView('floorplan');
  const list = page.getByTestId('outline-list');
  await keys.tabTo(list);
  await page.keyboard.press('Home');
  await page.keyboard.press('ArrowDown');
  await page.keyboard.press('ArrowDown');
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('selected-count')).toHaveText('1 selected');
  await expect(page.getByTestId('selection-announcer')).toContainText('Selected mat');
  const chosen = list.locator('[role="option"][aria-selected="true"]');
  await expect(chosen).toHaveCount(1);
  const active = await list.getAttribute('aria-activedescendant');
  expect(await chosen.getAttribute('id')).toBe(active);
  await keys.typeInto(page.getByTestId('cells-per-bitline'), '384');
  await expect(page.getByTestId('selection-announcer')).toContainText('384 cells per bit line');
  await expect(page.getByTestId('cells-per-bitline')).toHaveValue('384');

  // Run a sweep and build a point of its Pareto front.
  await keys.showView('explorer');
  await keys.tabTo(page.getByTestId('run-sweep'));
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('sweep-status')).toHaveAttribute('data-status', 'done', { timeout: 60_000 });
  await expect(page.getByTestId('sweep-announcer')).toContainText('Sweep done');
  await keys.tabTo(page.getByTestId('build-front-0'));
  await expect(page.getByTestId('chart-tooltip')).toBeVisible();
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('built-point')).toBeVisible();
  await expect(page.getByTestId('variant-switcher').locator('option')).toHaveCount(3);

  // Compare the variants, and switch back to the first from the table.
  await keys.showView('variants');
  await expect(page.getByTestId('variants-table').locator('thead th')).toHaveCount(4);
  // Better and worse are said in words and arrows, not by the tint alone.
  await expect(page.getByTestId('variants-table')).toContainText('· better');
  await expect(page.getByTestId('variants-table')).toContainText('· worse');
  await keys.tabTo(page.getByTestId('switch-v1'));
  await page.keyboard.press('Enter');
  await expect(page.getByTestId('active-v1')).toBeVisible();
  await page.screenshot({ path: test.info().outputPath('keyboard-variants.png') });
});

test('keyboard only: add a block from the form, then delete it from the list', async ({ page }) => {
  const keys = new KeyboardPage(page);
  const count = page.getByTestId('block-count');
  const before = Number(((await count.textContent()) ?? '').replace(/\D/g, ''));
  await keys.tabTo(page.getByTestId('add-type'));
  await page.keyboard.press('ArrowDown'); // sense-amplifier strip
  await expect(page.getByTestId('add-type')).toHaveValue('senseAmpStrip');
  await keys.typeInto(page.getByTestId('add-x'), '-200', false);
  await keys.typeInto(page.getByTestId('add-y'), '-50', false);
  await keys.typeInto(page.getByTestId('add-width'), '40', false);
  // Enter in the last field submits the form.
  await keys.typeInto(page.getByTestId('add-height'), '6');
  await expect(count).toHaveText(`${before + 1} blocks`);
  await expect(page.getByTestId('selection-announcer')).toContainText('sense-amplifier strip SA');

  // A bad value is refused with its reason and adds nothing.
  await keys.typeInto(page.getByTestId('add-width'), 'wide');
  await expect(page.getByTestId('add-width')).toHaveAttribute('aria-invalid', 'true');
  await expect(count).toHaveText(`${before + 1} blocks`);

  // The new block is last in the list: End, then Delete.
  await keys.tabTo(page.getByTestId('outline-list'));
  await page.keyboard.press('End');
  await page.keyboard.press('Delete');
  await expect(count).toHaveText(`${before} blocks`);
});

test('dialogs take focus, keep it, close on Escape and give it back', async ({ page }) => {
  const keys = new KeyboardPage(page);
  for (const [opener, dialog] of [
    ['open-help', 'shortcut-help'],
    ['export-png-menu', 'png-dialog'],
  ] as const) {
    await keys.tabTo(page.getByTestId(opener));
    await page.keyboard.press('Enter');
    const box = page.getByTestId(dialog);
    await expect(box).toBeVisible();
    const inside = () => box.evaluate((el) => el.contains(document.activeElement));
    expect(await inside()).toBe(true);
    for (let i = 0; i < 12; i++) {
      await page.keyboard.press('Tab');
      expect(await inside()).toBe(true);
    }
    await page.keyboard.press('Escape');
    await expect(box).toBeHidden();
    await expect(page.getByTestId(opener)).toBeFocused();
  }

  // Step and repeat opens from the keyboard on the selection.
  await page.getByTestId('floorplan').focus();
  await page.keyboard.press('Control+a');
  await page.keyboard.press('t');
  await expect(page.getByTestId('step-repeat')).toBeVisible();
  expect(await page.getByTestId('step-repeat').evaluate((el) => el.contains(document.activeElement))).toBe(
    true,
  );
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('step-repeat')).toBeHidden();
  await expect(page.getByTestId('floorplan')).toBeFocused();
});

test('tab bars follow the tabs pattern', async ({ page }) => {
  const keys = new KeyboardPage(page);
  const selection = page.getByTestId('tab-floorplan');
  await keys.tabTo(selection);
  await page.keyboard.press('ArrowRight');
  const process = page.getByTestId('tab-process');
  await expect(process).toBeFocused();
  await expect(process).toHaveAttribute('aria-selected', 'true');
  const panel = await process.getAttribute('aria-controls');
  await expect(page.locator(`#${panel}`)).toBeVisible();
  await expect(page.locator(`#${panel}`)).toHaveAttribute('role', 'tabpanel');
  await page.keyboard.press('End');
  const sidebarTabs = page.getByRole('tablist', { name: 'Panels' }).getByRole('tab');
  await expect(sidebarTabs.last()).toHaveAttribute('aria-selected', 'true');
  await page.keyboard.press('ArrowRight');
  await expect(selection).toHaveAttribute('aria-selected', 'true');
  for (const tab of await page.getByRole('tab').all()) {
    const controls = await tab.getAttribute('aria-controls');
    await expect(page.locator(`#${controls}`)).toHaveCount(1);
  }
});

test('every visible button has a tooltip', async ({ page }) => {
  const untitled = async () =>
    page.evaluate(() =>
      Array.from(document.querySelectorAll('button'))
        .filter((b) => b.offsetParent !== null && !b.title.trim())
        .map((b) => b.outerHTML.slice(0, 120)),
    );
  expect(await untitled()).toEqual([]);
  await page.getByTestId('view-explorer').click();
  expect(await untitled()).toEqual([]);
  await page.getByTestId('view-variants').click();
  expect(await untitled()).toEqual([]);
});
