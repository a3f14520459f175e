import { MAX_BLOCKS, type Design } from '../model/design';
import type { Block } from '../model/block';
import { idAllocator, nameAllocator } from './blockIds';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';
import { formatWholeNumber } from '../model/units';

export interface DuplicateBlocksArgs {
  readonly ids: readonly string[];
  /** Where the copies go relative to the originals (m). */
  readonly dx: number;
  readonly dy: number;
}

/** What a copy adds to its original's id and name, e.g. "-2-3" and " (2,3)" for step and repeat. */
export interface CopyTag {
  readonly id: string;
  readonly name: string;
}

/** Copies of blocks shifted by (dx, dy), with fresh ids from `allocate` and unique names from `rename`. */
export function shiftedCopies(
  originals: readonly Block[],
  allocate: (base: string) => string,
  rename: (name: string) => string,
  dx: number,
  dy: number,
  tag: CopyTag = { id: '', name: '' },
): Block[] {
  return originals.map((b) => ({
    ...b,
    id: allocate(`${b.id}${tag.id}`),
    name: b.name ? rename(`${b.name}${tag.name}`.slice(0, 120)) : b.name,
    x: b.x + dx,
    y: b.y + dy,
  }));
}

/** Duplicates the blocks; the canvas puts the copies right beside the originals, abutting them. */
export const duplicateBlocks: Command<DuplicateBlocksArgs> = {
  id: 'block.duplicate',
  label: 'Duplicate',
  run(design: Design, args: DuplicateBlocksArgs): CommandResult {
    if (!Number.isFinite(args.dx) || !Number.isFinite(args.dy)) {
      return { ok: false, error: 'duplicate needs a finite offset' };
    }
    const targets = new Set(args.ids);
    const originals = design.blocks.filter((b) => targets.has(b.id));
    if (originals.length === 0) return { ok: false, error: 'nothing selected to duplicate' };
    if (design.blocks.length + originals.length > MAX_BLOCKS) {
      return { ok: false, error: `a design holds at most ${formatWholeNumber(MAX_BLOCKS)} blocks` };
    }
    const copies = shiftedCopies(originals, idAllocator(design), nameAllocator(design), args.dx, args.dy);
    const error = checkBlocks(design, copies);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks: [...design.blocks, ...copies] } };
  },
};
