import { BLOCK_TYPES } from '../model/block';

/** The tools of the palette, in palette order; each one's number key is its place (1 = Select). */
export const TOOLS = ['select', 'pan', ...BLOCK_TYPES] as const;
export type Tool = (typeof TOOLS)[number];

/** What each tool does, for its button's tooltip and the shortcut help. */
export const TOOL_DESCRIPTIONS: Readonly<Record<Tool, string>> = {
  select: 'Select, move and resize',
  pan: 'Pan the view',
  mat: 'Draw a mat (drag: cell counts in 64s; Shift: powers of two; Alt: any count)',
  senseAmpStrip: 'Place a sense-amplifier strip (fits a bit-line edge)',
  wordlineDriverStrip: 'Place a sub-word-line driver strip (fits a word-line edge)',
  rowDecoder: 'Place a row decoder (fits the left or right side of a stack of mats and strips)',
  columnDecoder: 'Place a column decoder (fits the top or bottom of a stack of mats and strips)',
  spacer: 'Place a spacer',
};

/** Number key of each tool: its place in the palette. */
export function toolKey(tool: Tool): string {
  return String(TOOLS.indexOf(tool) + 1);
}
