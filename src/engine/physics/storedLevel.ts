import type { ProcessProfile } from '../../model/process';

/**
 * Threshold voltage with body effect (the standard long-channel MOSFET form):
 *   Vt(Vsb) = Vt0 + γ·(√(2φF + Vsb) − √(2φF))
 * Source: Sedra & Smith, Microelectronic Circuits, body-effect equation; Weste & Harris,
 * CMOS VLSI Design, 4th ed., 2011, §2.4.3.1 (published form).
 *
 * @param sourceBodyVoltage Vsb (V), ≥ 0 for an n-channel access device writing a 1.
 * @returns the threshold voltage (V).
 */
export function thresholdWithBodyEffect(process: ProcessProfile, sourceBodyVoltage: number): number {
  const phi = process.surfacePotential;
  const vsb = Math.max(0, sourceBodyVoltage);
  return (
    process.accessThresholdVoltage + process.bodyEffectCoefficient * (Math.sqrt(phi + vsb) - Math.sqrt(phi))
  );
}

/** The level a cell stores for a 1, and why. */
export interface StoredHighLevel {
  /** Storage-node voltage after writing a 1 (V). */
  readonly level: number;
  /** Threshold of the access transistor at that level, including body effect (V). */
  readonly threshold: number;
  /** True when VPP − Vt(level) stops the node below the array voltage. */
  readonly limitedByWordline: boolean;
  /** Smallest VPP that would store a full array-voltage 1: VDD + Vt(VDD) (V). */
  readonly wordlineHighNeeded: number;
}

/**
 * Stored-1 level of an n-channel access transistor: the node charges to the array voltage unless the
 * word line is too low, when it stops one threshold below the word line:
 *   V1 = min(VDD, VPP − Vt(V1)).
 * Vt rises with V1 (body effect), so the equation is solved by bisection; VPP − Vt(V) − V falls
 * strictly with V, so the root is unique. Common practice (no source) for the bisection; the
 * "VPP ≥ VDD + Vt" rule: B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001, ch. 2 (from memory).
 */
export function storedHighLevel(process: ProcessProfile): StoredHighLevel {
  const vdd = process.arrayVoltage;
  const vpp = process.wordlineHighVoltage;
  const headroom = (v: number) => vpp - thresholdWithBodyEffect(process, v) - v;
  const wordlineHighNeeded = vdd + thresholdWithBodyEffect(process, vdd);
  if (headroom(vdd) >= 0) {
    return {
      level: vdd,
      threshold: thresholdWithBodyEffect(process, vdd),
      limitedByWordline: false,
      wordlineHighNeeded,
    };
  }
  if (headroom(0) <= 0) {
    return {
      level: 0,
      threshold: thresholdWithBodyEffect(process, 0),
      limitedByWordline: true,
      wordlineHighNeeded,
    };
  }
  let low = 0;
  let high = vdd;
  // 60 halvings take any volt-scale bracket below 1e-15 V.
  for (let i = 0; i < 60; i++) {
    const mid = (low + high) / 2;
    if (headroom(mid) > 0) low = mid;
    else high = mid;
  }
  const level = (low + high) / 2;
  return {
    level,
    threshold: thresholdWithBodyEffect(process, level),
    limitedByWordline: true,
    wordlineHighNeeded,
  };
}
