import { setMatCellCounts } from '../commands/setMatCellCounts';
import { BLOCK_TYPE_LABEL, isMat, type Mat } from '../model/block';
import { formatQuantity } from '../model/units';
import { blockRect } from '../geometry/placedBlocks';
import { useAppStore } from '../store/useAppStore';
import { QuantityField } from './QuantityField';
import { useRunCommand } from './useRunCommand';
import { setMatCell } from '../commands/cellCommands';

/** The one value all mats share, or null when they differ. */
function shared(mats: readonly Mat[], pick: (m: Mat) => number): number | null {
  const first = mats[0];
  if (!first) return null;
  const value = pick(first);
  return mats.every((m) => pick(m) === value) ? value : null;
}

/** Edits the selected blocks: cell counts for mats; size and type shown for every block. */
export function PropertiesPanel() {
  const design = useAppStore((s) => s.history.present);
  const selectedIds = useAppStore((s) => s.selectedIds);
  const execute = useAppStore((s) => s.execute);
  const run = useRunCommand();
  const selectedSet = new Set(selectedIds);
  const blocks = design.blocks.filter((b) => selectedSet.has(b.id));
  const mats = blocks.filter(isMat);

  const apply = (args: { cellsPerBitline?: number; cellsPerWordline?: number }) =>
    run(setMatCellCounts, { matIds: mats.map((m) => m.id), ...args });

  return (
    <section className="panel" aria-labelledby="properties-heading">
      <h2 id="properties-heading">Properties</h2>
      {blocks.length === 0 && <p className="hint">Nothing selected.</p>}
      {blocks.length === 1 && blocks[0] && (
        <p className="block-summary" data-testid="selection-summary">
          {BLOCK_TYPE_LABEL[blocks[0].type]} <strong>{blocks[0].name || blocks[0].id}</strong>,{' '}
          {formatQuantity(blockRect(design, blocks[0]).width, 'length')} ×{' '}
          {formatQuantity(blockRect(design, blocks[0]).height, 'length')}
        </p>
      )}
      {blocks.length > 1 && <p className="block-summary">{blocks.length} blocks selected</p>}
      {mats.length > 0 && (
        <>
          <QuantityField
            id="cells-per-bitline"
            label="Cells per bit line"
            quantity="count"
            value={shared(mats, (m) => m.cellsPerBitline)}
            onCommit={(v) => apply({ cellsPerBitline: v })}
          />
          <QuantityField
            id="cells-per-wordline"
            label="Cells per word line"
            quantity="count"
            value={shared(mats, (m) => m.cellsPerWordline)}
            onCommit={(v) => apply({ cellsPerWordline: v })}
          />
          <div className="field">
            <label htmlFor="mat-cell">Cell</label>
            <select
              id="mat-cell"
              data-testid="mat-cell"
              value={mats.every((m) => m.cellId === mats[0]?.cellId) ? mats[0]?.cellId : ''}
              onChange={(e) => execute(setMatCell, { matIds: mats.map((m) => m.id), cellId: e.target.value })}
            >
              {!mats.every((m) => m.cellId === mats[0]?.cellId) && <option value="">mixed</option>}
              {design.cells.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name}
                </option>
              ))}
            </select>
          </div>
          <p className="hint">Bit lines run {mats[0]?.bitlineAxis}.</p>
        </>
      )}
    </section>
  );
}
