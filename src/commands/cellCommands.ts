import type { CellDefinition } from '../model/cell';
import { cellDefinitionSchema } from '../model/cellSchema';
import type { Design } from '../model/design';
import type { GainReadField } from '../model/fieldCatalog';
import type { Command, CommandResult } from './command';
import { firstIssue } from './zodMessage';

/** Cell fields edited as plain numbers. */
export type CellNumericField = 'bitlinePitchInF' | 'wordlinePitchInF' | 'storageCapacitance';

/** A fresh id not used by any cell of the design. */
function freshCellId(design: Design, base: string): string {
  const used = new Set(design.cells.map((c) => c.id));
  for (let n = 1; ; n++) {
    const id = `${base}-copy${n > 1 ? `-${n}` : ''}`;
    if (!used.has(id)) return id;
  }
}

/** Copies a cell definition so it can be edited without changing mats that use the original. */
export const copyCell: Command<{ readonly cellId: string }> = {
  id: 'cell.copy',
  label: 'Copy cell definition',
  run(design: Design, { cellId }): CommandResult {
    const cell = design.cells.find((c) => c.id === cellId);
    if (!cell) return { ok: false, error: `no cell "${cellId}"` };
    if (design.cells.length >= 100)
      return { ok: false, error: 'a design holds at most 100 cell definitions' };
    const copy: CellDefinition = { ...cell, id: freshCellId(design, cell.id), name: `${cell.name} (copy)` };
    return { ok: true, design: { ...design, cells: [...design.cells, copy] } };
  },
};

function replaceCell(design: Design, cellId: string, edit: (cell: CellDefinition) => unknown): CommandResult {
  const index = design.cells.findIndex((c) => c.id === cellId);
  const cell = design.cells[index];
  if (!cell) return { ok: false, error: `no cell "${cellId}"` };
  const parsed = cellDefinitionSchema.safeParse(edit(cell));
  if (!parsed.success) return { ok: false, error: firstIssue(parsed.error) };
  const cells = design.cells.slice();
  cells[index] = parsed.data;
  return { ok: true, design: { ...design, cells } };
}

/** Sets a numeric value of a cell definition; every mat using the cell follows. */
export const setCellValue: Command<{
  readonly cellId: string;
  readonly field: CellNumericField;
  readonly value: number;
}> = {
  id: 'cell.setValue',
  label: 'Set cell value',
  run(design: Design, { cellId, field, value }): CommandResult {
    const cell = design.cells.find((c) => c.id === cellId);
    if (cell && cell[field] === value) return { ok: true, design };
    return replaceCell(design, cellId, (c) => ({ ...c, [field]: value }));
  },
};

/** Sets a read-path value of a gain cell. */
export const setGainReadValue: Command<{
  readonly cellId: string;
  readonly field: GainReadField;
  readonly value: number;
}> = {
  id: 'cell.setGainReadValue',
  label: 'Set gain-cell read value',
  run(design: Design, { cellId, field, value }): CommandResult {
    const cell = design.cells.find((c) => c.id === cellId);
    if (cell && !cell.gainRead) return { ok: false, error: `cell "${cellId}" is not a gain cell` };
    if (cell?.gainRead?.[field] === value) return { ok: true, design };
    return replaceCell(design, cellId, (c) => ({
      ...c,
      gainRead: c.gainRead ? { ...c.gainRead, [field]: value } : null,
    }));
  },
};

/** Renames a cell definition. */
export const renameCell: Command<{ readonly cellId: string; readonly name: string }> = {
  id: 'cell.rename',
  label: 'Rename cell',
  run(design: Design, { cellId, name }): CommandResult {
    const cell = design.cells.find((c) => c.id === cellId);
    if (cell && cell.name === name) return { ok: true, design };
    return replaceCell(design, cellId, (c) => ({ ...c, name: name.trim() }));
  },
};

/** Sets drawn pitches (m) that replace the F-based ones, or clears them with null. */
export const setCellPitchOverride: Command<{
  readonly cellId: string;
  readonly override: { readonly bitlinePitch: number; readonly wordlinePitch: number } | null;
}> = {
  id: 'cell.setPitchOverride',
  label: 'Set drawn cell pitch',
  run(design: Design, { cellId, override }): CommandResult {
    return replaceCell(design, cellId, (c) => ({ ...c, pitchOverride: override ? { ...override } : null }));
  },
};

export { setMatCell } from './setMatCell';
