import { isPlacedMat, placeBlocks, type PlacedBlock } from '../geometry/placedBlocks';
import { placedDesign } from '../geometry/placedIndex';
import {
  ABUTMENT_TOLERANCE,
  area,
  bottom,
  boundingBox,
  overlapArea,
  right,
  type Rect,
} from '../geometry/rect';
import type { SpatialIndex } from '../geometry/spatialIndex';
import type { Block } from '../model/block';
import type { Design } from '../model/design';
import { collectFindings } from './checks';
import { evaluateMat } from './evaluate';
import type { Overlap } from './overlaps';
import type { Finding, MatReport, Report, Totals } from './report';

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
  /** Bounding box of the blocks that do not change. */
  readonly staticBox: Rect | null;
  readonly matOrder: ReadonlyMap<string, number>;
  /**
   * Scratch list: the placed blocks followed by the changed ones of the latest preview. Kept between
   * previews so that a pointer move does not copy thousands of entries.
   */
  readonly scratch: PlacedBlock[];
}

export function preparePreview(design: Design, report: Report, changingIds: Iterable<string>): PreviewBase {
  const { placed, index, positionOf } = placedDesign(design);
  const changing = new Set(changingIds);
  const changingPositions = new Set<number>();
  for (const id of changing) {
    const i = positionOf.get(id);
    if (i !== undefined) changingPositions.add(i);
  }
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  placed.forEach((p, i) => {
    if (changingPositions.has(i)) return;
    minX = Math.min(minX, p.rect.x);
    minY = Math.min(minY, p.rect.y);
    maxX = Math.max(maxX, right(p.rect));
    maxY = Math.max(maxY, bottom(p.rect));
  });
  return {
    design,
    report,
    changing,
    placed,
    index,
    positionOf,
    changingPositions,
    staticBox: minX === Infinity ? null : { x: minX, y: minY, width: maxX - minX, height: maxY - minY },
    matOrder: new Map(report.mats.map((m, i) => [m.matId, i])),
    scratch: placed.slice(),
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
 * The report of the design with the changing blocks replaced by `changed` (same ids; blocks are neither
 * added nor removed). Costs O(k log n) for k changed blocks, plus one pass over the mat reports.
 */
export function previewReport(base: PreviewBase, changed: readonly Block[]): Report {
  const { design, report, placed, index, changingPositions } = base;
  const moved = placeBlocks({ ...design, blocks: [...changed] });
  const n = placed.length;
  const combined = base.scratch;
  combined.length = n;
  combined.push(...moved);
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
  const storedHigh = report.storedHigh;
  const fresh: MatReport[] = [];
  const mats = report.mats.slice();
  for (const i of affected) {
    const p = combined[i];
    if (!p || !isPlacedMat(p)) continue;
    const r = evaluateMat(p, combined, composite, design.process, storedHigh);
    fresh.push(r);
    const at = base.matOrder.get(r.matId);
    if (at !== undefined) mats[at] = r;
  }
  fresh.sort((a, b) => (base.matOrder.get(a.matId) ?? 0) - (base.matOrder.get(b.matId) ?? 0));

  // Overlaps that involve a changed block, each pair once, first in design order first.
  const overlaps: Overlap[] = [];
  moved.forEach((m, j) => {
    for (const i of composite.near(m.rect, -ABUTMENT_TOLERANCE)) {
      if (i >= n && i - n <= j) continue;
      const other = combined[i];
      if (!other) continue;
      const shared = overlapArea(m.rect, other.rect);
      if (shared <= 0) continue;
      const mineFirst = designOrder(n + j) < designOrder(i);
      overlaps.push({
        firstId: mineFirst ? m.block.id : other.block.id,
        secondId: mineFirst ? other.block.id : m.block.id,
        area: shared,
      });
    }
  });

  const refreshed = new Set(fresh.map((m) => m.matId));
  const kept = report.findings.filter(
    (f) =>
      !f.blockIds.some((id) => base.changing.has(id)) &&
      (f.kind === 'overlap' || !f.blockIds.some((id) => refreshed.has(id))),
  );
  const added = collectFindings(fresh, overlaps, storedHigh, design.process.arrayVoltage).filter(
    (f: Finding) => f.blockIds.length > 0,
  );

  return { mats, totals: previewTotals(base, moved, mats), storedHigh, findings: [...kept, ...added] };
}

function previewTotals(base: PreviewBase, moved: readonly PlacedBlock[], mats: readonly MatReport[]): Totals {
  const before = base.report.totals;
  let placedArea = before.placedArea;
  for (const i of base.changingPositions) {
    const p = base.placed[i];
    if (p) placedArea -= area(p.rect);
  }
  for (const m of moved) placedArea += area(m.rect);
  let bits = 0;
  let cellArea = 0;
  let worstSenseSignal = Number.NaN;
  let worstSenseSignalMatId: string | null = null;
  for (const m of mats) {
    bits += m.bits;
    cellArea += m.cellArea;
    if (worstSenseSignalMatId === null || m.senseSignal < worstSenseSignal) {
      worstSenseSignal = m.senseSignal;
      worstSenseSignalMatId = m.matId;
    }
  }
  const box = boundingBox([...(base.staticBox ? [base.staticBox] : []), ...moved.map((m) => m.rect)]);
  const totalArea = box ? area(box) : 0;
  const areaPerBit = bits > 0 ? totalArea / bits : 0;
  const featureSize = base.design.process.featureSize;
  return {
    matCount: mats.length,
    bits,
    totalArea,
    placedArea,
    cellArea,
    arrayEfficiency: totalArea > 0 ? cellArea / totalArea : 0,
    areaPerBit,
    areaPerBitInF2: areaPerBit / (featureSize * featureSize),
    worstSenseSignal,
    worstSenseSignalMatId,
  };
}
