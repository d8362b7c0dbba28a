import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from '../cli/run-cli.js';
import { conversionFactor } from '../../src/preparation/conversion-factor.js';
import { hillAside, speciesText } from '../../src/preparation/species.js';
import { errorCode } from '../support/error-code.js';

// Prose and labels name a species as the user wrote it; the Hill formula is a field of its own.
describe('species named as written, the Hill formula beside', () => {
  it('normalises the text: trimmed, runs of white space as one space', () => {
    expect(speciesText({ input: '  PO4 ' })).toBe('PO4');
    expect(speciesText({ input: 'CaCl2  ·  2H2O' })).toBe('CaCl2 · 2H2O');
  });

  it('gravimetric: labels as written, Hill in analyteHill and weighedHill', () => {
    const [row] = jsonLines(pondus(['gravimetric', 'Cu', '--weighed', 'CuCl2', '--json']).stdout);
    expect(row).toMatchObject({ input: 'Cu', analyte: 'Cu', weighed: 'CuCl2', analyteHill: 'Cu', weighedHill: 'Cl2Cu' });
    const csv = pondus(['gravimetric', 'Cu', '--weighed', 'CuCl2', '--csv']).stdout.trim().split('\n');
    expect(csv[0].split(',').slice(0, 4)).toEqual(['input', 'line', 'analyte', 'weighed']);
    expect(csv[1].split(',').slice(0, 4)).toEqual(['Cu', '1', 'Cu', 'CuCl2']);
    expect(csv[0].split(',')).toContain('weighedHill');
  });

  it('basis: from and to as written, Hill in fromHill and toHill', () => {
    const [row] = jsonLines(pondus(['basis', 'PO4', '--to', 'P', '--json']).stdout);
    expect(row).toMatchObject({ input: 'PO4', from: 'PO4', to: 'P', fromHill: 'O4P', toHill: 'P' });
    const table = pondus(['basis', 'P2O5', '--to', 'P', '--value', '12.5 %']).stdout;
    expect(table).toContain('2 × M(P) / M(P2O5)');
  });

  it('a refusal names the species as written, not in Hill order', () => {
    let message = '';
    try {
      conversionFactor('NaCl', 'PO4');
    } catch (e) {
      message = (e as Error).message;
    }
    expect(errorCode(() => conversionFactor('NaCl', 'PO4'))).toBe('BAD_OPTION');
    expect(message).toContain('NaCl and PO4 share no element');
    expect(message).not.toContain('O4P');
  });

  it('salt: salt and parent as written, Hill beside', () => {
    const [row] = jsonLines(pondus(['salt', 'C14H13NaO3', '--parent', 'C14H14O3', '--json']).stdout);
    expect(row).toMatchObject({ salt: 'C14H13NaO3', parent: 'C14H14O3', saltHill: 'C14H13NaO3', parentHill: 'C14H14O3' });
  });
});

describe('prepare names the species the concentration is of as written', () => {
  it('a phosphate target is PO4 in the prose and the JSON, O4P only in targetHill', () => {
    const table = pondus(['prepare', 'Na3PO4', '--as', 'PO4', '--concentration', '0.100 M', '--volume', '250.0 mL']).stdout;
    expect(table).toContain('target: 0.100 M of PO4 (1 per formula unit) in 250.0 mL');
    expect(table).not.toContain('O4P');
    expect(table).not.toContain('Na3O4P');
    const [row] = jsonLines(pondus(['prepare', 'Na3PO4', '--as', 'PO4', '--concentration', '0.100 M', '--volume', '250.0 mL', '--json']).stdout);
    expect(row).toMatchObject({ input: 'Na3PO4', formula: 'Na3O4P', target: 'PO4', targetHill: 'O4P' });
  });

  it('an organic species written otherwise keeps its Hill formula beside it; an inorganic one does not', () => {
    expect(hillAside({ input: 'CuCl2', formula: 'Cl2Cu', atoms: new Map([['Cu', 1], ['Cl', 2]]) })).toBe('');
    expect(hillAside({ input: 'C6H12O6', formula: 'C6H12O6', atoms: new Map([['C', 6], ['H', 12], ['O', 6]]) })).toBe('');
    expect(hillAside({ input: 'CH3COOH', formula: 'C2H4O2', atoms: new Map([['C', 2], ['H', 4], ['O', 2]]) })).toBe('C2H4O2, ');
    expect(pondus(['prepare', 'CuCl2', '--concentration', '0.100 M', '--volume', '250.0 mL']).stdout.split('\n')[0]).toBe('CuCl2  (M = 134.45 g/mol)');
  });
});
