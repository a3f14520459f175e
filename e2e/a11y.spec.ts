import AxeBuilder from '@axe-core/playwright';
import { expect, test, type Page } from '@playwright/test';

/** Runs the accessibility scan and fails on any critical or serious violation, listing them. */
async function expectNoSeriousViolations(page: Page, where: string) {
  const result = await new AxeBuilder({ page }).analyze();
  const bad = result.violations.filter((v) => v.impact === 'critical' || v.impact === 'serious');
  const listed = bad.map(
    (v) =>
      `${where}: ${v.id} (${v.impact}) ${v.help}\n  ${v.nodes.map((n) => n.target.join(' ')).join('\n  ')}`,
  );
  expect.soft(listed, listed.join('\n')).toEqual([]);
}

test('every view, tab and dialog has no critical or serious accessibility violation', async ({ page }) => {
  test.setTimeout(120_000);
  await page.goto('/');
  await page.getByTestId('floorplan').locator('canvas').first().waitFor();
  await expectNoSeriousViolations(page, 'floorplan');
  for (const tab of ['process', 'cells', 'yield', 'floorplan'] as const) {
    await page.getByTestId(`tab-${tab}`).click();
    await expectNoSeriousViolations(page, `sidebar tab ${tab}`);
  }
  await page.getByTestId('open-help').click();
  await expect(page.getByTestId('shortcut-help')).toBeVisible();
  await expectNoSeriousViolations(page, 'shortcut help');
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('shortcut-help')).toBeHidden();

  await page.keyboard.press('Control+a');
  await page.keyboard.press('t');
  await expect(page.getByTestId('step-repeat')).toBeVisible();
  await expectNoSeriousViolations(page, 'step and repeat');
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('step-repeat')).toBeHidden();

  await page.getByTestId('export-png-menu').click();
  await expect(page.getByTestId('png-dialog')).toBeVisible();
  await expectNoSeriousViolations(page, 'PNG export');
  await page.keyboard.press('Escape');
  await expect(page.getByTestId('png-dialog')).toBeHidden();

  await page.getByTestId('view-explorer').click();
  await expect(page.getByTestId('explorer')).toBeVisible();
  await expectNoSeriousViolations(page, 'explorer before a sweep');
  await page.getByTestId('run-sweep').click();
  await expect(page.getByTestId('sweep-status')).toHaveAttribute('data-status', 'done', { timeout: 30_000 });
  await expectNoSeriousViolations(page, 'explorer after a sweep');
  // The block menu on the floorplan.
  await page.getByTestId('view-floorplan').click();
  await page.getByTestId('outline-list').focus();
  await page.keyboard.press('Enter');
  await page.getByTestId('floorplan').focus();
  await page.keyboard.press('Shift+F10');
  await expect(page.getByTestId('block-menu')).toBeVisible();
  await expectNoSeriousViolations(page, 'block menu');
  await page.keyboard.press('Escape');

  await page.getByTestId('view-variants').click();
  await expect(page.getByTestId('variants-view')).toBeVisible();
  await expectNoSeriousViolations(page, 'variants');
});

test('the dark theme has no critical or serious accessibility violation either', async ({ page }) => {
  test.setTimeout(120_000);
  await page.emulateMedia({ colorScheme: 'dark' });
  await page.goto('/');
  await page.getByTestId('floorplan').locator('canvas').first().waitFor();
  await expect(page.locator('html')).toHaveAttribute('data-theme', 'dark');
  await expectNoSeriousViolations(page, 'dark floorplan');
  for (const tab of ['process', 'cells', 'yield', 'floorplan'] as const) {
    await page.getByTestId(`tab-${tab}`).click();
    await expectNoSeriousViolations(page, `dark sidebar tab ${tab}`);
  }
  await page.getByTestId('open-help').click();
  await expectNoSeriousViolations(page, 'dark shortcut help');
  await page.keyboard.press('Escape');
  await page.getByTestId('view-explorer').click();
  await page.getByTestId('run-sweep').click();
  await expect(page.getByTestId('sweep-status')).toHaveAttribute('data-status', 'done', { timeout: 30_000 });
  await page.getByTestId('build-front-0').click();
  await expectNoSeriousViolations(page, 'dark explorer after a sweep');
  await page.getByTestId('view-variants').click();
  await expect(page.getByTestId('variants-view')).toBeVisible();
  await expectNoSeriousViolations(page, 'dark variants');
});
