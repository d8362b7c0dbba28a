import { describe, expect, it } from 'vitest';
import { styleAt } from '../../src/cli/output/style.js';
import { jsonLines, pondus } from './run-cli.js';
import { massPresenter } from '../../src/cli/commands/mass.js';
import { createWriter } from '../../src/cli/output/writers.js';
import type { Presenter } from '../../src/cli/output/presenter.js';

describe('pondus mass', () => {
  it('prints a table by default', () => {
    const r = pondus(['mass', 'H2O', 'CuSO4·5H2O']);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/H2O\s+│\s+H2O\s+│\s+18\.015/);
    expect(r.stdout).toContain('CuH10O9S');
    expect(r.stdout).toContain('249.68');
    expect(r.stdout).not.toMatch(/\u001b\[/); // NO_COLOR
  });

  it('writes one JSON object per input with the contract keys', () => {
    const r = pondus(['mass', '--json', 'H2O', 'SO4^2-']);
    expect(r.status).toBe(0);
    const [w, s] = jsonLines(r.stdout);
    // exact sums of CIAAW weights; monoisotopic mass from AME2020 (1H, 16O)
    expect(w).toEqual({ line: 1, input: 'H2O', formula: 'H2O', molarMass: 18.015, monoisotopicMass: 18.010564683056, nominalMass: 18, charge: 0, notes: [] });
    expect(s.line).toBe(2);
    expect(s.notes.map((n: { code: string }) => n.code)).toEqual(['ION_MOLAR_MASS']);
    expect(s.charge).toBe(-2);
    expect(s.formula).toBe('O4S^2-');
  });

  it('reads a batch from standard input, keeps order, and reports a bad line in place', () => {
    const r = pondus(['mass', '--json', '-'], 'H2O\nNaCl\nXx2\n\nC6H12O6\n');
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out).toHaveLength(5);
    expect(out.map((o) => o.input)).toEqual(['H2O', 'NaCl', 'Xx2', '', 'C6H12O6']);
    const xx = { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 };
    expect(out[2]).toEqual({ line: 3, input: 'Xx2', error: xx, errors: [xx], notes: [] });
    expect(out[3].error.code).toBe('EMPTY_INPUT');
    expect(out[4].molarMass).toBe(180.156);
    expect(r.stderr).toContain('2 of 5 inputs failed (lines 3, 4)');
  });

  it('empty standard input is said and is a usage error (exit 2), as no arguments are; a blank line is an input', () => {
    // source: README "Exit status" (2: no inputs); common practice for a batch, where an empty file piped in must not pass for success
    for (const format of ['--json', '--csv']) {
      const r = pondus(['mass', format, '-'], '');
      expect(r.status).toBe(2);
      expect(r.stderr).toContain('pondus: no inputs: standard input was empty, so nothing was read');
      expect(r.stdout).not.toContain('{');
    }
    const withArgument = pondus(['mass', '--json', 'H2O', '-'], '');
    expect(withArgument.status).toBe(0);
    expect(jsonLines(withArgument.stdout)).toHaveLength(1);
    expect(pondus(['mass', '--json', '-'], '\n').status).toBe(1);
  });

  it('handles CRLF line ends and a byte-order mark', () => {
    const r = pondus(['mass', '--json', '-'], '\ufeffH2O\r\nNaCl\r\n');
    expect(jsonLines(r.stdout).map((o) => o.formula)).toEqual(['H2O', 'ClNa']);
  });

  it('writes CSV and TSV with a header and one row per input', () => {
    const csv = pondus(['mass', '--csv', 'H2O', 'Q']);
    expect(csv.stdout.split('\n')[0]).toBe('input,line,formula,molarMass,monoisotopicMass,nominalMass,charge,notes,error,message');
    expect(csv.stdout.split('\n')[1]).toBe('H2O,1,H2O,18.015,18.010564683056,18,0,,,');
    expect(csv.stdout.split('\n')[2]).toBe("Q,2,,,,,,,UNKNOWN_ELEMENT,unknown element symbol 'Q' (column 1)");
    const tsv = pondus(['mass', '--tsv', 'NaCl']);
    expect(tsv.stdout.split('\n')[1].split('\t').slice(0, 4)).toEqual(['NaCl', '1', 'ClNa', '58.43976928']);
  });

  it('shows a bad formula with a caret, on standard error, exit 1', () => {
    const r = pondus(['mass', 'Ca(OH2']);
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain("error UNCLOSED_GROUP: '(' at column 3 is never closed\n  Ca(OH2\n    ^");
  });

  it('uses exit status 2 for usage errors', () => {
    expect(pondus(['mass']).status).toBe(2);
    expect(pondus(['mass', '--json', '--csv', 'H2O']).status).toBe(2);
    expect(pondus(['mass', '--nope', 'H2O']).status).toBe(2);
    expect(pondus(['weigh', 'H2O']).status).toBe(2);
    expect(pondus(['mass', '--weights', 'old', 'H2O']).status).toBe(2);
    expect(pondus([]).status).toBe(2);
  });

  it('never prints a stack trace, whatever the input', () => {
    const hostile = ['('.repeat(5000) + 'H' + ')'.repeat(4000), 'C'.repeat(200000), '\u0000\u0001', '__proto__', 'constructor', 'C99999999999999999999', '💧'.repeat(50), '^'.repeat(100)].join('\n');
    const r = pondus(['mass', '--json', '-'], hostile);
    expect(r.status).toBe(1);
    expect(jsonLines(r.stdout)).toHaveLength(8);
    expect(r.stderr).not.toMatch(/\bat .*\(.*:\d+:\d+\)/);
    const t = pondus(['mass', '-'], hostile);
    expect(t.stderr).not.toMatch(/\bat .*\(.*:\d+:\d+\)/);
    expect(t.stderr).toContain('NESTING_TOO_DEEP');
  });

  it('says which atomic weight stood in for an element without a standard one', () => {
    const r = pondus(['mass', 'PuO2']);
    expect(r.stdout).toContain('plutonium (Pu) has no standard atomic weight');
    const j = jsonLines(pondus(['mass', '--json', 'PuO2']).stdout)[0];
    expect(j.notes[0].message).toContain('244');
    expect(j.notes[0].code).toBe('NO_STANDARD_WEIGHT');
  });
});

describe('the table writer', () => {
  const run = (columns: number | undefined, inputs: string[]) => {
    let out = '';
    const sink = { write: (s: string) => void (out += s) };
    const style = styleAt(0);
    const p = massPresenter({}) as Presenter<unknown>;
    const w = createWriter('table', p, { out: sink, err: sink, outStyle: style, errStyle: style, numbered: true, columns });
    inputs.forEach((text, i) => w.ok({ text, line: i + 1 }, p.compute(text)));
    w.endBatch(true);
    return out;
  };

  it('fits a narrow terminal: no line wider than the terminal, long inputs cut with an ellipsis', () => {
    const long = 'CH3(CH2)40CH2CH2CH2CH2CH2CH2CH2CH2OH';
    const out = run(70, ['H2O', long]);
    for (const line of out.trimEnd().split('\n')) expect([...line].length).toBeLessThanOrEqual(70);
    expect(out).toContain('…');
    expect(out).toContain('18.015');
  });

  it('off a terminal keeps every character of the input', () => {
    const long = 'CH3(CH2)40CH2CH2CH2CH2CH2CH2CH2CH2OH';
    expect(run(undefined, ['H2O', long])).toContain(long);
  });
});
