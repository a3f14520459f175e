import type { Block } from '../model/block';
import type { Design } from '../model/design';

/**
 * Checks that every mat a command is about to write uses a cell of the design. Returns the first
 * problem, naming the block, or null when all are fine. The schema's rules (finite coordinates on the
 * die, positive sizes, whole cell counts) are not repeated here: the store holds every command's result
 * to them through the edit check (io/editCheck.ts), which is loaded after the first paint with the
 * schema library.
 */
export function checkBlocks(design: Design, blocks: Iterable<Block>): string | null {
  const cellIds = new Set(design.cells.map((c) => c.id));
  for (const block of blocks) {
    if (block.type === 'mat' && !cellIds.has(block.cellId)) {
      return `${block.id}: the design has no cell "${block.cellId}"`;
    }
  }
  return null;
}

/** The ids that name a block of the design, in the order given. */
export function existingIds(design: Design, ids: readonly string[]): string[] {
  const present = new Set(design.blocks.map((b) => b.id));
  return ids.filter((id) => present.has(id));
}
