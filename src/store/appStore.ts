import { create } from 'zustand';
import type { Command } from '../commands/command';
import { editReport, evaluate, type Report } from '../engine';
import { editProblems } from '../io/editCheck';
import type { Design } from '../model/design';
import { demoDesign } from '../model/demoDesign';
import { blocksEditedInPlace } from '../model/designEdit';
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

/** Most blocks an edit may change and still be evaluated incrementally (more: evaluate it whole). */
const INCREMENTAL_EDIT_LIMIT = 64;

/**
 * Reports of the documents seen, so undo and redo reuse them. Documents are immutable, so a report
 * stays right for as long as its document lives (in the history).
 */
const reports = new WeakMap<Design, Report>();

/**
 * The document state after a change from `from` to the new present. An edit of a few blocks in place
 * (a move, new cell counts) is evaluated through the live preview's incremental path; anything else is
 * evaluated whole. A document seen before takes its report from the cache.
 */
function documentState(history: History<Design>, from?: { design: Design; report: Report }) {
  const design = history.present;
  const changed = from ? blocksEditedInPlace(from.design, design, INCREMENTAL_EDIT_LIMIT) : null;
  let report = reports.get(design);
  if (!report) {
    report =
      from && changed && changed.length > 0
        ? editReport(from.design, from.report, design, changed)
        : evaluate(design);
    reports.set(design, report);
  }
  // Same ids in the same places: the selection still names blocks that exist.
  return { history, report, sameIds: changed !== null };
}

/** Keeps only ids that still name a block after a document change. */
function liveSelection(design: Design, ids: readonly string[]): readonly string[] {
  if (ids.length === 0) return ids;
  const existing = new Set(design.blocks.map((b) => b.id));
  const kept = ids.filter((id) => existing.has(id));
  return kept.length === ids.length ? ids : kept;
}

function withoutFlag<T extends { sameIds: boolean }>(state: T): Omit<T, 'sameIds'> {
  const { sameIds, ...rest } = state;
  void sameIds;
  return rest;
}

/** The new document state and the selection that still applies, from the state before. */
function moveTo(history: History<Design>, before: AppState) {
  const { sameIds, ...state } = documentState(history, {
    design: before.history.present,
    report: before.report,
  });
  const selectedIds = sameIds ? before.selectedIds : liveSelection(history.present, before.selectedIds);
  return { ...state, selectedIds };
}

export function createAppStore(initial: Design = demoDesign()) {
  return create<AppState>()((set, get) => ({
    ...withoutFlag(documentState(startHistory(initial))),
    selectedIds: [],
    viewport: { scale: 3, offsetX: 20, offsetY: 20 },
    lastError: null,
    fitRequest: 0,
    notice: null,

    execute(command, args) {
      const { history } = get();
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
      set({ ...moveTo(pushHistory(history, result.design), get()), lastError: null });
      return true;
    },
    undo() {
      const history = undoHistory(get().history);
      if (history === get().history) return;
      set(moveTo(history, get()));
    },
    redo() {
      const history = redoHistory(get().history);
      if (history === get().history) return;
      set(moveTo(history, get()));
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
        ...withoutFlag(documentState(pushHistory(get().history, design))),
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
