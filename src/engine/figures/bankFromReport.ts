import { figuresAt, type MatTable } from '../evaluation/matTable';
import { findMatReport } from '../evaluation/evaluate';
import type { MatFigures, Report } from '../evaluation/report';
import { yieldFiguresOf } from '../evaluation/yieldFigures';
import type { Design } from '../../model/design';
import type { PartitionFigures } from './bankFigure';

/** The figures of the mat with the largest value of `pick` (the first such mat), or undefined without mats. */
function largest(mats: MatTable, pick: (f: MatFigures) => number): MatFigures | undefined {
  let best: MatFigures | undefined;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    if (!best || pick(f) > pick(best)) best = f;
  }
  return best;
}

/**
 * The figures of the mat with the largest value of `pick` that exists (NaN ignored, as the totals do),
 * the first mat when it exists for none, or undefined without mats.
 */
function largestExisting(mats: MatTable, pick: (f: MatFigures) => number): MatFigures | undefined {
  let best: MatFigures | undefined;
  for (let k = 0; k < mats.count; k++) {
    const f = figuresAt(mats, k);
    if (!best || pick(f) > pick(best) || (Number.isNaN(pick(best)) && !Number.isNaN(pick(f)))) best = f;
  }
  return best;
}

/** The comparison figures of an evaluated design (the design gives the yield settings). */
export function figuresFromReport(report: Report, design: Design): PartitionFigures {
  const y = yieldFiguresOf(report, design);
  const t = report.totals;
  const worstMargin = findMatReport(report, t.worstSenseMarginMatId ?? '');
  const slowest = largest(report.mats, (f) => f.wordlineDelay);
  const slowestRcd = largestExisting(report.mats, (f) => f.timing.rcd);
  const slowestRc = largestExisting(report.mats, (f) => f.timing.rc);
  const hungriest = largest(report.mats, (f) => f.activationEnergy.perBit);
  const kinds = (severity: 'error' | 'warning') =>
    [...new Set(report.findings.filter((f) => f.severity === severity).map((f) => f.kind))].sort();
  return {
    matCount: t.matCount,
    usableBits: t.usableBits,
    totalArea: t.totalArea,
    cellArea: t.cellArea,
    areaPerBit: t.usableBits > 0 ? t.areaPerBit : Number.NaN,
    areaPerBitInF2: t.usableBits > 0 ? t.areaPerBitInF2 : Number.NaN,
    arrayEfficiency: t.arrayEfficiency,
    senseMargin: t.worstSenseMargin,
    senseSignalAtRefresh: worstMargin?.figures.senseSignalAfterRefresh ?? Number.NaN,
    requiredSignal: worstMargin?.figures.requiredSignal ?? Number.NaN,
    wordlineDelay: t.worstWordlineDelay,
    wordlineResistance: slowest?.wordlineResistance ?? Number.NaN,
    wordlineCapacitance: slowest?.wordlineCapacitance ?? Number.NaN,
    activationEnergyPerBit: hungriest?.activationEnergy.perBit ?? Number.NaN,
    activationEnergy: hungriest?.activationEnergy.total ?? Number.NaN,
    cellsPerWordline: hungriest?.cellsPerWordline ?? Number.NaN,
    rowToColumnDelay: t.worstRowToColumnDelay,
    wordlineTurnOn: slowestRcd?.timing.wordlineOn ?? Number.NaN,
    senseFireWait: slowestRcd?.timing.development ?? Number.NaN,
    latchTime: slowestRcd?.timing.latch ?? Number.NaN,
    rowCycleTime: t.worstRowCycleTime,
    rowActiveTime: slowestRc?.timing.ras ?? Number.NaN,
    rowPrechargeTime: slowestRc?.timing.rp ?? Number.NaN,
    retentionTime: t.shortestRetention,
    weakestRetentionTime: t.shortestWeakestRetention,
    refreshCycleTime: t.refresh.cycleTime,
    refreshInterval: t.refresh.interval,
    refreshBusyFraction: t.refresh.busyFraction,
    refreshPower: t.refresh.power,
    dieYield: y.dieYield,
    repairProbability: y.repairProbability,
    redundancyArea: y.redundancyArea,
    areaPerBitWithRedundancy: y.areaPerBitWithRedundancy,
    goodDiesPerWafer: y.goodDiesPerWafer,
    spareRows: y.settings.spareRows,
    spareColumns: y.settings.spareColumns,
    errorKinds: kinds('error'),
    warningKinds: kinds('warning'),
  };
}
