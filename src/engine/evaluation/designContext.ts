import type { OperatingConditions } from '../../model/operating';
import type { ProcessProfile } from '../../model/process';
import { offsetSigmaMultiplier } from '../physics/offset';
import type { RetentionTail } from '../physics/faultRates';
import type { LineTimeMemo } from '../physics/lineTimeMemo';
import { leakageAtTemperature, weakestCellLeakage } from '../physics/retention';
import { storedHighLevel, type StoredHighLevel } from '../physics/storedLevel';

/** Smallest leakage the engine uses (A): far below any physical cell, 1e-30 A keeps retention finite. */
export const MINIMUM_LEAKAGE = 1e-30;

/**
 * Typical cell leakage at the operating temperature (A), Arrhenius-scaled from the process's reference
 * value. Floored so that zero leakage (allowed) or an exp() underflow at low temperature still gives a
 * finite, if enormous, retention time instead of Infinity or 0/0. evaluate() and the explorer both use it.
 */
export function cellLeakage(process: ProcessProfile, operating: OperatingConditions): number {
  return Math.max(
    MINIMUM_LEAKAGE,
    leakageAtTemperature(
      process.cellLeakageCurrent,
      process.leakageReferenceTemperature,
      process.leakageActivationEnergy,
      operating.temperature,
    ),
  );
}

/** Design-wide values every mat needs, computed once per evaluation. */
export interface DesignContext {
  readonly process: ProcessProfile;
  readonly operating: OperatingConditions;
  readonly storedHigh: StoredHighLevel;
  /** Sense amplifiers the offset budget is spread over: the floorplan's × copies per die. */
  readonly senseAmpsOnDie: number;
  /** k of the k·σ offset budget, two-tailed over senseAmpsOnDie. */
  readonly sigmaMultiplier: number;
  /** Cells the weakest cell is sought among: the floorplan's × copies per die. */
  readonly cellsOnDie: number;
  /** Typical (main-population) cell leakage at the operating temperature (A). */
  readonly leakage: number;
  /** Leakage of the weakest cell on the die at the operating temperature (A). */
  readonly weakestLeakage: number;
  /**
   * Word-line step responses already found, kept across evaluations that share them (the explorer's
   * sweep); absent, each mat finds its own. The figures are the same numbers either way.
   */
  readonly lineTimes?: LineTimeMemo;
}

/**
 * The design-wide values: stored-1 level, k of the offset budget over the die's sense amplifiers, and the
 * typical and weakest-in-die leakage at the operating temperature (Arrhenius for each population).
 *
 * @param senseAmpsInFloorplan sense amplifiers of the floorplan (or bank) being evaluated.
 * @param cellsInFloorplan its cells.
 */
/** Median leakage of the weak-cell tail at temperature T (A): its own Arrhenius activation energy. */
export function tailMedianLeakage(process: ProcessProfile, T: number): number {
  return leakageAtTemperature(
    process.cellLeakageCurrent * process.tailLeakageMultiplier,
    process.leakageReferenceTemperature,
    process.tailActivationEnergy,
    T,
  );
}

/**
 * The weak-cell tail as the yield model reads it: its share of cells, its median leakage over the typical
 * cell's at the operating temperature, and its log-normal spread (the same two-population model as the
 * weakest-cell retention).
 */
export function retentionTailAt(process: ProcessProfile, operating: OperatingConditions): RetentionTail {
  const typical = cellLeakage(process, operating);
  return {
    fraction: process.tailCellFraction,
    medianLeakageMultiplier: typical > 0 ? tailMedianLeakage(process, operating.temperature) / typical : 1,
    spread: process.tailLeakageSpread,
  };
}

export function designContext(
  process: ProcessProfile,
  operating: OperatingConditions,
  senseAmpsInFloorplan: number,
  cellsInFloorplan: number,
  storedHigh: StoredHighLevel = storedHighLevel(process),
  lineTimes?: LineTimeMemo,
): DesignContext {
  const copies = operating.floorplanCopiesPerDie;
  const senseAmpsOnDie = senseAmpsInFloorplan * copies;
  const cellsOnDie = cellsInFloorplan * copies;
  const T = operating.temperature;
  const leakage = cellLeakage(process, operating);
  const tailMedian = tailMedianLeakage(process, T);
  return {
    process,
    operating,
    storedHigh,
    senseAmpsOnDie,
    sigmaMultiplier: offsetSigmaMultiplier(senseAmpsOnDie, operating.allowedSenseFailures),
    cellsOnDie,
    leakage,
    weakestLeakage: weakestCellLeakage(
      leakage,
      tailMedian,
      process.tailCellFraction,
      process.tailLeakageSpread,
      cellsOnDie,
    ),
    lineTimes,
  };
}
