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

  it('the limit is generous: a target just under a kilogram of water’s worth is not warned about', () => {
    // 6.00 M NaCl is 350.6 g/L, under 359 g (what 1 kg of water dissolves): no warning, by design
    expect(warned('NaCl', '6.00 M')).toBeUndefined();
    expect(solubilityWarning(formulaMassDetail('NaCl'), new Decimal('6.2'))?.code).toBe('SOLUBILITY_EXCEEDED');
  });

  it('a reagent not in the table gets no warning', () => {
    expect(solubilityWarning(formulaMassDetail('C9H8O4'), new Decimal(100))).toBeNull();
  });
});
