import { expect, test, type Page } from '@playwright/test';
import { EditorPage } from './editorPage';
import { ExplorerPage } from './explorerPage';
import { loadDemoDesign } from './floorplanPage';

/** Folded 8F² cell at F = 18 nm: one more cell per line adds two 36 nm lines, 72 nm (arithmetic). */
const CELL_STEP = 72e-9;

/** The selected mat's rectangle (m), read from the properties panel. */
async function selectedMatRect(app: EditorPage) {
  const number = async (id: string) =>
    Number.parseFloat((await app.field(id).inputValue()).replace(/,/g, ''));
  const x = (await number('block-x')) * 1e-6;
  const y = (await number('block-y')) * 1e-6;
  const cellsPerBitline = await number('cells-per-bitline');
  const cellsPerWordline = await number('cells-per-wordline');
  return {
    x,
    y,
    width: cellsPerWordline * CELL_STEP,
    height: cellsPerBitline * CELL_STEP,
    cellsPerBitline,
    cellsPerWordline,
  };
}

async function noPageErrors(page: Page) {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return errors;
}

test.describe('sketching a bank by hand', () => {
  test('from a blank sheet, a clean bank with decoders in ten actions', async ({ page }) => {
    const errors = await noPageErrors(page);
    const app = new EditorPage(page);
    await app.openWith('?blank');
    await expect(page.getByTestId('checks-empty')).toContainText('Nothing to check yet');
    // The empty sheet opens with the mat tool chosen, at a zoom where a short drag is a few hundred cells.
    await expect(app.tool('mat')).toHaveAttribute('aria-pressed', 'true');

    // 1: drag a mat.
    await app.drag(await app.canvasPoint(260, 160), await app.canvasPoint(420, 300));
    await expect(app.summary()).toContainText('mat Mat 1');
    const m = await selectedMatRect(app);
    for (const count of [m.cellsPerBitline, m.cellsPerWordline]) {
      expect(count % 64).toBe(0);
      expect(count).toBeGreaterThanOrEqual(128);
      expect(count).toBeLessThanOrEqual(1024);
    }
    await expect(page.getByTestId('mat-size')).toContainText(
      `${m.cellsPerBitline.toLocaleString('en-US')} × ${m.cellsPerWordline.toLocaleString('en-US')} cells/BL × cells/WL`,
    );
    // 2–4: sense-amplifier strips above and below (the bit-line ends).
    await page.keyboard.press('4');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y - 0.2e-6));
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height + 0.2e-6));
    // 5–6: a driver strip on the left (a word-line end).
    await page.keyboard.press('5');
    await app.click(await app.worldPoint(m.x - 0.2e-6, m.y + m.height / 2));
    await expect(page.getByTestId('findings')).toContainText('reach no row decoder');
    await expect(page.getByTestId('findings')).toContainText('reach no column decoder');
    // 7–8: a row decoder beside the left of the stack (left of the driver strip, 3 µm wide).
    await page.keyboard.press('6');
    const stackLeft = m.x - 3e-6;
    await app.click(await app.worldPoint(stackLeft - 1e-6, m.y + m.height / 2));
    await expect(app.summary()).toContainText(/row decoder Row decoder 1, 18 µm × /);
    // 9–10: a column decoder below the stack (under the bottom strip, 6 µm high).
    await page.keyboard.press('7');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height + 6e-6 + 1e-6));
    await app.expectChecksClear();
    await expect(app.blockCount()).toHaveText('6 blocks');
    await page.screenshot({ path: test.info().outputPath('1-clean-bank.png') });

    expect(errors).toEqual([]);
  });

  test('step and repeat shares the strips between neighbours; abutting copies warn of strips back to back', async ({
    page,
  }) => {
    const errors = await noPageErrors(page);
    const app = new EditorPage(page);
    await app.openWith('?blank');
    await app.drag(await app.canvasPoint(300, 100), await app.canvasPoint(420, 180));
    const m = await selectedMatRect(app);
    await page.keyboard.press('4');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y - 0.2e-6));
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height + 0.2e-6));
    await page.keyboard.press('5');
    await app.click(await app.worldPoint(m.x - 0.2e-6, m.y + m.height / 2));
    await page.keyboard.press('1');
    await page.keyboard.press('Control+a');
    await page.keyboard.press('t');
    const dialog = page.getByTestId('step-repeat');
    // The offered pitch lays each copy's top strip on the previous bottom strip.
    await expect(page.getByTestId('repeat-share')).toBeChecked();
    await app.field('repeat-columns').fill('1');
    await app.field('repeat-columns').press('Tab');
    await app.field('repeat-rows').fill('3');
    await app.field('repeat-rows').press('Tab');
    await page.getByTestId('repeat-apply').click();
    await expect(dialog).toBeHidden();
    // 3 mats, 4 sense-amplifier strips (two shared), 3 drivers.
    await expect(app.blockCount()).toHaveText('10 blocks');
    await expect(page.getByTestId('findings')).not.toContainText('back to back');
    // Decoders fit the whole stack of three mats.
    await page.keyboard.press('6');
    await app.click(await app.worldPoint(m.x - 4e-6, m.y + m.height / 2));
    await page.keyboard.press('7');
    const stackBottom = m.y + 3 * m.height + 4 * 6e-6 - 6e-6;
    await app.click(await app.worldPoint(m.x + m.width / 2, stackBottom + 1e-6));
    await app.expectChecksClear();
    await page.getByTestId('zoom-fit').click();
    await page.screenshot({ path: test.info().outputPath('2-shared-repeat.png') });

    // Undo the decoders and the repeat; repeat again with the strips not shared: copies abut, strips stack.
    for (let i = 0; i < 3; i++) await page.keyboard.press('Control+z');
    await expect(app.blockCount()).toHaveText('4 blocks');
    await page.keyboard.press('Control+a');
    await page.keyboard.press('t');
    await page.getByTestId('repeat-share').uncheck();
    await app.field('repeat-columns').fill('1');
    await app.field('repeat-columns').press('Tab');
    await app.field('repeat-rows').fill('3');
    await app.field('repeat-rows').press('Tab');
    await page.getByTestId('repeat-apply').click();
    await expect(app.blockCount()).toHaveText('12 blocks');
    await expect(page.getByTestId('findings')).toContainText(
      'are sense-amplifier strips back to back; one strip shared by the mats on both sides',
    );
    expect(errors).toEqual([]);
  });

  test('changing a mat’s cell keeps its capacity and its bank whole: no new finding, one undo step', async ({
    page,
  }) => {
    const errors = await noPageErrors(page);
    const app = new EditorPage(page);
    await app.openWith('?blank');
    await app.drag(await app.canvasPoint(260, 160), await app.canvasPoint(420, 300));
    const m = await selectedMatRect(app);
    await page.keyboard.press('4');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y - 0.2e-6));
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height + 0.2e-6));
    await page.keyboard.press('5');
    await app.click(await app.worldPoint(m.x - 0.2e-6, m.y + m.height / 2));
    await page.keyboard.press('6');
    await app.click(await app.worldPoint(m.x - 4e-6, m.y + m.height / 2));
    await page.keyboard.press('7');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height + 7e-6));
    await app.expectChecksClear();

    await page.keyboard.press('1');
    await app.click(await app.worldPoint(m.x + m.width / 2, m.y + m.height / 2));
    const size = await page.getByTestId('mat-size').textContent();
    await app.field('mat-cell').selectOption({ label: '1T1C eDRAM folded 50F²' });
    // Same cells and bits, a larger mat (5F pitches), its strips and decoders moved and re-fitted.
    await expect(page.getByTestId('mat-size')).toHaveText(size ?? '');
    await expect(app.field('block-x')).toHaveValue(await app.field('block-x').inputValue());
    await app.expectChecksClear();
    await page.getByTestId('zoom-fit').click();
    await page.screenshot({ path: test.info().outputPath('3-cell-changed.png') });
    await page.keyboard.press('Control+z');
    await expect(app.field('mat-cell')).toHaveValue('dram-folded-8f2');
    await app.expectChecksClear();
    expect(errors).toEqual([]);
  });
  test('changing the cell of one mat inside the demo grid keeps its slot: nothing else moves, no new finding, one undo', async ({
    page,
  }) => {
    const errors = await noPageErrors(page);
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    await app.expectChecksClear();
    await app.clickBlock(demo, 'mat-r1c1');
    const x = await app.field('block-x').inputValue();
    const y = await app.field('block-y').inputValue();
    await app.field('mat-cell').selectOption({ label: '1T1C eDRAM folded 50F²' });
    await expect(page.getByTestId('cell-change-note')).toContainText('Mat 2.2 keeps its slot in the grid');
    await expect(page.getByTestId('cell-change-note')).toContainText(
      'was 512 × 512 cells/BL × cells/WL · 512 Kib',
    );
    await expect(app.field('block-x')).toHaveValue(x);
    await expect(app.field('block-y')).toHaveValue(y);
    await app.expectChecksClear();
    await page.screenshot({ path: test.info().outputPath('4-cell-changed-in-grid.png') });
    await page.keyboard.press('Control+z');
    await expect(app.field('mat-cell')).toHaveValue('dram-folded-8f2');
    await expect(page.getByTestId('cell-change-note')).toHaveCount(0);
    await app.expectChecksClear();
    expect(errors).toEqual([]);
  });
});

test.describe('comparing variants', () => {
  test('variants of different capacities compare per bit, in plain percentages with arrows and words', async ({
    page,
  }) => {
    const errors = await noPageErrors(page);
    const explorer = new ExplorerPage(page);
    await explorer.open();
    // A 64 Mib bank beside the 8 Mib demo: the new one (v2) is the variant being edited.
    await page.getByTestId('build-partition').click();
    await expect(page.getByTestId('built-note')).toBeVisible();
    await page.getByTestId('view-variants').click();
    await expect(page.getByTestId('active-v2')).toBeVisible();
    const areaDelta = page.getByTestId('variant-v1-totalArea-delta');
    // The 8 Mib demo is far smaller in total: a plain percentage with an arrow, no exponent (total size
    // is neither better nor worse).
    await expect(areaDelta).toHaveText(/^↓ −\d{2}\.\d %$/);
    // Per bit, the area compares fairly: the row says so and the change is a few per cent, not −87 %.
    await page.getByTestId('variants-per-bit').check();
    await expect(page.getByTestId('variants-table')).toContainText('Bank area per bit');
    await expect(page.getByTestId('variants-table')).toContainText('Mats per Mib');
    await expect(page.getByTestId('variants-table')).not.toContainText(/\de[+-]\d/);
    const perBit = (await areaDelta.textContent()) ?? '';
    expect(perBit).toMatch(/^[↑↓] [+−][\d,]+\.?\d* % · (better|worse)$/);
    expect(perBit).not.toMatch(/e[+-]?\d/);
    await page.screenshot({ path: test.info().outputPath('4-variants-per-bit.png') });
    expect(errors).toEqual([]);
  });
});
