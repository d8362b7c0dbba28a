import { describe, expect, it } from 'vitest';
import { analysis } from '../../src/analysis/check.js';
import { fromJournalForm, readFoundValues } from '../../src/analysis/found-values.js';
import { readSheet } from '../../src/analysis/lab-sheet.js';
import { reportFormula } from '../../src/analysis/report-formula.js';
import { parseFormula } from '../../src/formula-parser/parse.js';

describe('report lines as written', () => {
  it('keeps the components, Hill order inside each one with carbon', () => {
    const r = analysis('C11H15N·CF3COOH·0.5H2O', 'C=54.93,H=6.03,N=4.93');
    expect(r.reportLine.startsWith('Anal. Calcd for C11H15N·C2HF3O2·0.5H2O: ')).toBe(true);
    expect(r.formula).toBe('C13H17F3NO2.5'); // the Hill formula of the whole stays the contract's `formula`
  });

  it('writes a component without carbon as written: HCl, H2SO4, CuSO4', () => {
    expect(reportFormula(parseFormula('C17H19NO3·HCl·3H2O'))).toBe('C17H19NO3·HCl·3H2O');
    expect(reportFormula(parseFormula('C8H10N4O2·H2SO4'))).toBe('C8H10N4O2·H2SO4');
    expect(reportFormula(parseFormula('CuSO4·5H2O'))).toBe('CuSO4·5H2O');
    expect(reportFormula(parseFormula('2CaSO4·H2O'))).toBe('2CaSO4·H2O');
  });

  it('morphine hydrochloride trihydrate: the calculated line', () => {
    // source: CIAAW 2021 standard atomic weights; C17H19NO3·HCl·3H2O, M = 375.85 (from memory: C 54.33, H 6.97, N 3.73)
    const r = analysis('C17H19NO3·HCl·3H2O', 'C, 54.30; H, 6.97; N, 3.73');
    expect(r.reportLine).toBe('Anal. Calcd for C17H19NO3·HCl·3H2O: C, 54.33; H, 6.97; N, 3.73. Found: C, 54.30; H, 6.97; N, 3.73.');
  });

  it('offers HCl written as HCl in fits', () => {
    const r = analysis('C17H19NO3', 'C=63.45,H=6.27,N=4.35', { solvents: ['HCl'] });
    expect(r.fits[0].formula).toBe('C17H19NO3·HCl');
    expect(r.fits[0].reportLine).toContain('Calcd for C17H19NO3·HCl:');
  });
});

describe('found values', () => {
  it('reads the journal form pondus prints, with the same values as KEY=VALUE', () => {
    const a = readFoundValues('C, 74.77; H, 6.21; N, 4.50');
    const b = readFoundValues('C=74.77 H=6.21 N=4.50');
    expect([...a.values].map(([k, v]) => [k, v.toString()])).toEqual([...b.values].map(([k, v]) => [k, v.toString()]));
    expect(readFoundValues('Found: C, 74.77; H, 6.21; N, 4.50.').text.get('N')).toBe('4.50');
  });

  it('keeps columns in place when rewriting the journal form', () => {
    const t = 'C, 74.77; H, 6.21';
    expect(fromJournalForm(t).length).toBe(t.length);
    expect(fromJournalForm('C=1, H=2')).toBe('C=1, H=2');
  });

  it('allows a zero for an element the compound lacks, and still refuses a non-zero one', () => {
    const r = analysis('C6H6', 'C=92.26,H=7.74,S=0.00');
    expect(r.calculated.S).toBe(0);
    expect(r.pass).toBe(true);
    expect(() => analysis('C6H6', 'C=92.26,H=7.74,S=0.50')).toThrow(/does not contain/);
  });
});

describe('salt partners', () => {
  it('offers an acid only to a compound with a basic site, and says so', () => {
    // bis(triphenylphosphine)palladium(II) dichloride, C36H30Cl2P2Pd: no nitrogen to protonate
    const r = analysis('C36H30Cl2P2Pd', 'C=61.20,H=4.40', { solvents: ['HCl', 'water'] });
    expect(r.fits.every((f) => f.solvates.every((s) => s.formula !== 'ClH'))).toBe(true);
    expect(r.continuous.map((c) => c.formula)).not.toContain('ClH');
    expect(r.notes.map((n) => n.code)).toContain('PARTNER_NOT_OFFERED');
  });

  it('offers acids in whole or half amounts, at most one per nitrogen', () => {
    const r = analysis('C20H25N3O', 'C=66.00,H=7.20,N=11.50', { solvents: ['HCl'], top: 10 });
    for (const f of r.fits) for (const s of f.solvates) {
      expect(Number.isInteger(s.amount * 2)).toBe(true);
      expect(s.amount).toBeLessThanOrEqual(3);
    }
  });

  it('lets the simpler fit win a tie', () => {
    // found = calculated for C20H25N3O·0.5H2O (CIAAW 2021 weights): a second partner cannot do better at 0.01
    const r = analysis('C20H25N3O', 'C=72.26,H=7.88,N=12.64', { solvents: ['water', 'MeOH'] });
    expect(r.fits[0].formula).toBe('C20H25N3O·0.5H2O');
  });
});

describe('lab sheets', () => {
  it('refuses a cell holding two values instead of reading an extra element from it', () => {
    const rows = readSheet('id,formula,C,H\nJK-1,C20H25N3O,74.27 N=12.99,7.79\nJK-2,C20H25N3O,74.27,7.79\n');
    expect(rows[0].problem).toMatch(/C cell holds '74.27 N=12.99', not one value/);
    expect(rows[1].problem).toBeUndefined();
  });
});
