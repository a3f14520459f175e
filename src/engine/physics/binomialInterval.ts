/**
 * Wilson score interval for a binomial proportion: k successes in n trials, two-sided at confidence 1 − a
 * with z = Φ⁻¹(1 − a/2): centre (p̂ + z²/2n)/(1 + z²/n), half-width z/(1 + z²/n)·√(p̂(1−p̂)/n + z²/4n²).
 * It stays inside [0, 1] and keeps its coverage at 0 and n successes, unlike the Wald interval.
 * Source: E. B. Wilson, "Probable inference, the law of succession, and statistical inference", JASA 22,
 * 1927; compared in R. G. Newcombe, "Two-sided confidence intervals for the single proportion: comparison
 * of seven methods", Statistics in Medicine 17, 1998 (method 3).
 */
export interface ProportionInterval {
  readonly estimate: number;
  readonly low: number;
  readonly high: number;
  /** Two-sided confidence level of [low, high]. */
  readonly confidence: number;
}

/** z for a two-sided 95 % interval, Φ⁻¹(0.975). */
export const Z_95 = 1.959963984540054;

export function wilsonInterval(
  successes: number,
  trials: number,
  z = Z_95,
  confidence = 0.95,
): ProportionInterval {
  if (!(trials > 0)) return { estimate: Number.NaN, low: 0, high: 1, confidence };
  const p = successes / trials;
  const z2 = z * z;
  const denominator = 1 + z2 / trials;
  const centre = (p + z2 / (2 * trials)) / denominator;
  const half = (z / denominator) * Math.sqrt((p * (1 - p)) / trials + z2 / (4 * trials * trials));
  return {
    estimate: p,
    low: Math.max(0, centre - half),
    high: Math.min(1, centre + half),
    confidence,
  };
}
