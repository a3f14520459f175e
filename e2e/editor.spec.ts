import { expect, test } from '@playwright/test';
import { EditorPage } from './editorPage';
import { loadDemoDesign } from './floorplanPage';
import { blockRect } from '../src/geometry/placedBlocks';

test.describe('floorplan editor journeys', () => {
  test('keyboard shortcuts: tools, rotate, mirror, nudge, duplicate, delete, copy and paste, help', async ({
    page,
  }) => {
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    for (const [key, tool] of [
      ['2', 'pan'],
      ['6', 'rowDecoder'],
      ['8', 'spacer'],
      ['1', 'select'],
    ] as const) {
      await page.keyboard.press(key);
      await expect(app.tool(tool)).toHaveAttribute('aria-pressed', 'true');
    }
    await app.clickBlock(demo, 'mat-r0c0');
    await expect(app.summary()).toContainText('Mat 1.1');
    // Positions show in µm at the grid's precision: the 36 nm pitch needs whole nanometres.
    await expect(app.field('block-x')).toHaveValue('21.000 µm');

    await page.keyboard.press('r');
    await expect(app.field('mat-axis')).toHaveValue('horizontal');
    // Inside a list box Ctrl+Z belongs to the box: nothing is undone.
    await app.field('mat-axis').focus();
    await page.keyboard.press('Control+z');
    await expect(app.field('mat-axis')).toHaveValue('horizontal');
    await expect(page.getByTestId('undo')).toBeEnabled();
    await app.field('mat-axis').evaluate((el) => (el as HTMLElement).blur());
    await page.keyboard.press('Control+z');
    await expect(app.field('mat-axis')).toHaveValue('vertical');
    await page.keyboard.press('m');
    await expect(app.field('mat-mirrored')).toBeChecked();
    await page.keyboard.press('Control+z');
    await expect(app.field('mat-mirrored')).not.toBeChecked();

    // Arrows nudge by one bit-line pitch (2F = 36 nm); Shift by ten.
    await page.keyboard.press('ArrowRight');
    await expect(app.field('block-x')).toHaveValue('21.036 µm');
    await page.keyboard.press('Shift+ArrowDown');
    await expect(app.field('block-y')).toHaveValue('6.360 µm');

    await page.keyboard.press('Control+d');
    await expect(app.blockCount()).toHaveText('59 blocks');
    await expect(app.selectedCount()).toHaveText('1 selected');
    await page.keyboard.press('Delete');
    await expect(app.blockCount()).toHaveText('58 blocks');

    // Copy a mat and paste it at the pointer, right of the floorplan.
    await app.clickBlock(demo, 'mat-r3c3');
    await page.keyboard.press('Control+c');
    const target = await app.worldPoint(195e-6, 10e-6);
    await page.mouse.move(target.x, target.y);
    await expect(page.getByTestId('cursor-coordinates')).toHaveText(/^x 19\d\.\d{3} µm {3}y \d+\.\d{3} µm$/);
    await page.keyboard.press('Control+v');
    await expect(app.blockCount()).toHaveText('59 blocks');
    await expect(app.summary()).toContainText('Mat 4.4');
    await expect(app.field('block-x')).toHaveValue(/^19[45]\.\d{3} µm$/);

    await page.keyboard.press('?');
    await expect(page.getByTestId('shortcut-help')).toBeVisible();
    await expect(page.getByTestId('shortcut-help')).toContainText('Step and repeat');
    await page.screenshot({ path: test.info().outputPath('3-shortcut-help.png') });
    await page.keyboard.press('Escape');
    await expect(page.getByTestId('shortcut-help')).toBeHidden();

    await page.keyboard.press('g');
    await expect(page.getByTestId('toggle-grid')).toHaveAttribute('aria-pressed', 'false');
    await page.keyboard.press('g');
    await expect(page.getByTestId('toggle-grid')).toHaveAttribute('aria-pressed', 'true');
    await page.keyboard.press('Escape');
    await expect(app.selectedCount()).toHaveText('0 selected');
  });

  test('a drag moves in whole pitches as one undo step, figures follow it live, and Escape cancels one', async ({
    page,
  }) => {
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    await expect(page.getByTestId('undo')).toBeDisabled();
    const start = await app.centreOf(demo, 'mat-r0c0');

    // Escape during a drag restores the mat and records nothing.
    await app.clickBlock(demo, 'mat-r0c0');
    await app.drag(start, { x: start.x + 60, y: start.y + 300 }, false);
    await page.keyboard.press('Escape');
    await page.mouse.up();
    await expect(app.field('block-x')).toHaveValue('21.000 µm');
    await expect(page.getByTestId('undo')).toBeDisabled();
    await app.expectChecksClear();

    // A real drag: while the button is down the checks already report the stranded mat.
    await app.drag(start, { x: start.x + 60, y: start.y + 600 }, false);
    await expect(page.getByTestId('findings')).toContainText('Mat 1.1');
    await page.screenshot({ path: test.info().outputPath('4-live-drag.png') });
    await page.mouse.up();
    await expect(page.getByTestId('undo')).toBeEnabled();
    const movedX = await app.field('block-x').inputValue();
    expect(movedX).not.toBe('21 µm');
    // 2F = 36 nm steps: the displacement is a whole number of bit-line pitches, unless the drag came
    // close enough to another block for the mat's left edge, right edge or centre to line up with that
    // block's (snapping.ts tries all three).
    const dxNm = (Number.parseFloat(movedX) - 21) * 1000;
    const onPitch = Math.abs(dxNm / 36 - Math.round(dxNm / 36)) < 1e-3;
    const mat = demo.blocks.find((b) => b.id === 'mat-r0c0');
    if (!mat) throw new Error('no mat-r0c0 in the demo');
    const widthNm = blockRect(demo, mat).width * 1e9;
    const leftNm = Number.parseFloat(movedX) * 1000;
    const otherEdgesNm = demo.blocks
      .filter((b) => b.id !== mat.id)
      .flatMap((b) => {
        const r = blockRect(demo, b);
        return [r.x * 1e9, (r.x + r.width) * 1e9, (r.x + r.width / 2) * 1e9];
      });
    const movedEdgesNm = [leftNm, leftNm + widthNm, leftNm + widthNm / 2];
    const onEdge = otherEdgesNm.some((e) => movedEdgesNm.some((m) => Math.abs(e - m) < 1));
    expect(onPitch || onEdge, `moved to ${movedX}: neither whole pitches nor lined up with an edge`).toBe(
      true,
    );
    await page.keyboard.press('Control+z');
    await expect(app.field('block-x')).toHaveValue('21.000 µm');
    await app.expectChecksClear();
    await expect(page.getByTestId('undo')).toBeDisabled();
  });

  test('a finding selects and frames its block; rubber band and shift-click select several', async ({
    page,
  }) => {
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    await app.clickBlock(demo, 'sa-r0c0');
    await app.click(await app.centreOf(demo, 'sa-r1c0'), ['Shift']);
    await expect(app.selectedCount()).toHaveText('2 selected');
    await page.keyboard.press('Delete');
    // Mat 1.1 loses both strips (unsensed); Mat 2.1 keeps one, too narrow for its amplifiers alone.
    await expect(app.findings()).toHaveCount(2);
    await page.keyboard.press('Escape');
    const before = await app.camera();
    await page.getByTestId('finding-unsensedBitlines').click();
    await expect(app.summary()).toContainText('Mat 1.1');
    await expect.poll(async () => (await app.camera()).scale).toBeGreaterThan(before.scale * 1.5);
    await page.screenshot({ path: test.info().outputPath('5-finding-framed.png') });

    // Rubber band from empty canvas around the two left mats of row 2 and their strips.
    await page.getByTestId('zoom-fit').click();
    const a = await app.worldPoint(19e-6, 47e-6);
    const b = await app.worldPoint(100e-6, 92e-6);
    await app.drag(a, b);
    await expect(app.summary()).toContainText('2 mats');
    // One value typed for both moves both, in one step.
    await app.field('cells-per-bitline').fill('256');
    await app.field('cells-per-bitline').press('Enter');
    await expect(app.field('cells-per-bitline')).toHaveValue('256');
    await page.keyboard.press('Control+z');
    await expect(app.field('cells-per-bitline')).toHaveValue('512');
    // Lengths take engineering notation: "0.25 mm" puts both mats' top edges at 250 µm.
    await app.field('block-y').fill('0.25 mm');
    await app.field('block-y').press('Enter');
    await expect(app.field('block-y')).toHaveValue('250.000 µm');
    await app.field('block-x').fill('far');
    await app.field('block-x').press('Enter');
    await expect(page.getByRole('alert')).toContainText('far');
  });

  test('wheel zoom keeps the point under the cursor; close up, cells and line directions are drawn', async ({
    page,
  }) => {
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    // Whole pixels: the browser reports pointer positions in whole pixels.
    const centre = await app.centreOf(demo, 'mat-r1c1');
    const p = { x: Math.round(centre.x), y: Math.round(centre.y) };
    const worldBefore = await app.worldAt(p);
    await page.mouse.move(p.x, p.y);
    // Each notch zooms by about a third; stop once a bit-line pitch (36 nm) is several pixels wide.
    for (let i = 0; i < 40 && (await app.camera()).scale < 300; i++) await page.mouse.wheel(0, -200);
    expect((await app.camera()).scale).toBeGreaterThan(300);
    const worldAfter = await app.worldAt(p);
    expect(Math.abs(worldAfter.x - worldBefore.x)).toBeLessThan(1e-9);
    expect(Math.abs(worldAfter.y - worldBefore.y)).toBeLessThan(1e-9);
    await expect(page.getByTestId('cursor-coordinates')).toContainText('µm');
    await page.screenshot({ path: test.info().outputPath('6-cells-close-up.png') });
    await page.keyboard.press('f');
    await expect.poll(async () => (await app.camera()).scale).toBeLessThan(10);

    // The pan tool (2) and Space + drag with any tool move the camera by the drag.
    const before = await app.camera();
    await page.keyboard.press('2');
    await app.drag(await app.canvasPoint(600, 400), await app.canvasPoint(500, 350));
    await expect.poll(async () => (await app.camera()).offsetX).toBeCloseTo(before.offsetX - 100, 6);
    await page.keyboard.press('1');
    await page.keyboard.down('Space');
    await app.drag(await app.canvasPoint(500, 350), await app.canvasPoint(600, 400));
    await page.keyboard.up('Space');
    await expect.poll(async () => (await app.camera()).offsetY).toBeCloseTo(before.offsetY, 6);
    await expect(app.selectedCount()).toHaveText('0 selected');

    // Z frames the selection.
    await app.clickBlock(demo, 'sa-r2c2');
    await page.keyboard.press('z');
    await expect.poll(async () => (await app.camera()).scale).toBeGreaterThan(before.scale * 2);
  });

  test('a mat resizes by its handle in whole cells, in one undo step', async ({ page }) => {
    const app = new EditorPage(page);
    const demo = loadDemoDesign();
    await app.open();
    await app.clickBlock(demo, 'mat-r0c0');
    const mat = demo.blocks.find((b) => b.id === 'mat-r0c0');
    if (!mat) throw new Error('demo lacks mat-r0c0');
    // East handle: the right edge at mid-height (the demo mat is 36.864 µm square).
    const east = await app.worldPoint(mat.x + 36.864e-6, mat.y + 18.432e-6);
    await app.drag(east, { x: east.x - 30, y: east.y + 3 });
    // The panel shows the commit once React has rendered it: wait for the field to change, then read it.
    await expect(app.field('cells-per-wordline')).not.toHaveValue('512');
    const cells = Number(await app.field('cells-per-wordline').inputValue());
    expect(cells).toBeLessThan(512);
    expect(Number.isInteger(cells)).toBe(true);
    await expect(app.field('cells-per-bitline')).toHaveValue('512');
    await expect(app.field('block-x')).toHaveValue('21.000 µm');
    await page.keyboard.press('Control+z');
    await expect(app.field('cells-per-wordline')).toHaveValue('512');
    await expect(page.getByTestId('undo')).toBeDisabled();
  });

  test('a 4,096-mat floorplan loads, a mat drags and the drag undoes in one step', async ({ page }) => {
    const app = new EditorPage(page);
    await app.openWith('?generate=64x64');
    await expect(app.blockCount()).toHaveText('12,418 blocks');
    // The whole 2 Gb die: 2 million sense amplifiers share the two-tailed failure budget (k ≈ 5.0), and
    // the margin (≈ 32 mV developed) still clears the 20 mV target: no findings.
    await expect(app.findings()).toHaveCount(0);
    const c = await app.camera();
    // Mat r10c10 of the generated grid, at the demo's spacing (µm): see src/app/startupDesign.ts.
    const centre = await app.worldPoint(
      (21 + 10 * 39.864 + 18.432) * 1e-6,
      (6 + 10 * 42.864 + 18.432) * 1e-6,
    );
    expect(c.scale).toBeGreaterThan(0);
    await app.drag(centre, { x: centre.x + 40, y: centre.y + 25 });
    await expect(app.summary()).toContainText('Mat 11.11');
    await expect(page.getByTestId('findings')).toBeVisible();
    await page.keyboard.press('Control+z');
    await expect(app.findings()).toHaveCount(0);
  });
});
