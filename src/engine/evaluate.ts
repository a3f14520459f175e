import { neighbourTable, type NeighbourTable } from '../geometry/neighbourGrid';
import { isPlacedMat, placeBlocks, type PlacedBlock, type PlacedMat } from '../geometry/placedBlocks';
import { ABUTMENT_TOLERANCE, overlapArea } from '../geometry/rect';
import type { Design } from '../model/design';
import { collectFindings } from './checks';
import { matConnections } from './connectivity';
import { matPhysics, senseAmpsOfMat, type DesignContext } from './matPhysics';
import { offsetSigmaMultiplier } from './offset';
import { unpartneredBitlines } from './openBitline';
import type { Overlap } from './overlaps';
import type { MatFigures, MatReport, Report } from './report';
import { leakageAtTemperature } from './retention';
import { storedHighLevel } from './storedLevel';
import { computeTotals } from './totals';

/** Smallest leakage the engine uses (A): far below any physical cell, 1e-30 A keeps retention finite. */
export const MINIMUM_LEAKAGE = 1e-30;

/** The design-wide values every mat needs (stored level, k of the offset budget, leakage at temperature). */
export function designContext(design: Design, senseAmpCount: number): DesignContext {
  const { process, operating } = design;
  return {
    process,
    operating,
    storedHigh: storedHighLevel(process),
    sigmaMultiplier: offsetSigmaMultiplier(senseAmpCount, operating.allowedSenseFailures),
    // Floored so that zero leakage (allowed) or an exp() underflow at low temperature still gives a
    // finite, if enormous, retention time instead of Infinity or 0/0.
    leakage: Math.max(
      MINIMUM_LEAKAGE,
      leakageAtTemperature(
        process.cellLeakageCurrent,
        process.leakageReferenceTemperature,
        process.leakageActivationEnergy,
        operating.temperature,
      ),
    ),
  };
}

/** Sense amplifiers of all mats: the count that shares the failure allowance. */
export function countSenseAmps(mats: readonly PlacedMat[]): number {
  let count = 0;
  for (const m of mats) count += senseAmpsOfMat(m);
  return count;
}

/**
 * Figures of one placed mat: its connections from its neighbours, then its physics. Mats with the same
 * cell, cell counts and sense-amplifier arrangement have the same physics, so with a `figuresByKind`
 * map a regular array computes it once per kind of mat and every mat of that kind shares the object.
 */
export function evaluatePlacedMat(
  mat: PlacedMat,
  /** The mat's position in `placed` and in the neighbour table. */
  at: number,
  placed: readonly PlacedBlock[],
  neighbours: NeighbourTable,
  ctx: DesignContext,
  figuresByKind?: Map<string, MatFigures>,
): MatReport {
  const connections = matConnections(mat, at, placed, neighbours);
  const lost = unpartneredBitlines(
    mat,
    connections.senseAmpContacts,
    connections.senseAmpEnds,
    placed,
    neighbours,
  );
  const kind = `${mat.cell.id}|${mat.block.cellsPerBitline}|${mat.block.cellsPerWordline}|${connections.senseAmpEnds}|${lost}`;
  let figures = figuresByKind?.get(kind);
  if (!figures) {
    figures = matPhysics(mat, connections.senseAmpEnds, lost, ctx);
    figuresByKind?.set(kind, figures);
  }
  return {
    matId: mat.block.id,
    name: mat.block.name,
    senseAmpStripIds: connections.senseAmpStripIds,
    wordlineDriverIds: connections.wordlineDriverIds,
    unsensedBitlines: connections.unsensedBitlines,
    undrivenWordlines: connections.undrivenWordlines,
    figures,
  };
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
  const placed = placeBlocks(design);
  // Every block's neighbours in one grid pass; they serve both the overlap check and mat connections.
  const neighbours = neighbourTable(
    placed.map((p) => p.rect),
    ABUTMENT_TOLERANCE,
  );
  const mats = placed.filter(isPlacedMat);
  const senseAmpCount = countSenseAmps(mats);
  const ctx = designContext(design, senseAmpCount);
  const figuresByKind = new Map<string, MatFigures>();
  const matReports: MatReport[] = [];
  const overlaps: Overlap[] = [];
  const { start, end, list } = neighbours;
  for (let i = 0; i < placed.length; i++) {
    const a = placed[i] as PlacedBlock;
    // Rows are ascending, so pairs come out in design order of the first and then the second block.
    for (let k = start[i] as number; k < (end[i] as number); k++) {
      const j = list[k] as number;
      if (j <= i) continue;
      const b = placed[j] as PlacedBlock;
      const shared = overlapArea(a.rect, b.rect);
      if (shared > 0) overlaps.push({ firstId: a.block.id, secondId: b.block.id, area: shared });
    }
    if (isPlacedMat(a)) matReports.push(evaluatePlacedMat(a, i, placed, neighbours, ctx, figuresByKind));
  }
  const totals = computeTotals(placed, mats, matReports, design, ctx.sigmaMultiplier, senseAmpCount);
  return {
    mats: matReports,
    totals,
    storedHigh: ctx.storedHigh,
    findings: collectFindings(matReports, overlaps, ctx.storedHigh, design),
  };
}

/** The report of one mat, or undefined when the id names no mat. */
export function findMatReport(report: Report, matId: string): MatReport | undefined {
  return report.mats.find((m) => m.matId === matId);
}
