/**
 * Atom counts: plain numbers while they are whole and exact (the common case,
 * kept fast), Decimal as soon as a decimal count or a very large product appears.
 */
import { Decimal } from '../exact/decimal.js';

export type Amount = number | Decimal;

/**
 * Reads a count as written ('2', '0.5') into an Amount.
 *
 * @example
 * amountOf('12') // 12
 */
export function amountOf(text: string, integer: boolean): Amount {
  return integer ? Number(text) : new Decimal(text);
}

/**
 * Product of two amounts, exact.
 *
 * @example
 * mulAmount(2, 3) // 6
 */
export function mulAmount(a: Amount, b: Amount): Amount {
  if (typeof a === 'number' && typeof b === 'number') {
    const p = a * b;
    if (Number.isSafeInteger(p)) return p;
  }
  return normalise(new Decimal(a).times(b));
}

/**
 * Sum of two amounts, exact.
 *
 * @example
 * addAmount(new Decimal('0.5'), 0.5) // 1
 */
export function addAmount(a: Amount, b: Amount): Amount {
  if (typeof a === 'number' && typeof b === 'number') {
    const s = a + b;
    if (Number.isSafeInteger(s)) return s;
  }
  return normalise(new Decimal(a).plus(b));
}

/** A Decimal that is a safe integer becomes a number again. */
function normalise(d: Decimal): Amount {
  if (d.isInteger() && d.abs().lte(Number.MAX_SAFE_INTEGER)) return d.toNumber();
  return d;
}

/**
 * The amount as a Decimal.
 *
 * @example
 * toDecimal(3).toString() // '3'
 */
export function toDecimal(a: Amount): Decimal {
  return typeof a === 'number' ? new Decimal(a) : a;
}

/**
 * The amount as text, exactly ('0.5', '12').
 *
 * @example
 * amountText(new Decimal('0.50')) // '0.5'
 */
export function amountText(a: Amount): string {
  return typeof a === 'number' ? String(a) : a.toFixed();
}

/**
 * True when the amount is a whole number.
 *
 * @example
 * isWhole(new Decimal('1.5')) // false
 */
export function isWhole(a: Amount): boolean {
  return typeof a === 'number' || a.isInteger();
}
