import type { Design } from '../model/design';
import { placeBlocks, type PlacedBlock } from './placedBlocks';
import { containsPoint, type Rect } from './rect';
import { buildSpatialIndex, type SpatialIndex } from './spatialIndex';

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
  const result: PlacedDesign = {
    placed,
    index: buildSpatialIndex(placed.map((p) => p.rect)),
    positionOf: new Map(placed.map((p, i) => [p.block.id, i])),
  };
  cache.set(design, result);
  return result;
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
