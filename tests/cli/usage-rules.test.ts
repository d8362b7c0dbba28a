// Usage checks commander does from the declarations (commands/declarations.ts): options that
// cannot go together and options a command requires are refused before the command runs, with
// exit status 2 and one message style (`pondus: …`, the reason or hint the declaration gives).
import { describe, expect, it } from 'vitest';
import { pondus } from './run-cli.js';

describe('conflicting options are refused by the declaration, with its reason', () => {
  it.each([
    [['composition', 'NaCl=5.00 g', '--mixture', '--part', 'Na'], '--mixture cannot be combined with --part: '],
    [['composition', 'NaCl=5.00 g', '--mixture', '--long', '--csv'], '--mixture cannot be combined with --long: '],
    [['calc', '2.45 g * 1.000', '--explain', '--tsv'], '--explain cannot be combined with --csv or --tsv: the steps are shown in the table'],
    [['candidates', '180.16', '--molar-mass', '--ppm', '3'], '--molar-mass cannot be combined with --ppm: --ppm sets the window'],
    [['candidates', '180.16', '--molar-mass', '--ion', '[M+H]+'], '--molar-mass cannot be combined with --ion: --ion says the masses are m/z values'],
    [['reagents', '--reference', 'C7H6O3=2.00 g', '--markdown', '--csv'], '--markdown cannot be combined with --json or --csv or --tsv: choose one output format'],
    [['titration', 'C9H8O4', '--sample', '0.5 g', '--titrant', '0.1 M', '--volume', '20 mL', '--added', '50.00 mL of 0.5000 M', '--blank', '1 mL'], '--added cannot be combined with --blank: '],
    [['sample-basis', '99.1 %', '--to', 'dried', '--on', 'dried', '--loss', '0.5 %'], '--on cannot be combined with --to: --to and --on say the same thing'],
    [['pattern', 'C6H6', '--fine', '--resolution', '1000'], '--fine cannot be combined with --resolution: '],
  ])('%j', (args, message) => {
    const r = pondus(args);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^pondus: /);
    expect(r.stderr.split('\n').filter(Boolean)).toHaveLength(1);
    expect(r.stderr).toContain(message);
  });

  it('a default is not a conflict: --molar-mass alone keeps the default --ppm unused', () => {
    // source: from memory (glucose C6H12O6, 180.16 g/mol)
    const r = pondus(['candidates', '180.16', '--molar-mass', '--limit', '5', '--json']);
    expect(r.stderr).not.toContain('cannot be combined');
    expect(r.status).not.toBe(2);
  });
});

describe('required options are refused by the declaration, with its hint', () => {
  it.each([
    [['gravimetric', 'Fe'], 'pondus: give the formula of the weighed form (the precipitate or residue as weighed) with --weighed\n'],
    [['basis', 'P2O5'], 'pondus: give the basis to convert to: --to P (or --to P2O5, K2O, SiO2, …)\n'],
    // the hint names no substance: C17H19NO3 would be another compound for most salts
    [['salt', 'C17H19NO3·HCl'], 'pondus: give the formula of the parent compound (the free base or acid the dose is of) with --parent\n'],
    [['gravimetric'], 'pondus: give the formula of the weighed form (the precipitate or residue as weighed) with --weighed\n'],
  ])('%j', (args, message) => {
    const r = pondus(args);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toBe(message);
  });

  it('--help still works without the required option', () => {
    const r = pondus(['gravimetric', '--help']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Usage: pondus gravimetric [options] [analytes...]');
  });
});

describe("commander's other messages keep its wording, in the same style", () => {
  it('an unknown option', () => {
    const r = pondus(['mass', 'H2O', '--frobnicate']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^pondus: unknown option '--frobnicate'/);
  });
  it('a value outside the choices', () => {
    const r = pondus(['mass', 'H2O', '--weights', 'old']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^pondus: option '--weights <table>' argument 'old' is invalid\. Allowed choices are standard, abridged\./);
  });
});

describe('an option value that cannot be read is said once, for the option (exit 2)', () => {
  // common practice: a command line with a malformed option is a usage error, reported before any input is worked
  it('a batch with an unreadable --concentration: one message naming the option, no rows', () => {
    const r = pondus(['prepare', '--concentration', 'abc', '--volume', '250 mL', '--json', '-'], 'NaCl\nKCl\n');
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain("pondus: --concentration 'abc' cannot be read");
    expect(r.stderr.match(/UNKNOWN_UNIT/g)).toHaveLength(1);
  });

  it('a malformed --mass of meq is named, with its column in the value', () => {
    const r = pondus(['meq', 'NaCl', '--mass', '1..0 g']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("--mass '1..0 g' cannot be read");
    expect(r.stderr).toContain('BAD_EXPRESSION');
  });

  it('an input of its own that fails first does not stop the batch; the later inputs get their results', () => {
    const r = pondus(['prepare', '--concentration', '0.100 M', '--volume', '250.0 mL', '--json', '-'], 'Xq\nNaCl\n');
    expect(r.status).toBe(1);
    const rows = r.stdout.trim().split('\n').map((l) => JSON.parse(l));
    expect(rows.map((x) => x.line)).toEqual([1, 2]);
    expect(rows[0].error.code).toBe('UNKNOWN_ELEMENT');
    expect(rows[1].error).toBeUndefined();
  });

  it('a value read only for some inputs but refused for what it means (not for how it is written) stays per row', () => {
    // a % w/w strength needs a density: a refusal of what the value means (BAD_AMOUNT), kept on each row as before
    const r = pondus(['meq', '--concentration', '5 % w/w', '--json', '-'], 'NaCl\nKCl\n');
    expect(r.status).toBe(1);
    expect(r.stdout.trim().split('\n')).toHaveLength(2);
  });
});
