// Typed issues: each formula-reader code carries its machine fields, and its message is made from
// them alone by messageFor (the codes and wording are pondus's own).
import { describe, expect, it } from 'vitest';
import { hasFields, type Issue, type TypedCode } from '../../src/errors/issue.js';
import { hintFor, issueLine, messageFor, typedIssue } from '../../src/errors/message.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { parseFormula } from '../../src/formula-parser/parse.js';

function issuesOf(input: string): Issue[] {
  try {
    parseFormula(input);
  } catch (e) {
    if (e instanceof PondusError) return e.issues;
    throw e;
  }
  throw new Error(`expected ${input} to fail`);
}

/** An input giving each typed code, and the machine fields its first issue of that code must carry. */
const CASES: [TypedCode, string, Record<string, unknown>][] = [
  ['EMPTY_INPUT', '', { stateSymbol: null }],
  ['EMPTY_INPUT', '(aq)', { stateSymbol: '(aq)' }],
  ['INPUT_TOO_LONG', 'H'.repeat(10_001), { characters: 10_001, limit: 10_000 }],
  ['CONTROL_CHARACTER', 'H\u00072O', { codePoint: 7 }],
  ['UNEXPECTED_CHARACTER', 'H2O,NaCl', { character: ',' }],
  ['UNEXPECTED_TOKEN', 'CuSO4·', { token: null, after: '·', expected: 'formula' }],
  ['UNEXPECTED_TOKEN', 'H2O··H2O', { token: '·', expected: 'addition-dot' }],
  ['UNKNOWN_ELEMENT', 'Xx2', { symbol: 'Xx' }],
  ['UNKNOWN_ISOTOPE', '[99C]', { symbol: 'C', massNumber: 99 }],
  ['UNKNOWN_ISOTOPE', '²D', { symbol: 'D', massNumber: null }],
  ['UNCLOSED_GROUP', 'Ca(OH2', { bracket: '(' }],
  ['UNMATCHED_CLOSING', 'Ca(OH)2]', { bracket: ']' }],
  ['MISMATCHED_BRACKET', 'K4[Fe(CN)6)', { bracket: ')', opening: '[', openingColumn: 3 }],
  ['EMPTY_GROUP', 'Ca()2', { bracket: '(' }],
  ['NESTING_TOO_DEEP', '('.repeat(40) + 'H' + ')'.repeat(40), { limit: 32 }],
  ['BAD_COUNT', 'H02', { count: '02', problem: 'leading-zero', limit: null }],
  ['BAD_COUNT', 'H1.1234567', { count: '1.1234567', problem: 'decimals', limit: 6 }],
  ['BAD_COUNT', 'H0', { count: '0', problem: 'zero' }],
  ['BAD_COUNT', 'CaSO4·1/0H2O', { count: '1/0', problem: 'divides-by-zero' }],
  ['COUNT_TOO_LARGE', 'C1234567890', { count: '1234567890', limit: 999_999_999 }],
  ['BAD_CHARGE', 'Fe^0+', { charge: '0', limit: 99 }],
  ['BAD_CHARGE', 'Fe^100+', { charge: '100', limit: 99 }],
  ['AMBIGUOUS_CHARGE', 'NH4+', { written: '+', digits: '4', sign: '+' }],
  ['MISPLACED_CHARGE', 'Fe^2+Cl', { charge: '^2+', following: 'Cl' }],
  ['SPACE_IN_FORMULA', 'H2O NaCl', { joined: 'H2ONaCl' }],
  ['INEXACT_FRACTION', 'CaSO4·⅓H2O', { numerator: 1, denominator: 3 }],
];

describe('typed issues of the formula reader', () => {
  it.each(CASES)('%s (%s): its fields, and the message made from them', (code, input, fields) => {
    const issue = issuesOf(input).find((i) => i.code === code);
    expect(issue, `${input} gives ${code}`).toBeDefined();
    expect(issue).toMatchObject(fields);
    expect(hasFields(issue!)).toBe(true);
    // the message is the fields' words: the same issue with its message emptied reads the same
    expect(messageFor({ ...issue!, message: '' } as Issue)).toBe(issue!.message);
  });

  it('every typed code has a case here', () => {
    const covered = new Set(CASES.map(([c]) => c));
    const codes: TypedCode[] = ['EMPTY_INPUT', 'INPUT_TOO_LONG', 'CONTROL_CHARACTER', 'UNEXPECTED_CHARACTER', 'UNEXPECTED_TOKEN', 'UNKNOWN_ELEMENT', 'UNKNOWN_ISOTOPE', 'UNCLOSED_GROUP', 'UNMATCHED_CLOSING', 'MISMATCHED_BRACKET', 'EMPTY_GROUP', 'NESTING_TOO_DEEP', 'BAD_COUNT', 'COUNT_TOO_LARGE', 'BAD_CHARGE', 'AMBIGUOUS_CHARGE', 'MISPLACED_CHARGE', 'SPACE_IN_FORMULA', 'INEXACT_FRACTION'];
    expect(codes.filter((c) => !covered.has(c))).toEqual([]);
  });

  it('typedIssue makes the message from the fields', () => {
    const i = typedIssue({ code: 'COUNT_TOO_LARGE', count: '1234567890', limit: 999_999_999, column: 2, length: 10 });
    expect(i.message).toBe('count 1234567890 is too large; counts go up to 999,999,999');
    expect(Object.keys(i).slice(0, 2)).toEqual(['code', 'message']);
  });

  it('a message-only issue keeps its words, and a reworded typed one too', () => {
    const plain: Issue = { code: 'BAD_AMOUNT', message: 'no amount given' };
    expect(hasFields(plain)).toBe(false);
    expect(messageFor(plain)).toBe('no amount given');
    const reworded = { ...issuesOf('Xx2')[0], message: "reagent 2: unknown element symbol 'Xx'" };
    expect(messageFor(reworded)).toBe("reagent 2: unknown element symbol 'Xx'");
  });

  it('names the options an issue mentions: the library by option, the command line by flag', () => {
    const i: Issue = { code: 'BAD_OPTION', message: 'a liquid needs `density`, or `molarMass: 98.08`', hint: 'read with `abbreviations: true`', options: ['density', 'molarMass', 'abbreviations'] };
    expect(messageFor(i)).toBe('a liquid needs `density`, or `molarMass: 98.08`');
    expect(messageFor(i, FLAG_NAMING)).toBe('a liquid needs --density, or --molar-mass 98.08');
    expect(hintFor(i, FLAG_NAMING)).toBe('read with --abbreviations');
    // a name not listed in options is left alone
    expect(messageFor({ code: 'BAD_OPTION', message: 'see `density`' }, FLAG_NAMING)).toBe('see `density`');
  });
});

describe('an issue in one line, as a CSV message cell has it', () => {
  it('gives the column once, at the end, whether or not the message names it', () => {
    // common practice of this contract: one form for every issue, the column never twice
    expect(issueLine(issuesOf('Ca(OH2')[0])).toBe("'(' is never closed (column 3)");
    expect(issueLine(issuesOf('Xx2')[0])).toBe("unknown element symbol 'Xx' (column 1)");
    expect(issueLine({ code: 'BAD_RECORD', message: 'a bad cell at column 4', column: 4 })).toBe('a bad cell at column 4');
    expect(issueLine({ code: 'BAD_RECORD', message: 'a bad cell', column: 4 })).toBe('a bad cell (column 4)');
  });

  it('adds the hint, its options named as the reader names them', () => {
    const flags = { option: (n: string) => `--${n}`, command: (f: string) => f };
    expect(issueLine({ code: 'BAD_OPTION', message: 'no form', hint: 'give `density`', options: ['density'] }, flags)).toBe('no form; hint: give --density');
    expect(issueLine(issuesOf('SO42-')[0])).toBe("the '-' after '42' leaves unclear which of the digits are a count and which a charge (column 5); hint: write SO4^2- (count 4, charge 2-), SO42^- (count 42, charge 1-) or SO^42- (charge 42-)");
  });
});
