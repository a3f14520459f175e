import type { Block } from '../model/block';
import type { Design } from '../model/design';
import type { Command, CommandResult } from './command';
import { checkBlocks } from './validateBlocks';

/** New geometry for one block; fields left out keep their value. Lengths in metres. */
export interface BlockShapeChange {
  readonly id: string;
  readonly x?: number;
  readonly y?: number;
  /** Strips only: a mat's size follows from its cells. */
  readonly width?: number;
  readonly height?: number;
  /** Mats only. */
  readonly cellsPerBitline?: number;
  readonly cellsPerWordline?: number;
}

export interface ReshapeBlocksArgs {
  readonly changes: readonly BlockShapeChange[];
}

function reshape(block: Block, change: BlockShapeChange): Block | string {
  const x = change.x ?? block.x;
  const y = change.y ?? block.y;
  if (block.type === 'mat') {
    if (change.width !== undefined || change.height !== undefined) {
      return `${block.id}: a mat is sized by its cell counts, not by width and height`;
    }
    const cellsPerBitline = change.cellsPerBitline ?? block.cellsPerBitline;
    const cellsPerWordline = change.cellsPerWordline ?? block.cellsPerWordline;
    if (
      x === block.x &&
      y === block.y &&
      cellsPerBitline === block.cellsPerBitline &&
      cellsPerWordline === block.cellsPerWordline
    )
      return block;
    return { ...block, x, y, cellsPerBitline, cellsPerWordline };
  }
  if (change.cellsPerBitline !== undefined || change.cellsPerWordline !== undefined) {
    return `${block.id}: only mats have cell counts`;
  }
  const width = change.width ?? block.width;
  const height = change.height ?? block.height;
  if (x === block.x && y === block.y && width === block.width && height === block.height) return block;
  return { ...block, x, y, width, height };
}

/**
 * Gives blocks new positions and sizes in one step: a resize by a handle (a mat in whole cells, a strip
 * freely) or a strip that fitted itself to the mat edge it was dropped on.
 */
export const reshapeBlocks: Command<ReshapeBlocksArgs> = {
  id: 'block.reshape',
  label: 'Resize',
  run(design: Design, args: ReshapeBlocksArgs): CommandResult {
    const changes = new Map(args.changes.map((c) => [c.id, c]));
    const changed: Block[] = [];
    let found = 0;
    let problem: string | null = null;
    const blocks = design.blocks.map((block) => {
      const change = changes.get(block.id);
      if (!change || problem) return block;
      found++;
      const next = reshape(block, change);
      if (typeof next === 'string') {
        problem = next;
        return block;
      }
      if (next !== block) changed.push(next);
      return next;
    });
    if (problem) return { ok: false, error: problem };
    if (found === 0) return { ok: false, error: 'no such block to resize' };
    if (changed.length === 0) return { ok: true, design };
    const error = checkBlocks(design, changed);
    if (error) return { ok: false, error };
    return { ok: true, design: { ...design, blocks } };
  },
};
