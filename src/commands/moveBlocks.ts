import type { Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';

export interface MoveBlocksArgs {
  readonly ids: readonly string[];
  /** Displacement (m), x to the right and y downwards. */
  readonly dx: number;
  readonly dy: number;
}

/** Moves blocks by a displacement: a drag on the canvas or an arrow-key nudge. */
export const moveBlocks: Command<MoveBlocksArgs> = {
  id: 'block.move',
  label: 'Move',
  run(design: Design, args: MoveBlocksArgs): CommandResult {
    if (!Number.isFinite(args.dx) || !Number.isFinite(args.dy)) {
      return { ok: false, error: 'a move needs a finite displacement' };
    }
    const targets = new Set(args.ids);
    const moved: Block[] = [];
    const blocks = design.blocks.map((b) => {
      if (!targets.has(b.id)) return b;
      const next = { ...b, x: b.x + args.dx, y: b.y + args.dy };
      moved.push(next);
      return next;
    });
    if (moved.length === 0) return { ok: false, error: 'nothing selected to move' };
    if (args.dx === 0 && args.dy === 0) return { ok: true, design };
    const error = checkBlocks(design, moved);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks } };
  },
};
