import type { Block, BitlineAxis, Strip } from '../model/block';
import type { CellDefinition } from '../model/cell';
import { unplacedMatGeometry } from '../geometry/matGeometry';

/** What to tile: a grid of identical mats with their strips and decoders. Sizes in metres. */
export interface GridFloorplanSpec {
  readonly cell: CellDefinition;
  readonly featureSize: number;
  readonly matRows: number;
  readonly matColumns: number;
  readonly cellsPerBitline: number;
  readonly cellsPerWordline: number;
  /** Height of a sense-amplifier strip (across the bit-line direction) (m). */
  readonly senseAmpStripHeight: number;
  /** Width of a sub-word-line driver strip (m). */
  readonly wordlineDriverStripWidth: number;
  /** Width of the row decoder at the left edge (m); 0 for none. */
  readonly rowDecoderWidth: number;
  /** Height of the column decoder at the bottom edge (m); 0 for none. */
  readonly columnDecoderHeight: number;
}

/**
 * Tiles mats with vertical bit lines in a grid: a sense-amplifier strip above and below every mat row
 * (inner strips shared by neighbouring rows), a sub-word-line driver strip left and right of every mat
 * column, a row decoder along the left edge and a column decoder along the bottom. Block ids say where
 * each block sits ("mat-r2c3"), so generated floorplans stay readable.
 */
export function gridFloorplan(spec: GridFloorplanSpec): Block[] {
  const probe = unplacedMatGeometry(spec.cell, spec.cellsPerBitline, spec.cellsPerWordline, spec.featureSize);
  const matW = probe.width;
  const matH = probe.height;
  const sa = spec.senseAmpStripHeight;
  const swd = spec.wordlineDriverStripWidth;
  const left = spec.rowDecoderWidth;
  const columnX = (c: number) => left + swd + c * (matW + swd);
  const rowY = (r: number) => sa + r * (matH + sa);
  const arrayWidth = spec.matColumns * (matW + swd) + swd;
  const arrayHeight = spec.matRows * (matH + sa) + sa;
  const blocks: Block[] = [];
  const axis: BitlineAxis = 'vertical';
  const strip = (
    id: string,
    name: string,
    type: Strip['type'],
    x: number,
    y: number,
    w: number,
    h: number,
  ): Strip => ({
    id,
    name,
    type,
    x,
    y,
    width: w,
    height: h,
  });

  for (let r = 0; r < spec.matRows; r++) {
    for (let c = 0; c < spec.matColumns; c++) {
      blocks.push({
        id: `mat-r${r}c${c}`,
        name: `Mat ${r + 1}.${c + 1}`,
        type: 'mat',
        x: columnX(c),
        y: rowY(r),
        cellId: spec.cell.id,
        cellsPerBitline: spec.cellsPerBitline,
        cellsPerWordline: spec.cellsPerWordline,
        bitlineAxis: axis,
      });
    }
  }
  for (let r = 0; r <= spec.matRows; r++) {
    for (let c = 0; c < spec.matColumns; c++) {
      blocks.push(
        strip(`sa-r${r}c${c}`, `SA ${r}.${c + 1}`, 'senseAmpStrip', columnX(c), r * (matH + sa), matW, sa),
      );
    }
  }
  for (let r = 0; r < spec.matRows; r++) {
    for (let c = 0; c <= spec.matColumns; c++) {
      blocks.push(
        strip(
          `swd-r${r}c${c}`,
          `SWD ${r + 1}.${c}`,
          'wordlineDriverStrip',
          left + c * (matW + swd),
          rowY(r),
          swd,
          matH,
        ),
      );
    }
  }
  if (left > 0) blocks.push(strip('row-decoder', 'Row decoder', 'rowDecoder', 0, 0, left, arrayHeight));
  if (spec.columnDecoderHeight > 0) {
    blocks.push(
      strip(
        'column-decoder',
        'Column decoder',
        'columnDecoder',
        left,
        arrayHeight,
        arrayWidth,
        spec.columnDecoderHeight,
      ),
    );
  }
  return blocks;
}
