/** The standard normal upper tail and the complementary error function it is built on. */

/**
 * Standard normal upper tail Q(z) = ½·erfc(z/√2), by W. J. Cody's rational Chebyshev approximation of
 * erfc (relative error below 1e-13 wherever the result is a normal double).
 * Source: W. J. Cody, "Rational Chebyshev approximations for the error function", Math. Comp. 23, 1969.
 */
export function normalUpperTail(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  return 0.5 * erfc(z / Math.SQRT2);
}

// Cody's erfc coefficients (Math. Comp. 23, 1969), as used in many numerical libraries.
const ERF_A = [3.1611237438705655, 113.86415415105016, 377.485237685302, 3209.3775891384694];
const ERF_B = [23.601290952344122, 244.02463793444417, 1282.6165260773723, 2844.236833439171];
const ERFC_C = [
  0.5641884969886701, 8.883149794388377, 66.11919063714163, 298.6351381974001, 881.952221241769,
  1712.0476126340707, 2051.0783778260716, 1230.3393547979972, 2.1531153547440383e-8,
];
const ERFC_D = [
  15.744926110709835, 117.6939508913125, 537.1811018620099, 1621.3895745666903, 3290.7992357334597,
  4362.619090143247, 3439.3676741437216, 1230.3393548037495,
];
const ERFC_P = [
  0.30532663496123236, 0.36034489994980445, 0.12578172611122926, 0.016083785148742275, 0.0006587491615298378,
  0.016315387137302097,
];
const ERFC_Q = [
  2.568520192289822, 1.8729528499234673, 0.5279051029514285, 0.06051834131244132, 0.0023352049762686918,
];

/** Complementary error function erfc(x), Cody 1969. */
export function erfc(x: number): number {
  const y = Math.abs(x);
  let result: number;
  if (y <= 0.46875) {
    const z = y * y;
    let num = 0.18577770618460315 * z;
    let den = z;
    for (let i = 0; i < 3; i++) {
      num = (num + (ERF_A[i] as number)) * z;
      den = (den + (ERF_B[i] as number)) * z;
    }
    const erfValue = (x * (num + (ERF_A[3] as number))) / (den + (ERF_B[3] as number));
    return 1 - erfValue;
  } else if (y <= 4) {
    let num = (ERFC_C[8] as number) * y;
    let den = y;
    for (let i = 0; i < 7; i++) {
      num = (num + (ERFC_C[i] as number)) * y;
      den = (den + (ERFC_D[i] as number)) * y;
    }
    result = (num + (ERFC_C[7] as number)) / (den + (ERFC_D[7] as number));
    result *= expSquaredNeg(y);
  } else {
    if (y >= 26.6) {
      result = 0;
    } else {
      const z = 1 / (y * y);
      let num = (ERFC_P[5] as number) * z;
      let den = z;
      for (let i = 0; i < 4; i++) {
        num = (num + (ERFC_P[i] as number)) * z;
        den = (den + (ERFC_Q[i] as number)) * z;
      }
      result = (z * (num + (ERFC_P[4] as number))) / (den + (ERFC_Q[4] as number));
      result = (1 / Math.sqrt(Math.PI) - result) / y;
      result *= expSquaredNeg(y);
    }
  }
  return x < 0 ? 2 - result : result;
}

/** exp(−y²) split as Cody does, so that large y keeps its relative precision. */
function expSquaredNeg(y: number): number {
  const ysq = Math.trunc(y * 16) / 16;
  const del = (y - ysq) * (y + ysq);
  return Math.exp(-ysq * ysq) * Math.exp(-del);
}
