import { useEffect } from 'react';
import { saveAutosave } from '../io/autosave';
import { useAppStore } from '../store/useAppStore';

/** Quiet time after the last change before writing (ms): one write per burst of edits. */
const AUTOSAVE_DELAY = 250;

/** Writes the document to browser storage shortly after every change. */
export function useAutosave() {
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | undefined;
    let pending = false;
    const write = () => {
      pending = false;
      const error = saveAutosave(localStorage, useAppStore.getState().history.present);
      if (error) useAppStore.getState().setNotice({ kind: 'error', text: error });
    };
    const unsubscribe = useAppStore.subscribe((state, previous) => {
      if (state.history.present === previous.history.present) return;
      clearTimeout(timer);
      pending = true;
      timer = setTimeout(write, AUTOSAVE_DELAY);
    });
    // Flush a pending write on page hide so that a reload right after an edit keeps it. Only a pending
    // one: an unchanged document must not overwrite what storage holds (it may be kept aside).
    const flush = () => {
      clearTimeout(timer);
      if (pending) write();
    };
    window.addEventListener('pagehide', flush);
    return () => {
      clearTimeout(timer);
      unsubscribe();
      window.removeEventListener('pagehide', flush);
    };
  }, []);
}
