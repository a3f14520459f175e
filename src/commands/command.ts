import type { Design } from '../model/design';

/** What running a command gives: the new document, or why it could not run (document untouched). */
export type CommandResult =
  { readonly ok: true; readonly design: Design } | { readonly ok: false; readonly error: string };

/**
 * A document command: one file each, shared by the editor commands (keys, buttons: editorCommands.ts),
 * gestures and panels. `run` is pure: it takes the document and arguments and returns a new document, so
 * undo and redo are just history steps. Its label names it in messages ("Rotate 90° was refused: …"); the
 * keys and buttons that run it are declared once, with the editor command that calls it.
 */
export interface Command<Args> {
  readonly id: string;
  readonly label: string;
  run(design: Design, args: Args): CommandResult;
}
