/**
 * blockTable() as it was before writeRows took stretches of mats and strips in their own loops (session
 * 6), kept as the oracle of test/geometry/blockTableStretches.test.ts: the same rows, sums and stretches.
 */
import type { BitlineAxis, Block, BlockType, Mat } from '../../src/model/block';
import { BLOCK_TYPES } from '../../src/model/blockBasics';
import type { CellDefinition } from '../../src/model/cell';
import type { Design } from '../../src/model/design';
import { matGeometry, type MatGeometry } from '../../src/geometry/matGeometry';
import { repeatedSum } from '../../src/geometry/repeatedSum';
import type { Rect } from '../../src/geometry/rect';

/** Block types in the order of their codes in {@link BlockTable.type}. */
export const BLOCK_TYPE_CODES: readonly BlockType[] = BLOCK_TYPES;
/** Each block type's code (the index in BLOCK_TYPE_CODES). */
export const CODE_OF = new Map(BLOCK_TYPE_CODES.map((type, code) => [type, code]));
export const MAT_CODE = BLOCK_TYPE_CODES.indexOf('mat');
export const SENSE_AMP_STRIP_CODE = BLOCK_TYPE_CODES.indexOf('senseAmpStrip');
export const WORDLINE_DRIVER_STRIP_CODE = BLOCK_TYPE_CODES.indexOf('wordlineDriverStrip');
export const ROW_DECODER_CODE = BLOCK_TYPE_CODES.indexOf('rowDecoder');

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
  const { x, y, width, height, type, kindOf, kinds, sums } = table;
  // The first mat's kind is found here, not in the loop: a call made only on the loop's first pass has
  // no type feedback yet, and the code V8 compiles for the loop would be thrown away at it on the next
  // call (a new design brings a new first kind).
  const first = design.blocks.find((b): b is Mat => b.type === 'mat') ?? null;
  const firstKind = first ? matKindOf(table, first) : -1;
  if (firstKind >= 0) sums.matsOfKind.push(0);
  const firstGeometry = first ? (kinds[firstKind] as MatKind).geometry : null;
  const stretches = new Int32Array(design.blocks.length + 1);
  const count = writeRows(
    table,
    design.blocks,
    first?.cellId ?? '',
    first?.cellsPerBitline ?? 0,
    first?.cellsPerWordline ?? 0,
    first?.bitlineAxis ?? 'vertical',
    first?.footprint !== undefined,
    firstKind,
    firstGeometry?.width ?? 0,
    firstGeometry?.height ?? 0,
    x,
    y,
    width,
    height,
    type,
    kindOf,
    kinds,
    sums.bounds,
    sums.matsOfKind,
    stretches,
  );
  stretches[count] = design.blocks.length;
  table.stretches = stretches.subarray(0, count + 1);
  sums.placedArea = finishStretches(table, table.stretches, sums);
  return table;
}

/**
 * Finishes a table written by {@link writeRows}, stretch by stretch (stretch k: blocks `stretches[k]` …
 * `stretches[k + 1] − 1`, of one top edge, width, height, type code and mat kind, whose first block
 * holds them): the other blocks' widths, heights, codes and kinds (TypedArray.fill), the mats of each
 * kind, the top and bottom bounds, and each block's area (width · height) into its code's sum and the
 * placed area, in design order. Stretches of one size and code that follow each other (rows of a tiled
 * array) are added at once (repeatedSum.ts: to the bit what adding block by block gives, without a new
 * number per block in the interpreter). Returns the placed area.
 */
function finishStretches(table: BlockTable, stretches: Int32Array, sums: TableSums): number {
  const { y, width, height, type, kindOf } = table;
  const { areaByCode, bounds, matsOfKind } = sums;
  let placedArea = 0;
  let k = 0;
  while (k + 1 < stretches.length) {
    const from = stretches[k] as number;
    const w = width[from] as number;
    const h = height[from] as number;
    const code = type[from] as number;
    // Consecutive stretches of one size and code are one sum.
    let next = k;
    do {
      const at = stretches[next] as number;
      const to = stretches[next + 1] as number;
      const kind = kindOf[at] as number;
      width.fill(w, at + 1, to);
      height.fill(h, at + 1, to);
      type.fill(code, at + 1, to);
      kindOf.fill(kind, at + 1, to);
      if (kind >= 0) matsOfKind[kind] = (matsOfKind[kind] as number) + to - at;
      // Comparisons as the rows' left and right bounds (writeRows): one top edge per stretch.
      const top = y[at] as number;
      const bottom = top + h;
      if (top < (bounds[1] as number)) bounds[1] = top;
      if (bottom > (bounds[3] as number)) bounds[3] = bottom;
      next++;
    } while (
      next + 1 < stretches.length &&
      width[stretches[next] as number] === w &&
      height[stretches[next] as number] === h &&
      type[stretches[next] as number] === code
    );
    const count = (stretches[next] as number) - from;
    const area = w * h;
    placedArea = repeatedSum(placedArea, area, count);
    areaByCode[code] = repeatedSum(areaByCode[code] as number, area, count);
    k = next;
  }
  return placedArea;
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

/** A mat kind (a class for the reason given at {@link TableRows}). */
class KindOfMat implements MatKind {
  constructor(
    readonly block: Mat,
    readonly cell: CellDefinition,
    readonly geometry: MatGeometry,
  ) {}
}

/** Starting values of the sums, read from module constants (see {@link writeRows}). */
const FAR = Infinity;
const NEAR = -Infinity;

/**
 * Writes every block's left and top edge, its left and right bounds, and where each stretch of blocks of
 * one top edge, size, code and mat kind begins with those in its first block's row, in one pass (design
 * order; {@link finishStretches} fills in the rest per stretch); returns the number of stretches. What the loop reads comes in as arguments and the loop ends the
 * function: a function V8 compiles after its first call would otherwise find no type feedback for code
 * before the loop (the first call ran it before the function had a feedback vector) and be thrown away
 * at entry, running the whole loop in the interpreter again (DEVELOPERS.md). The last mat's cell and
 * counts are kept in locals: consecutive mats are nearly always of one kind in a tiled array, so the
 * kind is looked up only when one of them changes.
 */
function writeRows(
  table: TableInProgress,
  blocks: readonly Block[],
  /** The first mat's cell, counts, axis and whether it has a footprint ('' and 0 without mats). */
  firstCell: string,
  firstPerBitline: number,
  firstPerWordline: number,
  firstAxis: BitlineAxis,
  firstFootprint: boolean,
  /** The first mat's kind and that kind's size (m), found by the caller; −1 without mats. */
  firstKind: number,
  firstWidth: number,
  firstHeight: number,
  xs: Float64Array,
  ys: Float64Array,
  widths: Float64Array,
  heights: Float64Array,
  types: Uint8Array,
  kindOf: Int32Array,
  kinds: readonly MatKind[],
  bounds: Float64Array,
  matsOfKind: number[],
  /** Where each stretch of blocks of one top edge, size, code and kind begins (see {@link Boxes.stretches}). */
  stretches: Int32Array,
): number {
  let minX = FAR;
  let maxX = NEAR;
  // The top edge, size and code of the stretch so far: sizes are ≥ 0, so −1 matches none and the first
  // block opens a stretch.
  let stretchY = 0;
  let areaWidth = -1;
  let areaHeight = -1;
  let sumCode = -1;
  let stretchKind = -1;
  let count = 0;
  // The box whose right edge is the far one so far: its left edge and width.
  let rightX = 0;
  let rightWidth = -1;
  let lastCell = firstCell;
  let lastPerBitline = firstPerBitline;
  let lastPerWordline = firstPerWordline;
  let lastAxis = firstAxis;
  let lastFootprint = firstFootprint;
  let lastKind = firstKind;
  let lastWidth = firstWidth;
  let lastHeight = firstHeight;
  // Strips come in runs of one type: the last type's code likewise.
  let runType: BlockType | null = null;
  let runCode = -1;
  for (let i = 0; i < blocks.length; i++) {
    const block = blocks[i] as Block;
    const x = block.x;
    const y = block.y;
    let w: number;
    let h: number;
    let code: number;
    let kind: number;
    if (block.type === 'mat') {
      if (
        block.cellId !== lastCell ||
        block.cellsPerBitline !== lastPerBitline ||
        block.cellsPerWordline !== lastPerWordline ||
        block.bitlineAxis !== lastAxis ||
        block.footprint !== undefined ||
        lastFootprint
      ) {
        lastKind = matKindOf(table, block);
        if (lastKind === matsOfKind.length) matsOfKind.push(0);
        const g = (kinds[lastKind] as MatKind).geometry;
        lastCell = block.cellId;
        lastPerBitline = block.cellsPerBitline;
        lastPerWordline = block.cellsPerWordline;
        lastAxis = block.bitlineAxis;
        lastFootprint = block.footprint !== undefined;
        lastWidth = g.width;
        lastHeight = g.height;
      }
      w = lastWidth;
      h = lastHeight;
      code = MAT_CODE;
      kind = lastKind;
    } else {
      w = block.width;
      h = block.height;
      if (block.type !== runType) {
        runType = block.type;
        runCode = CODE_OF.get(block.type) ?? -1;
      }
      code = runCode;
      kind = -1;
    }
    xs[i] = x;
    ys[i] = y;
    // A zero size opens a stretch of its own: 0 and −0 compare equal, and the stretch's other blocks
    // take the first one's numbers bit for bit.
    if (
      y !== stretchY ||
      w !== areaWidth ||
      h !== areaHeight ||
      code !== sumCode ||
      kind !== stretchKind ||
      w === 0 ||
      h === 0
    ) {
      stretchY = y;
      areaWidth = w;
      areaHeight = h;
      sumCode = code;
      stretchKind = kind;
      widths[i] = w;
      heights[i] = h;
      types[i] = code;
      kindOf[i] = kind;
      stretches[count++] = i;
    }
    // Comparisons rather than Math.min/max calls: coordinates are finite (restore checks them).
    // The bounds are stored as they grow (rarely, and the first block stores both): code after the
    // loop would have no type feedback when V8 compiles the loop as it runs (DEVELOPERS.md).
    if (x < minX) {
      minX = x;
      bounds[0] = x;
    }
    // x + w rounds monotonically in x: a box of the far edge's width starting no further right ends no
    // further right.
    if (w !== rightWidth || x > rightX) {
      const right = x + w;
      if (right > maxX) {
        maxX = right;
        rightX = x;
        rightWidth = w;
        bounds[2] = right;
      }
    }
  }
  return count;
}

/** The index of `block`'s mat kind in the table, the kind added when new (also replacedBlocks.ts). */
export function matKindOf(table: TableInProgress, block: Mat): number {
  const slot = block.footprint ? `|${block.footprint.width}|${block.footprint.height}` : '';
  const key = `${block.cellId}|${block.cellsPerBitline}|${block.cellsPerWordline}|${block.bitlineAxis}${slot}`;
  const known = table.kindIndex.get(key);
  if (known !== undefined) return known;
  const cell = table.cells.get(block.cellId);
  if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
  table.kinds.push(new KindOfMat(block, cell, matGeometry(block, cell, table.featureSize)));
  table.kindIndex.set(key, table.kinds.length - 1);
  return table.kinds.length - 1;
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
