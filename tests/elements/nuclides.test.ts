import { describe, expect, it } from 'vitest';
import { getNuclide, naturalIsotopes, principalIsotope } from '../../src/elements/nuclides.js';
import { PondusError } from '../../src/errors/pondus-error.js';

describe('nuclide masses and isotopic compositions', () => {
  it.each([
    // source: AME2020 (Wang et al., Chinese Phys. C 45 (2021) 030003)
    ['H', 1, '1.007825031898'],
    ['H', 2, '2.014101777844'],
    ['C', 12, '12.0000000'],
    ['C', 13, '13.00335483534'],
    ['O', 16, '15.99491461926'],
    ['Cl', 35, '34.968852694'],
    ['Cl', 37, '36.965902573'],
    ['Fe', 56, '55.934935537'],
    ['U', 238, '238.050786936'],
  ])('%s-%i has the AME2020 mass %s u', (symbol, a, mass) => {
    expect(getNuclide(symbol as string, a as number)?.mass).toBe(mass);
  });

  it('finds nuclides outside the natural set in the full AME2020 table', () => {
    // source: AME2020
    expect(getNuclide('C', 16)?.mass).toBe('16.014701255');
    expect(getNuclide('C', 99)).toBeUndefined();
  });

  it('takes the most abundant isotope as the principal one', () => {
    // source: CIAAW ICE 2013 Table 1
    expect(principalIsotope('Cl').massNumber).toBe(35);
    expect(principalIsotope('Br').massNumber).toBe(79);
    expect(principalIsotope('Fe').massNumber).toBe(56);
    expect(principalIsotope('Hg').massNumber).toBe(202);
    expect(principalIsotope('Tc').massNumber).toBe(98); // no natural composition: the flagged longest-lived isotope
  });
});

describe('nuclide look-ups with text that is not an element symbol', () => {
  it.each(['Xx', 'D', '', '__proto__', 'constructor', 'toString'])('principalIsotope(%j) throws a PondusError', (s) => {
    expect(() => principalIsotope(s)).toThrow(PondusError);
    try {
      principalIsotope(s);
    } catch (e) {
      expect((e as PondusError).issues[0].code).toBe('UNKNOWN_ELEMENT');
    }
  });

  it('D points to the bracket form of the nuclide', () => {
    expect(() => principalIsotope('D')).toThrow(/\[2H\]/);
  });

  it('getNuclide and naturalIsotopes answer nothing for names of object properties', () => {
    expect(getNuclide('constructor', 1)).toBeUndefined();
    expect(getNuclide('__proto__', 1)).toBeUndefined();
    expect(naturalIsotopes('hasOwnProperty')).toEqual([]);
  });
});
