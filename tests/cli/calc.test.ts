import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus calc', () => {
  it('reports the figure with its significant figures and unit', () => {
    const r = pondus(['calc', '0.100 M * 250.0 mL * M(CuSO4·5H2O) to g']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('=  6.24 g   (3 significant figures)');
  });

  it('explains each step and what limited the precision', () => {
    const r = pondus(['calc', '--explain', '(1.2 + 3.456) * 2.00']);
    expect(r.stdout).toContain('a sum keeps the fewest decimal places: last digit at 10^-1, set by 1.2');
    expect(r.stdout).toContain('a product keeps the fewest significant figures: 2');
    expect(r.stdout).toContain('unrounded: 9.312');
  });

  it('writes the contract JSON keys', () => {
    const [j] = jsonLines(pondus(['calc', '--json', '8.80 g + 2.1 g']).stdout);
    expect(j).toEqual({ line: 1, input: '8.80 g + 2.1 g', value: 10.9, rounded: 10.9, display: '10.9 g', sigFigs: 3, unit: 'g', notes: [] });
  });

  it('reads expressions from standard input with errors in place', () => {
    const r = pondus(['calc', '--json', '-'], '1 / 0\n2.50 g * 2\n5 g + 2 mL\n');
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out.map((o) => o.error?.code ?? o.display)).toEqual(['DIVISION_BY_ZERO', '5.00 g', 'INCOMPATIBLE_UNITS']);
  });

  it('rounds half up on request', () => {
    expect(pondus(['calc', '--rounding', 'half-up', '4.5 / 2.0']).stdout).toContain('=  2.3 ');
    expect(pondus(['calc', '4.5 / 2.0']).stdout).toContain('=  2.2 ');
  });
});

describe('pondus mass --uncertainty and composition --mixture', () => {
  it('gives the standard uncertainty of a molar mass', () => {
    const r = pondus(['mass', '--uncertainty', 'H2O']);
    expect(r.stdout).toContain('18.01535 ± 0.00026');
    const [j] = jsonLines(pondus(['mass', '--json', '--uncertainty', 'NaCl']).stdout);
    expect(j.molarMassUncertainty.standardUncertainty).toBeCloseTo(0.0031754, 6);
  });

  it('computes percent composition from measured element masses', () => {
    // source: OpenStax Chemistry 2e, Example 3.9 (7.34 g C, 1.85 g H, 2.85 g N in 12.04 g: 61.0 % C, 15.4 % H, 23.7 % N), from memory
    const [j] = jsonLines(pondus(['composition', '--mixture', '--json', 'C=7.34 g, H=1.85 g, N=2.85 g']).stdout);
    expect(j.totalMassDisplay).toBe('12.04');
    expect(j.components.map((c: { massPercentDisplay: string }) => c.massPercentDisplay)).toEqual(['61.0', '15.4', '23.7']);
  });

  it('splits a mixture by element', () => {
    const r = pondus(['composition', '--mixture', 'NaCl=5.00 g KCl=3.00 g']);
    expect(r.stdout).toMatch(/Cl\s+│\s+4\.46\s+│\s+55\.7/);
    const bad = pondus(['composition', '--mixture', 'NaCl=5.00']);
    expect(bad.status).toBe(1);
    expect(bad.stderr).toContain('give a unit for NaCl');
  });
});
