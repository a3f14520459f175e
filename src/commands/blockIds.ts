import type { Block } from '../model/block';
import type { Design } from '../model/design';

/**
 * Fresh block ids for commands that add blocks. Ids are chosen deterministically from what the document
 * already holds, so running a command twice on the same document gives the same result (undo and redo
 * stay exact) and tests can name the new blocks.
 */
export function idAllocator(design: Design): (base: string) => string {
  const taken = new Set(design.blocks.map((b) => b.id));
  return (base: string) => {
    const stem = base.slice(0, 70) || 'block';
    let id = stem;
    for (let n = 2; taken.has(id); n++) id = `${stem}-${n}`;
    taken.add(id);
    return id;
  };
}

/** The next free "prefix-N" id and its number (N from 1), for newly drawn blocks. */
export function nextNumberedId(design: Design, prefix: string): { id: string; number: number } {
  const taken = new Set(design.blocks.map((b) => b.id));
  let n = 1;
  while (taken.has(`${prefix}-${n}`)) n++;
  return { id: `${prefix}-${n}`, number: n };
}

/** Ids of blocks in `after` that `before` did not have, in document order: what a command added. */
export function addedBlockIds(before: Design, after: Design): string[] {
  if (before === after) return [];
  const old = new Set(before.blocks.map((b) => b.id));
  return after.blocks.filter((b: Block) => !old.has(b.id)).map((b) => b.id);
}
