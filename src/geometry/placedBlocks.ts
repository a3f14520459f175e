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

/**
 * Gives every block of a design its rectangle on the floorplan (m); mats also get their geometry. A strip
 * is its own rectangle (it has x, y, width and height), and mats of one kind share one geometry object,
 * so a large die allocates little here.
 */
export function placeBlocks(design: Design): PlacedBlock[] {
  const cells = new Map(design.cells.map((c) => [c.id, c]));
  const F = design.process.featureSize;
  const geometries = new Map<string, MatGeometry>();
  const placed: PlacedBlock[] = new Array<PlacedBlock>(design.blocks.length);
  for (let i = 0; i < design.blocks.length; i++) {
    const block = design.blocks[i] as Block;
    if (block.type !== 'mat') {
      placed[i] = { block, rect: block };
      continue;
    }
    const cell = cells.get(block.cellId);
    if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
    const key = `${block.cellId}|${block.cellsPerBitline}|${block.cellsPerWordline}|${block.bitlineAxis}`;
    let geometry = geometries.get(key);
    if (!geometry) {
      geometry = matGeometry(block, cell, F);
      geometries.set(key, geometry);
    }
    placed[i] = { block, rect: matRect(block, geometry), cell, geometry };
  }
  return placed;
}

/** Rectangle of one block, for hit-testing and drawing. */
export function blockRect(design: Design, block: Block): Rect {
  if (block.type !== 'mat') return { x: block.x, y: block.y, width: block.width, height: block.height };
  const cell = design.cells.find((c) => c.id === block.cellId);
  if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
  return matRect(block, matGeometry(block, cell, design.process.featureSize));
}
