import { errorCode } from '../support/error-code.js';
import { describe, expect, it } from 'vitest';
import { calc } from '../../src/calc/calc.js';

const code = (e: string) => errorCode(() => calc(e));

describe('hostile expressions get clear errors', () => {
  it('division by zero', () => {
    expect(code('1 / 0')).toBe('DIVISION_BY_ZERO');
    expect(code('5.0 g / (2.0 g - 2.0 g)')).toBe('DIVISION_BY_ZERO');
    expect(code('0^-1')).toBe('DIVISION_BY_ZERO');
  });

  it('10,000 nested parentheses', () => {
    expect(code('('.repeat(10000) + '1' + ')'.repeat(10000))).toBe('INPUT_TOO_LONG');
    expect(code('('.repeat(100) + '1' + ')'.repeat(100))).toBe('NESTING_TOO_DEEP');
    expect(code('('.repeat(32) + '1' + ')'.repeat(32))).toBeNull();
    expect(code('('.repeat(33) + '1' + ')'.repeat(33))).toBe('NESTING_TOO_DEEP');
  });

  it('unknown units and words', () => {
    expect(code('5 apples')).toBe('UNKNOWN_UNIT');
    expect(code('5 furlongs + 2 g')).toBe('UNKNOWN_UNIT');
  });

  it('huge numbers', () => {
    expect(code('1e999999')).toBe('NUMBER_OUT_OF_RANGE');
    expect(code('1e900 ^ 100')).toBe('NUMBER_OUT_OF_RANGE');
  });

  it('malformed expressions', () => {
    expect(code('')).toBe('EMPTY_INPUT');
    expect(code('1 +')).toBe('BAD_EXPRESSION');
    expect(code('2 3')).toBe('BAD_EXPRESSION');
    expect(code('g')).toBe('BAD_EXPRESSION');
    expect(code('2 ^ 1.5')).toBe('BAD_EXPRESSION');
    expect(code('M(Xx)')).toBe('UNKNOWN_ELEMENT');
    expect(code('(1')).toBe('UNCLOSED_GROUP');
    expect(code('__proto__')).not.toBeNull();
  });
});
