/**
 * Reaction stoichiometry: limiting reagent, theoretical yield of each product,
 * excess reagent left, percent yield. Amounts are measured quantities (mass,
 * moles, or volume × concentration) and carry their significant figures.
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { AMOUNT, MASS, measureAs } from '../calc/measure.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import type { ParseOptions } from '../formula-parser/parse.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';
import { balance, type BalanceResult } from './balance.js';
import type { Species } from './equation.js';

export interface ReactOptions extends ParseOptions {
  /** Amounts of reactants: 'H2=4.00 g', 'HCl=25.0 mL of 0.100 M', 'O2=0.500 mol'. */
  amounts: string[];
  /** The amount of a product actually obtained, for percent yield: 'H2O=30.1 g'. */
  actual?: string;
}

export interface SpeciesLine {
  species: string;
  coefficient: bigint;
  /** Molar mass, g/mol (null for the electron). */
  molarMass: Quantity | null;
  /** Amount given (reactants), or produced (products), mol. */
  moles: Quantity | null;
  /** Mass given or produced, g. */
  mass: Quantity | null;
}

export interface ReactResult {
  input: string;
  balanced: string;
  reactants: SpeciesLine[];
  products: SpeciesLine[];
  /** The limiting reagent as written. */
  limiting: string;
  /** Extent of reaction at completion, mol. */
  extent: Quantity;
  /** Reagents left over at completion, with the amount and mass left. */
  excess: { species: string; moles: Quantity; mass: Quantity | null }[];
  percentYield: { species: string; actual: Quantity; theoretical: Quantity; percent: Quantity } | null;
  balance: BalanceResult;
  notes: Note[];
}

const G_PER_MOL = unitOf('g/mol');

function molarMassOf(s: Species, options: ParseOptions): Quantity | null {
  if (s.formula === 'e-') return null;
  return quantity(reportedMolarMass(formulaMassDetail(s.text, options)), G_PER_MOL);
}

function findSpecies(key: string, all: Species[], input: string): Species {
  const k = key.trim();
  const hit = all.find((s) => s.text === k) ?? all.find((s) => s.formula === safeHill(k));
  if (!hit) throw fail({ code: 'BAD_AMOUNT', message: `'${k}' is not a species of the equation (${all.map((s) => s.text).join(', ')})` }, input);
  return hit;
}

function safeHill(text: string): string | null {
  try {
    return formulaMassDetail(text).formula;
  } catch {
    return null;
  }
}

function splitAmount(text: string): [string, string] {
  const eq = text.indexOf('=');
  if (eq <= 0) throw fail({ code: 'BAD_AMOUNT', message: `'${text}' is not SPECIES=AMOUNT (e.g. H2=4.00 g, HCl=25.0 mL of 0.100 M)` }, text);
  return [text.slice(0, eq), text.slice(eq + 1)];
}

/**
 * Limiting reagent, theoretical yields and excess for amounts of reactants.
 *
 * @example
 * react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'] }).limiting // 'O2'
 */
export function react(equation: string, options: ReactOptions): ReactResult {
  const bal = balance(equation, options);
  const eq = bal.equation;
  const all = [...eq.reactants, ...eq.products];
  const coef = new Map<Species, bigint>(all.map((s, i) => [s, bal.coefficients[i]]));
  const notes: Note[] = [...bal.notes];
  if (options.amounts.length === 0) throw fail({ code: 'BAD_AMOUNT', message: 'give the amount of at least one reactant: --amount H2=4.00 g' }, equation);
  const given = new Map<Species, Quantity>();
  for (const a of options.amounts) {
    const [key, value] = splitAmount(a);
    const s = findSpecies(key, all, a);
    if (s.side !== 'reactant') throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is a product; give amounts of reactants (and the product obtained with --actual)` }, a);
    if (given.has(s)) throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is given twice` }, a);
    const q = measureAs(value, [MASS, AMOUNT], `the amount of ${s.text}`, notes);
    if (q.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the amount of ${s.text} must be positive` }, a);
    const m = molarMassOf(s, options);
    if (sameDims(q.dims, MASS) && !m) throw fail({ code: 'BAD_AMOUNT', message: 'electrons have no molar mass here: give their amount in mol' }, a);
    given.set(s, sameDims(q.dims, MASS) ? divide(q, m!) : q);
  }
  for (const r of eq.reactants) {
    if (!given.has(r)) notes.push({ code: 'ASSUMED_EXCESS', message: `no amount given for ${r.text}: taken to be in excess` });
  }
  // extent of reaction allowed by each reactant: n / ν (ν exact)
  let limiting: Species | null = null;
  let extent: Quantity | null = null;
  for (const [s, n] of given) {
    const x = divide(n, quantity(exact(String(coef.get(s)!)), null));
    if (!extent || x.value.lt(extent.value)) {
      extent = x;
      limiting = s;
    }
  }
  const line = (s: Species, moles: Quantity | null): SpeciesLine => {
    const mm = molarMassOf(s, options);
    return { species: s.text, coefficient: coef.get(s)!, molarMass: mm, moles, mass: moles && mm ? multiply(moles, mm) : null };
  };
  const nu = (s: Species) => quantity(exact(String(coef.get(s)!)), null);
  const reactants = eq.reactants.map((s) => line(s, given.get(s) ?? null));
  const products = eq.products.map((s) => line(s, multiply(extent!, nu(s))));
  const excess = eq.reactants
    .filter((s) => given.has(s) && s !== limiting)
    .map((s) => {
      const left = subtract(given.get(s)!, multiply(extent!, nu(s)));
      const mm = molarMassOf(s, options);
      return { species: s.text, moles: left, mass: mm ? multiply(left, mm) : null };
    });
  let percentYield: ReactResult['percentYield'] = null;
  if (options.actual) {
    const [key, value] = splitAmount(options.actual);
    const s = findSpecies(key, all, options.actual);
    if (s.side !== 'product') throw fail({ code: 'BAD_AMOUNT', message: `${s.text} is not a product` }, options.actual);
    const q = measureAs(value, [MASS, AMOUNT], `the amount of ${s.text} obtained`, notes);
    const p = products[eq.products.indexOf(s)];
    const theoretical = sameDims(q.dims, MASS) ? p.mass! : p.moles!;
    const percent = multiply(divide(q, theoretical), quantity(exact(100), null));
    percentYield = { species: s.text, actual: q, theoretical, percent };
    if (percent.value.gt(100)) notes.push({ code: 'YIELD_OVER_100', message: `a yield over 100 % (${percent.value.toFixed(1)} %): the product may be wet or impure, or an amount is wrong` });
  }
  return { input: equation, balanced: bal.balanced, reactants, products, limiting: limiting!.text, extent: extent!, excess, percentYield, balance: bal, notes };
}

/** Non-throwing {@link react}. */
export function safeReact(equation: string, options: ReactOptions): SafeResult<ReactResult> {
  return toSafe(() => react(equation, options));
}
