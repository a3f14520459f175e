import type { ProcessProfile } from '../../model/process';
import type { LineTimeMemo } from './lineTimeMemo';
import { drivenLineTime, farEndTimeShare, lineModes } from './rcLine';

/** Parts of one (sub-)word line's capacitance (F). */
export interface WordlineCapacitance {
  /** active crossings × gate load: where the word line is a cell's gate */
  readonly gates: number;
  /** passing crossings × passing load: where it passes a bit line without a cell (folded arrays) */
  readonly passing: number;
  /** bit lines crossed × coupling per crossing (the same coupling the bit line sees) */
  readonly bitlineCoupling: number;
  /** wire capacitance per length × word-line length */
  readonly wire: number;
  readonly total: number;
}

/**
 * Word-line capacitance by crossings: a word line crosses every bit line of its mat; at N_active of them
 * it is an access transistor's gate, at the others (N_bl − N_active, the other half in a folded array) it
 * passes by.
 *   Cwl = N_active·Cg + (N_bl − N_active)·Cpass + N_bl·Cbw + c_wire·L_wl
 * Source: Keeth & Baker, DRAM Circuit Design, 2001, ch. 2 (word-line loading by active and passing
 * gates; from memory).
 */
export function wordlineCapacitance(
  process: ProcessProfile,
  activeCrossings: number,
  bitlinesCrossed: number,
  wordlineLength: number,
): WordlineCapacitance {
  const gates = activeCrossings * process.wordlineGateCapacitancePerActiveCrossing;
  const passing =
    Math.max(0, bitlinesCrossed - activeCrossings) * process.wordlinePassingCapacitancePerCrossing;
  const bitlineCoupling = bitlinesCrossed * process.bitlineToWordlineCapacitancePerCrossing;
  const wire = process.wordlineWireCapacitancePerLength * wordlineLength;
  return { gates, passing, bitlineCoupling, wire, total: gates + passing + bitlineCoupling + wire };
}

/** The far-end timing of one word line (s), each from the driver's input step. */
export interface WordlineTiming {
  /** Far end reaches half of the word-line high level. */
  readonly toHalf: number;
  /**
   * Far end reaches the access transistor's turn-on, Vpre + Vt(Vsb = Vpre): the cells start to share.
   * NaN when the high level never reaches it (the far cell is never read).
   */
  readonly toTurnOn: number;
  /** Far end reaches 90 % of the high level: ready to restore a full 1. */
  readonly toNinetyPercent: number;
  /**
   * Far end falls from the high level to the threshold Vt0 that isolates a cell holding 0 (tRP part);
   * NaN when Vt0 ≤ 0 (the access device never turns off).
   */
  readonly toFallOff: number;
  /** (Vpre + Vt) / V_high: the turn-on share of the swing. */
  readonly turnOnShare: number;
}

/**
 * Far-end delays of a word line driven by a driver of resistance Rd, with distributed line resistance Rw
 * and capacitance Cw, from the exact step response of a driven distributed RC line (rcLine.ts).
 *
 * @param highLevel the level the word line rises to (VPP for 1T1C, VDD for gain-cell read lines) (V).
 * @param turnOnLevel the far-end level at which the farthest cell starts to conduct (V).
 * @param offLevel the level below which a cell is isolated again (V).
 * @param memo keeps the line's dimensionless times by Rd/Rw, and the last few whole timings, across calls
 *   (a sweep); the same numbers (a timing kept is handed out again, shared: it is read-only).
 */
export function wordlineTiming(
  driverResistance: number,
  lineResistance: number,
  lineCapacitance: number,
  highLevel: number,
  turnOnLevel: number,
  offLevel: number,
  memo?: LineTimeMemo,
): WordlineTiming {
  const inputs = [driverResistance, lineResistance, lineCapacitance, highLevel, turnOnLevel, offLevel];
  const kept = memo?.recentTiming(inputs);
  if (kept) return kept;
  const timing = lineTiming(
    driverResistance,
    lineResistance,
    lineCapacitance,
    highLevel,
    turnOnLevel,
    offLevel,
    memo,
  );
  memo?.keepTiming(inputs, timing);
  return timing;
}

function lineTiming(
  driverResistance: number,
  lineResistance: number,
  lineCapacitance: number,
  highLevel: number,
  turnOnLevel: number,
  offLevel: number,
  memo?: LineTimeMemo,
): WordlineTiming {
  // One set of modes serves every level of the same line.
  const ratio = driverResistance / lineResistance;
  let timeShare: ((fraction: number) => number) | undefined;
  if (memo) timeShare = (fraction) => memo.timeShare(ratio, fraction);
  else if (lineResistance > 0) {
    const modes = lineModes(ratio);
    timeShare = (fraction) => farEndTimeShare(modes, fraction);
  }
  const t = (share: number) =>
    drivenLineTime(driverResistance, lineResistance, lineCapacitance, share, timeShare);
  const turnOnShare = highLevel > 0 ? turnOnLevel / highLevel : Infinity;
  // Falling from V_high to V_off is the same curve as rising through 1 − V_off/V_high; a threshold at
  // (or rounding to) 0 V is never reached, so the fall time does not exist.
  const fallShare = highLevel > 0 ? 1 - offLevel / highLevel : Infinity;
  return {
    toHalf: t(0.5),
    toTurnOn: turnOnShare < 1 ? t(Math.max(0, turnOnShare)) : Number.NaN,
    toNinetyPercent: t(0.9),
    toFallOff: fallShare < 1 ? t(Math.max(0, fallShare)) : Number.NaN,
    turnOnShare,
  };
}
