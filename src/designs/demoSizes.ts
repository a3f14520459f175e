import { FOLDED_8F2_CELL } from '../model/builtins';
import type { StripSizes } from './partitionPlan';

/**
 * Strip and decoder sizes of the invented demo (m), written once: the demo, the generated grids, the
 * explorer's default bank and the editor's default strip thickness all read them.
 */
export const DEMO_STRIPS: StripSizes = {
  senseAmpStripHeight: 6e-6,
  wordlineDriverStripWidth: 3e-6,
  rowDecoderWidth: 18e-6,
  columnDecoderHeight: 14e-6,
};

/** The demo's mat: folded 8F² cells, 512 per bit line and 512 per word line. */
export const DEMO_MAT = { cell: FOLDED_8F2_CELL, cellsPerBitline: 512, cellsPerWordline: 512 } as const;
