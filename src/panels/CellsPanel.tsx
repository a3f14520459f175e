import { useState } from 'react';
import {
  copyCell,
  renameCell,
  setCellPitchOverride,
  setCellValue,
  setGainReadValue,
} from '../commands/cellCommands';
import { CELL_KIND_LABEL, cellPitches, footprintInF2 } from '../model/cell';
import { GAIN_READ_FIELDS } from '../model/fieldCatalog';
import { formatQuantity } from '../model/units';
import { useAppStore } from '../store/useAppStore';
import { QuantityField } from './QuantityField';
import { useRunCommand } from './useRunCommand';
import { SelectField } from './SelectField';

/** The design's cell definitions: pick one, copy it, edit its pitches, capacitance and read path. */
export function CellsPanel() {
  const design = useAppStore((s) => s.history.present);
  const run = useRunCommand();
  const [chosen, setChosen] = useState(design.cells[0]?.id ?? '');
  const cell = design.cells.find((c) => c.id === chosen) ?? design.cells[0];
  if (!cell) return null;
  const F = design.process.featureSize;
  const pitches = cellPitches(cell, F);
  const users = design.blocks.filter((b) => b.type === 'mat' && b.cellId === cell.id).length;

  return (
    <section className="panel" aria-labelledby="cells-heading">
      <h2 id="cells-heading">Cells</h2>
      <SelectField
        id="cell-choice"
        label="Cell"
        value={cell.id}
        options={design.cells.map((c) => ({ value: c.id, label: c.name }))}
        onChange={setChosen}
      />
      <p className="hint" data-testid="cell-summary">
        {CELL_KIND_LABEL[cell.kind]}, {cell.bitlineArchitecture} bit lines,{' '}
        {formatQuantity(footprintInF2(cell, F), 'ratio', 3)} F² (
        {formatQuantity(pitches.bitlinePitch, 'length')} × {formatQuantity(pitches.wordlinePitch, 'length')}
        {cell.pitchOverride ? ', drawn' : ''}); used by {users} mat{users === 1 ? '' : 's'}.
      </p>
      <div className="panel-actions">
        <button
          type="button"
          data-testid="copy-cell"
          title="Make an editable copy of this cell"
          onClick={() => {
            if (run(copyCell, { cellId: cell.id }) === null) {
              const cells = useAppStore.getState().history.present.cells;
              setChosen(cells[cells.length - 1]?.id ?? cell.id);
            }
          }}
        >
          Copy to edit separately
        </button>
      </div>
      <div className="field">
        <label htmlFor="cell-name">Name</label>
        <input
          id="cell-name"
          defaultValue={cell.name}
          key={`${cell.id}-${cell.name}`}
          onBlur={(e) => run(renameCell, { cellId: cell.id, name: e.target.value })}
        />
      </div>
      <QuantityField
        id="cell-bitlinePitchInF"
        label="Bit-line pitch (×F)"
        quantity="ratio"
        value={cell.bitlinePitchInF}
        onCommit={(value) => run(setCellValue, { cellId: cell.id, field: 'bitlinePitchInF', value })}
      />
      <QuantityField
        id="cell-wordlinePitchInF"
        label="Word-line pitch (×F)"
        quantity="ratio"
        value={cell.wordlinePitchInF}
        onCommit={(value) => run(setCellValue, { cellId: cell.id, field: 'wordlinePitchInF', value })}
      />
      <QuantityField
        id="cell-drawn-bitline-pitch"
        label="Drawn bit-line pitch"
        quantity="length"
        value={pitches.bitlinePitch}
        onCommit={(value) =>
          run(setCellPitchOverride, {
            cellId: cell.id,
            override: { bitlinePitch: value, wordlinePitch: pitches.wordlinePitch },
          })
        }
      />
      <QuantityField
        id="cell-drawn-wordline-pitch"
        label="Drawn word-line pitch"
        quantity="length"
        value={pitches.wordlinePitch}
        onCommit={(value) =>
          run(setCellPitchOverride, {
            cellId: cell.id,
            override: { bitlinePitch: pitches.bitlinePitch, wordlinePitch: value },
          })
        }
      />
      {cell.pitchOverride && (
        <div className="panel-actions">
          <button
            type="button"
            title="Drop the typed pitches and derive them from the feature size"
            onClick={() => run(setCellPitchOverride, { cellId: cell.id, override: null })}
          >
            Derive pitches from F again
          </button>
        </div>
      )}
      <QuantityField
        id="cell-storageCapacitance"
        label={cell.gainRead ? 'Storage-node capacitance' : 'Storage capacitance'}
        quantity="capacitance"
        value={cell.storageCapacitance}
        onCommit={(value) => run(setCellValue, { cellId: cell.id, field: 'storageCapacitance', value })}
      />
      {cell.gainRead &&
        GAIN_READ_FIELDS.map((f) => (
          <QuantityField
            key={f.key}
            id={`cell-gain-${f.key}`}
            label={f.label}
            quantity={f.quantity}
            value={cell.gainRead ? cell.gainRead[f.key] : null}
            onCommit={(value) => run(setGainReadValue, { cellId: cell.id, field: f.key, value })}
          />
        ))}
    </section>
  );
}
