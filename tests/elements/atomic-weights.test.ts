import { describe, expect, it } from 'vitest';
import { ELEMENTS, getElement } from '../../src/elements/element-table.js';
import { getAtomData } from '../../src/elements/atom-data.js';

describe('element table', () => {
  it('has all 118 elements, numbered 1 to 118 without gaps, with unique symbols', () => {
    expect(ELEMENTS).toHaveLength(118);
    ELEMENTS.forEach((e, i) => expect(e.z).toBe(i + 1));
    expect(new Set(ELEMENTS.map((e) => e.symbol)).size).toBe(118);
  });

  it('uses the IUPAC names, also where the CIAAW text file misspells them', () => {
    // source: IUPAC element names (Red Book 2005, Table I; 2016 names for 113, 115, 117, 118)
    expect(getElement('Nb')?.name).toBe('niobium');
    expect(getElement('Ts')?.name).toBe('tennessine');
    expect(getElement('Og')?.name).toBe('oganesson');
  });

  it.each([
    // source: CIAAW standard atomic weights 2021 (Prohaska et al., Pure Appl. Chem. 94 (2022) 573), Table 1
    ['He', '4.002602', '0.000002'],
    ['F', '18.998403162', '0.000000005'],
    ['Na', '22.98976928', '0.00000002'],
    ['P', '30.973761998', '0.000000005'],
    ['Fe', '55.845', '0.002'],
    ['Cu', '63.546', '0.003'],
    ['Cs', '132.90545196', '0.00000006'],
    ['Bi', '208.98040', '0.00001'],
    ['U', '238.02891', '0.00003'],
  ])('%s has the CIAAW 2021 standard atomic weight %s ± %s', (symbol, value, u) => {
    expect(getElement(symbol)?.standard).toEqual({ kind: 'value', value, uncertainty: u });
  });

  it.each([
    // source: CIAAW 2024 revisions of the standard atomic weights of Gd, Lu and Zr
    ['Gd', '157.249', '0.002'],
    ['Lu', '174.96669', '0.00005'],
    ['Zr', '91.222', '0.003'],
  ])('%s carries the 2024 revision %s ± %s', (symbol, value, u) => {
    const e = getElement(symbol)!;
    expect(e.standard).toEqual({ kind: 'value', value, uncertainty: u });
    expect(e.revised).toBe(2024);
  });

  it.each([
    // source: CIAAW 2021 Table 1 (interval) and the conventional values CIAAW gives for interval elements
    ['H', '1.00784', '1.00811', '1.008'],
    ['Li', '6.938', '6.997', '6.94'],
    ['B', '10.806', '10.821', '10.81'],
    ['C', '12.0096', '12.0116', '12.011'],
    ['N', '14.00643', '14.00728', '14.007'],
    ['O', '15.99903', '15.99977', '15.999'],
    ['Mg', '24.304', '24.307', '24.305'],
    ['Si', '28.084', '28.086', '28.085'],
    ['S', '32.059', '32.076', '32.06'],
    ['Cl', '35.446', '35.457', '35.45'],
    ['Ar', '39.792', '39.963', '39.95'],
    ['Br', '79.901', '79.907', '79.904'],
    ['Tl', '204.382', '204.385', '204.38'],
    ['Pb', '206.14', '207.94', '207.2'],
  ])('%s is an interval [%s, %s] with conventional value %s', (symbol, low, high, conventional) => {
    expect(getElement(symbol)?.standard).toEqual({ kind: 'interval', low, high, conventional });
  });

  it('has exactly the 14 interval elements of the 2021 table', () => {
    expect(ELEMENTS.filter((e) => e.standard.kind === 'interval')).toHaveLength(14);
  });

  it('flags the 34 elements without a standard atomic weight and gives a mass number', () => {
    // source: CIAAW 2021 Table 1 lists no value for Tc, Pm, Po–Ac and Np–Og
    const none = ELEMENTS.filter((e) => e.standard.kind === 'none').map((e) => e.symbol);
    expect(none).toEqual(['Tc', 'Pm', 'Po', 'At', 'Rn', 'Fr', 'Ra', 'Ac', ...ELEMENTS.filter((e) => e.z >= 93).map((e) => e.symbol)]);
    expect(none).toHaveLength(34);
    // from memory: longest-lived isotopes as periodic tables bracket them
    expect(getElement('Tc')?.standard).toEqual({ kind: 'none', massNumber: 98 });
    expect(getElement('Ra')?.standard).toEqual({ kind: 'none', massNumber: 226 });
    expect(getElement('Pu')?.standard).toEqual({ kind: 'none', massNumber: 244 });
    expect(getAtomData('Tc', null)?.noStandardWeight).toBe(true);
  });

  it('keeps the abridged table', () => {
    // source: CIAAW 2021 abridged standard atomic weights (five figures)
    expect(getElement('Na')?.abridged).toEqual({ value: '22.990', uncertainty: '0.001' });
    expect(getElement('Cl')?.abridged).toEqual({ value: '35.45', uncertainty: '0.01' });
    expect(getAtomData('Na', null)?.average.abridged.text).toBe('22.990');
  });

  it('every value parses as a decimal and every standard value lies in a plausible range', () => {
    for (const e of ELEMENTS) {
      const std = e.standard;
      const v = std.kind === 'value' ? Number(std.value) : std.kind === 'interval' ? Number(std.conventional) : std.massNumber;
      expect(Number.isFinite(v)).toBe(true);
      expect(v).toBeGreaterThan(e.z); // A_r exceeds Z for every element but hydrogen…
      if (e.z > 1) expect(v).toBeLessThan(3 * e.z + 10);
    }
  });
});
