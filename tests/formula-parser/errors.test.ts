import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { renderError } from '../../src/errors/render.js';
import { parseFormula, safeParseFormula } from '../../src/formula-parser/parse.js';

function issue(input: string, options = {}) {
  try {
    parseFormula(input, options);
  } catch (e) {
    if (e instanceof PondusError) return { ...e.first, rendered: renderError(e) };
    throw e;
  }
  throw new Error(`expected ${input} to fail`);
}

describe('parse errors name the problem and the column', () => {
  it.each([
    ['', 'EMPTY_INPUT', undefined],
    ['   ', 'EMPTY_INPUT', undefined],
    ['Xx2', 'UNKNOWN_ELEMENT', 1],
    ['NaXy', 'UNKNOWN_ELEMENT', 3],
    ['co2', 'UNKNOWN_ELEMENT', 1],
    ['Ca(OH2', 'UNCLOSED_GROUP', 3],
    ['Ca(OH)2]', 'UNMATCHED_CLOSING', 8],
    ['K4[Fe(CN)6)', 'MISMATCHED_BRACKET', 11],
    ['Ca()2', 'EMPTY_GROUP', 3],
    ['H0', 'BAD_COUNT', 2],
    ['H02', 'BAD_COUNT', 2],
    ['C1234567890', 'COUNT_TOO_LARGE', 2],
    ['H1.1234567', 'BAD_COUNT', 2],
    ['NH4+', 'AMBIGUOUS_CHARGE', 4],
    ['SO42-', 'AMBIGUOUS_CHARGE', 5],
    ['SO4^2-H', 'MISPLACED_CHARGE', 4],
    ['Fe^0+', 'BAD_CHARGE', 3],
    ['H2O·', 'UNEXPECTED_TOKEN', 5],
    ['·H2O', 'UNEXPECTED_TOKEN', 1],
    ['H2O,NaCl', 'UNEXPECTED_CHARACTER', 4],
    ['H2O\u0000', 'CONTROL_CHARACTER', 4],
    ['[99C]', 'UNKNOWN_ISOTOPE', 1],
    ['²D', 'UNKNOWN_ISOTOPE', 1],
    ['Ac2O', 'AMBIGUOUS_READING', 1],
    ['DMF', 'UNKNOWN_ELEMENT', 2],
    ['2', 'UNEXPECTED_TOKEN', 2],
  ])('%j → %s at column %s', (input, code, column) => {
    const i = issue(input);
    expect(i.code).toBe(code);
    expect(i.column).toBe(column);
  });

  it('draws a caret under the column', () => {
    expect(issue('NaXy').rendered).toBe("error UNKNOWN_ELEMENT: unknown element symbol 'Xy'\n  NaXy\n    ^^");
  });

  it('hints at the intended symbols when the case slipped', () => {
    expect(issue('co2').hint).toContain("'CO2' or 'Co2'");
    expect(issue('NACL').hint).toContain("'NaCl'");
    expect(issue('h2o').hint).toContain("'H2O'");
    expect(issue('nacl').hint).toContain("'NaCl'");
    expect(issue('DMF').hint).toContain('N,N-dimethylformamide (C3H7NO)');
  });

  it('offers every reading of an ambiguous charge, ammonium first', () => {
    // source: NH4^+ is the ammonium ion (IUPAC Red Book, from memory); NH^4+ is the other split of the same text
    const i = issue('NH4+');
    expect(i.hint).toBe('write NH4^+ (count 4, charge 1+) or NH^4+ (charge 4+)');
  });

  it('counts columns in characters, not UTF-16 units', () => {
    expect(issue('H₂O₂Xx').column).toBe(5);
  });
});

describe('an alkyl prefix written with a hyphen', () => {
  it('is refused with the formula written without it, the same substance', () => {
    // n-BuLi, t-BuOK: the names as chemists write them; in a formula the prefix goes without the hyphen (common practice)
    for (const [written, joined] of [['n-BuLi', 'nBuLi'], ['t-BuOK', 'tBuOK']]) {
      const r = safeParseFormula(written);
      expect(r.success).toBe(false);
      if (!r.success) expect(r.error.issues[0].hint).toBe(`write the alkyl prefix without the hyphen: ${joined}`);
      expect(safeParseFormula(joined).success).toBe(true);
    }
  });
});

describe('a refused formula keeps what was noted before it failed', () => {
  it('the addition dot, the state symbol set aside; none for a plain failure', () => {
    // common practice: '.' between two formulas is the addition dot (Na2CO3·10H2O)
    const dot = safeParseFormula('Na2CO3.10H2O.Xx');
    expect(dot.success).toBe(false);
    if (!dot.success) expect(dot.error.notes.map((n) => n.code)).toEqual(['DOT_AS_ADDITION']);
    const state = safeParseFormula('Xx(aq)');
    if (!state.success) expect(state.error.notes.map((n) => n.code)).toEqual(['STATE_SYMBOL']);
    expect(state.success).toBe(false);
    const plain = safeParseFormula('Xx2');
    if (!plain.success) expect(plain.error.notes).toEqual([]);
    expect(plain.success).toBe(false);
  });
});
