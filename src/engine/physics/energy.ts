/**
 * Bit-line energy of one activation with half-VDD precharge and equalisation: each sensed pair draws
 * Cbl·VDD/2 of charge from VDD, so E = pairs · Cbl · VDD² / 2.
 * Source: common-practice derivation (shared/REFERENCES.md entry 13): 80 fF, 1.1 V → 48.4 fJ per pair.
 */
export function bitlinePairEnergy(pairs: number, bitlineCapacitance: number, arrayVoltage: number): number {
  return (pairs * bitlineCapacitance * arrayVoltage * arrayVoltage) / 2;
}

/**
 * Energy drawn from a supply to charge a capacitance to the supply level: E = C·V² (half of it is lost
 * in the charging resistance). Used for the word line (to VPP) and the sense-amplifier latches (to VDD).
 * Source: Rabaey et al., Digital Integrated Circuits, 2nd ed., 2003, ch. 5, dynamic power (from memory).
 */
export function chargingEnergy(capacitance: number, voltage: number): number {
  return capacitance * voltage * voltage;
}

/**
 * Energy to restore a read bit line precharged to VDD after it fell by ΔV: E = C·VDD·ΔV per line
 * (charge C·ΔV drawn from VDD). Common practice (no source).
 */
export function readBitlineRestoreEnergy(
  lines: number,
  capacitance: number,
  arrayVoltage: number,
  drop: number,
): number {
  return lines * capacitance * arrayVoltage * drop;
}
