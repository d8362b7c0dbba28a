import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { ELEMENTS, getElement } from '../../src/elements/element-table.js';
import { naturalIsotopes } from '../../src/elements/nuclides.js';
import weights from '../../src/elements/data/atomic-weights.json';

// The two checks that find a mistyped figure in the copied tables: amount fractions must add up
// to 1, and fractions × nuclide masses must land on the standard atomic weight. Each check is a
// function, so the tests also show that it rejects the two errors once present in the data
// (Sn 118.70 instead of 118.710; In-113 0.04271 instead of 0.04281).

interface Row { massNumber: number; abundance: string; mass: string }

/** Half a unit in the last written digit of each fraction, added up: what rounding alone can leave. */
function roundingAllowance(rows: Row[]): Decimal {
  return rows.reduce((a, r) => a.plus(new Decimal(10).pow(-(r.abundance.split('.')[1]?.length ?? 0)).div(2)), new Decimal(0));
}

function fractionsSumToOne(rows: Row[]): boolean {
  const sum = rows.reduce((a, r) => a.plus(r.abundance), new Decimal(0));
  return sum.minus(1).abs().lte(roundingAllowance(rows));
}

/** Σ xᵢ mᵢ (not normalised) within the stated uncertainty of a single standard value. */
function reproducesWeight(rows: Row[], value: string, uncertainty: string): boolean {
  const calc = rows.reduce((a, r) => a.plus(new Decimal(r.abundance).times(r.mass)), new Decimal(0));
  return calc.minus(value).abs().lte(uncertainty);
}

/** The single value the ICE 2013 compositions underlie: the 2021 entry, also for the three elements CIAAW revised in 2024. */
function value2021(symbol: string): { value: string; uncertainty: string } | null {
  const raw = (weights.elements as Array<Record<string, unknown>>).find((e) => e.symbol === symbol)!;
  if (typeof raw.value2021 === 'string') return { value: raw.value2021, uncertainty: raw.uncertainty2021 as string };
  if (typeof raw.value === 'string') return { value: raw.value, uncertainty: raw.uncertainty as string };
  return null;
}

describe('copied element data agrees with itself (ICE 2013 × AME2020 against CIAAW 2021)', () => {
  it('tin has the standard atomic weight 118.710 ± 0.007', () => {
    // source: CIAAW standard atomic weights 2021 (Prohaska et al., Pure Appl. Chem. 94 (2022) 573), Table 1
    expect(getElement('Sn')?.standard).toEqual({ kind: 'value', value: '118.710', uncertainty: '0.007' });
  });

  it('indium-113 has the amount fraction 0.04281', () => {
    // source: CIAAW ICE 2013 (Meija et al., Pure Appl. Chem. 88 (2016) 293), Table 1
    expect(naturalIsotopes('In').map((i) => [i.massNumber, i.abundance])).toEqual([[113, '0.04281'], [115, '0.95719']]);
  });

  it("every element's isotope fractions sum to 1, within the rounding of their last digits", () => {
    let checked = 0;
    for (const e of ELEMENTS) {
      const rows = naturalIsotopes(e.symbol);
      if (rows.length === 0) continue;
      checked++;
      const sum = rows.reduce((a, r) => a.plus(r.abundance), new Decimal(0));
      expect(fractionsSumToOne(rows), `${e.symbol}: Σx = ${sum.toFixed()}`).toBe(true);
    }
    expect(checked).toBe(84); // elements with a natural isotopic composition in ICE 2013
  });

  it('every element with a single standard value is reproduced by ICE × AME within its stated uncertainty', () => {
    let checked = 0;
    for (const e of ELEMENTS) {
      const rows = naturalIsotopes(e.symbol);
      const std = value2021(e.symbol);
      if (rows.length === 0 || std === null || e.standard.kind !== 'value') continue;
      checked++;
      expect(reproducesWeight(rows, std.value, std.uncertainty), `${e.symbol}: ${std.value} ± ${std.uncertainty}`).toBe(true);
    }
    expect(checked).toBeGreaterThan(60);
  });

  it('the interval elements: ICE × AME lies inside the CIAAW interval', () => {
    for (const e of ELEMENTS) {
      if (e.standard.kind !== 'interval') continue;
      const rows = naturalIsotopes(e.symbol);
      const calc = rows.reduce((a, r) => a.plus(new Decimal(r.abundance).times(r.mass)), new Decimal(0));
      expect(calc.gte(e.standard.low) && calc.lte(e.standard.high), `${e.symbol}: ${calc.toFixed(6)}`).toBe(true);
    }
  });

  it('the checks reject the two errors that were once in the copied data', () => {
    const sn = naturalIsotopes('Sn');
    expect(reproducesWeight(sn, '118.710', '0.007')).toBe(true);
    expect(reproducesWeight(sn, '118.70', '0.007')).toBe(false);
    const inRows = naturalIsotopes('In');
    expect(fractionsSumToOne(inRows)).toBe(true);
    expect(fractionsSumToOne(inRows.map((r) => (r.massNumber === 113 ? { ...r, abundance: '0.04271' } : r)))).toBe(false);
  });

  it('the 2024 revisions are kept beside the 2021 entries they replace', () => {
    // source: CIAAW 2021 Table 1 (Zr 91.224(2), Gd 157.25(3), Lu 174.9668(1)) and the 2024 revisions
    expect(value2021('Gd')).toEqual({ value: '157.25', uncertainty: '0.03' });
    expect(value2021('Lu')).toEqual({ value: '174.9668', uncertainty: '0.0001' });
    expect(value2021('Zr')).toEqual({ value: '91.224', uncertainty: '0.002' });
    expect(getElement('Gd')?.standard).toEqual({ kind: 'value', value: '157.249', uncertainty: '0.002' });
  });
});
