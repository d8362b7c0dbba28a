/**
 * Composition of a mixture, or of a sample from its measured element masses:
 * components given as `formula=mass` (or amount), percent by component and by
 * element, with significant figures carried from the measurements.
 */
import { Decimal } from '../exact/decimal.js';
import { fail, PondusError, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { formulaMassDetail, type MassOptions } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import type { Note } from '../errors/issue.js';
import { readKeyValues } from '../key-values/read-key-values.js';
import { exact, type Measured } from '../sigfig/measured.js';
import { add, divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { readNumber } from '../sigfig/read-number.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import { sameDims, unitOf } from '../sigfig/units.js';

/** One share of a mixture: a component or an element. */
export interface Share {
  /** The formula of a component, or the element symbol. */
  name: string;
  /** Mass in grams (measured). */
  mass: Measured;
  /** Percent by mass (measured). */
  massPercent: Measured;
}

export interface MixtureResult {
  input: string;
  /** Total mass in grams. */
  total: Measured;
  components: Share[];
  elements: Share[];
  /** Remarks (notes from reading the component formulas, each with its formula). */
  notes: Note[];
}

const AMOUNT = /^([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)\s*([A-Za-zµμ]+)?$/;

/**
 * Splits `NaCl=5.00 g, KCl=3.00 g` (commas, semicolons or spaces between entries).
 *
 * @example
 * splitEntries('C=7.34 g H=1.85 g') // ['C=7.34 g', 'H=1.85 g']
 */
export function splitEntries(input: string): string[] {
  return readKeyValues(input, { code: 'BAD_AMOUNT', example: 'NaCl=5.00 g, KCl=3.00 g' }).map((e) => `${e.key}=${e.value}`);
}

const pct = (part: Quantity, total: Quantity): Measured => {
  const r = multiply(divide(part, total), quantity(exact(100), null));
  return { value: r.value, lsd: r.lsd };
};

/**
 * Percent composition of a mixture by component and by element, from measured masses.
 *
 * @example
 * // OpenStax Chemistry 2e, Example 3.9: 7.34 g C, 1.85 g H, 2.85 g N
 * mixtureComposition('C=7.34 g, H=1.85 g, N=2.85 g').components.map(c => displayMeasured(c.massPercent).text) // ['61.0', '15.4', '23.7']
 */
export function mixtureComposition(input: string, options: MassOptions = {}): MixtureResult {
  const entries = readKeyValues(input, { code: 'BAD_AMOUNT', example: 'NaCl=5.00 g, KCl=3.00 g' });
  const parts: { name: string; mass: Quantity; fractions: { symbol: string; fraction: Decimal }[] }[] = [];
  const notes: Note[] = [];
  for (const { key: formula, value, column, valueColumn } of entries) {
    const at = column - 1;
    const m = AMOUNT.exec(value);
    if (!m) throw fail({ code: 'BAD_AMOUNT', message: `'${formula}=${value}' is not formula=amount (e.g. NaCl=5.00 g)`, column: valueColumn }, input);
    const [, number, unitText] = m;
    if (!unitText) throw fail({ code: 'BAD_AMOUNT', message: `give a unit for ${formula}: ${formula}=${number} g`, column: valueColumn }, input);
    let mr;
    try {
      mr = formulaMassDetail(formula, options);
    } catch (e) {
      if (e instanceof PondusError) throw new PondusError(e.issues.map((i) => ({ ...i, column: (i.column ?? 1) + at })), input);
      throw e;
    }
    for (const n of mr.notes) notes.push({ ...n, message: `${formula}: ${n.message}` });
    const unit = unitOf(unitText, valueColumn + number.length);
    const num = readNumber(number, valueColumn);
    if (num.value.isNegative()) throw fail({ code: 'BAD_AMOUNT', message: `a mass cannot be negative: ${formula}=${value}`, column: valueColumn }, input);
    let mass = quantity(num, unit);
    if (sameDims(unit.dims, [0, 1, 0])) mass = multiply(mass, quantity(reportedMolarMass(mr), unitOf('g/mol')));
    else if (!sameDims(unit.dims, [1, 0, 0])) throw fail({ code: 'BAD_AMOUNT', message: `${formula}: give a mass (g, mg, kg) or an amount (mol, mmol), not ${unitText}`, column: valueColumn }, input);
    const fractions = mr.contributions.map((c) => ({ symbol: c.label, fraction: c.mass.div(mr.molarMass) }));
    parts.push({ name: formula, mass, fractions });
  }
  let total = parts[0].mass;
  for (const p of parts.slice(1)) total = add(total, p.mass);
  if (total.value.isZero()) throw fail({ code: 'BAD_AMOUNT', message: 'the masses add up to zero' }, input);

  const components: Share[] = parts.map((p) => ({ name: p.name, mass: { value: p.mass.value, lsd: p.mass.lsd }, massPercent: pct(p.mass, total) }));
  const byElement = new Map<string, Quantity>();
  for (const p of parts) {
    for (const f of p.fractions) {
      // the fraction comes from tabulated atomic weights, far more precise than a weighing: it does not limit
      const q = multiply(p.mass, quantity(exact(f.fraction), null));
      const prev = byElement.get(f.symbol);
      byElement.set(f.symbol, prev ? add(prev, q) : q);
    }
  }
  const elements: Share[] = [...byElement].map(([name, q]) => ({ name, mass: { value: q.value, lsd: q.lsd }, massPercent: pct(q, total) }));
  return { input, total: { value: total.value, lsd: total.lsd }, components, elements, notes };
}

/** Non-throwing {@link mixtureComposition}. */
export function safeMixtureComposition(input: string, options: MassOptions = {}): SafeResult<MixtureResult> {
  return toSafe(() => mixtureComposition(input, options));
}

/**
 * The JSON form of a mixture result: full values plus the reported figures.
 *
 * @example
 * mixtureJson(mixtureComposition('NaCl=5.00 g, KCl=3.00 g')).components[0].massPercentDisplay // '62.5'
 */
export function mixtureJson(r: MixtureResult, rounding: RoundingMode = 'half-even') {
  const share = (s: Share) => ({
    name: s.name,
    mass: s.mass.value.toNumber(),
    massDisplay: displayMeasured(s.mass, rounding).text,
    massPercent: s.massPercent.value.toNumber(),
    massPercentDisplay: displayMeasured(s.massPercent, rounding).text,
  });
  return {
    input: r.input,
    totalMass: r.total.value.toNumber(),
    totalMassDisplay: displayMeasured(r.total, rounding).text,
    components: r.components.map(share),
    elements: r.elements.map(share),
    notes: r.notes.map((n) => n.message),
  };
}
