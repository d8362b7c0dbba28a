// osmolarity: a solution that cannot be worked reports every solute's problem, each at its column
// in the whole list (the README: `errors` lists every problem).
import { describe, expect, it } from 'vitest';
import { solutionOrEveryProblem } from '../../../src/cli/commands/pharmacy.js';
import { PondusError } from '../../../src/errors/pondus-error.js';
import { osmolarity } from '../../../src/pharmacy/osmolarity.js';
import { jsonLines, pondus } from '../run-cli.js';

const problems = (text: string) => {
  try {
    solutionOrEveryProblem(text, {});
  } catch (e) {
    if (e instanceof PondusError) return e.issues.map((i) => [i.code, i.column]);
    throw e;
  }
  throw new Error(`expected ${text} to fail`);
};

describe('every solute problem of a solution', () => {
  it('the unknown element, the unknown unit and the equivalents of a non-electrolyte, in order, at their columns', () => {
    // common practice: a non-electrolyte (glucose) has no ions, so mEq/L does not apply to it
    const text = 'Xx=1 %, KCl=abc, C6H12O6=2 mEq/L';
    expect(problems(text)).toEqual([
      ['UNKNOWN_ELEMENT', 1],
      ['UNKNOWN_UNIT', 13],
      ['BAD_AMOUNT', 26],
    ]);
    const r = pondus(['osmolarity', text, '--json']);
    expect(r.status).toBe(1);
    const [row] = jsonLines(r.stdout);
    expect(row.errors.map((e: { code: string }) => e.code)).toEqual(['UNKNOWN_ELEMENT', 'UNKNOWN_UNIT', 'BAD_AMOUNT']);
    expect(row.error).toEqual(row.errors[0]);
    // a column named in the message is the column in the whole list
    expect(row.errors[1].message).toBe("KCl: the strength: unknown unit or word 'abc' at column 13");
    expect(text.slice(12, 15)).toBe('abc');
  });

  it('the same first problem as the library gives, and each later one as that solute alone gives it', () => {
    const text = 'NaCl=0.9 %,  K(Cl=1 %; Zz=2 %';
    let first: unknown;
    try {
      osmolarity(text);
    } catch (e) {
      first = (e as PondusError).first;
    }
    expect(problems(text)).toEqual([
      ['UNCLOSED_GROUP', 15],
      ['UNKNOWN_ELEMENT', 24],
    ]);
    expect(first).toMatchObject({ code: 'UNCLOSED_GROUP', column: 15 });
  });

  it('a solute given twice is named; a good solution and a single problem are as before', () => {
    expect(problems('NaCl=0.9 %, NaCl=1 %, Qq=1 %')).toEqual([
      ['BAD_RECORD', 13],
      ['UNKNOWN_ELEMENT', 23],
    ]);
    expect(problems('NaCl=0.9 %, Qq=1 %')).toEqual([['UNKNOWN_ELEMENT', 13]]);
    // source: 0.9 % NaCl is 308 mOsm/L by complete dissociation (USP <785>, from memory)
    const [ok] = jsonLines(pondus(['osmolarity', 'NaCl=0.9 %', '--json']).stdout);
    expect(ok.mOsmPerL.figure).toBe('308.0');
  });
});
