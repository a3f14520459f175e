import { MAX_BLOCKS, type Design } from '../model/design';
import type { Block } from '../model/block';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';
import { formatWholeNumber } from '../model/units';

export interface AddBlocksArgs {
  /** Complete blocks with ids the design does not use yet. */
  readonly blocks: readonly Block[];
}

/** Adds drawn or placed blocks (a mat from the draw tool, a strip from a placement tool). */
export const addBlocks: Command<AddBlocksArgs> = {
  id: 'block.add',
  label: 'Add blocks',
  run(design: Design, args: AddBlocksArgs): CommandResult {
    if (args.blocks.length === 0) return { ok: false, error: 'nothing to add' };
    if (design.blocks.length + args.blocks.length > MAX_BLOCKS) {
      return { ok: false, error: `a design holds at most ${formatWholeNumber(MAX_BLOCKS)} blocks` };
    }
    const taken = new Set(design.blocks.map((b) => b.id));
    for (const block of args.blocks) {
      if (taken.has(block.id)) return { ok: false, error: `block id "${block.id}" is already used` };
      taken.add(block.id);
    }
    const error = checkBlocks(design, args.blocks);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks: [...design.blocks, ...args.blocks] } };
  },
};
