import type { BlockType } from '../model/block';

/** Matloom's own block palette: fill and outline per block type. */
export const BLOCK_STYLE: Record<
  BlockType,
  { fill: string; selectedFill: string; stroke: string; text: string }
> = {
  mat: { fill: '#cfe7df', selectedFill: '#b4d3f2', stroke: '#2f6f5e', text: '#173b32' },
  senseAmpStrip: { fill: '#f4d9a6', selectedFill: '#e9c98a', stroke: '#a8742a', text: '#5a3c10' },
  wordlineDriverStrip: { fill: '#ddd0ee', selectedFill: '#c9b5e6', stroke: '#6d4f99', text: '#392653' },
  rowDecoder: { fill: '#d5dbe3', selectedFill: '#bcc8d8', stroke: '#4f5d70', text: '#27303c' },
  columnDecoder: { fill: '#d5dbe3', selectedFill: '#bcc8d8', stroke: '#4f5d70', text: '#27303c' },
  spacer: { fill: '#ebe8e1', selectedFill: '#d9d4c8', stroke: '#9a9284', text: '#4c463b' },
};

/** Short tags drawn on blocks that are large enough on screen. */
export const BLOCK_TAG: Record<BlockType, string> = {
  mat: 'mat',
  senseAmpStrip: 'SA',
  wordlineDriverStrip: 'SWD',
  rowDecoder: 'row dec',
  columnDecoder: 'col dec',
  spacer: 'spacer',
};

export const SELECTION_STROKE = '#1d5fd1';
export const ERROR_STROKE = '#c62828';
export const WARNING_STROKE = '#c98500';
export const GUIDE_STROKE = '#d0368a';
export const CANVAS_BACKGROUND = '#f7f6f2';
/** Bit lines and word lines at high zoom. */
export const BITLINE_STROKE = '#2f6f5e';
export const WORDLINE_STROKE = '#7a55b0';
export const STORAGE_NODE_FILL = '#1f4f43';
