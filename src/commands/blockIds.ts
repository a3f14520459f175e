import type { Block, BlockType } from '../model/block';
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

/**
 * Fresh display names for copied blocks: a name the design (or an earlier copy) already uses gets the
 * first free " (n)" from 2 on, after any such suffix it had ("Mat 1.1" → "Mat 1.1 (2)", "Mat 1.1 (2)" →
 * "Mat 1.1 (3)"), so every message that names a block points at one block. Empty names stay empty.
 */
export function nameAllocator(design: Design): (name: string) => string {
  const taken = new Set<string>();
  for (const b of design.blocks) if (b.name) taken.add(b.name);
  return (name: string) => {
    if (!name) return name;
    let fresh = name.slice(0, 120);
    if (taken.has(fresh)) {
      const stem = name.replace(/ \(\d+\)$/, '').slice(0, 110);
      for (let n = 2; taken.has(fresh); n++) fresh = `${stem} (${n})`;
    }
    taken.add(fresh);
    return fresh;
  };
}

/** How a new block of each type is called: its id prefix and its name, numbered alike ("sa-3", "SA 3"). */
const NEW_BLOCK_NAMING: Readonly<Record<BlockType, { readonly prefix: string; readonly name: string }>> = {
  mat: { prefix: 'mat', name: 'Mat' },
  senseAmpStrip: { prefix: 'sa', name: 'SA' },
  wordlineDriverStrip: { prefix: 'swd', name: 'SWD' },
  rowDecoder: { prefix: 'rowdec', name: 'Row decoder' },
  columnDecoder: { prefix: 'coldec', name: 'Column decoder' },
  spacer: { prefix: 'spacer', name: 'Spacer' },
};

/**
 * The id and name of a block of `type` drawn, placed or typed in now: the first free number N from 1 for
 * the type's id prefix ("sa-N"), the name with the same number ("SA N").
 */
export function newBlockIdentity(design: Design, type: BlockType): { id: string; name: string } {
  const naming = NEW_BLOCK_NAMING[type];
  const taken = new Set(design.blocks.map((b) => b.id));
  let n = 1;
  while (taken.has(`${naming.prefix}-${n}`)) n++;
  return { id: `${naming.prefix}-${n}`, name: `${naming.name} ${n}` };
}

/** Ids of blocks in `after` that `before` did not have, in document order: what a command added. */
export function addedBlockIds(before: Design, after: Design): string[] {
  if (before === after) return [];
  const old = new Set(before.blocks.map((b) => b.id));
  return after.blocks.filter((b: Block) => !old.has(b.id)).map((b) => b.id);
}
