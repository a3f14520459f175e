import { gridFloorplan } from './gridFloorplan';
import { DEMO_MAT, DEMO_STRIPS } from './demoSizes';
import { BUILTIN_CELLS, DEFAULT_OPERATING, DEMO_PROCESS } from '../model/builtins';
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from '../model/design';

/** Name of the demo design file in public/, served by the app and read by the CLI example. */
export const DEMO_FILE_NAME = 'wren-demo-bank.json';

/** The demo's mats with their strips, `rows` × `columns` of them. */
function demoGrid(rows: number, columns: number) {
  return gridFloorplan({
    ...DEMO_MAT,
    ...DEMO_STRIPS,
    featureSize: DEMO_PROCESS.featureSize,
    matRows: rows,
    matColumns: columns,
  });
}

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
    // The section is one of 256 on the 2 Gb die: the offset budget and the weakest cell are the die's.
    operating: { ...DEFAULT_OPERATING, floorplanCopiesPerDie: 256 },
    cells: BUILTIN_CELLS.map((c) => ({ ...c })),
    blocks: demoGrid(4, 4),
  };
}

/** The demo scaled up: `rows` × `columns` of its mats with their strips, for trying the editor at scale. */
export function generatedDemoGrid(rows: number, columns: number): Design {
  return {
    ...demoDesign(),
    name: `Generated ${rows} × ${columns}-mat floorplan (invented demo process)`,
    // A generated floorplan is its own die (64 × 64 demo mats are the whole 2 Gb chip).
    operating: { ...DEFAULT_OPERATING, floorplanCopiesPerDie: 1 },
    blocks: demoGrid(rows, columns),
  };
}

/** An empty floorplan on the demo process with the built-in cells, for drawing from scratch. */
export function blankDesign(): Design {
  return { ...demoDesign(), name: 'Untitled floorplan', blocks: [] };
}
