import type { ProcessProfile } from '../../model/process';

/** Parts of one bit line's capacitance (F), each shown in the breakdown. */
export interface BitlineCapacitance {
  /** cells × per-cell junction and contact capacitance */
  readonly junction: number;
  /** word lines crossed × coupling per crossing */
  readonly wordlineCoupling: number;
  /** word-line pitches run × coupling to the neighbouring bit lines per pitch */
  readonly bitlineCoupling: number;
  /** wire capacitance per length × bit-line length */
  readonly wire: number;
  /** the sense amplifier's input */
  readonly senseAmp: number;
  readonly total: number;
}

/**
 * Bit-line capacitance as the sum of its parts (a lumped sum of parallel capacitances). A bit line is
 * loaded by every word line it crosses, not only by those that hold one of its cells: in a folded array
 * it crosses 2N word lines for N cells.
 *   Cbl = N·Cj + N_wl·(Cbw + Cbb) + c_wire·L_bl + C_sa
 * Source: B. Keeth, R. J. Baker, DRAM Circuit Design: A Tutorial, IEEE Press, 2001, ch. 2, bit-line
 * capacitance components (from memory).
 *
 * @param cellsPerBitline N, cells connected to the bit line.
 * @param wordlinesCrossed N_wl, word lines the bit line crosses (N / crossing occupancy).
 * @param bitlineLength L_bl (m).
 */
export function bitlineCapacitance(
  process: ProcessProfile,
  cellsPerBitline: number,
  wordlinesCrossed: number,
  bitlineLength: number,
): BitlineCapacitance {
  const junction = cellsPerBitline * process.bitlineJunctionCapacitancePerCell;
  const wordlineCoupling = wordlinesCrossed * process.bitlineToWordlineCapacitancePerCrossing;
  const bitlineCoupling = wordlinesCrossed * process.bitlineToBitlineCapacitancePerCrossing;
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
