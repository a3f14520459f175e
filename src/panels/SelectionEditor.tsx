import { setBlockProperties, type BlockPropertiesPatch } from '../commands/setBlockProperties';
import { pitchFor } from '../canvas/gestures/gesture';
import { cellChangeNotes, setMatCell } from '../commands/setMatCell';
import { setMatCellCounts } from '../commands/setMatCellCounts';
import { ANCHOR_CORNERS, type AnchorCorner } from '../geometry/stretchMap';
import { matGeometry } from '../geometry/matGeometry';
import { blockRect } from '../geometry/placedBlocks';
import { BITLINE_AXES, BLOCK_TYPE_LABEL, isMat, type Block, type Mat, type Strip } from '../model/block';
import type { Design } from '../model/design';
import { formatMatSizeAndBits } from '../model/matSize';
import { formatQuantity } from '../model/units';
import { useEditorStore } from '../store/editorStore';
import { useAppStore } from '../store/useAppStore';
import { NameField } from './NameField';
import { QuantityField } from './QuantityField';
import { SelectField } from './SelectField';
import { useRunCommand } from './useRunCommand';

const ANCHOR_LABEL: Record<AnchorCorner, string> = {
  topLeft: 'top-left',
  topRight: 'top-right',
  bottomLeft: 'bottom-left',
  bottomRight: 'bottom-right',
};

/** Sentences of a cell change shown at most; a whole bank says the rest in one line. */
const NOTES_SHOWN = 3;

/** The one value all blocks share, or null when they differ. */
function shared<B, V>(blocks: readonly B[], pick: (b: B) => V): V | null {
  const first = blocks[0];
  if (first === undefined) return null;
  const value = pick(first);
  return blocks.every((b) => pick(b) === value) ? value : null;
}

function typeSummary(blocks: readonly Block[]): string {
  const counts = new Map<string, number>();
  for (const b of blocks)
    counts.set(BLOCK_TYPE_LABEL[b.type], (counts.get(BLOCK_TYPE_LABEL[b.type]) ?? 0) + 1);
  return [...counts].map(([label, n]) => `${n} ${label}${n === 1 ? '' : 's'}`).join(', ');
}

/** How a cell change resizes the mats, and what the last one did: session choices kept by the panel. */
export interface CellChangeChoices {
  readonly anchor: AnchorCorner;
  readonly setAnchor: (anchor: AnchorCorner) => void;
  readonly keepCounts: boolean;
  readonly setKeepCounts: (keep: boolean) => void;
  /** What the last cell change did, shown while the document is the one it made (undo hides it). */
  readonly cellNote: CellNote | null;
  readonly setCellNote: (note: CellNote) => void;
}

/** The sentences of one cell change and the document it made. */
export interface CellNote {
  readonly design: Design;
  readonly lines: readonly string[];
}

/**
 * Edits the selected blocks, one or many at once: a value typed here goes to every selected block it
 * fits (position to all, width and height to strips, cells and bit-line direction to mats), in one
 * undo step. Fields show "mixed" where the blocks differ. Lengths accept engineering notation.
 * Loaded when something is first selected (PropertiesPanel.tsx).
 */
export function SelectionEditor({ choices }: { readonly choices: CellChangeChoices }) {
  const design = useAppStore((s) => s.history.present);
  const selectedIds = useAppStore((s) => s.selectedIds);
  const toolOptions = useEditorStore((s) => s.options);
  const run = useRunCommand();
  const selectedSet = new Set(selectedIds);
  const blocks = design.blocks.filter((b) => selectedSet.has(b.id));
  const mats = blocks.filter(isMat);
  const strips = blocks.filter((b): b is Strip => b.type !== 'mat');
  const ids = blocks.map((b) => b.id);

  const patch = (p: BlockPropertiesPatch) => run(setBlockProperties, { ids, patch: p });
  const { anchor, setAnchor, keepCounts, setKeepCounts, cellNote, setCellNote } = choices;
  const counts = (args: { cellsPerBitline?: number; cellsPerWordline?: number }) =>
    run(setMatCellCounts, { matIds: mats.map((m) => m.id), ...args });

  const single = blocks.length === 1 ? blocks[0] : undefined;
  const singleRect = single ? blockRect(design, single) : null;
  const singleMat = single && isMat(single) ? single : undefined;
  const cell = singleMat ? design.cells.find((c) => c.id === singleMat.cellId) : undefined;
  const geometry = singleMat && cell ? matGeometry(singleMat, cell, design.process.featureSize) : null;
  const mirrored = shared(mats, (m: Mat) => m.mirrored ?? false);
  // Positions show at the step moves and nudges of this selection go in.
  const grid = pitchFor(design, toolOptions, blocks);

  return (
    <>
      {single && singleRect && (
        <p className="block-summary" data-testid="selection-summary">
          {BLOCK_TYPE_LABEL[single.type]} <strong>{single.name || single.id}</strong>,{' '}
          {formatQuantity(singleRect.width, 'length')} × {formatQuantity(singleRect.height, 'length')}
          {geometry && (
            <span className="mat-size" data-testid="mat-size">
              <br />
              {single.type === 'mat' &&
                formatMatSizeAndBits(single.cellsPerBitline, single.cellsPerWordline, geometry.bits)}
            </span>
          )}
        </p>
      )}
      {blocks.length > 1 && (
        <p className="block-summary" data-testid="selection-summary">
          {blocks.length} blocks selected: {typeSummary(blocks)}
        </p>
      )}
      {single && (
        <NameField
          key={`${single.id}:${single.name}`}
          value={single.name}
          onCommit={(name) => patch({ name })}
        />
      )}
      {blocks.length > 0 && (
        <>
          <QuantityField
            id="block-x"
            label="x (left)"
            quantity="length"
            step={grid.x}
            value={shared(blocks, (b) => b.x)}
            onCommit={(x) => patch({ x })}
          />
          <QuantityField
            id="block-y"
            label="y (top)"
            quantity="length"
            step={grid.y}
            value={shared(blocks, (b) => b.y)}
            onCommit={(y) => patch({ y })}
          />
        </>
      )}
      {strips.length > 0 && (
        <>
          <QuantityField
            id="block-width"
            label={mats.length > 0 ? 'Width (strips)' : 'Width'}
            quantity="length"
            value={shared(strips, (s) => s.width)}
            onCommit={(width) => patch({ width })}
          />
          <QuantityField
            id="block-height"
            label={mats.length > 0 ? 'Height (strips)' : 'Height'}
            quantity="length"
            value={shared(strips, (s) => s.height)}
            onCommit={(height) => patch({ height })}
          />
        </>
      )}
      {mats.length > 0 && (
        <>
          <QuantityField
            id="cells-per-bitline"
            label="Cells per bit line"
            quantity="count"
            value={shared(mats, (m) => m.cellsPerBitline)}
            onCommit={(v) => counts({ cellsPerBitline: v })}
          />
          <QuantityField
            id="cells-per-wordline"
            label="Cells per word line"
            quantity="count"
            value={shared(mats, (m) => m.cellsPerWordline)}
            onCommit={(v) => counts({ cellsPerWordline: v })}
          />
          <SelectField
            id="mat-cell"
            label="Cell"
            value={shared(mats, (m) => m.cellId)}
            noValueLabel="mixed"
            options={design.cells.map((c) => ({ value: c.id, label: c.name }))}
            onChange={(cellId) => {
              const matIds = mats.map((m) => m.id);
              if (run(setMatCell, { matIds, cellId, keepCounts, anchor }) !== null) return;
              const after = useAppStore.getState().history.present;
              setCellNote({ design: after, lines: cellChangeNotes(design, after, matIds) });
            }}
          />
          {cellNote && cellNote.design === design && cellNote.lines.length > 0 && (
            <div className="hint" role="status" data-testid="cell-change-note">
              {cellNote.lines.slice(0, NOTES_SHOWN).map((line) => (
                <p key={line}>{line}</p>
              ))}
              {cellNote.lines.length > NOTES_SHOWN && (
                <p>…and {cellNote.lines.length - NOTES_SHOWN} more mats alike.</p>
              )}
            </div>
          )}
          <SelectField
            id="cell-change-anchor"
            label="On a cell change, keep"
            value={anchor}
            options={ANCHOR_CORNERS.map((c) => ({ value: c, label: `${ANCHOR_LABEL[c]} corner` }))}
            onChange={(c) => setAnchor(c)}
          />
          <div className="field">
            <label htmlFor="cell-change-keep-counts">…and keep cell counts (not capacity)</label>
            <input
              id="cell-change-keep-counts"
              data-testid="cell-change-keep-counts"
              type="checkbox"
              checked={keepCounts}
              onChange={(e) => setKeepCounts(e.target.checked)}
            />
          </div>
          <SelectField
            id="mat-axis"
            label="Bit lines run"
            value={shared(mats, (m) => m.bitlineAxis)}
            noValueLabel="mixed"
            options={BITLINE_AXES.map((a) => ({ value: a, label: a }))}
            onChange={(bitlineAxis) => patch({ bitlineAxis })}
          />
          <div className="field">
            <label htmlFor="mat-mirrored">Mirrored</label>
            <input
              id="mat-mirrored"
              data-testid="mat-mirrored"
              type="checkbox"
              checked={mirrored === true}
              ref={(el) => {
                if (el) el.indeterminate = mirrored === null;
              }}
              onChange={(e) => patch({ mirrored: e.target.checked })}
            />
          </div>
        </>
      )}
    </>
  );
}
