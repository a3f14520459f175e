/**
 * Die yield from random defects, and dies per wafer. Plain numbers, SI units (areas in m², defect
 * densities in defects per m², lengths in m).
 */

/**
 * Poisson yield Y = exp(−A·D): the probability that a die of critical area A holds no killing defect when
 * killing defects fall independently at density D.
 * Source: the Poisson yield model (e.g. M. J. Flynn, "Computer Architecture: Pipelined and Parallel
 * Processor Design", 1995, §2 on die area and yield).
 */
export function poissonYield(area: number, defectDensity: number): number {
  return Math.exp(-area * defectDensity);
}

/**
 * Negative-binomial yield Y = (1 + A·D/α)^(−α): defects that cluster, the density varying from die to die
 * as a gamma distribution with shape α (small α = strong clustering; α → ∞ gives the Poisson yield).
 * Source: C. H. Stapper's clustered-defect yield model (IBM J. Res. Dev., 1980s); the form used in
 * J. L. Hennessy, D. A. Patterson, "Computer Architecture: A Quantitative Approach", die-yield formula.
 *
 * @param clustering the cluster parameter α (> 0); Infinity gives the Poisson yield.
 */
export function negativeBinomialYield(area: number, defectDensity: number, clustering: number): number {
  if (!(clustering > 0)) return Number.NaN;
  if (!Number.isFinite(clustering)) return poissonYield(area, defectDensity);
  // (1 + x/α)^(−α) = exp(−α·log1p(x/α)) keeps precision for large α.
  return Math.exp(-clustering * Math.log1p((area * defectDensity) / clustering));
}

/**
 * Gross dies per wafer: N = π(d/2)²/S − π·d/√(2S), the wafer area over the die area less the dies lost
 * along the rim (the rim's length over the diagonal of a square die). Returns the real-valued estimate;
 * callers floor it to count whole dies. Never negative.
 * Source: J. L. Hennessy, D. A. Patterson, "Computer Architecture: A Quantitative Approach", 5th ed., 2012,
 * ch. 1 (cost of an integrated circuit), dies-per-wafer formula.
 *
 * @param waferDiameter usable wafer diameter d (m).
 * @param dieArea die area S (m²).
 */
export function grossDiesPerWafer(waferDiameter: number, dieArea: number): number {
  if (!(waferDiameter > 0) || !(dieArea > 0)) return Number.NaN;
  const gross =
    (Math.PI * (waferDiameter / 2) ** 2) / dieArea - (Math.PI * waferDiameter) / Math.sqrt(2 * dieArea);
  return Math.max(0, gross);
}

/** Good dies per wafer: whole gross dies times the die yield. */
export function goodDiesPerWafer(grossDies: number, dieYield: number): number {
  return Math.floor(grossDies) * dieYield;
}
