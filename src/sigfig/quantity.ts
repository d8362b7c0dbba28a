/**
 * Quantities: measured numbers with a dimension, carried in base units
 * (g, mol, L), and for uncertainty work their sensitivities to each input
 * (first-order propagation, GUM §5.1; inputs taken as uncorrelated, and the
 * same input used twice handled exactly through its sensitivity).
 */
import { Decimal } from '../exact/decimal.js';
import { sqrtDecimal } from '../exact/sqrt.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { dividedBy, minus as minusM, plus as plusM, sigFigsOf, times as timesM, withSigFigs, type Measured } from './measured.js';
import { baseUnitText, dimsName, sameDims, toBaseUnit, type Dims, type Unit } from './units.js';

export interface Quantity extends Measured {
  dims: Dims;
  /** The unit to show it in, when one is preferred (the unit it was entered in). */
  unit: Unit | null;
  /** ∂value/∂input for each input with a stated uncertainty (empty when none). */
  grad: Map<number, Decimal>;
}

/**
 * A quantity from a measured number and an optional unit.
 *
 * @param m - a measured number, in the unit given.
 * @param unit - its unit (from unitOf), or null for a pure number.
 * @returns the quantity in the base unit of its dimension, with its precision moved by the unit's power of ten and no sensitivities.
 * @throws PondusError: BAD_ARGUMENT when `m` is not a Measured or `unit` is neither a unit nor null.
 * @example
 * displayQuantity(quantity(readNumber('250.'), unitOf('mg')), 'g').text // '0.250 g'
 */
export function quantity(m: Measured, unit: Unit | null): Quantity {
  // a unit is a power of ten: the value and its last digit move, the significant figures stay
  const sigFigs = m.lsd !== null ? m.sigFigs : undefined;
  if (!unit) return made(m.value, m.lsd, sigFigs, [0, 0, 0], null, new Map());
  return made(toBaseUnit(m.value, unit), m.lsd === null ? null : m.lsd + unit.exp10, sigFigs, unit.dims, unit, new Map());
}

/**
 * A quantity from its fields, `sigFigs` left out when undefined. Written as object literals, not
 * as a spread with more fields after it, which V8 builds slowly (about a microsecond each).
 */
function made(value: Decimal, lsd: number | null, sigFigs: number | undefined, dims: Dims, unit: Unit | null, grad: Map<number, Decimal>): Quantity {
  return sigFigs === undefined ? { value, lsd, dims, unit, grad } : { value, lsd, sigFigs, dims, unit, grad };
}

/**
 * A copy of a quantity with a sensitivities map of its own (a caller may add to it).
 *
 * @example
 * copyQuantity(measure('2.50 g')).grad.size // 0
 */
export function copyQuantity(q: Quantity): Quantity {
  return made(q.value, q.lsd, q.sigFigs, q.dims, q.unit, new Map(q.grad));
}

function mapGrad(a: Map<number, Decimal>, f: (g: Decimal) => Decimal): Map<number, Decimal> {
  const out = new Map<number, Decimal>();
  for (const [k, g] of a) out.set(k, f(g));
  return out;
}

function combine(a: Map<number, Decimal>, b: Map<number, Decimal>, fa: (g: Decimal) => Decimal, fb: (g: Decimal) => Decimal): Map<number, Decimal> {
  if (a.size === 0 && b.size === 0) return new Map();
  const out = mapGrad(a, fa);
  for (const [k, g] of b) out.set(k, (out.get(k) ?? new Decimal(0)).plus(fb(g)));
  return out;
}

function describe(q: Quantity): string {
  return dimsName(q.dims);
}

/**
 * Sum of two quantities of the same dimension; fewest decimal places.
 *
 * @param a - a quantity.
 * @param b - a quantity of the same dimension.
 * @param column - the 1-based column to give an error, in a longer input.
 * @returns the sum, to the coarser last decimal place, in the unit of `a` (else of `b`), with both inputs' sensitivities.
 * @throws PondusError: INCOMPATIBLE_UNITS when the dimensions differ; BAD_ARGUMENT when `a` or `b` is not a Quantity or `column` is given and not a number.
 * @example
 * displayQuantity(add(quantity(readNumber('8.80'), unitOf('g')), quantity(readNumber('2.1'), unitOf('g')))).text // '10.9 g'
 */
export function add(a: Quantity, b: Quantity, column?: number): Quantity {
  if (!sameDims(a.dims, b.dims)) {
    throw fail(typedIssue({ code: 'INCOMPATIBLE_UNITS', operation: 'add', first: describe(a), firstDimension: baseUnitText(a.dims) || null, second: describe(b), secondDimension: baseUnitText(b.dims) || null, column }));
  }
  const m = plusM(a, b);
  return made(m.value, m.lsd, m.sigFigs, a.dims, a.unit ?? b.unit, combine(a.grad, b.grad, (g) => g, (g) => g));
}

/**
 * Difference of two quantities of the same dimension.
 *
 * @param a - the quantity to subtract from.
 * @param b - the quantity to subtract, of the same dimension.
 * @param column - the 1-based column to give an error, in a longer input.
 * @returns the difference, to the coarser last decimal place, in the unit of `a` (else of `b`), with both inputs' sensitivities.
 * @throws PondusError: INCOMPATIBLE_UNITS when the dimensions differ; BAD_ARGUMENT when `a` or `b` is not a Quantity or `column` is given and not a number.
 * @example
 * displayQuantity(subtract(quantity(readNumber('10.0'), unitOf('mL')), quantity(readNumber('2.25'), unitOf('mL')))).text // '7.8 mL'
 */
export function subtract(a: Quantity, b: Quantity, column?: number): Quantity {
  if (!sameDims(a.dims, b.dims)) {
    throw fail(typedIssue({ code: 'INCOMPATIBLE_UNITS', operation: 'subtract', first: describe(a), firstDimension: baseUnitText(a.dims) || null, second: describe(b), secondDimension: baseUnitText(b.dims) || null, column }));
  }
  const m = minusM(a, b);
  return made(m.value, m.lsd, m.sigFigs, a.dims, a.unit ?? b.unit, combine(a.grad, b.grad, (g) => g, (g) => g.neg()));
}

const addDims = (a: Dims, b: Dims, s: number): Dims => [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];
const isNone = (d: Dims) => d[0] === 0 && d[1] === 0 && d[2] === 0;

/** The unit a product keeps: the other factor's when one factor is a pure number. */
function productUnit(a: Quantity, b: Quantity): Unit | null {
  if (isNone(b.dims) && !b.unit) return a.unit;
  if (isNone(a.dims) && !a.unit) return b.unit;
  return null;
}

/**
 * Product; fewest significant figures, exact numbers never limit.
 *
 * @param a - a quantity.
 * @param b - a quantity.
 * @returns the product, to the fewer significant figures of the two (exact numbers never limit), with the dimensions added.
 * @throws PondusError: BAD_ARGUMENT when `a` or `b` is not a Quantity.
 * @example
 * displayQuantity(multiply(quantity(readNumber('0.100'), unitOf('M')), quantity(readNumber('250.0'), unitOf('mL'))), 'mol').text // '0.0250 mol'
 */
export function multiply(a: Quantity, b: Quantity): Quantity {
  const m = timesM(a, b);
  const grad = a.grad.size === 0 && b.grad.size === 0 ? new Map<number, Decimal>() : combine(a.grad, b.grad, (g) => g.times(b.value), (g) => g.times(a.value));
  return made(m.value, m.lsd, m.sigFigs, addDims(a.dims, b.dims, 1), productUnit(a, b), grad);
}

/**
 * Quotient; fewest significant figures. Division by zero is an error.
 *
 * @param a - the dividend.
 * @param b - the divisor.
 * @param column - the 1-based column to give an error, in a longer input.
 * @returns the quotient, to the fewer significant figures of the two, with the dimensions subtracted.
 * @throws PondusError: DIVISION_BY_ZERO when `b` is zero; BAD_ARGUMENT when `a` or `b` is not a Quantity or `column` is given and not a number.
 * @example
 * displayQuantity(divide(quantity(readNumber('5.00'), unitOf('g')), quantity(readNumber('58.44'), unitOf('g/mol')))).text // '0.0856 mol'
 */
export function divide(a: Quantity, b: Quantity, column?: number): Quantity {
  if (b.value.isZero()) throw fail({ code: 'DIVISION_BY_ZERO', message: 'division by zero', column });
  const m = dividedBy(a, b);
  const unit = isNone(b.dims) && !b.unit ? a.unit : null;
  // the sensitivities only when there are inputs with an uncertainty
  const grad = a.grad.size === 0 && b.grad.size === 0 ? new Map<number, Decimal>() : combine(a.grad, b.grad, (g) => g.div(b.value), (g) => g.times(a.value).div(b.value.times(b.value)).neg());
  return made(m.value, m.lsd, m.sigFigs, addDims(a.dims, b.dims, -1), unit, grad);
}

/**
 * Negation.
 *
 * @param a - a quantity.
 * @returns the quantity with its sign and its sensitivities reversed; its precision and unit unchanged.
 * @throws PondusError: BAD_ARGUMENT when `a` is not a Quantity.
 * @example
 * displayQuantity(negate(quantity(readNumber('2.50'), unitOf('g')))).text // '-2.50 g'
 */
export function negate(a: Quantity): Quantity {
  return made(a.value.neg(), a.lsd, a.sigFigs, a.dims, a.unit, a.grad.size === 0 ? new Map<number, Decimal>() : mapGrad(a.grad, (g) => g.neg()));
}

/**
 * Whole-number power: the result keeps the base's significant figures.
 *
 * @param a - the base.
 * @param n - the exponent, a whole number.
 * @param column - the 1-based column to give an error, in a longer input.
 * @returns the power, with the base's significant figures and its dimensions times `n`, and no preferred unit.
 * @throws PondusError: DIVISION_BY_ZERO for zero to a negative power; NUMBER_OUT_OF_RANGE when the result is not finite or beyond 10^±10000; BAD_ARGUMENT when `a` is not a Quantity or `n` not a number.
 * @example
 * displayQuantity(power(quantity(readNumber('1.50'), null), 2)).text // '2.25'
 */
export function power(a: Quantity, n: number, column?: number): Quantity {
  if (!Number.isInteger(n) || Math.abs(n) > 1000) throw fail({ code: 'BAD_NUMBER', message: `a quantity is raised to a whole-number power (up to ±1000), not ${n}`, column });
  if (n < 0 && a.value.isZero()) throw fail({ code: 'DIVISION_BY_ZERO', message: 'zero to a negative power', column });
  const value = a.value.pow(n);
  if (!value.isFinite() || Math.abs(value.e) > 10_000) throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: value.toSignificantDigits(3).toExponential(), exponentLimit: 10_000, reading: 'result', what: null, column }));
  const m: Measured = a.lsd === null ? { value, lsd: null } : value.isZero() ? { value, lsd: a.lsd } : withSigFigs(value, sigFigsOf(a));
  const grad = a.grad.size === 0 ? new Map<number, Decimal>() : mapGrad(a.grad, (g) => g.times(new Decimal(n).times(a.value.pow(n - 1))));
  return made(m.value, m.lsd, m.sigFigs, [a.dims[0] * n, a.dims[1] * n, a.dims[2] * n], null, grad);
}

/**
 * Standard uncertainty of a quantity from its sensitivities and the inputs' standard uncertainties.
 *
 * @param q - a quantity with its sensitivities (`grad`).
 * @param inputs - the standard uncertainty of each input, keyed as in `grad`.
 * @returns the combined standard uncertainty, √Σ(∂q/∂xᵢ · u(xᵢ))², first order, inputs independent; 0 when none applies.
 * @throws PondusError: BAD_ARGUMENT when `q` is not a Quantity or `inputs` not a Map.
 * @example
 * const q = { ...quantity(readNumber('8.80'), unitOf('g')), grad: new Map([[0, new Decimal(2)]]) }
 * standardUncertainty(q, new Map([[0, new Decimal('0.05')]])).toString() // '0.1'
 */
export function standardUncertainty(q: Quantity, inputs: Map<number, Decimal>): Decimal {
  let s = new Decimal(0);
  for (const [k, g] of q.grad) {
    const u = inputs.get(k);
    if (u) {
      const x = g.times(u);
      s = s.plus(x.times(x));
    }
  }
  return sqrtDecimal(s);
}
