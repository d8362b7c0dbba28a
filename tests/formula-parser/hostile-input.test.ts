import { errorCode } from '../support/error-code.js';
import { describe, expect, it } from 'vitest';
import { formulaMass } from '../../src/mass/formula-mass.js';

const code = (input: string) => errorCode(() => formulaMass(input));

describe('hostile input gets a clear error, never a crash or a hang', () => {
  it('20,000-deep nesting', () => {
    const deep = '('.repeat(20000) + 'H' + ')'.repeat(20000);
    expect(code(deep)).toBe('INPUT_TOO_LONG'); // the length limit speaks first
    // with the limit raised, the depth limit stops it before the recursive parser sees it
    expect(() => formulaMass(deep, { maxLength: 100_000 })).toThrow(/nested more than 32 deep/);
    expect(() => formulaMass('('.repeat(40) + 'H' + ')'.repeat(40))).toThrow(/nested more than 32 deep/);
  });

  it('a 100 kB formula', () => {
    expect(code('CH2'.repeat(34000))).toBe('INPUT_TOO_LONG');
  });

  it('a formula just under the length limit still works', () => {
    expect(code('CH2'.repeat(3000))).toBeNull();
  });

  it('huge counts and counts that multiply past 10^12 atoms', () => {
    expect(code('C99999999999999999999')).toBe('COUNT_TOO_LARGE');
    expect(code('((((C999999999)999999999)999)999)')).toBe('COUNT_TOO_LARGE');
  });

  it('control characters, escape sequences and NUL', () => {
    expect(code('H2O\u001b[31m')).toBe('CONTROL_CHARACTER');
    expect(code('\u0007')).toBe('CONTROL_CHARACTER');
  });

  it('prototype keys are just unknown words', () => {
    expect(code('__proto__')).toBe('UNEXPECTED_CHARACTER');
    expect(code('constructor')).toBe('UNKNOWN_ELEMENT');
    expect(code('Constructor')).toBe('UNKNOWN_ELEMENT');
    expect(code('ToString')).toBe('UNKNOWN_ELEMENT');
    expect(code('[1Constructor]')).toBe('UNKNOWN_ELEMENT');
  });

  it('emoji and other symbols', () => {
    expect(code('H2O💧')).toBe('UNEXPECTED_CHARACTER');
  });

  it('many charges and signs', () => {
    expect(code('Na^+^+')).toBe('MISPLACED_CHARGE');
    expect(code('+'.repeat(1000))).not.toBeNull();
  });
});
