import { decodeDesignBytes } from '../io/decodeText';
import { newDocumentId } from '../io/documentShelf';
import { restoreDesign } from '../io/restore';
import { clipForMessage } from '../model/messageText';
import type { AppStore } from './appStore';

/**
 * Opens a design file's text through the one restore path, as a new document: the design that was open
 * stays in browser storage under its own id (see Recent). A text that does not restore leaves
 * everything exactly as it was and says why in the notice.
 *
 * @returns true when the design was opened.
 */
export function openDesignText(store: AppStore, text: string, fileName: string): boolean {
  const restored = restoreDesign(text);
  const { startDocument, setNotice } = store.getState();
  const shownName = clipForMessage(fileName);
  if (!restored.ok) {
    setNotice({
      kind: 'error',
      text: `${shownName} was not opened: ${restored.errors.slice(0, 3).join('; ')}. The current design is unchanged.`,
    });
    return false;
  }
  startDocument(restored.design, { documentId: newDocumentId(), inFile: true });
  setNotice({
    kind: 'info',
    text: `Opened ${shownName}${restored.migratedFrom ? ` (upgraded from format version ${restored.migratedFrom})` : ''} as a new document; an edited design you had open stays under Recent.`,
  });
  return true;
}

/** Opens a design file's bytes: decoded as the CLI decodes them (UTF-8, or UTF-16 with a mark), then restored. */
export function openDesignBytes(store: AppStore, bytes: Uint8Array, fileName: string): boolean {
  const decoded = decodeDesignBytes(bytes);
  if (!decoded.ok) {
    store.getState().setNotice({
      kind: 'error',
      text: `${clipForMessage(fileName)} was not opened: ${decoded.error}. The current design is unchanged.`,
    });
    return false;
  }
  return openDesignText(store, decoded.text, fileName);
}
