import { describe, expect, it } from 'vitest';
import { convertBasis } from '../../src/preparation/basis.js';
import { conversionFactor } from '../../src/preparation/conversion-factor.js';
import { dilute } from '../../src/preparation/dilution.js';
import { gravimetric } from '../../src/preparation/gravimetric.js';
import { displayInstruction, displayResult } from '../../src/sigfig/instruction.js';
import { saltFactor } from '../../src/preparation/salt-factor.js';
import { prepareSolution } from '../../src/preparation/solution.js';
import { substituteForm } from '../../src/preparation/substitute.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { displayMeasured } from '../../src/sigfig/round.js';

const g = (i: Parameters<typeof displayInstruction>[0] | null) => displayInstruction(i!, 'g').text;
const codes = (notes: { code: string }[]) => notes.map((n) => n.code);

describe('making up solutions: the mass to weigh is an instruction', () => {
  it('grams of NaCl in 0.250 L of a 5.30 M solution: 77.4 g, weighed as 77.43 g', () => {
    // source: OpenStax Chemistry 2e §3.3, mass of solute in a given volume of solution: 77.4 g (from memory)
    const r = prepareSolution('NaCl', { concentration: '5.30 M', volume: '0.250 L' });
    expect(displayResult(r.mass!.quantity, 'g').text).toBe('77.4 g'); // the textbook figure
    expect(g(r.mass)).toBe('77.43 g'); // the instruction, at working precision
    expect(r.mass!.textbookSigFigs).toBe(3);
  });

  it('0.1 M NaCl in 250 mL: weigh 1.461 g, with a note on the target’s few figures', () => {
    // 0.1 mol/L × 0.250 L × 58.44 g/mol = 1.461 g
    const r = prepareSolution('NaCl', { concentration: '0.1 M', volume: '250 mL' });
    expect(g(r.mass)).toBe('1.461 g');
    const note = r.notes.find((n) => n.code === 'WORKING_PRECISION')!;
    expect(note.message).toContain('the target 0.1 M has 1 significant figure');
    expect(note.message).toContain('working precision (4 significant figures)');
  });

  it('keeps more than four figures when the data carry more', () => {
    // glucose, 180.156 g/mol (6 figures): 0.100000 mol/L × 1.000000 L × 180.156 g/mol = 18.0156 g
    const r = prepareSolution('C6H12O6', { concentration: '0.100000 M', volume: '1.000000 L' });
    expect(g(r.mass)).toBe('18.0156 g');
    expect(codes(r.notes)).not.toContain('WORKING_PRECISION');
  });

  it('allows for the hydrate form and the assay', () => {
    const r = prepareSolution('CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL', purity: '98.5 %' });
    // 0.02500 mol × 249.68 g/mol = 6.242 g; ÷ 0.985 = 6.337 g
    expect(g(r.pureMass)).toBe('6.242 g');
    expect(g(r.mass)).toBe('6.337 g');
  });

  it('makes a 1000 mg/L copper standard from the pentahydrate: 3.929 g per litre', () => {
    // 1.000 g/L Cu × 1.000 L × 249.68/63.546 = 3.929 g (common practice for AAS standards)
    const r = prepareSolution('CuSO4·5H2O', { concentration: '1000 ppm', volume: '1.000 L', as: 'Cu' });
    expect(g(r.mass)).toBe('3.929 g');
    expect(codes(r.notes)).toContain('PPM_AS_MG_PER_L');
    expect(codes(r.notes)).toContain('WORKING_PRECISION');
  });

  it('counts the chloride in calcium chloride', () => {
    const r = prepareSolution('CaCl2·2H2O', { concentration: '0.200 M', volume: '500.0 mL', as: 'Cl' });
    // 0.100 mol Cl⁻ needs 0.05000 mol CaCl2·2H2O × 147.008 g/mol = 7.350 g
    expect(g(r.mass)).toBe('7.350 g');
  });

  it('does not round a carry into an extra figure: 0.250 M NaOH in 100.0 mL is 0.9999 g', () => {
    // 0.02500 mol × 39.997 g/mol = 0.999925 g
    expect(g(prepareSolution('NaOH', { concentration: '0.250 M', volume: '100.0 mL' }).mass)).toBe('0.9999 g');
  });

  it('reads a purity without a unit as a fraction, and says so', () => {
    const r = prepareSolution('CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL', purity: '0.985' });
    expect(g(r.mass)).toBe('6.337 g');
    expect(codes(r.notes)).toContain('PURITY_AS_FRACTION');
    expect(() => prepareSolution('NaCl', { concentration: '0.100 M', volume: '1.00 L', purity: '98.5' })).toThrow("the purity 98.5 has no unit: as a fraction of 1 it would be 9850 %");
  });

  it('refuses nonsense', () => {
    expect(() => prepareSolution('NaCl', { concentration: '0.1 g', volume: '1.00 L' })).toThrow(/concentration must be/);
    expect(() => prepareSolution('NaCl', { concentration: '0.100 M', volume: '1.00 L', purity: '120 %' })).toThrow(/purity/);
    expect(() => prepareSolution('NaCl', { concentration: '-0.100 M', volume: '1.00 L' })).toThrow(/positive/);
    expect(() => prepareSolution('NaCl', { volume: '1.00 L' })).toThrow(/target concentration, or the mass weighed/);
  });

  it('warns when the mass is too small to weigh', () => {
    const r = prepareSolution('NaCl', { concentration: '1.00 mM', volume: '10.0 mL' });
    expect(displayInstruction(r.mass!, 'mg').text).toBe('0.5844 mg');
    expect(r.notes.find((n) => n.code === 'MASS_TOO_SMALL')!.message).toMatch(/stock solution/);
    expect(codes(prepareSolution('NaCl', { concentration: '0.100 M', volume: '250.0 mL' }).notes)).not.toContain('MASS_TOO_SMALL');
  });
});

describe('an assay with --as: of the reagent, or a potency of the part', () => {
  // ondansetron hydrochloride dihydrate C18H19N3O·HCl·2H2O (365.9 g/mol) and ondansetron C18H19N3O (293.4 g/mol) (from memory)
  const base = { concentration: '2.00 mg/mL', volume: '20.0 mL', as: 'C18H19N3O', purity: '80.2 %' };

  it('refuses an assay that could be either, offering both masses', () => {
    expect(() => prepareSolution('C18H19N3O·HCl·2H2O', base)).toThrow(/could be of C18H19N3O·HCl·2H2O itself \(weigh 62\.20 mg\).*potency 'as C18H19N3O' \(weigh 49\.88 mg\)/);
  });

  it('a potency as base is not corrected twice: 40.00 mg of base ÷ 80.2 % = 49.88 mg', () => {
    const r = prepareSolution('C18H19N3O·HCl·2H2O', { ...base, purityBasis: 'part' });
    expect(displayInstruction(r.mass!, 'mg').text).toBe('49.88 mg');
    expect(codes(r.notes)).toContain('PURITY_OF_PART');
  });

  it('the assay of the salt itself, when said so', () => {
    const r = prepareSolution('C18H19N3O·HCl·2H2O', { ...base, purityBasis: 'reagent' });
    expect(displayInstruction(r.mass!, 'mg').text).toBe('62.20 mg');
  });

  it('an assay above the part’s share can only be of the reagent', () => {
    const r = prepareSolution('CuSO4·5H2O', { concentration: '1000. ppm', volume: '1.000 L', as: 'Cu', purity: '98.0 %' });
    expect(g(r.mass)).toBe('4.009 g');
    expect(codes(r.notes)).toContain('PURITY_OF_REAGENT');
    expect(() => prepareSolution('CuSO4·5H2O', { concentration: '1000. ppm', volume: '1.000 L', as: 'Cu', purity: '98.0 %', purityBasis: 'part' })).toThrow(/more than pure CuSO4·5H2O holds/);
  });
});

describe('the concentration made, from the mass weighed: a result', () => {
  it('25.2 g of acetic acid in 0.500 L is 0.839 M', () => {
    // source: OpenStax Chemistry 2e §3.3, molarity of vinegar from the mass of acetic acid: 0.839 M (from memory)
    const r = prepareSolution('CH3CO2H', { volume: '0.500 L', weighed: '25.2 g' });
    expect(displayResult(r.made!, 'M').text).toBe('0.839 M');
    expect(r.mass).toBeNull();
  });

  it('1.4587 g of NaCl made up to 250.0 mL is 0.09984 M, beside the instruction', () => {
    const r = prepareSolution('NaCl', { concentration: '0.1 M', volume: '250.0 mL', weighed: '1.4587 g' });
    expect(g(r.mass)).toBe('1.461 g');
    expect(displayResult(r.made!, 'M').text).toBe('0.09984 M');
    expect(codes(r.notes)).toContain('MADE_FROM_WEIGHED');
  });

  it('in the target’s kind: mg/L of copper from the pentahydrate weighed', () => {
    // 0.3930 g × 63.546/249.68 ÷ 0.1000 L = 1000.2 mg/L
    const r = prepareSolution('CuSO4·5H2O', { concentration: '1000 ppm', volume: '100.0 mL', as: 'Cu', weighed: '0.3930 g' });
    expect(displayResult(r.made!, 'mg/L').text).toBe('1.000 × 10³ mg/L');
  });
});

describe('replacing one form by another', () => {
  it('replaces the anhydrous salt by the pentahydrate', () => {
    const r = substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g');
    expect(g(r.mass)).toBe('15.64 g');
    expect(r.notes).toEqual([]);
  });

  it('a salt for its free base keeps equal formula units, with a note that the forms differ by more than water', () => {
    // C17H19NO3 285.34 and C17H19NO3·HCl·3H2O 375.85 g/mol (CIAAW 2021 standard atomic weights): 1.000 g × 375.85 / 285.34 = 1.317 g
    const r = substituteForm('C17H19NO3·HCl·3H2O', 'C17H19NO3', '1.000 g');
    expect(g(r.mass)).toBe('1.317 g');
    expect(codes(r.notes)).toEqual(['FORMS_DIFFER']);
  });

  it('a sulfate of two bases stands for two of its base: 1.000 g of morphine is 1.330 g of the sulfate pentahydrate, and back', () => {
    // source: morphine C17H19NO3 285.34 and morphine sulfate pentahydrate (C17H19NO3)2·H2SO4·5H2O 758.83 g/mol
    // (CIAAW 2021 standard atomic weights); 1.000 g ÷ 285.34 ÷ 2 × 758.83 = 1.330 g; 1.000 g ÷ 758.83 × 2 × 285.34 = 0.7521 g
    const r = substituteForm('(C17H19NO3)2·H2SO4·5H2O', 'C17H19NO3', '1.000 g');
    expect(g(r.mass)).toBe('1.330 g');
    expect(r.notes.find((n) => n.code === 'FORMS_DIFFER')!.message).toContain('1 mol of (C17H19NO3)2·H2SO4·5H2O stands for 2 mol of C17H19NO3');
    expect(g(substituteForm('C17H19NO3', '(C17H19NO3)2·H2SO4·5H2O', '1.000 g').mass)).toBe('0.7521 g');
  });

  it('refuses a different substance: NaCl in place of Na2CO3·10H2O, iron(III) for iron(II), nitrate for nitrite, …', () => {
    for (const [use, instead] of [['Na2CO3·10H2O', 'NaCl'], ['Na2CO3', 'NaHCO3'], ['Na2HPO4·7H2O', 'NaH2PO4'], ['FeCl3·6H2O', 'FeCl2'], ['NaNO3', 'NaNO2'], ['NaClO4', 'NaCl'], ['Na2C2O4', 'Na2CO3'], ['Na2S2O3·5H2O', 'Na2SO3'], ['H2O2', 'H2O'], ['Cu(NO3)2·3H2O', 'CuO']]) {
      expect(() => substituteForm(use, instead, '1.000 g'), `${use} for ${instead}`).toThrow(expect.objectContaining({ issues: [expect.objectContaining({ code: 'FORMS_UNRELATED', hint: `weigh ${instead} itself, or one of its hydrates` })] }));
    }
  });

  it('allows for the assay of the form weighed: 24.65 g of MgSO4·7H2O is 12.28 g of 98.0 % MgSO4', () => {
    // 24.65 g ÷ 246.47 g/mol × 120.36 g/mol = 12.04 g pure; ÷ 0.980 = 12.28 g
    const r = substituteForm('MgSO4', 'MgSO4·7H2O', '24.65 g', { purity: '98.0 %' });
    expect(g(r.pureMass)).toBe('12.04 g');
    expect(g(r.mass)).toBe('12.28 g');
    expect(codes(r.notes)).toContain('PURITY_OF_FORM_WEIGHED');
  });
});

describe('dilution', () => {
  it("a bare % is read as per volume, with a note naming the reading: '37 %' may be a label strength by mass", () => {
    // 37 % HCl is 37 % w/w (1.19 g/mL): 10.0 % w/v from it needs 22.71 mL (worked by hand), not the 27.03 mL of C1·V1 = C2·V2
    const r = dilute('37 %', '10.0 %', '100.0 mL');
    expect(r.notes.map((n) => n.code)).toContain('PERCENT_PER_VOLUME');
    expect(dilute('1.00 M', '0.100 M', '100.0 mL').notes.map((n) => n.code)).not.toContain('PERCENT_PER_VOLUME');
    expect(() => dilute('70 % v/v', '10 % w/v', '100.0 mL')).toThrow('a dilution needs one kind for both');
  });

  it('volume of 1.59 M KOH for 5.00 L of 0.100 M: 0.314 L, taken as 0.3145 L', () => {
    // source: OpenStax Chemistry 2e §3.3, volume of a concentrated solution needed for dilution: 0.314 L (from memory)
    const r = dilute('1.59 M', '0.100 M', '5.00 L');
    expect(displayResult(r.stockVolume!.quantity, 'L').text).toBe('0.314 L');
    expect(displayInstruction(r.stockVolume!).text).toBe('0.3145 L');
  });

  it('99 % to 70 % in 473 mL: take 334.4 mL', () => {
    // 473 mL × 70/99 = 334.44 mL
    const r = dilute('99 %', '70 %', '473 mL');
    expect(displayInstruction(r.stockVolume!).text).toBe('334.4 mL');
    expect(codes(r.notes)).toContain('WORKING_PRECISION');
  });

  it('keeps the unit of the final volume and refuses to concentrate', () => {
    expect(displayInstruction(dilute('1.00 M', '0.100 M', '250.0 mL').stockVolume!).text).toBe('25.00 mL');
    expect(() => dilute('0.100 M', '1.00 M', '250.0 mL')).toThrow(/more concentrated/);
    expect(() => dilute('1.00 M', '10.0 g/L', '250.0 mL')).toThrow(/same kind/);
  });

  it('points a 1:1000 one-step dilution needing 50 µL to serial dilution', () => {
    const r = dilute('1.00 M', '1.00 mM', '50.0 mL');
    expect(displayInstruction(r.stockVolume!, 'µL').text).toBe('50.00 µL');
    const w = r.notes.find((n) => n.code === 'SERIAL_DILUTION')!;
    expect(w.message).toContain('1:1000');
    expect(w.message).toContain('1:100, then 1:10');
    expect(codes(dilute('1.00 M', '0.100 M', '250.0 mL').notes)).not.toContain('SERIAL_DILUTION');
    // a small transfer alone: 1:10 into 500 µL needs 50 µL
    expect(dilute('1.00 M', '0.100 M', '500. µL').notes.find((n) => n.code === 'SERIAL_DILUTION')!.message).toMatch(/larger final volume/);
  });

  it('the concentration made from the volume taken: 0.850 L of 5.00 M to 1.80 L is 2.36 M', () => {
    // source: OpenStax Chemistry 2e §3.3, concentration of a diluted solution: 2.36 M (from memory)
    const r = dilute('5.00 M', undefined, '1.80 L', '0.850 L');
    expect(displayResult(r.made!, 'M').text).toBe('2.36 M');
    expect(r.stockVolume).toBeNull();
  });
});

describe('gravimetric factors and oxide basis', () => {
  it.each([
    // from memory: handbook tables of gravimetric factors
    ['Fe', 'Fe2O3', '0.6994'],
    ['Cl', 'AgCl', '0.2474'],
    ['SO4', 'BaSO4', '0.4116'],
    ['P2O5', 'Mg2P2O7', '0.6378'],
  ])('%s weighed as %s: %s', (sought, weighed, f) => {
    expect(conversionFactor(sought, weighed).factor.toFixed(4)).toBe(f);
  });

  it.each([
    // source: IFA fertilizer conversion factors (from memory)
    ['P', 'P2O5', '0.4364'],
    ['P2O5', 'P', '2.2914'],
    ['K', 'K2O', '0.8301'],
    ['K2O', 'K', '1.2046'],
    ['Si', 'SiO2', '0.4674'],
  ])('%s from %s: × %s', (to, from, f) => {
    // the published tables use older atomic weights (O 15.9994): agreement to ±1 in the last figure
    expect(conversionFactor(to, from).factor.minus(f).abs().lte('0.0001')).toBe(true);
  });

  it('gives the analyte mass and its mass fraction in the sample (results: textbook figures)', () => {
    const r = gravimetric('Fe', 'Fe2O3', { weighedMass: '0.2345 g', sampleMass: '1.0012 g' });
    expect(displayQuantity(r.analyteMass!, 'g').text).toBe('0.1640 g');
    expect(displayQuantity(r.massPercent!).figure).toBe('16.38');
    expect(r.notes).toEqual([]);
  });

  it('warns of a mass fraction over 100 %', () => {
    const r = gravimetric('Cl', 'AgCl', { weighedMass: '0.5000 g', sampleMass: '0.1000 g' });
    expect(displayQuantity(r.massPercent!).figure).toBe('123.7');
    expect(codes(r.notes)).toEqual(['RESULT_OVER_100']);
  });

  it('converts a value and warns of a basis value over 100 %', () => {
    const r = convertBasis('P2O5', 'P', { value: '12.5 %' });
    expect(displayQuantity(r.converted!, '%').text).toBe('5.46 %');
    expect(codes(convertBasis('K', 'K2O', { value: '90.0 %' }).notes)).toEqual(['RESULT_OVER_100']);
    expect(codes(convertBasis('P2O5', 'P', { value: '1300 ppm' }).notes)).toEqual(['MEASUREMENT']); // trailing zeros
  });

  it('asks which element when two share several', () => {
    expect(() => conversionFactor('MgO', 'MgCO3')).not.toThrow();
    expect(() => conversionFactor('NaCl', 'KBr')).toThrow(/share no element/);
  });
});

describe('salt and parent', () => {
  it('morphine hydrochloride trihydrate against morphine: 10 mg of morphine is 13.17 mg of the salt', () => {
    // M(C17H19NO3·HCl·3H2O) / M(C17H19NO3), both from CIAAW weights (common practice)
    const r = saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3', { parentMass: '10 mg' });
    expect(displayMeasured(r.reported).text).toBe('1.3172');
    expect(displayInstruction(r.saltMass!).text).toBe('13.17 mg');
    expect(codes(r.notes)).toEqual(['MEASUREMENT', 'WORKING_PRECISION']); // the trailing zero of 10, then the working precision
  });

  it('ondansetron 4 mg as the hydrochloride dihydrate: 4.988 mg', () => {
    // from memory: product labelling gives 4 mg ondansetron as 5 mg of the hydrochloride dihydrate
    const r = saltFactor('C18H19N3O·HCl·2H2O', 'C18H19N3O', { parentMass: '4.00 mg' });
    expect(displayInstruction(r.saltMass!).text).toBe('4.988 mg');
    expect(codes(r.notes)).toContain('MASS_TOO_SMALL');
  });

  it('the parent carried by a salt mass is a result', () => {
    const r = saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3', { saltMass: '13.2 mg' });
    expect(displayResult(r.parentMass!).text).toBe('10.0 mg');
  });

  it('needs the parent written as part of the salt', () => {
    // morphine hydrochloride written as one formula: neither parent·acid nor a metal salt of the parent
    expect(() => saltFactor('C17H20ClNO3', 'C17H19NO3')).toThrow(/neither written as C17H19NO3·acid/);
  });
});

describe('reagents that need more than the usual caution', () => {
  it('sodium hydroxide: standardise the solution; chromium(VI): a carcinogen; sodium chloride: nothing more', () => {
    // NaOH takes up water and CO2, so NaOH solutions are standardised (common practice); Cr(VI) compounds are IARC Group 1 (from memory)
    const codes = (f: string, c: string) => prepareSolution(f, { concentration: c, volume: '1.000 L' }).notes.map((n) => n.code);
    expect(codes('NaOH', '0.1000 M')).toContain('REAGENT_HANDLING');
    expect(codes('KOH', '0.1000 M')).toContain('REAGENT_HANDLING');
    expect(codes('K2Cr2O7', '0.01667 M')).toContain('REAGENT_HANDLING');
    expect(codes('NaCl', '0.1000 M')).not.toContain('REAGENT_HANDLING');
  });
});
