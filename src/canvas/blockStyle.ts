import type { BlockType } from '../model/block';

/**
 * Matloom's own block palette: fill and outline per block type. The fills are tints of the Okabe–Ito
 * colours (M. Okabe and K. Ito, "Color Universal Design (CUD): how to make figures and presentations that
 * are friendly to colorblind people", 2002): bluish green for mats, orange for sense-amplifier strips,
 * reddish purple for driver strips, sky blue for decoders, grey for spacers. They were chosen so that
 * every two types stay apart under simulated protanopia, deuteranopia and tritanopia;
 * test/canvas/colourVision.test.ts computes the differences.
 */
export const BLOCK_STYLE: Record<
  BlockType,
  { fill: string; selectedFill: string; stroke: string; text: string }
> = {
  mat: { fill: '#95c2ad', selectedFill: '#86b2b6', stroke: '#2f6f5e', text: '#173b32' },
  senseAmpStrip: { fill: '#f3d6bc', selectedFill: '#dac4c1', stroke: '#a8742a', text: '#5a3c10' },
  wordlineDriverStrip: { fill: '#ddb0c7', selectedFill: '#c6a3c9', stroke: '#6d4f99', text: '#392653' },
  rowDecoder: { fill: '#c3def4', selectedFill: '#afcbed', stroke: '#4f5d70', text: '#27303c' },
  columnDecoder: { fill: '#c3def4', selectedFill: '#afcbed', stroke: '#4f5d70', text: '#27303c' },
  spacer: { fill: '#dedede', selectedFill: '#c7cbdb', stroke: '#8a8276', text: '#4c463b' },
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
