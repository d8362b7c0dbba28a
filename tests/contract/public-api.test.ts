// The public API's error guarantee: every function exported from src/index.ts answers or throws a
// PondusError, whatever it is given (wrong types, undefined, NaN, huge values), and every safe…
// function is the non-throwing form of its throwing function.
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { isGuarded } from '../../src/errors/guard.js';
import { PondusError } from '../../src/errors/pondus-error.js';

// Classes exported as classes, not guarded: the error type itself, decimal.js's Decimal (its own
// API, shared so that its values are the same class as the caller's) and Rational (the exact
// fractions of the balancing code).
const CLASSES = ['PondusError', 'Decimal', 'Rational'];

const functions = Object.entries(api).filter(([name, v]) => typeof v === 'function' && !CLASSES.includes(name)) as [string, (...a: unknown[]) => unknown][];

const HUGE = 'C'.repeat(50_000);
const hostile: unknown[] = [undefined, null, NaN, Infinity, -Infinity, -1, 0, 1e308, 2 ** 53 + 1, '', ' ', 'Xx', 'H2O', HUGE, '\u0000', '__proto__', {}, [], [NaN], true, () => 1, Symbol('s'), 10n, new Map(), Object.create(null), { weights: 5, rounding: null, concentration: NaN, volume: {}, mass: [], sample: null, part: 7 }];

/** The argument lists tried on every function: each hostile value alone, and beside plausible text. */
function argumentLists(): unknown[][] {
  const lists: unknown[][] = [[]];
  for (const h of hostile) {
    lists.push([h], [h, h], ['H2O', h], [h, 'H2O'], ['NaCl', 'NaCl', h], ['NaCl', {}, h], [h, {}, 'half-up']);
  }
  return lists;
}

function describeArgs(args: unknown[]): string {
  return args
    .map((a) => (typeof a === 'symbol' ? 'Symbol' : typeof a === 'bigint' ? `${a}n` : typeof a === 'function' ? 'fn' : a === HUGE ? 'HUGE' : Number.isNaN(a) ? 'NaN' : (JSON.stringify(a) ?? String(a))))
    .join(', ');
}

/** Calls fn; returns null on an answer, the PondusError's code otherwise; anything else thrown is returned as a failure text. */
function outcome(fn: (...a: unknown[]) => unknown, args: unknown[]): { code: string | null; escaped?: string; message?: string } {
  try {
    fn(...args);
    return { code: null };
  } catch (e) {
    if (e instanceof PondusError) return { code: e.first.code, message: e.first.message };
    return { code: null, escaped: `${(e as Error)?.constructor?.name}: ${(e as Error)?.message}` };
  }
}

// Functions whose own code still fails inside on some malformed argument that the boundary's kind
// check cannot see; the boundary turns the failure into a PondusError with code INTERNAL_ERROR.
// Empty: every library value (a result, a Measured, a Quantity, an error), every options object
// with required fields and every array of such things is checked at the boundary by its shape
// (src/errors/guard.ts). Listed so that a new one is noticed.
const KNOWN_INTERNAL: string[] = [];

describe('every public function answers or throws a PondusError', () => {
  it('every exported function is guarded at the boundary', () => {
    const unguarded = functions.filter(([name, fn]) => !name.startsWith('safe') && !isGuarded(fn)).map(([n]) => n);
    expect(unguarded).toEqual([]);
  });

  const internal = new Map<string, string[]>();
  for (const [name, fn] of functions) {
    it(name, () => {
      const escaped: string[] = [];
      for (const args of argumentLists()) {
        const r = outcome(fn, args);
        if (r.escaped) escaped.push(`${name}(${describeArgs(args)}) threw ${r.escaped}`);
        if (r.code === 'INTERNAL_ERROR') {
          const seen = internal.get(name) ?? [];
          if (seen.length < 3) seen.push(`${name}(${describeArgs(args)}): ${r.message}`);
          internal.set(name, seen);
        }
      }
      expect(escaped).toEqual([]);
    });
  }

  it('the functions that still fail inside on malformed arguments are the known ones', () => {
    // printed for the record: the raw failure the boundary turned into INTERNAL_ERROR
    for (const lines of internal.values()) for (const l of lines) console.log(l.slice(0, 240));
    expect([...internal.keys()].sort()).toEqual(KNOWN_INTERNAL);
  });
});

// Plausible mistakes with library values: a result of one function given to another's serialiser,
// a value rebuilt by hand without a field, an options object missing a required field, a list with
// one wrong item. Each is refused at the boundary with BAD_ARGUMENT naming the function, the
// argument (or option, or item) and what was expected.
describe('library values of the wrong shape are refused by name', () => {
  const message = (f: () => unknown) => outcome(f, []);
  const call = (name: string, ...args: unknown[]) => () => (api as unknown as Record<string, (...a: unknown[]) => unknown>)[name](...args);
  const peaks = api.isotopePattern('Br2').peaks;
  const reacted = api.react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'] });
  const cases: [string, () => unknown, string][] = [
    ['a composition where a mass result belongs', call('massJson', api.composition('H2O')), "massJson: argument 1 must be a mass result (from formulaMass), not an object without 'monoisotopicMass'"],
    ['a plain mass result where the detailed one belongs', call('plainMass', api.formulaMass('H2O')), "plainMass: argument 1 must be a detailed mass result (from formulaMassDetail), not an object without 'molarMassNumber'"],
    ['a Measured with a number for its value', call('times', { value: 1, lsd: null }, api.exact(2)), "times: argument 1 must be a Measured (a Decimal value with its precision), not an object whose 'value' is the number 1"],
    ['a Measured where a Quantity belongs', call('add', api.exact(1), api.exact(2)), "add: argument 1 must be a Quantity (from measure or quantity), not an object without 'dims'"],
    ['a Quantity where an instruction belongs', call('instructionJson', api.measure('1.461 g'), 'g'), "instructionJson: argument 1 must be an instruction (a mass to weigh, a volume to take), not an object without 'quantity'"],
    ['a unit object of the wrong shape', call('displayQuantity', api.measure('250. mg'), { symbol: 'g' }), "displayQuantity: argument 2 must be a unit (a symbol such as 'mL', or a unit from unitOf) or null, not an object without 'exp10'"],
    ['a reaction result whose balance was lost', call('reactJson', { ...reacted, balance: {} }), "reactJson: argument 1 must be a reaction result (from react), not an object whose 'balance' is an object without 'input'"],
    ['an error-like object', call('renderError', { issues: [{ code: 'X', message: 'x' }] }), 'renderError: argument 1 must be a PondusError, not an object'],
    ['a PondusError without issues', call('errorJson', new api.PondusError([])), 'errorJson: argument 1 must be a PondusError, not a PondusError without issues'],
    ['titration options without the titre', call('titrationAssay', 'KHC8H4O4', { sample: '0.5000 g', titrant: '0.1000 M' }), "titrationAssay: option volume (argument 2) must be a string, the titre ('24.85 mL'), not nothing (undefined)"],
    ['a standard mass given as a number', call('standardise', 'KHC8H4O4', { mass: 0.5105, volume: '24.95 mL' }), "standardise: option mass (argument 2) must be a string, the mass of primary standard weighed ('0.5105 g'), not the number 0.5105"],
    ['combustion options without the products', call('combustion', { sample: '1.000 g' }), "combustion: option collected (argument 1) must be an object, the masses collected by product ({ co2: '1.499 g', h2o: '0.4091 g' }), not nothing (undefined)"],
    ['a formula where an atom key belongs', call('atomIsotopes', 'H2O'), "atomIsotopes: argument 1 must be an atom key with isotope data ('C', '13C', 'D' is written '2H'), not 'H2O'"],
    ['a string where a list of atom keys belongs', call('hillOrder', 'H2O'), "hillOrder: argument 1 must be an iterable of atom keys ('C', '13C'), such as an array or a Map's keys(), not a string"],
    ['a list of atom keys with a number in it', call('hillOrder', ['O', 5]), "hillOrder: argument 1 must be an iterable of atom keys ('C', '13C'), such as an array or a Map's keys(), not an iterable whose item 2 is the number 5"],
    ['a list of strings with a null in it', call('readFixOption', ['C4H6O3=5', null]), 'readFixOption: argument 1 must be an array, each item a string, not an array whose item 2 is null'],
    ['a list of peaks with a null in it', call('stickPlot', [peaks[0], null]), 'stickPlot: argument 1 must be an array, each item a peak of an isotope pattern, not an array whose item 2 is null'],
    ['a mass result among composition results', call('compositionCsvColumns', [api.composition('H2O'), api.formulaMass('NaCl')], false), "compositionCsvColumns: argument 1 must be an array, each item a composition result (from composition), not an array whose item 2 is an object without 'elements'"],
  ];
  for (const [what, f, expected] of cases) {
    it(what, () => {
      const r = message(f);
      expect(r.code).toBe('BAD_ARGUMENT');
      expect(r.message).toBe(expected);
    });
  }

  it('still takes every value the library returns', () => {
    // source: from memory (CIAAW 2021 standard atomic weights): H2O 18.015 g/mol
    expect(api.massJson(api.formulaMass('H2O')).molarMass).toBe(18.015);
    expect(api.plainMass(api.formulaMassDetail('H2O')).molarMassExact).toBe('18.015');
    expect(api.hillOrder(new Map([['O', 1], ['H', 2]]).keys())).toEqual(['H', 'O']);
    expect(api.hillOrder(new Set(['Cl', 'C', 'H']))).toEqual(['C', 'H', 'Cl']);
    expect(api.displayQuantity(api.measure('250. mg'), api.unitOf('g')).text).toBe('0.250 g');
    expect(api.displayQuantity(api.measure('2.50 g'), null).text).toBe('2.50 g');
    expect(api.reactJson(reacted).limiting).toBe('O2');
    expect(api.errorJson(api.safeFormulaMass('H2Q').error as api.PondusError).code).toBe('UNKNOWN_ELEMENT');
    expect(api.stickPlot(peaks).length).toBe(peaks.length + 1);
    expect(api.atomIsotopes('2H').massNumbers).toEqual([2]);
  });
});

describe('the error guarantee, case by case', () => {
  const code = (f: () => unknown) => outcome(f, []).code;
  it('names the argument of the wrong kind', () => {
    expect(code(() => (api.analysis as (...a: unknown[]) => unknown)(5, 'C=1'))).toBe('BAD_ARGUMENT');
    expect(code(() => (api.analysis as (...a: unknown[]) => unknown)('C6H6', { C: 92 }))).toBe('BAD_ARGUMENT');
    expect(outcome(() => (api.formulaMass as (...a: unknown[]) => unknown)(42), []).message).toBe('formulaMass: argument 1 must be a formula (a string or a parsed formula), not the number 42');
    expect(code(() => api.formulaMass('H2O', null as never))).toBe('BAD_ARGUMENT');
    expect(code(() => api.formulaMass('H2O', { weights: 'bogus' as never }))).toBe('BAD_ARGUMENT');
  });
  it('keeps the codes of the functions themselves', () => {
    expect(code(() => api.principalIsotope('Xx'))).toBe('UNKNOWN_ELEMENT');
    expect(code(() => api.principalIsotope('D'))).toBe('UNKNOWN_ELEMENT');
    expect(code(() => api.formulaMass('H2Q'))).toBe('UNKNOWN_ELEMENT');
    expect(code(() => api.calc('1 g / 0 g'))).toBe('DIVISION_BY_ZERO');
  });
  it('turns a division by zero deep inside into DIVISION_BY_ZERO', () => {
    expect(code(() => api.dividedBy(api.exact(1), api.exact(0)))).toBe('DIVISION_BY_ZERO');
  });
  it('refuses a figure count below one and a rounding it does not know', () => {
    expect(code(() => api.roundToSigFigs(new api.Decimal('1.25'), 0))).toBe('BAD_ARGUMENT');
    expect(code(() => api.roundToSigFigs(new api.Decimal('1.25'), 2.5))).toBe('BAD_ARGUMENT');
    expect(code(() => api.roundToSigFigs(new api.Decimal('1.25'), 2, 'up' as never))).toBe('BAD_ARGUMENT');
    // source: ASTM E29 (half to even): 1.25 to two figures is 1.2
    expect(api.roundToSigFigs(new api.Decimal('1.25'), 2).toString()).toBe('1.2');
  });
  it('keeps the name and arity of each function', () => {
    expect(api.formulaMass.name).toBe('formulaMass');
    expect(api.dilute.length).toBe(4);
  });
});

// One good call and one bad call for every safe… function: the safe form gives exactly what the
// throwing form gives, or the same error as data.
const SAFE_CASES: Record<string, { good: unknown[]; bad: unknown[] }> = {
  safeParseFormula: { good: ['CuSO4·5H2O'], bad: ['Xx2'] },
  safeFormulaMass: { good: ['H2O'], bad: ['H2Q'] },
  safeComposition: { good: ['FeSO4·7H2O', { part: 'Fe' }], bad: ['H2O', { part: 'NaCl' }] },
  safeCalc: { good: ['5.63 g / 8.80 g * 100 %'], bad: ['5 g + 2 mL'] },
  safeMixtureComposition: { good: ['C=7.34 g, H=1.85 g, N=2.85 g'], bad: ['C=7.34 q'] },
  safeAnalysis: { good: ['C6H6', 'C=92.26,H=7.74'], bad: ['C6H6', 'C=92.26,Cl=1.00'] },
  safeBalance: { good: ['H2 + O2 -> H2O'], bad: ['H2 + O2'] },
  safeReact: { good: ['H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'] }], bad: ['H2 + O2 -> H2O', { amounts: [] }] },
  safePrepareSolution: { good: ['CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL' }], bad: ['CuSO4·5H2O', { concentration: '0.100 g', volume: '250.0 mL' }] },
  safeSubstituteForm: { good: ['MgSO4', 'MgSO4·7H2O', '24.65 g', { purity: '98.0 %' }], bad: ['MgSO4', 'MgSO4·7H2O', '24.65 mL'] },
  safeDilute: { good: ['1.00 M', '0.100 M', '250.0 mL'], bad: ['0.100 M', '1.00 M', '250.0 mL'] },
  safeGravimetric: { good: ['Cl', 'AgCl', { weighedMass: '0.2866 g' }], bad: ['Cl', 'Fe2O3'] },
  // the dose option that the hand-written wrapper once refused
  safeSaltFactor: { good: ['C17H19NO3·HCl·3H2O', 'C17H19NO3', { parentMass: '10.0 mg' }], bad: ['C17H19NO3·HCl', 'C6H6'] },
  safeConvertBasis: { good: ['P2O5', 'P', { value: '12.5 %' }], bad: ['P2O5', 'K'] },
  safeEmpirical: { good: ['C=40.00 H=6.71 O=53.29', { molarMass: '180.16' }], bad: ['C=40.00 Q=6.71'] },
  safeCombustion: { good: [{ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } }], bad: [{ sample: '0 g', collected: { co2: '1.499 g' } }] },
  safeCandidateFormulas: { good: [{ mass: '180.06339', ppm: 3, elements: 'C0-20 H0-40 O0-10' }], bad: [{ mass: 'heavy', elements: 'C0-20' }] },
  safeTitrationAssay: { good: ['KHC8H4O4', { sample: '0.5000 g', titrant: '0.1000 M', volume: '24.40 mL' }], bad: ['KHC8H4O4', { sample: '0 g', titrant: '0.1 M', volume: '24 mL' }] },
  safeStandardise: { good: ['KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' }], bad: ['KHC8H4O4', { mass: '0.5105 mL', volume: '24.95 mL' }] },
  safeConvertSampleBasis: { good: ['99.1 %', 'as-is', 'dried', { loss: '0.50 %' }], bad: ['99.1 %', 'as-is', 'dried', {}] },
  safeReplicates: { good: ['3.080 3.094 3.107 3.056 3.112 3.174 3.198 g'], bad: ['99.2'] },
  safeMilliequivalents: { good: ['KCl', { concentration: '10 %' }], bad: ['Xx', { concentration: '10 %' }] },
  safeOsmolarity: { good: ['NaCl=0.9 %'], bad: ['NaCl'] },
  safeAlligation: { good: ['10 %', { higher: '20 %', lower: '5 %', total: '300 g' }], bad: ['30 %', { higher: '20 %', lower: '5 %', by: 'mass' }] },
  safeReagentTable: { good: [[{ role: 'reference', reagent: 'NaCl', amount: '1.00 g' }]], bad: [[{ role: 'reagent', reagent: 'NaCl', amount: '1.0 equiv' }]] },
  safeConcentratedReagent: { good: ['HCl', { fraction: '37 %', density: '1.19 g/mL', concentration: '0.100 M', volume: '1.000 L' }], bad: ['HCl', { fraction: '137 %', density: '1.19 g/mL' }] },
  safeDilutionSeries: { good: [{ factor: '1:1000', volume: '10.00 mL' }], bad: [{ factor: '1:0', volume: '10.00 mL' }] },
  safeDiluteByMass: { good: ['10. % w/w', '2.5 % w/w', '60.0 g'], bad: ['2.5 % w/w', '10. % w/w', '60.0 g'] },
  safePrepRow: { good: [{ line: 2, raw: 'P-1,NaCl', id: 'P-1', reagent: 'sodium chloride', formula: 'NaCl', purity: '', density: '', as: '', target: '0.100 M', volume: '250.0 mL', weighed: '', taken: '' }], bad: [{ line: 2, raw: 'P-1,NaCl', id: 'P-1', reagent: 'sodium chloride', formula: 'NaCl', purity: '', density: '', as: '', target: '0.100 q', volume: '250.0 mL', weighed: '', taken: '' }] },
  safePotency: { good: ['950. µg/mg', { need: '500. mg' }], bad: ['heavy'] },
  safeStrengthForms: { good: ['1:1000'], bad: ['1:'] },
  safeIonMass: { good: ['C15H15NO2', '[M+H]+'], bad: ['C6H6', '[M+Q]+'] },
  safeIsotopePattern: { good: ['Cl2'], bad: ['C6H6', { ion: '[M+Q]+' }] },
};

describe('the safe… functions are the throwing functions made non-throwing', () => {
  const safeNames = Object.keys(api).filter((n) => /^safe[A-Z]/.test(n));
  it('every safe function has a case here', () => {
    expect(safeNames.sort()).toEqual(Object.keys(SAFE_CASES).sort());
  });
  for (const name of safeNames) {
    const base = name[4].toLowerCase() + name.slice(5);
    it(`${name} = ${base} without throwing`, () => {
      const safe = (api as unknown as Record<string, (...a: unknown[]) => api.SafeResult<unknown>>)[name];
      const fn = (api as unknown as Record<string, (...a: unknown[]) => unknown>)[base];
      const { good, bad } = SAFE_CASES[name];
      const ok = safe(...good);
      expect(ok.success).toBe(true);
      if (ok.success) expect(ok.data).toEqual(fn(...good));
      const failed = safe(...bad);
      expect(failed.success).toBe(false);
      let thrown: unknown;
      try {
        fn(...bad);
      } catch (e) {
        thrown = e;
      }
      expect(thrown).toBeInstanceOf(PondusError);
      if (!failed.success) {
        expect(failed.error).toBeInstanceOf(PondusError);
        expect(failed.error.issues).toEqual((thrown as PondusError).issues);
      }
      // and never throws, whatever it is given
      for (const h of hostile) expect(safe(h, h, h).success).toBe(false);
    });
  }
});
