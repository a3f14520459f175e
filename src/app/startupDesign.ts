import { gridFloorplan } from '../geometry/gridFloorplan';
import { BUILTIN_CELLS, DEFAULT_OPERATING, DEMO_PROCESS, FOLDED_8F2_CELL } from '../model/builtins';
import { demoDesign } from '../model/demoDesign';
import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from '../model/design';

/** Largest generated grid along one side: 256 × 256 mats is about 200,000 blocks with their strips. */
const MAX_GENERATED_SIDE = 256;

/** An empty floorplan on the demo process with the built-in cells, for drawing from scratch. */
export function blankDesign(): Design {
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    name: 'Untitled floorplan',
    lengthUnit: 'm',
    process: { ...DEMO_PROCESS },
    operating: { ...DEFAULT_OPERATING },
    cells: BUILTIN_CELLS.map((c) => ({ ...c })),
    blocks: [],
  };
}

/**
 * A design chosen by the page address, for trying the editor at scale and for tests:
 * `?blank` starts empty; `?generate=64x64` tiles 64 rows × 64 columns of the demo's mats with their
 * strips (4,096 mats). Returns null for any other address (the app then opens the demo).
 */
export function designFromQuery(search: string): Design | null {
  const params = new URLSearchParams(search);
  if (params.has('blank')) return blankDesign();
  const generate = params.get('generate');
  if (!generate) return null;
  const match = /^(\d{1,3})x(\d{1,3})$/.exec(generate);
  if (!match) return null;
  const rows = Number(match[1]);
  const columns = Number(match[2]);
  if (rows < 1 || columns < 1 || rows > MAX_GENERATED_SIDE || columns > MAX_GENERATED_SIDE) return null;
  const demo = demoDesign();
  return {
    ...demo,
    name: `Generated ${rows} × ${columns}-mat floorplan (invented demo process)`,
    blocks: gridFloorplan({
      cell: FOLDED_8F2_CELL,
      featureSize: DEMO_PROCESS.featureSize,
      matRows: rows,
      matColumns: columns,
      cellsPerBitline: 512,
      cellsPerWordline: 512,
      senseAmpStripHeight: 6e-6,
      wordlineDriverStripWidth: 3e-6,
      rowDecoderWidth: 18e-6,
      columnDecoderHeight: 14e-6,
    }),
  };
}
