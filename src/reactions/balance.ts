/**
 * Balances a chemical equation exactly: the null space of the element-and-charge
 * matrix over the rationals (BigInt), scaled to the smallest whole numbers.
 *
 * The coefficients as written (1 where none is written) come first: when they
 * conserve every element and the charge, they are used. Otherwise a unique
 * balance is computed. When atoms alone allow more than one independent balance
 * (acylations, condensations: one species is a combination of others), pondus
 * says so and shows a basis, and the user fixes it, by writing the coefficients
 * or by fixing those of chosen species.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { amountText } from '../formula/amount.js';
import type { ParseOptions } from '../formula-parser/parse.js';
import { parseEquation, type Equation, type Species } from './equation.js';
import { echelonBasis, nullSpace, Rational, reducedRowEchelon, smallestIntegers, smallestWholeBalance, wholeEchelon } from './rational.js';

/** Coefficients fixed by the user: `'written'` (those written in the equation) or species → coefficient text. */
export type FixedCoefficients = 'written' | Readonly<Record<string, string | number>>;

export interface BalanceOptions extends ParseOptions {
  /**
   * Fixes coefficients when atoms alone do not: `'written'` takes the coefficients
   * written in the equation, `{ C4H6O3: 5 }` those of chosen species; the rest are solved for.
   */
  fix?: FixedCoefficients;
  /** Species written on one side that are catalysts or additives: left out of the balance ('H2SO4'). */
  catalysts?: readonly string[];
}

/** A balanced equation, as plain data. */
export interface BalanceResult {
  input: string;
  /** The balanced equation as text: '2 H2 + O2 → 2 H2O'. */
  balanced: string;
  /** Species as written (without coefficients), in order. */
  species: string[];
  /** Hill formulas of the species, in the same order. */
  formulas: string[];
  /** How many of the species are reactants (the first ones). */
  reactantCount: number;
  /** The coefficients in the order written, as numbers (whole numbers unless written or fixed as fractions). */
  coefficients: number[];
  /** The same coefficients exactly, as text: '2', '1/2'. */
  exactCoefficients: string[];
  /** True when the coefficients as written (1 where none is written) conserve every element and the charge. */
  balancedAsWritten: boolean;
  /** True when atoms and charge alone fix the ratios (one independent balance). */
  unique: boolean;
  /** How many independent balances atoms and charge allow. */
  independentBalances: number;
  /** When not unique: a basis of the balances, as equations (any positive combination balances too). */
  basis: string[];
  /** How the coefficients were settled. */
  settledBy: 'as written' | 'computed' | 'fixed';
  /** Species left out of the balance as catalysts (written on both sides, or named), as written. */
  catalysts: string[];
  notes: Note[];
}

/** What balancing found, for the library's own use (react and the reagent table). */
export interface Balanced {
  result: BalanceResult;
  equation: Equation;
  /** Exact coefficients, in the order written. */
  exact: Rational[];
}

function matrixOf(eq: Equation): Rational[][] {
  const all = [...eq.reactants, ...eq.products];
  const keys: string[] = [];
  for (const s of all) for (const k of s.atoms.keys()) if (!keys.includes(k)) keys.push(k);
  const rows = keys.map((k) =>
    all.map((s) => {
      const n = s.atoms.get(k);
      const r = n === undefined ? Rational.ZERO : typeof n === 'number' && Number.isSafeInteger(n) ? Rational.of(BigInt(n), 1n) : Rational.fromDecimal(amountText(n));
      return s.side === 'reactant' ? r : r.neg();
    }),
  );
  if (all.some((s) => s.charge !== 0)) {
    rows.push(all.map((s) => Rational.of(BigInt(s.side === 'reactant' ? s.charge : -s.charge))));
  }
  return rows;
}

/**
 * The element-and-charge matrix of {@link matrixOf} in plain whole numbers (rows in the same
 * order: the elements as first met, then the charge), or null when a count is not a whole number
 * below 2^31 or a charge is not that small. `sides` holds every element of the species, in order.
 */
function wholeMatrixOf(all: readonly Species[], sides: ReadonlyMap<string, number>): number[][] | null {
  const n = all.length;
  const row = new Map<string, number>();
  const rows: number[][] = [];
  for (const k of sides.keys()) {
    row.set(k, rows.length);
    rows.push(new Array<number>(n).fill(0));
  }
  let charged = false;
  for (let j = 0; j < n; j++) {
    const s = all[j];
    const reactant = s.side === 'reactant';
    for (const [k, c] of s.atoms) {
      if (typeof c !== 'number' || !Number.isInteger(c) || c >= SMALL || c <= -SMALL) return null;
      rows[row.get(k)!][j] = reactant ? c : 0 - c;
    }
    if (s.charge !== 0) charged = true;
  }
  if (charged) {
    const q = new Array<number>(n);
    for (let j = 0; j < n; j++) {
      const z = all[j].charge;
      if (!Number.isInteger(z) || z >= SMALL || z <= -SMALL) return null;
      q[j] = all[j].side === 'reactant' ? z : 0 - z;
    }
    rows.push(q);
  }
  return rows;
}

/** Whole entries and coefficients below this go the route of plain numbers. */
const SMALL = 2 ** 31;
const EXACT = 2 ** 53;

/** {@link conserves} on the whole-number matrix, or null when a coefficient is not a small whole number or a sum would leave the exact integers. */
function wholeConserves(rows: readonly number[][], c: readonly Rational[]): boolean | null {
  const w = new Array<number>(c.length);
  for (let j = 0; j < c.length; j++) {
    const x = c[j];
    if (x.den !== 1n || x.num >= 2147483648n || x.num <= -2147483648n) return null;
    w[j] = Number(x.num);
  }
  let ok = true;
  for (const row of rows) {
    let sum = 0;
    for (let j = 0; j < w.length; j++) {
      const p = row[j] * w[j];
      sum += p;
      if (!(Math.abs(p) < EXACT && Math.abs(sum) < EXACT)) return null;
    }
    if (sum !== 0) ok = false;
  }
  return ok;
}

function writtenOf(s: Species, input: string): Rational {
  if (s.written === null) return Rational.ONE;
  let r: Rational;
  if (s.written.includes('/')) {
    const [a, b] = s.written.split('/');
    const den = Rational.fromDecimal(b);
    if (den.isZero()) throw fail({ code: 'BAD_EQUATION', message: `the coefficient ${s.written} of ${s.text} divides by zero` }, input);
    r = Rational.fromDecimal(a).div(den);
  } else r = Rational.fromDecimal(s.written);
  if (r.sign() <= 0) throw fail({ code: 'BAD_EQUATION', message: `the coefficient ${s.written} of ${s.text} must be positive` }, input);
  return r;
}

function conserves(rows: Rational[][], c: Rational[]): boolean {
  return rows.every((row) => row.reduce((acc, x, i) => acc.plus(x.times(c[i])), Rational.ZERO).isZero());
}

function coefficientText(c: Rational): string {
  return c.toString();
}

/**
 * Writes species with coefficients as an equation.
 *
 * @param reactants - the reactants' texts, in order.
 * @param products - the products' texts, in order.
 * @param coefficients - one coefficient for each reactant then each product (a coefficient of 1 is not written).
 * @returns the equation as text, sides joined by →.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * equationText(['H2', 'O2'], ['H2O'], [2, 1, 2]) // '2 H2 + O2 → 2 H2O'
 * equationText(['H2', 'O2'], ['H2O'], ['1', '1/2', '1']) // 'H2 + 1/2 O2 → H2O'
 */
export function equationText(reactants: string[], products: string[], coefficients: readonly (number | string | bigint)[]): string {
  const term = (s: string, c: number | string | bigint) => (String(c) === '1' ? s : `${String(c)} ${s}`);
  const left = reactants.map((s, i) => term(s, coefficients[i])).join(' + ');
  const right = products.map((s, i) => term(s, coefficients[reactants.length + i])).join(' + ');
  return `${left} → ${right}`;
}

function basisText(basis: Rational[][], reactantTexts: string[], productTexts: string[]): string[] {
  return basis.map((v) => {
    let ints = smallestIntegers(v);
    if (ints.every((c) => c <= 0n)) ints = ints.map((c) => -c);
    if (ints.some((c) => c < 0n)) {
      // a relation among the species with some of them on the other side: write it as an equation
      const all = [...reactantTexts, ...productTexts];
      const sideOf = (i: number) => (i < reactantTexts.length) === ints[i] > 0n;
      const left = all.map((t, i) => [t, ints[i], i] as const).filter(([, c, i]) => c !== 0n && sideOf(i));
      const right = all.map((t, i) => [t, ints[i], i] as const).filter(([, c, i]) => c !== 0n && !sideOf(i));
      const moved = all.filter((_, i) => ints[i] !== 0n && (i < reactantTexts.length) !== (ints[i] > 0n));
      const abs = (c: bigint) => (c < 0n ? -c : c);
      return `${equationText(left.map(([t]) => t), right.map(([t]) => t), [...left.map(([, c]) => abs(c)), ...right.map(([, c]) => abs(c))])} (with ${moved.join(', ')} on the other side)`;
    }
    const keep = (list: string[], offset: number) => list.map((t, i) => [t, ints[offset + i]] as const).filter(([, c]) => c !== 0n);
    const r = keep(reactantTexts, 0);
    const p = keep(productTexts, reactantTexts.length);
    return equationText(r.map(([t]) => t), p.map(([t]) => t), [...r.map(([, c]) => c), ...p.map(([, c]) => c)]);
  });
}

/** Solves for c = Σ a_j basis_j with c fixed on some species; null when those do not settle it. */
function solveFixed(basis: Rational[][], fixed: Map<number, Rational>): { c: Rational[] } | { free: number } | { inconsistent: true } {
  const k = basis.length;
  const idx = [...fixed.keys()];
  // augmented system: rows = fixed species, columns = a_1..a_k | value
  const { m, pivots } = reducedRowEchelon(idx.map((i) => [...basis.map((v) => v[i]), fixed.get(i)!]), k);
  const r = pivots.length;
  for (let i = r; i < m.length; i++) if (!m[i][k].isZero()) return { inconsistent: true };
  if (pivots.length < k) return { free: k - pivots.length };
  const a = new Array<Rational>(k).fill(Rational.ZERO);
  pivots.forEach((pc, i) => {
    a[pc] = m[i][k];
  });
  const n = basis[0].length;
  const c: Rational[] = [];
  for (let i = 0; i < n; i++) c.push(basis.reduce((acc, v, j) => acc.plus(v[i].times(a[j])), Rational.ZERO));
  return { c };
}

function fixedMap(fix: FixedCoefficients, all: Species[], input: string): Map<number, Rational> {
  const out = new Map<number, Rational>();
  if (fix === 'written') {
    all.forEach((s, i) => {
      if (s.written !== null) out.set(i, writtenOf(s, input));
    });
    if (out.size === 0) throw fail({ code: 'BAD_OPTION', message: 'no coefficients are written in the equation: write them, or fix those of chosen species (C4H6O3=1)' }, input);
    return out;
  }
  for (const [key, value] of Object.entries(fix)) {
    const k = key.trim();
    const i = all.findIndex((s) => s.text === k);
    const j = i >= 0 ? i : all.findIndex((s) => s.formula === k);
    if (j < 0) throw fail({ code: 'BAD_OPTION', message: `'${k}' is not a species of the equation (${all.map((s) => s.text).join(', ')})` }, input);
    if (out.has(j)) throw fail({ code: 'BAD_OPTION', message: `the coefficient of ${all[j].text} is fixed twice` }, input);
    const text = String(value).trim();
    let r: Rational;
    const frac = /^([0-9]+(?:\.[0-9]+)?)\/([0-9]+(?:\.[0-9]+)?)$/.exec(text);
    if (frac) {
      const den = Rational.fromDecimal(frac[2]);
      if (den.isZero()) throw fail({ code: 'BAD_OPTION', message: `the coefficient of ${all[j].text}, ${text}, divides by zero` }, input);
      r = Rational.fromDecimal(frac[1]).div(den);
    } else if (/^[0-9]+(?:\.[0-9]+)?$/.test(text)) r = Rational.fromDecimal(text);
    else throw fail({ code: 'BAD_OPTION', message: `the coefficient of ${all[j].text} must be a positive number ('${text}')` }, input);
    if (r.sign() <= 0) throw fail({ code: 'BAD_OPTION', message: `the coefficient of ${all[j].text} must be positive` }, input);
    out.set(j, r);
  }
  return out;
}

/**
 * Balances a parsed equation; the library's entry point for commands that go on computing.
 *
 * @param written - an equation read by {@link parseEquation}.
 * @param options - fix (coefficients to hold: 'written' or { SPECIES: N }) and catalysts to leave out.
 * @returns the balance result, the equation with its catalysts set aside, and the exact coefficients in the order written.
 * @throws PondusError: BAD_EQUATION for a written coefficient that is not positive or divides by zero; BAD_OPTION for a fixed coefficient or catalyst that is not a species of the equation, a coefficient fixed twice or not positive, or catalysts that leave a side empty; NO_BALANCE when no coefficients balance every element and the charge; NOT_UNIQUE when the balance is not unique and nothing fixes it; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * balanceParsed(parseEquation('H2 + O2 -> H2O')).result.coefficients // [2, 1, 2]
 */
export function balanceParsed(written: Equation, options: BalanceOptions = {}): Balanced {
  const eq = withCatalysts(written, options.catalysts ?? []);
  try {
    return balanceReduced(eq, options);
  } catch (e) {
    if (e instanceof PondusError && eq.catalysts.length > 0 && (e.first.code === 'NO_BALANCE' || e.first.code === 'NOT_UNIQUE')) {
      const names = eq.catalysts.map((c) => c.text).join(', ');
      throw new PondusError(e.issues.map((i) => ({ ...i, message: `${i.message} (${names} left out of the balance as ${eq.catalysts.length === 1 ? 'a catalyst' : 'catalysts'})` })), e.input);
    }
    throw e;
  }
}

/** Takes named catalysts out of the sides of an equation. */
function withCatalysts(eq: Equation, names: readonly string[]): Equation {
  if (names.length === 0) return eq;
  const reactants = [...eq.reactants];
  const products = [...eq.products];
  const catalysts = [...eq.catalysts];
  const notes = [...eq.notes];
  for (const raw of names) {
    const name = raw.trim();
    const find = (list: Species[]) => list.findIndex((s) => s.text === name || s.formula === name);
    const r = find(reactants);
    const p = find(products);
    if (r < 0 && p < 0) {
      if (catalysts.some((c) => c.text === name || c.formula === name)) continue;
      throw fail({ code: 'BAD_OPTION', message: `the catalyst '${name}' is not a species of the equation (${[...reactants, ...products].map((s) => s.text).join(', ')})` }, eq.input);
    }
    const [s] = r >= 0 ? reactants.splice(r, 1) : products.splice(p, 1);
    catalysts.push(s);
    notes.push({ code: 'CATALYST', message: `${s.text} is named a catalyst: left out of the balance` });
  }
  if (reactants.length === 0 || products.length === 0) throw fail({ code: 'BAD_OPTION', message: 'with the catalysts left out, a side of the equation is empty' }, eq.input);
  return { ...eq, reactants, products, catalysts, notes };
}

function balanceReduced(eq: Equation, options: BalanceOptions): Balanced {
  const input = eq.input;
  const all: Species[] = [...eq.reactants, ...eq.products];
  const texts = all.map((s) => s.text);
  const reactantTexts = eq.reactants.map((s) => s.text);
  const productTexts = eq.products.map((s) => s.text);
  const notes: Note[] = [...eq.notes];
  // an element on one side only can never balance: say which (the sides each element is on: 1 reactants, 2 products)
  const sides = new Map<string, number>();
  for (const s of all) {
    const side = s.side === 'reactant' ? 1 : 2;
    for (const k of s.atoms.keys()) sides.set(k, (sides.get(k) ?? 0) | side);
  }
  for (const s of all) {
    for (const k of s.atoms.keys()) {
      if (sides.get(k) !== 3) {
        throw fail({ code: 'NO_BALANCE', message: `no balance: ${k} appears only among the ${s.side === 'reactant' ? 'reactants' : 'products'}` }, input);
      }
    }
  }
  // whole counts (nearly every equation) go the route of plain numbers; the fractions' matrix is made only when needed
  const whole = wholeMatrixOf(all, sides);
  const echelon = whole && wholeEchelon(whole.map((row) => row.slice()), all.length);
  let rows: Rational[][] | null = null;
  // with the whole-number route, the basis as fractions is made only when it is shown or solved for
  let fractions: Rational[][] | null = echelon ? null : nullSpace((rows = matrixOf(eq)), all.length);
  const basisNow = (): Rational[][] => (fractions ??= echelonBasis(echelon!, all.length));
  /** How many independent balances: the null space's dimension. */
  const dimension = fractions ? fractions.length : all.length - echelon!.pivots.length;
  if (dimension === 0) {
    throw fail({ code: 'NO_BALANCE', message: 'no set of coefficients balances every element and the charge' }, input);
  }
  const unique = dimension === 1;
  const shownBasis = unique ? [] : basisText(basisNow(), reactantTexts, productTexts);
  const written = all.map((s) => writtenOf(s, input));
  const anyWritten = all.some((s) => s.written !== null);
  const asWritten = (whole && wholeConserves(whole, written)) ?? conserves(rows ?? matrixOf(eq), written);
  const basisList = shownBasis.map((s, i) => `(${i + 1}) ${s}`).join('; ');
  let coefficients: Rational[];
  let settledBy: BalanceResult['settledBy'];

  if (options.fix !== undefined) {
    const fixed = fixedMap(options.fix, all, input);
    const solved = solveFixed(basisNow(), fixed);
    const names = [...fixed.keys()].map((i) => `${texts[i]}=${fixed.get(i)!.toString()}`).join(', ');
    if ('inconsistent' in solved) {
      throw fail({ code: 'NO_BALANCE', message: `no balance has the coefficients fixed (${names})${unique ? '' : `; the balances are combinations of ${basisList}`}` }, input);
    }
    if ('free' in solved) {
      throw fail({ code: 'NOT_UNIQUE', message: `the coefficients fixed (${names}) leave ${solved.free} more to choose: fix the coefficient of ${solved.free === 1 ? 'one more species' : `${solved.free} more species`}; the balances are combinations of ${basisList}` }, input);
    }
    coefficients = solved.c;
    settledBy = 'fixed';
    notes.push({ code: 'COEFFICIENTS_FIXED', message: `the coefficients of ${names} were fixed; the others follow from the balance of every element${all.some((s) => s.charge !== 0) ? ' and the charge' : ''}` });
  } else if (asWritten) {
    coefficients = written;
    settledBy = 'as written';
    if (anyWritten || !unique) notes.push({ code: 'BALANCED_AS_WRITTEN', message: 'the coefficients as written (1 where none is written) conserve every element and the charge: they are used' });
  } else if (unique) {
    // plain numbers when the whole-number route took it and they stay exact, BigInt otherwise
    const small = echelon && smallestWholeBalance(echelon, all.length);
    let ints: (number | bigint)[] = small ?? smallestIntegers(basisNow()[0]);
    if (ints.every((c) => c <= 0)) ints = ints.map((c) => (typeof c === 'number' ? 0 - c : -c));
    const zero = ints.findIndex((c) => c === 0 || c === 0n);
    if (zero >= 0) throw fail({ code: 'NO_BALANCE', message: `no balance in which every species takes part: ${texts[zero]} would get a coefficient of 0` }, input);
    const negative = ints.findIndex((c) => c < 0);
    if (negative >= 0) {
      const s = all[negative];
      throw fail({ code: 'NO_BALANCE', message: `no balance as written: ${s.text} would have to be on the other side (${s.side === 'reactant' ? 'a product' : 'a reactant'})` }, input);
    }
    coefficients = ints.map((c) => (typeof c === 'number' ? Rational.whole(c) : Rational.of(c)));
    settledBy = 'computed';
    if (anyWritten) notes.push({ code: 'COEFFICIENTS_REPLACED', message: 'the coefficients written in the equation do not balance it; the balanced ones are computed' });
  } else {
    throw fail({
      code: 'NOT_UNIQUE',
      message: `more than one independent balance (${dimension}); any combination of these balances it: ${basisList}. ${anyWritten ? 'The coefficients as written do not balance it. ' : ''}Write the coefficients in the equation, or fix those of chosen species`,
    }, input);
  }
  const bad = coefficients.findIndex((c) => c.sign() <= 0);
  if (bad >= 0) {
    throw fail({ code: 'NO_BALANCE', message: `no balance with the coefficients fixed in which every species takes part: ${texts[bad]} would get a coefficient of ${coefficients[bad].toString()}` }, input);
  }
  if (!unique) {
    notes.push({ code: 'NOT_UNIQUE_FROM_ATOMS', message: `not unique from atoms alone: ${dimension} independent balances (${basisList}); the coefficients ${settledBy === 'fixed' ? 'fixed' : 'as written'} choose one` });
  }
  const exactTexts = coefficients.map(coefficientText);
  const result: BalanceResult = {
    input,
    balanced: equationText(reactantTexts, productTexts, exactTexts),
    species: texts,
    formulas: all.map((s) => s.formula),
    reactantCount: eq.reactants.length,
    coefficients: coefficients.map((c) => c.toNumber()),
    exactCoefficients: exactTexts,
    balancedAsWritten: asWritten,
    unique,
    independentBalances: dimension,
    basis: shownBasis,
    settledBy,
    catalysts: eq.catalysts.map((c) => c.text),
    notes,
  };
  return { result, equation: eq, exact: coefficients };
}

/**
 * Balances an equation with exact rational arithmetic. Plain data: coefficients are numbers,
 * with the exact values as text beside them.
 *
 * @param input - the equation, reactants and products separated by an arrow (->, → or =), species by +; charges (Fe^3+), electrons (e-) and coefficients may be written.
 * @param options - fix (coefficients to hold when atoms alone do not settle the balance: 'written' or { SPECIES: N }), catalysts to leave out, and the formula options.
 * @returns the balanced equation as text, the coefficients as numbers and as exact text, whether it is unique and balanced as written, and the notes.
 * @throws PondusError: the codes of {@link parseEquation} (EMPTY_INPUT, INPUT_TOO_LONG, BAD_EQUATION, and a species' formula codes such as UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, AMBIGUOUS_READING, …); BAD_EQUATION for a written coefficient that is not positive or divides by zero; BAD_OPTION for a fixed coefficient or catalyst that is not a species of the equation, a coefficient fixed twice or not positive, or catalysts that leave a side empty; NO_BALANCE when no coefficients balance every element and the charge (or none with all species taking part, on the sides written, with the fixed ones); NOT_UNIQUE when the balance is not unique and nothing fixes it; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * balance('Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O').coefficients // [5, 1, 8, 5, 1, 4]
 * balance('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2').balancedAsWritten // true
 * balance('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2').unique // false
 */
export function balance(input: string, options: BalanceOptions = {}): BalanceResult {
  return balanceParsed(parseEquation(input, options), options).result;
}
