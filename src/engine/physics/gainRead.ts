import type { GainRead } from '../../model/cell';

/**
 * Saturation current of the read path with the storage transistor's gate at the stored level V:
 *   I = (β/(2·n))·(V − Vt)² for V > Vt, else 0 (long-channel square law),
 * where n equal transistors in series act as one of n times the length (β/n): the 3T cell's read-access
 * and storage devices, or the 4T/6T cell's access and pull-down devices, give n = 2; the 2T cell's
 * storage device alone gives n = 1.
 * Source: Shichman–Hodges square law, e.g. Sedra & Smith, Microelectronic Circuits (from memory); series
 * stack as one longer device: N. Weste, D. Harris, CMOS VLSI Design, 4th ed., 2011, §4.3 (from memory).
 */
export function gainReadCurrent(read: GainRead, storedLevel: number, seriesDevices = 1): number {
  const overdrive = storedLevel - read.readThresholdVoltage;
  const beta = read.readTransconductance / Math.max(1, seriesDevices);
  return overdrive > 0 ? (beta / 2) * overdrive * overdrive : 0;
}

/** Stored level that gives read current I: V = Vt + √(2·n·I/β) (V). */
export function levelForReadCurrent(read: GainRead, current: number, seriesDevices = 1): number {
  const beta = read.readTransconductance / Math.max(1, seriesDevices);
  return read.readThresholdVoltage + Math.sqrt((2 * Math.max(0, current)) / beta);
}

/**
 * Stored level after the write word line falls: the write transistor's gate overlap Cc and the storage
 * node Cs divide the fall, ΔV = V_WWL·Cc/(Cc + Cs) (charge conservation, arithmetic; the effect is
 * described for 2T and 3T gain cells by Meinerzhagen et al., Gain-Cell Embedded DRAMs, Springer, 2018;
 * from memory).
 */
export function writeCouplingLoss(
  read: GainRead,
  storageCapacitance: number,
  writeWordlineSwing: number,
): number {
  const cc = read.writeCouplingCapacitance;
  return cc > 0 ? (writeWordlineSwing * cc) / (cc + storageCapacitance) : 0;
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
  seriesDevices = 1,
  differential = false,
): GainReadSignals {
  const swing = (current: number) => Math.min(arrayVoltage, (current * senseTime) / readBitlineCapacitance);
  const readCurrent = gainReadCurrent(read, storedHigh, seriesDevices);
  const dropHigh = swing(readCurrent);
  const dropLow = swing(read.readOffCurrent + (cellsPerBitline - 1) * read.unselectedLeakageCurrent);
  // A differential cell (4T, 6T) pulls one line of its own pair while the other sees only leakage: the
  // whole difference is the signal. A single-ended cell is compared with a reference midway.
  return { readCurrent, dropHigh, dropLow, senseSignal: (dropHigh - dropLow) / (differential ? 1 : 2) };
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
  seriesDevices = 1,
  differential = false,
): number {
  const neededDrop = (differential ? 1 : 2) * requiredSignal + dropLow;
  if (neededDrop > arrayVoltage) return Infinity;
  return levelForReadCurrent(read, (neededDrop * readBitlineCapacitance) / senseTime, seriesDevices);
}
