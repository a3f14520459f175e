import { COMMANDS, keysText, type ActionId, type EditorCommand } from './editorCommands';
import { chordMatches, type KeyInput } from './keyChord';

export type { ActionId } from './editorCommands';
export { toolKey } from './tools';
export type { KeyInput } from './keyChord';

/** One row of the shortcut help. */
export interface Shortcut {
  readonly action: ActionId;
  /** As shown in the help overlay and in tooltips. */
  readonly keys: string;
  readonly description: string;
  readonly group: EditorCommand['group'];
}

/** The shortcut help's rows, derived from the editor commands (editorCommands.ts), in their order. */
export const SHORTCUTS: readonly Shortcut[] = COMMANDS.filter((c) => c.help !== false).map((c) => ({
  action: c.id,
  keys: keysText(c),
  description: c.description,
  group: c.group,
}));

/** The command a key press asks for, or null: the first command with a chord that matches it. */
export function actionForKey(e: KeyInput): ActionId | null {
  for (const command of COMMANDS) {
    for (const chord of command.keys) if (chordMatches(chord, e)) return command.id;
  }
  return null;
}
