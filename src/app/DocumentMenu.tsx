import { useEffect, useRef, useState } from 'react';
import type { DocumentAbout, KeptAside } from '../io/documentShelf';
import { useAppStore } from '../store/useAppStore';
import { CommandButton } from './CommandButton';
import { openDesignFile } from './designFiles';
import { makeShareLink, registerFileInput } from './documentActions';
import { documentSession } from './session';
import './documents.css';
import { afterFirstPaint } from '../panels/afterFirstPaint';

// The list Recent opens comes after the first paint (asked for then, long before anyone can click).
const recentList = afterFirstPaint(() => import('./RecentList').then((m) => m.RecentList));

/** New, Open, Save, the recent designs (each can be reopened or forgotten) and a share link. */
export function DocumentMenu() {
  const fileInput = useRef<HTMLInputElement>(null);
  const [recent, setRecent] = useState<DocumentAbout[] | null>(null);
  const [aside, setAside] = useState<KeptAside[]>([]);
  const documentId = useAppStore((s) => s.documentId);
  const [link, setLink] = useState<string | null>(null);
  useEffect(() => registerFileInput(() => fileInput.current?.click()), []);
  useEffect(() => recentList.preload(), []);
  // An open list follows what the notices report (a design forgotten, or put back by Undo).
  const notice = useAppStore((s) => s.notice);
  const listOpen = recent !== null;
  useEffect(() => {
    if (!listOpen) return;
    let current = true;
    void documentSession.recent().then((list) => current && setRecent(list));
    void documentSession.keptAside().then((list) => current && setAside(list));
    return () => {
      current = false;
    };
  }, [notice, listOpen]);

  const toggleRecent = async () => {
    if (recent) setRecent(null);
    else {
      setAside(await documentSession.keptAside());
      setRecent(await documentSession.recent());
    }
  };

  return (
    <div className="document-menu">
      <CommandButton id="file.new" testId="new-design" />
      <CommandButton id="file.open" testId="open-file" text="Open…" />
      <input
        ref={fileInput}
        type="file"
        accept=".json,application/json"
        hidden
        data-testid="open-file-input"
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) void openDesignFile(file);
        }}
      />
      <CommandButton id="file.save" testId="save-file" />
      <button
        type="button"
        data-testid="recent-menu"
        title="Designs opened or saved recently in this browser"
        aria-expanded={recent !== null}
        onClick={() => void toggleRecent()}
      >
        Recent
      </button>
      <button
        type="button"
        data-testid="share-link"
        title="Copy a link that carries this design"
        data-link={link ?? undefined}
        onClick={async () => setLink(await makeShareLink())}
      >
        Share link
      </button>
      {recent && (
        <recentList.Render
          props={{ recent, aside, documentId, setRecent, setAside }}
          fallback={<div className="recent-list" role="dialog" aria-label="Recent designs" aria-busy />}
        />
      )}
    </div>
  );
}
