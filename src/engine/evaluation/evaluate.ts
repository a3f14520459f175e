import { bandedNeighbourTable } from '../../geometry/bandedPairs';
import {
  BLOCK_TYPE_CODES,
  blockTable,
  kindAt,
  MAT_CODE,
  type BlockTable,
  type MatKind,
} from '../../geometry/blockTable';
import { groupedGridTable } from '../../geometry/neighbourGrid';
import type { NeighbourTable } from '../../geometry/neighbourRows';
import { ABUTMENT_TOLERANCE } from '../../geometry/rect';
import type { Design } from '../../model/design';
import { collectFindings } from './checks';
import { layoutState } from './layoutFindings';
import { emptyConnections, type MatConnections } from './connectivity';
import { designContext as contextOf, type DesignContext } from './designContext';
import { figuresOfKind, unservedFiguresKey } from './figureRecipes';
import { senseAmpsOfMat } from './matPhysics';
import { findPositionedOverlaps } from './overlaps';
import { rememberReportState } from './reportState';
import type { MatFigures, MatReport, Report } from './report';
import { matAt, matIndexOf, MatTableBuilder } from './matTable';
import type { ServedLines } from './servedLines';
import { connectAllMats } from './servedRuns';
import { computeTotals } from './totals';

export { MINIMUM_LEAKAGE } from './designContext';

/** The design-wide values every mat needs, for a design whose floorplan has these counts. */
export function designContext(design: Design, senseAmpCount: number, cellCount: number): DesignContext {
  return contextOf(design.process, design.operating, senseAmpCount, cellCount);
}

/** Sense amplifiers of all mats: the floorplan's share of the die's failure allowance. */
export function countSenseAmps(table: BlockTable): number {
  // Once per kind, then counted per kind: no cell read per mat (cells of different designs may have
  // different shapes, and a compiled loop reading them is thrown away).
  const perKind = new Float64Array(table.kinds.length);
  for (let k = 0; k < perKind.length; k++) perKind[k] = senseAmpsOfMat(table.kinds[k] as MatKind);
  return sumOverMats(table, perKind);
}

/** Cells of all mats: the floorplan's share of the die's cells, among which the weakest is sought. */
export function countCells(table: BlockTable): number {
  const perKind = new Float64Array(table.kinds.length);
  for (let k = 0; k < perKind.length; k++) perKind[k] = (table.kinds[k] as MatKind).geometry.bits;
  return sumOverMats(table, perKind);
}

/** Below this every multiple of ½ is a double, exactly (2^52 / 2). */
const EXACT_HALVES = 2 ** 51;

/**
 * Σ over the mats of their kind's value, as a sum mat by mat in design order gives it. When every value
 * is a multiple of ½ and the sum of magnitudes stays below 2^51, every partial sum in any order is exact,
 * so mats per kind × value per kind is that sum to the bit; otherwise the mats are summed one by one.
 */
function sumOverMats(table: BlockTable, perKind: Float64Array): number {
  const matsOfKind = table.sums.matsOfKind;
  let sum = 0;
  let magnitude = 0;
  let exact = true;
  for (let k = 0; k < perKind.length; k++) {
    const value = perKind[k] as number;
    const mats = matsOfKind[k] ?? 0;
    if (!Number.isInteger(2 * value)) exact = false;
    sum += mats * value;
    magnitude += mats * Math.abs(value);
  }
  return exact && magnitude < EXACT_HALVES ? sum : sumMatByMat(table, perKind);
}

/** Σ over the mats of their kind's value, mat by mat in design order. */
function sumMatByMat(table: BlockTable, perKind: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < table.count; i++) {
    const kind = table.kindOf[i] as number;
    if (kind >= 0) sum += perKind[kind] as number;
  }
  return sum;
}

/** Filled for one mat at a time and read at once, so one record serves every mat. */
const connections = emptyConnections();

/** Mats in the table. */
export function countMats(table: BlockTable): number {
  let count = 0;
  for (const mats of table.sums.matsOfKind) count += mats;
  return count;
}

/**
 * Evaluates every mat into `builder`, in design order: the connection pass (servedRuns.ts), then each
 * mat's figures, shared by mats of one kind and connections (computed when a key is first met, in the
 * order matEvaluation.ts evaluateMatAt would meet it, so the report's figures list is the same).
 */
export function evaluateAllMats(
  table: BlockTable,
  neighbours: NeighbourTable,
  ctx: DesignContext,
  builder: MatTableBuilder,
  matCount: number,
): void {
  const lines = connectAllMats(table, neighbours, matCount, builder);
  assignFigures(table, lines, ctx, builder, new Map<number | string, MatFigures>());
}

/** The figures of mats with this connection `key`, computed once per key (see matEvaluation.ts, evaluateMatAt). */
function figuresOf(
  table: BlockTable,
  at: number,
  c: MatConnections,
  ctx: DesignContext,
  figuresByKind: Map<number | string, MatFigures>,
  key: number | string,
): MatFigures {
  let figures = figuresByKind.get(key);
  if (!figures) {
    figures = figuresOfKind(kindAt(table, at), c, ctx);
    figuresByKind.set(key, figures);
  }
  return figures;
}

/**
 * Each mat's figures from its connections: a run of mats that leave no line unserved and share a kind
 * and sense-amplifier ends gets one figures object at once; any other mat its own lookup.
 */
function assignFigures(
  table: BlockTable,
  lines: ServedLines,
  ctx: DesignContext,
  builder: MatTableBuilder,
  figuresByKind: Map<number | string, MatFigures>,
): void {
  const { position, servedKey } = lines;
  builder.setLines(lines.count, position, lines.unsensedBitlines, lines.undrivenWordlines);
  let runStart = 0;
  let runKey = lines.count > 0 ? (servedKey[0] as number) : -1;
  for (let k = 1; k <= lines.count; k++) {
    const key = k < lines.count ? (servedKey[k] as number) : -2;
    if (key === runKey && key >= 0) continue;
    // The run runStart … k − 1 ends here (a mat with unserved lines is a run of its own).
    builder.setFigures(runStart, k, figuresOfMat(table, lines, runStart, ctx, figuresByKind));
    runStart = k;
    runKey = key;
  }
}

/** The figures of mat k of `lines`, found or computed by its connection key (see matEvaluation.ts, evaluateMatAt). */
function figuresOfMat(
  table: BlockTable,
  lines: ServedLines,
  k: number,
  ctx: DesignContext,
  figuresByKind: Map<number | string, MatFigures>,
): MatFigures {
  const at = lines.position[k] as number;
  const c = connections;
  c.unsensedBitlines = lines.unsensedBitlines[k] as number;
  c.undrivenWordlines = lines.undrivenWordlines[k] as number;
  c.senseAmpEnds = lines.senseAmpEnds[k] as number;
  c.unpartneredBitlines = lines.unpartneredBitlines[k] as number;
  const served = lines.servedKey[k] as number;
  const key = served >= 0 ? served : unservedFiguresKey(table.kindOf[at] as number, c);
  return figuresOf(table, at, c, ctx, figuresByKind, key);
}

/**
 * The neighbours evaluation reads, found in one grid pass: a mat and a strip that meet (which strips
 * serve a mat; which mats lie beyond a sense-amplifier strip) and any two blocks that overlap (the overlap
 * check). Two strips touching at a corner, or mats side by side, serve nothing and are left out.
 */
export function evaluationNeighbours(table: BlockTable): NeighbourTable {
  // Mats in one group, every other block in the other: pairs across the groups that meet are kept, pairs
  // within one only when they overlap (overlapAreaAt > 0: more than the tolerance both ways). Floorplans
  // written row by row take the banded pass; anything else the grid, with the same result.
  return (
    bandedNeighbourTable(table, ABUTMENT_TOLERANCE, table.type, MAT_GROUP) ??
    groupedGridTable(table, ABUTMENT_TOLERANCE, matGroups(table))
  );
}

/** The group of each block type code: 1 for mats, 0 for every other block. */
const MAT_GROUP = Uint8Array.from(BLOCK_TYPE_CODES, (_, code) => (code === MAT_CODE ? 1 : 0));

function matGroups(table: BlockTable): Uint8Array {
  const isMat = new Uint8Array(table.count);
  for (let i = 0; i < table.count; i++) if (table.type[i] === MAT_CODE) isMat[i] = 1;
  return isMat;
}

/**
 * Evaluates a validated design: lays out its blocks, finds which strips serve which mat edges, and
 * computes every mat's capacitance, read signals, offset and noise budget, margin, retention, delays and
 * energy, then the area and refresh totals and the checks.
 *
 * @param design a design that passed io/restore (SI units: metres, farads, volts, seconds, kelvin).
 * @returns a {@link Report} whose numbers are all in SI units; mats appear in the design's block order.
 */
export function evaluate(design: Design): Report {
  const table = blockTable(design);
  const neighbours = evaluationNeighbours(table);
  const senseAmpCount = countSenseAmps(table);
  const ctx = designContext(design, senseAmpCount, countCells(table));
  const matCount = countMats(table);
  const builder = new MatTableBuilder(design.blocks, matCount);
  evaluateAllMats(table, neighbours, ctx, builder, matCount);
  const mats = builder.finish();
  const overlaps = findPositionedOverlaps(table, neighbours);
  const totals = computeTotals(table, mats, design, ctx, senseAmpCount, overlaps, neighbours.runs ?? null);
  const layout = layoutState(table, mats, undefined, neighbours.runs ?? null);
  const report: Report = {
    mats,
    totals,
    storedHigh: ctx.storedHigh,
    findings: [...collectFindings(mats, overlaps, ctx.storedHigh, design), ...layout.findings],
  };
  rememberReportState(report, { table, overlaps, matIndexAt: layout.matIndexAt, layout });
  return report;
}

/** The report of one mat, or undefined when the id names no mat. */
export function findMatReport(report: Report, matId: string): MatReport | undefined {
  const k = matIndexOf(report.mats, matId);
  return k < 0 ? undefined : matAt(report.mats, k);
}
