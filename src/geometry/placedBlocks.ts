import type { Block, Mat, Strip } from '../model/block';
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

/** Gives every block of a design its rectangle on the floorplan (m); mats also get their geometry. */
export function placeBlocks(design: Design): PlacedBlock[] {
  const cells = new Map(design.cells.map((c) => [c.id, c]));
  const F = design.process.featureSize;
  return design.blocks.map((block: Block): PlacedBlock => {
    if (block.type !== 'mat') {
      return { block, rect: { x: block.x, y: block.y, width: block.width, height: block.height } };
    }
    const cell = cells.get(block.cellId);
    if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
    const geometry = matGeometry(block, cell, F);
    return { block, rect: matRect(block, geometry), cell, geometry };
  });
}

/** Rectangle of one block, for hit-testing and drawing. */
export function blockRect(design: Design, block: Block): Rect {
  if (block.type !== 'mat') return { x: block.x, y: block.y, width: block.width, height: block.height };
  const cell = design.cells.find((c) => c.id === block.cellId);
  if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
  return matRect(block, matGeometry(block, cell, design.process.featureSize));
}
