import {
  discardKeptAside,
  forgetDocument,
  keptAsideList,
  keptAsideText,
  listDocuments,
  loadDocument,
  rememberDocument,
  type ForgottenDocument,
  newDocumentId,
  saveDocument,
  type DocumentAbout,
  type KeptAside,
  type KeyValueArea,
} from '../io/documentShelf';
import { restoreDesignWhenLoaded } from '../io/checksOnDemand';
import type { Design } from '../model/design';
import { clipForMessage } from '../model/messageText';
import { demoDesign } from '../designs/demoDesign';
import type { AppStore } from '../store/appStore';
import { browserArea, claimDocument } from './browserArea';
import { DocumentKeeper, SESSION_DOCUMENT_KEY, type KeeperStatus } from './documentKeeper';
import { designFromQuery } from './startupDesign';

/** Where versions before IndexedDB kept their one autosave (localStorage); moved into a document once. */
const OLD_AUTOSAVE_KEY = 'matloom.autosave.v1';
/** How long a reload waits for the page it replaces to let go of its document (ms). */
const RELOAD_CLAIM_WAIT = 3000;

/**
 * The tab's documents: which one opens at start, keeping it stored, reopening a recent one and starting
 * new ones. Every start other than a reopen makes a new document id, so nothing started here ever
 * writes over another document.
 */
export class DocumentSession {
  private release: (() => void) | null = null;
  /** The document id this tab holds the lock of. */
  private claimedId: string | null = null;
  private readonly keeper: DocumentKeeper | null;
  status: KeeperStatus = 'idle';
  private statusListeners = new Set<() => void>();

  constructor(
    private readonly store: AppStore,
    private readonly area: KeyValueArea | null = browserArea(),
  ) {
    this.keeper = area ? new DocumentKeeper(store, area) : null;
  }

  /** Opens the first document: a share link, a start address, this tab's document, the newest one, or the demo. */
  async start(location: { search: string; hash: string }): Promise<void> {
    const notices: string[] = [];
    await this.moveOldAutosave();
    // The share-link reader loads only for an address with a fragment: most starts have none.
    const link = location.hash.length > 1 ? await import('../io/shareLink') : null;
    const payload = link ? link.sharedPayload(location.hash) : null;
    if (link && payload !== null) {
      const shared = await link.restoreShared(payload);
      if (shared.ok) {
        this.startNew(shared.design, true);
        this.store.getState().setNotice({ kind: 'info', text: 'Opened a shared design as a new document.' });
        return this.watch();
      }
      notices.push(
        `The shared design in this address could not be opened: ${shared.errors.slice(0, 2).join('; ')}.`,
      );
    }
    const requested = designFromQuery(location.search);
    if (requested) {
      this.startNew(requested, true);
      return this.watch(notices);
    }
    const ownId = readSessionId();
    if (ownId && (await this.reopen(ownId, RELOAD_CLAIM_WAIT, notices))) return this.watch(notices);
    for (const about of await this.recent()) {
      if (about.id === ownId) continue;
      if (await this.reopen(about.id, 0, notices)) return this.watch(notices);
    }
    this.startNew(demoDesign(), true);
    return this.watch(notices);
  }

  /** Designs kept aside because they no longer restored, newest first; empty without storage. */
  async keptAside(): Promise<KeptAside[]> {
    if (!this.area) return [];
    try {
      return await keptAsideList(this.area);
    } catch {
      return [];
    }
  }

  /** The stored text of a kept-aside design, exactly as kept (to save to a file and mend by hand). */
  async keptAsideText(key: string): Promise<string | null> {
    if (!this.area) return null;
    try {
      return await keptAsideText(this.area, key);
    } catch {
      return null;
    }
  }

  /** Removes a kept-aside design for good, after the person confirmed; the notice says what happened. */
  async discardKeptAside(key: string): Promise<void> {
    const { setNotice } = this.store.getState();
    if (!this.area) return;
    try {
      await discardKeptAside(this.area, key);
      setNotice({ kind: 'info', text: `Discarded the kept-aside design "${clipForMessage(key)}".` });
    } catch (error) {
      setNotice({
        kind: 'error',
        text: `The kept-aside design could not be discarded (${clipForMessage(String(error), 80)}); it stays stored.`,
      });
    }
  }

  /** Newest first; empty without storage. */
  async recent(): Promise<DocumentAbout[]> {
    if (!this.area) return [];
    try {
      return await listDocuments(this.area);
    } catch {
      return [];
    }
  }

  /**
   * Starts a new document with `design` under a fresh id. `reproducible`: the design can be made again
   * (demo, generated, blank, shared link) or is in a file, so closing the tab unedited loses nothing, and
   * it is stored only once edited.
   */
  startNew(design: Design, reproducible: boolean): void {
    this.letGo();
    const id = newDocumentId();
    this.keeper?.markWritten(id, reproducible ? design : null);
    this.store.getState().startDocument(design, { documentId: id, inFile: reproducible });
  }

  /** Reopens a stored document; false (with a notice line) when it cannot be. */
  async reopen(id: string, waitMs = 0, notices: string[] = []): Promise<boolean> {
    if (!this.area) return false;
    if (id === this.store.getState().documentId) return true;
    const release = await claimDocument(id, waitMs);
    if (!release) {
      notices.push('That design is open in another tab.');
      this.flushNotices(notices);
      return false;
    }
    const loaded = await loadDocument(this.area, id);
    if (loaded.kind !== 'restored') {
      release();
      if (loaded.kind !== 'none') notices.push(loaded.message);
      this.flushNotices(notices);
      return false;
    }
    this.keeper?.flushNow();
    this.letGo();
    this.release = release;
    this.claimedId = id;
    this.keeper?.markWritten(id, loaded.design);
    this.store.getState().startDocument(loaded.design, { documentId: id, inFile: false });
    try {
      sessionStorage.setItem(SESSION_DOCUMENT_KEY, id);
    } catch {
      // Only the reload shortcut is lost.
    }
    return true;
  }

  /**
   * Forgets a stored document (the recent list's Forget): never the open one, and not one another tab
   * has open. The notice offers Undo, which puts it back exactly as it was while the notice is shown.
   */
  async forget(id: string): Promise<void> {
    const { setNotice } = this.store.getState();
    if (!this.area) return;
    if (id === this.store.getState().documentId) {
      setNotice({ kind: 'error', text: 'The open design cannot be forgotten; open another one first.' });
      return;
    }
    const release = await claimDocument(id, 0);
    if (!release) {
      setNotice({ kind: 'error', text: 'That design is open in another tab; close it there first.' });
      return;
    }
    let forgotten: ForgottenDocument | null;
    try {
      forgotten = await forgetDocument(this.area, id);
    } catch (error) {
      setNotice({
        kind: 'error',
        text: `The design could not be forgotten (${clipForMessage(String(error), 80)}); it stays stored.`,
      });
      return;
    } finally {
      release();
    }
    if (!forgotten) return;
    const name = clipForMessage(forgotten.about?.name ?? 'design');
    const area = this.area;
    setNotice({
      kind: 'info',
      text: `Forgot “${name}” from this browser's storage.`,
      action: {
        label: 'Undo',
        title: `Keep “${name}” in this browser after all`,
        run: () => {
          void rememberDocument(area, forgotten)
            .then(() => setNotice({ kind: 'info', text: `“${name}” is kept again (Recent).` }))
            .catch((error: unknown) =>
              setNotice({
                kind: 'error',
                text: `“${name}” could not be put back (${clipForMessage(String(error), 80)}).`,
              }),
            );
        },
      },
    });
  }

  /** Writes a pending change at once (page hide). */
  flush(): void {
    this.keeper?.flushNow();
  }

  onStatus(listener: () => void): () => void {
    this.statusListeners.add(listener);
    return () => this.statusListeners.delete(listener);
  }

  private watch(notices: string[] = []): void {
    this.flushNotices(notices);
    // Hold the lock of whichever document is open (new ones, files opened, reopened ones).
    const claimOpen = () => {
      const id = this.store.getState().documentId;
      if (id === this.claimedId) return;
      this.letGo();
      this.claimedId = id;
      void claimDocument(id).then((release) => {
        if (this.claimedId === id) this.release = release;
        else release?.();
      });
    };
    claimOpen();
    this.store.subscribe((state, previous) => {
      if (state.documentId !== previous.documentId) claimOpen();
    });
    if (!this.keeper) {
      this.store
        .getState()
        .setStorageProblem(
          'This browser offers no storage to keep designs in (IndexedDB). Save to a file to keep your work.',
        );
      return;
    }
    this.keeper.watch((status) => {
      this.status = status;
      for (const listener of this.statusListeners) listener();
    });
  }

  private flushNotices(notices: string[]): void {
    if (notices.length > 0) this.store.getState().setNotice({ kind: 'error', text: notices.join(' ') });
  }

  private letGo(): void {
    this.release?.();
    this.release = null;
    this.claimedId = null;
  }

  /** Moves the single autosave of earlier versions into a document of its own, then removes it. */
  private async moveOldAutosave(): Promise<void> {
    if (!this.area) return;
    try {
      const text = localStorage.getItem(OLD_AUTOSAVE_KEY);
      if (text === null) return;
      const restored = await restoreDesignWhenLoaded(text);
      // A text that no longer restores stays where it is: nothing is dropped.
      if (!restored.ok) return;
      await saveDocument(this.area, newDocumentId(), restored.design, text);
      localStorage.removeItem(OLD_AUTOSAVE_KEY);
    } catch {
      // Left in localStorage; a later start tries again.
    }
  }
}

function readSessionId(): string | null {
  try {
    return sessionStorage.getItem(SESSION_DOCUMENT_KEY);
  } catch {
    return null;
  }
}
