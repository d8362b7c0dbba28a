/**
 * Standard uncertainty of a molar mass from the standard atomic weights, by the
 * method of van der Veen et al., "Interpretation and use of standard atomic
 * weights", Pure Appl. Chem. 93 (2021) 629: each standard atomic weight is read
 * as a rectangular distribution — over the interval [a, b] for interval
 * elements, over [A − U, A + U] for the others — with mean at its centre and
 * standard uncertainty half-width/√3; the molar mass Σ nᵢAᵢ then has
 * u² = Σ (nᵢ u(Aᵢ))² (different elements independent, atoms of one element
 * fully correlated). Nuclide masses (isotope labels) are taken as exact: their
 * AME2020 uncertainties are far smaller.
 */
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { Decimal } from '../exact/decimal.js';
import { sqrtDecimal } from '../exact/sqrt.js';
import { toDecimal } from '../formula/amount.js';
import type { MassDetail } from './formula-mass.js';

/** One element's part of the uncertainty budget. */
export interface UncertaintyTerm {
  label: string;
  /** Centre of the rectangular distribution. */
  value: Decimal;
  /** Standard uncertainty of the atomic weight. */
  u: Decimal;
  /** count × u: this element's contribution to u(M). */
  contribution: Decimal;
}

export interface MolarMassUncertainty {
  /** Σ count × centre value, g/mol. */
  value: Decimal;
  /** Standard uncertainty u(M), g/mol (coverage factor k = 1). */
  standardUncertainty: Decimal;
  terms: UncertaintyTerm[];
}

/** √3, made on first use (a Decimal square root is not free at start-up). */
let sqrt3: Decimal | null = null;
const SQRT3 = (): Decimal => (sqrt3 ??= new Decimal(3).sqrt());

/**
 * The molar mass with its standard uncertainty from the atomic-weight intervals and uncertainties.
 *
 * @param r - a detailed mass result (from formulaMassDetail).
 * @returns the molar mass (interval elements at the middle of their interval), its standard uncertainty (k = 1) and each element's term; a labelled nuclide counts with no uncertainty.
 * @throws PondusError: NO_STANDARD_WEIGHT for an element without a standard atomic weight (Tc, Pu); BAD_ARGUMENT when `r` is not a detailed mass result.
 * @example
 * molarMassUncertainty(formulaMassDetail('H2O')).standardUncertainty.toSignificantDigits(2).toString() // '0.00026'
 */
export function molarMassUncertainty(r: MassDetail): MolarMassUncertainty {
  const terms: UncertaintyTerm[] = r.contributions.map((c) => {
    const n = toDecimal(c.count);
    if (c.massNumber !== null) return { label: c.label, value: new Decimal(c.atomicWeight), u: new Decimal(0), contribution: new Decimal(0) };
    const std = c.atom.element.standard;
    let value: Decimal;
    let u: Decimal;
    if (std.kind === 'interval') {
      value = new Decimal(std.low).plus(std.high).div(2);
      u = new Decimal(std.high).minus(std.low).div(2).div(SQRT3());
    } else if (std.kind === 'value') {
      value = new Decimal(std.value);
      u = new Decimal(std.uncertainty).div(SQRT3());
    } else {
      throw fail(typedIssue({ code: 'NO_STANDARD_WEIGHT', symbol: c.symbol, name: c.atom.element.name }), r.input);
    }
    return { label: c.label, value, u, contribution: n.times(u) };
  });
  const value = terms.reduce((s, t, i) => s.plus(toDecimal(r.contributions[i].count).times(t.value)), new Decimal(0));
  const standardUncertainty = sqrtDecimal(terms.reduce((s, t) => s.plus(t.contribution.pow(2)), new Decimal(0)));
  return { value, standardUncertainty, terms };
}

/**
 * A value with its standard uncertainty as people write it: the uncertainty to
 * two significant figures, the value to the same decimal place (GUM §7.2.6).
 *
 * @param value - the value.
 * @param u - its standard uncertainty, not negative.
 * @returns the text 'value ± u', rounded half-even.
 * @throws PondusError: BAD_NUMBER for a negative or non-finite uncertainty or value; BAD_ARGUMENT when `value` or `u` is not a Decimal.
 * @example
 * formatWithUncertainty(new Decimal('18.01535'), new Decimal('0.000264')) // '18.01535 ± 0.00026'
 */
export function formatWithUncertainty(value: Decimal, u: Decimal): string {
  if (!value.isFinite() || !u.isFinite() || u.isNegative()) throw fail({ code: 'BAD_NUMBER', message: `a value and its uncertainty are finite, the uncertainty not negative: not ${value.toString()} ± ${u.toString()}` });
  if (u.isZero()) return `${value.toFixed()} ± 0`;
  const u2 = u.toSignificantDigits(2, Decimal.ROUND_HALF_EVEN);
  const decimals = Math.max(0, -(u2.e - 1));
  return `${value.toFixed(decimals, Decimal.ROUND_HALF_EVEN)} ± ${u2.toFixed(decimals)}`;
}
