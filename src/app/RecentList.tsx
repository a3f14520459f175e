import type { DocumentAbout, KeptAside } from '../io/documentShelf';
import { useAppStore } from '../store/useAppStore';
import { downloadBlob } from './download';
import { documentSession } from './session';
import { formatWholeNumber } from '../model/units';

function savedWhen(ms: number): string {
  return new Date(ms).toLocaleString(undefined, { dateStyle: 'short', timeStyle: 'short' });
}

/** What the document menu hands its recent list: the lists it fetched and how to refresh them. */
export interface RecentListProps {
  readonly recent: readonly DocumentAbout[];
  readonly aside: readonly KeptAside[];
  /** The open design's id (its entry cannot be reopened or forgotten). */
  readonly documentId: string;
  readonly setRecent: (list: DocumentAbout[] | null) => void;
  readonly setAside: (list: KeptAside[]) => void;
}

/**
 * The recent designs (each can be reopened or forgotten) and the designs kept aside because they could
 * not be restored (each can be saved to a file or discarded), as the document menu's Recent opens them.
 */
export function RecentList({ recent, aside, documentId, setRecent, setAside }: RecentListProps) {
  return (
    <div className="recent-list" role="dialog" aria-label="Recent designs" data-testid="recent-list">
      {recent.length === 0 && aside.length === 0 && <p>No designs kept in this browser yet.</p>}
      <ul>
        {recent.map((entry) => (
          <li key={entry.id}>
            <button
              type="button"
              className="recent-open"
              data-testid="recent-entry"
              data-document-id={entry.id}
              disabled={entry.id === documentId}
              title={entry.name}
              onClick={async () => {
                setRecent(null);
                if (await documentSession.reopen(entry.id)) useAppStore.getState().setNotice(null);
              }}
            >
              <span className="recent-name">{entry.name}</span>
              <span className="recent-about">
                {formatWholeNumber(entry.blockCount)} blocks · {savedWhen(entry.savedAt)}
                {entry.id === documentId ? ' · open' : ''}
              </span>
            </button>
            {entry.id !== documentId && (
              <button
                type="button"
                className="recent-forget"
                data-testid="recent-forget"
                data-document-id={entry.id}
                title={`Forget “${entry.name}”: remove it from this browser's storage (Undo is offered)`}
                aria-label={`Forget ${entry.name}`}
                onClick={async () => {
                  await documentSession.forget(entry.id);
                  setRecent(await documentSession.recent());
                }}
              >
                Forget
              </button>
            )}
          </li>
        ))}
      </ul>
      {aside.length > 0 && (
        <section className="kept-aside" data-testid="kept-aside" aria-label="Designs kept aside">
          <h3>Kept aside: could not be restored</h3>
          <p>Save one to a file to mend it by hand and open it again, or discard it.</p>
          <ul>
            {aside.map((entry) => (
              <li key={entry.key} data-testid="kept-aside-entry" data-key={entry.key}>
                <span className="recent-about">{entry.keptAt > 0 ? savedWhen(entry.keptAt) : entry.key}</span>
                <button
                  type="button"
                  data-testid="kept-aside-save"
                  title="Save this kept-aside design, exactly as it was stored, to a file"
                  onClick={async () => {
                    const text = await documentSession.keptAsideText(entry.key);
                    if (text === null) return;
                    const stamp = new Date(entry.keptAt).toISOString().slice(0, 19).replace(/[:T]/g, '-');
                    downloadBlob(new Blob([text], { type: 'application/json' }), `kept-aside-${stamp}.json`);
                  }}
                >
                  Save to a file
                </button>
                <button
                  type="button"
                  data-testid="kept-aside-discard"
                  title="Remove this kept-aside design from this browser for good (asks first)"
                  onClick={async () => {
                    if (!window.confirm('Discard this kept-aside design for good? It cannot be undone.'))
                      return;
                    await documentSession.discardKeptAside(entry.key);
                    setAside(await documentSession.keptAside());
                  }}
                >
                  Discard
                </button>
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}
