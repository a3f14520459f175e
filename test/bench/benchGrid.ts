import { DEMO_STRIPS } from '../../src/designs/demoSizes';

/**
 * The benches' tiled floorplan: side × side demo mats (512 cells per word line) with the demo's strips
 * and decoders, without its cell and feature size so that the baseline bench can pair it with the old
 * code's built-ins. `npm run bench`'s evaluate lines (warm, cold, baseline) all read it.
 */
export function benchGridSpec(side: number, cellsPerBitline = 512) {
  return { matRows: side, matColumns: side, cellsPerBitline, cellsPerWordline: 512, ...DEMO_STRIPS };
}
