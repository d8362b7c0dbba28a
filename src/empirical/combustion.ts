/**
 * Combustion analysis: from the mass of a sample and the masses of CO2 and H2O
 * collected (and optionally N2, SO2, or a silver halide precipitate), the mass
 * and percent of each element — oxygen by difference — with significant
 * figures, and the empirical formula.
 */
import { notesJson } from '../errors/note-json.js';
import type { Note } from '../errors/issue.js';
import { LIBRARY_NAMING, messageFor, type OptionNaming } from '../errors/message.js';
import { fail, PondusError } from '../errors/pondus-error.js';

/**
 * The library's naming, but the tolerance, which belongs to the search from percentages: the note
 * names that search and its option (and the command line its command and flag).
 */
const COMBUSTION_NAMING: OptionNaming = {
  option: (name, value) => (name === 'tolerance' ? 'tolerance (search the percentages above with `empirical` and `tolerance`)' : LIBRARY_NAMING.option(name, value)),
  command: LIBRARY_NAMING.command,
};
import { Decimal } from '../exact/decimal.js';
import { MASS, measureAs } from '../calc/measure.js';
import { conversionFactor } from '../preparation/conversion-factor.js';
import { exact } from '../sigfig/measured.js';
import { add, divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { searchFormula, type FormulaFit } from './formula-search.js';
import type { Measurements } from './measurements.js';
import { checkInputLength } from '../errors/input-length.js';
import { PRODUCTS } from './search-defaults.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import type { RoundingMode } from '../sigfig/round.js';

export { PRODUCTS };

export interface CombustionOptions {
  /** Sample mass: '0.1000 g'. */
  sample: string;
  /** How the reported figures are rounded (default half to even). */
  rounding?: RoundingMode;
  /** Masses collected, by product: { co2: '0.2000 g', h2o: '0.0819 g' }. */
  collected: Partial<Record<keyof typeof PRODUCTS, string>>;
}

/** Combustion analysis with the measured quantities, for callers inside the library. */
export interface CombustionDetail {
  /** The sample mass as given. */
  input: string;
  sample: Quantity;
  /** Mass and percent of each element, in the order C, H, N, S, halogens, O. */
  elements: { symbol: string; mass: Quantity; percent: Quantity; byDifference: boolean }[];
  /** The empirical formula, or null when none fits within the precision of the data (a note says so). */
  empirical: string | null;
  /** The empirical formula in Hill order. */
  hill: string | null;
  fit: FormulaFit | null;
  alternatives: FormulaFit[];
  notes: Note[];
}

/** One element of a combustion analysis, as plain data. */
export interface CombustionElement {
  symbol: string;
  /** Its mass in g: the unrounded number, the exact decimal, the reported figure and the text with its unit. */
  mass: number;
  massExact: string;
  massFigure: string;
  massDisplay: string;
  /** Its percent of the sample: the unrounded number, the exact decimal and the reported figure. */
  percent: number;
  percentExact: string;
  percentFigure: string;
  /** Oxygen found as the sample less the elements collected. */
  byDifference: boolean;
}

/** A combustion analysis: plain data (numbers as numbers, exact decimals and reported figures as text beside them). */
export interface CombustionResult {
  /** The sample mass as given. */
  input: string;
  /** The sample mass as reported ('1.000 g'). */
  sample: string;
  /** The sample mass in g. */
  sampleMass: number;
  /** Mass and percent of each element, in the order C, H, N, S, halogens, O. */
  elements: CombustionElement[];
  /** The empirical formula, or null when none fits within the precision of the data (a note says so). */
  empirical: string | null;
  /** The empirical formula in Hill order. */
  hill: string | null;
  fit: FormulaFit | null;
  alternatives: FormulaFit[];
  /** The rounding the reported figures follow. */
  rounding: RoundingMode;
  notes: Note[];
}

/**
 * Element masses, percents and the empirical formula from a combustion analysis, as plain data.
 *
 * @param options - the sample mass, the masses collected of each combustion product ({ co2: '1.499 g', h2o: '0.4091 g' }, also n2, so2, agcl, …), and rounding.
 * @returns each element's mass and percent (results of the measurements), the empirical formula with its fit and alternatives (null when none fits, with a note), and the notes.
 * @throws PondusError: INPUT_TOO_LONG for a mass text past its length limit; BAD_MEASUREMENT for a sample mass that is not positive, a negative mass collected, no masses collected, or elements that weigh more than the sample; BAD_OPTION for masses collected not given as an object, an unknown product, or a mass not written as text; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); SEARCH_TOO_LARGE for a formula search beyond the work limit; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * combustion({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } }).empirical // 'C3H4O3'
 * combustion({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } }).elements[0].percentFigure // '40.91'
 */
export function combustion(options: CombustionOptions): CombustionResult {
  const rounding = options.rounding ?? 'half-even';
  const d = combustionDetail(options);
  const sample = displayQuantity(d.sample, 'g', rounding);
  return {
    input: d.input,
    sample: sample.text,
    sampleMass: sample.value.toNumber(),
    elements: d.elements.map((e) => {
      const m = displayQuantity(e.mass, 'g', rounding);
      const p = displayQuantity(e.percent, undefined, rounding);
      return { symbol: e.symbol, mass: m.value.toNumber(), massExact: m.value.toFixed(), massFigure: m.figure, massDisplay: m.text, percent: e.percent.value.toNumber(), percentExact: e.percent.value.toFixed(), percentFigure: p.figure, byDifference: e.byDifference };
    }),
    empirical: d.empirical,
    hill: d.hill,
    fit: d.fit,
    alternatives: d.alternatives,
    rounding,
    notes: d.notes,
  };
}

/**
 * The JSON object `pondus combustion --json` writes.
 *
 * @example
 * combustionJson(combustion({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } })).elements[1].massDisplay // '0.04578 g'
 */
export function combustionJson(r: CombustionResult) {
  return {
    input: r.input,
    sample: r.sample,
    elements: r.elements.map((e) => ({ symbol: e.symbol, mass: e.mass, massDisplay: e.massDisplay, percent: e.percent, percentDisplay: e.percentFigure, byDifference: e.byDifference })),
    empirical: r.empirical,
    hill: r.hill,
    residuals: r.fit ? { ...r.fit.residuals } : null,
    alternatives: r.alternatives.map((a) => a.formula),
    notes: notesJson(r.notes),
  };
}

/**
 * Element masses, percents and the empirical formula from a combustion analysis, with the
 * measured quantities (for callers inside the library; the public form is {@link combustion}).
 *
 * @example
 * combustionDetail({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } }).elements[0].mass.value.toFixed(4) // '0.4091'
 */
export function combustionDetail(options: CombustionOptions): CombustionDetail {
  const notes: Note[] = [];
  checkInputLength(options.sample, 'the sample mass');
  if (options.collected !== null && typeof options.collected === 'object') for (const [key, text] of Object.entries(options.collected)) checkInputLength(text, `the mass of ${key}`);
  const sample = measureAs(options.sample, [MASS], 'the sample mass', notes);
  if (sample.value.lte(0)) throw fail({ code: 'BAD_MEASUREMENT', message: 'the sample mass must be positive' });
  const hundred = quantity(exact(100), null);
  const elements: CombustionDetail['elements'] = [];
  if (options.collected === null || typeof options.collected !== 'object') throw fail({ code: 'BAD_OPTION', message: `give the masses collected as an object such as { co2: '0.2000 g', h2o: '0.0819 g' }` });
  for (const [key, text] of Object.entries(options.collected)) {
    if (text === undefined) continue;
    // keys in lower case (co2, h2o, agcl); CO2 and AgCl as written are read the same way
    const p = Object.hasOwn(PRODUCTS, key.toLowerCase()) ? PRODUCTS[key.toLowerCase()] : undefined;
    if (!p) throw fail({ code: 'BAD_OPTION', message: `'${key}' is not a combustion product pondus knows: ${Object.keys(PRODUCTS).join(', ')}` });
    if (typeof text !== 'string') throw fail({ code: 'BAD_OPTION', message: `the mass of ${p.formula} is written as text with its unit, such as '0.2000 g'` });
    const m = measureAs(text, [MASS], `the mass of ${p.formula}`, notes);
    if (m.value.isNegative()) throw fail({ code: 'BAD_MEASUREMENT', message: `the mass of ${p.formula} cannot be negative` });
    const f = conversionFactor(p.element, p.formula);
    const mass = multiply(m, quantity(f.reported, null));
    elements.push({ symbol: p.element, mass, percent: multiply(divide(mass, sample), hundred), byDifference: false });
  }
  if (elements.length === 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'give the masses collected: at least CO2 (and H2O, N2, SO2, AgCl, …)' });
  const found = elements.slice(1).reduce((acc, e) => add(acc, e.mass), elements[0].mass);
  const rest = subtract(sample, found);
  if (rest.value.isNegative() && rest.value.abs().gt(new Decimal(10).pow(rest.lsd ?? 0))) {
    throw fail({ code: 'BAD_MEASUREMENT', message: `the elements found weigh more than the sample (${found.value.toFixed(5)} g > the sample's ${options.sample.trim()}): check the masses` });
  }
  if (rest.value.gt(new Decimal(10).pow(rest.lsd ?? 0))) {
    elements.push({ symbol: 'O', mass: rest, percent: multiply(divide(rest, sample), hundred), byDifference: true });
    notes.push({ code: 'BY_DIFFERENCE', message: `oxygen by difference: ${rest.value.toFixed(6)} g (the sample less the elements found)` });
  }
  const measurements: Measurements = {
    kind: 'mass',
    elements: elements.map((e) => ({ symbol: e.symbol, value: e.mass.value, halfUnit: new Decimal(10).pow(e.mass.lsd ?? -12).div(2), byDifference: e.byDifference })),
    sample: sample.value,
    sampleHalfUnit: new Decimal(10).pow(sample.lsd ?? -12).div(2),
  };
  // the element masses and percents are results of the measurements, whether or not a formula fits
  let s: ReturnType<typeof searchFormula>;
  try {
    s = searchFormula(measurements);
  } catch (e) {
    if (!(e instanceof PondusError) || e.first.code !== 'NO_FORMULA_FITS') throw e;
    // combustion has no tolerance of its own: the percentages it reports can be searched with one
    const named = e.first.options?.includes('tolerance') ? { options: e.first.options, functions: ['empirical' as const] } : {};
    notes.push({ code: 'NO_FORMULA_FITS', message: messageFor(e.first, COMBUSTION_NAMING), ...named });
    return { input: options.sample, sample, elements, empirical: null, hill: null, fit: null, alternatives: [], notes };
  }
  return { input: options.sample, sample, elements, empirical: s.best.formula, hill: s.best.hill, fit: s.best, alternatives: s.alternatives, notes };
}
