/**
 * The stoichiometric mass factor between two substances that share an element:
 * mass of `sought` per unit mass of `given`. For a precipitate this is the
 * gravimetric factor (IUPAC Gold Book: the ratio of the molar mass of the
 * substance sought to that of the substance weighed, each multiplied by the
 * number of formula units that hold the same amount of the key element); for
 * fertilizer, ceramic and geochemical work it converts between an element and
 * its oxide basis (P ↔ P2O5, K ↔ K2O, Si ↔ SiO2, Al ↔ Al2O3).
 */
import { fail } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { dividedBy, exact, times, type Measured } from '../sigfig/measured.js';
import { gcd } from '../reactions/rational.js';
import { speciesText } from './species.js';

export interface ConversionFactor {
  sought: MassDetail;
  given: MassDetail;
  /** The element both contain, on which the factor rests. */
  element: string;
  /** Formula units of the sought substance … */
  a: bigint;
  /** … per formula units of the given one. */
  b: bigint;
  /** a·M(sought) / (b·M(given)), exact. */
  factor: Decimal;
  /** The factor with the precision of the molar masses. */
  reported: Measured;
}

/**
 * The mass of `sought` that corresponds to a unit mass of `given`.
 *
 * @param sought - the formula of the species sought ('Fe').
 * @param given - the formula of the species weighed ('Fe2O3').
 * @param element - the element the factor rests on, when the two share more than one besides O and H.
 * @param options - the mass options.
 * @returns the element it rests on, the whole-number ratio a:b, the factor (mass of sought per unit mass of given), and the factor with the precision of the molar masses.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); BAD_OPTION for formulas that share no element, or more than one with none chosen, an element not in both, or counts of it that are not whole; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * conversionFactor('Fe', 'Fe2O3').factor.toFixed(4) // '0.6994'
 * conversionFactor('P', 'P2O5').factor.toFixed(4)   // '0.4364'
 */
export function conversionFactor(sought: string, given: string, element?: string, options: MassOptions = {}): ConversionFactor {
  const s = formulaMassDetail(sought, options);
  const g = formulaMassDetail(given, options);
  const shared = [...s.atoms.keys()].filter((k) => g.atoms.has(k));
  let key = element;
  if (key === undefined) {
    const candidates = shared.length > 1 ? shared.filter((k) => k !== 'O' && k !== 'H') : shared;
    if (candidates.length !== 1) {
      throw fail({
        code: 'BAD_OPTION',
        message: candidates.length === 0 ? `${speciesText(s)} and ${speciesText(g)} share no element` : `${speciesText(s)} and ${speciesText(g)} share ${candidates.join(', ')}: say which element the factor rests on (\`element\`)`,
        options: ['element'],
      });
    }
    key = candidates[0];
  }
  if (!s.atoms.has(key) || !g.atoms.has(key)) throw fail({ code: 'BAD_OPTION', message: `${key} is not in both ${speciesText(s)} and ${speciesText(g)}` });
  const ns = toDecimal(s.atoms.get(key)!);
  const ng = toDecimal(g.atoms.get(key)!);
  if (!ns.isInteger() || !ng.isInteger()) throw fail({ code: 'BAD_OPTION', message: 'the factor needs whole counts of the key element' });
  // a·ns = b·ng  →  a = ng/d, b = ns/d
  const d = gcd(BigInt(ns.toFixed()), BigInt(ng.toFixed()));
  const a = BigInt(ng.toFixed()) / d;
  const b = BigInt(ns.toFixed()) / d;
  const factor = s.molarMass.times(String(a)).div(g.molarMass.times(String(b)));
  const reported = dividedBy(times(reportedMolarMass(s), exact(String(a))), times(reportedMolarMass(g), exact(String(b))));
  return { sought: s, given: g, element: key, a, b, factor, reported };
}
