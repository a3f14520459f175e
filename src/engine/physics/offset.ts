import type { OffsetStacking } from '../../model/process';
import { upperTailQuantile } from './statistics';

/**
 * Pelgrom's law: standard deviation of the threshold mismatch of a transistor pair,
 *   σ(ΔVt) = A_VT / √(W·L).
 * Source: M. Pelgrom, A. Duinmaijer, A. Welbers, "Matching Properties of MOS Transistors",
 * IEEE JSSC 24(5), 1989 (published law).
 *
 * @param matchingCoefficient A_VT (V·m).
 * @param width W (m). @param length L (m).
 * @returns σ (V).
 */
export function pelgromSigma(matchingCoefficient: number, width: number, length: number): number {
  return matchingCoefficient / Math.sqrt(width * length);
}

/**
 * How many σ of offset the sense amplifiers must tolerate so that, of `senseAmpCount` amplifiers on the
 * die, on average no more than `allowedFailures` see an offset beyond the budget. An amplifier reads both
 * data, so an offset beyond the budget in either direction opposes one of them: both tails count,
 *   P(|offset| > k·σ) = 2·Q(k) = allowedFailures / senseAmpCount  →  k = Q⁻¹(f / (2N)).
 * Common practice (no source) for the failure-count budget (shared/REFERENCES.md entry 24).
 *
 * @returns k ≥ 0 (0 when every amplifier may fail).
 */
export function offsetSigmaMultiplier(senseAmpCount: number, allowedFailures: number): number {
  if (senseAmpCount <= 0) return 0;
  const p = Math.min(0.5, allowedFailures / (2 * senseAmpCount));
  // Math.max also turns the −0 of p = ½ into 0.
  return Math.max(0, upperTailQuantile(p));
}

/**
 * Adds the offset budget and the noise allowance: linearly (worst case, both at their limit together)
 * or as a root sum of squares (independent). Geib et al., IEEE JSSC, July 1992, stack a 27 mV 5σ offset
 * and 10 mV of bit-line asymmetry linearly to 37 mV.
 */
export function stackOffsets(offsetBudget: number, noise: number, stacking: OffsetStacking): number {
  return stacking === 'linear' ? offsetBudget + noise : Math.hypot(offsetBudget, noise);
}
