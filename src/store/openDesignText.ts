import { restoreDesign } from '../io/restore';
import type { AppStore } from './appStore';

/**
 * Opens a design file's text: through the one restore path, then as one undoable step. A text that does
 * not restore leaves the document exactly as it was and says why in the notice.
 *
 * @returns true when the design was opened.
 */
export function openDesignText(store: AppStore, text: string, fileName: string): boolean {
  const restored = restoreDesign(text);
  const { replaceDesign, setNotice } = store.getState();
  if (!restored.ok) {
    setNotice({
      kind: 'error',
      text: `${fileName} was not opened: ${restored.errors.slice(0, 3).join('; ')}. The current design is unchanged.`,
    });
    return false;
  }
  replaceDesign(restored.design);
  setNotice({
    kind: 'info',
    text: `Opened ${fileName}${restored.migratedFrom ? ` (upgraded from format version ${restored.migratedFrom})` : ''}. Undo returns to the previous design.`,
  });
  return true;
}
