import { gridFloorplan } from '../geometry/gridFloorplan';
import { BUILTIN_CELLS, DEFAULT_OPERATING, DEMO_PROCESS, FOLDED_8F2_CELL } from './builtins';
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from './design';

/** Name of the demo design file in public/, served by the app and read by the CLI example. */
export const DEMO_FILE_NAME = 'wren-demo-bank.json';

/**
 * The built-in demo: one 4 × 4-mat section of "Wren", an invented 2 Gb chip on the invented Halden D18
 * process: folded 8F² mats of 512 cells per bit line and 512 per word line, sense-amplifier strips
 * between mat rows, sub-word-line drivers between mat columns, and decoders along two edges.
 */
export function demoDesign(): Design {
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: 'Wren bank section (invented demo)',
    lengthUnit: 'm',
    process: { ...DEMO_PROCESS },
    operating: { ...DEFAULT_OPERATING },
    cells: BUILTIN_CELLS.map((c) => ({ ...c })),
    blocks: gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: 4,
      matColumns: 4,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      senseAmpStripHeight: 6e-6,
      wordlineDriverStripWidth: 3e-6,
      rowDecoderWidth: 18e-6,
      columnDecoderHeight: 14e-6,
    }),
  };
}
