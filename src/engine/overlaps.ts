import type { PlacedBlock } from '../geometry/placedBlocks';
import { ABUTMENT_TOLERANCE, overlapArea } from '../geometry/rect';
import type { SpatialIndex } from '../geometry/spatialIndex';

/** A pair of blocks that share area (not just an edge). */
export interface Overlap {
  readonly firstId: string;
  readonly secondId: string;
  /** Shared area (m²). */
  readonly area: number;
}

/**
 * Adds the pairs (i, j > i) that share area, given the indices near block i in ascending order. Abutting
 * neighbours among them share no area and are skipped.
 */
export function collectOverlaps(
  placed: readonly PlacedBlock[],
  i: number,
  near: readonly number[],
  into: Overlap[],
): void {
  const a = placed[i];
  if (!a) return;
  for (const j of near) {
    if (j <= i) continue;
    const b = placed[j];
    if (!b) continue;
    const shared = overlapArea(a.rect, b.rect);
    if (shared > 0) into.push({ firstId: a.block.id, secondId: b.block.id, area: shared });
  }
}

/** Every overlapping pair once, in design order of the first and then the second block, found through the spatial index (O(n log n) for sparse overlaps). */
export function findOverlaps(placed: readonly PlacedBlock[], index: SpatialIndex): Overlap[] {
  const overlaps: Overlap[] = [];
  // Shrinking the query box by the tolerance skips neighbours that merely abut. Sorting the hits puts
  // pairs in design order, whatever order the index returns them in (live previews rely on it).
  for (let i = 0; i < placed.length; i++) {
    const a = placed[i];
    if (a)
      collectOverlaps(
        placed,
        i,
        index.near(a.rect, -ABUTMENT_TOLERANCE).sort((x, y) => x - y),
        overlaps,
      );
  }
  return overlaps;
}
