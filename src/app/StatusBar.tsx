import { useEffect, useRef } from 'react';
import { Legend } from '../canvas/Legend';
import { pitchFor } from '../canvas/gestures/gesture';
import { formatPosition, formatQuantity } from '../model/units';
import { useEditorStore, type EditorState } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';

/** The pointer at the precision of the grid the active tool places on (the chosen cell's line pitches). */
function coordinates(pointer: EditorState['pointer']): string {
  if (!pointer) return 'x —   y —';
  const grid = pitchFor(useAppStore.getState().history.present, useEditorStore.getState().options, []);
  return `x ${formatPosition(pointer.x, grid.x)}   y ${formatPosition(pointer.y, grid.y)}`;
}

/**
 * The pointer position in micrometres. It changes on every pointer move, so it is written straight into
 * the element instead of re-rendering through React on each move.
 */
function Coordinates() {
  const ref = useRef<HTMLSpanElement>(null);
  useEffect(() => {
    const write = (pointer: EditorState['pointer']) => {
      if (ref.current) ref.current.textContent = coordinates(pointer);
    };
    write(useEditorStore.getState().pointer);
    return useEditorStore.subscribe((s, prev) => {
      if (s.pointer !== prev.pointer) write(s.pointer);
    });
  }, []);
  return <span ref={ref} className="coordinates" data-testid="cursor-coordinates" />;
}

/** Pointer position in micrometres, zoom, and how many blocks there are and are selected. */
export function StatusBar() {
  const scale = useAppStore((s) => s.viewport.scale);
  const blockCount = useAppStore((s) => s.history.present.blocks.length);
  const selectedCount = useAppStore((s) => s.selectedIds.length);
  const lastError = useAppStore((s) => s.lastError);
  return (
    <div className="status-bar" data-testid="status-bar">
      <Coordinates />
      <span title="Screen pixels per micrometre">zoom {formatQuantity(scale, 'ratio', 3)} px/µm</span>
      <span data-testid="block-count">
        {formatQuantity(blockCount, 'count')} block{blockCount === 1 ? '' : 's'}
      </span>
      <span data-testid="selected-count">{formatQuantity(selectedCount, 'count')} selected</span>
      {lastError && (
        <span className="status-error" role="status" data-testid="last-error">
          {lastError}
        </span>
      )}
      <Legend />
    </div>
  );
}
