/**
 * Greatest common divisor and least common multiple, of safe integers or of BigInts: the one
 * implementation the formula reader (multipliers of fractions) and the exact fractions of the
 * balancer share.
 */
import { fail } from '../errors/pondus-error.js';

/**
 * Greatest common divisor of two integers of the same kind (numbers or BigInts), ignoring signs;
 * gcd(0, 0) is 0. Anything else is refused (BAD_NUMBER).
 *
 * @example
 * gcd(12, 18)   // 6
 * gcd(12n, 18n) // 6n
 * gcd(-4, 6)    // 2
 */
export function gcd(a: number, b: number): number;
export function gcd(a: bigint, b: bigint): bigint;
export function gcd(a: number | bigint, b: number | bigint): number | bigint {
  if (typeof a === 'bigint' && typeof b === 'bigint') {
    let x = a < 0n ? -a : a;
    let y = b < 0n ? -b : b;
    while (y !== 0n) [x, y] = [y, x % y];
    return x;
  }
  if (typeof a === 'number' && typeof b === 'number' && Number.isSafeInteger(a) && Number.isSafeInteger(b)) return wholeGcd(a, b);
  throw fail({ code: 'BAD_NUMBER', message: 'gcd takes two safe integers or two BigInts' });
}

/**
 * {@link gcd} of two safe integers the caller has already checked, on plain numbers with no
 * check and nothing allocated: for the inner loops of exact elimination.
 *
 * @example
 * wholeGcd(-12, 18) // 6
 * wholeGcd(0, 0)    // 0
 */
export function wholeGcd(a: number, b: number): number {
  let x = a < 0 ? -a : a;
  let y = b < 0 ? -b : b;
  while (y !== 0) {
    const t = x % y;
    x = y;
    y = t;
  }
  return x;
}

/**
 * Least common multiple of two positive integers of the same kind.
 *
 * @example
 * lcm(4, 6)   // 12
 * lcm(4n, 6n) // 12n
 */
export function lcm(a: number, b: number): number;
export function lcm(a: bigint, b: bigint): bigint;
export function lcm(a: number | bigint, b: number | bigint): number | bigint {
  if (typeof a === 'bigint' && typeof b === 'bigint') return (a / gcd(a, b)) * b;
  if (typeof a === 'number' && typeof b === 'number') return (a / gcd(a, b)) * b;
  throw fail({ code: 'BAD_NUMBER', message: 'lcm takes two safe integers or two BigInts' });
}
