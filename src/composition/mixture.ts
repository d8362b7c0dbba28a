/**
 * Composition of a mixture, or of a sample from its measured element masses:
 * components given as `formula=mass` (or amount), percent by component and by
 * element, with significant figures carried from the measurements.
 */
import { Decimal } from '../exact/decimal.js';
import { fail, PondusError, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { formulaMass, type MassOptions } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { exact, type Measured } from '../sigfig/measured.js';
import { add, divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { readNumber } from '../sigfig/read-number.js';
import { displayMeasured } from '../sigfig/round.js';
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
}

const ENTRY = /^\s*([^=\s,;]+)\s*=\s*([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?)\s*([A-Za-zµμ]+)?\s*$/;

/**
 * Splits `NaCl=5.00 g, KCl=3.00 g` (commas, semicolons or spaces between entries).
 *
 * @example
 * splitEntries('C=7.34 g H=1.85 g') // ['C=7.34 g', 'H=1.85 g']
 */
export function splitEntries(input: string): string[] {
  return input
    .split(/[,;]|\s+(?=[^\s=,;]+\s*=)/)
    .map((s) => s.trim())
    .filter((s) => s !== '');
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
  const entries = splitEntries(input);
  if (entries.length === 0) throw fail({ code: 'BAD_AMOUNT', message: 'no components: write them as formula=mass, e.g. NaCl=5.00 g, KCl=3.00 g' }, input);
  const parts: { name: string; mass: Quantity; fractions: { symbol: string; fraction: Decimal }[] }[] = [];
  let offset = 0;
  for (const entry of entries) {
    const at = input.indexOf(entry, offset);
    offset = at + entry.length;
    const column = at + 1;
    const m = ENTRY.exec(entry);
    if (!m) throw fail({ code: 'BAD_AMOUNT', message: `'${entry}' is not formula=amount (e.g. NaCl=5.00 g)`, column }, input);
    const [, formula, number, unitText] = m;
    if (!unitText) throw fail({ code: 'BAD_AMOUNT', message: `give a unit for ${formula}: ${formula}=${number} g`, column }, input);
    let mr;
    try {
      mr = formulaMass(formula, options);
    } catch (e) {
      if (e instanceof PondusError) throw new PondusError(e.issues.map((i) => ({ ...i, column: (i.column ?? 1) + at })), input);
      throw e;
    }
    const unit = unitOf(unitText, column + formula.length + 1);
    const num = readNumber(number, column);
    if (num.value.isNegative()) throw fail({ code: 'BAD_AMOUNT', message: `a mass cannot be negative: ${entry}`, column }, input);
    let mass = quantity(num, unit);
    if (sameDims(unit.dims, [0, 1, 0])) mass = multiply(mass, quantity(reportedMolarMass(mr), unitOf('g/mol')));
    else if (!sameDims(unit.dims, [1, 0, 0])) throw fail({ code: 'BAD_AMOUNT', message: `${formula}: give a mass (g, mg, kg) or an amount (mol, mmol), not ${unitText}`, column }, input);
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
  return { input, total: { value: total.value, lsd: total.lsd }, components, elements };
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
export function mixtureJson(r: MixtureResult) {
  const share = (s: Share) => ({
    name: s.name,
    mass: s.mass.value.toNumber(),
    massDisplay: displayMeasured(s.mass).text,
    massPercent: s.massPercent.value.toNumber(),
    massPercentDisplay: displayMeasured(s.massPercent).text,
  });
  return {
    input: r.input,
    totalMass: r.total.value.toNumber(),
    totalMassDisplay: displayMeasured(r.total).text,
    components: r.components.map(share),
    elements: r.elements.map(share),
  };
}
