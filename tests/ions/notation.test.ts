import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { readIonNotation, isIonNotation } from '../../src/ions/read-ion-notation.js';
import { readIonLine } from '../../src/ions/read-ion-line.js';
import { readIonSheet } from '../../src/ions/ion-sheet.js';
import { errorCode } from '../support/error-code.js';

function issue(text: string) {
  try {
    readIonNotation(text);
  } catch (e) {
    expect(e).toBeInstanceOf(PondusError);
    return (e as PondusError).first;
  }
  throw new Error(`'${text}' was read`);
}

describe('reading the ion notation', () => {
  // the notations of the trade (common practice of ESI/APCI reporting)
  it.each([
    ['[M+H]+', '[M+H]+', 1, false, 1, [[1, 1, 'H']]],
    ['[M+Na]+', '[M+Na]+', 1, false, 1, [[1, 1, 'Na']]],
    ['[M+K]+', '[M+K]+', 1, false, 1, [[1, 1, 'K']]],
    ['[M+Li]+', '[M+Li]+', 1, false, 1, [[1, 1, 'Li']]],
    ['[M+NH4]+', '[M+NH4]+', 1, false, 1, [[1, 1, 'H4N']]],
    ['[M-H]-', '[M-H]-', -1, false, 1, [[-1, 1, 'H']]],
    ['[M−H]−', '[M-H]-', -1, false, 1, [[-1, 1, 'H']]],
    ['[M+Cl]-', '[M+Cl]-', -1, false, 1, [[1, 1, 'Cl']]],
    ['[M+HCOO]-', '[M+HCOO]-', -1, false, 1, [[1, 1, 'CHO2']]],
    ['[M+2H]2+', '[M+2H]2+', 2, false, 1, [[1, 2, 'H']]],
    ['[M+H-H2O]+', '[M+H-H2O]+', 1, false, 1, [[1, 1, 'H'], [-1, 1, 'H2O']]],
    ['[2M+Na]+', '[2M+Na]+', 1, false, 2, [[1, 1, 'Na']]],
    ['M+•', 'M+•', 1, true, 1, []],
    ['M−•', 'M-•', -1, true, 1, []],
    ['M+.', 'M+•', 1, true, 1, []],
    ['M-.', 'M-•', -1, true, 1, []],
    ['M•+', 'M+•', 1, true, 1, []],
    ['[M + H]+', '[M+H]+', 1, false, 1, [[1, 1, 'H']]],
    ['[M+2H]²⁺', '[M+2H]2+', 2, false, 1, [[1, 2, 'H']]],
  ] as const)('%s', (text, canonical, charge, radical, multiplier, terms) => {
    const n = readIonNotation(text);
    expect(n.canonical).toBe(canonical);
    expect(n.charge).toBe(charge);
    expect(n.radical).toBe(radical);
    expect(n.multiplier).toBe(multiplier);
    expect(n.terms.map((t) => [t.sign, t.count, t.formula])).toEqual(terms);
    expect(n.formula).toBeNull();
  });

  it('writes the journal form with spaces around the signs', () => {
    expect(readIonNotation('[M+H-H2O]+').journal).toBe('[M + H - H2O]+');
    expect(readIonNotation('M+.').journal).toBe('M+•');
  });

  it('reads a formula in place of M', () => {
    const n = readIonNotation('[C15H15NO2+H]+');
    expect(n.formula).toBe('C15H15NO2');
    expect(n.formulaColumn).toBe(2);
    expect(readIonNotation('[[13C]6H12O6+Na]+').formula).toBe('[13C]6H12O6');
  });

  it('refuses a missing charge, with the column after the bracket', () => {
    const i = issue('[M+H]');
    expect(i.code).toBe('BAD_ION');
    expect(i.column).toBe(6);
    expect(i.message).toContain('no charge');
  });

  it('refuses an unclosed bracket at the bracket', () => {
    expect(issue('[M+H').column).toBe(1);
  });

  it('points a bad adduct formula into the notation', () => {
    const i = issue('[M+Xx]+');
    expect(i.code).toBe('UNKNOWN_ELEMENT');
    expect(i.column).toBe(4);
  });

  it('asks for brackets when terms are written without them', () => {
    const i = issue('M+H+');
    expect(i.code).toBe('BAD_ION');
    expect(i.column).toBe(2);
    expect(i.hint).toContain('[M+H]');
  });

  it('asks for the number before the sign', () => {
    const i = issue('[M+2H]+2');
    expect(i.message).toContain('write 2+');
    expect(i.column).toBe(8);
  });

  it('refuses charged terms, M twice, lower-case m, a dangling sign and trailing text', () => {
    expect(issue('[M+SO4^2-]-').message).toContain('carries a charge');
    expect(issue('[M+M]+').message).toContain('M may appear once');
    expect(issue('[m+H]+').message).toContain('capital');
    expect(issue('[M+]+').message).toContain('expected an adduct formula');
    expect(issue('[M+H]+ x').column).toBe(8);
    expect(issue('').code).toBe('BAD_ION');
    expect(issue('M+•+').code).toBe('BAD_ION');
    expect(issue('[M+H]+\u0007').code).toBe('CONTROL_CHARACTER');
    expect(issue('[M+H]' + '+'.repeat(300)).code).toBe('INPUT_TOO_LONG');
    expect(issue('[0M+H]+').code).toBe('BAD_ION');
    expect(issue('[M+H]0+').code).toBe('BAD_ION');
  });

  it('tells notations from formulas', () => {
    expect(isIonNotation('[M+Na]+')).toBe(true);
    expect(isIonNotation('NaCl')).toBe(false);
  });
});

describe('batch lines and sheets', () => {
  it('splits FORMULA ION FOUND, FORMULA FOUND, ION FOUND and a lone formula', () => {
    expect(readIonLine('C15H15NO2 [M+H]+ 242.1172')).toEqual({ formula: 'C15H15NO2', ion: '[M+H]+', found: '242.1172' });
    expect(readIonLine('  C15H15NO2\t[M + H]+  ')).toEqual({ formula: 'C15H15NO2', ion: '[M + H]+', found: null });
    expect(readIonLine('C15H15NO2 242.1172')).toEqual({ formula: 'C15H15NO2', ion: null, found: '242.1172' });
    expect(readIonLine('[C6H12O6+Na]+ 203.0524')).toEqual({ formula: null, ion: '[C6H12O6+Na]+', found: '203.0524' });
    expect(readIonLine('[13C]6H12O6 [M+Na]+')).toEqual({ formula: '[13C]6H12O6', ion: '[M+Na]+', found: null });
    expect(errorCode(() => readIonLine('   '))).toBe('EMPTY_INPUT');
  });

  it('reads a lab sheet with id, formula, ion and found columns, keeping line numbers', () => {
    const rows = readIonSheet('id,formula,ion,found\nAB-7,C15H15NO2,[M+H]+,242.1172\n\nAB-8,C14H15NO3S,[M-H]-,\n');
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatchObject({ line: 2, id: 'AB-7', formula: 'C15H15NO2', ion: '[M+H]+', found: '242.1172' });
    expect(rows[1]).toMatchObject({ line: 4, id: 'AB-8', found: '' });
    expect(errorCode(() => readIonSheet('id,ion\nA,[M+H]+\n'))).toBe('BAD_RECORD');
  });
});

describe('any text', () => {
  it('is read or refused with a PondusError, never a crash', async () => {
    const fc = (await import('fast-check')).default;
    const { ionMass } = await import('../../src/ions/ion-mass.js');
    const pieces = fc.constantFrom('[', ']', 'M', '2', '+', '-', '−', '•', '.', 'H', 'Na', 'H2O', ' ', '(', ')', '^', '⁺', '²', 'm', 'Cl', 'x', '\u0000', '[13C]');
    fc.assert(
      fc.property(fc.oneof(fc.string(), fc.array(pieces, { maxLength: 14 }).map((a) => a.join(''))), (text) => {
        expect(errorCode(() => readIonNotation(text))).not.toBe('INTERNAL_ERROR');
        expect(errorCode(() => ionMass('C6H6', text))).not.toBe('INTERNAL_ERROR');
        expect(errorCode(() => readIonLine(text))).not.toBe('INTERNAL_ERROR');
      }),
      { numRuns: 1500 },
    );
  });
});
