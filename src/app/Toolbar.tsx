import { useEffect } from 'react';
import { useAppStore } from '../store/useAppStore';
import { FileMenu } from './FileMenu';

/** True when focus is in a text field, where Ctrl+Z belongs to the field. */
function typingInField(target: EventTarget | null): boolean {
  return target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement;
}

/** Top bar: design name, undo/redo with shortcuts, frame-all. */
export function Toolbar() {
  const name = useAppStore((s) => s.history.present.name);
  const canUndo = useAppStore((s) => s.history.past.length > 0);
  const canRedo = useAppStore((s) => s.history.future.length > 0);
  const undo = useAppStore((s) => s.undo);
  const redo = useAppStore((s) => s.redo);
  const requestFit = useAppStore((s) => s.requestFit);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (typingInField(e.target)) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      if (mod && key === 'z' && !e.shiftKey) {
        e.preventDefault();
        undo();
      } else if (mod && ((key === 'z' && e.shiftKey) || key === 'y')) {
        e.preventDefault();
        redo();
      } else if (!mod && key === 'f') {
        requestFit();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [undo, redo, requestFit]);

  return (
    <header className="toolbar">
      <h1 className="brand">Matloom</h1>
      <span className="design-name" data-testid="design-name">
        {name}
      </span>
      <FileMenu />
      <div className="actions">
        <button type="button" onClick={undo} disabled={!canUndo} title="Undo (Ctrl+Z)" data-testid="undo">
          Undo
        </button>
        <button
          type="button"
          onClick={redo}
          disabled={!canRedo}
          title="Redo (Ctrl+Shift+Z)"
          data-testid="redo"
        >
          Redo
        </button>
        <button type="button" onClick={requestFit} title="Frame the whole floorplan (F)">
          Frame all
        </button>
      </div>
    </header>
  );
}
