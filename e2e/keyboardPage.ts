import { expect, type Locator, type Page } from '@playwright/test';

/** Most Tab presses a journey spends looking for one control before it gives up. */
const MAX_TABS = 160;

/**
 * Keyboard-only moves: Tab until a control has focus (proving it can be reached without a mouse), and
 * the tab bars' arrow keys.
 */
export class KeyboardPage {
  constructor(readonly page: Page) {}

  /** Presses Tab (or Shift+Tab) until `target` has focus. */
  async tabTo(target: Locator, backwards = false) {
    for (let i = 0; i < MAX_TABS; i++) {
      if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) return;
      await this.page.keyboard.press(backwards ? 'Shift+Tab' : 'Tab');
    }
    throw new Error(`could not reach ${target.toString()} with the Tab key`);
  }

  /** Reaches the view tab bar with Tab and moves to a view with the arrow keys. */
  async showView(view: 'floorplan' | 'explorer' | 'variants') {
    const order = ['floorplan', 'explorer', 'variants'];
    const selected = this.page.locator('[role="tab"][aria-selected="true"][data-testid^="view-"]');
    await this.tabTo(selected);
    const from = order.indexOf(((await selected.getAttribute('data-testid')) ?? '').replace('view-', ''));
    const to = order.indexOf(view);
    for (let i = from; i < to; i++) await this.page.keyboard.press('ArrowRight');
    for (let i = from; i > to; i--) await this.page.keyboard.press('ArrowLeft');
    await expect(this.page.getByTestId(`view-${view}`)).toHaveAttribute('aria-selected', 'true');
    await expect(this.page.getByTestId(`view-${view}`)).toBeFocused();
  }

  /** Replaces a text field's content by typing, then presses Enter (which also submits its form). */
  async typeInto(field: Locator, text: string, enter = true) {
    await this.tabTo(field);
    await this.page.keyboard.press('Control+a');
    await this.page.keyboard.type(text);
    if (enter) await this.page.keyboard.press('Enter');
  }
}
