import { MAX_CELLS_PER_LINE, type Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { formatWholeNumber } from '../model/units';

export interface SetMatCellCountsArgs {
  readonly matIds: readonly string[];
  readonly cellsPerBitline?: number;
  readonly cellsPerWordline?: number;
}

function checkCount(label: string, value: number | undefined): string | null {
  if (value === undefined) return null;
  if (!Number.isInteger(value) || value < 1 || value > MAX_CELLS_PER_LINE) {
    return `${label} must be a whole number from 1 to ${formatWholeNumber(MAX_CELLS_PER_LINE)}`;
  }
  return null;
}

/** Sets cells per bit line and/or per word line on one or more mats; the mats resize around their corner. */
export const setMatCellCounts: Command<SetMatCellCountsArgs> = {
  id: 'mat.setCellCounts',
  label: 'Set cells per line',
  run(design: Design, args: SetMatCellCountsArgs): CommandResult {
    const error =
      checkCount('cells per bit line', args.cellsPerBitline) ??
      checkCount('cells per word line', args.cellsPerWordline);
    if (error) return { ok: false, error };
    const targets = new Set(args.matIds);
    let changed = false;
    const blocks = design.blocks.map((block): Block => {
      if (block.type !== 'mat' || !targets.has(block.id)) return block;
      const cellsPerBitline = args.cellsPerBitline ?? block.cellsPerBitline;
      const cellsPerWordline = args.cellsPerWordline ?? block.cellsPerWordline;
      if (cellsPerBitline === block.cellsPerBitline && cellsPerWordline === block.cellsPerWordline)
        return block;
      changed = true;
      return { ...block, cellsPerBitline, cellsPerWordline };
    });
    if (!changed) {
      return targets.size === 0 || !design.blocks.some((b) => b.type === 'mat' && targets.has(b.id))
        ? { ok: false, error: 'no mat selected' }
        : { ok: true, design };
    }
    return { ok: true, design: { ...design, blocks } };
  },
};
