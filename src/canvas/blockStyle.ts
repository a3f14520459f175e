import { BLOCK_TYPE_LABEL, BLOCK_TYPES, type BlockType } from '../model/block';

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

/** One row of the legend: a swatch and its words. */
export interface LegendRow {
  /** Short words beside the swatch. */
  readonly label: string;
  /** Full words, for a tooltip. */
  readonly title: string;
  readonly fill: string;
  readonly stroke: string;
  /** A check marker (drawn with a heavier outline) rather than a block colour. */
  readonly marker: boolean;
}

/** Short legend words where the block type's own name is long. */
const LEGEND_LABEL: Partial<Record<BlockType, string>> = {
  senseAmpStrip: 'SA strip',
  wordlineDriverStrip: 'SWD strip',
  rowDecoder: 'decoder',
  columnDecoder: 'decoder',
};

/**
 * The legend, on screen (Legend.tsx) and in the exported image (floorplanImage.ts): every block colour
 * in block-type order (types that share a colour once), then the two check markers.
 */
export const LEGEND_ROWS: readonly LegendRow[] = [
  ...BLOCK_TYPES.filter(
    (type, i) => BLOCK_TYPES.findIndex((t) => BLOCK_STYLE[t].fill === BLOCK_STYLE[type].fill) === i,
  ).map((type) => ({
    label: LEGEND_LABEL[type] ?? BLOCK_TYPE_LABEL[type],
    title: BLOCK_TYPES.filter((t) => BLOCK_STYLE[t].fill === BLOCK_STYLE[type].fill)
      .map((t) => BLOCK_TYPE_LABEL[t])
      .join(', '),
    fill: BLOCK_STYLE[type].fill,
    stroke: BLOCK_STYLE[type].stroke,
    marker: false,
  })),
  {
    label: 'error',
    title: 'a check that fails',
    fill: 'rgba(198, 40, 40, 0.16)',
    stroke: ERROR_STROKE,
    marker: true,
  },
  {
    label: 'warning',
    title: 'a check that warns',
    fill: 'rgba(201, 133, 0, 0.16)',
    stroke: WARNING_STROKE,
    marker: true,
  },
];
