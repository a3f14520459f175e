import type { Block, Mat, Strip } from '../model/block';
import { blockTable, kindAt, rectAt } from './blockTable';
import type { CellDefinition } from '../model/cell';
import type { Design } from '../model/design';
import { matGeometry, matRect, type MatGeometry } from './matGeometry';
import type { Rect } from './rect';

export interface PlacedMat {
  readonly block: Mat;
  readonly rect: Rect;
  readonly cell: CellDefinition;
  readonly geometry: MatGeometry;
}

export interface PlacedStrip {
  readonly block: Strip;
  readonly rect: Rect;
}

export type PlacedBlock = PlacedMat | PlacedStrip;

export function isPlacedMat(placed: PlacedBlock): placed is PlacedMat {
  return placed.block.type === 'mat';
}

/**
 * Every block of a design with its rectangle on the floorplan (m) as objects, for the canvas and the
 * image export; mats also get their cell and geometry. Laid out by {@link blockTable}, so a strip is its
 * own rectangle and mats of one kind share one geometry object.
 */
export function placeBlocks(design: Design): PlacedBlock[] {
  const table = blockTable(design);
  return design.blocks.map((block, i): PlacedBlock => {
    if (block.type !== 'mat') return { block, rect: block };
    const { cell, geometry } = kindAt(table, i);
    return { block, rect: rectAt(table, i), cell, geometry };
  });
}

/** Rectangle of one block, for hit-testing and drawing. */
export function blockRect(design: Design, block: Block): Rect {
  if (block.type !== 'mat') return { x: block.x, y: block.y, width: block.width, height: block.height };
  const cell = design.cells.find((c) => c.id === block.cellId);
  if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
  return matRect(block, matGeometry(block, cell, design.process.featureSize));
}
