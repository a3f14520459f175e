import type { Design } from '../model/design';
import type { RestoreResult } from './restore';

/**
 * Restore and the edit check, loaded when first needed. Both validate with the schema library (zod, about
 * a quarter of the first load's JavaScript), which a new design shown from the demo or a start address
 * does not need before it is drawn. The app asks for them after the first paint; reading a stored design,
 * a share link, a file or a pasted clipboard waits for them, as each of those already waits for its text.
 */
export interface Checks {
  /** io/restore.ts: the one restore path. */
  readonly restoreDesign: (input: unknown) => RestoreResult;
  /** io/editCheck.ts: what restore would say about an edit's result, checking only what changed. */
  readonly editProblems: (next: Design, base: Design | null) => string[];
}

let loaded: Checks | null = null;
let loading: Promise<Checks> | null = null;

/** Starts loading the checks (once) and resolves when they are ready. */
export function loadChecks(): Promise<Checks> {
  loading ??= Promise.all([import('./restore'), import('./editCheck')]).then(([restore, edit]) => {
    loaded = { restoreDesign: restore.restoreDesign, editProblems: edit.editProblems };
    return loaded;
  });
  return loading;
}

/** The checks when they have loaded, else null (without starting a load). */
export function loadedChecks(): Checks | null {
  return loaded;
}

/** Restores a design through the one restore path, loading it first when needed. Never rejects. */
export async function restoreDesignWhenLoaded(input: unknown): Promise<RestoreResult> {
  try {
    return (await loadChecks()).restoreDesign(input);
  } catch (error) {
    // A failed chunk load (offline after an update): the design is not opened, and nothing is lost.
    loading = null;
    return {
      ok: false,
      errors: [
        `the design checks could not be loaded (${error instanceof Error ? error.message : String(error)})`,
      ],
    };
  }
}
