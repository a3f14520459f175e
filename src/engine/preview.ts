import { isPlacedMat, placeBlocks, type PlacedBlock } from '../geometry/placedBlocks';
import { placedDesign } from '../geometry/placedIndex';
import { ABUTMENT_TOLERANCE, bottom, overlapArea, right, type Rect } from '../geometry/rect';
import { neighbourTableOf, type NeighbourTable } from '../geometry/neighbourGrid';
import type { SpatialIndex } from '../geometry/spatialIndex';
import type { Block } from '../model/block';
import type { Design } from '../model/design';
import { collectFindings } from './checks';
import { countSenseAmps, designContext, evaluate, evaluatePlacedMat } from './evaluate';
import { findOverlaps, type Overlap } from './overlaps';
import type { Report } from './report';
import { computeTotals } from './totals';

/**
 * Live figures while a gesture changes a few blocks of a large design: instead of evaluating the whole
 * design on every pointer move, only the changed blocks and the mats beside their old and new places
 * are evaluated again, and the totals are updated by difference. The result equals evaluate() of the
 * changed design (tested), so the panels can follow a drag frame by frame on a 4,096-mat floorplan.
 */

/** What stays fixed during one gesture: the design and report before it, and which blocks change. */
export interface PreviewBase {
  readonly design: Design;
  readonly report: Report;
  readonly changing: ReadonlySet<string>;
  readonly placed: readonly PlacedBlock[];
  readonly index: SpatialIndex;
  readonly positionOf: ReadonlyMap<string, number>;
  /** Placed positions of the changing blocks. */
  readonly changingPositions: ReadonlySet<number>;
  readonly matOrder: ReadonlyMap<string, number>;
  /**
   * Scratch list: the placed blocks followed by the changed ones of the latest preview. Kept between
   * previews so that a pointer move does not copy thousands of entries.
   */
  readonly scratch: PlacedBlock[];
  /** Overlapping pairs among the blocks that do not change, found once per gesture. */
  readonly staticOverlaps: readonly Overlap[];
}

export function preparePreview(design: Design, report: Report, changingIds: Iterable<string>): PreviewBase {
  const { placed, index, positionOf } = placedDesign(design);
  const changing = new Set(changingIds);
  const changingPositions = new Set<number>();
  for (const id of changing) {
    const i = positionOf.get(id);
    if (i !== undefined) changingPositions.add(i);
  }
  return {
    design,
    report,
    changing,
    placed,
    index,
    positionOf,
    changingPositions,
    matOrder: new Map(report.mats.map((m, i) => [m.matId, i])),
    scratch: placed.slice(),
    staticOverlaps: findOverlaps(placed, index).filter(
      (o) => !changing.has(o.firstId) && !changing.has(o.secondId),
    ),
  };
}

function intersects(a: Rect, b: Rect, margin: number): boolean {
  return (
    a.x - margin <= right(b) &&
    b.x <= right(a) + margin &&
    a.y - margin <= bottom(b) &&
    b.y <= bottom(a) + margin
  );
}

/**
 * Neighbour rows for the mats to evaluate again and for the sense-amplifier strips beside them (whose
 * neighbours give an open-bit-line mat its partners), found by queries on the composite index; every
 * other row stays empty.
 */
function previewNeighbours(
  combined: readonly PlacedBlock[],
  composite: SpatialIndex,
  mats: ReadonlySet<number>,
): NeighbourTable {
  const rows = new Map<number, number[]>();
  const rowOf = (i: number): number[] => {
    let row = rows.get(i);
    if (!row) {
      const rect = combined[i]?.rect;
      row = rect ? composite.near(rect, ABUTMENT_TOLERANCE).filter((j) => j !== i) : [];
      rows.set(i, row);
    }
    return row;
  };
  for (const i of mats) {
    for (const j of rowOf(i)) if (combined[j]?.block.type === 'senseAmpStrip') rowOf(j);
  }
  return neighbourTableOf(combined.length, rows);
}

/**
 * The report of the design with the changing blocks replaced by `changed` (same ids; blocks are neither
 * added nor removed). Mats beside a changed block are evaluated again through a composite index (the
 * static index without the changing blocks, plus the moved ones); every other mat keeps its report.
 * Totals and findings are then recomputed from the mat reports in one linear pass. When the change
 * alters the number of sense amplifiers (a resize), every margin moves with k, so the whole design is
 * evaluated instead.
 */
export function previewReport(base: PreviewBase, changed: readonly Block[]): Report {
  const { design, report, placed, index, changingPositions } = base;
  const moved = placeBlocks({ ...design, blocks: [...changed] });
  const n = placed.length;
  const combined = base.scratch;
  combined.length = n;
  combined.push(...moved);
  // The design as it stands during the gesture, in design order.
  const current = placed.slice();
  moved.forEach((m) => {
    const at = base.positionOf.get(m.block.id);
    if (at !== undefined) current[at] = m;
  });
  const currentMats = current.filter(isPlacedMat);
  const senseAmpCount = countSenseAmps(currentMats);
  if (senseAmpCount !== report.totals.senseAmpCount) {
    const merged = new Map(changed.map((b) => [b.id, b]));
    return evaluate({ ...design, blocks: design.blocks.map((b) => merged.get(b.id) ?? b) });
  }

  const composite: SpatialIndex = {
    near(rect, margin) {
      const hits = index.near(rect, margin).filter((i) => !changingPositions.has(i));
      moved.forEach((m, j) => {
        if (intersects(rect, m.rect, margin)) hits.push(n + j);
      });
      return hits;
    },
  };
  const designOrder = (i: number) =>
    i < n ? i : (base.positionOf.get(moved[i - n]?.block.id ?? '') ?? Number.MAX_SAFE_INTEGER);

  // Mats to evaluate again: the changed ones and every mat beside an old or a new place.
  const affected = new Set<number>();
  moved.forEach((m, j) => {
    if (isPlacedMat(m)) affected.add(n + j);
  });
  const around = [...[...changingPositions].map((i) => placed[i]?.rect), ...moved.map((m) => m.rect)];
  for (const rect of around) {
    if (!rect) continue;
    for (const i of composite.near(rect, ABUTMENT_TOLERANCE)) {
      const p = combined[i];
      if (i < n && p && isPlacedMat(p)) affected.add(i);
    }
  }
  const ctx = designContext(design, senseAmpCount);
  const neighbours = previewNeighbours(combined, composite, affected);
  const mats = report.mats.slice();
  for (const i of affected) {
    const p = combined[i];
    if (!p || !isPlacedMat(p)) continue;
    const r = evaluatePlacedMat(p, i, combined, neighbours, ctx);
    const at = base.matOrder.get(r.matId);
    if (at !== undefined) mats[at] = r;
  }

  // Overlaps: the static pairs found once per gesture, plus those of the changed blocks, in design order.
  const overlaps: { overlap: Overlap; first: number; second: number }[] = base.staticOverlaps.map((o) => ({
    overlap: o,
    first: base.positionOf.get(o.firstId) ?? 0,
    second: base.positionOf.get(o.secondId) ?? 0,
  }));
  moved.forEach((m, j) => {
    for (const i of composite.near(m.rect, -ABUTMENT_TOLERANCE)) {
      if (i >= n && i - n <= j) continue;
      const other = combined[i];
      if (!other) continue;
      const shared = overlapArea(m.rect, other.rect);
      if (shared <= 0) continue;
      const mine = designOrder(n + j);
      const theirs = designOrder(i);
      const mineFirst = mine < theirs;
      overlaps.push({
        overlap: {
          firstId: mineFirst ? m.block.id : other.block.id,
          secondId: mineFirst ? other.block.id : m.block.id,
          area: shared,
        },
        first: Math.min(mine, theirs),
        second: Math.max(mine, theirs),
      });
    }
  });
  overlaps.sort((a, b) => a.first - b.first || a.second - b.second);

  const totals = computeTotals(current, currentMats, mats, design, ctx.sigmaMultiplier, senseAmpCount);
  const findings = collectFindings(
    mats,
    overlaps.map((o) => o.overlap),
    report.storedHigh,
    design,
  );
  return { mats, totals, storedHigh: report.storedHigh, findings };
}
