import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App';
import { loadChecks } from './io/checksOnDemand';
import { loadEditPath } from './store/editPathOnDemand';
import { documentSession } from './app/session';
import { primeEdits } from './app/editPrimer';
import { primeTextLengths } from './app/textLengthPrimer';
import { useEditorStore } from './store/editorStore';
import { useAppStore } from './store/useAppStore';
import './app/app.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

// The first document (share link, start address, this tab's document, the newest, or the demo) is open
// before anything is drawn, so the canvas never shows one design and then another.
void documentSession
  .start(window.location)
  .catch(() => undefined)
  .finally(() => {
    // On an empty sheet the first thing to do is draw a mat, so its tool is chosen.
    const started = useAppStore.getState().history.present;
    if (new URLSearchParams(window.location.search).has('blank') && started.blocks.length === 0) {
      useEditorStore.getState().setTool('mat');
    }
    createRoot(root).render(
      <StrictMode>
        <App />
      </StrictMode>,
    );
    // Restore and the edit check (with the schema library) load after the first paint: edits made
    // before they arrive are checked when they do (store/appStore.ts).
    requestAnimationFrame(() => setTimeout(() => void loadChecks(), 0));
    // So does the edit path (engine/editPath.ts): until it arrives, edits are evaluated whole.
    requestAnimationFrame(() => setTimeout(() => void loadEditPath().catch(() => undefined), 0));
    // The first edit after opening a whole die finds the design's text length measured (io/designTextLength.ts).
    primeTextLengths(useAppStore);
    // ... and the layout checks' edit index built (engine reportState.prepareForEdits).
    primeEdits(useAppStore);
  });
