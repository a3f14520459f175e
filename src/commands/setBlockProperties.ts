import type { BitlineAxis, Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';

/** Values typed into the properties panel; each applies to every selected block it fits. Lengths in metres. */
export interface BlockPropertiesPatch {
  readonly name?: string;
  readonly x?: number;
  readonly y?: number;
  /** Strips only. */
  readonly width?: number;
  readonly height?: number;
  /** Mats only. */
  readonly cellId?: string;
  readonly bitlineAxis?: BitlineAxis;
  readonly mirrored?: boolean;
}

export interface SetBlockPropertiesArgs {
  readonly ids: readonly string[];
  readonly patch: BlockPropertiesPatch;
}

function applyPatch(block: Block, patch: BlockPropertiesPatch): Block {
  const common = {
    name: patch.name ?? block.name,
    x: patch.x ?? block.x,
    y: patch.y ?? block.y,
  };
  if (block.type === 'mat') {
    const next = {
      ...block,
      ...common,
      cellId: patch.cellId ?? block.cellId,
      bitlineAxis: patch.bitlineAxis ?? block.bitlineAxis,
      mirrored: patch.mirrored ?? block.mirrored,
    };
    if (next.mirrored === undefined) delete next.mirrored;
    const same =
      next.name === block.name &&
      next.x === block.x &&
      next.y === block.y &&
      next.cellId === block.cellId &&
      next.bitlineAxis === block.bitlineAxis &&
      next.mirrored === block.mirrored;
    return same ? block : next;
  }
  const next = {
    ...block,
    ...common,
    width: patch.width ?? block.width,
    height: patch.height ?? block.height,
  };
  const same =
    next.name === block.name &&
    next.x === block.x &&
    next.y === block.y &&
    next.width === block.width &&
    next.height === block.height;
  return same ? block : next;
}

/**
 * Sets the properties typed in the panel on one or many blocks at once (one undo step). A value only
 * reaches the blocks it belongs to: width and height go to strips, cell and bit-line direction to mats.
 */
export const setBlockProperties: Command<SetBlockPropertiesArgs> = {
  id: 'block.setProperties',
  label: 'Set properties',
  run(design: Design, args: SetBlockPropertiesArgs): CommandResult {
    const p = args.patch;
    for (const [key, value] of Object.entries({ x: p.x, y: p.y, width: p.width, height: p.height })) {
      if (value !== undefined && !Number.isFinite(value))
        return { ok: false, error: `${key} must be a finite length` };
    }
    const targets = new Set(args.ids);
    const changed: Block[] = [];
    let found = 0;
    const blocks = design.blocks.map((block) => {
      if (!targets.has(block.id)) return block;
      found++;
      const next = applyPatch(block, p);
      if (next !== block) changed.push(next);
      return next;
    });
    if (found === 0) return { ok: false, error: 'nothing selected' };
    if (changed.length === 0) return { ok: true, design };
    const error = checkBlocks(design, changed);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks } };
  },
};
