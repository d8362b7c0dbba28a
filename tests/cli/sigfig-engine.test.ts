import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';
import { noteMessages } from '../support/notes.js';

// The significant-figure engine seen through the commands. Rules: OpenStax Chemistry 2e §1.5
// (from memory); rounding half to even per ASTM E29 (from memory). Figures worked by hand.

describe('a carry into the next power of ten does not add a figure', () => {
  it('calc', () => {
    expect(pondus(['calc', '0.9996 * 1.00']).stdout).toContain('=  1.00   (3 significant figures)');
    const r = pondus(['calc', '--explain', '0.99 * 1.01 g']);
    expect(r.stdout).toContain('=  1.0 g   (2 significant figures)');
    expect(r.stdout).toContain('a product keeps the fewest significant figures: 2');
    const [j] = jsonLines(pondus(['calc', '--json', '0.9996 * 1.00']).stdout);
    expect(j).toMatchObject({ display: '1.00', sigFigs: 3, rounded: 1 });
  });

  it('prepare gives the mass to weigh at working precision, its figures counted on the rounded value', () => {
    // 0.250 M × 0.1000 L × 39.997 g/mol = 0.999925 g: an instruction, 4 figures → 0.9999 g (not 1.000 g)
    const r = pondus(['prepare', 'NaOH', '--concentration', '0.250 M', '--volume', '100.0 mL']);
    expect(r.stdout).toContain('weigh 0.9999 g');
    expect(r.stdout).not.toContain('1.000 g');
  });

  it('basis', () => {
    // 8.30 % K × 1.2046 = 9.998 % K2O → 10.0 %
    const r = pondus(['basis', 'K', '--to', 'K2O', '--value', '8.30 %']);
    expect(r.stdout).toContain('8.30 % K = 10.0 % K2O');
  });

  it('react', () => {
    // 99.96 mL × 0.100 M = 0.009996 mol → 0.0100 mol (3 figures, as the data)
    const [j] = jsonLines(pondus(['react', '--json', 'NaOH + HCl -> NaCl + H2O', '--amount', 'HCl=99.96 mL of 0.100 M']).stdout);
    expect(j.reactants.find((x: { species: string }) => x.species === 'HCl').molesDisplay).toBe('0.0100');
    expect(j.products.map((x: { molesDisplay: string }) => x.molesDisplay)).toEqual(['0.0100', '0.0100']);
  });
});

describe('results below the precision of the data, and defined numbers', () => {
  it('a zero difference claims no figure', () => {
    const [j] = jsonLines(pondus(['calc', '--json', '10.0 g - 9.95 g']).stdout);
    expect(j.sigFigs).toBe(0);
    expect(j.display).toBe('0.0 g');
    expect(noteMessages(j).join(' ')).toMatch(/below the precision of the data/);
    const t = pondus(['calc', '10.0 g - 9.95 g']);
    expect(t.stdout).not.toContain('1 significant figure');
    expect(t.stdout).toContain('note: the difference (0.05 g unrounded) is below the precision of the data');
  });

  it('100 %, g/100 mL and 1:1000 are exact', () => {
    expect(pondus(['calc', '5.63 g / 8.80 g * 100 %']).stdout).toContain('=  64.0 %   (3 significant figures)');
    expect(pondus(['calc', '2.50 g/100 mL to g/L']).stdout).toContain('=  25.0 g/L');
    const r = pondus(['calc', '1:1000 * 250.0 mL']);
    expect(r.stdout).toContain('=  0.2500 mL   (4 significant figures)');
    expect(r.stdout).toContain('note: 1:1000 is read as the ratio 1/1000');
  });

  it('half up is available', () => {
    expect(pondus(['calc', '--rounding', 'half-up', '10.0 g - 9.95 g']).stdout).toContain('=  0.1 g   (1 significant figure)');
  });
});
