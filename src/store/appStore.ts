import { create } from 'zustand';
import type { Command } from '../commands/command';
import { evaluate, type Report } from '../engine';
import { loadedEditPath } from './editPathOnDemand';
import { loadChecks, loadedChecks } from '../io/checksOnDemand';
import type { Design } from '../model/design';
import { demoDesign } from '../designs/demoDesign';
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
  /** A message for the person (file refused, stored design kept aside, export done); null when none. */
  readonly notice: Notice | null;
  /** Which stored document this is (its keys in browser storage); every new document gets a fresh one. */
  readonly documentId: string;
  /**
   * The design as it is in a file (last saved or opened), or as it was started from something that can
   * be made again (the demo, a generated grid, a share link); null when no file holds it. The tab warns
   * before closing while the document differs from it.
   */
  readonly inFile: Design | null;
  /** Why keeping the design in browser storage failed; stays until the design is saved to a file. */
  readonly storageProblem: string | null;

  execute<A>(command: Command<A>, args: A): boolean;
  undo(): void;
  redo(): void;
  select(ids: readonly string[]): void;
  setViewport(viewport: Viewport): void;
  requestFit(): void;
  /**
   * Starts another document (new, opened, reopened): a fresh history under its own storage id, so the
   * document it replaces stays where it was stored and is never overwritten.
   */
  startDocument(design: Design, start: DocumentStart): void;
  /** Records that `design` is now in a file: the close warning and any storage problem are cleared. */
  markInFile(design: Design): void;
  setStorageProblem(problem: string | null): void;
  setNotice(notice: Notice | null): void;
}

/** How a document starts: its storage id, and whether a file (or a reproducible source) holds it. */
export interface DocumentStart {
  readonly documentId: string;
  readonly inFile: boolean;
}

export interface Notice {
  readonly kind: 'info' | 'error';
  readonly text: string;
  /** One thing the person can do about it, shown as a button beside the text (its title says what it does). */
  readonly action?: { readonly label: string; readonly title: string; readonly run: () => void };
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
 * (a move, new cell counts) is evaluated through the live preview's incremental path (once it has loaded,
 * store/editPathOnDemand.ts); anything else is evaluated whole. A document seen before takes its report from the cache.
 */
function documentState(history: History<Design>, from?: { design: Design; report: Report }) {
  const design = history.present;
  const changed = from ? blocksEditedInPlace(from.design, design, INCREMENTAL_EDIT_LIMIT) : null;
  let report = reports.get(design);
  if (!report) {
    // Before the edit path has loaded (just after the first paint) the edit is evaluated whole: same report.
    const path = loadedEditPath();
    report =
      path && from && changed && changed.length > 0
        ? path.editReport(from.design, from.report, design, changed)
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

/** What restore would say about `next`, an edit of `base` (empty: it restores); see io/editCheck.ts. */
export type EditCheck = (next: Design, base: Design) => readonly string[];

/** Where the store finds the edit check: at once when loaded, else once it has loaded. */
export interface EditCheckSource {
  now(): EditCheck | null;
  load(): Promise<EditCheck>;
}

/** The app's edit check, loaded with the schema library after the first paint (io/checksOnDemand.ts). */
export const EDIT_CHECK_ON_DEMAND: EditCheckSource = {
  now: () => loadedChecks()?.editProblems ?? null,
  load: () => loadChecks().then((checks) => checks.editProblems),
};

/** An edit accepted before the edit check had loaded, to be checked when it has. */
interface UncheckedEdit {
  readonly base: Design;
  readonly next: Design;
  readonly label: string;
}

/**
 * The history with `base` as its present and every entry from `base`'s successor on dropped (the
 * successor failed the edit check), or null when `base` is no longer in it (another document started).
 */
function historyBackTo(history: History<Design>, base: Design): History<Design> | null {
  const entries = [...history.past, history.present, ...history.future];
  const at = entries.indexOf(base);
  return at < 0 ? null : { past: entries.slice(0, at), present: base, future: [] };
}

/** Id of a store's first document until the app starts one (tests never store it). */
export const UNSTORED_DOCUMENT_ID = 'unstored';

export function createAppStore(
  initial: Design = demoDesign(),
  editChecks: EditCheckSource = EDIT_CHECK_ON_DEMAND,
) {
  /**
   * Edits accepted before the edit check loaded (only in the moments after the first paint). They are
   * checked in order when it arrives; the first that would not restore is undone with everything after
   * it, and refused with restore's words, so that every edit that stays restores.
   */
  let unchecked: UncheckedEdit[] = [];
  const checkLater = (edit: UncheckedEdit): void => {
    unchecked.push(edit);
    if (unchecked.length > 1) return;
    void editChecks.load().then((check) => {
      const edits = unchecked;
      unchecked = [];
      for (const { base, next, label } of edits) {
        const problems = check(next, base);
        if (problems.length === 0) continue;
        const history = historyBackTo(store.getState().history, base);
        if (history) {
          store.setState({
            ...moveTo(history, store.getState()),
            lastError: `${label} was refused: ${problems.slice(0, 3).join('; ')}`,
          });
        }
        return;
      }
    });
  };

  const store = create<AppState>()((set, get) => ({
    ...withoutFlag(documentState(startHistory(initial))),
    selectedIds: [],
    viewport: { scale: 3, offsetX: 20, offsetY: 20 },
    lastError: null,
    fitRequest: 0,
    notice: null,
    documentId: UNSTORED_DOCUMENT_ID,
    inFile: initial,
    storageProblem: null,

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
      const check = editChecks.now();
      if (check) {
        const problems = check(result.design, history.present);
        if (problems.length > 0) {
          set({ lastError: `${command.label} was refused: ${problems.slice(0, 3).join('; ')}` });
          return false;
        }
      } else {
        checkLater({ base: history.present, next: result.design, label: command.label });
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
    startDocument(design, start) {
      set({
        ...withoutFlag(documentState(startHistory(design))),
        documentId: start.documentId,
        inFile: start.inFile ? design : null,
        selectedIds: [],
        lastError: null,
        fitRequest: get().fitRequest + 1,
      });
    },
    markInFile(design) {
      set({ inFile: design, storageProblem: null });
    },
    setStorageProblem(problem) {
      set({ storageProblem: problem });
    },
    setNotice(notice) {
      set({ notice });
    },
  }));
  return store;
}

export type AppStore = ReturnType<typeof createAppStore>;
