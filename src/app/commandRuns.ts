import type { ActionId } from '../commands/editorCommands';
import type { Tool } from '../commands/tools';
import type { AppStore } from '../store/appStore';
import type { EditorStore } from '../store/editorStore';
import { saveDesignFile } from './designFiles';
import { openDesignFromDisk, startNewDocument } from './documentActions';
import type { EditorActionsCore } from './editorActions';

/** What a command's run works with. */
export interface CommandRunContext {
  readonly actions: EditorActionsCore;
  readonly app: AppStore;
  readonly editor: EditorStore;
}

/** Runs a command; `shift` is whether Shift was held (a nudge goes ten pitches). */
type CommandRun = (ctx: CommandRunContext, shift: boolean) => void;

/** Zoom step of the + and − keys. */
const KEY_ZOOM = 1.25;

const tool =
  (t: Tool): CommandRun =>
  ({ editor }) =>
    editor.getState().setTool(t);

/**
 * What each editor command does (its label, keys and when it is enabled are in commands/editorCommands.ts).
 * A record over every id, so a command without a run, or a run without a command, does not compile.
 */
export const COMMAND_RUNS: Readonly<Record<ActionId, CommandRun>> = {
  'file.new': () => startNewDocument(),
  'file.open': () => void openDesignFromDisk(),
  'file.save': () => void saveDesignFile(),
  'tool.select': tool('select'),
  'tool.pan': tool('pan'),
  'tool.mat': tool('mat'),
  'tool.senseAmpStrip': tool('senseAmpStrip'),
  'tool.wordlineDriverStrip': tool('wordlineDriverStrip'),
  'tool.rowDecoder': tool('rowDecoder'),
  'tool.columnDecoder': tool('columnDecoder'),
  'tool.spacer': tool('spacer'),
  // Space is held during a drag; the canvas reads it.
  'view.pan': () => undefined,
  escape: ({ actions }) => actions.escape(),
  'edit.undo': ({ app }) => app.getState().undo(),
  'edit.redo': ({ app }) => app.getState().redo(),
  'edit.delete': ({ actions }) => void actions.deleteSelection(),
  'edit.duplicate': ({ actions }) => actions.duplicate(),
  'edit.copy': ({ actions }) => void actions.copy(),
  'edit.cut': ({ actions }) => {
    if (actions.copy()) actions.deleteSelection();
  },
  'edit.paste': ({ actions }) => void actions.paste(),
  'edit.selectAll': ({ actions }) => actions.selectAll(),
  'edit.rotate': ({ actions }) => void actions.rotate(),
  'edit.mirrorLeftRight': ({ actions }) => void actions.mirror('leftRight'),
  'edit.mirrorTopBottom': ({ actions }) => void actions.mirror('topBottom'),
  'edit.stepAndRepeat': ({ app, editor }) => {
    if (app.getState().selectedIds.length > 0) editor.getState().setStepRepeatOpen(true);
  },
  'edit.nudgeLeft': ({ actions }, shift) => actions.nudge(-1, 0, shift),
  'edit.nudgeRight': ({ actions }, shift) => actions.nudge(1, 0, shift),
  'edit.nudgeUp': ({ actions }, shift) => actions.nudge(0, -1, shift),
  'edit.nudgeDown': ({ actions }, shift) => actions.nudge(0, 1, shift),
  'edit.blockMenu': ({ editor }) => editor.getState().setContextMenu({ at: null }),
  'view.fitAll': ({ app }) => app.getState().requestFit(),
  'view.frameSelection': ({ actions }) => actions.frameSelection(),
  'view.zoomIn': ({ actions }) => actions.zoom(KEY_ZOOM),
  'view.zoomOut': ({ actions }) => actions.zoom(1 / KEY_ZOOM),
  'view.grid': ({ editor }) => editor.getState().toggleGrid(),
  help: ({ editor }) => editor.getState().setHelpOpen(!editor.getState().helpOpen),
};
