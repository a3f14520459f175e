import { MAX_DESIGN_TEXT_LENGTH } from '../io/designText';
import { clipForMessage } from '../model/messageText';
import { useAppStore } from '../store/useAppStore';
import { downloadBlob, fileBaseName } from './download';

/**
 * Design files as people expect them: Save writes back to the file the design was opened from when the
 * browser allows it (File System Access), else offers a download; Open uses the browser's file picker
 * (which gives that write-back) or a file input; a dropped file opens the same way.
 */

/** Largest file read (bytes); restore's text limit, since UTF-8 bytes ≥ UTF-16 characters. */
export const MAX_FILE_BYTES = MAX_DESIGN_TEXT_LENGTH;

/** The parts of the File System Access API used here (not yet in TypeScript's DOM library). */
interface WritableFile {
  write(data: Blob): Promise<void>;
  close(): Promise<void>;
}
export interface DesignFileHandle {
  readonly kind: 'file';
  readonly name: string;
  getFile(): Promise<File>;
  createWritable?: () => Promise<WritableFile>;
}
interface PickerWindow {
  showOpenFilePicker?: (options: unknown) => Promise<DesignFileHandle[]>;
}

/** The file each document was opened from (by document id), for saving back to it. */
const handles = new Map<string, DesignFileHandle>();

function designFileText(): { blob: Blob; design: ReturnType<typeof current> } {
  const design = current();
  return { blob: new Blob([`${JSON.stringify(design, null, 2)}\n`], { type: 'application/json' }), design };
}

const current = () => useAppStore.getState().history.present;

/** Saves the open design (Ctrl+S): back to its file where possible, else as a download. */
export async function saveDesignFile(): Promise<void> {
  const { blob, design } = designFileText();
  const state = useAppStore.getState();
  const handle = handles.get(state.documentId);
  if (handle?.createWritable) {
    try {
      const writable = await handle.createWritable();
      await writable.write(blob);
      await writable.close();
      state.markInFile(design);
      state.setNotice({ kind: 'info', text: `Saved to ${clipForMessage(handle.name)}.` });
      return;
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') return;
      // Permission refused or the file went away: fall back to a download, and say so.
      handles.delete(state.documentId);
      state.setNotice({
        kind: 'error',
        text: `Could not write to ${clipForMessage(handle.name)} (${clipForMessage(String(error), 80)}); the design was offered as a download instead.`,
      });
    }
  }
  const fileName = `${fileBaseName(design.name)}.matloom.json`;
  downloadBlob(blob, fileName);
  state.markInFile(design);
}

/** Opens a File (input, drop or picker) as a new document; remembers its handle for saving back. */
export async function openDesignFile(file: File, handle?: DesignFileHandle): Promise<boolean> {
  const { setNotice } = useAppStore.getState();
  if (file.size > MAX_FILE_BYTES) {
    setNotice({
      kind: 'error',
      text: `${clipForMessage(file.name)} is ${file.size.toLocaleString('en-US')} bytes; the limit is ${MAX_FILE_BYTES.toLocaleString('en-US')}. Nothing was changed.`,
    });
    return false;
  }
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await file.arrayBuffer());
  } catch (error) {
    setNotice({
      kind: 'error',
      text: `${clipForMessage(file.name)} could not be read (${clipForMessage(String(error), 80)}). Nothing was changed.`,
    });
    return false;
  }
  // Restore (with the schema library) loads on the first file opened.
  const { openDesignBytes } = await import('../store/openDesignText');
  const opened = openDesignBytes(useAppStore, bytes, file.name);
  if (opened && handle) handles.set(useAppStore.getState().documentId, handle);
  return opened;
}

/**
 * Asks for a design file (Ctrl+O) with the browser's picker when it has one; returns false when there
 * is no picker, so the caller opens its file input instead.
 */
export async function pickDesignFile(): Promise<boolean> {
  const picker = (window as PickerWindow).showOpenFilePicker;
  if (!picker) return false;
  try {
    const [handle] = await picker({
      types: [{ description: 'Matloom design', accept: { 'application/json': ['.json'] } }],
      multiple: false,
    });
    if (handle) await openDesignFile(await handle.getFile(), handle);
  } catch (error) {
    if (!(error instanceof DOMException && error.name === 'AbortError')) {
      useAppStore
        .getState()
        .setNotice({ kind: 'error', text: `Could not open a file: ${clipForMessage(String(error), 80)}.` });
    }
  }
  return true;
}

/** Opens the first file of a drop, with its handle where the browser gives one. */
export async function openDroppedFile(transfer: DataTransfer): Promise<void> {
  const item = Array.from(transfer.items).find((i) => i.kind === 'file');
  const file = item?.getAsFile() ?? transfer.files[0];
  if (!file) return;
  type HandleItem = DataTransferItem & { getAsFileSystemHandle?: () => Promise<DesignFileHandle | null> };
  const handlePromise = (item as HandleItem | undefined)?.getAsFileSystemHandle?.();
  let handle: DesignFileHandle | undefined;
  try {
    const found = await handlePromise;
    if (found?.kind === 'file') handle = found;
  } catch {
    // No handle: the file opens, and Save offers a download.
  }
  await openDesignFile(file, handle);
}
