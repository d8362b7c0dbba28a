import { describe, expect, it } from 'vitest';
import { standardise } from '../../src/assay/standardise.js';
import { titrationAssay } from '../../src/assay/titration-assay.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

const pct = (q: Parameters<typeof displayQuantity>[0]) => displayQuantity(q, '%').text;
const codes = (notes: { code: string }[]) => notes.map((n) => n.code);

describe('standardising a titrant against a primary standard', () => {
  it('potassium hydrogen phthalate: 20.42 mg per mL of 0.1 M sodium hydroxide', () => {
    // source: pharmacopoeial volumetric-solution statement "each 20.42 mg of potassium biphthalate is equivalent to
    // 1 mL of 0.1 N sodium hydroxide" (USP, Volumetric Solutions), from memory: 0.4084 g in 20.00 mL → 0.1000 M
    // 20.42 mg is itself rounded (M = 204.22), so the molarity agrees within half a unit in its last digit
    const r = standardise('KHC8H4O4', { mass: '0.4084 g', volume: '20.00 mL' });
    expect(Math.abs(r.molarity.value.toNumber() - 0.1)).toBeLessThan((0.1 * 0.005) / 20.42);
    expect(displayQuantity(r.molarity, 'M').text).toBe('0.09999 M');
    expect(codes(r.notes)).toEqual(['PURITY_ASSUMED', 'RATIO_ASSUMED', 'NO_BLANK']);
  });

  it('sodium carbonate for hydrochloric acid, 1:2 (to CO2): 52.99 mg per mL of 1 M', () => {
    // source: "each 52.99 mg of sodium carbonate is equivalent to 1 mL of 1 N hydrochloric acid" (USP, Volumetric Solutions), from memory
    const r = standardise('Na2CO3', { mass: '0.2650 g', volume: '50.00 mL', ratio: '1:2' });
    expect(displayQuantity(r.molarity, 'M').text).toBe('0.1000 M');
    expect(r.ratio.text).toBe('1:2');
  });

  it('a textbook standardisation: 0.1876 g Na2CO3 takes 37.86 mL HCl', () => {
    // source: worked problem quoted at jiskha.com/display.cgi?id=1353865174 (FW 106 mg/mmol, 1:2): 0.0935 M
    const r = standardise('Na2CO3', { mass: '0.1876 g', volume: '37.86 mL', ratio: '1:2' });
    expect(displayQuantity(r.molarity, 'M').text).toBe('0.09350 M');
  });

  it('applies the purity and subtracts the blank, and says so', () => {
    const r = standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL', blank: '0.03 mL', purity: '99.95 %' });
    // 0.5105 × 0.9995 / 204.2223 / 0.02492 = 0.10026 (M of KHC8H4O4 from the CIAAW standard weights)
    expect(r.molarity.value.toNumber()).toBeCloseTo((0.5105 * 0.9995) / 204.2223 / 0.02492, 10);
    expect(displayQuantity(r.molarity, 'M').text).toBe('0.1003 M');
    expect(codes(r.notes)).toContain('BLANK_SUBTRACTED');
    expect(codes(r.notes)).toContain('PURITY_APPLIED');
  });

  it('refuses a blank larger than the titre and a purity over 100 %', () => {
    expect(() => standardise('KHC8H4O4', { mass: '0.5 g', volume: '0.02 mL', blank: '0.05 mL' })).toThrow(/not positive/);
    expect(() => standardise('KHC8H4O4', { mass: '0.5 g', volume: '20 mL', purity: '100.5 %' })).toThrow(/at most 100/);
    expect(() => standardise('KHC8H4O4', { mass: '0.5 g', volume: '20 mL', ratio: '1-2' })).toThrow(/A:B/);
  });
});

describe('titration assay', () => {
  it('sodium hydrogen carbonate in a sample, with the acid standardised first', () => {
    // source: the same worked problem (jiskha.com/display.cgi?id=1353865174): 0.4671 g sample, 40.72 mL of the HCl
    // standardised above; with FW 106 and 84 the answer is 68.46 %, with IUPAC weights 68.47 %
    const hcl = standardise('Na2CO3', { mass: '0.1876 g', volume: '37.86 mL', ratio: '1:2' });
    const titrant = `${displayQuantity(hcl.molarity, 'M').text}`;
    const r = titrationAssay('NaHCO3', { sample: '0.4671 g', titrant, volume: '40.72 mL', ratio: '1:1' });
    expect(r.assay.value.times(100).toNumber()).toBeCloseTo(68.46, 1);
    expect(pct(r.assay)).toBe('68.47 %');
  });

  it('aspirin by residual titration: each mL of 0.5 M NaOH consumed is 45.04 mg of C9H8O4', () => {
    // source: the former pharmacopoeial aspirin assay (hydrolysis with excess 0.5 N NaOH, back-titration with 0.5 N H2SO4):
    // "each mL of 0.5 N sodium hydroxide is equivalent to 45.04 mg of C9H8O4", from memory
    const r = titrationAssay('C9H8O4', { sample: '1.500 g', added: '50.00 mL of 0.5000 M', titrant: '0.5000 M', volume: '16.70 mL', ratio: '1:2' });
    expect(displayQuantity(r.mass, 'mg').value.toNumber()).toBeCloseTo((50.0 - 16.7) * 45.04, 0);
    expect(r.kind).toBe('back');
    expect(codes(r.notes)).toEqual(['RATIO_GIVEN', 'RATIO_ASSUMED', 'BACK_TITRATION']);
  });

  it('back-titration against a blank: the blank less the sample titre', () => {
    const withBlank = titrationAssay('C9H8O4', { sample: '1.500 g', back: true, blank: '50.00 mL', titrant: '0.5000 M', volume: '16.70 mL', ratio: '1:2' });
    const withAdded = titrationAssay('C9H8O4', { sample: '1.500 g', added: '50.00 mL of 0.5000 M', titrant: '0.5000 M', volume: '16.70 mL', ratio: '1:2' });
    expect(withBlank.assay.value.eq(withAdded.assay.value)).toBe(true);
    expect(codes(withBlank.notes)).toContain('BLANK_DIFFERENCE');
  });

  it('keeps the figures of the measurements: a 3-figure titrant gives a 3-figure assay', () => {
    const r = titrationAssay('KHC8H4O4', { sample: '0.5000 g', titrant: '0.100 M', volume: '24.40 mL' });
    expect(pct(r.assay)).toBe('99.7 %');
    const b = titrationAssay('KHC8H4O4', { sample: '0.5000 g', titrant: '0.1000 M', volume: '24.45 mL', blank: '0.05 mL' });
    expect(displayQuantity(b.netTitre, 'mL').text).toBe('24.40 mL');
    expect(pct(b.assay)).toBe('99.66 %');
  });

  it('counts a hydrate’s water in the molar mass, with a note', () => {
    const r = titrationAssay('Na2B4O7·10H2O', { sample: '0.9500 g', titrant: '0.1000 M', volume: '49.50 mL', ratio: '1:2' });
    expect(codes(r.notes)).toContain('HYDRATE_WATER_COUNTED');
  });

  it('refuses impossible back-titrations and a nonsense sample', () => {
    expect(() => titrationAssay('C9H8O4', { sample: '1.5 g', added: '5.00 mmol', titrant: '0.5000 M', volume: '16.70 mL' })).toThrow(/nothing reacted/);
    expect(() => titrationAssay('C9H8O4', { sample: '1.5 g', back: true, titrant: '0.5 M', volume: '16 mL' })).toThrow(/`added`/);
    expect(() => titrationAssay('C9H8O4', { sample: '1.5 mL', titrant: '0.5 M', volume: '16 mL' })).toThrow(/sample mass must be a mass/);
    expect(() => titrationAssay('C9H8O4', { sample: '0 g', titrant: '0.5 M', volume: '16 mL' })).toThrow(/positive/);
  });
});
