import type { MatKind } from '../../geometry/blockTable';
import { isGainCell } from '../../model/cellBasics';
import type { OperatingConditions } from '../../model/operating';
import type { ProcessProfile } from '../../model/process';
import { bitlineCapacitance } from '../physics/bitline';
import { chargeSharingDelay, drivenLineDelay } from '../physics/delay';
import { bitlinePairEnergy, chargingEnergy, readBitlineRestoreEnergy } from '../physics/energy';
import { gainReadSignals, minimumGainLevel } from '../physics/gainRead';
import { couplingNoise } from '../physics/noise';
import { pelgromSigma, stackOffsets } from '../physics/offset';
import type { ActivationEnergy, ChargeSharingRead, GainCellRead, MatFigures } from './report';
import { leakageAtTemperature, leakageDroop, retentionTime } from '../physics/retention';
import { senseAmpPitchBudget } from '../physics/senseAmpPitch';
import { chargeTransferRatio, readSignals } from '../physics/sensing';
import type { StoredHighLevel } from '../physics/storedLevel';

/** Design-wide values every mat needs, computed once per evaluation. */
export interface DesignContext {
  readonly process: ProcessProfile;
  readonly operating: OperatingConditions;
  readonly storedHigh: StoredHighLevel;
  /** k of the k·σ offset budget. */
  readonly sigmaMultiplier: number;
  /** Cell leakage at the operating temperature (A). */
  readonly leakage: number;
}

/** Smallest leakage the engine uses (A): far below any physical cell, 1e-30 A keeps retention finite. */
export const MINIMUM_LEAKAGE = 1e-30;

/**
 * Cell leakage at the operating temperature (A), Arrhenius-scaled from the process's reference value.
 * Floored so that zero leakage (allowed) or an exp() underflow at low temperature still gives a finite,
 * if enormous, retention time instead of Infinity or 0/0. evaluate() and the explorer both use it.
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

/** Sense amplifiers serving a mat: one per pair of bit lines, or one per read bit line for gain cells. */
export function senseAmpsOfMat(mat: MatKind): number {
  return isGainCell(mat.cell.kind) ? mat.geometry.bitlineCount : mat.geometry.bitlineCount / 2;
}

/** Read figures that differ between 1T1C and gain cells. */
interface ReadOutcome {
  readonly read: ChargeSharingRead | GainCellRead;
  readonly senseSignal: number;
  readonly senseSignalAfterRefresh: number;
  readonly allowedDroop: number;
  readonly bitlineDelay: number;
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
  const fresh = readSignals(v1, p.prechargeVoltage, ctr);
  const aged = readSignals(Math.max(0, v1 - droop), p.prechargeVoltage, ctr);
  // The 1 may droop until its signal equals the required signal: (V1 − δ − Vpre)·CTR = required.
  const allowedDroop = Math.max(0, v1 - p.prechargeVoltage - required / ctr);
  return {
    read: {
      kind: 'chargeSharing',
      chargeTransferRatio: ctr,
      signalHigh: fresh.signalHigh,
      signalLow: fresh.signalLow,
      signalHighAfterRefresh: aged.signalHigh,
    },
    senseSignal: fresh.senseSignal,
    senseSignalAfterRefresh: aged.senseSignal,
    allowedDroop,
    bitlineDelay: chargeSharingDelay(p.accessTransistorResistance, cs, bitlineResistance, cbl),
    bitlineEnergy: bitlinePairEnergy(mat.block.cellsPerWordline, cbl, p.arrayVoltage),
    wordlineVoltage: p.wordlineHighVoltage,
  };
}

function gainCellOutcome(
  mat: MatKind,
  ctx: DesignContext,
  cbl: number,
  required: number,
  droop: number,
): ReadOutcome {
  const p = ctx.process;
  const read = mat.cell.gainRead;
  if (!read) throw new Error(`gain cell "${mat.cell.id}" has no read-path values`);
  const n = mat.block.cellsPerBitline;
  const t = p.gainCellSenseTime;
  const v1 = ctx.storedHigh.level;
  const fresh = gainReadSignals(read, v1, n, cbl, t, p.arrayVoltage);
  const aged = gainReadSignals(read, Math.max(0, v1 - droop), n, cbl, t, p.arrayVoltage);
  const minimumLevel = minimumGainLevel(read, required, fresh.dropLow, cbl, t, p.arrayVoltage);
  return {
    read: {
      kind: 'gainRead',
      readCurrent: fresh.readCurrent,
      dropHigh: fresh.dropHigh,
      dropLow: fresh.dropLow,
      dropHighAfterRefresh: aged.dropHigh,
    },
    senseSignal: fresh.senseSignal,
    senseSignalAfterRefresh: aged.senseSignal,
    allowedDroop: Number.isFinite(minimumLevel) ? Math.max(0, v1 - minimumLevel) : 0,
    bitlineDelay: t,
    // Worst case: every cell on the word line holds a 1 and pulls its read bit line down.
    bitlineEnergy: readBitlineRestoreEnergy(mat.block.cellsPerWordline, cbl, p.arrayVoltage, fresh.dropHigh),
    // The read word line swings to VDD; the boosted level is only for writes.
    wordlineVoltage: p.arrayVoltage,
  };
}

/**
 * Every figure of one kind of mat, given how many of its bit-line ends have sense amplifiers (0, 1 or 2)
 * and how many of its open bit lines lack a partner.
 */
export function matPhysics(
  mat: MatKind,
  senseAmpEnds: number,
  lostBitlines: number,
  ctx: DesignContext,
): MatFigures {
  const p = ctx.process;
  const g = mat.geometry;
  const gain = isGainCell(mat.cell.kind);
  const cbl = bitlineCapacitance(p, mat.block.cellsPerBitline, g.bitlineLength);
  const bitlineResistance = p.bitlineResistancePerLength * g.bitlineLength;

  const offsetSigma = pelgromSigma(
    p.senseAmpMatchingCoefficient,
    p.senseAmpTransistorWidth,
    p.senseAmpTransistorLength,
  );
  const offsetBudget = ctx.sigmaMultiplier * offsetSigma;
  const noiseFactor =
    mat.cell.bitlineArchitecture === 'folded' && !gain ? p.foldedNoiseFactor : p.openNoiseFactor;
  const noiseAllowance = couplingNoise(cbl.bitlineCoupling, cbl.total, p.arrayVoltage, noiseFactor);
  const requiredSignal = stackOffsets(offsetBudget, noiseAllowance, p.offsetStacking);

  const droop = leakageDroop(ctx.leakage, ctx.operating.refreshWindow, mat.cell.storageCapacitance);
  const outcome = gain
    ? gainCellOutcome(mat, ctx, cbl.total, requiredSignal, droop)
    : chargeSharingOutcome(mat, ctx, cbl.total, requiredSignal, droop, bitlineResistance);

  const wordlineResistance = p.wordlineResistancePerLength * g.wordlineLength;
  const wordlineCapacitance =
    mat.block.cellsPerWordline * p.wordlineGateCapacitancePerCell +
    p.wordlineWireCapacitancePerLength * g.wordlineLength;

  const senseAmpEnergy = chargingEnergy(
    mat.block.cellsPerWordline * p.senseAmpSwitchedCapacitance,
    p.arrayVoltage,
  );
  const wordlineEnergy = chargingEnergy(wordlineCapacitance, outcome.wordlineVoltage);
  const total = outcome.bitlineEnergy + wordlineEnergy + senseAmpEnergy;
  const activationEnergy: ActivationEnergy = {
    bitlines: outcome.bitlineEnergy,
    wordline: wordlineEnergy,
    senseAmps: senseAmpEnergy,
    total,
    perBit: total / mat.block.cellsPerWordline,
  };

  const budget = senseAmpPitchBudget(g.bitlinePitch, mat.cell.bitlineArchitecture, gain, senseAmpEnds);
  const lostBits = lostBitlines * mat.block.cellsPerBitline;
  return {
    cellId: mat.cell.id,
    cellKind: mat.cell.kind,
    architecture: mat.cell.bitlineArchitecture,
    cellsPerBitline: mat.block.cellsPerBitline,
    cellsPerWordline: mat.block.cellsPerWordline,
    bitlineCount: g.bitlineCount,
    wordlineCount: g.wordlineCount,
    bits: g.bits,
    usableBits: g.bits - lostBits,
    lostBits,
    area: g.width * g.height,
    cellArea: g.bits * g.cellArea,
    cellFootprint: g.cellArea,
    bitlineLength: g.bitlineLength,
    wordlineLength: g.wordlineLength,
    storageCapacitance: mat.cell.storageCapacitance,
    bitlineCapacitance: cbl,
    read: outcome.read,
    senseSignal: outcome.senseSignal,
    senseSignalAfterRefresh: outcome.senseSignalAfterRefresh,
    senseAmpCount: senseAmpsOfMat(mat),
    offsetSigma,
    offsetBudget,
    noiseAllowance,
    requiredSignal,
    senseMargin: outcome.senseSignal - requiredSignal,
    senseMarginAtRefresh: outcome.senseSignalAfterRefresh - requiredSignal,
    leakage: ctx.leakage,
    allowedDroop: outcome.allowedDroop,
    retentionTime: retentionTime(mat.cell.storageCapacitance, outcome.allowedDroop, ctx.leakage),
    wordlineResistance,
    wordlineCapacitance,
    wordlineDelay: drivenLineDelay(p.wordlineDriverResistance, wordlineResistance, wordlineCapacitance),
    bitlineResistance,
    bitlineDelay: outcome.bitlineDelay,
    activationEnergy,
    senseAmpPitchBudget: budget,
    senseAmpFits: senseAmpEnds === 0 || p.senseAmpWidth <= budget * (1 + 1e-9),
  };
}
