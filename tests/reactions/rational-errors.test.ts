import { describe, expect, it } from 'vitest';
import { Rational } from '../../src/reactions/rational.js';
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
