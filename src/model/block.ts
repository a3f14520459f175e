import type { Block, Mat } from './blockSchema';

/**
 * Blocks placed on the floorplan: their types and plain facts, without the validation library. The
 * schema that checks a stored or edited block is in blockSchema.ts, loaded with restore and the edit check.
 */

export {
  BITLINE_AXES,
  BLOCK_TYPES,
  BLOCK_TYPE_LABEL,
  MAX_CELLS_PER_LINE,
  STRIP_TYPES,
  type BitlineAxis,
  type StripType,
} from './blockBasics';
export type { Block, BlockType, Mat, Strip } from './blockSchema';

export function isMat(block: Block): block is Mat {
  return block.type === 'mat';
}
