import type { Design } from '../model/design';
import { clipForMessage } from '../model/messageText';
import { restoreDesignWhenLoaded } from './checksOnDemand';

/**
 * Designs kept in the browser, one record per document, so that starting another design never
 * overwrites the one before. Pure over {@link KeyValueArea}: the app passes IndexedDB (idb-keyval),
 * tests a Map. Keys:
 *   `design:<id>`  the design file's text (a string or a Blob of text pieces)
 *   `about:<id>`   what the list of recent designs shows ({@link DocumentAbout})
 *   `unreadable:<id>:<time>`  a stored design that no longer restored, kept aside unchanged
 * Each document writes only its own keys, so two tabs never overwrite each other's work. A document
 * is removed only when the person forgets it from the recent list ({@link forgetDocument}).
 */

/** The part of an async key-value store the shelf needs. */
export interface KeyValueArea {
  get(key: string): Promise<unknown>;
  set(key: string, value: unknown): Promise<void>;
  del(key: string): Promise<void>;
  keys(): Promise<string[]>;
}

/** One entry of the recent-designs list. */
export interface DocumentAbout {
  readonly id: string;
  readonly name: string;
  /** When it was last written (ms since 1970). */
  readonly savedAt: number;
  readonly blockCount: number;
}

const DESIGN_PREFIX = 'design:';
const ABOUT_PREFIX = 'about:';
const UNREADABLE_PREFIX = 'unreadable:';

export const designKey = (id: string) => `${DESIGN_PREFIX}${id}`;
const aboutKey = (id: string) => `${ABOUT_PREFIX}${id}`;

/** A fresh document id: time and randomness, so that two tabs starting at once still differ. */
export function newDocumentId(now = Date.now()): string {
  const random = Math.random().toString(36).slice(2, 10).padEnd(8, '0');
  return `${now.toString(36)}-${random}`;
}

/** Stored text as a string, whatever form it was kept in; null when there is none. */
async function storedText(value: unknown): Promise<string | null> {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string') return value;
  if (typeof Blob !== 'undefined' && value instanceof Blob) return value.text();
  return null;
}

/**
 * Writes a document: its text (string or Blob), then its entry in the recent list. Throws what storage
 * threw (quota, blocked), so that the caller can tell the person.
 */
export async function saveDocument(
  area: KeyValueArea,
  id: string,
  design: Design,
  text: string | Blob,
  now = Date.now(),
): Promise<void> {
  await area.set(designKey(id), text);
  const about: DocumentAbout = { id, name: design.name, savedAt: now, blockCount: design.blocks.length };
  await area.set(aboutKey(id), about);
}

/** What opening a stored document found. */
export type StoredLoad =
  | { readonly kind: 'none' }
  | { readonly kind: 'restored'; readonly design: Design }
  | { readonly kind: 'keptAside'; readonly message: string }
  | { readonly kind: 'unreadable'; readonly message: string };

/**
 * Reads a document through the one restore path. A stored design that no longer restores is copied to
 * its own `unreadable:` key (a new one every time, so a second bad save never replaces the first), read
 * back to make sure the copy is whole, and only then removed from the list. The message says what is
 * true: kept aside, or left where it was because the copy failed.
 */
export async function loadDocument(area: KeyValueArea, id: string, now = Date.now()): Promise<StoredLoad> {
  let text: string | null;
  try {
    text = await storedText(await area.get(designKey(id)));
  } catch (error) {
    return { kind: 'unreadable', message: `The stored design could not be read (${describe(error)}).` };
  }
  if (text === null) return { kind: 'none' };
  const restored = await restoreDesignWhenLoaded(text);
  if (restored.ok) return { kind: 'restored', design: restored.design };
  const why = restored.errors[0] ?? 'unknown problem';
  const asideKey = `${UNREADABLE_PREFIX}${id}:${now}`;
  try {
    await area.set(asideKey, text);
    const copy = await storedText(await area.get(asideKey));
    if (copy !== text) throw new Error('the copy read back differs');
  } catch (error) {
    return {
      kind: 'unreadable',
      message: `A stored design could not be restored (${why}), and keeping a copy aside failed (${describe(error)}); it stays stored as it was.`,
    };
  }
  try {
    await area.del(designKey(id));
    await area.del(aboutKey(id));
  } catch {
    // The copy is safe; an entry left in the list only shows the same problem again.
  }
  return {
    kind: 'keptAside',
    message: `A stored design could not be restored (${why}). It was kept aside unchanged under "${asideKey}" in this browser's storage.`,
  };
}

/** A document taken off the shelf, held so that it can be put back (undo). */
export interface ForgottenDocument {
  readonly id: string;
  /** The stored text, as it was stored (a string or a Blob). */
  readonly text: unknown;
  /** Its recent-list entry, when it had one. */
  readonly about: DocumentAbout | null;
}

/**
 * Removes a document's design and recent-list entry, returning both so that {@link rememberDocument}
 * can put them back; null when there was no such document. Both are read before anything is removed.
 * Kept-aside copies (`unreadable:`) are left alone.
 */
export async function forgetDocument(area: KeyValueArea, id: string): Promise<ForgottenDocument | null> {
  const text = await area.get(designKey(id));
  const about = await area.get(aboutKey(id));
  if (text === undefined && about === undefined) return null;
  await area.del(aboutKey(id));
  await area.del(designKey(id));
  return { id, text, about: isAbout(about) ? about : null };
}

/** Puts a forgotten document back, design first, exactly as it was stored. */
export async function rememberDocument(area: KeyValueArea, forgotten: ForgottenDocument): Promise<void> {
  if (forgotten.text !== undefined) await area.set(designKey(forgotten.id), forgotten.text);
  if (forgotten.about) await area.set(aboutKey(forgotten.id), forgotten.about);
}

/** The recent-designs list, newest first. Entries that cannot be read are skipped. */
export async function listDocuments(area: KeyValueArea): Promise<DocumentAbout[]> {
  const keys = (await area.keys()).filter((k) => typeof k === 'string' && k.startsWith(ABOUT_PREFIX));
  const entries = await Promise.all(keys.map((k) => area.get(k).catch(() => undefined)));
  return entries.filter(isAbout).sort((a, b) => b.savedAt - a.savedAt);
}

/** Keys of designs kept aside because they no longer restored. */
export async function listKeptAside(area: KeyValueArea): Promise<string[]> {
  return (await area.keys()).filter((k) => typeof k === 'string' && k.startsWith(UNREADABLE_PREFIX));
}

/** One design kept aside, as the recent list shows it. */
export interface KeptAside {
  readonly key: string;
  /** When it was set aside (ms since 1970), from its key. */
  readonly keptAt: number;
}

/** The kept-aside designs, newest first. */
export async function keptAsideList(area: KeyValueArea): Promise<KeptAside[]> {
  return (await listKeptAside(area))
    .map((key) => ({ key, keptAt: Number(key.slice(key.lastIndexOf(':') + 1)) }))
    .map((k) => ({ ...k, keptAt: Number.isFinite(k.keptAt) ? k.keptAt : 0 }))
    .sort((a, b) => b.keptAt - a.keptAt);
}

/** The text of a kept-aside design, exactly as it was stored; null when there is none. */
export async function keptAsideText(area: KeyValueArea, key: string): Promise<string | null> {
  if (!key.startsWith(UNREADABLE_PREFIX)) return null;
  return storedText(await area.get(key));
}

/** Removes a kept-aside design for good (only `unreadable:` keys: never a document). */
export async function discardKeptAside(area: KeyValueArea, key: string): Promise<void> {
  if (!key.startsWith(UNREADABLE_PREFIX))
    throw new Error(`"${clipForMessage(key)}" is not a kept-aside design`);
  await area.del(key);
}

function isAbout(value: unknown): value is DocumentAbout {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return (
    typeof v.id === 'string' &&
    typeof v.name === 'string' &&
    typeof v.savedAt === 'number' &&
    typeof v.blockCount === 'number'
  );
}

function describe(error: unknown): string {
  return clipForMessage(error instanceof Error ? error.message : String(error), 120);
}
