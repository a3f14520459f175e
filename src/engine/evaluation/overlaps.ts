import type { BlockTable, Boxes } from '../../geometry/blockTable';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';

/** A pair of blocks that share area (not just an edge). */
export interface Overlap {
  readonly firstId: string;
  readonly secondId: string;
  /** Shared area (m²). */
  readonly area: number;
}

/** An overlap with the design positions of its two blocks (first < second). */
export interface PositionedOverlap {
  readonly overlap: Overlap;
  readonly first: number;
  readonly second: number;
}

/**
 * Every overlapping pair once, in design order of the first and then the second block, from the blocks'
 * neighbour rows (abutting neighbours share no area and are skipped).
 */
export function findOverlaps(table: BlockTable, neighbours: NeighbourTable): Overlap[] {
  return findPositionedOverlaps(table, neighbours).map((o) => o.overlap);
}

/** {@link findOverlaps} with the design positions of each pair, so a later edit can update the list. */
export function findPositionedOverlaps(table: BlockTable, neighbours: NeighbourTable): PositionedOverlap[] {
  const shared = neighbours.shared;
  // The pass that found the neighbours also found the pairs sharing more than the tolerance both ways
  // (overlapAreaAt > 0), in this order: no need to test every neighbour again.
  if (shared && shared.margin === ABUTMENT_TOLERANCE) return overlapsOfShared(table, shared.pairs);
  return overlapsAmongNeighbours(table, neighbours);
}

function overlapsOfShared(table: BlockTable, pairs: Int32Array): PositionedOverlap[] {
  const overlaps: PositionedOverlap[] = [];
  for (let k = 0; k < pairs.length; k += 2) {
    const i = pairs[k] as number;
    const j = pairs[k + 1] as number;
    const area = overlapAreaAt(table, i, j);
    overlaps.push({
      overlap: { firstId: table.blocks[i]?.id ?? '', secondId: table.blocks[j]?.id ?? '', area },
      first: i,
      second: j,
    });
  }
  return overlaps;
}

function overlapsAmongNeighbours(table: BlockTable, neighbours: NeighbourTable): PositionedOverlap[] {
  const overlaps: PositionedOverlap[] = [];
  const { start, end, list } = neighbours;
  for (let i = 0; i < table.count; i++) {
    // Rows are ascending, so pairs come out in design order.
    for (let k = start[i] as number; k < (end[i] as number); k++) {
      const j = list[k] as number;
      if (j <= i) continue;
      const area = overlapAreaAt(table, i, j);
      if (area > 0)
        overlaps.push({
          overlap: { firstId: table.blocks[i]?.id ?? '', secondId: table.blocks[j]?.id ?? '', area },
          first: i,
          second: j,
        });
    }
  }
  return overlaps;
}

/** The area blocks i and j share (m²): rect.ts overlapArea with the same arithmetic, read from a table. */
export function overlapAreaAt(boxes: Boxes, i: number, j: number): number {
  const ax = boxes.x[i] as number;
  const ay = boxes.y[i] as number;
  const bx = boxes.x[j] as number;
  const by = boxes.y[j] as number;
  const w = Math.min(ax + (boxes.width[i] as number), bx + (boxes.width[j] as number)) - Math.max(ax, bx);
  const h = Math.min(ay + (boxes.height[i] as number), by + (boxes.height[j] as number)) - Math.max(ay, by);
  return w > ABUTMENT_TOLERANCE && h > ABUTMENT_TOLERANCE ? w * h : 0;
}
