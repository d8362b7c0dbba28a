/**
 * Reads a set of measurements for the empirical formula: mass percents
 * (`C=40.00 H=6.71 O=53.29`), element masses with units (`Fe=34.97 g O=15.03 g`),
 * one element by difference (`O=rest`), and for masses an optional sample mass
 * (`sample=12.04 g`). Also a JSON object per line (`{"C": "40.00", …}`).
 * Each value keeps the precision it was written with.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';
import { readNumber } from '../sigfig/read-number.js';
import { unitOf } from '../sigfig/units.js';

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
}

const DIFFERENCE = /^(rest|diff|difference|by difference|\*|\?)$/i;

function entriesOf(text: string): [string, string, number][] {
  const t = text.trim();
  if (t.startsWith('{')) {
    let obj: unknown;
    try {
      obj = JSON.parse(t);
    } catch {
      throw fail({ code: 'BAD_MEASUREMENT', message: 'the line starts with { but is not valid JSON' }, text);
    }
    if (obj === null || typeof obj !== 'object' || Array.isArray(obj)) throw fail({ code: 'BAD_MEASUREMENT', message: 'a JSON line must be an object such as {"C": "40.00", "H": "6.71", "O": "rest"}' }, text);
    return Object.entries(obj as Record<string, unknown>).map(([k, v]) => [k, String(v), 1]);
  }
  const out: [string, string, number][] = [];
  const re = /([A-Za-z]+)\s*[=:]\s*([^=,;]*?)(?=\s*(?:[,;]|\s+[A-Za-z]+\s*[=:]|$))/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(t)) !== null) {
    out.push([m[1], m[2].trim(), m.index + 1]);
  }
  if (out.length === 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'no measurements: write them as C=40.00 H=6.71 O=53.29 (percent) or Fe=34.97 g O=15.03 g' }, text);
  return out;
}

/**
 * Parses one measurement set.
 *
 * @example
 * readMeasurements('C=40.00 H=6.71 O=rest').elements[2].byDifference // true
 */
export function readMeasurements(text: string): Measurements {
  const entries = entriesOf(text);
  const elements: ElementMeasurement[] = [];
  let kind: Measurements['kind'] | null = null;
  let sample: Decimal | null = null;
  let sampleHalfUnit: Decimal | null = null;
  for (const [key, raw, column] of entries) {
    if (/^sample$/i.test(key)) {
      const m = /^([-+]?[0-9.eE+-]+)\s*([A-Za-zµ]+)$/.exec(raw);
      if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `the sample mass needs a unit: sample=${raw} g`, column }, text);
      const n = readNumber(m[1], column);
      const u = unitOf(m[2], column);
      if (u.dims[0] !== 1 || u.dims[1] !== 0 || u.dims[2] !== 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'the sample must be a mass', column }, text);
      const f = new Decimal(10).pow(u.exp10);
      sample = n.value.times(f);
      sampleHalfUnit = new Decimal(10).pow(n.lsd! + u.exp10).div(2);
      continue;
    }
    if (!isElementSymbol(key)) throw fail({ code: 'UNKNOWN_ELEMENT', message: `unknown element symbol '${key}'`, column }, text);
    if (elements.some((e) => e.symbol === key)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} is given twice`, column }, text);
    if (DIFFERENCE.test(raw)) {
      elements.push({ symbol: key, value: null, halfUnit: new Decimal(0), byDifference: true });
      continue;
    }
    const m = /^([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)\s*(%|[A-Za-zµ]+)?$/.exec(raw);
    if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}=${raw}' is not a number, a mass or 'rest'`, column }, text);
    const n = readNumber(m[1], column);
    const unit = m[2] && m[2] !== '%' ? unitOf(m[2], column) : null;
    const thisKind = unit ? 'mass' : 'percent';
    if (unit && (unit.dims[0] !== 1 || unit.dims[1] !== 0 || unit.dims[2] !== 0)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key}: give a mass (g, mg) or a percent, not ${m[2]}`, column }, text);
    if (kind && kind !== thisKind) throw fail({ code: 'BAD_MEASUREMENT', message: 'give all values as percents or all as masses, not a mix', column }, text);
    kind = thisKind;
    const f = unit ? new Decimal(10).pow(unit.exp10) : new Decimal(1);
    const value = n.value.times(f);
    if (value.isNegative()) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} is negative`, column }, text);
    if (thisKind === 'percent' && value.gt(100)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} is over 100 %`, column }, text);
    // a bare integer like 40 is read as known to the unit (it is a measurement here, not a count)
    const lsd = n.lsd! + (unit ? unit.exp10 : 0);
    elements.push({ symbol: key, value, halfUnit: new Decimal(10).pow(lsd).div(2), byDifference: false });
  }
  if (elements.length === 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'no elements given' }, text);
  kind ??= 'percent';
  const diffs = elements.filter((e) => e.byDifference);
  if (diffs.length > 1) throw fail({ code: 'BAD_MEASUREMENT', message: 'only one element can be found by difference' }, text);
  if (sample && kind !== 'mass') throw fail({ code: 'BAD_MEASUREMENT', message: 'a sample mass goes with element masses, not percents' }, text);
  const known = elements.filter((e) => !e.byDifference);
  const sum = known.reduce((s, e) => s.plus(e.value!), new Decimal(0));
  const slack = known.reduce((s, e) => s.plus(e.halfUnit), new Decimal(0));
  const total = kind === 'percent' ? new Decimal(100) : sample;
  if (diffs.length === 1) {
    if (!total) throw fail({ code: 'BAD_MEASUREMENT', message: `${diffs[0].symbol} by difference needs the sample mass: add sample=… g` }, text);
    const rest = total.minus(sum);
    if (rest.lte(slack)) throw fail({ code: 'BAD_MEASUREMENT', message: `nothing is left for ${diffs[0].symbol}: the others add up to ${sum.toFixed()}${kind === 'percent' ? ' %' : ' g'}` }, text);
    diffs[0].value = rest;
    diffs[0].halfUnit = slack.plus(kind === 'mass' && sampleHalfUnit ? sampleHalfUnit : 0);
  } else if (kind === 'percent') {
    if (sum.minus(100).abs().gt(slack.plus('1.0'))) {
      throw fail({ code: 'BAD_MEASUREMENT', message: `the percents add up to ${sum.toFixed()} %, not 100 %: is an element missing (give it as X=rest)?` }, text);
    }
  } else if (total && sum.gt(total.plus(slack))) {
    throw fail({ code: 'BAD_MEASUREMENT', message: `the element masses add up to ${sum.toFixed()} g, more than the sample` }, text);
  }
  return { kind, elements, sample, sampleHalfUnit };
}
