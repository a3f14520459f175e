import { expect, type Page } from '@playwright/test';
import { FloorplanPage } from './floorplanPage';

/**
 * Page object for the document journeys: the browser storage the app keeps designs in (read straight
 * from IndexedDB, database "matloom", store "documents"), the storage status, Recent and the files.
 */
export class DocumentsPage extends FloorplanPage {
  constructor(page: Page) {
    super(page);
    // Leaving a page with unsaved changes asks first; these journeys leave on purpose.
    page.on('dialog', (dialog) => void (dialog.type() === 'beforeunload' ? dialog.accept() : undefined));
  }

  async openAt(address: string) {
    await this.page.goto(address);
    await this.canvasArea.locator('canvas').first().waitFor();
  }

  /** Waits until the open design is written to browser storage. */
  async waitUntilKept(timeout = 30_000) {
    await expect(this.page.getByTestId('storage-status')).toHaveAttribute('data-status', 'kept', { timeout });
  }

  /** Every key in the app's IndexedDB store. */
  async storedKeys(): Promise<string[]> {
    return this.page.evaluate(() =>
      withStore('readonly', (store) => store.getAllKeys()).then((k) => k.map(String)),
    );
  }

  /** The stored value under `key` as text (strings as they are, Blobs read). */
  async storedText(key: string): Promise<string | null> {
    return this.page.evaluate(async (k) => {
      const value = await withStore('readonly', (store) => store.get(k));
      if (value === undefined) return null;
      return value instanceof Blob ? value.text() : String(value);
    }, key);
  }

  async putStored(key: string, text: string) {
    await this.page.evaluate(([k, t]) => withStore('readwrite', (store) => store.put(t, k)), [
      key,
      text,
    ] as const);
  }

  /** Renames the selected mat's first cells-per-word-line field: an ordinary, undoable edit. */
  async setCellsPerWordline(value: string) {
    const field = this.page.getByTestId('cells-per-wordline');
    await field.fill(value);
    await field.press('Enter');
  }

  async reopenRecent(name: string) {
    await this.page.getByTestId('recent-menu').click();
    await this.page.getByTestId('recent-entry').filter({ hasText: name }).first().click();
  }
}

declare global {
  function withStore<T>(mode: IDBTransactionMode, run: (store: IDBObjectStore) => IDBRequest<T>): Promise<T>;
}

/** Installs `withStore` in the page: one request on the app's object store, as a promise. */
export async function installStoreAccess(page: Page) {
  await page.addInitScript(() => {
    globalThis.withStore = (mode, run) =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('matloom');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const db = open.result;
          const request = run(db.transaction('documents', mode).objectStore('documents'));
          request.onsuccess = () => {
            resolve(request.result);
            db.close();
          };
          request.onerror = () => reject(request.error);
        };
      });
  });
}
