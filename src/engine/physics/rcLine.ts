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
  // Σ|aₙ| over all modes and over those past the first few, for the bound in fractionBelow.
  let weightSum = 0;
  let laterWeights = 0;
  for (let n = TERMS - 1; n >= 0; n--) {
    weightSum += Math.abs(modes.weights[n] as number);
    if (n === FIRST_MODES) laterWeights = weightSum;
  }
  const slack = ROUNDING_SLACK * (1 + weightSum);
  // The response rises monotonically; bracket s, then bisect. The slowest mode bounds the upper end.
  const slowest = modes.rates[0] as number;
  let high = Math.max(1, (-Math.log1p(-fraction) + 5) / slowest);
  while (fractionBelow(modes, high, fraction, laterWeights, slack)) high *= 2;
  let low = 0;
  for (let i = 0; i < TIME_ITERATIONS; i++) {
    const mid = (low + high) / 2;
    if (fractionBelow(modes, mid, fraction, laterWeights, slack)) low = mid;
    else high = mid;
  }
  return (low + high) / 2;
}

/** Modes summed before the rest is bounded (see fractionBelow). */
const FIRST_MODES = 4;
/**
 * Far more than the rounding of either sum: each of 16 terms and additions is off by a few units in
 * the last place of numbers no larger than Σ|aₙ|, some 20·Σ|aₙ|·2⁻⁵³ ≈ 2e-15·Σ|aₙ| in all.
 */
const ROUNDING_SLACK = 1e-12;

/**
 * Whether farEndFraction(modes, s) < fraction, for s ≥ 0 and 0 < fraction < 1 — the same answer, most
 * often without all 16 terms. The first FIRST_MODES terms give 1 − Σ; the others add at most
 * Σₙ₌₄ |aₙ|·exp(−βₙ²·s) ≤ laterWeights·exp(−β₄²·s) (rates rise with n), and rounding at most `slack`.
 * Only when the fraction lies within that bound of the partial sum is the whole sum formed. (The clamp to
 * [0, 1] keeps either side of a fraction inside (0, 1).)
 */
function fractionBelow(
  modes: LineModes,
  s: number,
  fraction: number,
  laterWeights: number,
  slack: number,
): boolean {
  const { rates, weights } = modes;
  let rest = 0;
  for (let n = 0; n < FIRST_MODES; n++) rest += (weights[n] as number) * Math.exp(-(rates[n] as number) * s);
  const partial = 1 - rest;
  const bound = laterWeights * Math.exp(-(rates[FIRST_MODES] as number) * s) * (1 + 1e-9) + slack;
  if (partial - bound >= fraction) return false;
  if (partial + bound < fraction) return true;
  return farEndFraction(modes, s) < fraction;
}
