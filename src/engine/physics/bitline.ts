import type { ProcessProfile } from '../../model/process';

/** Parts of one bit line's capacitance (F), each shown in the breakdown. */
export interface BitlineCapacitance {
  /** cells × per-cell junction and contact capacitance */
  readonly junction: number;
  /** cells × per-cell coupling to the word lines it crosses */
  readonly wordlineCoupling: number;
  /** cells × per-cell coupling to the neighbouring bit lines */
  readonly bitlineCoupling: number;
  /** wire capacitance per length × bit-line length */
  readonly wire: number;
  /** the sense amplifier's input */
  readonly senseAmp: number;
  readonly total: number;
}

/**
 * Bit-line capacitance as the sum of its parts (a lumped sum of parallel capacitances):
 *   Cbl = N·(Cj + Cbw + Cbb) + c_wire·L_bl + C_sa
 * Source: B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001, ch. 2, bit-line
 * capacitance components (from memory).
 *
 * @param cellsPerBitline N, cells connected to the bit line.
 * @param bitlineLength L_bl (m).
 */
export function bitlineCapacitance(
  process: ProcessProfile,
  cellsPerBitline: number,
  bitlineLength: number,
): BitlineCapacitance {
  const junction = cellsPerBitline * process.bitlineJunctionCapacitancePerCell;
  const wordlineCoupling = cellsPerBitline * process.bitlineToWordlineCapacitancePerCell;
  const bitlineCoupling = cellsPerBitline * process.bitlineToBitlineCapacitancePerCell;
  const wire = process.bitlineWireCapacitancePerLength * bitlineLength;
  const senseAmp = process.senseAmpInputCapacitance;
  return {
    junction,
    wordlineCoupling,
    bitlineCoupling,
    wire,
    senseAmp,
    total: junction + wordlineCoupling + bitlineCoupling + wire + senseAmp,
  };
}
