/**
 * The one unit vocabulary: the dimensions, the units of the bench (mass,
 * amount, volume, and what divides them: molar and mass concentration, molar
 * mass; percent and parts per million) and their factors. Every factor is a
 * power of ten, exact, so converting never changes a value's precision: only
 * the position of its last significant digit moves. Every reader of amounts
 * (the calculator, measure.ts, the measurement sets of the empirical formula,
 * the commands) takes its dimensions and factors from here.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';

/** Exponents of the base dimensions [mass (g), amount (mol), volume (L)]. */
export type Dims = readonly [number, number, number];

export interface Unit {
  symbol: string;
  /** Power of ten from this unit to the base unit (mg → -3). */
  exp10: number;
  dims: Dims;
  name: string;
}

/** A mass (g). */
export const MASS: Dims = Object.freeze([1, 0, 0] as const);
/** An amount of substance (mol). */
export const AMOUNT: Dims = Object.freeze([0, 1, 0] as const);
/** A volume (L). */
export const VOLUME: Dims = Object.freeze([0, 0, 1] as const);
/** A molar concentration (mol/L). */
export const MOLARITY: Dims = Object.freeze([0, 1, -1] as const);
/** A mass concentration (g/L). */
export const MASS_CONCENTRATION: Dims = Object.freeze([1, 0, -1] as const);
/** A molar mass (g/mol). */
export const MOLAR_MASS: Dims = Object.freeze([1, -1, 0] as const);
/** A pure number (fractions, percents, ppm). */
export const PURE: Dims = Object.freeze([0, 0, 0] as const);
const NONE = PURE;

const POW10 = new Map<number, Decimal>();

/**
 * 10^n as an exact Decimal, made once per exponent: the factor of every unit
 * and of every last-digit position.
 *
 * @example
 * pow10(-3).toString() // '0.001'
 */
export function pow10(n: number): Decimal {
  let d = POW10.get(n);
  if (d === undefined) {
    d = new Decimal(`1e${n}`); // exact: the same value as 10^n, read instead of multiplied out
    if (POW10.size < 4096) POW10.set(n, d);
  }
  return d;
}

/**
 * A value in base units (g, mol, L) expressed in a unit: the value divided by the unit's factor,
 * computed as a product by the inverse power of ten (the same exact quotient, rounded the same way).
 *
 * @example
 * inUnitOf(new Decimal('0.25'), unitOf('mL')).toString() // '250'
 */
export function inUnitOf(value: Decimal, u: Unit | null): Decimal {
  const exp10 = u ? u.exp10 : 0;
  // a value already within the working precision is its own quotient by 1
  if (exp10 === 0 && value.sd() <= Decimal.precision) return value;
  return value.times(pow10(-exp10));
}

/**
 * A value in a unit expressed in base units (g, mol, L): the value times the unit's factor.
 *
 * @example
 * toBaseUnit(new Decimal('250'), unitOf('mL')).toString() // '0.25'
 */
export function toBaseUnit(value: Decimal, u: Unit | null): Decimal {
  const exp10 = u ? u.exp10 : 0;
  // a value already within the working precision is its own product by 1
  if (exp10 === 0 && value.sd() <= Decimal.precision) return value;
  return value.times(pow10(exp10));
}

/**
 * The exact factor from a unit to its base unit (mg → 0.001; none → 1).
 *
 * @example
 * unitFactor(unitOf('mL')).toString() // '0.001'
 */
export function unitFactor(u: Unit | null): Decimal {
  return pow10(u ? u.exp10 : 0);
}

const TABLE: Unit[] = [
  { symbol: 'kg', exp10: 3, dims: MASS, name: 'kilogram' },
  { symbol: 'g', exp10: 0, dims: MASS, name: 'gram' },
  { symbol: 'mg', exp10: -3, dims: MASS, name: 'milligram' },
  { symbol: 'µg', exp10: -6, dims: MASS, name: 'microgram' },
  { symbol: 'ng', exp10: -9, dims: MASS, name: 'nanogram' },
  { symbol: 'mol', exp10: 0, dims: AMOUNT, name: 'mole' },
  { symbol: 'mmol', exp10: -3, dims: AMOUNT, name: 'millimole' },
  { symbol: 'µmol', exp10: -6, dims: AMOUNT, name: 'micromole' },
  { symbol: 'nmol', exp10: -9, dims: AMOUNT, name: 'nanomole' },
  { symbol: 'L', exp10: 0, dims: VOLUME, name: 'litre' },
  { symbol: 'mL', exp10: -3, dims: VOLUME, name: 'millilitre' },
  { symbol: 'µL', exp10: -6, dims: VOLUME, name: 'microlitre' },
  { symbol: 'M', exp10: 0, dims: MOLARITY, name: 'mole per litre' },
  { symbol: 'mM', exp10: -3, dims: MOLARITY, name: 'millimole per litre' },
  { symbol: 'µM', exp10: -6, dims: MOLARITY, name: 'micromole per litre' },
  { symbol: 'nM', exp10: -9, dims: MOLARITY, name: 'nanomole per litre' },
  { symbol: 'mol/L', exp10: 0, dims: MOLARITY, name: 'mole per litre' },
  { symbol: 'mmol/L', exp10: -3, dims: MOLARITY, name: 'millimole per litre' },
  { symbol: 'g/L', exp10: 0, dims: MASS_CONCENTRATION, name: 'gram per litre' },
  { symbol: 'mg/L', exp10: -3, dims: MASS_CONCENTRATION, name: 'milligram per litre' },
  { symbol: 'µg/L', exp10: -6, dims: MASS_CONCENTRATION, name: 'microgram per litre' },
  { symbol: 'ng/mL', exp10: -6, dims: MASS_CONCENTRATION, name: 'nanogram per millilitre' },
  { symbol: 'mg/mL', exp10: 0, dims: MASS_CONCENTRATION, name: 'milligram per millilitre' },
  { symbol: 'µg/mL', exp10: -3, dims: MASS_CONCENTRATION, name: 'microgram per millilitre' },
  { symbol: 'g/mL', exp10: 3, dims: MASS_CONCENTRATION, name: 'gram per millilitre' },
  // per 100 mL: the 100 is defined, exact (clinical and food labels; pharmacopoeial % w/v)
  { symbol: 'g/100 mL', exp10: 1, dims: MASS_CONCENTRATION, name: 'gram per 100 millilitres' },
  { symbol: 'mg/100 mL', exp10: -2, dims: MASS_CONCENTRATION, name: 'milligram per 100 millilitres' },
  { symbol: 'g/dL', exp10: 1, dims: MASS_CONCENTRATION, name: 'gram per decilitre' },
  { symbol: 'mg/dL', exp10: -2, dims: MASS_CONCENTRATION, name: 'milligram per decilitre' },
  // percent weight in volume: grams of solute in 100 mL of solution (pharmacopoeial usage)
  { symbol: '% w/v', exp10: 1, dims: MASS_CONCENTRATION, name: 'percent weight in volume (g per 100 mL)' },
  { symbol: 'g/mol', exp10: 0, dims: MOLAR_MASS, name: 'gram per mole' },
  { symbol: 'kg/mol', exp10: 3, dims: MOLAR_MASS, name: 'kilogram per mole' },
  { symbol: '%', exp10: -2, dims: NONE, name: 'percent' },
  { symbol: '% w/w', exp10: -2, dims: NONE, name: 'percent by mass' },
  { symbol: '% v/v', exp10: -2, dims: NONE, name: 'percent by volume' },
  { symbol: 'ppm', exp10: -6, dims: NONE, name: 'part per million' },
  // mass per mass: potencies (µg per mg of powder) and contents of solids and semisolids
  { symbol: 'mg/g', exp10: -3, dims: NONE, name: 'milligram per gram' },
  { symbol: 'µg/mg', exp10: -3, dims: NONE, name: 'microgram per milligram' },
  { symbol: 'mg/kg', exp10: -6, dims: NONE, name: 'milligram per kilogram' },
  { symbol: 'µg/g', exp10: -6, dims: NONE, name: 'microgram per gram' },
  { symbol: 'ppb', exp10: -9, dims: NONE, name: 'part per billion' },
];

const ALIASES: Record<string, string> = {
  ug: 'µg',
  'μg': 'µg', // Greek mu
  umol: 'µmol',
  'μmol': 'µmol',
  uL: 'µL',
  'μL': 'µL',
  ul: 'µL',
  'µl': 'µL',
  'μl': 'µL',
  ml: 'mL',
  l: 'L',
  uM: 'µM',
  'μM': 'µM',
  'mol/l': 'mol/L',
  'g/l': 'g/L',
  'mg/l': 'mg/L',
  'mg/ml': 'mg/mL',
  'ug/mL': 'µg/mL',
  'g/ml': 'g/mL',
  'mol·L⁻¹': 'mol/L',
  'mmol·L⁻¹': 'mmol/L',
  'g·L⁻¹': 'g/L',
  'mg·L⁻¹': 'mg/L',
  'g·mL⁻¹': 'g/mL',
  'mg·mL⁻¹': 'mg/mL',
  'g·mol⁻¹': 'g/mol',
  // the cubic decimetre is the litre and the cubic centimetre the millilitre, exactly (SI Brochure,
  // 9th edition, table 8): the spellings of school and many European texts
  'dm³': 'L',
  dm3: 'L',
  'cm³': 'mL',
  cm3: 'mL',
  'mol/dm³': 'mol/L',
  'mol/dm3': 'mol/L',
  'mol·dm⁻³': 'mol/L',
  'mol dm⁻³': 'mol/L',
  'mol dm-3': 'mol/L',
  'mol L⁻¹': 'mol/L',
  'mol L-1': 'mol/L',
  'mol·L-1': 'mol/L',
  'mmol L-1': 'mmol/L',
  'mmol L⁻¹': 'mmol/L',
  'g L-1': 'g/L',
  'g L⁻¹': 'g/L',
  'mg L-1': 'mg/L',
  'mg L⁻¹': 'mg/L',
  'g mL-1': 'g/mL',
  'g mL⁻¹': 'g/mL',
  'mg mL-1': 'mg/mL',
  'mg mL⁻¹': 'mg/mL',
  'µg mL-1': 'µg/mL',
  'µg mL⁻¹': 'µg/mL',
  'g mol-1': 'g/mol',
  'g mol⁻¹': 'g/mol',
  'g cm-3': 'g/mL',
  // a density in kilograms per litre is the same number in grams per millilitre, exactly
  'kg/L': 'g/mL',
  'kg L-1': 'g/mL',
  'kg L⁻¹': 'g/mL',
  'kg·L⁻¹': 'g/mL',
  // the same amount per a thousandth of the volume: exactly the unit a thousand times smaller
  'mmol/mL': 'mol/L',
  'µmol/mL': 'mmol/L',
  'umol/mL': 'mmol/L',
  'μmol/mL': 'mmol/L',
  'µmol/L': 'µM',
  'umol/L': 'µM',
  'μmol/L': 'µM',
  'nmol/L': 'nM',
  'nmol/mL': 'µM',
  'ug/L': 'µg/L',
  'μg/L': 'µg/L',
  'ng/ml': 'ng/mL',
  'g/cm³': 'g/mL',
  'g/cm3': 'g/mL',
  'g·cm⁻³': 'g/mL',
  'g cm⁻³': 'g/mL',
  'g/dm³': 'g/L',
  'g/dm3': 'g/L',
  // the SI unit of density: 1 kg/m³ is 1 g/L exactly
  'kg/m³': 'g/L',
  'kg/m3': 'g/L',
  'kg·m⁻³': 'g/L',
  'kg m⁻³': 'g/L',
  'kg m-3': 'g/L',
  'g/100mL': 'g/100 mL',
  'g/100 ml': 'g/100 mL',
  'g/100ml': 'g/100 mL',
  'mg/100mL': 'mg/100 mL',
  'mg/100 ml': 'mg/100 mL',
  'mg/100ml': 'mg/100 mL',
  'g/dl': 'g/dL',
  'mg/dl': 'mg/dL',
  '%w/v': '% w/v',
  '%w/w': '% w/w',
  '%v/v': '% v/v',
  'ug/mg': 'µg/mg',
  'μg/mg': 'µg/mg',
  'mcg/mg': 'µg/mg',
  'ug/g': 'µg/g',
  'μg/g': 'µg/g',
};

let derived = false;

/**
 * The aliases with the spellings derived from them, made on first use: a unit written as its
 * symbol ('mL', 'M') is found without them, and making them was a tenth of what a command's
 * start-up allocated.
 */
function aliasTable(): Record<string, string> {
  if (derived) return ALIASES;
  derived = true;
  // a litre written with a lower-case l ('mmol/l', 'µg/ml', 'g/100 ml', 'mol l-1', 'g ml⁻¹'), as 'mol/l'
  // and 'g/l' are: every per-litre or per-millilitre spelling is read with l as with L (SI Brochure,
  // 9th edition, table 8: both l and L are symbols of the litre)
  for (const k of [...TABLE.map((u) => u.symbol), ...Object.keys(ALIASES)]) {
    const m = /^(.*\/(?:100 ?)?[mµuμd]?)L$|^(.*[ ·][mµuμd]?)L(-1|\u207b\u00b9)$/.exec(k);
    if (!m || !/[a-zA-Zµμ%]/.test(m[1] ?? m[2])) continue;
    const lower = m[1] !== undefined ? `${m[1]}l` : `${m[2]}l${m[3]}`;
    if (ALIASES[lower] === undefined && !BY_SYMBOL.has(lower)) ALIASES[lower] = ALIASES[k] ?? k;
  }
  // a minus sign (U+2212) where a hyphen stands for one ('mol dm−3', as typeset texts print it), and
  // the exponent written with a caret ('mol L^-1', 'g cm^-3', as plain text writes it)
  for (const k of Object.keys(ALIASES)) {
    if (!/[a-zA-Z]-[0-9]$/.test(k)) continue;
    ALIASES[k.replace(/-/g, '\u2212')] = ALIASES[k];
    ALIASES[k.replace(/-([0-9])$/, '^-$1')] = ALIASES[k];
    ALIASES[k.replace(/-([0-9])$/, '^\u2212$1')] = ALIASES[k];
  }
  // the Greek small letter mu (U+03BC) where the micro sign (U+00B5) stands, as keyboards and fonts
  // give it: every spelling with µ is read with μ too ('μg/mL', 'μmol/l')
  for (const k of [...TABLE.map((u) => u.symbol), ...Object.keys(ALIASES)]) {
    if (!k.includes('\u00b5')) continue;
    const greek = k.replaceAll('\u00b5', '\u03bc');
    if (ALIASES[greek] === undefined) ALIASES[greek] = ALIASES[k] ?? k;
  }
  return ALIASES;
}

let spellings: readonly string[] | undefined;

/**
 * Every spelling {@link unitOf} accepts: the symbols and their aliases.
 *
 * @example
 * unitSpellings().includes('mmol/l') // true
 * unitSpellings().includes('mL') // true
 */
export function unitSpellings(): readonly string[] {
  return (spellings ??= Object.freeze([...TABLE.map((u) => u.symbol), ...Object.keys(aliasTable())]));
}

/**
 * True for the percent units (%, % w/w, % v/v): a fraction of a whole, where
 * the 100 is defined.
 *
 * @example
 * isPercent(unitOf('%')) // true
 * isPercent(unitOf('% w/v')) // false (a mass concentration, g per 100 mL)
 */
export function isPercent(u: Unit): boolean {
  return u.exp10 === -2 && sameDims(u.dims, NONE);
}

const BY_SYMBOL = new Map(TABLE.map((u) => [u.symbol, u]));

/** Units of the trade that pondus does not read as amounts, and why (for the hint of UNKNOWN_UNIT). */
const NOT_READ: readonly [RegExp, string][] = [
  [/^N$/, 'normality (N) depends on the reaction the solution is used in, so pondus does not read it: give the molarity (M) and count the equivalents of that reaction yourself'],
  [/^(m|µ|u)?(eq|Eq)(\/[mµu]?[Ll])?$/, "equivalents depend on the charge of the ion counted, so pondus does not read them as an amount: give the molarity or the mass concentration; a salt's strength in equivalents is read by the milliequivalents calculation (meq) and osmolarity, and a dilution takes equivalents on both sides"],
  [/^(IU|units?|U)(\/(m?g|mL|L))?$/i, 'biological units (IU, units) are defined for each substance by its reference standard, not by its mass: pondus does not convert them'],
  [/^(mol|mmol)\/kg$/, 'a molality (mol per kg of solvent) is not read: pondus reads molar concentrations per litre of solution (M, mol/L)'],
];

/**
 * Why a unit of the trade is not read, for the hint of an unknown unit; undefined for a word
 * that is not such a unit.
 *
 * @example
 * notReadHint('N')?.startsWith('normality') // true
 * notReadHint('mEq/L')?.startsWith('equivalents') // true
 * notReadHint('foo') // undefined
 */
export function notReadHint(word: string): string | undefined {
  return NOT_READ.find(([re]) => re.test(word))?.[1];
}

/** The symbols the calculator and the commands accept, for help and error messages. */
export const UNIT_SYMBOLS: readonly string[] = Object.freeze(TABLE.map((u) => u.symbol));

/**
 * Looks up a unit by symbol or accepted spelling; throws UNKNOWN_UNIT otherwise.
 *
 * @param symbol - a unit symbol ('mg', 'mL', 'g/mol') or an accepted spelling ('ug').
 * @param column - the 1-based column of the symbol in a longer input, given to the error.
 * @returns the unit: its symbol, power of ten and dimensions.
 * @throws PondusError: UNKNOWN_UNIT for a symbol pondus does not know (the hint lists those it does); BAD_ARGUMENT when `symbol` is not a string or `column` is given and not a number.
 * @example
 * unitOf('mg').exp10 // -3
 * unitOf('ug').symbol // 'µg'
 */
export function unitOf(symbol: string, column?: number): Unit {
  const u = BY_SYMBOL.get(symbol) ?? BY_SYMBOL.get(aliasTable()[symbol] ?? '');
  if (!u) {
    throw fail(typedIssue({ code: 'UNKNOWN_UNIT', unit: symbol, inExpression: false, column, hint: notReadHint(symbol) ?? `units: ${UNIT_SYMBOLS.join(', ')}` }));
  }
  return u;
}

const LONGEST_SYMBOL = Math.max(...TABLE.map((u) => u.symbol.length));

/**
 * The rest of `text` from `start` when it is a unit's own symbol ('mL', 'M', 'g/mol'; not an
 * alias), else null: a look-up that needs none of the derived spellings.
 *
 * @example
 * symbolToEnd('250.0 mL', 6) // 'mL'
 * symbolToEnd('250.0 ml', 6) // null (an alias of mL)
 * symbolToEnd('2 g / 4 mL', 2) // null (the text goes on)
 */
export function symbolToEnd(text: string, start: number): string | null {
  if (text.length - start > LONGEST_SYMBOL) return null;
  const rest = text.slice(start);
  return BY_SYMBOL.has(rest) ? rest : null;
}

/** True when two dimension vectors are equal. */
export function sameDims(a: Dims, b: Dims): boolean {
  return a[0] === b[0] && a[1] === b[1] && a[2] === b[2];
}

const DIM_NAMES: [Dims, string, string][] = [
  [PURE, 'a pure number', ''],
  [MASS, 'a mass', 'g'],
  [AMOUNT, 'an amount of substance', 'mol'],
  [VOLUME, 'a volume', 'L'],
  [MOLARITY, 'a molar concentration', 'M'],
  [MASS_CONCENTRATION, 'a mass concentration', 'g/L'],
  [MOLAR_MASS, 'a molar mass', 'g/mol'],
  [[0, -1, 1], 'a volume per amount', 'L/mol'],
  [[-1, 1, 0], 'an amount per mass', 'mol/g'],
  [[0, 0, -1], 'a reciprocal volume', '1/L'],
];

/**
 * A plain-English name for a dimension ('a mass', 'a molar concentration').
 *
 * @example
 * dimsName([1, 0, 0]) // 'a mass'
 */
export function dimsName(d: Dims): string {
  return DIM_NAMES.find(([x]) => sameDims(x, d))?.[1] ?? `a quantity in ${baseUnitText(d)}`;
}

/**
 * The base-unit symbol for a dimension: 'g', 'M', 'g/mol', or a product of powers.
 *
 * @example
 * baseUnitText([0, 1, -1]) // 'M'
 */
export function baseUnitText(d: Dims): string {
  const named = DIM_NAMES.find(([x]) => sameDims(x, d));
  if (named) return named[2];
  const parts: string[] = [];
  (['g', 'mol', 'L'] as const).forEach((s, i) => {
    if (d[i] === 1) parts.push(s);
    else if (d[i] !== 0) parts.push(`${s}^${d[i]}`);
  });
  return parts.join('·');
}
