import { BITLINE_AXES, BLOCK_TYPE_LABEL, type BitlineAxis } from '../model/block';
import { useEditorStore, isPlacementTool } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { QuantityField } from '../panels/QuantityField';
import { CommandButton } from './CommandButton';
import type { ActionId } from '../commands/editorCommands';

/** Buttons for the editor commands on the selection, each with its key (editorCommands.ts). */
const SELECTION_COMMANDS = [
  ['edit.rotate', 'rotate'],
  ['edit.mirrorLeftRight', 'mirror-lr'],
  ['edit.mirrorTopBottom', 'mirror-tb'],
  ['edit.duplicate', 'duplicate'],
  ['edit.stepAndRepeat', 'step-repeat'],
  ['edit.delete', 'delete'],
] as const satisfies readonly (readonly [ActionId, string])[];

function SelectionActions() {
  return (
    <div className="block-actions" role="group" aria-label="Selection">
      {SELECTION_COMMANDS.map(([id, testId]) => (
        <CommandButton key={id} id={id} testId={`action-${testId}`} />
      ))}
    </div>
  );
}

/**
 * Options of the active tool along the top of the canvas (cell and bit-line direction for mats,
 * thickness for strips), and view buttons.
 */
export function ToolOptionsBar() {
  const tool = useEditorStore((s) => s.tool);
  const options = useEditorStore((s) => s.options);
  const setOptions = useEditorStore((s) => s.setOptions);
  const setThickness = useEditorStore((s) => s.setThickness);
  const gridVisible = useEditorStore((s) => s.gridVisible);
  const cells = useAppStore((s) => s.history.present.cells);
  const selectedCount = useAppStore((s) => s.selectedIds.length);
  const cellId = cells.some((c) => c.id === options.cellId) ? options.cellId : (cells[0]?.id ?? '');

  return (
    <div className="tool-options" data-testid="tool-options">
      {tool === 'mat' && (
        <>
          <label>
            Cell{' '}
            <select
              data-testid="option-cell"
              value={cellId}
              onChange={(e) => setOptions({ cellId: e.target.value })}
            >
              {cells.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
          </label>
          <label>
            Bit lines{' '}
            <select
              data-testid="option-axis"
              value={options.bitlineAxis}
              onChange={(e) => setOptions({ bitlineAxis: e.target.value as BitlineAxis })}
            >
              {BITLINE_AXES.map((a) => (
                <option key={a} value={a}>
                  {a}
                </option>
              ))}
            </select>
          </label>
          <span className="hint">
            Drag to size in whole cells; click for {options.cellsPerBitline} × {options.cellsPerWordline}{' '}
            cells.
          </span>
        </>
      )}
      {isPlacementTool(tool) && (
        <>
          <div className="inline-field">
            <QuantityField
              id="option-thickness"
              label={`${BLOCK_TYPE_LABEL[tool]} thickness`}
              quantity="length"
              digits={4}
              value={options.thickness[tool]}
              onCommit={(v) => {
                if (!(v > 0) || v > 1e-3) return 'thickness must be between 0 and 1 mm';
                setThickness(tool, v);
                return null;
              }}
            />
          </div>
          <span className="hint">
            {tool === 'senseAmpStrip' || tool === 'wordlineDriverStrip'
              ? `Click beside a mat's ${tool === 'senseAmpStrip' ? 'bit-line' : 'word-line'} edge to fit it; drag to draw.`
              : 'Click to place; drag to draw.'}
          </span>
        </>
      )}
      {tool === 'select' && selectedCount > 0 && <SelectionActions />}
      {((tool === 'select' && selectedCount === 0) || tool === 'pan') && (
        <span className="hint">
          {tool === 'select'
            ? 'Click or drag on empty canvas to select; drag to move (snaps to cell pitch and neighbours; Alt: free).'
            : 'Drag to pan; the wheel zooms around the pointer.'}
        </span>
      )}
      <div className="view-buttons">
        <CommandButton id="view.fitAll" testId="zoom-fit" />
        <CommandButton id="view.frameSelection" testId="zoom-selection" />
        <CommandButton id="view.grid" testId="toggle-grid" pressed={gridVisible} />
      </div>
    </div>
  );
}
