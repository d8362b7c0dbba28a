/**
 * Quantities: measured numbers with a dimension, carried in base units
 * (g, mol, L), and for uncertainty work their sensitivities to each input
 * (first-order propagation, GUM §5.1; inputs taken as uncorrelated, and the
 * same input used twice handled exactly through its sensitivity).
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { dividedBy, minus as minusM, plus as plusM, sigFigsOf, times as timesM, withSigFigs, type Measured } from './measured.js';
import { baseUnitText, dimsName, sameDims, unitFactor, type Dims, type Unit } from './units.js';

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
 * @example
 * displayQuantity(quantity(readNumber('250.'), unitOf('mg')), 'g').text // '0.250 g'
 */
export function quantity(m: Measured, unit: Unit | null): Quantity {
  // a unit is a power of ten: the value and its last digit move, the significant figures stay
  const figures = m.sigFigs !== undefined && m.lsd !== null ? { sigFigs: m.sigFigs } : {};
  if (!unit) return { value: m.value, lsd: m.lsd, ...figures, dims: [0, 0, 0], unit: null, grad: new Map() };
  const f = unitFactor(unit);
  return { value: m.value.times(f), lsd: m.lsd === null ? null : m.lsd + unit.exp10, ...figures, dims: unit.dims, unit, grad: new Map() };
}

function mapGrad(a: Map<number, Decimal>, f: (g: Decimal) => Decimal): Map<number, Decimal> {
  const out = new Map<number, Decimal>();
  for (const [k, g] of a) out.set(k, f(g));
  return out;
}

function combine(a: Map<number, Decimal>, b: Map<number, Decimal>, fa: (g: Decimal) => Decimal, fb: (g: Decimal) => Decimal): Map<number, Decimal> {
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
 * @example
 * displayQuantity(add(quantity(readNumber('8.80'), unitOf('g')), quantity(readNumber('2.1'), unitOf('g')))).text // '10.9 g'
 */
export function add(a: Quantity, b: Quantity, column?: number): Quantity {
  if (!sameDims(a.dims, b.dims)) {
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `cannot add ${describe(a)} (${baseUnitText(a.dims) || 'no unit'}) and ${describe(b)} (${baseUnitText(b.dims) || 'no unit'})`, column });
  }
  const m = plusM(a, b);
  return { ...m, dims: a.dims, unit: a.unit ?? b.unit, grad: combine(a.grad, b.grad, (g) => g, (g) => g) };
}

/** Difference of two quantities of the same dimension. */
export function subtract(a: Quantity, b: Quantity, column?: number): Quantity {
  if (!sameDims(a.dims, b.dims)) {
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `cannot subtract ${describe(b)} (${baseUnitText(b.dims) || 'no unit'}) from ${describe(a)} (${baseUnitText(a.dims) || 'no unit'})`, column });
  }
  const m = minusM(a, b);
  return { ...m, dims: a.dims, unit: a.unit ?? b.unit, grad: combine(a.grad, b.grad, (g) => g, (g) => g.neg()) };
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
 * @example
 * displayQuantity(multiply(quantity(readNumber('0.100'), unitOf('M')), quantity(readNumber('250.0'), unitOf('mL'))), 'mol').text // '0.0250 mol'
 */
export function multiply(a: Quantity, b: Quantity): Quantity {
  const m = timesM(a, b);
  return { ...m, dims: addDims(a.dims, b.dims, 1), unit: productUnit(a, b), grad: combine(a.grad, b.grad, (g) => g.times(b.value), (g) => g.times(a.value)) };
}

/**
 * Quotient; fewest significant figures. Division by zero is an error.
 *
 * @example
 * displayQuantity(divide(quantity(readNumber('5.00'), unitOf('g')), quantity(readNumber('58.44'), unitOf('g/mol')))).text // '0.0856 mol'
 */
export function divide(a: Quantity, b: Quantity, column?: number): Quantity {
  if (b.value.isZero()) throw fail({ code: 'DIVISION_BY_ZERO', message: 'division by zero', column });
  const m = dividedBy(a, b);
  const unit = isNone(b.dims) && !b.unit ? a.unit : null;
  // the sensitivities only when there are inputs with an uncertainty
  const grad = a.grad.size === 0 && b.grad.size === 0 ? new Map<number, Decimal>() : combine(a.grad, b.grad, (g) => g.div(b.value), (g) => g.times(a.value).div(b.value.times(b.value)).neg());
  return { ...m, dims: addDims(a.dims, b.dims, -1), unit, grad };
}

/** Negation. */
export function negate(a: Quantity): Quantity {
  return { ...a, value: a.value.neg(), grad: mapGrad(a.grad, (g) => g.neg()) };
}

/**
 * Whole-number power: the result keeps the base's significant figures.
 *
 * @example
 * displayQuantity(power(quantity(readNumber('1.50'), null), 2)).text // '2.25'
 */
export function power(a: Quantity, n: number, column?: number): Quantity {
  if (n < 0 && a.value.isZero()) throw fail({ code: 'DIVISION_BY_ZERO', message: 'zero to a negative power', column });
  const value = a.value.pow(n);
  if (!value.isFinite() || Math.abs(value.e) > 10_000) throw fail({ code: 'NUMBER_OUT_OF_RANGE', message: 'the result is out of range', column });
  const m: Measured = a.lsd === null ? { value, lsd: null } : value.isZero() ? { value, lsd: a.lsd } : withSigFigs(value, sigFigsOf(a));
  const grad = a.grad.size === 0 ? new Map<number, Decimal>() : mapGrad(a.grad, (g) => g.times(new Decimal(n).times(a.value.pow(n - 1))));
  return { ...m, dims: [a.dims[0] * n, a.dims[1] * n, a.dims[2] * n], unit: null, grad };
}

/**
 * Standard uncertainty of a quantity from its sensitivities and the inputs' standard uncertainties.
 *
 * @example
 * const q = { ...quantity(readNumber('8.80'), unitOf('g')), grad: new Map([[0, new Decimal(2)]]) }
 * standardUncertainty(q, new Map([[0, new Decimal('0.05')]])).toString() // '0.1'
 */
export function standardUncertainty(q: Quantity, inputs: Map<number, Decimal>): Decimal {
  let s = new Decimal(0);
  for (const [k, g] of q.grad) {
    const u = inputs.get(k);
    if (u) s = s.plus(g.times(u).pow(2));
  }
  return s.sqrt();
}
