import { blockRect } from '../geometry/placedBlocks';
import { groupCentre, mirrorRect, type MirrorAxis } from '../geometry/transform';
import type { Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';

export interface MirrorBlocksArgs {
  readonly ids: readonly string[];
  /** leftRight flips about a vertical line, topBottom about a horizontal one. */
  readonly axis: MirrorAxis;
}

/**
 * Mirrors the blocks about the centre line of their bounding box: positions reflect, and each mat's
 * handedness flips (its `mirrored` flag), which is all a mirror changes inside a mat.
 */
export const mirrorBlocks: Command<MirrorBlocksArgs> = {
  id: 'block.mirror',
  label: 'Mirror',
  run(design: Design, args: MirrorBlocksArgs): CommandResult {
    if (args.axis !== 'leftRight' && args.axis !== 'topBottom') {
      return { ok: false, error: 'mirror axis must be leftRight or topBottom' };
    }
    const targets = new Set(args.ids);
    const chosen = design.blocks.filter((b) => targets.has(b.id));
    const centre = groupCentre(chosen.map((b) => blockRect(design, b)));
    if (!centre) return { ok: false, error: 'nothing selected to mirror' };
    const flipped: Block[] = [];
    const blocks = design.blocks.map((b): Block => {
      if (!targets.has(b.id)) return b;
      const r = mirrorRect(blockRect(design, b), args.axis, centre.x, centre.y);
      const next: Block =
        b.type === 'mat'
          ? { ...b, x: r.x, y: r.y, mirrored: !(b.mirrored ?? false) }
          : { ...b, x: r.x, y: r.y };
      flipped.push(next);
      return next;
    });
    const error = checkBlocks(design, flipped);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks } };
  },
};
