import type { BlockType } from './block';

// The plain facts about blocks, apart from their schema (block.ts), so that code which only computes
// (the engine and the sweep worker) does not load the validation library.

/** A position or size on the floorplan (m); a die is at most a few centimetres across. */
export const MAX_COORDINATE = 0.1;

/** Cells on one bit line or one word line; large enough for any real mat, small enough to stay sane. */
export const MAX_CELLS_PER_LINE = 16384;

/** Which way the bit lines run across the canvas. */
export const BITLINE_AXES = ['vertical', 'horizontal'] as const;
export type BitlineAxis = (typeof BITLINE_AXES)[number];

/** Strips and other rectangular blocks. A spacer serves nothing: it only takes area (a gap kept on purpose). */
export const STRIP_TYPES = [
  'senseAmpStrip',
  'wordlineDriverStrip',
  'rowDecoder',
  'columnDecoder',
  'spacer',
] as const;
export type StripType = (typeof STRIP_TYPES)[number];

/** Every block type: the mat, then the strips. */
export const BLOCK_TYPES = ['mat', ...STRIP_TYPES] as const;

/** Human names of block types, for panels, checks and exports. */
export const BLOCK_TYPE_LABEL: Record<BlockType, string> = {
  mat: 'mat',
  senseAmpStrip: 'sense-amplifier strip',
  wordlineDriverStrip: 'sub-word-line driver strip',
  rowDecoder: 'row decoder',
  columnDecoder: 'column decoder',
  spacer: 'spacer',
};
