import type { MatKind } from '../../geometry/blockTable';
import {
  crossingOccupancy,
  isDifferentialCell,
  isGainCell,
  needsRefresh,
  seriesReadDevices,
} from '../../model/cellBasics';
import { bitlineCapacitance } from '../physics/bitline';
import type { DesignContext } from './designContext';
import { bitlinePairEnergy, chargingEnergy, readBitlineRestoreEnergy } from '../physics/energy';
import { gainReadSignals, minimumGainLevel, writeCouplingLoss } from '../physics/gainRead';
import { couplingNoise } from '../physics/noise';
import { pelgromSigma, stackOffsets } from '../physics/offset';
import type { ActivationEnergy, ChargeSharingRead, GainCellRead, MatFigures } from './report';
import { leakageDroop, retentionTime } from '../physics/retention';
import {
  developedShare,
  developmentTimeConstant,
  equaliseTime,
  latchTime,
  restoreTime,
  rowTiming,
} from '../physics/rowTiming';
import { senseAmpPitchBudget } from '../physics/senseAmpPitch';
import { chargeTransferRatio, readSignals } from '../physics/sensing';
import { thresholdWithBodyEffect } from '../physics/storedLevel';
import { wordlineCapacitance, wordlineTiming } from '../physics/wordline';

export type { DesignContext } from './designContext';

/**
 * Sense amplifiers serving a mat: one per pair of bit lines (1T1C), one per read bit line (gain cells),
 * one per column (4T and 6T hold both lines of their pair).
 */
export function senseAmpsOfMat(mat: MatKind): number {
  const kind = mat.cell.kind;
  return isGainCell(kind) || isDifferentialCell(kind)
    ? mat.geometry.bitlineCount
    : mat.geometry.bitlineCount / 2;
}

/** How the floorplan serves one mat: found from geometry by connectivity.ts. */
export interface MatService {
  /** Bit-line ends (0, 1 or 2) that have a sense-amplifier strip. */
  readonly senseAmpEnds: number;
  /** Open bit lines whose sense amplifier has no partner line beyond its strip. */
  readonly unpartneredBitlines: number;
  /** Bit lines that reach no sense amplifier. */
  readonly unsensedBitlines: number;
  /** Word lines that reach no driver. */
  readonly undrivenWordlines: number;
}

/** A mat served at both bit-line ends and both word-line ends, with every line partnered. */
export const FULLY_SERVED: MatService = {
  senseAmpEnds: 2,
  unpartneredBitlines: 0,
  unsensedBitlines: 0,
  undrivenWordlines: 0,
};

/** Read figures that differ between 1T1C and cells read by current. */
interface ReadOutcome {
  readonly read: ChargeSharingRead | GainCellRead;
  readonly fullSenseSignal: number;
  readonly senseSignal: number;
  readonly senseSignalAfterRefresh: number;
  readonly allowedDroop: number;
  readonly bitlineDelay: number;
  readonly development: number;
  readonly restorePath: number;
  readonly bitlineEnergy: number;
  readonly wordlineVoltage: number;
}

function chargeSharingOutcome(
  mat: MatKind,
  ctx: DesignContext,
  cbl: number,
  required: number,
  droop: number,
  bitlineResistance: number,
): ReadOutcome {
  const p = ctx.process;
  const cs = mat.cell.storageCapacitance;
  const ctr = chargeTransferRatio(cs, cbl);
  const v1 = ctx.storedHigh.level;
  const tau = developmentTimeConstant(p.accessTransistorResistance, cs, bitlineResistance, cbl);
  const share = developedShare(ctx.operating.senseFireTime, tau);
  const fresh = readSignals(v1, p.prechargeVoltage, ctr);
  const aged = readSignals(Math.max(0, v1 - droop), p.prechargeVoltage, ctr);
  // The 1 may droop until its developed signal equals the required one: (V1 − δ − Vpre)·CTR·share = required.
  const allowedDroop = Math.max(0, v1 - p.prechargeVoltage - required / (ctr * share));
  return {
    read: {
      kind: 'chargeSharing',
      chargeTransferRatio: ctr,
      signalHigh: fresh.signalHigh,
      signalLow: fresh.signalLow,
      signalHighAfterRefresh: aged.signalHigh,
      developmentTimeConstant: tau,
      developedShare: share,
    },
    fullSenseSignal: fresh.senseSignal,
    senseSignal: fresh.senseSignal * share,
    senseSignalAfterRefresh: aged.senseSignal * share,
    allowedDroop,
    bitlineDelay: tau * Math.LN2,
    development: ctx.operating.senseFireTime,
    restorePath: p.accessTransistorResistance + bitlineResistance,
    bitlineEnergy: bitlinePairEnergy(mat.block.cellsPerWordline, cbl, p.arrayVoltage),
    wordlineVoltage: p.wordlineHighVoltage,
  };
}

function currentReadOutcome(
  mat: MatKind,
  ctx: DesignContext,
  cbl: number,
  required: number,
  droop: number,
): ReadOutcome {
  const p = ctx.process;
  const read = mat.cell.gainRead;
  if (!read) throw new Error(`cell "${mat.cell.id}" has no read-path values`);
  const kind = mat.cell.kind;
  const differential = isDifferentialCell(kind);
  const series = seriesReadDevices(kind);
  const n = mat.block.cellsPerBitline;
  // Gain cells keep their own sense time; 4T and 6T fire like the array's other sense amplifiers.
  const t = isGainCell(kind) ? p.gainCellSenseTime : ctx.operating.senseFireTime;
  // 1T1C and 4T cells write through a boosted word line; gain cells lose the write word line's
  // coupling; the static 6T cell holds the full supply.
  const wordlineVoltage = kind === 'dram-4t' ? p.wordlineHighVoltage : p.arrayVoltage;
  const coupling = isGainCell(kind)
    ? writeCouplingLoss(read, mat.cell.storageCapacitance, p.wordlineHighVoltage)
    : 0;
  const v1 = kind === 'sram-6t' ? p.arrayVoltage : Math.max(0, ctx.storedHigh.level - coupling);
  const agedDroop = needsRefresh(kind) ? droop : 0;
  const fresh = gainReadSignals(read, v1, n, cbl, t, p.arrayVoltage, series, differential);
  const aged = gainReadSignals(
    read,
    Math.max(0, v1 - agedDroop),
    n,
    cbl,
    t,
    p.arrayVoltage,
    series,
    differential,
  );
  const minimumLevel = minimumGainLevel(
    read,
    required,
    fresh.dropLow,
    cbl,
    t,
    p.arrayVoltage,
    series,
    differential,
  );
  return {
    read: {
      kind: 'gainRead',
      differential,
      seriesDevices: series,
      writeCouplingLoss: coupling,
      readCurrent: fresh.readCurrent,
      dropHigh: fresh.dropHigh,
      dropLow: fresh.dropLow,
      dropHighAfterRefresh: aged.dropHigh,
    },
    fullSenseSignal: fresh.senseSignal,
    senseSignal: fresh.senseSignal,
    senseSignalAfterRefresh: aged.senseSignal,
    allowedDroop: Number.isFinite(minimumLevel) ? Math.max(0, v1 - minimumLevel) : 0,
    bitlineDelay: t,
    development: t,
    // The read does not destroy the data: nothing to write back.
    restorePath: 0,
    // Worst case: every cell on the word line pulls its read bit line down.
    bitlineEnergy: readBitlineRestoreEnergy(mat.block.cellsPerWordline, cbl, p.arrayVoltage, fresh.dropHigh),
    wordlineVoltage,
  };
}

/**
 * Cells left usable by the lines that reach a sense amplifier (with a partner) and a driver, in [0, bits]:
 * every bit line holds cellsPerBitline cells spread over the word lines, so each undriven word line
 * takes its share of the cells that remain.
 */
function usableCells(mat: MatKind, service: MatService): number {
  const g = mat.geometry;
  const onSensedLines = Math.max(
    0,
    g.bits - (service.unsensedBitlines + service.unpartneredBitlines) * mat.block.cellsPerBitline,
  );
  const drivenShare = Math.max(0, 1 - service.undrivenWordlines / g.wordlineCount);
  return Math.min(g.bits, service.undrivenWordlines > 0 ? onSensedLines * drivenShare : onSensedLines);
}

/**
 * Every figure of one kind of mat, given how the floorplan serves it (sense-amplifier ends, unpartnered,
 * unsensed and undriven lines).
 */
export function matPhysics(mat: MatKind, service: MatService, ctx: DesignContext): MatFigures {
  const p = ctx.process;
  const g = mat.geometry;
  const kind = mat.cell.kind;
  const gain = isGainCell(kind);
  const refreshed = needsRefresh(kind);
  const cbl = bitlineCapacitance(p, mat.block.cellsPerBitline, g.wordlineCount, g.bitlineLength);
  const bitlineResistance = p.bitlineResistancePerLength * g.bitlineLength;

  const offsetSigma = pelgromSigma(
    p.senseAmpMatchingCoefficient,
    p.senseAmpTransistorWidth,
    p.senseAmpTransistorLength,
  );
  const offsetBudget = ctx.sigmaMultiplier * offsetSigma;
  const noiseFactor =
    mat.cell.bitlineArchitecture === 'open' || gain ? p.openNoiseFactor : p.foldedNoiseFactor;
  const noiseAllowance = couplingNoise(cbl.bitlineCoupling, cbl.total, p.arrayVoltage, noiseFactor);
  const requiredSignal = stackOffsets(offsetBudget, noiseAllowance, p.offsetStacking);

  const droop = leakageDroop(ctx.leakage, ctx.operating.refreshWindow, mat.cell.storageCapacitance);
  const outcome =
    kind === 'dram-1t1c'
      ? chargeSharingOutcome(mat, ctx, cbl.total, requiredSignal, droop, bitlineResistance)
      : currentReadOutcome(mat, ctx, cbl.total, requiredSignal, droop);

  // A word line crosses every bit line of the mat; it gates a cell at the occupied share of them.
  const activeCrossings = g.bitlineCount * crossingOccupancy(mat.cell.bitlineArchitecture);
  const wordlineResistance = p.wordlineResistancePerLength * g.wordlineLength;
  const wlc = wordlineCapacitance(p, activeCrossings, g.bitlineCount, g.wordlineLength);
  // A 1T1C cell conducts once the word line exceeds its source (the precharged bit line) by the
  // body-affected threshold; a cell read by current once the word line exceeds the read path's threshold
  // (its source sits near ground). Either is isolated again below the zero-bias threshold.
  const read = mat.cell.gainRead;
  const turnOnLevel =
    kind === 'dram-1t1c' || !read
      ? p.prechargeVoltage + thresholdWithBodyEffect(p, p.prechargeVoltage)
      : read.readThresholdVoltage;
  const wlTiming = wordlineTiming(
    p.wordlineDriverResistance,
    wordlineResistance,
    wlc.total,
    outcome.wordlineVoltage,
    turnOnLevel,
    p.accessThresholdVoltage,
    ctx.lineTimes,
  );

  const usableBits = usableCells(mat, service);
  const sensed = usableBits > 0;
  const senseMargin = sensed ? outcome.senseSignal - requiredSignal : Number.NaN;
  const senseMarginAtRefresh = sensed ? outcome.senseSignalAfterRefresh - requiredSignal : Number.NaN;
  const pairSwing = p.arrayVoltage;
  const chain = rowTiming({
    wordlineOn: wlTiming.toTurnOn,
    development: outcome.development,
    latch: latchTime(cbl.total, p.senseAmpLatchResistance, outcome.senseSignal, pairSwing),
    wordlineNinety: wlTiming.toNinetyPercent,
    restore:
      outcome.restorePath > 0
        ? restoreTime(outcome.restorePath, mat.cell.storageCapacitance, ctx.operating.restoreFraction)
        : 0,
    wordlineFall: wlTiming.toFallOff,
    equalise: equaliseTime(
      p.equaliserResistance,
      bitlineResistance,
      cbl.total,
      pairSwing,
      ctx.operating.equaliseResidual,
    ),
  });
  const timing = sensed ? chain : nanTiming(chain);

  const senseAmpEnergy = chargingEnergy(
    mat.block.cellsPerWordline * p.senseAmpSwitchedCapacitance,
    p.arrayVoltage,
  );
  const wordlineEnergy = chargingEnergy(wlc.total, outcome.wordlineVoltage);
  const total = outcome.bitlineEnergy + wordlineEnergy + senseAmpEnergy;
  const activationEnergy: ActivationEnergy = {
    bitlines: outcome.bitlineEnergy,
    wordline: wordlineEnergy,
    senseAmps: senseAmpEnergy,
    total,
    perBit: total / mat.block.cellsPerWordline,
  };

  const budget = senseAmpPitchBudget(
    g.bitlinePitch,
    mat.cell.bitlineArchitecture,
    gain,
    service.senseAmpEnds,
  );
  // With no droop allowed (the fresh signal already falls short) there is no margin to lose: the
  // retention time does not exist (NaN, "—" with the reason), it is not 0 s.
  const retentionExists = sensed && refreshed && outcome.allowedDroop > 0;
  return {
    cellId: mat.cell.id,
    cellKind: kind,
    architecture: mat.cell.bitlineArchitecture,
    cellsPerBitline: mat.block.cellsPerBitline,
    cellsPerWordline: mat.block.cellsPerWordline,
    bitlineCount: g.bitlineCount,
    wordlineCount: g.wordlineCount,
    bits: g.bits,
    usableBits,
    lostBits: g.bits - usableBits,
    unpartneredBits: Math.min(g.bits, service.unpartneredBitlines * mat.block.cellsPerBitline),
    area: g.width * g.height,
    cellArea: g.bits * g.cellArea,
    cellFootprint: g.cellArea,
    bitlineLength: g.bitlineLength,
    wordlineLength: g.wordlineLength,
    storageCapacitance: mat.cell.storageCapacitance,
    bitlineCapacitance: cbl,
    read: outcome.read,
    fullSenseSignal: outcome.fullSenseSignal,
    senseSignal: outcome.senseSignal,
    senseSignalAfterRefresh: outcome.senseSignalAfterRefresh,
    senseAmpCount: senseAmpsOfMat(mat),
    offsetSigma,
    offsetBudget,
    noiseAllowance,
    requiredSignal,
    senseMargin,
    senseMarginAtRefresh,
    leakage: ctx.leakage,
    weakestLeakage: ctx.weakestLeakage,
    allowedDroop: outcome.allowedDroop,
    needsRefresh: refreshed,
    retentionTime: retentionExists
      ? retentionTime(mat.cell.storageCapacitance, outcome.allowedDroop, ctx.leakage)
      : Number.NaN,
    weakestRetentionTime: retentionExists
      ? retentionTime(mat.cell.storageCapacitance, outcome.allowedDroop, ctx.weakestLeakage)
      : Number.NaN,
    wordlineResistance,
    wordlineCapacitance: wlc.total,
    wordlineCapacitanceParts: wlc,
    wordlineHighLevel: outcome.wordlineVoltage,
    wordlineDelay: wlTiming.toHalf,
    wordlineTiming: wlTiming,
    bitlineResistance,
    bitlineDelay: outcome.bitlineDelay,
    timing,
    standbyPower: g.bits * mat.cell.holdCurrent * p.arrayVoltage,
    activationEnergy,
    senseAmpPitchBudget: budget,
    senseAmpFits: service.senseAmpEnds === 0 || p.senseAmpWidth <= budget * (1 + 1e-9),
  };
}

/** A timing chain whose every step is NaN: the mat has no sensed bit line, so no row cycle exists. */
function nanTiming(chain: ReturnType<typeof rowTiming>): ReturnType<typeof rowTiming> {
  const nan = Number.NaN;
  return {
    ...chain,
    latch: nan,
    restore: nan,
    equalise: nan,
    rcd: nan,
    ras: nan,
    rp: nan,
    rc: nan,
  };
}
