import { describe, expect, it } from 'vitest';
import { noteMessages } from '../support/notes.js';
import { jsonLines, pondus } from './run-cli.js';

describe('readings a chemist could take two ways are said', () => {
  it('a decimal count shaped like a cut-short hydrate', () => {
    const [row] = jsonLines(pondus(['mass', '--json', 'CuSO4.5']).stdout);
    expect(noteMessages(row).join(' ')).toMatch(/'4\.5' at column 5 is read as a decimal count/);
  });

  it("an ion's molar mass against its monoisotopic mass", () => {
    const [row] = jsonLines(pondus(['mass', '--json', 'Fe^3+']).stdout);
    expect(noteMessages(row).join(' ')).toMatch(/3 electrons missing from the ion .* not counted/);
  });
});

describe('an option given twice is refused in every command', () => {
  it.each([
    ['analysis', ['analysis', 'C20H25N3O', '--found', 'C=72.30,H=7.91', '--found', 'N=12.60']],
    ['empirical', ['empirical', 'C=40.00 H=6.71 O=53.29', '--molar-mass', '180', '--molar-mass', '90']],
    ['titration', ['titration', 'C9H8O4', '--sample', '0.5012 g', '--sample', '0.6 g', '--titrant', '0.1002 M', '--volume', '27.45 mL']],
    ['ion', ['ion', 'C6H12O6', '--adduct', '[M+H]+', '--adduct', '[M+Na]+']],
    ['mass', ['mass', 'H2O', '--weights', 'abridged', '--weights', 'standard']],
  ])('%s', (_name, args) => {
    const r = pondus(args);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/is given twice/);
  });

  it('react --amount still collects one amount per reactant', () => {
    const r = pondus(['react', '--json', 'H2 + O2 -> H2O', '--amount', 'H2=2.00 g', '--amount', 'O2=16.0 g']);
    expect(r.status).toBe(0);
    // 2.00 g H2 is 0.992 mol and needs 15.9 g O2: with 16.0 g of O2 both amounts count, and H2 limits
    expect(jsonLines(r.stdout)[0].limiting).toBe('H2');
  });
});
