import { BLOCK_TYPE_LABEL, type Block } from '../../model/block';
import type { Design } from '../../model/design';
import { formatWholeNumber } from '../../model/units';

/** A block as a person names it: its type and its name (or id when it has none). */
export function blockTitle(block: Block): string {
  return `${BLOCK_TYPE_LABEL[block.type]} ${block.name || block.id}`;
}

/** How many selected blocks are named one by one before the rest are counted. */
const NAMED = 3;

/** What the screen reader hears when the selection changes. */
export function selectionText(design: Design, ids: readonly string[]): string {
  if (ids.length === 0) return 'Nothing selected.';
  const byId = new Map(design.blocks.map((b) => [b.id, b]));
  const blocks = ids.map((id) => byId.get(id)).filter((b): b is Block => b !== undefined);
  const named = blocks.slice(0, NAMED).map(blockTitle);
  const rest = blocks.length - named.length;
  const list = rest > 0 ? `${named.join(', ')} and ${formatWholeNumber(rest)} more` : named.join(', ');
  if (blocks.length === 1) {
    const b = blocks[0];
    const counts =
      b?.type === 'mat'
        ? `, ${b.cellsPerBitline} cells per bit line × ${b.cellsPerWordline} per word line`
        : '';
    return `Selected ${list}${counts}.`;
  }
  return `${formatWholeNumber(blocks.length)} blocks selected: ${list}.`;
}
