import type { Page } from '@playwright/test';

/**
 * The browser's save picker (File System Access `showSaveFilePicker`) in tests. Headless Chromium has
 * one that cancels at once, as a person would; journeys that expect a download take it away, and
 * journeys about the picker put a stub in its place that hands over a file recording every write.
 */

/** Removes the save picker from every page of this test: saves and exports become downloads. */
export async function withoutSavePicker(page: Page) {
  await page.addInitScript(() => {
    Object.defineProperty(window, 'showSaveFilePicker', {
      value: undefined,
      writable: true,
      configurable: true,
    });
  });
}

/** What the stub picker saw: how often it was asked, the names it suggested, and the writes per file. */
export interface PickedFiles {
  asked: number;
  suggested: string[];
  /** Writes of each finished (closed) file, in order. */
  closed: { name: string; writes: number; text: string }[];
}

declare global {
  interface Window {
    pickedFiles: PickedFiles;
  }
}

/**
 * Puts a save picker in the open page that answers with a file named `name` (or cancels, with
 * `cancel`), whose writable stream records its writes.
 */
export async function stubSavePicker(page: Page, name: string, cancel = false) {
  await page.evaluate(
    ([fileName, cancelled]) => {
      window.pickedFiles = { asked: 0, suggested: [], closed: [] };
      Object.defineProperty(window, 'showSaveFilePicker', {
        writable: true,
        configurable: true,
        value: async (options: { suggestedName: string }) => {
          window.pickedFiles.asked++;
          window.pickedFiles.suggested.push(options.suggestedName);
          if (cancelled) throw new DOMException('The user aborted a request.', 'AbortError');
          return {
            kind: 'file',
            name: fileName,
            createWritable: async () => {
              const parts: string[] = [];
              return {
                write: async (data: string | Blob) =>
                  void parts.push(typeof data === 'string' ? data : await data.text()),
                close: async () =>
                  void window.pickedFiles.closed.push({
                    name: fileName,
                    writes: parts.length,
                    text: parts.join(''),
                  }),
                abort: async () => undefined,
              };
            },
          };
        },
      });
    },
    [name, cancel] as const,
  );
}

/** What the stub picker has seen so far. */
export function pickedFiles(page: Page): Promise<PickedFiles> {
  return page.evaluate(() => window.pickedFiles);
}
