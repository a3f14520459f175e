/**
 * Where the parts of a PNG export go, in CSS px: the floorplan on the left, a side panel on its right for
 * the legend and the scale bar (so neither ever covers a block), the title block below both. Pure, so
 * the layout is tested in Node.
 */

/** Width of the side panel holding the legend and the scale bar (px). */
export const SIDE_PANEL_WIDTH = 250;

/** Longest a scale bar may be (px); it takes the longest round length that fits. */
const SCALE_BAR_MAX_PX = 160;

export interface ImageLayout {
  /** The floorplan's area: x from 0 to `floorplanWidth`. */
  readonly floorplanWidth: number;
  /** The side panel starts here and is {@link SIDE_PANEL_WIDTH} wide. */
  readonly panelX: number;
  readonly width: number;
}

export function imageLayout(floorplanWidth: number): ImageLayout {
  return { floorplanWidth, panelX: floorplanWidth, width: floorplanWidth + SIDE_PANEL_WIDTH };
}

/**
 * The scale bar for `pixelsPerMetre`: the longest length of 1, 2 or 5 times a power of ten (m) whose bar
 * fits in {@link SCALE_BAR_MAX_PX}, and its length in px.
 */
export function scaleBar(pixelsPerMetre: number): { readonly length: number; readonly pixels: number } {
  const most = SCALE_BAR_MAX_PX / pixelsPerMetre;
  const decade = 10 ** Math.floor(Math.log10(most));
  const step = [5, 2, 1].find((s) => s * decade <= most) ?? 1;
  const length = step * decade;
  return { length, pixels: length * pixelsPerMetre };
}

/** Export scales from which strips and decoders carry their names (at 1× the text would be a smudge). */
export const NAMED_STRIPS_FROM_SCALE = 2;
