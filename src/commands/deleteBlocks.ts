import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';

export interface DeleteBlocksArgs {
  readonly ids: readonly string[];
}

/** Deletes the named blocks. */
export const deleteBlocks: Command<DeleteBlocksArgs> = {
  id: 'block.delete',
  label: 'Delete',
  run(design: Design, args: DeleteBlocksArgs): CommandResult {
    const doomed = new Set(args.ids);
    const blocks = design.blocks.filter((b) => !doomed.has(b.id));
    if (blocks.length === design.blocks.length) return { ok: false, error: 'nothing selected to delete' };
    return { ok: true, design: { ...design, blocks } };
  },
};
