import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { pickDesignFile } from './designFiles';
import { documentSession } from './session';
import { blankDesign } from './startupDesign';

/** Opens the page's file input; set by the document menu, used when the browser has no file picker. */
let openFileInput: () => void = () => {};

export function registerFileInput(open: () => void): void {
  openFileInput = open;
}

/** Open (Ctrl+O): the browser's file picker, or the file input. */
export async function openDesignFromDisk(): Promise<void> {
  if (!(await pickDesignFile())) openFileInput();
}

/** New: an empty floorplan as a new document; the open one stays where it is stored. */
export function startNewDocument(): void {
  documentSession.startNew(blankDesign(), true);
  // On an empty sheet the first thing to do is draw a mat.
  useEditorStore.getState().setTool('mat');
  useAppStore.getState().setNotice({
    kind: 'info',
    text: 'Started a new design; an edited design you had open stays under Recent.',
  });
}

/**
 * Makes a share link for the open design and copies it (or shows it when the clipboard refuses), or
 * says why the design is too large for one. Returns the link.
 */
export async function makeShareLink(): Promise<string | null> {
  const { history, setNotice } = useAppStore.getState();
  // The link writer (compression, base64) loads on the first link made.
  const { shareFragment } = await import('../io/shareLink');
  const made = await shareFragment(history.present);
  if (!made.ok) {
    setNotice({ kind: 'error', text: `No share link: ${made.error}.` });
    return null;
  }
  const url = `${location.origin}${location.pathname}#${made.fragment}`;
  try {
    await navigator.clipboard.writeText(url);
    setNotice({
      kind: 'info',
      text: 'Share link copied. Opening it starts a new document with this design.',
    });
  } catch {
    setNotice({ kind: 'info', text: `Share link (copy it): ${url}` });
  }
  return url;
}
