// Every problem the formula reader can find in one input is reported, in the order of the input,
// up to a bound (the error codes and columns are pondus's own contract).
import { describe, expect, it } from 'vitest';
import { MAX_ISSUES, PondusError } from '../../src/errors/pondus-error.js';
import { parseFormula } from '../../src/formula-parser/parse.js';
import { prescanAll } from '../../src/formula-parser/prescan.js';

function failure(input: string): PondusError {
  try {
    parseFormula(input);
  } catch (e) {
    if (e instanceof PondusError) return e;
    throw e;
  }
  throw new Error(`expected ${input} to fail`);
}
const found = (input: string) => failure(input).issues.map((i) => [i.code, i.column]);

describe('the formula reader reports every problem it finds', () => {
  it('both unknown symbols of XxQq, each at its column', () => {
    const e = failure('XxQq');
    expect(found('XxQq')).toEqual([['UNKNOWN_ELEMENT', 1], ['UNKNOWN_ELEMENT', 3]]);
    expect(e.issues.map((i) => i.message)).toEqual(["unknown element symbol 'Xx'", "unknown element symbol 'Qq'"]);
    expect(e.more).toBe(false);
  });

  it('stray characters and the unknown symbols among them, in the order of the text', () => {
    expect(found('Xx,Qq;')).toEqual([['UNKNOWN_ELEMENT', 1], ['UNEXPECTED_CHARACTER', 3], ['UNKNOWN_ELEMENT', 4], ['UNEXPECTED_CHARACTER', 6]]);
  });

  it('a grammar error and the unknown symbols the tokens show', () => {
    // the formula ends after the addition dot, and Qq is no element
    expect(found('Qq2·')).toEqual([['UNKNOWN_ELEMENT', 1], ['UNEXPECTED_TOKEN', 5]]);
    expect(found('H2O2Qq^2+H')).toEqual([['UNKNOWN_ELEMENT', 5], ['MISPLACED_CHARGE', 7]]);
  });

  it('every bracket problem, and every control character', () => {
    expect(found('Ca(OH2)]]')).toEqual([['UNMATCHED_CLOSING', 8], ['UNMATCHED_CLOSING', 9]]);
    expect(found('(Na(Cl')).toEqual([['UNCLOSED_GROUP', 1], ['UNCLOSED_GROUP', 4]]);
    expect(found('H\u00012O\u0002')).toEqual([['CONTROL_CHARACTER', 2], ['CONTROL_CHARACTER', 5]]);
  });

  it('every space inside a formula, the advice given once', () => {
    const e = failure('H2O NaCl KCl');
    expect(e.issues.map((i) => [i.code, i.column])).toEqual([['SPACE_IN_FORMULA', 4], ['SPACE_IN_FORMULA', 9]]);
    expect(e.issues.map((i) => i.hint !== undefined)).toEqual([true, false]);
  });

  it('an input with one problem still gives exactly one issue', () => {
    for (const input of ['Ca(OH2', 'Xx2', 'H0', 'K4[Fe(CN)6)', 'NH4+', '']) expect(failure(input).issues).toHaveLength(1);
  });

  it('keeps at most MAX_ISSUES issues and says there were more', () => {
    for (const input of ['Xx'.repeat(500), ',H'.repeat(500), '\u0001'.repeat(5000), ']'.repeat(5000), 'H '.repeat(3000) + 'H']) {
      const e = failure(input);
      expect(e.issues).toHaveLength(MAX_ISSUES);
      expect(e.more).toBe(true);
    }
    // exactly MAX_ISSUES problems: all kept, nothing more to say
    const e = failure('Xx'.repeat(MAX_ISSUES));
    expect(e.issues).toHaveLength(MAX_ISSUES);
    expect(e.more).toBe(false);
  });

  it('the prescan of hostile text stops early (nesting past the limit is said once)', () => {
    expect(prescanAll('('.repeat(100) + 'H' + ')'.repeat(100)).map((i) => i.code)).toEqual(['NESTING_TOO_DEEP']);
    expect(prescanAll('x'.repeat(20_000)).map((i) => i.code)).toEqual(['INPUT_TOO_LONG']);
  });
});

describe('brackets that do not pair up do not hide the other problems', () => {
  it('an unknown word beside two unclosed brackets: all three, in the order of the text', () => {
    expect(found('bad((')).toEqual([['UNKNOWN_ELEMENT', 1], ['UNCLOSED_GROUP', 4], ['UNCLOSED_GROUP', 5]]);
  });

  it('an unknown symbol inside a bracket that is never closed', () => {
    expect(found('Ca(OXq')).toEqual([['UNCLOSED_GROUP', 3], ['UNKNOWN_ELEMENT', 5]]);
  });

  it('a bracket problem alone stays alone', () => {
    expect(found('Ca(OH2')).toEqual([['UNCLOSED_GROUP', 3]]);
  });
});
