import { describe, expect, it } from 'vitest';
import { gcd, nullSpace, Rational, smallestIntegers } from '../../src/reactions/rational.js';
import { PondusError } from '../../src/errors/pondus-error.js';

const codeOf = (f: () => unknown) => {
  try {
    f();
  } catch (e) {
    return e instanceof PondusError ? e.first.code : `not a PondusError: ${String(e)}`;
  }
  return 'no error';
};

describe('exact fractions from text', () => {
  it.each([
    ['0.95', '19/20'],
    ['-0.125', '-1/8'],
    ['1e21', '1000000000000000000000'],
    ['2.5E-3', '1/400'],
    ['12', '12'],
  ])('%s is %s', (text, fraction) => {
    expect(Rational.fromDecimal(text).toString()).toBe(fraction);
  });

  it.each(['', 'x', '1/2', 'NaN', 'Infinity', '1e400000'])('%j is refused with a PondusError', (text) => {
    expect(['BAD_NUMBER', 'NUMBER_OUT_OF_RANGE']).toContain(codeOf(() => Rational.fromDecimal(text)));
  });

  it('a zero denominator and division by zero are PondusErrors', () => {
    expect(codeOf(() => Rational.of(1n, 0n))).toBe('DIVISION_BY_ZERO');
    expect(codeOf(() => Rational.ONE.div(Rational.ZERO))).toBe('DIVISION_BY_ZERO');
  });
});

describe('misuse of the fraction helpers is a PondusError, never a TypeError', () => {
  /* eslint-disable @typescript-eslint/no-explicit-any */
  it.each([
    ['a float numerator', () => Rational.of(1.5 as any)],
    ['a number denominator', () => Rational.of(1n, 2 as any)],
    ['a number operand', () => Rational.ONE.plus(3 as any)],
    ['a null operand', () => Rational.ONE.times(null as any)],
    ['a string operand', () => Rational.ONE.div('2' as any)],
    ['a null decimal', () => Rational.fromDecimal(null as any)],
    ['an object decimal', () => Rational.fromDecimal({} as any)],
    ['a fraction as text', () => Rational.fromDecimal('1/2')],
    ['hex text', () => Rational.fromDecimal('0x10')],
    ['gcd of numbers', () => gcd(4 as any, 6 as any)],
    ['a ragged matrix', () => nullSpace([[Rational.ONE], []], 1)],
    ['a matrix of numbers', () => nullSpace([[1 as any, 2 as any]], 2)],
    ['a list of numbers', () => smallestIntegers([1 as any])],
  ])('%s', (_what, f) => {
    expect(codeOf(f)).toBe('BAD_NUMBER');
  });

  it('converts exactly to a plain number', () => {
    expect(Rational.of(1n, 2n).toNumber()).toBe(0.5);
    expect(Rational.fromDecimal('1e21').toNumber()).toBe(1e21);
  });
});
