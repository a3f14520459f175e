/**
 * Widgets that handle their own keys (a tab bar's arrows, the block list's Enter and Delete, a menu) mark
 * themselves with `data-own-keys`; the editor's one key listener leaves their plain keys alone, so an
 * arrow in the block list moves through the list instead of nudging blocks. Chords with Ctrl or ⌘ (undo,
 * redo, select all) still reach the editor. Inside an open modal dialog every key belongs to the dialog.
 */
export const OWN_KEYS_ATTRIBUTE = 'data-own-keys';

/** The parts of a key event this reads. */
interface KeyTarget {
  readonly target: EventTarget | null;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
}

/** True when the key belongs to the widget or dialog it was pressed in, not to the editor. */
export function keyOwnedByWidget(e: KeyTarget): boolean {
  if (!(e.target instanceof Element)) return false;
  if (e.target.closest('dialog[open]')) return true;
  return !(e.ctrlKey || e.metaKey) && e.target.closest(`[${OWN_KEYS_ATTRIBUTE}]`) !== null;
}
