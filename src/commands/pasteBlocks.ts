import type { Block } from '../model/block';
import type { CellDefinition } from '../model/cell';
import { MAX_BLOCKS, type Design } from '../model/design';
import { idAllocator, nameAllocator } from './blockIds';
import type { Command, CommandResult } from './command';
import { shiftedCopies } from './duplicateBlocks';
import { checkBlocks } from './validateBlocks';
import { formatWholeNumber } from '../model/units';

export interface PasteBlocksArgs {
  /** Blocks from the clipboard, already read through io/restore. */
  readonly blocks: readonly Block[];
  /** The cells those blocks use; any the design lacks are added. */
  readonly cells: readonly CellDefinition[];
  /** Shift applied to the pasted blocks (m). */
  readonly dx: number;
  readonly dy: number;
}

/**
 * Pastes copied blocks. Ids that clash get a suffix, and so do names (" (2)"); a cell the design already has (same id) is used as
 * it is, and a cell it lacks comes along with the blocks.
 */
export const pasteBlocks: Command<PasteBlocksArgs> = {
  id: 'block.paste',
  label: 'Paste',
  run(design: Design, args: PasteBlocksArgs): CommandResult {
    if (args.blocks.length === 0) return { ok: false, error: 'the clipboard holds no blocks' };
    if (!Number.isFinite(args.dx) || !Number.isFinite(args.dy)) {
      return { ok: false, error: 'paste needs a finite offset' };
    }
    if (design.blocks.length + args.blocks.length > MAX_BLOCKS) {
      return { ok: false, error: `a design holds at most ${formatWholeNumber(MAX_BLOCKS)} blocks` };
    }
    const known = new Set(design.cells.map((c) => c.id));
    const newCells: CellDefinition[] = [];
    for (const block of args.blocks) {
      if (block.type !== 'mat' || known.has(block.cellId)) continue;
      const cell = args.cells.find((c) => c.id === block.cellId);
      if (!cell) return { ok: false, error: `${block.id}: the clipboard lacks cell "${block.cellId}"` };
      newCells.push(cell);
      known.add(cell.id);
    }
    const withCells = newCells.length > 0 ? { ...design, cells: [...design.cells, ...newCells] } : design;
    const copies = shiftedCopies(args.blocks, idAllocator(design), nameAllocator(design), args.dx, args.dy);
    const error = checkBlocks(withCells, copies);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...withCells, blocks: [...design.blocks, ...copies] } };
  },
};
