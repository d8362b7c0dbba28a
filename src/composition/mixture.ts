/**
 * Composition of a mixture, or of a sample from its measured element masses:
 * components given as `formula=mass` (or amount), percent by component and by
 * element, with significant figures carried from the measurements.
 */
import { notesJson } from '../errors/note-json.js';
import { Decimal } from '../exact/decimal.js';
import { fail, PondusError, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { formulaMassDetail, type MassOptions } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import type { Note } from '../errors/issue.js';
import { readKeyValues } from '../key-values/read-key-values.js';
import { exact, type Measured } from '../sigfig/measured.js';
import { add, divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { namedSubstance } from '../formula-parser/names.js';
import { readNumber } from '../sigfig/read-number.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import { sameDims, unitOf } from '../sigfig/units.js';

/** One share of a mixture: a component or an element. */
export interface Share {
  /** The formula of a component as written, its name, or the element symbol. */
  name: string;
  /** Mass in grams (measured). */
  mass: Measured;
  /** Percent by mass (measured). */
  massPercent: Measured;
  /** For a component: its formula in Hill order, or null for a named component (an excipient, a filler). */
  formula?: string | null;
  /** For a component: how its mass was given — measured, or the rest of the total. */
  basis?: 'given' | 'rest';
}

export interface MixtureResult {
  input: string;
  /** Total mass in grams (the sample mass when one is given, else the sum of the components). */
  total: Measured;
  /** Whether the total was given (`total=…` or `sample=…`) or is the sum of the components. */
  totalGiven: boolean;
  components: Share[];
  /** Element shares, from the components with a formula only. */
  elements: Share[];
  /** The mass the components given do not account for (a total given, no `rest`), else null. */
  unaccounted: Share | null;
  /** Remarks (notes from reading the component formulas, each with its formula). */
  notes: Note[];
}

const AMOUNT = /^([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)\s*([A-Za-zµμ]+)?$/;
const TOTAL_KEY = /^(total|sample)$/i;
/** A name, not a formula: three lower-case letters in a row never occur in a formula. */
const NAME_LIKE = /[a-z]{3,}/;

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

interface Part {
  name: string;
  formula: string | null;
  mass: Quantity | null;
  fractions: { symbol: string; fraction: Decimal }[];
  column: number;
}

/**
 * Percent composition of a mixture by component and by element, from measured masses.
 * Components may be formulas or names (`lactose=70.0 mg`: no elements for it); `total=` or
 * `sample=` gives the whole mass, and one component may be `rest` (the total less the others).
 *
 * @param input - the components as KEY=VALUE pairs ('NaCl=5.00 g, KCl=3.00 g'), with `total=` or `sample=` for the whole mass and at most one `=rest`.
 * @param options - the atomic-weight table and reading options for the formulas, as for formulaMass.
 * @returns the total mass, each component's mass and percent, each element's mass and percent (from the components with a formula), any mass not accounted for, and the notes.
 * @throws PondusError: BAD_AMOUNT for a pair that is not component=mass, a missing or non-mass unit, a negative or zero mass, a key given twice, a second rest or a rest without a total, or components heavier than the total; UNKNOWN_UNIT and NUMBER_OUT_OF_RANGE for the amount; the codes of parseFormula for a key that is neither a formula nor a name (UNKNOWN_ELEMENT, UNCLOSED_GROUP, …); BAD_ARGUMENT when `input` is not a string or `options` not an object.
 * @example
 * // OpenStax Chemistry 2e, Example 3.9: 7.34 g C, 1.85 g H, 2.85 g N
 * mixtureComposition('C=7.34 g, H=1.85 g, N=2.85 g').components.map(c => displayMeasured(c.massPercent).text) // ['61.0', '15.4', '23.7']
 * mixtureComposition('C8H9NO2=250.0 mg, filler=rest, total=320.0 mg').components[1].massPercent.value.toFixed(3) // '21.875'
 */
export function mixtureComposition(input: string, options: MassOptions = {}): MixtureResult {
  const entries = readKeyValues(input, { code: 'BAD_AMOUNT', example: 'NaCl=5.00 g, KCl=3.00 g' });
  const parts: Part[] = [];
  const notes: Note[] = [];
  let givenTotal: Quantity | null = null;
  let restAt = -1;
  const readMass = (key: string, value: string, valueColumn: number, molar: ((q: Quantity) => Quantity) | null): Quantity => {
    const m = AMOUNT.exec(value);
    if (!m) throw fail({ code: 'BAD_AMOUNT', message: `'${key}=${value}' is not component=amount (e.g. NaCl=5.00 g, lactose=70.0 mg, filler=rest)`, column: valueColumn }, input);
    const [, number, unitText] = m;
    if (!unitText) throw fail({ code: 'BAD_AMOUNT', message: `give a unit for ${key}: ${key}=${number} g`, column: valueColumn }, input);
    const unit = unitOf(unitText, valueColumn + number.length);
    const num = readNumber(number, valueColumn);
    if (num.value.isNegative()) throw fail({ code: 'BAD_AMOUNT', message: `a mass cannot be negative: ${key}=${value}`, column: valueColumn }, input);
    const mass = quantity(num, unit);
    if (sameDims(unit.dims, [0, 1, 0])) {
      if (!molar) throw fail({ code: 'BAD_AMOUNT', message: `${key}: an amount in ${unitText} needs a formula; give a mass (g, mg, kg)`, column: valueColumn }, input);
      return molar(mass);
    }
    if (!sameDims(unit.dims, [1, 0, 0])) throw fail({ code: 'BAD_AMOUNT', message: `${key}: give a mass (g, mg, kg)${molar ? ' or an amount (mol, mmol)' : ''}, not ${unitText}`, column: valueColumn }, input);
    return mass;
  };
  for (const { key, value, column, valueColumn } of entries) {
    const at = column - 1;
    if (TOTAL_KEY.test(key)) {
      if (givenTotal) throw fail({ code: 'BAD_AMOUNT', message: 'the total (or sample) mass is given twice', column }, input);
      if (/^rest$/i.test(value.trim())) throw fail({ code: 'BAD_AMOUNT', message: 'the total cannot be the rest', column: valueColumn }, input);
      givenTotal = readMass(key, value, valueColumn, null);
      if (givenTotal.value.isZero()) throw fail({ code: 'BAD_AMOUNT', message: 'the total mass must be positive', column: valueColumn }, input);
      continue;
    }
    let mr = null;
    try {
      mr = formulaMassDetail(key, options);
    } catch (e) {
      if (!(e instanceof PondusError)) throw e;
      if (!NAME_LIKE.test(key)) throw new PondusError(e.issues.map((i) => ({ ...i, column: (i.column ?? 1) + at })), input);
    }
    const isRest = /^rest$/i.test(value.trim());
    if (isRest) {
      if (restAt >= 0) throw fail({ code: 'BAD_AMOUNT', message: 'only one component can be the rest', column: valueColumn }, input);
      restAt = parts.length;
    }
    if (mr) {
      for (const n of mr.notes) notes.push({ ...n, message: `${key}: ${n.message}` });
      const molarMass = mr;
      const mass = isRest ? null : readMass(key, value, valueColumn, (q) => multiply(q, quantity(reportedMolarMass(molarMass), unitOf('g/mol'))));
      parts.push({ name: key, formula: mr.formula, mass, fractions: mr.contributions.map((c) => ({ symbol: c.label, fraction: c.mass.div(molarMass.molarMass) })), column });
    } else {
      const mass = isRest ? null : readMass(key, value, valueColumn, null);
      parts.push({ name: key, formula: null, mass, fractions: [], column });
      notes.push({ code: 'NAMED_COMPONENT', message: `${key} is read as a named component, not a formula: its mass counts, its elements do not${namedSubstance(key) ? ` (write ${namedSubstance(key)!.formula} to count them)` : ''}` });
    }
  }
  if (parts.length === 0) throw fail({ code: 'BAD_AMOUNT', message: 'give at least one component besides the total' }, input);
  const given = parts.filter((p) => p.mass !== null).map((p) => p.mass!);
  let sum: Quantity | null = given.length ? given[0] : null;
  for (const q of given.slice(1)) sum = add(sum!, q);
  if (restAt >= 0) {
    if (!givenTotal) throw fail({ code: 'BAD_AMOUNT', message: `${parts[restAt].name}=rest needs the total: add total=… (or sample=…), the mass of the whole`, column: parts[restAt].column }, input);
    const rest = sum ? subtract(givenTotal, sum) : givenTotal;
    if (rest.value.isNegative()) throw fail({ code: 'BAD_AMOUNT', message: `the components given (${displayMeasured(sum!).text} g) weigh more than the total (${displayMeasured(givenTotal).text} g): the rest would be negative` }, input);
    parts[restAt].mass = rest;
    notes.push({ code: 'BY_DIFFERENCE', message: `${parts[restAt].name} is the rest: the total less the other components, ${displayMeasured(rest).text} g` });
    sum = givenTotal;
  }
  const total = givenTotal ?? sum!;
  if (total.value.isZero()) throw fail({ code: 'BAD_AMOUNT', message: 'the masses add up to zero' }, input);
  let unaccounted: Share | null = null;
  if (givenTotal && restAt < 0) {
    const left = subtract(givenTotal, sum!);
    // the sum may exceed the total within the last digit of the weighings
    const tolerance = left.lsd === null ? new Decimal(0) : new Decimal(10).pow(left.lsd);
    if (left.value.lt(tolerance.neg())) throw fail({ code: 'BAD_AMOUNT', message: `the components (${displayMeasured(sum!).text} g) weigh more than the total (${displayMeasured(givenTotal).text} g)` }, input);
    if (left.value.gt(0)) {
      unaccounted = { name: 'unaccounted', mass: { value: left.value, lsd: left.lsd }, massPercent: pct(left, total) };
      notes.push({ code: 'UNACCOUNTED', message: `the components account for ${displayMeasured(sum!).text} g of the ${displayMeasured(givenTotal).text} g total; ${displayMeasured(left).text} g is not named (give a component =rest to name it)` });
    }
  }

  const components: Share[] = parts.map((p) => ({ name: p.name, formula: p.formula, basis: parts.indexOf(p) === restAt ? 'rest' : 'given', mass: { value: p.mass!.value, lsd: p.mass!.lsd }, massPercent: pct(p.mass!, total) }));
  const byElement = new Map<string, Quantity>();
  for (const p of parts) {
    for (const f of p.fractions) {
      // the fraction comes from tabulated atomic weights, far more precise than a weighing: it does not limit
      const q = multiply(p.mass!, quantity(exact(f.fraction), null));
      const prev = byElement.get(f.symbol);
      byElement.set(f.symbol, prev ? add(prev, q) : q);
    }
  }
  const elements: Share[] = [...byElement].map(([name, q]) => ({ name, mass: { value: q.value, lsd: q.lsd }, massPercent: pct(q, total) }));
  const named = parts.filter((p) => p.formula === null);
  if (named.length && byElement.size) notes.push({ code: 'ELEMENTS_OF_FORMULAS', message: `elements are counted for the components with a formula only; ${named.map((p) => p.name).join(', ')} ${named.length === 1 ? 'has' : 'have'} none, so the element percents do not add up to 100` });
  return { input, total: { value: total.value, lsd: total.lsd }, totalGiven: givenTotal !== null, components, elements, unaccounted, notes };
}

/** Non-throwing {@link mixtureComposition}. */
export function safeMixtureComposition(input: string, options: MassOptions = {}): SafeResult<MixtureResult> {
  return toSafe(() => mixtureComposition(input, options));
}

/**
 * The JSON form of a mixture result: full values plus the reported figures.
 *
 * @param r - a mixture result (from mixtureComposition).
 * @param rounding - how the displayed figures are rounded: 'half-even' (default) or 'half-up'.
 * @returns the plain object: every mass and percent as a number at full precision beside its reported text.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a mixture result or `rounding` is not a rounding mode.
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
    totalGiven: r.totalGiven,
    components: r.components.map((c) => ({ ...share(c), formula: c.formula ?? null, basis: c.basis ?? 'given' })),
    elements: r.elements.map(share),
    unaccounted: r.unaccounted ? share(r.unaccounted) : null,
    notes: notesJson(r.notes),
  };
}
