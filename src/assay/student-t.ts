/**
 * Two-sided critical values of Student's t, computed rather than tabulated:
 * the two-sided tail probability of t with ν degrees of freedom is the
 * regularised incomplete beta function I_x(ν/2, 1/2) at x = ν/(ν + t²)
 * (Abramowitz & Stegun 26.7.1 and 26.5.27, from memory), evaluated by its
 * continued fraction (modified Lentz), and the critical value is found by
 * bisection. tests/assay/student-t.test.ts checks the values against the
 * printed table for ν = 1–30, 40, 60, 120 and ∞.
 */
import { fail } from '../errors/pondus-error.js';

const LANCZOS = [76.18009172947146, -86.50532032941677, 24.01409824083091, -1.231739572450155, 0.1208650973866179e-2, -0.5395239384953e-5];

/**
 * ln Γ(x) for x > 0 (Lanczos approximation, about 15 digits).
 *
 * @param x - a positive number.
 * @returns ln Γ(x).
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * Math.round(Math.exp(logGamma(5))) // 24
 */
export function logGamma(x: number): number {
  let y = x;
  const tmp = x + 5.5 - (x + 0.5) * Math.log(x + 5.5);
  let ser = 1.000000000190015;
  for (const c of LANCZOS) ser += c / ++y;
  return -tmp + Math.log((2.5066282746310005 * ser) / x);
}

function betaContinuedFraction(a: number, b: number, x: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= 500; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = 1 + aa / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h;
}

/**
 * The regularised incomplete beta function I_x(a, b).
 *
 * @param x - the upper limit, 0 to 1.
 * @param a - the first shape parameter, positive.
 * @param b - the second shape parameter, positive.
 * @returns the regularised incomplete beta function I_x(a, b).
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * Math.round(incompleteBeta(0.5, 2, 2) * 1e9) / 1e9 // 0.5
 */
export function incompleteBeta(x: number, a: number, b: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log(1 - x));
  return x < (a + 1) / (a + b + 2) ? (front * betaContinuedFraction(a, b, x)) / a : 1 - (front * betaContinuedFraction(b, a, 1 - x)) / b;
}

/**
 * Two-sided tail probability P(|T| > t) for ν degrees of freedom.
 *
 * @param t - the t statistic.
 * @param df - the degrees of freedom.
 * @returns the two-sided probability of a |t| at least as large.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * Math.abs(twoSidedP(12.706, 1) - 0.05) < 1e-4 // true
 */
export function twoSidedP(t: number, df: number): number {
  return incompleteBeta(df / (df + t * t), df / 2, 0.5);
}

/**
 * The two-sided critical value of t at a confidence level (in percent, 50–99.9) for ν ≥ 1 degrees of freedom (Infinity for the normal limit).
 *
 * @param levelPercent - the two-sided confidence level, 50 to 99.9.
 * @param df - the degrees of freedom, a whole number of at least 1 (Infinity for the normal limit).
 * @returns the critical value t.
 * @throws PondusError: BAD_OPTION for a level or degrees of freedom out of range; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * tCritical(95, 6).toFixed(3) // '2.447'
 */
export function tCritical(levelPercent: number, df: number): number {
  if (!(levelPercent >= 50 && levelPercent <= 99.9)) throw fail({ code: 'BAD_OPTION', message: `the confidence level must be between 50 and 99.9 %; got ${levelPercent}` });
  if (!(df >= 1) || !Number.isInteger(df) && df !== Infinity) throw fail({ code: 'BAD_OPTION', message: `degrees of freedom must be a whole number of at least 1; got ${df}` });
  const alpha = 1 - levelPercent / 100;
  const p = (t: number) => (df === Infinity ? normalTwoSided(t) : twoSidedP(t, df));
  let lo = 0;
  let hi = 1;
  while (p(hi) > alpha) hi *= 2;
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (p(mid) > alpha) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** P(|Z| > z) for the standard normal, from the incomplete gamma function's relation to erfc (z²/2 with a = 1/2). */
function normalTwoSided(z: number): number {
  return erfc(z / Math.SQRT2);
}

/** erfc by the continued fraction of the incomplete gamma function Γ(1/2, x²)/Γ(1/2) (series below 1.5). */
function erfc(x: number): number {
  const a = 0.5;
  const xx = x * x;
  const gln = logGamma(a);
  if (xx < a + 1) {
    let sum = 1 / a;
    let del = sum;
    let ap = a;
    for (let n = 0; n < 500; n++) {
      ap++;
      del *= xx / ap;
      sum += del;
      if (Math.abs(del) < Math.abs(sum) * 1e-16) break;
    }
    return 1 - sum * Math.exp(-xx + a * Math.log(xx) - gln);
  }
  let b = xx + 1 - a;
  let c = 1 / 1e-300;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 500; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < 1e-300) d = 1e-300;
    c = b + an / c;
    if (Math.abs(c) < 1e-300) c = 1e-300;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < 1e-16) break;
  }
  return Math.exp(-xx + a * Math.log(xx) - gln) * h;
}
