import { useState } from 'react';
import { addBlocks } from '../../commands/addBlocks';
import {
  BITLINE_AXES,
  BLOCK_TYPE_LABEL,
  BLOCK_TYPES,
  type BitlineAxis,
  type BlockType,
} from '../../model/block';
import { useEditorStore } from '../../store/editorStore';
import { useAppStore } from '../../store/useAppStore';
import { newBlockFromForm, type NewBlockForm } from './newBlock';

/** Windows shorter than this (px) open with the form folded. */
const SHORT_WINDOW_PX = 800;

type TextKey = 'x' | 'y' | 'width' | 'height' | 'cellsPerBitline' | 'cellsPerWordline';

const FIELDS: readonly { key: TextKey; label: string; forMat: boolean | 'both' }[] = [
  { key: 'x', label: 'X (left, µm)', forMat: 'both' },
  { key: 'y', label: 'Y (top, µm)', forMat: 'both' },
  { key: 'width', label: 'Width (µm)', forMat: false },
  { key: 'height', label: 'Height (µm)', forMat: false },
  { key: 'cellsPerBitline', label: 'Cells per bit line', forMat: true },
  { key: 'cellsPerWordline', label: 'Cells per word line', forMat: true },
];

/**
 * Adds a mat, strip, decoder or spacer at typed coordinates and size, through the same add-block command
 * as the drawing tools; the new block is selected and framed. Bare numbers are micrometres; "0.1 mm" or
 * "36u" work too. A refused block leaves the document and the typed values as they were.
 */
export function AddBlockForm() {
  const design = useAppStore((s) => s.history.present);
  const options = useEditorStore((s) => s.options);
  const [form, setForm] = useState<NewBlockForm>({
    type: 'mat',
    x: '0',
    y: '0',
    width: '36',
    height: '6',
    cellsPerBitline: String(options.cellsPerBitline),
    cellsPerWordline: String(options.cellsPerWordline),
    cellId: '',
    bitlineAxis: options.bitlineAxis,
  });
  const [errors, setErrors] = useState<Partial<Record<keyof NewBlockForm, string>>>({});
  const [refused, setRefused] = useState<string | null>(null);
  // On a short window the form starts folded, so the block list keeps room.
  const [open, setOpen] = useState(() => window.innerHeight >= SHORT_WINDOW_PX);
  const cellId = design.cells.some((c) => c.id === form.cellId) ? form.cellId : (design.cells[0]?.id ?? '');
  const isMat = form.type === 'mat';

  const submit = () => {
    const result = newBlockFromForm(design, { ...form, cellId });
    if (!result.ok) {
      setErrors(result.errors);
      setRefused(null);
      return;
    }
    setErrors({});
    const app = useAppStore.getState();
    if (!app.execute(addBlocks, { blocks: [result.block] })) {
      setRefused(useAppStore.getState().lastError);
      return;
    }
    setRefused(null);
    app.select([result.block.id]);
    useEditorStore.getState().requestFrame([result.block.id]);
  };

  return (
    <details className="add-block" open={open} onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary data-testid="add-block-summary">Add a block at coordinates</summary>
      <form
        aria-label="Add a block"
        data-testid="add-block-form"
        onSubmit={(e) => {
          e.preventDefault();
          submit();
        }}
      >
        <div className="field">
          <label htmlFor="add-type">Type</label>
          <select
            id="add-type"
            data-testid="add-type"
            value={form.type}
            onChange={(e) => setForm({ ...form, type: e.target.value as BlockType })}
          >
            {BLOCK_TYPES.map((t) => (
              <option key={t} value={t}>
                {BLOCK_TYPE_LABEL[t]}
              </option>
            ))}
          </select>
        </div>
        {isMat && (
          <>
            <div className="field">
              <label htmlFor="add-cell">Cell</label>
              <select
                id="add-cell"
                data-testid="add-cell"
                value={cellId}
                onChange={(e) => setForm({ ...form, cellId: e.target.value })}
              >
                {design.cells.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.name}
                  </option>
                ))}
              </select>
            </div>
            <div className="field">
              <label htmlFor="add-axis">Bit lines run</label>
              <select
                id="add-axis"
                data-testid="add-axis"
                value={form.bitlineAxis}
                onChange={(e) => setForm({ ...form, bitlineAxis: e.target.value as BitlineAxis })}
              >
                {BITLINE_AXES.map((a) => (
                  <option key={a} value={a}>
                    {a}
                  </option>
                ))}
              </select>
            </div>
          </>
        )}
        {FIELDS.filter((f) => f.forMat === 'both' || f.forMat === isMat).map((f) => (
          <div className="field" key={f.key}>
            <label htmlFor={`add-${f.key}`}>{f.label}</label>
            <input
              id={`add-${f.key}`}
              data-testid={`add-${f.key}`}
              value={form[f.key]}
              aria-invalid={errors[f.key] !== undefined}
              aria-describedby={errors[f.key] ? `add-${f.key}-error` : undefined}
              onChange={(e) => setForm({ ...form, [f.key]: e.target.value })}
            />
            {errors[f.key] && (
              <p className="field-error" id={`add-${f.key}-error`} role="alert">
                {errors[f.key]}
              </p>
            )}
          </div>
        ))}
        {refused && (
          <p className="field-error" role="alert" data-testid="add-refused">
            {refused}
          </p>
        )}
        <button type="submit" data-testid="add-block" title="Add the block, select it and frame it">
          Add {BLOCK_TYPE_LABEL[form.type]}
        </button>
      </form>
    </details>
  );
}
