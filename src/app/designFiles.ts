import { designFilePieces, MAX_DESIGN_FILE_BYTES, MAX_DESIGN_TEXT_LENGTH } from '../io/designText';
import { clipForMessage } from '../model/messageText';
import { useAppStore } from '../store/useAppStore';
import type { Notice } from '../store/appStore';
import { downloadBlob, fileBaseName } from './download';
import {
  chooseSaveTarget,
  writePieces,
  type FileKind,
  type SaveTarget,
  type WritableFileHandle,
} from './saveToFile';
import { formatWholeNumber } from '../model/units';

/**
 * Design files as people expect them: Save writes back to the file the design was opened from when the
 * browser allows it (File System Access), else into a file picked with the browser's save picker, else
 * offers a download; Open uses the browser's file picker
 * (which gives that write-back) or a file input; a dropped file opens the same way.
 */

/** Largest file read (bytes): every text restore accepts fits (see MAX_DESIGN_FILE_BYTES). */
export const MAX_FILE_BYTES = MAX_DESIGN_FILE_BYTES;

export interface DesignFileHandle extends WritableFileHandle {
  getFile(): Promise<File>;
}
interface PickerWindow {
  showOpenFilePicker?: (options: unknown) => Promise<DesignFileHandle[]>;
}

/** What a design file is, for the save picker's type filter and the download. */
const DESIGN_FILE: FileKind = {
  description: 'Matloom design',
  mime: 'application/json',
  extension: '.json',
};

/** The file each document was opened from or saved to (by document id), for saving back to it. */
const handles = new Map<string, WritableFileHandle>();

const current = () => useAppStore.getState().history.present;

/** The warning for a saved file longer than Open reads (the work is saved; it is said so that it is no surprise). */
function tooLongToOpen(characters: number): Notice | null {
  if (characters <= MAX_DESIGN_TEXT_LENGTH) return null;
  return {
    kind: 'error',
    text: `Saved, but the file is ${formatWholeNumber(characters)} characters, more than Open reads (${formatWholeNumber(MAX_DESIGN_TEXT_LENGTH)}): remove variants or blocks and save again to have a file that opens.`,
  };
}

/**
 * Saves the open design (Ctrl+S): back to its file where the browser allows it; else into a file the
 * person picks with the browser's save picker (remembered for the next save), or as a download where
 * there is no picker. Cancelling the picker saves nothing and changes nothing.
 */
export async function saveDesignFile(): Promise<void> {
  const design = current();
  const state = useAppStore.getState();
  const fileName = `${fileBaseName(design.name)}.matloom.json`;
  const known = handles.get(state.documentId);
  const target: SaveTarget = known?.createWritable
    ? { kind: 'file', handle: known }
    : await chooseSaveTarget(fileName, DESIGN_FILE);
  if (target.kind === 'cancelled') return;
  const options = { fileName, kind: DESIGN_FILE, download: downloadBlob };
  const outcome = await writePieces(target, designFilePieces(design), options);
  if (outcome.kind === 'written' && target.kind === 'file') {
    handles.set(state.documentId, target.handle);
    state.markInFile(design);
    state.setNotice(
      tooLongToOpen(outcome.characters) ?? {
        kind: 'info',
        text: `Saved to ${clipForMessage(outcome.name)}.`,
      },
    );
    return;
  }
  if (outcome.kind === 'downloaded') {
    state.markInFile(design);
    const warning = tooLongToOpen(outcome.characters);
    if (warning) state.setNotice(warning);
    return;
  }
  if (outcome.kind === 'failed' && target.kind === 'file') {
    const error = outcome.error;
    if (error instanceof DOMException && error.name === 'AbortError') return;
    // Permission refused or the file went away: offer a download instead, and say so.
    handles.delete(state.documentId);
    const fallback = await writePieces({ kind: 'download' }, designFilePieces(design), options);
    if (fallback.kind === 'downloaded') state.markInFile(design);
    state.setNotice({
      kind: 'error',
      text: `Could not write to ${clipForMessage(target.handle.name)} (${clipForMessage(String(error), 80)}); ${fallback.kind === 'downloaded' ? 'the design was offered as a download instead' : 'nothing was saved'}.`,
    });
    return;
  }
  state.setNotice({
    kind: 'error',
    text: `The design could not be saved (${outcome.kind === 'failed' ? clipForMessage(String(outcome.error), 80) : 'too large for a download'}). The design is unchanged.`,
  });
}

/** Opens a File (input, drop or picker) as a new document; remembers its handle for saving back. */
export async function openDesignFile(file: File, handle?: DesignFileHandle): Promise<boolean> {
  const { setNotice } = useAppStore.getState();
  if (file.size > MAX_FILE_BYTES) {
    setNotice({
      kind: 'error',
      text: `${clipForMessage(file.name)} is ${formatWholeNumber(file.size)} bytes; the limit is ${formatWholeNumber(MAX_FILE_BYTES)}. Nothing was changed.`,
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
