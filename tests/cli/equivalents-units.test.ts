import { describe, expect, it } from 'vitest';
import { pondus } from './run-cli.js';

describe('equivalents and lower-case litres on the command line', () => {
  it('reads mEq/l and quotes what was typed when an option value cannot be read (exit 2, once)', () => {
    expect(pondus(['meq', 'KCl', '--concentration', '20 mEq/l']).stdout).toContain('20.00 mEq/L');
    const r = pondus(['meq', 'KCl', 'NaCl', '--concentration', '20x mEq/l']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('20x mEq/l');
    expect(r.stderr).not.toContain('mmol/l');
    expect(r.stderr.match(/error UNKNOWN_UNIT/g)).toHaveLength(1);
  });

  it('lists the equivalents units in the hint where a salt takes them', () => {
    const r = pondus(['meq', 'KCl', '--concentration', '20 foo/l']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('mEq/L');
  });

  it('prepares from mmol/l as from mmol/L', () => {
    const a = pondus(['prepare', 'NaCl', '--concentration', '10 mmol/l', '--volume', '250.0 mL']);
    const b = pondus(['prepare', 'NaCl', '--concentration', '10 mmol/L', '--volume', '250.0 mL']);
    expect(a.status).toBe(0);
    expect(a.stdout).toContain('weigh 0.1461 g');
    expect(b.stdout).toContain('weigh 0.1461 g');
  });

  // the README's CSV rule: a number cell is the exact decimal
  it('writes meq and osmolarity CSV number cells as plain decimals', () => {
    const m = pondus(['meq', 'KCl', '--concentration', '2 mEq/mL', '--csv']).stdout.split('\n')[1].split(',');
    expect(m.slice(3, 7)).toEqual(['2', '2', '2000', '4000']);
    const o = pondus(['osmolarity', 'KCl=2 mEq/mL', '--csv']).stdout.split('\n')[1];
    expect(o).toMatch(/^KCl=2 mEq\/mL,1,4000,4000,/);
    expect(o).not.toContain('×');
  });

  it('dilutes mEq/mL to mEq/L and refuses mEq against mmol', () => {
    const r = pondus(['dilute', '2 mEq/mL', '--to', '20 mEq/L', '--volume', '1.000 L']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('take 10.00 mL');
    const bad = pondus(['dilute', '2 mEq/mL', '--to', '20 mmol/L', '--volume', '1.000 L']);
    expect(bad.status).toBe(1);
    expect(bad.stderr).toContain("salt's charge");
  });

  it('gives the concentration made from a volume taken in the stock unit, in the table, JSON and CSV', () => {
    // from memory: C2 = C1·V1/V2; 10.00 mL of 2 mEq/L made up to 100.0 mL is 0.2 mEq/L
    const args = ['dilute', '2 mEq/L', '--taken', '10.00 mL', '--volume', '100.0 mL'];
    expect(pondus(args).stdout).toContain('gives 0.2 mEq/L');
    expect(pondus(args).stdout).not.toMatch(/gives [0-9.]+ M\b/);
    expect(JSON.parse(pondus([...args, '--json']).stdout).made.display).toBe('0.2 mEq/L');
    expect(pondus([...args, '--csv']).stdout).toContain(',0.2 mEq/L,');
  });
});
