import { create } from 'zustand';
import type { Command } from '../commands/command';
import { evaluate, type Report } from '../engine';
import { editProblems } from '../io/editCheck';
import type { Design } from '../model/design';
import { demoDesign } from '../model/demoDesign';
import { pushHistory, redoHistory, startHistory, undoHistory, type History } from './history';

/** Camera over the floorplan: screen px = world µm × scale + offset. Session state, never undone. */
export interface Viewport {
  /** Pixels per micrometre. */
  readonly scale: number;
  readonly offsetX: number;
  readonly offsetY: number;
}

export interface AppState {
  /** Document: undo-tracked. */
  readonly history: History<Design>;
  /** Derived: evaluate(history.present), recomputed only when the document changes. */
  readonly report: Report;
  /** Session: not undone. */
  readonly selectedIds: readonly string[];
  readonly viewport: Viewport;
  /** Last command error, shown until the next successful command. */
  readonly lastError: string | null;
  /** Bumped to ask the canvas to frame the whole floorplan. */
  readonly fitRequest: number;
  /** A message for the person (file refused, autosave kept aside, export done); null when none. */
  readonly notice: Notice | null;

  execute<A>(command: Command<A>, args: A): boolean;
  undo(): void;
  redo(): void;
  select(ids: readonly string[]): void;
  setViewport(viewport: Viewport): void;
  requestFit(): void;
  /** Opens a restored design as one undoable step, so the design it replaces is never lost. */
  replaceDesign(design: Design): void;
  setNotice(notice: Notice | null): void;
}

export interface Notice {
  readonly kind: 'info' | 'error';
  readonly text: string;
}

const documentState = (history: History<Design>) => ({ history, report: evaluate(history.present) });

/** Keeps only ids that still name a block after a document change. */
function liveSelection(design: Design, ids: readonly string[]): readonly string[] {
  if (ids.length === 0) return ids;
  const existing = new Set(design.blocks.map((b) => b.id));
  const kept = ids.filter((id) => existing.has(id));
  return kept.length === ids.length ? ids : kept;
}

export function createAppStore(initial: Design = demoDesign()) {
  return create<AppState>()((set, get) => ({
    ...documentState(startHistory(initial)),
    selectedIds: [],
    viewport: { scale: 3, offsetX: 20, offsetY: 20 },
    lastError: null,
    fitRequest: 0,
    notice: null,

    execute(command, args) {
      const { history, selectedIds } = get();
      const result = command.run(history.present, args);
      if (!result.ok) {
        set({ lastError: result.error });
        return false;
      }
      if (result.design === history.present) {
        set({ lastError: null });
        return true;
      }
      // Every accepted edit must still restore (reload, file, CLI): refuse it with restore's words.
      const problems = editProblems(result.design, history.present);
      if (problems.length > 0) {
        set({ lastError: `${command.label} was refused: ${problems.slice(0, 3).join('; ')}` });
        return false;
      }
      set({
        ...documentState(pushHistory(history, result.design)),
        selectedIds: liveSelection(result.design, selectedIds),
        lastError: null,
      });
      return true;
    },
    undo() {
      const history = undoHistory(get().history);
      if (history === get().history) return;
      set({ ...documentState(history), selectedIds: liveSelection(history.present, get().selectedIds) });
    },
    redo() {
      const history = redoHistory(get().history);
      if (history === get().history) return;
      set({ ...documentState(history), selectedIds: liveSelection(history.present, get().selectedIds) });
    },
    select(ids) {
      set({ selectedIds: ids });
    },
    setViewport(viewport) {
      set({ viewport });
    },
    requestFit() {
      set({ fitRequest: get().fitRequest + 1 });
    },
    replaceDesign(design) {
      set({
        ...documentState(pushHistory(get().history, design)),
        selectedIds: [],
        lastError: null,
        fitRequest: get().fitRequest + 1,
      });
    },
    setNotice(notice) {
      set({ notice });
    },
  }));
}

export type AppStore = ReturnType<typeof createAppStore>;
