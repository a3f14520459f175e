import type { CanvasHandle } from '../canvas/canvasBridge';
import { pitchFor } from '../canvas/gestures/gesture';
import { zoomAround } from '../canvas/viewportMath';
import { addedBlockIds } from '../commands/blockIds';
import type { Command } from '../commands/command';
import { deleteBlocks } from '../commands/deleteBlocks';
import { duplicateBlocks } from '../commands/duplicateBlocks';
import { mirrorBlocks } from '../commands/mirrorBlocks';
import { moveBlocks } from '../commands/moveBlocks';
import { pasteBlocks } from '../commands/pasteBlocks';
import { rotateBlocks } from '../commands/rotateBlocks';
import { stepAndRepeat, type StepAndRepeatArgs } from '../commands/stepAndRepeat';
import { blockRect } from '../geometry/placedBlocks';
import { boundingBox, type Rect } from '../geometry/rect';
import { repeatPitches, type RepeatPitches } from '../geometry/repeatPitch';
import { snapToPitch } from '../geometry/snapping';
import { loadChecks } from '../io/checksOnDemand';
import type { Design } from '../model/design';
import type { AppStore } from '../store/appStore';
import type { EditorStore } from '../store/editorStore';
import type { ActionId } from '../commands/editorCommands';
import { COMMAND_RUNS } from './commandRuns';

/** Shift+arrow nudges this many pitches. */
const BIG_NUDGE = 10;

/** The copied blocks as a small design file: the same format as a saved design, read back through restore. */
export function clipboardText(design: Design, ids: readonly string[]): string | null {
  const wanted = new Set(ids);
  const blocks = design.blocks.filter((b) => wanted.has(b.id));
  if (blocks.length === 0) return null;
  const cellIds = new Set(blocks.flatMap((b) => (b.type === 'mat' ? [b.cellId] : [])));
  const used = design.cells.filter((c) => cellIds.has(c.id));
  // A design file names at least one cell, so a clip of strips alone carries the design's first.
  const cells = used.length > 0 ? used : design.cells.slice(0, 1);
  const name = `${blocks.length} copied block${blocks.length === 1 ? '' : 's'}`;
  return JSON.stringify({ ...design, name, cells, blocks });
}

/**
 * The editor's actions on the selection and the view, shared by the keyboard, the tool palette and the
 * properties panel. Each document change goes through one command, so it is one undo step.
 */
export function createEditorActions(app: AppStore, editor: EditorStore, canvas: () => CanvasHandle | null) {
  const selection = () => app.getState().selectedIds;
  const design = () => app.getState().history.present;

  /** Step-and-repeat pitches of the selection: abutting, and sharing its edge strips. */
  function selectionPitches(): RepeatPitches | null {
    const d = design();
    const wanted = new Set(selection());
    return repeatPitches(
      d.blocks.filter((b) => wanted.has(b.id)).map((b) => ({ type: b.type, rect: blockRect(d, b) })),
    );
  }

  function selectionBox(): Rect | null {
    const d = design();
    const wanted = new Set(selection());
    return boundingBox(d.blocks.filter((b) => wanted.has(b.id)).map((b) => blockRect(d, b)));
  }

  /** Runs a command that adds blocks and selects what it added. */
  function runAndSelectAdded<A>(command: Command<A>, args: A, keepSelected: readonly string[] = []): boolean {
    const before = design();
    if (!app.getState().execute(command, args)) return false;
    app.getState().select([...keepSelected, ...addedBlockIds(before, design())]);
    return true;
  }

  function nudge(dx: number, dy: number, big: boolean): void {
    const ids = selection();
    if (ids.length === 0) return;
    const wanted = new Set(ids);
    const pitch = pitchFor(
      design(),
      editor.getState().options,
      design().blocks.filter((b) => wanted.has(b.id)),
    );
    const n = big ? BIG_NUDGE : 1;
    app.getState().execute(moveBlocks, { ids, dx: dx * pitch.x * n, dy: dy * pitch.y * n });
  }

  function copy(): string | null {
    const text = clipboardText(design(), selection());
    if (text) editor.getState().setClipboard(text);
    return text;
  }

  /**
   * Pastes a copied design's blocks with their top-left corner at the pointer (or beside the originals).
   * Resolves true when it pasted; the clipboard text is read through restore, loaded on first use.
   */
  async function paste(text: string | null = editor.getState().clipboard): Promise<boolean> {
    if (!text) return false;
    const { restoreDesign } = await loadChecks();
    const restored = restoreDesign(text);
    if (!restored.ok) return false;
    const clip = restored.design;
    const box = boundingBox(clip.blocks.map((b) => blockRect(clip, b)));
    if (!box) return false;
    const pointer = editor.getState().pointer;
    const pitch = pitchFor(design(), editor.getState().options, clip.blocks);
    const dx = pointer ? snapToPitch(pointer.x - box.x, pitch.x) : box.width;
    const dy = pointer ? snapToPitch(pointer.y - box.y, pitch.y) : 0;
    return runAndSelectAdded(pasteBlocks, { blocks: clip.blocks, cells: clip.cells, dx, dy });
  }

  function zoom(factor: number): void {
    const size = canvas()?.size() ?? { width: 800, height: 600 };
    app.getState().setViewport(zoomAround(app.getState().viewport, factor, size.width / 2, size.height / 2));
  }

  function escape(): void {
    if (canvas()?.cancelGesture()) return;
    const e = editor.getState();
    if (e.helpOpen) return e.setHelpOpen(false);
    if (e.stepRepeatOpen) return e.setStepRepeatOpen(false);
    if (e.tool !== 'select') return e.setTool('select');
    app.getState().select([]);
  }

  const actions = {
    selectionBox,
    selectionPitches,
    copy,
    paste,
    deleteSelection: () =>
      selection().length > 0 && app.getState().execute(deleteBlocks, { ids: selection() }),
    duplicate: () => {
      const box = selectionBox();
      if (box) runAndSelectAdded(duplicateBlocks, { ids: selection(), dx: box.width, dy: 0 });
    },
    rotate: () => selection().length > 0 && app.getState().execute(rotateBlocks, { ids: selection() }),
    mirror: (axis: 'leftRight' | 'topBottom') =>
      selection().length > 0 && app.getState().execute(mirrorBlocks, { ids: selection(), axis }),
    stepAndRepeat: (args: Omit<StepAndRepeatArgs, 'ids'>) =>
      runAndSelectAdded(stepAndRepeat, { ...args, ids: selection() }, selection()),
    selectAll: () => app.getState().select(design().blocks.map((b) => b.id)),
    frameSelection: () => {
      if (selection().length > 0) editor.getState().requestFrame(selection());
      else app.getState().requestFit();
    },
    nudge,
    zoom,
    escape,
  };

  /** Runs an editor command (commands/editorCommands.ts, bound in commandRuns.ts); `shift` makes nudges ten times larger. */
  function perform(action: ActionId, shift = false): void {
    COMMAND_RUNS[action]({ actions, app, editor }, shift);
  }

  return { ...actions, perform };
}

export type EditorActions = ReturnType<typeof createEditorActions>;
/** The actions a command runs with. */
export type EditorActionsCore = Omit<EditorActions, 'perform'>;
