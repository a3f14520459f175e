import { isPlacedMat, placeBlocks, type PlacedMat } from '../geometry/placedBlocks';
import { buildSpatialIndex } from '../geometry/spatialIndex';
import type { Design } from '../model/design';
import { collectFindings } from './checks';
import { matConnections } from './connectivity';
import { matPhysics, senseAmpsOfMat, type DesignContext } from './matPhysics';
import { offsetSigmaMultiplier } from './offset';
import { unpartneredBitlines } from './openBitline';
import { findOverlaps } from './overlaps';
import type { MatReport, Report } from './report';
import { leakageAtTemperature } from './retention';
import { storedHighLevel } from './storedLevel';
import { computeTotals } from './totals';

/** Smallest leakage the engine uses (A): far below any physical cell, 1e-30 A keeps retention finite. */
export const MINIMUM_LEAKAGE = 1e-30;

/**
 * Evaluates a validated design: lays out its blocks, finds which strips serve which mat edges, and
 * computes every mat's capacitance, read signals, offset and noise budget, margin, retention, delays and
 * energy, then the area and refresh totals and the checks.
 *
 * @param design a design that passed io/restore (SI units: metres, farads, volts, seconds, kelvin).
 * @returns a {@link Report} whose numbers are all in SI units; mats appear in the design's block order.
 */
export function evaluate(design: Design): Report {
  const { process, operating } = design;
  const placed = placeBlocks(design);
  const index = buildSpatialIndex(placed.map((p) => p.rect));
  const mats = placed.filter(isPlacedMat);

  // The offset budget depends on how many sense amplifiers share the failure allowance.
  let senseAmpCount = 0;
  for (const m of mats) senseAmpCount += senseAmpsOfMat(m);
  const ctx: DesignContext = {
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

  const matReports: MatReport[] = mats.map((mat: PlacedMat) => {
    const connections = matConnections(mat, placed, index);
    const lost = unpartneredBitlines(
      mat,
      connections.senseAmpContacts,
      connections.senseAmpEnds,
      placed,
      index,
    );
    return matPhysics(mat, connections, lost, ctx);
  });
  const overlaps = findOverlaps(placed, index);
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
