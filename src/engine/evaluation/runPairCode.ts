import { ABUTMENT_TOLERANCE } from '../../geometry/rect';

/**
 * The vertical relation of a run of mats and a run of strips (geometry/blockRuns.ts: every block of a
 * run spans the run's top … bottom, with bottom = top + height as every box test forms it) as one small
 * code, so that the connection pass (servedRuns.ts) compares run pairs by integers: whether the strips'
 * bottom lies on the mats' top edge or their top on the mats' bottom edge (within the tolerance), and how
 * the stretch of the mats' height they share covers it. Every test is the one the block-by-block pass
 * (servedLines.ts, connectEachMat) makes on the same doubles.
 */

/** The code's bits: the other run's bottom on the mats' top edge (within the tolerance)… */
const MEETS_FIRST = 1;
/** …its top on the mats' bottom edge… */
const MEETS_SECOND = 2;
/** …the stretch of the mats' height it shares is longer than the tolerance… */
const PASSES = 4;
/** …starts beyond the tolerance from the top… */
const STARTS_LATE = 8;
/** …and reaches the mats' bottom within the tolerance (against the reach given). */
const REACHES = 16;

const NEGATIVE_TOLERANCE = -ABUTMENT_TOLERANCE;

/**
 * What run `s` is to the mats of run `r` (`top`/`bottom` per run, m), the stretch measured against
 * `reach` (the length of the edge a left or right strip serves, less the tolerance).
 */
export function runPairCode(
  top: Float64Array,
  bottom: Float64Array,
  r: number,
  s: number,
  reach: number,
): number {
  const ownTop = top[r] as number;
  const ownBottom = bottom[r] as number;
  const otherTop = top[s] as number;
  const otherBottom = bottom[s] as number;
  const dFirst = otherBottom - ownTop;
  const dSecond = otherTop - ownBottom;
  const tol = ABUTMENT_TOLERANCE;
  // The stretch shared runs from max(own top, its top) to min(own bottom, its bottom), from the top.
  const shareFrom = otherTop > ownTop ? otherTop - ownTop : 0;
  const shareTo = (otherBottom < ownBottom ? otherBottom : ownBottom) - ownTop;
  return (
    (dFirst > tol || dFirst < NEGATIVE_TOLERANCE ? 0 : MEETS_FIRST) |
    (dSecond > tol || dSecond < NEGATIVE_TOLERANCE ? 0 : MEETS_SECOND) |
    (shareTo - shareFrom > tol ? PASSES : 0) |
    (shareFrom > tol ? STARTS_LATE : 0) |
    (shareTo >= reach ? REACHES : 0)
  );
}
