/** The parts of a key event a shortcut reads. */
export interface KeyInput {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

/**
 * One key combination of a command. `key` is the KeyboardEvent key; a single character matches either
 * case, a named key ("Delete", "ArrowLeft") exactly. Alt combinations are left to the browser.
 */
export interface KeyChord {
  readonly key: string;
  /** Ctrl, or ⌘ on a Mac, held; when absent neither may be held. */
  readonly mod?: boolean;
  /** true: Shift held; false: Shift not held; absent: either (Shift+arrow nudges further, "?" needs Shift). */
  readonly shift?: boolean;
}

/** Whether a key press is this chord. */
export function chordMatches(chord: KeyChord, e: KeyInput): boolean {
  if (e.altKey) return false;
  if ((chord.mod ?? false) !== (e.ctrlKey || e.metaKey)) return false;
  if (chord.shift !== undefined && chord.shift !== e.shiftKey) return false;
  return chord.key.length === 1 ? e.key.toLowerCase() === chord.key.toLowerCase() : e.key === chord.key;
}

const KEY_NAMES: Readonly<Record<string, string>> = {
  Escape: 'Esc',
  ArrowLeft: '←',
  ArrowRight: '→',
  ArrowUp: '↑',
  ArrowDown: '↓',
  '-': '−',
};

/** A chord as people read it: "Ctrl+Shift+Z", "Delete", "M". */
export function chordLabel(chord: KeyChord): string {
  const key = KEY_NAMES[chord.key] ?? (chord.key.length === 1 ? chord.key.toUpperCase() : chord.key);
  return `${chord.mod ? 'Ctrl+' : ''}${chord.shift ? 'Shift+' : ''}${key}`;
}
