import { describe, expect, it } from 'vitest';
import { concentratedReagent } from '../../src/preparation/concentrated.js';
import { CONCENTRATED_GRADES } from '../../src/preparation/concentrated-grades.js';
import { displayInstruction, displayResult } from '../../src/sigfig/instruction.js';

const codes = (notes: { code: string }[]) => notes.map((n) => n.code);
const M = (formula: string, fraction: string, density?: string) => concentratedReagent(formula, { fraction, density }).molarity.value.toNumber();

describe('concentrated reagents by mass fraction and density', () => {
  it('37 % HCl, d 1.19: about 12.1 M', () => {
    // source: CRC Handbook of Chemistry and Physics, table of concentrated acids and bases: 37 % HCl, 1.19 g/mL, 12.1 M (from memory)
    expect(M('HCl', '37 %', '1.19 g/mL')).toBeCloseTo(12.08, 2);
    expect(displayResult(concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL' }).molarity, 'M').text).toBe('12.08 M');
  });

  it('96 % H2SO4, d 1.84: about 18.0 M; 70 % HNO3, d 1.42: about 15.8 M; 28 % NH3, d 0.90: about 14.8 M', () => {
    // source: CRC Handbook of Chemistry and Physics, table of concentrated acids and bases (from memory)
    expect(M('H2SO4', '96 %', '1.84 g/mL')).toBeCloseTo(18.01, 2);
    expect(M('HNO3', '70 %', '1.42 g/mL')).toBeCloseTo(15.77, 2);
    expect(M('NH3', '28 %', '0.90 g/mL')).toBeCloseTo(14.80, 2);
  });

  it('every grade in the table gives the molarity the table lists, within 1 %', () => {
    // source: the table's own molarity column, CRC Handbook (from memory); w·ρ/M must reproduce it
    for (const g of CONCENTRATED_GRADES) {
      const r = concentratedReagent(g.formula, { fraction: `${g.percent} %` });
      expect(r.densitySource).toBe('table');
      expect(Math.abs(r.molarity.value.toNumber() / Number(g.molarity) - 1)).toBeLessThan(0.01);
    }
  });

  it('1.00 M HCl, 500.0 mL from 37 % HCl: take 41.40 mL of the concentrated acid (a volume, not a mass of HCl)', () => {
    // 1.00 × 0.5000 L ÷ (0.37 × 1190 g/L ÷ 36.46 g/mol) = 41.40 mL; common practice (from memory): "about 41.4 mL of conc. HCl per 500 mL of 1 M"
    const r = concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL', concentration: '1.00 M', volume: '500.0 mL' });
    expect(displayInstruction(r.take!, 'mL').text).toBe('41.40 mL');
    expect(r.take!.quantity.dims).toEqual([0, 0, 1]);
    expect(codes(r.notes)).toContain('ADD_ACID_TO_WATER');
    expect(codes(r.notes)).toContain('WORKING_PRECISION'); // 37 % has 2 figures
  });

  it('a mass-concentration target is converted through the molar mass', () => {
    const a = concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL', concentration: '36.46 g/L', volume: '500.0 mL' });
    expect(displayInstruction(a.take!, 'mL').text).toBe('41.40 mL');
  });

  it('sulfuric acid gets the heat warning; ammonia the NH3 reading and no acid warning', () => {
    const s = concentratedReagent('H2SO4', { fraction: '96 %', concentration: '0.500 M', volume: '1.000 L' });
    expect(s.notes.find((n) => n.code === 'ADD_ACID_TO_WATER')!.message).toContain('heat');
    expect(codes(s.notes)).toContain('DENSITY_FROM_TABLE');
    const n = concentratedReagent('NH3', { fraction: '28 %', density: '0.90 g/mL' });
    expect(codes(n.notes)).toContain('AMMONIA_AS_NH3');
    expect(codes(n.notes)).not.toContain('ADD_ACID_TO_WATER');
  });

  it('refuses: no density for a grade not in the table, a % w/v fraction, a target not weaker than the reagent', () => {
    expect(() => concentratedReagent('HCl', { fraction: '36 %' })).toThrow(/density/);
    expect(() => concentratedReagent('HCl', { fraction: '37 % w/v', density: '1.19 g/mL' })).toThrow(/mass fraction/);
    expect(() => concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL', concentration: '13 M', volume: '1.000 L' })).toThrow(/not weaker/);
    expect(() => concentratedReagent('HCl', { fraction: '137 %', density: '1.19 g/mL' })).toThrow(/at most 100/);
  });
});

describe('a concentrated reagent is never weighed', () => {
  it('prepare refuses to weigh HCl, H2SO4 or NH3 and points to the volume of the concentrated reagent', async () => {
    const { prepareSolution } = await import('../../src/preparation/solution.js');
    for (const f of ['HCl', 'H2SO4', 'NH3', 'HNO3', 'HBr']) {
      try {
        prepareSolution(f, { concentration: '1.00 M', volume: '500.0 mL' });
        expect.unreachable();
      } catch (e) {
        expect((e as { first: { code: string; hint?: string } }).first.code).toBe('CONCENTRATED_REAGENT');
        expect((e as { first: { hint?: string } }).first.hint).toContain('`fraction: ');
      }
    }
  });
});

describe('hydrofluoric acid gets its own handling note', () => {
  it('48 % HF, d 1.15: 27.6 M, with plastic ware and calcium gluconate named', () => {
    // source: w·ρ/M = 0.48 × 1150 g/L ÷ 20.006 g/mol (CIAAW 2021: H 1.008, F 18.998) = 27.59 M;
    // HF etches glass and its burns are treated with calcium gluconate gel (from memory)
    const r = concentratedReagent('HF', { fraction: '48 %', density: '1.15 g/mL' });
    expect(displayResult(r.molarity, 'M').text).toBe('27.59 M');
    const note = r.notes.find((n) => n.code === 'REAGENT_HANDLING')!;
    expect(note.message).toContain('plastic ware');
    expect(note.message).toContain('calcium gluconate');
  });

  it('no such note for hydrochloric acid', () => {
    expect(codes(concentratedReagent('HCl', { fraction: '37 %' }).notes)).not.toContain('REAGENT_HANDLING');
  });
});
