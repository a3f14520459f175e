/**
 * Inverse of the standard normal cumulative distribution, Φ⁻¹(p), by P. J. Acklam's rational
 * approximation (relative error below 1.15e-9 over the whole range).
 * Source: P. J. Acklam, "An algorithm for computing the inverse normal cumulative distribution
 * function", 2003 (published algorithm and coefficients).
 *
 * @param p probability in (0, 1).
 * @returns z with Φ(z) = p; ±Infinity at 0 and 1; NaN outside [0, 1].
 */
export function inverseNormal(p: number): number {
  if (Number.isNaN(p) || p < 0 || p > 1) return Number.NaN;
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  const low = 0.02425;
  if (p < low) {
    const q = Math.sqrt(-2 * Math.log(p));
    return poly(C, q) / (poly(D, q) * q + 1);
  }
  if (p <= 1 - low) {
    const q = p - 0.5;
    const r = q * q;
    return (poly(A, r) * q) / (poly(B, r) * r + 1);
  }
  const q = Math.sqrt(-2 * Math.log1p(-p));
  return -poly(C, q) / (poly(D, q) * q + 1);
}

const A = [
  -39.69683028665376, 220.9460984245205, -275.9285104469687, 138.357751867269, -30.66479806614716,
  2.506628277459239,
];
const B = [-54.47609879822406, 161.5858368580409, -155.6989798598866, 66.80131188771972, -13.28068155288572];
const C = [
  -0.007784894002430293, -0.3223964580411365, -2.400758277161838, -2.549732539343734, 4.374664141464968,
  2.938163982698783,
];
const D = [0.007784695709041462, 0.3224671290700398, 2.445134137142996, 3.754408661907416];

/** Horner evaluation of c0·xⁿ + c1·xⁿ⁻¹ + … + cn. */
function poly(coefficients: readonly number[], x: number): number {
  let sum = 0;
  for (const c of coefficients) sum = sum * x + c;
  return sum;
}

/**
 * Upper-tail quantile for a small probability p: z with P(Z > z) = p, computed as −Φ⁻¹(p) so that
 * p far below machine epsilon keeps its precision (1 − p would round to 1).
 */
export function upperTailQuantile(p: number): number {
  return -inverseNormal(p);
}
