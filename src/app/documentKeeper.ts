import { designTextPieces } from '../io/designText';
import { saveDocument, type KeyValueArea } from '../io/documentShelf';
import type { Design } from '../model/design';
import { clipForMessage } from '../model/messageText';
import { UNSTORED_DOCUMENT_ID, type AppStore } from '../store/appStore';
import { requestIdle, type IdleDeadline } from './idleTime';

/** Where this tab remembers its document across reloads. */
export const SESSION_DOCUMENT_KEY = 'matloom.document';

/** What the keeper reports to the status line. */
export type KeeperStatus = 'idle' | 'kept' | 'pending' | 'failed';

/**
 * Keeps the open document in browser storage, off the edit's path: a change only marks the document
 * dirty; its text is made in idle time, a few thousand blocks per slice (io/designText.ts), and written
 * as one Blob. A newer edit during a save starts the text again from the newest design. Only the open
 * document's own keys are written. A failure is reported once as a lasting problem (the notice stays
 * until the design is saved to a file).
 */
export class DocumentKeeper {
  /** The design last written for each document id, so an unchanged document is not written again. */
  private readonly written = new Map<string, Design>();
  private running = false;
  private onStatus: (status: KeeperStatus) => void = () => {};

  constructor(
    private readonly store: AppStore,
    private readonly area: KeyValueArea,
  ) {}

  /** Records what storage already holds for a document (reopened, or reproducible and not yet stored). */
  markWritten(id: string, design: Design | null): void {
    if (design) this.written.set(id, design);
    else this.written.delete(id);
  }

  watch(onStatus: (status: KeeperStatus) => void): () => void {
    this.onStatus = onStatus;
    const unsubscribe = this.store.subscribe((state, previous) => {
      if (state.documentId !== previous.documentId) {
        // Another document opened: the one before keeps its last edit, written now under its own id.
        this.writeNow(previous.documentId, previous.history.present);
      }
      if (state.history.present !== previous.history.present || state.documentId !== previous.documentId) {
        this.schedule();
      }
    });
    this.schedule();
    return unsubscribe;
  }

  /** True when the open document differs from what storage holds. */
  dirty(): boolean {
    const { documentId, history } = this.store.getState();
    return documentId !== UNSTORED_DOCUMENT_ID && this.written.get(documentId) !== history.present;
  }

  /**
   * Writes the open document now, in one go (page hide: idle time will not come again). The write is
   * started; the browser finishes the transaction if it can.
   */
  flushNow(): void {
    const { documentId, history } = this.store.getState();
    this.writeNow(documentId, history.present);
  }

  /** Writes `design` as document `id` in one go, unless storage already holds it. */
  private writeNow(id: string, design: Design): void {
    if (id === UNSTORED_DOCUMENT_ID || this.written.get(id) === design) return;
    const text = new Blob(Array.from(designTextPieces(design)), { type: 'application/json' });
    saveDocument(this.area, id, design, text).then(
      () => {
        this.written.set(id, design);
        this.afterFirstSave(id);
      },
      (error: unknown) => this.reportFailure(error),
    );
  }

  private schedule(): void {
    if (!this.dirty()) return;
    this.onStatus('pending');
    if (this.running) return;
    this.running = true;
    requestIdle((deadline) => void this.save(deadline));
  }

  private async save(first: IdleDeadline): Promise<void> {
    const { documentId: id, history } = this.store.getState();
    const design = history.present;
    const pieces: string[] = [];
    const source = designTextPieces(design);
    let deadline = first;
    for (;;) {
      // In idle time, pieces until the browser wants the thread back; when idle time never came (a
      // busy page), two pieces per turn so that the save still moves on without a long task.
      let taken = 0;
      let next = source.next();
      while (!next.done) {
        pieces.push(next.value);
        taken++;
        if (deadline.didTimeout ? taken >= 2 : deadline.timeRemaining() < 1) break;
        next = source.next();
      }
      if (next.done) break;
      deadline = await new Promise<IdleDeadline>((resolve) => requestIdle(resolve));
      if (this.store.getState().history.present !== design) {
        // Edited meanwhile: start again from the newest design.
        this.running = false;
        this.schedule();
        return;
      }
    }
    try {
      await saveDocument(this.area, id, design, new Blob(pieces, { type: 'application/json' }));
      this.written.set(id, design);
      this.afterFirstSave(id);
    } catch (error) {
      this.reportFailure(error);
      this.running = false;
      this.onStatus('failed');
      return;
    }
    this.running = false;
    if (this.dirty()) this.schedule();
    else this.onStatus('kept');
  }

  /** Once stored, a reload reopens this document instead of the address it was started from. */
  private afterFirstSave(id: string): void {
    if (this.store.getState().documentId !== id) return;
    try {
      sessionStorage.setItem(SESSION_DOCUMENT_KEY, id);
    } catch {
      // Without session storage a reload opens the most recent document, which is this one.
    }
    if (location.search || location.hash) {
      history.replaceState(null, '', location.pathname);
    }
  }

  private reportFailure(error: unknown): void {
    const why = clipForMessage(
      error instanceof Error ? `${error.name}: ${error.message}` : String(error),
      120,
    );
    this.store
      .getState()
      .setStorageProblem(
        `This design could not be kept in the browser's storage (${why}). Save it to a file to keep your work.`,
      );
  }
}
