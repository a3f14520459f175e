import { Legend } from '../canvas/Legend';
import { formatQuantity, formatScaled } from '../model/units';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';

/** Pointer position in micrometres, zoom, and how many blocks there are and are selected. */
export function StatusBar() {
  const pointer = useEditorStore((s) => s.pointer);
  const scale = useAppStore((s) => s.viewport.scale);
  const blockCount = useAppStore((s) => s.history.present.blocks.length);
  const selectedCount = useAppStore((s) => s.selectedIds.length);
  const lastError = useAppStore((s) => s.lastError);
  return (
    <div className="status-bar" data-testid="status-bar">
      <span className="coordinates" data-testid="cursor-coordinates">
        {pointer
          ? `x ${formatScaled(pointer.x, 'µ', 3)} µm   y ${formatScaled(pointer.y, 'µ', 3)} µm`
          : 'x —   y —'}
      </span>
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
