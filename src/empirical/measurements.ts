/**
 * Reads a set of measurements for the empirical formula: mass percents
 * (`C=40.00 H=6.71 O=53.29`), element masses with units (`Fe=34.97 g O=15.03 g`),
 * one element by difference (`O=rest`), and for masses an optional sample mass
 * (`sample=12.04 g`). Also a JSON object per line (`{"C": "40.00", …}`).
 * Each value keeps the precision it was written with.
 *
 * A key may be a compound, as geochemists and ceramicists report analyses
 * (`SiO2=42.70 MgO=57.30`): its value is split into its elements by the
 * formula's mass shares (Si is 46.74 % of SiO2), and so is its precision (half
 * a unit of 42.70, times the share). An element reached from several keys
 * (O from every oxide, or O from oxides plus `O=rest`) gets the sum.
 */
import { Decimal } from '../exact/decimal.js';
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';
import { readKeyValues } from '../key-values/read-key-values.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { readNumber } from '../sigfig/read-number.js';
import { MASS, pow10, sameDims, unitFactor, unitOf } from '../sigfig/units.js';

export interface ElementMeasurement {
  symbol: string;
  /** Mass percent, or mass in g; null for the element by difference until resolved. */
  value: Decimal | null;
  /** Half a unit in the last written digit: how far the true value may be from the written one. */
  halfUnit: Decimal;
  byDifference: boolean;
}

export interface Measurements {
  kind: 'percent' | 'mass';
  elements: ElementMeasurement[];
  /** Sample mass in g (masses only). */
  sample: Decimal | null;
  sampleHalfUnit: Decimal | null;
  /** Compound keys and how they were split into elements (empty for element keys only). */
  conversions?: Conversion[];
  /** The element by difference and the value found for it, before anything from compounds was added. */
  difference?: { symbol: string; value: Decimal } | null;
  /** Remarks: the conversions, a sum over 100 %, notes from reading the compound formulas. */
  notes?: Note[];
}

const DIFFERENCE = /^(rest|diff|difference|by difference|\*|\?)$/i;

/** A compound key (an oxide) converted to its elements with the formula's mass shares. */
export interface Conversion {
  /** The key as written: 'SiO2'. */
  key: string;
  /** Its Hill formula. */
  formula: string;
  /** The value given (percent, or g), and as written. */
  value: Decimal;
  text: string;
  /** Each element's part of the value. */
  parts: { symbol: string; value: Decimal; share: Decimal }[];
}

/** What a key of a measurement set stands for: an element, or a compound split into its elements. */
function readKey(key: string, column: number, text: string): { symbol: string; share: Decimal }[] | { formula: string; parts: { symbol: string; share: Decimal }[]; notes: Note[] } {
  if (isElementSymbol(key)) return [{ symbol: key, share: new Decimal(1) }];
  let m;
  try {
    m = formulaMassDetail(key);
  } catch (e) {
    if (/^[A-Z][a-z]?$/.test(key) || /^[A-Za-z][a-z]?$/.test(key)) throw fail({ code: 'UNKNOWN_ELEMENT', message: `unknown element symbol '${key}'`, column, length: key.length }, text);
    const why = e instanceof PondusError ? `: ${e.first.message}` : '';
    throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}' is neither an element symbol nor a formula such as SiO2 or Al2O3${why}`, column, length: key.length, options: e instanceof PondusError ? e.first.options : undefined }, text);
  }
  if (m.charge !== 0) throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}' is an ion: give element or oxide percents (SiO2, Al2O3, Na2O, …)`, column, length: key.length }, text);
  if (m.contributions.some((c) => c.massNumber !== null)) throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}' names an isotope: give element or oxide percents with natural atomic weights`, column, length: key.length }, text);
  const bySymbol = new Map<string, Decimal>();
  for (const c of m.contributions) bySymbol.set(c.symbol, (bySymbol.get(c.symbol) ?? new Decimal(0)).plus(c.mass));
  return { formula: m.formula, parts: [...bySymbol].map(([symbol, mass]) => ({ symbol, share: mass.div(m.molarMass) })), notes: m.notes };
}

/**
 * Parses one measurement set.
 *
 * @param text - one measurement set: element or oxide percents or masses, e.g. 'C=40.00 H=6.71 O=rest' or 'MgO=57.30 SiO2=42.70', with sample=… g for masses.
 * @returns the elements with their values and half-units of the last figure, the kind (percent or mass), the sample mass, the element by difference, the compounds split into elements, and the notes.
 * @throws PondusError: BAD_MEASUREMENT for a set that cannot be read (a piece not key=value, a key twice, a value that is not a number, a mass or 'rest', a negative value or one over 100 %, percents not adding up to 100 %, masses more than the sample, a mix of percents and masses, a compound that is an ion or names an isotope); UNKNOWN_ELEMENT for a key that looks like an element symbol but is not one (with its column); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readMeasurements('C=40.00 H=6.71 O=rest').elements[2].byDifference // true
 * readMeasurements('MgO=57.30 SiO2=42.70').elements.map((e) => e.symbol) // ['Mg', 'O', 'Si']
 */
export function readMeasurements(text: string): Measurements {
  try {
    return readSet(text);
  } catch (e) {
    // number and unit readers know the column but not the line: give them the set's text
    if (e instanceof PondusError && e.input === undefined) throw new PondusError(e.issues, text);
    throw e;
  }
}

function readSet(text: string): Measurements {
  const entries = readKeyValues(text, { colon: true, json: true, example: 'C=40.00 H=6.71 O=53.29 (percent), Fe=34.97 g O=15.03 g, or oxides SiO2=42.70 MgO=57.30' });
  const elements: ElementMeasurement[] = [];
  const conversions: Conversion[] = [];
  const notes: Note[] = [];
  let kind: Measurements['kind'] | null = null;
  let sample: Decimal | null = null;
  let sampleHalfUnit: Decimal | null = null;
  let diffSymbol: string | null = null;
  let diffColumn = 0;
  // what was given, key by key: the sum of the values, and of their half-units
  let sum = new Decimal(0);
  let slack = new Decimal(0);
  const add = (symbol: string, value: Decimal, halfUnit: Decimal) => {
    const e = elements.find((x) => x.symbol === symbol);
    if (e) {
      e.value = e.value!.plus(value);
      e.halfUnit = e.halfUnit.plus(halfUnit);
    } else elements.push({ symbol, value, halfUnit, byDifference: false });
  };
  for (const { key, value: raw, column, valueColumn } of entries) {
    if (/^sample$/i.test(key)) {
      const m = /^([-+]?[0-9.eE+-]+)\s*([A-Za-zµ]+)$/.exec(raw);
      if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `the sample mass needs a unit: sample=${raw} g`, column }, text);
      const n = readNumber(m[1], valueColumn);
      const u = unitOf(m[2], valueColumn);
      if (!sameDims(u.dims, MASS)) throw fail({ code: 'BAD_MEASUREMENT', message: 'the sample must be a mass', column: valueColumn }, text);
      sample = n.value.times(unitFactor(u));
      sampleHalfUnit = pow10(n.lsd! + u.exp10).div(2);
      if (sample.lte(0)) throw fail({ code: 'BAD_MEASUREMENT', message: 'the sample mass must be positive', column: valueColumn }, text);
      continue;
    }
    const read = readKey(key, column, text);
    if (DIFFERENCE.test(raw)) {
      if (!Array.isArray(read)) throw fail({ code: 'BAD_MEASUREMENT', message: `only an element can be found by difference, not the compound ${key}`, column }, text);
      if (diffSymbol) throw fail({ code: 'BAD_MEASUREMENT', message: 'only one element can be found by difference', column }, text);
      diffSymbol = key;
      diffColumn = column;
      continue;
    }
    const m = /^([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)\s*(%|[A-Za-zµ]+)?$/.exec(raw);
    if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}=${raw}' is not a number, a mass or 'rest'`, column: valueColumn }, text);
    const n = readNumber(m[1], valueColumn);
    // an element symbol after a value is an element written without its value ('N=28.85 O'), not a unit
    if (m[2] && m[2] !== '%' && isElementSymbol(m[2]) && !/^(g|mg|kg|ug|µg|ng)$/.test(m[2])) {
      const at = valueColumn + raw.lastIndexOf(m[2]);
      throw fail({ code: 'BAD_MEASUREMENT', message: `'${m[2]}' after ${key}=${m[1]} has no value: each element is written SYMBOL=VALUE`, column: at, length: m[2].length, hint: `for ${m[2]} by difference write ${m[2]}=rest` }, text);
    }
    const unit = m[2] && m[2] !== '%' ? unitOf(m[2], valueColumn) : null;
    const thisKind = unit ? 'mass' : 'percent';
    if (unit && !sameDims(unit.dims, MASS)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key}: give a mass (g, mg) or a percent, not ${m[2]}`, column: valueColumn }, text);
    if (kind && kind !== thisKind) throw fail({ code: 'BAD_MEASUREMENT', message: 'give all values as percents or all as masses, not a mix', column: valueColumn }, text);
    kind = thisKind;
    const value = n.value.times(unitFactor(unit));
    if (value.isNegative()) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} is negative`, column: valueColumn }, text);
    if (thisKind === 'percent' && value.gt(100)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} is over 100 %`, column: valueColumn }, text);
    // a bare integer like 40 is read as known to the unit (it is a measurement here, not a count)
    const lsd = n.lsd! + (unit ? unit.exp10 : 0);
    const halfUnit = pow10(lsd).div(2);
    sum = sum.plus(value);
    slack = slack.plus(halfUnit);
    if (Array.isArray(read)) {
      add(key, value, halfUnit);
    } else {
      conversions.push({ key, formula: read.formula, value, text: m[1], parts: read.parts.map((p) => ({ symbol: p.symbol, value: value.times(p.share), share: p.share })) });
      // the limit of each element's value scales with its share of the compound
      for (const p of read.parts) add(p.symbol, value.times(p.share), halfUnit.times(p.share));
      for (const note of read.notes) notes.push({ ...note, message: `${key}: ${note.message}` });
    }
  }
  if (elements.length === 0 && diffSymbol === null) throw fail({ code: 'BAD_MEASUREMENT', message: 'no elements given' }, text);
  kind ??= 'percent';
  if (sample && kind !== 'mass') throw fail({ code: 'BAD_MEASUREMENT', message: 'a sample mass goes with element masses, not percents' }, text);
  const unitText = kind === 'percent' ? ' %' : ' g';
  const total = kind === 'percent' ? new Decimal(100) : sample;
  let difference: Measurements['difference'] = null;
  if (diffSymbol !== null) {
    if (!total) throw fail({ code: 'BAD_MEASUREMENT', message: `${diffSymbol} by difference needs the sample mass: add sample=… g`, column: diffColumn }, text);
    let rest = total.minus(sum);
    const fromCompounds = elements.some((e) => e.symbol === diffSymbol);
    const restSlack = slack.plus(kind === 'mass' && sampleHalfUnit ? sampleHalfUnit : 0);
    // with oxides, the oxygen by difference may be nothing at all (the oxides sum to 100 %)
    if (fromCompounds && rest.abs().lte(restSlack)) rest = Decimal.max(rest, 0);
    else if (rest.lte(slack)) throw fail({ code: 'BAD_MEASUREMENT', message: `nothing is left for ${diffSymbol}: the others add up to ${sum.toFixed()}${unitText}`, column: diffColumn }, text);
    difference = { symbol: diffSymbol, value: rest };
    const e = elements.find((x) => x.symbol === diffSymbol);
    if (e) {
      e.value = e.value!.plus(rest);
      e.halfUnit = e.halfUnit.plus(restSlack);
      e.byDifference = true;
    } else elements.push({ symbol: diffSymbol, value: rest, halfUnit: restSlack, byDifference: true });
  } else if (kind === 'percent') {
    if (sum.minus(100).abs().gt(slack.plus('1.0'))) {
      throw fail({ code: 'BAD_MEASUREMENT', message: sum.gt(100) ? `the percents add up to ${sum.toFixed()} %, more than 100 %: check the values (one may be mistyped, or counted twice)` : `the percents add up to ${sum.toFixed()} %, not 100 %: is an element missing (give it as X=rest)?` }, text);
    }
    if (sum.gt('100.5')) notes.push({ code: 'SUM_OVER_100', message: `the percents add up to ${sum.toFixed()} %, over 100 %: the formula is fitted to the values as given; check them` });
  } else if (total && sum.gt(total.plus(slack))) {
    throw fail({ code: 'BAD_MEASUREMENT', message: `the element masses add up to ${sum.toFixed()} g, more than the sample` }, text);
  }
  if (conversions.length > 0) {
    const fmt = (d: Decimal) => d.toDecimalPlaces(3).toFixed();
    const each = conversions.map((c) => `${c.key} ${c.text}${unitText} → ${c.parts.map((p) => `${p.symbol} ${fmt(p.value)}`).join(' + ')}`).join('; ');
    notes.unshift({ code: 'COMPOUND_CONVERTED', message: `compound values split into element values by the formulas' mass shares (standard atomic weights): ${each}` });
    if (difference) {
      const own = conversions.flatMap((c) => c.parts).filter((p) => p.symbol === difference!.symbol);
      if (own.length > 0) notes.push({ code: 'DIFFERENCE_ADDED', message: `${difference.symbol} by difference (${fmt(difference.value)}${unitText}) is added to the ${difference.symbol} carried by the compounds (${fmt(own.reduce((a, p) => a.plus(p.value), new Decimal(0)))}${unitText})` });
    }
  }
  return { kind, elements, sample, sampleHalfUnit, conversions, difference, notes };
}
