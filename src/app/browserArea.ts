import { createStore, del, get, keys, set } from 'idb-keyval';
import type { KeyValueArea } from '../io/documentShelf';

/** The browser's IndexedDB as the document shelf's key-value area (database "matloom", store "documents"). */
export function browserArea(): KeyValueArea | null {
  if (typeof indexedDB === 'undefined') return null;
  const store = createStore('matloom', 'documents');
  return {
    get: (key) => get(key, store),
    set: (key, value) => set(key, value, store),
    del: (key) => del(key, store),
    keys: async () => (await keys(store)).map(String),
  };
}

/**
 * Holds a document for this tab while it is open (Web Locks), so that another tab does not reopen and
 * overwrite it. Returns a release function, or null when another tab holds it. Without Web Locks every
 * claim succeeds.
 */
export async function claimDocument(id: string, waitMs = 0): Promise<(() => void) | null> {
  if (typeof navigator === 'undefined' || !navigator.locks) return () => {};
  let release: () => void = () => {};
  const held = new Promise<void>((resolve) => (release = resolve));
  const granted = await new Promise<boolean>((resolve) => {
    const options: LockOptions = waitMs > 0 ? { signal: AbortSignal.timeout(waitMs) } : { ifAvailable: true };
    navigator.locks
      .request(`matloom-document-${id}`, options, (lock) => {
        resolve(lock !== null);
        return lock ? held : undefined;
      })
      .catch(() => resolve(false));
  });
  return granted ? release : null;
}
