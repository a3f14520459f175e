import { blockRect } from '../geometry/placedBlocks';
import { boundingBox, type Rect } from '../geometry/rect';
import type { Design } from '../model/design';
import type { Viewport } from '../store/appStore';
import { RULER_SIZE } from './paint/scene';
import { fitViewport } from './viewportMath';

/** Room kept around framed blocks (px), beyond the rulers. */
const FRAME_MARGIN_PX = 36;

/**
 * What an empty floorplan shows (m): about 120 µm × 80 µm, so that a drag across a fifth of the canvas
 * draws a mat of a few hundred cells per line (a folded 8F² cell at F = 18 nm steps 72 nm per cell),
 * not thousands.
 */
export const EMPTY_FLOORPLAN_BOX = { x: 0, y: 0, width: 120e-6, height: 80e-6 };

/** The viewport showing the whole floorplan, or the empty sheet's default box when there is nothing. */
export function frameEverything(design: Design, width: number, height: number): Viewport {
  const box = boundingBox(design.blocks.map((b) => blockRect(design, b))) ?? EMPTY_FLOORPLAN_BOX;
  return frameBox(box, width, height);
}

/**
 * The viewport showing the named blocks with some of their surroundings (a third of their size on each
 * side), or null when none of them exists.
 */
export function frameBlocks(
  design: Design,
  ids: readonly string[],
  width: number,
  height: number,
): Viewport | null {
  const wanted = new Set(ids);
  const box = boundingBox(design.blocks.filter((b) => wanted.has(b.id)).map((b) => blockRect(design, b)));
  if (!box) return null;
  const grow = Math.max(box.width, box.height) / 3;
  return frameBox(
    { x: box.x - grow, y: box.y - grow, width: box.width + 2 * grow, height: box.height + 2 * grow },
    width,
    height,
  );
}

/** Fits a box into the part of the canvas the rulers leave free. */
function frameBox(box: Rect | null, width: number, height: number): Viewport {
  const v = fitViewport(box, width - RULER_SIZE, height - RULER_SIZE, FRAME_MARGIN_PX);
  return { ...v, offsetX: v.offsetX + RULER_SIZE, offsetY: v.offsetY + RULER_SIZE };
}
