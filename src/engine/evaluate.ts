import { isPlacedMat, placeBlocks, type PlacedBlock, type PlacedMat } from '../geometry/placedBlocks';
import { buildSpatialIndex, type SpatialIndex } from '../geometry/spatialIndex';
import type { Design } from '../model/design';
import type { ProcessProfile } from '../model/process';
import { bitlineCapacitance } from './bitline';
import { collectFindings } from './checks';
import { matConnections } from './connectivity';
import { findOverlaps } from './overlaps';
import type { MatReport, Report } from './report';
import { chargeTransferRatio, readSignals } from './sensing';
import { storedHighLevel, type StoredHighLevel } from './storedLevel';
import { computeTotals } from './totals';

/** Figures of one placed mat, given its neighbours through the spatial index. */
export function evaluateMat(
  mat: PlacedMat,
  placed: readonly PlacedBlock[],
  index: SpatialIndex,
  process: ProcessProfile,
  storedHigh: StoredHighLevel,
): MatReport {
  const g = mat.geometry;
  const cbl = bitlineCapacitance(process, mat.block.cellsPerBitline, g.bitlineLength);
  const cs = mat.cell.storageCapacitance;
  const ctr = chargeTransferRatio(cs, cbl.total);
  const signals = readSignals(storedHigh.level, process.prechargeVoltage, ctr);
  const connections = matConnections(mat, placed, index);
  return {
    matId: mat.block.id,
    name: mat.block.name,
    cellId: mat.cell.id,
    cellsPerBitline: mat.block.cellsPerBitline,
    cellsPerWordline: mat.block.cellsPerWordline,
    bitlineCount: g.bitlineCount,
    wordlineCount: g.wordlineCount,
    bits: g.bits,
    area: g.width * g.height,
    cellArea: g.bits * g.cellArea,
    bitlineLength: g.bitlineLength,
    wordlineLength: g.wordlineLength,
    storageCapacitance: cs,
    bitlineCapacitance: cbl,
    chargeTransferRatio: ctr,
    ...signals,
    ...connections,
  };
}

/**
 * Evaluates a validated design: lays out its blocks, finds which strips serve which mat edges, and
 * computes each mat's bit-line capacitance, charge-transfer ratio and read signals, the area totals and
 * the checks.
 *
 * @param design a design that passed io/restore (SI units: metres, farads, volts).
 * @returns a {@link Report} whose numbers are all in SI units; mats appear in the design's block order.
 */
export function evaluate(design: Design): Report {
  const placed = placeBlocks(design);
  const index = buildSpatialIndex(placed.map((p) => p.rect));
  const storedHigh = storedHighLevel(design.process);
  const mats: MatReport[] = [];
  for (const p of placed) {
    if (isPlacedMat(p)) mats.push(evaluateMat(p, placed, index, design.process, storedHigh));
  }
  const overlaps = findOverlaps(placed, index);
  return {
    mats,
    totals: computeTotals(placed, mats, design.process.featureSize),
    storedHigh,
    findings: collectFindings(mats, overlaps, storedHigh, design.process.arrayVoltage),
  };
}

/** The report of one mat, or undefined when the id names no mat. */
export function findMatReport(report: Report, matId: string): MatReport | undefined {
  return report.mats.find((m) => m.matId === matId);
}
