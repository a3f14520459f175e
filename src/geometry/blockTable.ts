import type { Block, Mat } from '../model/block';
import type { CellDefinition } from '../model/cell';
import type { Design } from '../model/design';
import { BLOCK_TYPE_CODES } from './blockCodes';
import type { MatGeometry } from './matGeometry';
import type { Rect } from './rect';
import { finishStretches, writeRows } from './tableStretches';

export {
  BLOCK_TYPE_CODES,
  CODE_OF,
  MAT_CODE,
  ROW_DECODER_CODE,
  SENSE_AMP_STRIP_CODE,
  WORDLINE_DRIVER_STRIP_CODE,
} from './blockCodes';
export { matKindOf } from './matKinds';

/**
 * What a mat's shape and physics follow from: its cell and cell counts (from a mat of that kind) and the
 * geometry they give. Mats with the same cell, counts and bit-line axis share one kind.
 */
export interface MatKind {
  readonly block: Pick<Mat, 'cellsPerBitline' | 'cellsPerWordline' | 'bitlineAxis' | 'footprint'>;
  readonly cell: CellDefinition;
  readonly geometry: MatGeometry;
}

/** Boxes in flat arrays (m): box i spans x[i] … x[i] + width[i] by y[i] … y[i] + height[i]. */
export interface Boxes {
  readonly count: number;
  readonly x: Float64Array;
  readonly y: Float64Array;
  readonly width: Float64Array;
  readonly height: Float64Array;
  /**
   * Where the stretches of boxes that follow each other with one top edge, width, height and type code
   * (and mat kind) begin, then the count (box indices, ascending), when whoever wrote the boxes noted
   * them (a block table written in one pass does); null or absent otherwise.
   */
  readonly stretches?: Int32Array | null;
}

/**
 * A design's blocks laid out in flat typed arrays, in design order: each block's rectangle (m), its type
 * code and, for a mat, its kind. Evaluating a whole die reads positions from here rather than from one
 * object per block, which keeps a 4,096-mat evaluation free of tens of thousands of small allocations.
 */
export interface BlockTable extends Boxes {
  readonly blocks: readonly Block[];
  /** Index into {@link BLOCK_TYPE_CODES}. */
  readonly type: Uint8Array;
  /** For a mat, the index of its kind in `kinds`; −1 for every other block. */
  readonly kindOf: Int32Array;
  readonly kinds: readonly MatKind[];
  /** The design's process feature size (m), which the mats' geometry depends on. */
  readonly featureSize: number;
  /** Cells by id, to place further mats (live previews). */
  readonly cells: ReadonlyMap<string, CellDefinition>;
  /** Kind index by "cell|cells per BL|cells per WL|axis". */
  readonly kindIndex: ReadonlyMap<string, number>;
  /** Sums over the blocks, gathered while the rows were written (see {@link TableSums}). */
  readonly sums: TableSums;
}

/**
 * Sums over a table's blocks that evaluation reads (totals, counts), gathered while the rows are written,
 * where each block's place and size are at hand: a pass of their own would read every row again.
 */
export class TableSums {
  /** Area of every block (m², width · height), summed in design order. */
  placedArea = 0;
  /** The same per type code (index into {@link BLOCK_TYPE_CODES}), each summed in design order. */
  readonly areaByCode = new Float64Array(BLOCK_TYPE_CODES.length);
  /** Bounding box of every block (m): left, top, right, bottom; ±Infinity without blocks. */
  readonly bounds = Float64Array.of(Infinity, Infinity, -Infinity, -Infinity);
  /** Mats of each kind (indices as the table's kinds). */
  readonly matsOfKind: number[] = [];
}

/** A table while its rows are written: its list of kinds and their index still grow. */
export interface TableInProgress extends BlockTable {
  readonly kinds: MatKind[];
  readonly kindIndex: Map<string, number>;
  readonly sums: TableSums;
  stretches: Int32Array | null;
}

/** Lays out every block of a design: strips are their own rectangles, mats take their size from their kind. */
export function blockTable(design: Design): BlockTable {
  const cells = new Map(design.cells.map((c) => [c.id, c]));
  const table = emptyTable(design.blocks, design.process.featureSize, cells);
  const stretches = new Int32Array(design.blocks.length + 1);
  const count = writeRows(table, stretches);
  stretches[count] = design.blocks.length;
  table.stretches = stretches.subarray(0, count + 1);
  table.sums.placedArea = finishStretches(table, table.stretches, table.sums);
  return table;
}

/** The rectangle of block i (m). */
export function rectAt(table: Boxes, i: number): Rect {
  return {
    x: table.x[i] as number,
    y: table.y[i] as number,
    width: table.width[i] as number,
    height: table.height[i] as number,
  };
}

/** The kind of mat i; throws for a block that is not a mat. */
export function kindAt(table: BlockTable, i: number): MatKind {
  const kind = table.kinds[table.kindOf[i] as number];
  if (!kind) throw new Error(`block ${table.blocks[i]?.id ?? i} is not a mat`);
  return kind;
}

function emptyTable(
  blocks: readonly Block[],
  featureSize: number,
  cells: ReadonlyMap<string, CellDefinition>,
): TableInProgress {
  const n = blocks.length;
  return new TableRows(
    n,
    blocks,
    new Float64Array(n),
    new Float64Array(n),
    new Float64Array(n),
    new Float64Array(n),
    new Uint8Array(n),
    new Int32Array(n),
    [],
    featureSize,
    cells,
    new Map(),
    new TableSums(),
  );
}

/**
 * A table's storage as a class, not an object literal: the second time a literal runs, V8 gives its
 * objects a more general shape (it keeps a template from then on), and every compiled function that had
 * read the first shape is thrown away. That was most of the engine in a session's second evaluation.
 * Instances of a class keep one shape. (The same holds for the mat kinds and the mat and neighbour tables.)
 */
export class TableRows implements TableInProgress {
  constructor(
    readonly count: number,
    readonly blocks: readonly Block[],
    readonly x: Float64Array,
    readonly y: Float64Array,
    readonly width: Float64Array,
    readonly height: Float64Array,
    readonly type: Uint8Array,
    readonly kindOf: Int32Array,
    readonly kinds: MatKind[],
    readonly featureSize: number,
    readonly cells: ReadonlyMap<string, CellDefinition>,
    readonly kindIndex: Map<string, number>,
    readonly sums: TableSums,
  ) {}

  /** See {@link Boxes.stretches}: noted by blockTable(), null for a copy with blocks replaced. */
  stretches: Int32Array | null = null;
}

/** Plain rectangles as flat boxes (for callers that have rectangles rather than a design). */
export function boxesOf(rects: readonly Rect[]): Boxes {
  const n = rects.length;
  const boxes = {
    count: n,
    x: new Float64Array(n),
    y: new Float64Array(n),
    width: new Float64Array(n),
    height: new Float64Array(n),
  };
  rects.forEach((r, i) => {
    boxes.x[i] = r.x;
    boxes.y[i] = r.y;
    boxes.width[i] = r.width;
    boxes.height[i] = r.height;
  });
  return boxes;
}
