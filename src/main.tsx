import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App';
import { designFromQuery } from './app/startupDesign';
import { useEditorStore } from './store/editorStore';
import { useAppStore } from './store/useAppStore';
import './app/app.css';

const requested = designFromQuery(window.location.search);
if (requested) useAppStore.getState().replaceDesign(requested);
// On an empty sheet the first thing to do is draw a mat, so its tool is chosen.
if (requested && requested.blocks.length === 0) useEditorStore.getState().setTool('mat');

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');
createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
