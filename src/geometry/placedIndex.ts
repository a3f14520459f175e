import type { Design } from '../model/design';
import type { Block } from '../model/block';
import { matGeometry, matRect } from './matGeometry';
import { placeBlocks, type PlacedBlock } from './placedBlocks';
import { containsPoint, type Rect } from './rect';
import { buildSpatialIndex, withMovedRects, type SpatialIndex } from './spatialIndex';

/** A design's blocks with their rectangles, an index over them, and where each id sits in the list. */
export interface PlacedDesign {
  readonly placed: readonly PlacedBlock[];
  readonly index: SpatialIndex;
  readonly positionOf: ReadonlyMap<string, number>;
}

const cache = new WeakMap<Design, PlacedDesign>();

/**
 * Places a design's blocks and indexes them, once per document: documents are immutable, so the result
 * is kept for as long as the document object lives (canvas drawing, hit-testing and live previews share it).
 */
export function placedDesign(design: Design): PlacedDesign {
  const cached = cache.get(design);
  if (cached) return cached;
  const placed = placeBlocks(design);
  // Filled in a loop: a [id, i] pair per block would be 200,000 short-lived arrays on a whole die.
  const positionOf = new Map<string, number>();
  for (let i = 0; i < placed.length; i++) positionOf.set((placed[i] as PlacedBlock).block.id, i);
  const result: PlacedDesign = {
    placed,
    index: buildSpatialIndex(placed.map((p) => p.rect)),
    positionOf,
  };
  cache.set(design, result);
  return result;
}

/**
 * The placed design of `next`, an edit of `previous` that replaced the blocks at the `changed` positions
 * with new versions of themselves (model/designEdit.ts): the other blocks keep their placement, the ids
 * keep their positions and the R-tree is updated, not rebuilt. Kept like {@link placedDesign}.
 */
export function placedDesignAfterEdit(
  previous: Design,
  next: Design,
  changed: readonly number[],
): PlacedDesign {
  const cached = cache.get(next);
  if (cached) return cached;
  const before = cache.get(previous);
  if (!before) return placedDesign(next);
  const placed = before.placed.slice();
  const moved = new Map<number, Rect>();
  for (const i of changed) {
    const block = next.blocks[i];
    if (!block) return placedDesign(next);
    const p = placeOne(next, block);
    placed[i] = p;
    moved.set(i, p.rect);
  }
  const index = withMovedRects(before.index, moved) ?? buildSpatialIndex(placed.map((p) => p.rect));
  const result: PlacedDesign = { placed, index, positionOf: before.positionOf };
  cache.set(next, result);
  return result;
}

function placeOne(design: Design, block: Block): PlacedBlock {
  if (block.type !== 'mat') return { block, rect: block };
  const cell = design.cells.find((c) => c.id === block.cellId);
  if (!cell) throw new Error(`mat "${block.id}" uses unknown cell "${block.cellId}"`);
  const geometry = matGeometry(block, cell, design.process.featureSize);
  return { block, rect: matRect(block, geometry), cell, geometry };
}

/** The topmost block under a point (m): the last one in drawing order, or null. */
export function blockAt(placed: PlacedDesign, x: number, y: number, margin = 0): string | null {
  const hits = placed.index.near({ x, y, width: 0, height: 0 }, margin);
  let best = -1;
  for (const i of hits) {
    const p = placed.placed[i];
    if (!p) continue;
    const r = p.rect;
    const grown = {
      x: r.x - margin,
      y: r.y - margin,
      width: r.width + 2 * margin,
      height: r.height + 2 * margin,
    };
    if (i > best && containsPoint(grown, x, y)) best = i;
  }
  return best >= 0 ? (placed.placed[best]?.block.id ?? null) : null;
}

/** Ids of the blocks lying wholly inside a box (m), in drawing order. */
export function blocksInside(placed: PlacedDesign, box: Rect): string[] {
  const ids: number[] = placed.index
    .near(box, 0)
    .filter((i) => {
      const r = placed.placed[i]?.rect;
      return (
        !!r &&
        r.x >= box.x &&
        r.y >= box.y &&
        r.x + r.width <= box.x + box.width &&
        r.y + r.height <= box.y + box.height
      );
    })
    .sort((a, b) => a - b);
  return ids.map((i) => placed.placed[i]?.block.id ?? '').filter((id) => id !== '');
}
