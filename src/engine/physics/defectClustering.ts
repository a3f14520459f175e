/**
 * Defect clustering at die scale: the defect density of a die is D·X with X gamma-distributed, mean 1 and
 * shape α (Stapper's compound Poisson model; the negative-binomial yield is its zero-fault case). Any
 * yield that is known for a fixed density becomes the clustered yield by averaging over X.
 */

/**
 * E[f(X)] for X ~ Gamma(shape α, mean 1): ∫ f(x)·α^α x^(α−1) e^(−αx)/Γ(α) dx, by adaptive Simpson
 * quadrature (absolute tolerance 1e-7) up to the point where the gamma tail holds less than 1e-16 of the
 * mass. For α < 1 the substitution t = x^α removes the x^(α−1) singularity (x^(α−1) dx = dt/α).
 *
 * @param f a function of the density multiplier x ≥ 0 with values in [0, 1].
 * @param clustering α > 0; Infinity (no clustering) returns f(1).
 */
export function clusteredExpectation(f: (multiplier: number) => number, clustering: number): number {
  if (!Number.isFinite(clustering)) return f(1);
  if (!(clustering > 0)) return Number.NaN;
  const alpha = clustering;
  const logNorm = alpha * Math.log(alpha) - logGamma(alpha);
  // Beyond x = 1 + 40/√α + 40/α the gamma tail is far below 1e-16.
  const upperX = 1 + 40 / Math.sqrt(alpha) + 40 / alpha;
  if (alpha < 1) {
    const integrand = (t: number): number => {
      const x = t ** (1 / alpha);
      return f(x) * Math.exp(logNorm - alpha * x);
    };
    return integrate(integrand, upperX ** alpha) / alpha;
  }
  const integrand = (x: number): number =>
    x === 0
      ? alpha === 1
        ? f(0) * Math.exp(logNorm)
        : 0
      : f(x) * Math.exp(logNorm + (alpha - 1) * Math.log(x) - alpha * x);
  return integrate(integrand, upperX);
}

/** Absolute tolerance of the integral (the results are probabilities, shown to 4 digits). */
const TOLERANCE = 1e-7;

/**
 * ∫_0^upper g by adaptive Simpson over panels that shrink geometrically towards 0 (upper/2^k), so a
 * sharp feature near zero (a large fault count decays like e^(−λx)) is never stepped over.
 */
function integrate(g: (x: number) => number, upper: number): number {
  const panels = 24;
  let total = 0;
  let b = upper;
  for (let i = 0; i < panels; i++) {
    const a = i === panels - 1 ? 0 : b / 2;
    const fa = g(a);
    const fb = g(b);
    const fm = g((a + b) / 2);
    const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
    total += adaptiveSimpson(g, a, b, fa, fm, fb, whole, TOLERANCE / panels, 30);
    b = a;
  }
  return total;
}

function adaptiveSimpson(
  g: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tolerance: number,
  depth: number,
): number {
  const m = (a + b) / 2;
  const lm = (a + m) / 2;
  const rm = (m + b) / 2;
  const flm = g(lm);
  const frm = g(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth <= 0 || Math.abs(delta) <= 15 * tolerance) return left + right + delta / 15;
  return (
    adaptiveSimpson(g, a, m, fa, flm, fm, left, tolerance / 2, depth - 1) +
    adaptiveSimpson(g, m, b, fm, frm, fb, right, tolerance / 2, depth - 1)
  );
}

/**
 * ln Γ(x) for x > 0 by the Lanczos approximation (g = 7, 9 coefficients; relative error ~1e-15).
 * Source: C. Lanczos, "A Precision Approximation of the Gamma Function", SIAM J. Numer. Anal. B1, 1964;
 * coefficients as tabulated by P. Godfrey [from memory].
 */
export function logGamma(x: number): number {
  if (x < 0.5) return Math.log(Math.PI / Math.abs(Math.sin(Math.PI * x))) - logGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0] as number;
  const t = z + 7.5;
  for (let i = 1; i < 9; i++) a += (LANCZOS[i] as number) / (z + i);
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

const LANCZOS = [
  0.9999999999998099, 676.5203681218851, -1259.1392167224028, 771.3234287776531, -176.6150291621406,
  12.507343278686905, -0.13857109526572012, 9.984369578019572e-6, 1.5056327351493116e-7,
];
