/**
 * Wire-delay conventions. Matloom reports 50 % delays (input step to half swing at the far end):
 * lumped RC: 0.69·RC; uniform distributed RC line: 0.38·RC (exact 0.3787; Elmore gives RC/2).
 * Source: J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits, 2nd ed., 2003, ch. 4,
 * wire models (from memory; the coefficients follow from the diffusion equation).
 */
export const LUMPED_RC_50 = Math.LN2;
export const DISTRIBUTED_RC_50 = 0.38;

/**
 * Word-line delay of a line driven at one end by a driver of resistance Rd, line resistance Rw and
 * capacitance Cw (gate loads spread along it):
 *   t50 = 0.69·Rd·Cw + 0.38·Rw·Cw.
 * Source: Rabaey et al., 2003, ch. 4, driver-plus-distributed-wire form (from memory).
 *
 * @returns t50 (s).
 */
export function drivenLineDelay(
  driverResistance: number,
  lineResistance: number,
  lineCapacitance: number,
): number {
  return (
    LUMPED_RC_50 * driverResistance * lineCapacitance + DISTRIBUTED_RC_50 * lineResistance * lineCapacitance
  );
}

/**
 * Bit-line development time of a 1T1C read: the cell discharges through the access transistor into the
 * series combination of Cs and Cbl, then the signal spreads along the distributed bit line:
 *   t50 = 0.69·R_access·(Cs·Cbl/(Cs + Cbl)) + 0.38·R_bl·Cbl.
 * Common practice (no source) for combining the two terms.
 */
export function chargeSharingDelay(
  accessResistance: number,
  storageCapacitance: number,
  bitlineResistance: number,
  bitlineCapacitance: number,
): number {
  const series = (storageCapacitance * bitlineCapacitance) / (storageCapacitance + bitlineCapacitance);
  return (
    LUMPED_RC_50 * accessResistance * series + DISTRIBUTED_RC_50 * bitlineResistance * bitlineCapacitance
  );
}
