import { describe, expect, it } from 'vitest';
import {
  AUTOSAVE_KEY,
  loadAutosave,
  QUARANTINE_KEY,
  saveAutosave,
  type KeyValueStore,
} from '../../src/io/autosave';
import { demoDesign } from '../../src/model/demoDesign';

function memoryStore(initial: Record<string, string> = {}): KeyValueStore & { data: Map<string, string> } {
  const data = new Map(Object.entries(initial));
  return {
    data,
    getItem: (k) => data.get(k) ?? null,
    setItem: (k, v) => void data.set(k, v),
    removeItem: (k) => void data.delete(k),
  };
}

describe('autosave', () => {
  it('saves and restores the same design', () => {
    const store = memoryStore();
    expect(saveAutosave(store, demoDesign())).toBeNull();
    const loaded = loadAutosave(store);
    expect(loaded.kind).toBe('restored');
    if (loaded.kind === 'restored') expect(loaded.design).toEqual(demoDesign());
  });

  it('finds nothing in empty storage', () => {
    expect(loadAutosave(memoryStore()).kind).toBe('none');
  });

  it('keeps a corrupted autosave aside with a message instead of dropping it', () => {
    const store = memoryStore({ [AUTOSAVE_KEY]: '{"format":"matloom-design","version":1,"name":' });
    const loaded = loadAutosave(store);
    expect(loaded.kind).toBe('quarantined');
    if (loaded.kind === 'quarantined') expect(loaded.message).toMatch(/not valid JSON/);
    expect(store.data.get(QUARANTINE_KEY)).toBe('{"format":"matloom-design","version":1,"name":');
    expect(store.data.has(AUTOSAVE_KEY)).toBe(false);
  });

  it('reports a storage that refuses to write', () => {
    const full: KeyValueStore = {
      getItem: () => null,
      setItem: () => {
        throw new Error('QuotaExceededError');
      },
      removeItem: () => undefined,
    };
    expect(saveAutosave(full, demoDesign())).toMatch(/autosave failed: QuotaExceededError/);
  });
});
