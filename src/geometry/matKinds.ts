import type { Mat } from '../model/block';
import type { CellDefinition } from '../model/cell';
import type { MatKind, TableInProgress } from './blockTable';
import { matGeometry, type MatGeometry } from './matGeometry';

/** The index of `block`'s mat kind in the table, the kind added when new (blockTable, replacedBlocks.ts). */
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

/** A mat kind (a class for the reason given at blockTable.ts TableRows). */
class KindOfMat implements MatKind {
  constructor(
    readonly block: Mat,
    readonly cell: CellDefinition,
    readonly geometry: MatGeometry,
  ) {}
}
