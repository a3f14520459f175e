import type { Block, BlockType } from '../model/block';
import {
  CODE_OF,
  matKindOf,
  TableRows,
  TableSums,
  type BlockTable,
  type MatKind,
  type TableInProgress,
} from './blockTable';

/**
 * A copy of the table with some blocks replaced by new versions of themselves (same position in design
 * order, new place or size): what the design looks like during a gesture, without laying out the rest again.
 */
export function withBlocksReplaced(
  base: BlockTable,
  replacements: ReadonlyMap<number, Block>,
  /** The new block list, when the caller has it already (it must hold the replacements). */
  replaced?: readonly Block[],
): BlockTable {
  const blocks = replaced ?? base.blocks.slice();
  if (!replaced) for (const [i, block] of replacements) (blocks as Block[])[i] = block;
  const table = new TableRows(
    base.count,
    blocks,
    base.x.slice(),
    base.y.slice(),
    base.width.slice(),
    base.height.slice(),
    base.type.slice(),
    base.kindOf.slice(),
    base.kinds.slice(),
    base.featureSize,
    base.cells,
    new Map(base.kindIndex),
    new TableSums(),
  );
  for (const [i, block] of replacements) writeRow(table, i, block);
  for (let k = 0; k < table.kinds.length; k++) table.sums.matsOfKind.push(0);
  table.sums.placedArea = sumRows(table);
  return table;
}

/**
 * The sums of a table whose rows were written one by one (a copy with some blocks replaced), into its
 * {@link TableSums} whose mat counts start at 0 per kind; returns the placed area.
 */
function sumRows(table: TableInProgress): number {
  const { x: xs, y: ys, width: widths, height: heights, type: types, kindOf, sums } = table;
  const { areaByCode, bounds, matsOfKind } = sums;
  let placedArea = 0;
  for (let i = 0; i < table.count; i++) {
    const x = xs[i] as number;
    const y = ys[i] as number;
    const w = widths[i] as number;
    const h = heights[i] as number;
    const code = types[i] as number;
    const area = w * h;
    placedArea += area;
    areaByCode[code] = (areaByCode[code] as number) + area;
    if (x < (bounds[0] as number)) bounds[0] = x;
    if (y < (bounds[1] as number)) bounds[1] = y;
    if (x + w > (bounds[2] as number)) bounds[2] = x + w;
    if (y + h > (bounds[3] as number)) bounds[3] = y + h;
    const kind = kindOf[i] as number;
    if (kind >= 0) matsOfKind[kind] = (matsOfKind[kind] as number) + 1;
  }
  return placedArea;
}

function writeRow(table: TableInProgress, i: number, block: Block): void {
  table.x[i] = block.x;
  table.y[i] = block.y;
  table.type[i] = typeCode(block.type);
  if (block.type !== 'mat') {
    table.width[i] = block.width;
    table.height[i] = block.height;
    table.kindOf[i] = -1;
    return;
  }
  const kind = matKindOf(table, block);
  table.width[i] = (table.kinds[kind] as MatKind).geometry.width;
  table.height[i] = (table.kinds[kind] as MatKind).geometry.height;
  table.kindOf[i] = kind;
}

/** The last type looked up and its code: blocks come in runs of one type, so most lookups are this. */
let lastType: BlockType | null = null;
let lastCode = -1;

function typeCode(type: BlockType): number {
  if (type !== lastType) {
    lastCode = CODE_OF.get(type) ?? -1;
    lastType = type;
  }
  return lastCode;
}
