import type { GainRead } from '../../model/cell';

/**
 * Saturation current of the storage (read) transistor with its gate at the stored level V:
 *   I = (β/2)·(V − Vt)² for V > Vt, else 0 (long-channel square law).
 * Source: Shichman–Hodges square law, e.g. Sedra & Smith, Microelectronic Circuits (from memory).
 */
export function gainReadCurrent(read: GainRead, storedLevel: number): number {
  const overdrive = storedLevel - read.readThresholdVoltage;
  return overdrive > 0 ? (read.readTransconductance / 2) * overdrive * overdrive : 0;
}

/** Stored level that gives read current I: V = Vt + √(2I/β) (V). */
export function levelForReadCurrent(read: GainRead, current: number): number {
  return read.readThresholdVoltage + Math.sqrt((2 * Math.max(0, current)) / read.readTransconductance);
}

/** The read-bit-line swings of a gain cell and the signal left for the sense amplifier (V). */
export interface GainReadSignals {
  /** Read current of the selected cell holding a 1 (A). */
  readonly readCurrent: number;
  /** Read-bit-line drop reading a stored 1 (neighbours hold 0: least extra current) (V). */
  readonly dropHigh: number;
  /** Read-bit-line drop reading a stored 0 (neighbours hold 1: most leakage) (V). */
  readonly dropLow: number;
  /** (dropHigh − dropLow)/2: the signal on each side of a reference set midway (V). */
  readonly senseSignal: number;
}

/**
 * Read of a gain cell onto a read bit line precharged to VDD: the selected cell sinks its read current
 * for the sense time, and the unselected cells on the line add their leakage. The read is
 * non-destructive and inverting (a stored 1 pulls the line down):
 *   ΔV = I·t_sense / C_RBL, capped at VDD;
 *   ΔV1 = I_read(V1)·t / C, ΔV0 = (I_off + (N − 1)·I_unsel)·t / C;
 *   signal = (ΔV1 − ΔV0) / 2 against a reference midway.
 * Source: gain-cell read as described by P. Meinerzhagen, A. Teman, R. Giterman, N. Edri, A. Burg,
 * A. Fish, Gain-Cell Embedded DRAMs for Low-Power VLSI Systems-on-Chip, Springer, 2018 (from memory);
 * ΔV = I·t/C is charge balance (arithmetic).
 */
export function gainReadSignals(
  read: GainRead,
  storedHigh: number,
  cellsPerBitline: number,
  readBitlineCapacitance: number,
  senseTime: number,
  arrayVoltage: number,
): GainReadSignals {
  const swing = (current: number) => Math.min(arrayVoltage, (current * senseTime) / readBitlineCapacitance);
  const readCurrent = gainReadCurrent(read, storedHigh);
  const dropHigh = swing(readCurrent);
  const dropLow = swing(read.readOffCurrent + (cellsPerBitline - 1) * read.unselectedLeakageCurrent);
  return { readCurrent, dropHigh, dropLow, senseSignal: (dropHigh - dropLow) / 2 };
}

/**
 * Lowest stored-1 level that still leaves `requiredSignal` after a read, given the stored-0 drop:
 * needs ΔV1 ≥ 2·required + ΔV0, i.e. I ≥ (2·required + ΔV0)·C/t. Returns Infinity when even a full
 * rail swing cannot give that signal.
 */
export function minimumGainLevel(
  read: GainRead,
  requiredSignal: number,
  dropLow: number,
  readBitlineCapacitance: number,
  senseTime: number,
  arrayVoltage: number,
): number {
  const neededDrop = 2 * requiredSignal + dropLow;
  if (neededDrop > arrayVoltage) return Infinity;
  return levelForReadCurrent(read, (neededDrop * readBitlineCapacitance) / senseTime);
}
