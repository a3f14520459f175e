import { z } from 'zod';
import { BITLINE_AXES, MAX_CELLS_PER_LINE, MAX_COORDINATE, STRIP_TYPES } from './blockBasics';
import { finite, positive, wholeCount } from './schemaParts';

/**
 * The schema of blocks placed on the floorplan (block.ts holds what code that only computes needs). Positions are the top-left corner in metres, y growing downwards
 * (the way a canvas and a layout viewer both draw). A mat's size follows from its cell and cell counts;
 * every other block carries its own width and height.
 */

const coordinate = (label: string) => finite(label, -MAX_COORDINATE, MAX_COORDINATE);
// At least 10 nm: far below any strip, and far above the 1 nm abutment tolerance the checks rely on.
const extent = (label: string) => positive(label, 1e-8, MAX_COORDINATE);

const blockBase = {
  id: z.string().min(1).max(80),
  name: z.string().max(120).default(''),
  x: coordinate('x'),
  y: coordinate('y'),
};

export const matSchema = z.object({
  ...blockBase,
  type: z.literal('mat'),
  cellId: z.string().min(1).max(80),
  /** Cells connected to one bit line. */
  cellsPerBitline: wholeCount('cells per bit line', 1, MAX_CELLS_PER_LINE),
  /** Cells connected to one word line. */
  cellsPerWordline: wholeCount('cells per word line', 1, MAX_CELLS_PER_LINE),
  bitlineAxis: z.enum(BITLINE_AXES),
  /**
   * Handedness: true when the mat is a mirror image of its unmirrored layout (after any number of
   * mirrorings, an odd count). The physics does not depend on it; the canvas shows it. Absent means false,
   * so files written before the field existed load unchanged.
   */
  mirrored: z.boolean().optional(),
  /**
   * The slot the mat keeps in a grid when its cell array is a little smaller than the slot (its cell was
   * changed while the mats beside it kept theirs): width and height along the canvas axes (m). The array
   * sits in the slot's top-left corner and the rest, less than one cell along each axis, is an edge band
   * with no usable cells (common practice: dummy cells, no source). A value outside [array, array + one
   * cell) along an axis is ignored there (geometry/matGeometry.ts), so changing the counts later never
   * leaves a stale slot behind. Absent means the array's own size.
   */
  footprint: z.object({ width: extent('footprint width'), height: extent('footprint height') }).optional(),
});

export const stripSchema = z.object({
  ...blockBase,
  type: z.enum(STRIP_TYPES),
  width: extent('width'),
  height: extent('height'),
});

export const blockSchema = z.discriminatedUnion('type', [matSchema, stripSchema]);

export type Mat = z.infer<typeof matSchema>;
export type Strip = z.infer<typeof stripSchema>;
export type Block = z.infer<typeof blockSchema>;
export type BlockType = Block['type'];
