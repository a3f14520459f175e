import type { AppStore } from '../store/appStore';
import { TOOLS, type EditorStore, type Tool } from '../store/editorStore';
import { saveDesignFile } from './designFiles';
import { openDesignFromDisk, startNewDocument } from './documentActions';
import type { EditorActionsCore } from './editorActions';
import { chordLabel, type KeyChord } from './keyChord';

/** What a command's enabled() reads. */
export interface CommandState {
  readonly selectionCount: number;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
}

/** What a command's run() works with. */
export interface CommandRunContext {
  readonly actions: EditorActionsCore;
  readonly app: AppStore;
  readonly editor: EditorStore;
}

/**
 * A command of the editor as people meet it: on a key, a button, in the shortcut help. Its label, keys
 * and when it is enabled are written here once; the key listener (useEditorShortcuts.ts), the keymap and
 * the shortcut help (keymap.ts), the toolbar and the selection buttons all read them. Changes to the
 * document go through a document command (src/commands/), so each run is one undo step.
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
  /** Runs it; `shift` is whether Shift was held (a nudge goes ten pitches). */
  readonly run: (ctx: CommandRunContext, shift: boolean) => void;
}

/** Zoom step of the + and − keys. */
const KEY_ZOOM = 1.25;

const hasSelection = (s: CommandState) => s.selectionCount > 0;

const TOOL_DESCRIPTIONS: Record<Tool, string> = {
  select: 'Select, move and resize',
  pan: 'Pan the view',
  mat: 'Draw a mat (drag: cell counts in 64s; Shift: powers of two; Alt: any count)',
  senseAmpStrip: 'Place a sense-amplifier strip (fits a bit-line edge)',
  wordlineDriverStrip: 'Place a sub-word-line driver strip (fits a word-line edge)',
  rowDecoder: 'Place a row decoder (fits the left or right side of a stack of mats and strips)',
  columnDecoder: 'Place a column decoder (fits the top or bottom of a stack of mats and strips)',
  spacer: 'Place a spacer',
};

/** Number key of each tool: its place in the palette. */
export function toolKey(tool: Tool): string {
  return String(TOOLS.indexOf(tool) + 1);
}

const toolCommands = TOOLS.map((tool): EditorCommand & { readonly id: `tool.${Tool}` } => ({
  id: `tool.${tool}`,
  label: TOOL_DESCRIPTIONS[tool],
  description: TOOL_DESCRIPTIONS[tool],
  group: 'Tools',
  keys: [{ key: toolKey(tool) }],
  run: ({ editor }) => editor.getState().setTool(tool),
}));

const nudge = <const Id extends string>(
  id: Id,
  key: string,
  dx: number,
  dy: number,
  help: EditorCommand['help'],
): EditorCommand & { readonly id: Id } => ({
  id,
  label: 'Nudge',
  description: 'Nudge by one cell pitch (Shift: ten)',
  group: 'Edit',
  keys: [{ key }],
  help,
  enabled: hasSelection,
  run: ({ actions }, shift) => actions.nudge(dx, dy, shift),
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
    run: () => startNewDocument(),
  },
  {
    id: 'file.open',
    label: 'Open',
    description: 'Open a design file (or drop one on the page)',
    group: 'File',
    keys: [{ key: 'o', mod: true, shift: false }],
    run: () => void openDesignFromDisk(),
  },
  {
    id: 'file.save',
    label: 'Save',
    description: 'Save the design to a file (back to the file it came from where the browser allows)',
    group: 'File',
    keys: [{ key: 's', mod: true, shift: false }],
    run: () => void saveDesignFile(),
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
    run: () => undefined,
  },
  {
    id: 'escape',
    label: 'Cancel',
    description: 'Cancel the drag in progress; else back to Select; else clear the selection',
    group: 'Tools',
    keys: [{ key: 'Escape' }],
    inDialogs: true,
    run: ({ actions }) => actions.escape(),
  },
  {
    id: 'edit.undo',
    label: 'Undo',
    description: 'Undo',
    group: 'Edit',
    keys: [{ key: 'z', mod: true, shift: false }],
    enabled: (s) => s.canUndo,
    inDialogs: true,
    run: ({ app }) => app.getState().undo(),
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
    run: ({ app }) => app.getState().redo(),
  },
  {
    id: 'edit.delete',
    label: 'Delete',
    description: 'Delete the selection',
    group: 'Edit',
    keys: [{ key: 'Delete' }, { key: 'Backspace' }],
    enabled: hasSelection,
    run: ({ actions }) => void actions.deleteSelection(),
  },
  {
    id: 'edit.duplicate',
    label: 'Duplicate',
    description: 'Duplicate, abutting on the right',
    group: 'Edit',
    keys: [{ key: 'd', mod: true }],
    enabled: hasSelection,
    run: ({ actions }) => actions.duplicate(),
  },
  {
    id: 'edit.copy',
    label: 'Copy',
    description: 'Copy',
    group: 'Edit',
    keys: [{ key: 'c', mod: true }],
    enabled: hasSelection,
    run: ({ actions }) => void actions.copy(),
  },
  {
    id: 'edit.cut',
    label: 'Cut',
    description: 'Cut',
    group: 'Edit',
    keys: [{ key: 'x', mod: true }],
    enabled: hasSelection,
    run: ({ actions }) => {
      if (actions.copy()) actions.deleteSelection();
    },
  },
  {
    id: 'edit.paste',
    label: 'Paste',
    description: 'Paste at the pointer',
    group: 'Edit',
    keys: [{ key: 'v', mod: true }],
    run: ({ actions }) => void actions.paste(),
  },
  {
    id: 'edit.selectAll',
    label: 'Select all',
    description: 'Select everything',
    group: 'Edit',
    keys: [{ key: 'a', mod: true }],
    run: ({ actions }) => actions.selectAll(),
  },
  {
    id: 'edit.rotate',
    label: 'Rotate 90°',
    description: 'Rotate 90° clockwise',
    group: 'Edit',
    keys: [{ key: 'r' }],
    enabled: hasSelection,
    run: ({ actions }) => void actions.rotate(),
  },
  {
    id: 'edit.mirrorLeftRight',
    label: 'Mirror ↔',
    description: 'Mirror left–right',
    group: 'Edit',
    keys: [{ key: 'm', shift: false }],
    enabled: hasSelection,
    run: ({ actions }) => void actions.mirror('leftRight'),
  },
  {
    id: 'edit.mirrorTopBottom',
    label: 'Mirror ↕',
    description: 'Mirror top–bottom',
    group: 'Edit',
    keys: [{ key: 'm', shift: true }],
    enabled: hasSelection,
    run: ({ actions }) => void actions.mirror('topBottom'),
  },
  {
    id: 'edit.stepAndRepeat',
    label: 'Step and repeat…',
    description: 'Step and repeat (n × m at a pitch)…',
    group: 'Edit',
    keys: [{ key: 't' }],
    enabled: hasSelection,
    run: ({ app, editor }) => {
      if (app.getState().selectedIds.length > 0) editor.getState().setStepRepeatOpen(true);
    },
  },
  nudge('edit.nudgeLeft', 'ArrowLeft', -1, 0, { keys: '← → ↑ ↓' }),
  nudge('edit.nudgeRight', 'ArrowRight', 1, 0, false),
  nudge('edit.nudgeUp', 'ArrowUp', 0, -1, false),
  nudge('edit.nudgeDown', 'ArrowDown', 0, 1, false),
  {
    id: 'edit.blockMenu',
    label: 'Block menu',
    description: 'Open the menu of commands for the selection (or right-click a block)',
    group: 'Edit',
    keys: [{ key: 'ContextMenu' }, { key: 'F10', shift: true }],
    enabled: hasSelection,
    run: ({ editor }) => editor.getState().setContextMenu({ at: null }),
  },
  {
    id: 'view.fitAll',
    label: 'Fit',
    description: 'Fit: show the whole floorplan',
    group: 'View',
    keys: [{ key: 'f' }],
    inDialogs: true,
    run: ({ app }) => app.getState().requestFit(),
  },
  {
    id: 'view.frameSelection',
    label: 'Selection',
    description: 'Zoom to the selection',
    group: 'View',
    keys: [{ key: 'z' }],
    run: ({ actions }) => actions.frameSelection(),
  },
  {
    id: 'view.zoomIn',
    label: 'Zoom in',
    description: 'Zoom in / out (or the mouse wheel, around the pointer)',
    group: 'View',
    keys: [{ key: '+' }, { key: '=' }],
    help: { keys: '+ / −' },
    run: ({ actions }) => actions.zoom(KEY_ZOOM),
  },
  {
    id: 'view.zoomOut',
    label: 'Zoom out',
    description: 'Zoom out',
    group: 'View',
    keys: [{ key: '-' }, { key: '_' }],
    help: false,
    run: ({ actions }) => actions.zoom(1 / KEY_ZOOM),
  },
  {
    id: 'view.grid',
    label: 'Grid',
    description: 'Show or hide the grid',
    group: 'View',
    keys: [{ key: 'g' }],
    run: ({ editor }) => editor.getState().toggleGrid(),
  },
  {
    id: 'help',
    label: 'Keyboard shortcuts',
    description: 'Show or hide this list',
    group: 'View',
    keys: [{ key: '?' }],
    inDialogs: true,
    run: ({ editor }) => editor.getState().setHelpOpen(!editor.getState().helpOpen),
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
