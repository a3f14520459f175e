import { useEffect } from 'react';
import { activeCanvas } from '../canvas/canvasBridge';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { keyOwnedByWidget } from './a11y/keyOwnership';
import { editorActions } from './actions';
import { commandEnabled, editorCommand } from '../commands/editorCommands';
import { commandStateOf } from './useCommand';
import { actionForKey } from '../commands/keymap';

/** True when focus is in a text field or list box, where keys (Ctrl+Z too) belong to the field. */
function typingInField(target: EventTarget | null): boolean {
  return (
    target instanceof HTMLInputElement ||
    target instanceof HTMLTextAreaElement ||
    target instanceof HTMLSelectElement ||
    (target instanceof HTMLElement && target.isContentEditable)
  );
}

/**
 * The app's one key listener: every editor command's keys (editorCommands.ts) and the clipboard. Keys
 * are caught in the capture phase so that, during a drag, Escape or an undo cancels the drag before
 * anything else sees the key. Copy and paste also go through the browser's clipboard events, so blocks
 * copied in one tab paste in another; the pasted text is read through io/restore like any design file.
 */
export function useEditorShortcuts(): void {
  useEffect(() => {
    let pasteHandled = false;
    const onKeyDown = (e: KeyboardEvent) => {
      if (typingInField(e.target) || keyOwnedByWidget(e)) return;
      const action = actionForKey(e);
      const canvas = activeCanvas();
      if (canvas?.gestureActive()) {
        if (action === 'escape' || action === 'edit.undo' || action === 'edit.redo') {
          e.preventDefault();
          e.stopImmediatePropagation();
          canvas.cancelGesture();
        }
        return;
      }
      if (!action) return;
      const command = editorCommand(action);
      const editor = useEditorStore.getState();
      const dialogOpen = editor.helpOpen || editor.stepRepeatOpen;
      if (dialogOpen && !command.inDialogs) return;
      if (action === 'edit.paste') {
        // The browser's paste event brings the clipboard text; without one, paste what was copied here.
        pasteHandled = false;
        setTimeout(() => {
          if (!pasteHandled) void editorActions.paste();
        }, 0);
        return;
      }
      // Copy and cut leave the key to the browser too, so that its copy event can fill the clipboard.
      if (action !== 'edit.copy' && action !== 'edit.cut') e.preventDefault();
      if (commandEnabled(command, commandStateOf(useAppStore.getState())))
        editorActions.perform(action, e.shiftKey);
    };
    const onCopy = (e: ClipboardEvent) => {
      if (typingInField(e.target) || useAppStore.getState().selectedIds.length === 0) return;
      const text = useEditorStore.getState().clipboard;
      if (!text || !e.clipboardData) return;
      e.clipboardData.setData('text/plain', text);
      e.preventDefault();
    };
    const onPaste = (e: ClipboardEvent) => {
      if (typingInField(e.target)) return;
      pasteHandled = true;
      e.preventDefault();
      const text = e.clipboardData?.getData('text/plain') ?? '';
      void editorActions.paste(text).then((pasted) => pasted || editorActions.paste());
    };
    window.addEventListener('keydown', onKeyDown, true);
    document.addEventListener('copy', onCopy);
    document.addEventListener('cut', onCopy);
    document.addEventListener('paste', onPaste);
    return () => {
      window.removeEventListener('keydown', onKeyDown, true);
      document.removeEventListener('copy', onCopy);
      document.removeEventListener('cut', onCopy);
      document.removeEventListener('paste', onPaste);
    };
  }, []);
}
