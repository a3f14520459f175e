import type { Design } from '../model/design';

/** What running a command gives: the new document, or why it could not run (document untouched). */
export type CommandResult =
  { readonly ok: true; readonly design: Design } | { readonly ok: false; readonly error: string };

/**
 * A user command: one file each, shared by toolbar, keyboard and panels. `run` is pure: it takes the
 * document and arguments and returns a new document, so undo and redo are just history steps.
 */
export interface Command<Args> {
  readonly id: string;
  readonly label: string;
  /** Keyboard shortcut as shown to people, e.g. "Ctrl+Z"; absent when there is none. */
  readonly shortcut?: string;
  run(design: Design, args: Args): CommandResult;
}
