import { deleteBlocks } from './deleteBlocks';
import { duplicateBlocks } from './duplicateBlocks';
import { chordLabel, type KeyChord } from './keyChord';
import { pasteBlocks } from './pasteBlocks';
import { rotateBlocks } from './rotateBlocks';
import { stepAndRepeat } from './stepAndRepeat';
import { TOOL_DESCRIPTIONS, TOOLS, toolKey, type Tool } from './tools';

/** What a command's enabled() reads. */
export interface CommandState {
  readonly selectionCount: number;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
}

/**
 * A command of the editor as people meet it: on a key, a button, in the shortcut help. Its label, keys
 * and when it is enabled are written here once; the keymap and the shortcut help (keymap.ts), the app's key
 * listener, the toolbar, the tool palette and the block menu all read them. What it does is bound in the
 * app (app/commandRuns.ts, one run per id), because running it needs the stores and the canvas; changes
 * to the document go through a document command of this folder, so each run is one undo step.
 */
export interface EditorCommand {
  readonly id: string;
  /** Short name, for a button. */
  readonly label: string;
  /** What it does, for the shortcut help and tooltips. */
  readonly description: string;
  readonly group: 'File' | 'Tools' | 'Edit' | 'View';
  readonly keys: readonly KeyChord[];
  /**
   * Its row in the shortcut help: the keys as written there when one row stands for several commands
   * ("← → ↑ ↓"), or false when another command's row covers it. Absent: its own chords.
   */
  readonly help?: { readonly keys: string } | false;
  /** When it can run; always when absent. */
  readonly enabled?: (state: CommandState) => boolean;
  /** Also runs while a dialog (shortcut help, step and repeat) is open. */
  readonly inDialogs?: boolean;
}

const hasSelection = (s: CommandState) => s.selectionCount > 0;

const toolCommands = TOOLS.map((tool): EditorCommand & { readonly id: `tool.${Tool}` } => ({
  id: `tool.${tool}`,
  label: TOOL_DESCRIPTIONS[tool],
  description: TOOL_DESCRIPTIONS[tool],
  group: 'Tools',
  keys: [{ key: toolKey(tool) }],
}));

const nudge = <const Id extends string>(
  id: Id,
  key: string,
  help: EditorCommand['help'],
): EditorCommand & { readonly id: Id } => ({
  id,
  label: 'Nudge',
  description: 'Nudge by one cell pitch (Shift: ten)',
  group: 'Edit',
  keys: [{ key }],
  help,
  enabled: hasSelection,
});

/** Every editor command, in the order of the shortcut help. */
export const EDITOR_COMMANDS = [
  {
    id: 'file.new',
    label: 'New',
    description: 'Start a new, empty design (the open one stays under Recent)',
    group: 'File',
    // Browsers keep Ctrl+N for a new window, so New is a button only.
    keys: [],
    help: false,
  },
  {
    id: 'file.open',
    label: 'Open',
    description: 'Open a design file (or drop one on the page)',
    group: 'File',
    keys: [{ key: 'o', mod: true, shift: false }],
  },
  {
    id: 'file.save',
    label: 'Save',
    description: 'Save the design to a file (back to the file it came from where the browser allows)',
    group: 'File',
    keys: [{ key: 's', mod: true, shift: false }],
  },
  ...toolCommands,
  {
    id: 'view.pan',
    label: 'Pan',
    description: 'Pan with any tool (or drag with the middle button)',
    group: 'Tools',
    // Space is held during a drag; the canvas reads it, so this command has no chord of its own.
    keys: [],
    help: { keys: 'Space + drag' },
  },
  {
    id: 'escape',
    label: 'Cancel',
    description: 'Cancel the drag in progress; else back to Select; else clear the selection',
    group: 'Tools',
    keys: [{ key: 'Escape' }],
    inDialogs: true,
  },
  {
    id: 'edit.undo',
    label: 'Undo',
    description: 'Undo',
    group: 'Edit',
    keys: [{ key: 'z', mod: true, shift: false }],
    enabled: (s) => s.canUndo,
    inDialogs: true,
  },
  {
    id: 'edit.redo',
    label: 'Redo',
    description: 'Redo',
    group: 'Edit',
    keys: [
      { key: 'z', mod: true, shift: true },
      { key: 'y', mod: true },
    ],
    enabled: (s) => s.canRedo,
    inDialogs: true,
  },
  {
    id: 'edit.delete',
    label: deleteBlocks.label,
    description: 'Delete the selection',
    group: 'Edit',
    keys: [{ key: 'Delete' }, { key: 'Backspace' }],
    enabled: hasSelection,
  },
  {
    id: 'edit.duplicate',
    label: duplicateBlocks.label,
    description: 'Duplicate, abutting on the right',
    group: 'Edit',
    keys: [{ key: 'd', mod: true }],
    enabled: hasSelection,
  },
  {
    id: 'edit.copy',
    label: 'Copy',
    description: 'Copy',
    group: 'Edit',
    keys: [{ key: 'c', mod: true }],
    enabled: hasSelection,
  },
  {
    id: 'edit.cut',
    label: 'Cut',
    description: 'Cut',
    group: 'Edit',
    keys: [{ key: 'x', mod: true }],
    enabled: hasSelection,
  },
  {
    id: 'edit.paste',
    label: pasteBlocks.label,
    description: 'Paste at the pointer',
    group: 'Edit',
    keys: [{ key: 'v', mod: true }],
  },
  {
    id: 'edit.selectAll',
    label: 'Select all',
    description: 'Select everything',
    group: 'Edit',
    keys: [{ key: 'a', mod: true }],
  },
  {
    id: 'edit.rotate',
    label: rotateBlocks.label,
    description: 'Rotate 90° clockwise',
    group: 'Edit',
    keys: [{ key: 'r' }],
    enabled: hasSelection,
  },
  {
    id: 'edit.mirrorLeftRight',
    label: 'Mirror ↔',
    description: 'Mirror left–right',
    group: 'Edit',
    keys: [{ key: 'm', shift: false }],
    enabled: hasSelection,
  },
  {
    id: 'edit.mirrorTopBottom',
    label: 'Mirror ↕',
    description: 'Mirror top–bottom',
    group: 'Edit',
    keys: [{ key: 'm', shift: true }],
    enabled: hasSelection,
  },
  {
    id: 'edit.stepAndRepeat',
    label: `${stepAndRepeat.label}…`,
    description: 'Step and repeat (n × m at a pitch)…',
    group: 'Edit',
    keys: [{ key: 't' }],
    enabled: hasSelection,
  },
  nudge('edit.nudgeLeft', 'ArrowLeft', { keys: '← → ↑ ↓' }),
  nudge('edit.nudgeRight', 'ArrowRight', false),
  nudge('edit.nudgeUp', 'ArrowUp', false),
  nudge('edit.nudgeDown', 'ArrowDown', false),
  {
    id: 'edit.blockMenu',
    label: 'Block menu',
    description: 'Open the menu of commands for the selection (or right-click a block)',
    group: 'Edit',
    keys: [{ key: 'ContextMenu' }, { key: 'F10', shift: true }],
    enabled: hasSelection,
  },
  {
    id: 'view.fitAll',
    label: 'Fit',
    description: 'Fit: show the whole floorplan',
    group: 'View',
    keys: [{ key: 'f' }],
    inDialogs: true,
  },
  {
    id: 'view.frameSelection',
    label: 'Selection',
    description: 'Zoom to the selection',
    group: 'View',
    keys: [{ key: 'z' }],
  },
  {
    id: 'view.zoomIn',
    label: 'Zoom in',
    description: 'Zoom in / out (or the mouse wheel, around the pointer)',
    group: 'View',
    keys: [{ key: '+' }, { key: '=' }],
    help: { keys: '+ / −' },
  },
  {
    id: 'view.zoomOut',
    label: 'Zoom out',
    description: 'Zoom out',
    group: 'View',
    keys: [{ key: '-' }, { key: '_' }],
    help: false,
  },
  {
    id: 'view.grid',
    label: 'Grid',
    description: 'Show or hide the grid',
    group: 'View',
    keys: [{ key: 'g' }],
  },
  {
    id: 'help',
    label: 'Keyboard shortcuts',
    description: 'Show or hide this list',
    group: 'View',
    keys: [{ key: '?' }],
    inDialogs: true,
  },
] as const satisfies readonly EditorCommand[];

/** Every command the keyboard and the buttons can run. */
export type ActionId = (typeof EDITOR_COMMANDS)[number]['id'];

/** The commands as plain EditorCommand objects (the const list above keeps their ids as literal types). */
export const COMMANDS: readonly (EditorCommand & { readonly id: ActionId })[] = EDITOR_COMMANDS;

const BY_ID: ReadonlyMap<string, EditorCommand> = new Map(COMMANDS.map((c) => [c.id, c]));

/** The command of an id. */
export function editorCommand(id: ActionId): EditorCommand {
  const command = BY_ID.get(id);
  if (!command) throw new Error(`no editor command "${id}"`);
  return command;
}

/** A command's keys as people read them: "Ctrl+Shift+Z / Ctrl+Y". */
export function keysText(command: EditorCommand): string {
  if (command.help) return command.help.keys;
  return command.keys.map(chordLabel).join(' / ');
}

/** Tooltip of a command's button: what it does and its key. */
export function commandTitle(command: EditorCommand): string {
  const keys = keysText(command);
  return keys ? `${command.description} (${keys})` : command.description;
}

/** Whether a command can run now. */
export function commandEnabled(command: EditorCommand, state: CommandState): boolean {
  return command.enabled ? command.enabled(state) : true;
}
