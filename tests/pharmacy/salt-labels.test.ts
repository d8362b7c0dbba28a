import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from '../cli/run-cli.js';

// The salt is named as written; its Hill formula is a field of its own.
describe('meq and osmolarity name the salt as written', () => {
  it('meq: salt as written in JSON, CSV and the table, Hill in saltHill', () => {
    const [row] = jsonLines(pondus(['meq', 'KH2PO4', '--mass', '1.000 g', '--json']).stdout);
    expect(row).toMatchObject({ input: 'KH2PO4', salt: 'KH2PO4', saltHill: 'H2KO4P' });
    const table = pondus(['meq', 'KH2PO4', '--mass', '1.000 g']).stdout;
    expect(table.split('\n')[0]).toMatch(/^KH2PO4 {2}\(M = 136\.084 g\/mol\)/);
    expect(table).not.toContain('H2KO4P');
    const [head, line] = pondus(['meq', 'CaCl2·2H2O', '--mass', '1.000 g', '--csv']).stdout.trim().split('\n');
    const cols = head.split(',');
    expect(line.split(',')[cols.indexOf('salt')]).toBe('CaCl2·2H2O');
    expect(line.split(',')[cols.indexOf('saltHill')]).toBe('CaCl2H4O2');
  });
});
