/**
 * Correctly rounded quotients of exact integers in plain double arithmetic, for the
 * hot path of percentages: the double nearest to 100·a/b, the same number Decimal
 * gives, without a Decimal per element. The first guess is within an ulp or two of the
 * answer; the neighbours are compared by their exact residuals c·b − 100·a, each
 * product held as an unevaluated sum of two doubles (Dekker's exact product).
 */

const SPLITTER = 134217729; // 2^27 + 1

/** Exact product of two doubles as hi + lo (no overflow in this use). */
function twoProduct(a: number, b: number, out: Float64Array): void {
  const p = a * b;
  let c = SPLITTER * a;
  const ah = c - (c - a);
  const al = a - ah;
  c = SPLITTER * b;
  const bh = c - (c - b);
  const bl = b - bh;
  out[0] = p;
  out[1] = al * bl - (((p - ah * bh) - al * bh) - ah * bl);
}

const x = new Float64Array(2);
const y = new Float64Array(2);
const bits = new Float64Array(1);
const words = new Uint32Array(bits.buffer);
const LOW = new Uint8Array(new Uint32Array([1]).buffer)[0] === 1 ? 0 : 1;

/** The neighbour of a positive finite double one ulp up (step 1) or down (step -1). */
function neighbour(q: number, step: 1 | -1): number {
  bits[0] = q;
  const lo = words[LOW];
  if (step === 1) {
    if (lo === 0xffffffff) {
      words[LOW] = 0;
      words[1 - LOW]++;
    } else words[LOW] = lo + 1;
  } else if (lo === 0) {
    words[LOW] = 0xffffffff;
    words[1 - LOW]--;
  } else words[LOW] = lo - 1;
  return bits[0];
}

/** c·b − k·a, with rounding far below the gap between neighbours' residuals. */
function residual(c: number, b: number, ka: Float64Array): number {
  twoProduct(c, b, y);
  return y[0] - ka[0] + (y[1] - ka[1]);
}

/** True when a positive double's last mantissa bit is 0 (the even one of a tie). */
function isEven(q: number): boolean {
  bits[0] = q;
  return (words[LOW] & 1) === 0;
}

/**
 * The double nearest to k·a/b for non-negative safe integers a and b > 0 (and a small
 * integer k): `scaledRatio(m, M, 100)` is the percent by mass of a part of mass m in M.
 *
 * @param a the numerator, a safe integer ≥ 0
 * @param b the denominator, a safe integer > 0
 * @param k the factor, a small positive integer (100 for percent)
 * @returns the correctly rounded double of k·a/b
 * @example
 * scaledRatio(2016000000000, 18015000000000, 100) // 11.190674437968359
 */
export function scaledRatio(a: number, b: number, k: number): number {
  if (a === 0) return 0;
  twoProduct(k, a, x);
  let q = x[0] / b;
  // k·a held exactly in one double: the division itself is correctly rounded (IEEE 754, ties to even)
  if (x[1] === 0) return q;
  let r = residual(q, b, x);
  if (r === 0) return q;
  // step towards the exact quotient while that brings the residual down (at most an ulp or two)
  const step = r > 0 ? -1 : 1;
  for (let i = 0; i < 4; i++) {
    const n = neighbour(q, step);
    const rn = residual(n, b, x);
    const an = Math.abs(rn);
    const aq = Math.abs(r);
    if (an > aq || (an === aq && isEven(q))) return q;
    q = n;
    r = rn;
    if (r === 0 || r > 0 !== step < 0) return q;
  }
  return q;
}
