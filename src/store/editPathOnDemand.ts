/**
 * The engine's edit path (engine/editPath.ts), loaded when first needed so that the first load carries
 * only what drawing a design needs. The app asks for it after its first paint (src/main.tsx). Until it
 * has arrived a committed edit is evaluated whole and a drag shows the figures from before it began;
 * both then match what the edit path would have given.
 */
import type * as EditPathModule from '../engine/editPath';

export type EditPath = typeof EditPathModule;

let loaded: EditPath | null = null;
let loading: Promise<EditPath> | null = null;

/** Starts loading the edit path (once; again after a failed load) and resolves when it is ready. */
export function loadEditPath(): Promise<EditPath> {
  loading ??= import('../engine/editPath').then(
    (path) => (loaded = path),
    (error: unknown) => {
      // A failed chunk load (offline after an update): whole evaluation goes on; the next ask tries again.
      loading = null;
      throw error;
    },
  );
  return loading;
}

/** The edit path when it has loaded, else null (without starting a load). */
export function loadedEditPath(): EditPath | null {
  return loaded;
}
