import type { Design } from './design';

/**
 * The design positions whose blocks `next` replaced with new versions of themselves, when that is all an
 * edit did: the same number of blocks, the same ids in the same order, and the same process, operating
 * point and cells (compared by identity, as commands copy only what they change). Null for any other
 * change, or when more than `limit` blocks changed. One pass of identity comparisons over the blocks.
 */
export function blocksEditedInPlace(previous: Design, next: Design, limit: number): number[] | null {
  if (
    next.blocks.length !== previous.blocks.length ||
    next.process !== previous.process ||
    next.operating !== previous.operating ||
    next.cells !== previous.cells
  )
    return null;
  const changed: number[] = [];
  const a = previous.blocks;
  const b = next.blocks;
  for (let i = 0; i < b.length; i++) {
    if (a[i] === b[i]) continue;
    if (a[i]?.id !== b[i]?.id || changed.length >= limit) return null;
    changed.push(i);
  }
  return changed;
}
