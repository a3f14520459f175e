import type { BuildSpec } from '../designs/buildPartition';
import { planPartition, type PartitionPlan } from '../designs/partitionPlan';
import {
  designContext,
  firingKinds,
  FULLY_SERVED,
  matPhysics,
  refreshBusyFraction,
  refreshCycleTime,
  refreshInterval,
  refreshPower,
  refreshRowCycle,
  rowsPerRefreshCommand,
  senseAmpsOfMat,
  storedHighLevel,
  LineTimeMemo,
  gridRepairPlan,
  matDomainShare,
  retentionTailAt,
  yieldOfDomains,
  type CheckedFigures,
  type PartitionFigures,
  type MatFigures,
  type StoredHighLevel,
} from '../engine';
import { matGeometry, matRect } from '../geometry/matGeometry';
import type { PlacedMat } from '../geometry/placedBlocks';
import type { Mat } from '../model/block';
import { DEFAULT_REPAIR } from '../model/builtins';
import type { OperatingConditions } from '../model/operating';
import type { ProcessProfile } from '../model/process';

/** The spec of one partition to assess: a build spec without a library or name. */
export type PartitionPointSpec = Omit<BuildSpec, 'cells' | 'name'>;

export type PartitionFiguresResult =
  | { readonly ok: true; readonly figures: PartitionFigures; readonly plan: PartitionPlan }
  | { readonly ok: false; readonly error: string };

/**
 * Values points of a sweep share, computed once: per process and operating conditions the stored-1 level
 * (a bisection); across the whole sweep the word lines' step responses by driver-to-line resistance ratio
 * (a root find per ratio and level instead of one per point; the same numbers).
 */
export class ProcessCache {
  readonly lineTimes = new LineTimeMemo();
  private readonly entries = new Map<
    ProcessProfile,
    { operating: OperatingConditions; storedHigh: StoredHighLevel }
  >();

  get(process: ProcessProfile, operating: OperatingConditions) {
    const hit = this.entries.get(process);
    if (hit && hit.operating === operating) return hit;
    const entry = { operating, storedHigh: storedHighLevel(process) };
    this.entries.set(process, entry);
    return entry;
  }
}

/** Every mat of a built bank has a sense-amplifier strip at both bit-line ends and drivers at both word-line ends. */
const SENSE_AMP_ENDS = 2;

/**
 * The comparison figures of the bank buildPartition() would build, without building it. Every mat of
 * that bank is the same mat with the same neighbours: a sense-amplifier strip above and below, drivers
 * left and right, so the engine's own matPhysics() runs once on one representative mat, and the totals
 * follow in closed form from the plan (grid, bounding box, usable bits). Only the open-array edge loss
 * differs between mats, and it changes nothing but the usable bits, which the plan counts. A test
 * checks the result against evaluate() on the built design.
 */
export function partitionFigures(
  spec: PartitionPointSpec,
  cache: ProcessCache = new ProcessCache(),
  options: YieldOptions = {},
): PartitionFiguresResult {
  const { process, operating, cell } = spec;
  const planned = planPartition({
    targetBits: spec.targetBits,
    cell,
    featureSize: process.featureSize,
    cellsPerBitline: spec.cellsPerBitline,
    cellsPerWordline: spec.cellsPerWordline,
    strips: spec.strips,
  });
  if (!planned.ok) return planned;
  const plan = planned.plan;
  const block: Mat = {
    id: 'mat-r0c0',
    name: 'Mat 1.1',
    type: 'mat',
    x: 0,
    y: 0,
    cellId: cell.id,
    cellsPerBitline: spec.cellsPerBitline,
    cellsPerWordline: spec.cellsPerWordline,
    bitlineAxis: 'vertical',
  };
  const geometry = matGeometry(block, cell, process.featureSize);
  const placed: PlacedMat = { block, rect: matRect(block, geometry), cell, geometry };
  const shared = cache.get(process, operating);
  const senseAmpCount = senseAmpsOfMat(placed) * plan.matCount;
  const ctx = designContext(
    process,
    operating,
    senseAmpCount,
    geometry.bits * plan.matCount,
    shared.storedHigh,
    cache.lineTimes,
  );
  // Every mat has strips at both bit-line ends and drivers at both word-line ends; the open-array edge
  // loss changes only the usable bits, which the plan counts.
  const mat = matPhysics(placed, { ...FULLY_SERVED, senseAmpEnds: SENSE_AMP_ENDS }, ctx);

  const totalArea = plan.width * plan.height;
  const cellArea = plan.usableBits * geometry.cellArea;
  const areaPerBit = totalArea / plan.usableBits;
  // Mats side by side share a row (one band), so the bank has matRows × word lines rows to refresh.
  const rows = plan.matRows * geometry.wordlineCount;
  const interval = refreshInterval(operating.refreshWindow, operating.refreshCommandsPerWindow);
  const refreshed = mat.needsRefresh;
  const cycle = refreshed
    ? refreshCycleTime(
        rowsPerRefreshCommand(rows, operating.refreshCommandsPerWindow),
        operating.refreshRowsInParallel,
        refreshRowCycle(process.rowCycleTimeOverride, mat.timing.rc).rowCycleTime,
      )
    : 0;

  // The engine's own check rules; the representative mat loses no bits, the bank's edge rows do.
  const checked: CheckedFigures = {
    senseMarginAtRefresh: mat.senseMarginAtRefresh,
    senseSignalAfterRefresh: mat.senseSignalAfterRefresh,
    requiredSignal: mat.requiredSignal,
    senseAmpFits: mat.senseAmpFits,
    senseAmpPitchBudget: mat.senseAmpPitchBudget,
    retentionTime: mat.retentionTime,
    weakestRetentionTime: mat.weakestRetentionTime,
    unpartneredBits: plan.lostBits,
  };
  const { errorKinds, warningKinds } = firingKinds(checked, { process, operating }, shared.storedHigh);
  // A built bank's strips chain every mat to the decoders along its edges, when it has them.
  if (!(spec.strips.rowDecoderWidth > 0)) warningKinds.push('noRowDecoder');
  if (!(spec.strips.columnDecoderHeight > 0)) warningKinds.push('noColumnDecoder');
  warningKinds.sort();

  const y = bankYield(spec, plan, mat, options);

  return {
    ok: true,
    plan,
    figures: {
      matCount: plan.matCount,
      usableBits: plan.usableBits,
      totalArea,
      cellArea,
      areaPerBit,
      areaPerBitInF2: areaPerBit / (process.featureSize * process.featureSize),
      arrayEfficiency: cellArea / totalArea,
      senseMargin: mat.senseMarginAtRefresh,
      senseSignalAtRefresh: mat.senseSignalAfterRefresh,
      requiredSignal: mat.requiredSignal,
      wordlineDelay: mat.wordlineDelay,
      wordlineResistance: mat.wordlineResistance,
      wordlineCapacitance: mat.wordlineCapacitance,
      activationEnergyPerBit: mat.activationEnergy.perBit,
      activationEnergy: mat.activationEnergy.total,
      cellsPerWordline: spec.cellsPerWordline,
      rowToColumnDelay: mat.timing.rcd,
      wordlineTurnOn: mat.timing.wordlineOn,
      senseFireWait: mat.timing.development,
      latchTime: mat.timing.latch,
      rowCycleTime: mat.timing.rc,
      rowActiveTime: mat.timing.ras,
      rowPrechargeTime: mat.timing.rp,
      retentionTime: mat.retentionTime,
      weakestRetentionTime: mat.weakestRetentionTime,
      refreshCycleTime: cycle,
      refreshInterval: interval,
      refreshBusyFraction: refreshBusyFraction(cycle, interval),
      refreshPower: refreshed
        ? refreshPower(
            plan.matCount * mat.activationEnergy.total * mat.wordlineCount,
            operating.refreshWindow,
          )
        : 0,
      dieYield: y?.dieYield ?? Number.NaN,
      repairProbability: y?.repairProbability ?? Number.NaN,
      redundancyArea: y?.redundancyArea ?? Number.NaN,
      areaPerBitWithRedundancy: y?.areaPerBitWithRedundancy ?? Number.NaN,
      goodDiesPerWafer: y?.goodDiesPerWafer ?? Number.NaN,
      spareRows: y?.settings.spareRows ?? Number.NaN,
      spareColumns: y?.settings.spareColumns ?? Number.NaN,
      errorKinds,
      warningKinds,
    },
  };
}

/** Whether and with which spares a point's yield is assessed (about a millisecond a point). */
export interface YieldOptions {
  /** false leaves the yield figures NaN (a sweep that does not plot them stays fast). */
  readonly withYield?: boolean;
  readonly spareRows?: number;
  readonly spareColumns?: number;
}

/**
 * The bank's yield figures from its representative mat: the row-repair domains are the mats, the mat
 * rows (matColumns mats each) or the whole bank; the column-repair domains are the sense-amplifier strips,
 * matRows + 1 rows of strips the width of the mats (as gridFloorplan lays them), the inner ones shared by
 * the mats above and below.
 */
function bankYield(spec: PartitionPointSpec, plan: PartitionPlan, mat: MatFigures, options: YieldOptions) {
  if (options.withYield === false) return null;
  const base = spec.operating.repair ?? DEFAULT_REPAIR;
  const settings = {
    ...base,
    spareRows: options.spareRows ?? base.spareRows,
    spareColumns: options.spareColumns ?? base.spareColumns,
  };
  const retentionTail = retentionTailAt(spec.process, spec.operating);
  const share = matDomainShare(mat, settings, spec.operating.refreshWindow, retentionTail);
  const repairPlan = gridRepairPlan(
    {
      matRows: plan.matRows,
      matColumns: plan.matColumns,
      stripArea: plan.matWidth * spec.strips.senseAmpStripHeight,
    },
    settings,
    share,
  );
  return yieldOfDomains({
    plan: repairPlan,
    mats: [mat],
    settings,
    floorplanCopiesPerDie: spec.operating.floorplanCopiesPerDie,
    retentionTail,
    refreshWindow: spec.operating.refreshWindow,
    floorplanArea: plan.width * plan.height,
    usableBits: plan.usableBits,
  });
}
