import { blockSchema, type Block } from '../model/block';
import type { Design } from '../model/design';

/**
 * Checks blocks a command is about to write against the model schema (finite coordinates on the die,
 * positive sizes, whole cell counts) and that every mat's cell exists. Returns the first problem, naming
 * the block, or null when all are fine.
 */
export function checkBlocks(design: Design, blocks: Iterable<Block>): string | null {
  const cellIds = new Set(design.cells.map((c) => c.id));
  for (const block of blocks) {
    const parsed = blockSchema.safeParse(block);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      return `${block.id}: ${issue?.message ?? 'invalid block'}`;
    }
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
