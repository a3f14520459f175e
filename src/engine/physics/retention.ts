import { upperTailQuantile } from './statistics';

/** Boltzmann constant (J/K), exact since the 2019 SI redefinition (BIPM, The International System of Units, 9th ed., 2019). */
export const BOLTZMANN = 1.380649e-23;

/**
 * Arrhenius scaling of a leakage current from its reference temperature:
 *   I(T) = I_ref · exp(−(Ea/k)·(1/T − 1/T_ref)).
 * Source: Arrhenius law; for DRAM junction leakage see K. Itoh, VLSI Memory Chip Design, Springer, 2001
 * (from memory).
 *
 * @param referenceCurrent I_ref (A) at `referenceTemperature` (K).
 * @param activationEnergy Ea (J). @param temperature T (K).
 * @returns I(T) (A).
 */
export function leakageAtTemperature(
  referenceCurrent: number,
  referenceTemperature: number,
  activationEnergy: number,
  temperature: number,
): number {
  return (
    referenceCurrent *
    Math.exp((-activationEnergy / BOLTZMANN) * (1 / temperature - 1 / referenceTemperature))
  );
}

/**
 * Activation energy that makes leakage grow by `ratio` from T1 to T2 (J):
 *   Ea = k·ln(ratio) / (1/T1 − 1/T2).
 * "Retention halves per 10 °C" is ratio 2 over a 10 K step.
 */
export function activationEnergyForRatio(
  ratio: number,
  lowTemperature: number,
  highTemperature: number,
): number {
  return (BOLTZMANN * Math.log(ratio)) / (1 / lowTemperature - 1 / highTemperature);
}

/**
 * Time for a constant leakage current to move a storage node by `allowedDroop`:
 *   t = Cs · ΔV / I.
 * Source: charge balance Q = C·V = I·t (arithmetic); constant-current leakage of the order of
 * femtoamperes per cell, IEICE Trans. Electron. E79-C(12):1707, 1996.
 *
 * @param storageCapacitance Cs (F). @param allowedDroop ΔV (V), clipped at 0. @param leakage I (A), > 0.
 * @returns t (s).
 */
export function retentionTime(storageCapacitance: number, allowedDroop: number, leakage: number): number {
  return (storageCapacitance * Math.max(0, allowedDroop)) / leakage;
}

/** Voltage a storage node loses in `time` to a constant `leakage`: ΔV = I·t/Cs (V). */
export function leakageDroop(leakage: number, time: number, storageCapacitance: number): number {
  return (leakage * time) / storageCapacitance;
}

/**
 * Leakage of the weakest cell among `cells` in a two-population retention model: most cells leak
 * `typicalLeakage`; a share `tailFraction` belongs to a tail whose leakage is log-normal with median
 * `tailMedianLeakage` and spread σ = `tailSpread` in ln(I). The weakest of the n = tailFraction·cells tail
 * cells sits at the expected largest of n normal samples, Blom's plotting position
 * z = Φ⁻¹((n − 0.375)/(n + 0.25)) (G. Blom, Statistical Estimates and Transformed Beta-Variables, Wiley,
 * 1958; from memory). With no tail cell on the die the typical leakage is the weakest.
 * Two-population model: T. Hamamoto, S. Sugiura, S. Sawada, "On the retention time distribution of
 * dynamic random access memory (DRAM)", IEEE Trans. Electron Devices 45(6), 1998 (from memory).
 *
 * @returns the weakest cell's leakage (A), never below the typical leakage.
 */
export function weakestCellLeakage(
  typicalLeakage: number,
  tailMedianLeakage: number,
  tailFraction: number,
  tailSpread: number,
  cells: number,
): number {
  const n = tailFraction * cells;
  if (!(n >= 1)) return typicalLeakage;
  const z = upperTailQuantile(0.625 / (n + 0.25));
  return Math.max(typicalLeakage, tailMedianLeakage * Math.exp(tailSpread * z));
}
