/**
 * Charge-transfer ratio of a cell onto its bit line: CTR = Cs / (Cs + Cbl).
 * Source: B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001, ch. 1 (from memory);
 * N. Weste, D. Harris, CMOS VLSI Design, 4th ed., 2011, §12.3 (published formula).
 *
 * @param storageCapacitance Cs (F), > 0.
 * @param bitlineCapacitance Cbl (F), ≥ 0.
 * @returns a ratio in (0, 1].
 */
export function chargeTransferRatio(storageCapacitance: number, bitlineCapacitance: number): number {
  return storageCapacitance / (storageCapacitance + bitlineCapacitance);
}

/**
 * Bit-line voltage change when a cell at `cellVoltage` shares charge with a bit line precharged to
 * `prechargeVoltage` (charge conservation on Cs + Cbl):
 *   ΔV = (Vcell − Vpre)·Cs/(Cs + Cbl) = (Vcell − Vpre)·CTR.
 * Positive when the bit line rises.
 *
 * @returns ΔV (V).
 */
export function chargeSharingSignal(cellVoltage: number, prechargeVoltage: number, ratio: number): number {
  return (cellVoltage - prechargeVoltage) * ratio;
}

/** The two read signals of a 1T1C cell and the smaller of them, all as magnitudes towards the correct side. */
export interface ReadSignals {
  /** Rise of the bit line reading a stored 1 (V); negative means the 1 reads as a 0. */
  readonly signalHigh: number;
  /** Fall of the bit line reading a stored 0 (V); negative means the 0 reads as a 1. */
  readonly signalLow: number;
  /** min(signalHigh, signalLow): the signal the sense amplifier can count on (V). */
  readonly senseSignal: number;
}

/**
 * Read signals for a stored 1 (at `storedHigh`) and a stored 0 (at 0 V) against the precharge level.
 */
export function readSignals(storedHigh: number, prechargeVoltage: number, ratio: number): ReadSignals {
  const signalHigh = chargeSharingSignal(storedHigh, prechargeVoltage, ratio);
  const signalLow = -chargeSharingSignal(0, prechargeVoltage, ratio);
  return { signalHigh, signalLow, senseSignal: Math.min(signalHigh, signalLow) };
}
