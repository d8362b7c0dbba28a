// A target no solution can hold gets a warning: the anhydrous salt per litre of solution against
// what a kilogram of water dissolves at 20 °C.
import { describe, expect, it } from 'vitest';
import { prepareSolution } from '../../src/preparation/solution.js';
import { solubilityWarning } from '../../src/preparation/solubility.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';
import { Decimal } from '../../src/exact/decimal.js';

const warned = (formula: string, concentration: string, volume = '1.000 L') =>
  prepareSolution(formula, { concentration, volume }).notes.find((n) => n.code === 'SOLUBILITY_EXCEEDED');

describe('solubility', () => {
  it('7.00 M NaCl (409.1 g/L) is more than water dissolves; 1.00 M is not', () => {
    // source: NaCl 58.44 g/mol (CIAAW 2021); solubility about 36 g per 100 g of water at 20 °C
    // (CRC Handbook of Chemistry and Physics, aqueous solubility of inorganic compounds, from memory)
    const note = warned('NaCl', '7.00 M')!;
    expect(note.message).toContain('409.1 g of sodium chloride per litre');
    expect(note.message).toContain('35.9 g per 100 g of water');
    expect(warned('NaCl', '1.00 M')).toBeUndefined();
  });

  it('a hydrate counts as its anhydrous salt: 2.00 M from CuSO4·5H2O is 319.2 g/L of CuSO4', () => {
    // source: CuSO4 159.60 g/mol (CIAAW 2021); solubility about 20.7 g per 100 g of water at 20 °C (CRC Handbook, from memory)
    expect(warned('CuSO4·5H2O', '2.00 M', '100.0 mL')!.message).toContain('319.2 g of copper(II) sulfate per litre (as anhydrous CuSO4)');
    expect(warned('CuSO4·5H2O', '0.100 M', '250.0 mL')).toBeUndefined();
  });

  it('a percent w/v target is checked the same way: 40 % NaCl is 400 g/L', () => {
    expect(warned('NaCl', '40.0 %', '100.0 mL')!.message).toContain('400 g of sodium chloride per litre');
    expect(warned('NaCl', '0.9 %', '1.000 L')).toBeUndefined();
  });

  it('between the least a litre of saturated solution holds and the kilogram-of-water bound: a note that it may not dissolve', () => {
    // saturated NaCl is 35.9 / 135.9 = 26.4 % w/w, so at least 264 g/L (its density is above 1 g/mL);
    // 5.00 M is 292.2 g/L, 6.00 M is 350.6 g/L (both under the 359 g of a kilogram of water): near or above saturation
    const near = prepareSolution('NaCl', { concentration: '6.00 M', volume: '1.000 L' }).notes.find((n) => n.code === 'SOLUBILITY_NEAR')!;
    expect(near.message).toContain('350.6 g of sodium chloride per litre, near or above its solubility at 20 °C: a saturated solution is 26.4 % w/w');
    expect(warned('NaCl', '6.00 M')).toBeUndefined();
    expect(solubilityWarning(formulaMassDetail('NaCl'), new Decimal('5.00'))?.code).toBe('SOLUBILITY_NEAR');
    expect(solubilityWarning(formulaMassDetail('NaCl'), new Decimal('4.00'))).toBeNull(); // 233.8 g/L
    expect(solubilityWarning(formulaMassDetail('NaCl'), new Decimal('6.2'))?.code).toBe('SOLUBILITY_EXCEEDED');
  });

  it('a reagent not in the table gets no warning', () => {
    expect(solubilityWarning(formulaMassDetail('C9H8O4'), new Decimal(100))).toBeNull();
  });
});

describe('solubility table', () => {
  it('finds every row of its table: far past its solubility, each compound is warned about', async () => {
    const { SOLUBILITY_20C } = await import('../../src/preparation/solubility.js');
    for (const [formula, name] of SOLUBILITY_20C) {
      // 1000 mol/L is past any solubility in the table (sucrose: 200 g per 100 g of water is about 5.8 mol per kg)
      const note = solubilityWarning(formulaMassDetail(formula), new Decimal(1000));
      expect(note?.code, formula).toBe('SOLUBILITY_EXCEEDED');
      expect(note?.message, formula).toContain(name);
    }
  });
});
