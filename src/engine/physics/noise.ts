/**
 * Coupling-noise allowance on a bit line during sensing. Neighbouring bit lines swing by half the array
 * voltage; a share Cbb/Cbl of that couples onto this line, and the pair rejects all but a fraction κ as
 * common mode (κ small for folded pairs that run side by side, larger for open pairs in different mats):
 *   V_noise = κ · (Cbb / Cbl) · VDD / 2.
 * Source: capacitive-divider coupling (common practice); folded-versus-open noise rejection as described
 * in N. Weste, D. Harris, CMOS VLSI Design, 4th ed., 2011, §12.3, and K. Itoh, VLSI Memory Chip Design,
 * Springer, 2001, ch. 3 (from memory). κ is a process input, not derived.
 *
 * @param couplingCapacitance Cbb, the bit line's total coupling to neighbouring bit lines (F).
 * @param bitlineCapacitance Cbl, its total capacitance (F), > 0.
 * @param arrayVoltage VDD (V). @param noiseFactor κ (ratio).
 * @returns the noise allowance (V).
 */
export function couplingNoise(
  couplingCapacitance: number,
  bitlineCapacitance: number,
  arrayVoltage: number,
  noiseFactor: number,
): number {
  if (bitlineCapacitance <= 0) return 0;
  return (noiseFactor * couplingCapacitance * arrayVoltage) / (2 * bitlineCapacitance);
}
