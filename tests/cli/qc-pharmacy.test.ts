import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus titration', () => {
  it('gives the % assay with its notes, the basis, the verdict and the caution', () => {
    const r = pondus(['titration', 'C9H8O4', '--sample', '0.4985 g', '--titrant', '0.1002 M', '--volume', '27.45 mL', '--blank', '0.05 mL', '--water', '0.25 %', '--limits', '99.5-100.5']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('assay 99.22 % (as is)');
    expect(r.stdout).toContain('on the anhydrous basis: 99.47 %');
    expect(r.stdout).toContain("99.5 % (the result rounded to the limits' last digit) complies");
    expect(r.stdout).toContain('caution: a computed result and verdict do not release or reject a batch');
  });

  it('writes one JSON row per input with input, line, notes {code, message} and caution', () => {
    const r = pondus(['titration', '--json', '-', '--sample', '1.500 g', '--added', '50.00 mL of 0.5000 M', '--titrant', '0.5000 M', '--volume', '16.70 mL', '--ratio', '1:2'], 'C9H8O4\nXx9\n');
    expect(r.status).toBe(1);
    const [a, b] = jsonLines(r.stdout);
    expect(a).toMatchObject({ input: 'C9H8O4', line: 1, kind: 'back', ratio: '1:2', reagentRatio: '1:1', basis: 'as-is' });
    // amounts in the one shape of every command: the value in the base unit, the figure as reported
    expect(a.moles).toEqual({ kind: 'result', value: 0.008325, unit: 'mol', display: '8.325 mmol', sigFigs: 4, figure: '8.325', displayUnit: 'mmol' });
    expect(a.assay).toMatchObject({ kind: 'result', unit: '', displayUnit: '%' });
    // the figure is the value (a fraction) as a percentage, rounded once
    expect(a.assay.value).toBeCloseTo(Number(a.assay.figure) / 100, 4);
    expect(a.notes.map((n: { code: string }) => n.code)).toEqual(['RATIO_GIVEN', 'RATIO_ASSUMED', 'BACK_TITRATION']);
    expect(a.caution).toMatch(/laboratory's procedures/);
    expect(b).toMatchObject({ input: 'Xx9', line: 2, error: { code: 'UNKNOWN_ELEMENT' } });
  });

  it('missing or conflicting options are usage errors (exit 2)', () => {
    expect(pondus(['titration', 'C9H8O4', '--sample', '0.5 g']).status).toBe(2);
    const both = pondus(['titration', 'C9H8O4', '--sample', '1.5 g', '--titrant', '0.5 M', '--volume', '16 mL', '--added', '25 mmol', '--blank', '50 mL']);
    expect(both.status).toBe(2);
    expect(both.stderr).toMatch(/not both/);
    const two = pondus(['titration', 'C9H8O4', '--sample', '1.5 g', '--titrant', '0.5 M', '--volume', '16 mL', '--water', '0.2 %', '--loss', '0.3 %']);
    expect(two.status).toBe(2);
    expect(two.stderr).toMatch(/--on/);
    const unused = pondus(['titration', 'C9H8O4', '--sample', '1.5 g', '--titrant', '0.5 M', '--volume', '16 mL', '--water', '0.2 %', '--on', 'dried']);
    expect(unused.status).toBe(2);
    expect(unused.stderr).toMatch(/ignored/);
    expect(pondus(['titration', 'C9H8O4', '--sample', '1.5 g', '--titrant', '0.5 M', '--volume', '16 mL', '--rounding', 'up']).status).toBe(2);
  });
});

describe('pondus standardise', () => {
  it('gives the molarity of the titrant', () => {
    const [j] = jsonLines(pondus(['standardise', '--json', 'Na2CO3', '--mass', '0.2650 g', '--volume', '50.00 mL', '--ratio', '1:2']).stdout);
    expect(j.molarity).toEqual({ kind: 'result', value: expect.any(Number), unit: 'M', display: '0.1000 M', sigFigs: 4, figure: '0.1000', displayUnit: 'M' });
    expect(j.notes.map((n: { code: string }) => n.code)).toEqual(['PURITY_ASSUMED', 'RATIO_GIVEN', 'NO_BLANK']);
    expect(pondus(['standardise', 'KHC8H4O4', '--mass', '0.5 g']).status).toBe(2);
  });
});

describe('pondus sample-basis', () => {
  it('converts to the dried basis and checks the limits, half-up unless half-even is asked for', () => {
    const even = jsonLines(pondus(['sample-basis', '--json', '98.00 %', '--to', 'dried', '--loss', '0.05 %', '--limits', '98.0-102.0']).stdout)[0];
    // 98.00 / 0.9995 = 98.049 → 98.0 either way
    expect(even.specification).toMatchObject({ rounded: '98.0', complies: true, basis: 'dried' });
    // source: USP General Notices 7.20 (a 5 in the first digit dropped rounds up), from memory
    const tieUp = jsonLines(pondus(['sample-basis', '--json', '102.05 %', '--from', 'dried', '--limits', '98.0-102.0']).stdout)[0];
    const tieEven = jsonLines(pondus(['sample-basis', '--json', '102.05 %', '--from', 'dried', '--limits', '98.0-102.0', '--rounding', 'half-even']).stdout)[0];
    expect(tieUp.specification).toMatchObject({ rounded: '102.1', complies: false, rounding: 'half-up' });
    expect(tieEven.specification).toMatchObject({ rounded: '102.0', complies: true, rounding: 'half-even' });
    expect(tieEven.notes.map((n: { message: string }) => n.message).join(' ')).toMatch(/as asked.*USP General Notices 7.20 rounds a 5 up/);
  });

  it('refuses a content the conversion would not use, and no --to', () => {
    expect(pondus(['sample-basis', '99 %', '--to', 'dried', '--loss', '0.5 %', '--water', '0.2 %']).status).toBe(2);
    expect(pondus(['sample-basis', '99 %']).status).toBe(2);
  });

  it('CSV has flat columns and a notes column', () => {
    const lines = pondus(['sample-basis', '--csv', '99.1 %', '--to', 'dried', '--loss', '0.50 %']).stdout.trim().split('\n');
    expect(lines[0]).toBe('input,line,from,to,converted_percent,converted,limits,complies,notes,error,message');
    expect(lines[1]).toMatch(/^99\.1 %,1,as-is,dried,99\.59798994974874\d*,99\.6,,,"FROM_AS_IS: /);
    // the shared writer's notes column, with the caution on every row
    expect(lines[1]).toContain('| CAUTION: a computed result and verdict do not release or reject a batch');
  });
});

describe('pondus replicates', () => {
  it('one list per line from standard input, failures in place', () => {
    const r = pondus(['replicates', '--json', '-'], '3.080 3.094 3.107 3.056 3.112 3.174 3.198 g\n99.2\n99.2 99.5 99.1 %\n');
    expect(r.status).toBe(1);
    const rows = jsonLines(r.stdout);
    expect(rows.map((x) => x.reported ?? x.error.code)).toEqual(['3.117 ± 0.047 g', 'BAD_MEASUREMENT', '99.27 ± 0.52 %']);
    expect(rows.map((x) => x.line)).toEqual([1, 2, 3]);
  });

  it('a --level outside 50–99.9 is a usage error', () => {
    expect(pondus(['replicates', '1.0 1.1', '--level', '100']).status).toBe(2);
  });
});

describe('pondus meq, osmolarity, alligation', () => {
  it('meq: strength to mEq/mL, target to the mass to weigh, with the pharmacy caution', () => {
    const [s] = jsonLines(pondus(['meq', '--json', 'KCl', '--concentration', '10 %']).stdout);
    // mEq are an amount of charge: per mL, held in Eq/L
    expect(s.meqPerMl).toMatchObject({ kind: 'result', unit: 'Eq/L', figure: '1.341', displayUnit: 'mEq/mL', display: '1.341 mEq/mL' });
    const [w] = jsonLines(pondus(['meq', '--json', 'KCl', '--meq', '40 mEq']).stdout);
    expect(w.mass).toMatchObject({ kind: 'instruction', unit: 'g', display: '2.982 g', sigFigs: 4 });
    expect(w.meq).toMatchObject({ kind: 'instruction', value: 0.04, unit: 'Eq', displayUnit: 'mEq' });
    expect(s.notes.map((n: { code: string }) => n.code)).toContain('PERCENT_AS_W_V');
    expect(s.caution).toMatch(/pharmacist/);
    const t = pondus(['meq', 'KCl', '--meq', '40 mEq']);
    expect(t.stdout).toContain('weigh 2.982 g');
    expect(t.stdout).toContain('caution: a dose, a mass to weigh');
    expect(pondus(['meq', 'KCl']).status).toBe(2);
    expect(pondus(['meq', 'KCl', '--mass', '1 g', '--meq', '2 mEq']).status).toBe(2);
  });

  it('osmolarity: 0.9 % NaCl is 308.0 mOsm/L', () => {
    const [j] = jsonLines(pondus(['osmolarity', '--json', 'NaCl=0.9 %']).stdout);
    expect(j.mOsmPerL).toMatchObject({ kind: 'result', unit: 'Osm/L', figure: '308.0', displayUnit: 'mOsm/L' });
    expect(j.notes.map((n: { code: string }) => n.code)).toContain('COMPLETE_DISSOCIATION');
  });

  it('alligation: amounts at working precision, exit 2 without a total or --by', () => {
    const [j] = jsonLines(pondus(['alligation', '--json', '10 %', '--higher', '20 %', '--lower', '5 %', '--total', '300 g']).stdout);
    // amounts to mix are instructions, at working precision
    expect(j.higher).toEqual({ kind: 'instruction', value: 100, unit: 'g', display: '100.0 g', sigFigs: 4, figure: '100.0', displayUnit: 'g' });
    expect(j.lower).toEqual({ kind: 'instruction', value: 200, unit: 'g', display: '200.0 g', sigFigs: 4, figure: '200.0', displayUnit: 'g' });
    expect(j.total.figure).toBe('300.0');
    expect(pondus(['alligation', '10 %', '--higher', '20 %', '--lower', '5 %']).status).toBe(2);
  });
});

describe('bad input to the QC and pharmacy commands', () => {
  it('gets a coded error in place, never an internal error, and the good lines still answer', () => {
    const cases: [string[], string][] = [
      [['replicates', '--json', '-'], '__proto__\n1e999 2\n\u0007\n99.1 99.3\n'],
      [['meq', '--json', '--mass', '1.000 g', '-'], 'Na2SO4^2-\nH2O\n((\nKCl\n'],
      [['osmolarity', '--json', '-'], '=,=\n__proto__=1 %\nNaCl=1e500 %\nNaCl=0.9 %\n'],
      [['alligation', '--json', '--higher', '20 %', '--lower', '5 %', '--by', 'mass', '-'], '30 %\n5\nabc\n10 %\n'],
      [['sample-basis', '--json', '--to', 'dried', '--loss', '0.5 %', '-'], '-5 %\n1e99 %\nx\n99.0 %\n'],
    ];
    for (const [args, input] of cases) {
      const r = pondus(args, input);
      expect(r.status, args.join(' ')).toBe(1);
      expect(r.stdout + r.stderr).not.toMatch(/internal error|INTERNAL_ERROR|RangeError/);
      const rows = jsonLines(r.stdout);
      expect(rows).toHaveLength(4);
      expect(rows.slice(0, 3).every((x) => typeof x.error?.code === 'string')).toBe(true);
      expect(rows[3].error).toBeUndefined();
      expect(rows.map((x) => x.line)).toEqual([1, 2, 3, 4]);
    }
  });
});
