import type { Design } from '../model/design';
import { restoreDesign } from './restore';

/** The part of Web Storage autosave needs; tests pass a Map-backed fake. */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export const AUTOSAVE_KEY = 'matloom.autosave.v1';
/** Where an autosave that failed to restore is kept, so it is never silently lost. */
export const QUARANTINE_KEY = 'matloom.autosave.unreadable';

/** What reading the autosave found. */
export type AutosaveLoad =
  | { readonly kind: 'none' }
  | { readonly kind: 'restored'; readonly design: Design }
  | { readonly kind: 'quarantined'; readonly message: string };

/** Writes the design; returns an error message when storage refused it (full or blocked). */
export function saveAutosave(store: KeyValueStore, design: Design): string | null {
  try {
    store.setItem(AUTOSAVE_KEY, JSON.stringify(design));
    return null;
  } catch (error) {
    return `autosave failed: ${error instanceof Error ? error.message : String(error)}`;
  }
}

/**
 * Reads the autosave through the one restore path. A saved text that no longer restores is moved to
 * {@link QUARANTINE_KEY} (never dropped) and the caller is told why.
 */
export function loadAutosave(store: KeyValueStore): AutosaveLoad {
  let text: string | null;
  try {
    text = store.getItem(AUTOSAVE_KEY);
  } catch {
    return { kind: 'none' };
  }
  if (text === null) return { kind: 'none' };
  const restored = restoreDesign(text);
  if (restored.ok) return { kind: 'restored', design: restored.design };
  try {
    store.setItem(QUARANTINE_KEY, text);
    store.removeItem(AUTOSAVE_KEY);
  } catch {
    // Storage refused to move it; leaving it where it is still loses nothing.
  }
  return {
    kind: 'quarantined',
    message: `The autosaved design could not be restored (${restored.errors[0] ?? 'unknown problem'}). It was kept aside under "${QUARANTINE_KEY}" in this browser's storage; the demo design is open instead.`,
  };
}
