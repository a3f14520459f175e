/** One double and its two 32-bit words, to read a double's exponent and build a power of two. */
const BITS = new Float64Array(1);
const WORDS = new Int32Array(BITS.buffer);
/** Index of the word holding sign and exponent: the second on a little-endian machine. */
const HIGH = new Uint8Array(Uint16Array.of(1).buffer)[0] === 1 ? 1 : 0;
const LOW = 1 - HIGH;
/** 2^52 and 2^53: a double's significand as an integer lies in [2^52, 2^53). */
const SIGNIFICAND_LOW = 2 ** 52;
const SIGNIFICAND_HIGH = 2 ** 53;

/**
 * `s` with `v` added `n` times, rounded after each addition: the double `for (…) s += v` ends with, to the
 * bit, in about two steps per power of two the sum passes instead of n (a whole die's mats mostly share one
 * figures object, and an interpreted loop boxes every partial sum).
 *
 * Why it is exact: while the sum lies in one binade [2^e, 2^(e+1)), the doubles there are the multiples
 * of u = 2^(e − 52), and the sum is one. Adding v (v/u = q + f exactly: a power-of-two scaling) rounds
 * to the sum plus d·u, d = q or q + 1 as f < ½ or > ½, as long as the exact sum stays below 2^(e+1);
 * so every such addition adds the same d·u, and t of them add t·d·u at once, exactly (the result is a
 * multiple of u no larger than 2^(e+1)). A tie (f = ½, where rounding to even alternates), a sum or v
 * that is not a positive normal double, a v not small beside the sum, and the addition that leaves the
 * binade each take one plain addition. IEEE 754 round-to-nearest-even, as JavaScript numbers are.
 */
export function repeatedSum(s: number, v: number, n: number): number {
  if (!(n > 0)) return s;
  // After one addition of a zero the sum is its own sum with that zero (±0 + ±0 rounds alike each time).
  if (v === 0) return s + v;
  // Negative sums of negative addends round as their mirror images do (round-to-nearest-even is
  // symmetric, and no sum is 0 after the first addition).
  if (v < 0 && s <= 0) return -repeatedSum(-s, -v, n);
  let sum = s;
  let left = n;
  while (left > 0) {
    BITS[0] = sum;
    const exponent = ((WORDS[HIGH] as number) >>> 20) & 0x7ff;
    // u below is a normal double and 2^(e+1) is finite; v positive and finite.
    if (!(sum > 0 && exponent > 52 && exponent < 2046 && v > 0 && v < Infinity)) {
      sum += v;
      left--;
      continue;
    }
    WORDS[HIGH] = (exponent - 52) << 20;
    WORDS[LOW] = 0;
    const u = BITS[0] as number;
    const ratio = v / u;
    const q = Math.floor(ratio);
    const f = ratio - q;
    if (!(ratio < SIGNIFICAND_LOW) || f === 0.5) {
      sum += v;
      left--;
      continue;
    }
    const d = f > 0.5 ? q + 1 : q;
    // v is less than half the spacing: no addition changes the sum any more.
    if (d === 0) return sum;
    // Additions j = 0, 1, … stay in the binade while (sum/u + j·d) + q + f < 2^53, i.e. j·d ≤ room − 1
    // (integers, 0 ≤ f < 1). The quotient is rounded: step back while it counts one too many.
    const room = SIGNIFICAND_HIGH - sum / u - q;
    let t = room >= 1 ? Math.floor((room - 1) / d) + 1 : 0;
    while (t > 0 && (t - 1) * d > room - 1) t--;
    if (t === 0) {
      sum += v;
      left--;
      continue;
    }
    const steps = t < left ? t : left;
    sum += steps * d * u;
    left -= steps;
  }
  return sum;
}
