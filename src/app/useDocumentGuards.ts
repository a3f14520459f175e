import { useEffect } from 'react';
import { useAppStore } from '../store/useAppStore';
import { openDroppedFile } from './designFiles';
import { documentSession } from './session';

/** True when the open design differs from the one a file (or a reproducible start) holds. */
export function changesOutsideFile(): boolean {
  const { history, inFile } = useAppStore.getState();
  return history.present !== inFile;
}

/**
 * Page-wide guards for the document: the browser asks before closing a tab whose changes are in no
 * file; a pending save is written when the page is hidden; a design file dropped anywhere opens.
 */
export function useDocumentGuards(): void {
  useEffect(() => {
    const beforeUnload = (e: BeforeUnloadEvent) => {
      if (!changesOutsideFile()) return;
      e.preventDefault();
      // Older browsers show the prompt only when returnValue is set.
      e.returnValue = '';
    };
    const hide = () => documentSession.flush();
    const onVisibility = () => {
      if (document.visibilityState === 'hidden') hide();
    };
    const dragOver = (e: DragEvent) => {
      if (!e.dataTransfer?.types.includes('Files')) return;
      e.preventDefault();
      e.dataTransfer.dropEffect = 'copy';
    };
    const drop = (e: DragEvent) => {
      if (!e.dataTransfer?.types.includes('Files')) return;
      e.preventDefault();
      void openDroppedFile(e.dataTransfer);
    };
    window.addEventListener('beforeunload', beforeUnload);
    window.addEventListener('pagehide', hide);
    document.addEventListener('visibilitychange', onVisibility);
    window.addEventListener('dragover', dragOver);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('beforeunload', beforeUnload);
      window.removeEventListener('pagehide', hide);
      document.removeEventListener('visibilitychange', onVisibility);
      window.removeEventListener('dragover', dragOver);
      window.removeEventListener('drop', drop);
    };
  }, []);
}
