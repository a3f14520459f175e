import { blockTable, MAT_CODE, rectAt, type BlockTable, type MatKind } from '../../geometry/blockTable';
import { withBlocksReplaced } from '../../geometry/replacedBlocks';
import { senseAmpsOfMat } from './matPhysics';
import { neighbourTableOf, type NeighbourTable } from '../../geometry/neighbourRows';
import { placedDesign } from '../../geometry/placedIndex';
import { ABUTMENT_TOLERANCE, bottom, right, type Rect } from '../../geometry/rect';
import type { SpatialIndex } from '../../geometry/spatialIndex';
import type { Block } from '../../model/block';
import type { Design } from '../../model/design';
import { collectFindings } from './checks';
import { layoutStateAfterEdit } from './layoutAfterEdit';
import { layoutState, type LayoutState } from './layoutFindings';
import { matIndexByPosition } from './decoderReach';
import { designContext, evaluate, evaluationNeighbours } from './evaluate';
import { copyMat, evaluateMatAt, refigured } from './matEvaluation';
import { findPositionedOverlaps, overlapAreaAt, type PositionedOverlap } from './overlaps';
import { rememberReportState, reportState } from './reportState';
import type { MatFigures, Report } from './report';
import { figuresAt, MatTableBuilder, shareIdIndex } from './matTable';
import { computeTotals } from './totals';

/**
 * Live figures while a gesture changes a few blocks of a large design: instead of evaluating the whole
 * design on every pointer move, only the changed blocks and the mats beside their old and new places
 * are evaluated again, and the totals are recomputed from the mat reports. The result equals evaluate()
 * of the changed design (tested), so the panels can follow a drag frame by frame on a 4,096-mat floorplan.
 */

/** What stays fixed during one gesture: the design and report before it, and which blocks change. */
export interface PreviewBase {
  readonly design: Design;
  readonly report: Report;
  readonly changing: ReadonlySet<string>;
  /** The design's blocks laid out before the gesture. */
  readonly table: BlockTable;
  /** R-tree over the same blocks in the same order (shared with the canvas). */
  readonly index: SpatialIndex;
  readonly positionOf: ReadonlyMap<string, number>;
  /** Design positions of the changing blocks. */
  readonly changingPositions: ReadonlySet<number>;
  /** For each design position, the index of its mat in the report, or −1. */
  readonly matIndexAt: Int32Array;
  /** Overlapping pairs among the blocks that do not change, found once per gesture. */
  readonly staticOverlaps: readonly PositionedOverlap[];
  /** The layout checks of the design before the gesture. */
  readonly layout: LayoutState;
  /**
   * Mat figures computed during the gesture, per kind of mat and connection key (see evaluateMatAt):
   * frames of one gesture share the design-wide values (the counts are the same, or the whole design is
   * evaluated), so a mat dragged across the floorplan is computed once per arrangement, not per frame.
   */
  readonly figures: Map<MatKind, Map<number | string, MatFigures>>;
}

export function preparePreview(design: Design, report: Report, changingIds: Iterable<string>): PreviewBase {
  const { index, positionOf } = placedDesign(design);
  // The table and overlaps evaluate() (or the previous edit) left with the report, when it is this design's.
  const known = reportState(report);
  const state = known && known.table.count === design.blocks.length ? known : undefined;
  const table = state?.table ?? blockTable(design);
  const overlaps = state?.overlaps ?? findPositionedOverlaps(table, evaluationNeighbours(table));
  const matIndexAt = state?.matIndexAt ?? matIndexByPosition(report.mats, table.count);
  const layout = state?.layout ?? layoutState(table, report.mats, matIndexAt);
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
    table,
    index,
    positionOf,
    changingPositions,
    matIndexAt,
    layout,
    figures: new Map(),
    staticOverlaps: overlaps.filter(
      (o) => !changingPositions.has(o.first) && !changingPositions.has(o.second),
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
  current: BlockTable,
  composite: SpatialIndex,
  mats: ReadonlySet<number>,
): NeighbourTable {
  const rows = new Map<number, number[]>();
  const rowOf = (i: number): number[] => {
    let row = rows.get(i);
    if (!row) {
      row = composite.near(rectAt(current, i), ABUTMENT_TOLERANCE).filter((j) => j !== i);
      rows.set(i, row);
    }
    return row;
  };
  for (const i of mats) {
    for (const j of rowOf(i)) if (current.blocks[j]?.type === 'senseAmpStrip') rowOf(j);
  }
  return neighbourTableOf(current.count, rows);
}

/**
 * The report of the design with the changing blocks replaced by `changed` (same ids; blocks are neither
 * added nor removed). Mats beside a changed block are evaluated again through a composite index (the
 * static index without the changing blocks, plus their new places); every other mat keeps its report.
 * Totals and findings are then recomputed from the mat reports in one linear pass. When the change
 * alters the number of sense amplifiers or cells (a resize), every margin moves with k and every
 * retention with the weakest cell: every other mat's figures are then computed again from its kind and
 * connections (once per distinct figures), without finding its neighbours again.
 */
export function previewReport(
  base: PreviewBase,
  changed: readonly Block[],
  /** The edited design's block list when there is one (a commit), so that it is not copied again. */
  blocks?: readonly Block[],
): Report {
  const { design, report, index, changingPositions } = base;
  const replacements = new Map<number, Block>();
  for (const block of changed) {
    const at = base.positionOf.get(block.id);
    if (at !== undefined) replacements.set(at, block);
  }
  // The design as it stands during the gesture, in design order.
  const current = withBlocksReplaced(base.table, replacements, blocks);
  // The counts change only by what the replaced mats had and have.
  let senseAmpCount = report.totals.senseAmpCount;
  let cellCount = report.totals.bits;
  for (const i of replacements.keys()) {
    for (const [table, sign] of [
      [base.table, -1],
      [current, 1],
    ] as const) {
      const kind = table.kindOf[i] as number;
      if (kind < 0) continue;
      senseAmpCount += sign * senseAmpsOfMat(table.kinds[kind] as MatKind);
      cellCount += sign * (table.kinds[kind] as MatKind).geometry.bits;
    }
  }
  // k of the offset budget follows the sense-amplifier count, the weakest cell the cell count: when they
  // change, every mat's figures are computed again from its kind and connections, which stay as they were
  // for the mats away from the change.
  const countsChanged = senseAmpCount !== report.totals.senseAmpCount || cellCount !== report.totals.bits;

  const composite: SpatialIndex = {
    near(rect, margin) {
      const hits = index.near(rect, margin).filter((i) => !changingPositions.has(i));
      for (const i of replacements.keys()) if (intersects(rect, rectAt(current, i), margin)) hits.push(i);
      return hits;
    },
  };

  // Mats to evaluate again: the changed ones and every mat beside an old or a new place.
  const affected = new Set<number>();
  for (const i of replacements.keys()) if (current.type[i] === MAT_CODE) affected.add(i);
  const around: Rect[] = [];
  for (const i of replacements.keys()) around.push(rectAt(base.table, i), rectAt(current, i));
  for (const rect of around) {
    for (const i of composite.near(rect, ABUTMENT_TOLERANCE))
      if (current.type[i] === MAT_CODE) affected.add(i);
  }
  const ctx = designContext(design, senseAmpCount, cellCount);
  const neighbours = previewNeighbours(current, composite, affected);
  // Every other mat keeps its row of the report's table; the figures list is extended, never reordered
  // (or started again when every mat's figures change).
  const builder = countsChanged
    ? new MatTableBuilder(current.blocks, report.mats.count)
    : new MatTableBuilder(current.blocks, report.mats.count, report.mats.figures);
  // Figures computed with this gesture's design-wide values, per kind of mat and connection key.
  const cache = countsChanged ? new Map<MatKind, Map<number | string, MatFigures>>() : base.figures;
  const redone = new Set<number>();
  for (const i of affected) {
    const k = base.matIndexAt[i] ?? -1;
    if (k < 0) continue;
    const kind = current.kinds[current.kindOf[i] as number] as MatKind;
    let figures = cache.get(kind);
    if (!figures) cache.set(kind, (figures = new Map()));
    evaluateMatAt(current, i, neighbours, ctx, builder, k, figures);
    redone.add(k);
  }
  if (countsChanged) {
    const again = new Map<MatFigures, MatFigures>();
    for (let k = 0; k < report.mats.count; k++) {
      if (redone.has(k)) continue;
      const before = figuresAt(report.mats, k);
      let after = again.get(before);
      if (!after) {
        after = refigured(before, ctx);
        // Figures from elsewhere (none are, today): evaluate the design whole.
        if (!after) return evaluate({ ...design, blocks: current.blocks.slice() });
        again.set(before, after);
      }
      copyMat(builder, k, report.mats, after);
    }
  } else {
    for (let k = 0; k < report.mats.count; k++) if (!redone.has(k)) copyMat(builder, k, report.mats);
  }
  const mats = builder.finish();
  // Same mats under the same ids in the same order: the id lookup carries over.
  shareIdIndex(report.mats, mats);

  // Overlaps: the static pairs found once per gesture, plus those of the changed blocks, in design order.
  const overlaps: PositionedOverlap[] = base.staticOverlaps.slice();
  for (const i of replacements.keys()) {
    for (const j of composite.near(rectAt(current, i), -ABUTMENT_TOLERANCE)) {
      // A pair of two changed blocks is found from both; keep it once.
      if (j === i || (replacements.has(j) && j < i)) continue;
      const area = overlapAreaAt(current, i, j);
      if (area <= 0) continue;
      const first = Math.min(i, j);
      const second = Math.max(i, j);
      overlaps.push({
        overlap: {
          firstId: current.blocks[first]?.id ?? '',
          secondId: current.blocks[second]?.id ?? '',
          area,
        },
        first,
        second,
      });
    }
  }
  overlaps.sort((a, b) => a.first - b.first || a.second - b.second);

  const totals = computeTotals(current, mats, design, ctx, senseAmpCount, overlaps);
  const layout = layoutStateAfterEdit(
    base.layout,
    report.mats,
    current,
    mats,
    { changed: [...replacements.keys()], redone, matIndexAt: base.matIndexAt },
    (i) => composite.near(rectAt(current, i), 2 * ABUTMENT_TOLERANCE),
  );
  const findings = [
    ...collectFindings(mats, overlaps, ctx.storedHigh, design, current.blocks),
    ...layout.findings,
  ];
  const result: Report = { mats, totals, storedHigh: ctx.storedHigh, findings };
  rememberReportState(result, { table: current, overlaps, matIndexAt: base.matIndexAt, layout });
  return result;
}
