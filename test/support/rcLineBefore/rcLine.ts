/**
 * rcLine.ts as it was before farEndTimeShare decided most comparisons from the first few modes: the
 * oracle of test/engine/rcLineFast.test.ts (the same root finds, every fraction evaluated in full).
 */
/**
 * Step response of a uniform distributed RC line (total resistance R, total capacitance C, far end open)
 * driven through a source resistance Rd, at its far end. With s = t/(R·C) and r = Rd/R, the diffusion
 * equation with the boundary conditions v(0) = V − r·∂v/∂x (source) and ∂v/∂x(1) = 0 (open end) has the
 * eigen-solution
 *   v_far(s)/V = 1 − Σₙ aₙ·exp(−βₙ²·s),   βₙ·tan βₙ = 1/r,   aₙ = (sin βₙ/βₙ) / (½ + sin 2βₙ/(4βₙ)).
 * With r = 0 this is the classic series 1 − (4/π)·Σ (−1)ⁿ/(2n+1)·exp(−(2n+1)²π²s/4), whose 50 % and 90 %
 * points are 0.38·RC and 1.0·RC (J. Rabaey, A. Chandrakasan, B. Nikolić, Digital Integrated Circuits,
 * 2nd ed., 2003, wire chapter, step-response table; from memory); with r → ∞ it becomes the lumped
 * 1 − exp(−t/(Rd·C)). Series solution of the heat equation: H. S. Carslaw, J. C. Jaeger, Conduction of
 * Heat in Solids, 2nd ed., 1959, §3.10 (radiation boundary condition; from memory).
 */

/** Eigen-terms kept: the 16th decays as exp(−(15.5π)²·s), negligible beyond s ≈ 0.02 (a 1 % swing). */
const TERMS = 16;
/** Most Newton steps per eigenvalue (it converges in a handful); bisection steps for a time (2⁻⁴⁰). */
const ROOT_ITERATIONS = 40;
const TIME_ITERATIONS = 40;

/** The eigenvalues βₙ² and weights aₙ of a line with source-to-line resistance ratio r. */
export interface LineModes {
  readonly rates: Float64Array;
  readonly weights: Float64Array;
}

/**
 * βₙ in (nπ, nπ + π/2) solves h(β) = r·β·sin β − cos β = 0 (β·tan β = 1/r), by Newton steps kept inside
 * the bracket (a bisection step whenever Newton would leave it).
 */
export function lineModes(ratio: number): LineModes {
  const rates = new Float64Array(TERMS);
  const weights = new Float64Array(TERMS);
  const r = Math.max(0, ratio);
  for (let n = 0; n < TERMS; n++) {
    let low = n * Math.PI;
    let high = n * Math.PI + Math.PI / 2;
    let beta = high;
    if (r > 0) {
      // h(low) has the sign of −cos(nπ), h(high) the opposite one.
      const lowSign = n % 2 === 0 ? -1 : 1;
      beta = (low + high) / 2;
      for (let i = 0; i < ROOT_ITERATIONS; i++) {
        const sin = Math.sin(beta);
        const cos = Math.cos(beta);
        const h = r * beta * sin - cos;
        if (h === 0) break;
        if (Math.sign(h) === lowSign) low = beta;
        else high = beta;
        const slope = r * sin + r * beta * cos + sin;
        let next = beta - h / slope;
        if (!(next > low && next < high)) next = (low + high) / 2;
        if (Math.abs(next - beta) < 1e-15 * (1 + beta)) {
          beta = next;
          break;
        }
        beta = next;
      }
    }
    rates[n] = beta * beta;
    weights[n] = Math.sin(beta) / beta / (0.5 + Math.sin(2 * beta) / (4 * beta));
  }
  return { rates, weights };
}

/** Far-end voltage as a share of the step, at s = t/(R·C). */
export function farEndFraction(modes: LineModes, s: number): number {
  let rest = 0;
  for (let n = 0; n < TERMS; n++)
    rest += (modes.weights[n] as number) * Math.exp(-(modes.rates[n] as number) * s);
  return Math.min(1, Math.max(0, 1 - rest));
}

/**
 * Time for the far end of a driven distributed line to reach `fraction` of its step (s).
 * Without line resistance it is the lumped −Rd·C·ln(1 − fraction); with neither resistance, 0.
 * Returns Infinity for a fraction of 1 or more, NaN for a fraction below 0.
 */
export function drivenLineTime(
  driverResistance: number,
  lineResistance: number,
  lineCapacitance: number,
  fraction: number,
  /**
   * s = t/(R·C) for a fraction, when the caller already knows the line's response (several fractions of
   * one line, or a LineTimeMemo); by default from lineModes(Rd/R).
   */
  timeShare?: (fraction: number) => number,
): number {
  if (!(fraction >= 0)) return Number.NaN;
  if (fraction >= 1) return Infinity;
  if (fraction === 0 || lineCapacitance <= 0) return 0;
  if (lineResistance <= 0) return -driverResistance * lineCapacitance * Math.log1p(-fraction);
  const tau = lineResistance * lineCapacitance;
  const share = timeShare
    ? timeShare(fraction)
    : farEndTimeShare(lineModes(driverResistance / lineResistance), fraction);
  return share * tau;
}

/**
 * The dimensionless time s = t/(R·C) at which the far end of a line with these modes reaches `fraction`
 * of its step, for 0 < fraction < 1. It depends on the line only through its modes (the ratio Rd/R), so
 * lines of one ratio share it (LineTimeMemo).
 */
export function farEndTimeShare(modes: LineModes, fraction: number): number {
  // The response rises monotonically; bracket s, then bisect. The slowest mode bounds the upper end.
  const slowest = modes.rates[0] as number;
  let high = Math.max(1, (-Math.log1p(-fraction) + 5) / slowest);
  while (farEndFraction(modes, high) < fraction) high *= 2;
  let low = 0;
  for (let i = 0; i < TIME_ITERATIONS; i++) {
    const mid = (low + high) / 2;
    if (farEndFraction(modes, mid) < fraction) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}
