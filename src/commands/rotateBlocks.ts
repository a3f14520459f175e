import { blockRect } from '../geometry/placedBlocks';
import { groupCentre, rotateQuarterClockwise } from '../geometry/transform';
import type { Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';

export interface RotateBlocksArgs {
  readonly ids: readonly string[];
}

/**
 * Turns the blocks a quarter clockwise about the centre of their bounding box (one block turns about its
 * own centre). A mat's bit lines change direction; a strip swaps width and height.
 */
export const rotateBlocks: Command<RotateBlocksArgs> = {
  id: 'block.rotate',
  label: 'Rotate 90°',
  run(design: Design, args: RotateBlocksArgs): CommandResult {
    const targets = new Set(args.ids);
    const chosen = design.blocks.filter((b) => targets.has(b.id));
    const centre = groupCentre(chosen.map((b) => blockRect(design, b)));
    if (!centre) return { ok: false, error: 'nothing selected to rotate' };
    const turned: Block[] = [];
    const blocks = design.blocks.map((b): Block => {
      if (!targets.has(b.id)) return b;
      const r = rotateQuarterClockwise(blockRect(design, b), centre.x, centre.y);
      const next: Block =
        b.type === 'mat'
          ? { ...b, x: r.x, y: r.y, bitlineAxis: b.bitlineAxis === 'vertical' ? 'horizontal' : 'vertical' }
          : { ...b, x: r.x, y: r.y, width: r.width, height: r.height };
      turned.push(next);
      return next;
    });
    const error = checkBlocks(design, turned);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks } };
  },
};
