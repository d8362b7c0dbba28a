// Codes beyond the formula reader that carry machine fields: a script reads the unit, the two
// dimensions, the number and its limit, the element, the part or the size of a search without
// parsing the message, and the message is made from those fields alone.
import { describe, expect, it } from 'vitest';
import { hasFields, type Issue, type TypedCode } from '../../src/errors/issue.js';
import { messageFor } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import {
  add,
  alligation,
  calc,
  candidateFormulas,
  dilute,
  dilutionSeries,
  empirical,
  formulaMassDetail,
  measure,
  molarMassUncertainty,
  partShare,
  PondusError,
  power,
  quantity,
  Rational,
  readNumber,
  reportUnit,
  subtract,
  titrationAssay,
  unitOf,
} from '../../src/index.js';

function issueOf(run: () => unknown): Issue {
  try {
    run();
  } catch (e) {
    if (e instanceof PondusError) return e.first;
    throw e;
  }
  throw new Error('expected a PondusError');
}

/** A call, the code it raises, and the machine fields its issue must carry. */
const CASES: [string, () => unknown, TypedCode, Record<string, unknown>][] = [
  ['a unit pondus does not know', () => unitOf('furlong'), 'UNKNOWN_UNIT', { unit: 'furlong', inExpression: false }],
  ['a word in a calculator expression', () => calc('5 foo'), 'UNKNOWN_UNIT', { unit: 'foo', inExpression: true, column: 3 }],
  ['a mass plus a volume', () => add(measure('1 g'), measure('1 mL')), 'INCOMPATIBLE_UNITS', { operation: 'add', first: 'a mass', firstDimension: 'g', second: 'a volume', secondDimension: 'L' }],
  ['a volume taken from a mass', () => subtract(measure('1 g'), measure('1 mL')), 'INCOMPATIBLE_UNITS', { operation: 'subtract', first: 'a mass', firstDimension: 'g', second: 'a volume', secondDimension: 'L' }],
  ['a mass shown in mL', () => reportUnit(measure('1 g'), 'mL'), 'INCOMPATIBLE_UNITS', { operation: 'convert', first: null, firstDimension: 'g', second: 'mL' }],
  ['a pure number shown in g', () => reportUnit(measure('2'), 'g'), 'INCOMPATIBLE_UNITS', { operation: 'convert', firstDimension: null, second: 'g' }],
  ['a molar stock and a target per volume', () => dilute('1.0 M', '5 g/L', '100.0 mL'), 'INCOMPATIBLE_UNITS', { operation: 'dilute', first: 'stock', firstDimension: 'M', second: 'target', secondDimension: 'g/L' }],
  ['the same in a serial plan', () => dilutionSeries({ stock: '1.0 M', target: '5 g/L', volume: '10.00 mL' }), 'INCOMPATIBLE_UNITS', { operation: 'dilute', firstDimension: 'M' }],
  ['an exponent past the limit', () => readNumber('1e2000'), 'NUMBER_OUT_OF_RANGE', { value: '1e2000', exponentLimit: 1000, reading: 'exponent', what: null }],
  ['a number past 1e100', () => readNumber(' 1e150 '), 'NUMBER_OUT_OF_RANGE', { value: '1e150', exponentLimit: 100, reading: 'number' }],
  ['a fraction past 10^1000', () => Rational.fromDecimal('1e1001'), 'NUMBER_OUT_OF_RANGE', { value: '1e1001', exponentLimit: 1000, reading: 'fraction' }],
  ['strengths to mix in a percent and a per-volume unit', () => alligation('10 %', { higher: '20 mg/mL', lower: '5 %', total: '300 mL' }), 'INCOMPATIBLE_UNITS', { operation: 'mix', first: 'target', firstDimension: null, second: 'higher', secondDimension: 'g/L' }],
  ['a lower strength in molar units', () => alligation('10 %', { higher: '20 %', lower: '0.1 M', total: '300 mL' }), 'INCOMPATIBLE_UNITS', { operation: 'mix', second: 'lower', secondDimension: 'M' }],
  ['a power past 10^10000', () => power(quantity(readNumber('1e99'), null), 1000), 'NUMBER_OUT_OF_RANGE', { value: '1e+99000', exponentLimit: 10_000, reading: 'result', what: null }],
  ['a calculator result past 1e300', () => calc('1e99 * 1e99 * 1e99 * 1e99'), 'NUMBER_OUT_OF_RANGE', { value: '1e+396', exponentLimit: 300, reading: 'result' }],
  [
    'a sample mass past 10^60 g',
    () => titrationAssay('NaOH', { sample: '1e70 g', titrant: '0.1 M', volume: '20 mL' }),
    'NUMBER_OUT_OF_RANGE',
    { value: '1e70 g', exponentLimit: 60, reading: 'measurement', what: 'the sample mass' },
  ],
  ['an element with no standard atomic weight', () => molarMassUncertainty(formulaMassDetail('TcO2')), 'NO_STANDARD_WEIGHT', { symbol: 'Tc', name: 'technetium' }],
  ['a part with an element the formula lacks', () => partShare(formulaMassDetail('H2O'), 'SO4'), 'PART_NOT_IN_FORMULA', { part: 'O4S', formula: 'H2O', lacking: ['S'] }],
  ['a part with two elements the formula lacks', () => partShare(formulaMassDetail('NaCl'), 'SO4'), 'PART_NOT_IN_FORMULA', { part: 'O4S', formula: 'ClNa', lacking: ['S', 'O'] }],
  ['a molecular search over a wide molar-mass range', () => empirical('C=40.00 H=6.71 O=53.29', { molarMass: '100-90000' }), 'SEARCH_TOO_LARGE', { search: 'molecular', limit: expect.any(Number), walkLimit: null }],
  [
    'a candidate window too wide to count',
    () => candidateFormulas({ mass: '1500.5', ppm: 1000, elements: 'C0-150 H0-300 N0-40 O0-40 S0-10 P0-10 Cl0-10 Br0-10 F0-10 I0-10 Si0-10 B0-10 Se0-10' }),
    'SEARCH_TOO_LARGE',
    { search: 'candidates', estimate: null, limit: 100_000_000, walkLimit: 5_000_000, window: 'mass 1500.5 ± 1000 ppm', elements: 13 },
  ],
];

describe('machine fields beyond the formula reader', () => {
  it.each(CASES)('%s', (_what, run, code, fields) => {
    const issue = issueOf(run);
    expect(issue.code).toBe(code);
    expect(hasFields(issue)).toBe(true);
    expect(issue).toMatchObject(fields);
    // the message is the one the fields make (a caller's context, as 'the sample mass: ', stays in front)
    const made = messageFor({ ...issue, message: '' });
    expect(issue.message.endsWith(made)).toBe(true);
  });

  it('the molecular search carries its estimate, the number in its message', () => {
    const issue = issueOf(() => empirical('C=40.00 H=6.71 O=53.29', { molarMass: '100-90000' }));
    if (!hasFields(issue) || issue.code !== 'SEARCH_TOO_LARGE') throw new Error('expected typed SEARCH_TOO_LARGE');
    expect(issue.estimate).toBeGreaterThan(issue.limit);
    expect(issue.message).toContain(issue.estimate!.toLocaleString('en-US'));
  });

  it('a search refused with options to narrow names them by the reader', () => {
    const issue = issueOf(() => candidateFormulas({ mass: '1500.5', ppm: 1000, elements: 'C0-150 H0-300 N0-40 O0-40 S0-10 P0-10 Cl0-10 Br0-10 F0-10 I0-10 Si0-10 B0-10 Se0-10' }));
    expect(messageFor(issue)).toMatch(/narrow the window \(`ppm`\), the element ranges \(`elements`,/);
    expect(messageFor(issue, FLAG_NAMING)).toMatch(/narrow the window \(--ppm\), the element ranges \(--elements,/);
  });
});
