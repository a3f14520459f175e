import { useEffect } from 'react';
import { activeCanvas } from '../canvas/canvasBridge';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { useExploreStore } from '../store/useExploreStore';
import { readAddressState, writeAddressState, type AddressState } from './addressState';

/** Frames to wait at most for the canvas to be laid out before framing a selection read from the address. */
const MAX_FRAMES_TO_WAIT = 120;

/** Frames the blocks once the canvas is on screen (it measures itself after the first layout). */
function frameWhenCanvasReady(ids: readonly string[], framesLeft = MAX_FRAMES_TO_WAIT): void {
  const canvas = activeCanvas();
  if (canvas && canvas.size().width > 0) {
    useEditorStore.getState().requestFrame(ids);
    return;
  }
  if (framesLeft > 0) requestAnimationFrame(() => frameWhenCanvasReady(ids, framesLeft - 1));
}

function applyAddress(state: AddressState): void {
  useExploreStore.getState().setView(state.view);
  const existing = new Set(useAppStore.getState().history.present.blocks.map((b) => b.id));
  const ids = state.select.filter((id) => existing.has(id));
  useAppStore.getState().select(ids);
  if (ids.length > 0) frameWhenCanvasReady(ids);
}

/**
 * Keeps the page address in step with the view and the selection: choosing a view adds a history entry
 * (so Back returns to the previous view), a new selection replaces the current entry; on load and on
 * Back or Forward the address's view and selection are restored and the selection framed.
 */
export function useAddressState(): void {
  useEffect(() => {
    let restoring = false;
    const restore = () => {
      restoring = true;
      applyAddress(readAddressState(window.location.search));
      restoring = false;
    };
    const write = (push: boolean) => {
      if (restoring) return;
      const search = writeAddressState(window.location.search, {
        view: useExploreStore.getState().view,
        select: useAppStore.getState().selectedIds,
      });
      if (search === window.location.search) return;
      const url = `${window.location.pathname}${search}${window.location.hash}`;
      if (push) window.history.pushState(null, '', url);
      else window.history.replaceState(null, '', url);
    };
    restore();
    window.addEventListener('popstate', restore);
    const stopView = useExploreStore.subscribe((s, prev) => {
      if (s.view !== prev.view) write(true);
    });
    const stopSelection = useAppStore.subscribe((s, prev) => {
      if (s.selectedIds !== prev.selectedIds) write(false);
    });
    return () => {
      window.removeEventListener('popstate', restore);
      stopView();
      stopSelection();
    };
  }, []);
}
