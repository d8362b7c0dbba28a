/**
 * Balances a chemical equation exactly: the null space of the element-and-charge
 * matrix over the rationals (BigInt), scaled to the smallest whole numbers.
 * Says when there is no balance, or more than one independent one.
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { amountText } from '../formula/amount.js';
import type { ParseOptions } from '../formula-parser/parse.js';
import { parseEquation, type Equation, type Species } from './equation.js';
import { nullSpace, Rational, smallestIntegers } from './rational.js';

export interface BalanceResult {
  input: string;
  /** The balanced equation as text: '2 H2 + O2 → 2 H2O'. */
  balanced: string;
  /** Species as written, in order. */
  species: string[];
  /** Smallest whole-number coefficients, in the order written. */
  coefficients: bigint[];
  equation: Equation;
  notes: Note[];
}

function matrixOf(eq: Equation): { rows: Rational[][]; labels: string[] } {
  const all = [...eq.reactants, ...eq.products];
  const keys: string[] = [];
  for (const s of all) for (const k of s.atoms.keys()) if (!keys.includes(k)) keys.push(k);
  const rows = keys.map((k) =>
    all.map((s) => {
      const n = s.atoms.get(k);
      const r = n === undefined ? Rational.ZERO : Rational.fromDecimal(amountText(n));
      return s.side === 'reactant' ? r : r.neg();
    }),
  );
  const labels = [...keys];
  if (all.some((s) => s.charge !== 0)) {
    rows.push(all.map((s) => Rational.of(BigInt(s.side === 'reactant' ? s.charge : -s.charge))));
    labels.push('charge');
  }
  return { rows, labels };
}

/**
 * Writes species with coefficients as an equation.
 *
 * @example
 * equationText(['H2', 'O2'], ['H2O'], [2n, 1n, 2n]) // '2 H2 + O2 → 2 H2O'
 */
export function equationText(reactants: string[], products: string[], coefficients: bigint[]): string {
  const term = (s: string, c: bigint) => (c === 1n ? s : `${c} ${s}`);
  const left = reactants.map((s, i) => term(s, coefficients[i])).join(' + ');
  const right = products.map((s, i) => term(s, coefficients[reactants.length + i])).join(' + ');
  return `${left} → ${right}`;
}

/**
 * Balances an equation with exact rational arithmetic.
 *
 * @example
 * balance('Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O').coefficients // [5n, 1n, 8n, 5n, 1n, 4n]
 */
export function balance(input: string, options: ParseOptions = {}): BalanceResult {
  const eq = parseEquation(input, options);
  const all: Species[] = [...eq.reactants, ...eq.products];
  const texts = all.map((s) => s.text);
  // an element on one side only can never balance: say which
  for (const s of all) {
    for (const k of s.atoms.keys()) {
      const other = all.filter((x) => x.side !== s.side && x.atoms.has(k));
      if (other.length === 0) {
        throw fail({ code: 'NO_BALANCE', message: `no balance: ${k} appears only among the ${s.side === 'reactant' ? 'reactants' : 'products'}` }, input);
      }
    }
  }
  const { rows } = matrixOf(eq);
  const basis = nullSpace(rows, all.length);
  const reactantTexts = eq.reactants.map((s) => s.text);
  const productTexts = eq.products.map((s) => s.text);
  if (basis.length === 0) {
    throw fail({ code: 'NO_BALANCE', message: 'no set of coefficients balances every element and the charge' }, input);
  }
  if (basis.length > 1) {
    const shown = basis.map((v) => {
      let ints = smallestIntegers(v);
      if (ints.every((c) => c <= 0n)) ints = ints.map((c) => -c);
      if (ints.some((c) => c < 0n)) return `coefficients in the order written: ${ints.join(', ')}`;
      const keep = (list: string[], offset: number) => list.map((t, i) => [t, ints[offset + i]] as const).filter(([, c]) => c !== 0n);
      const r = keep(reactantTexts, 0);
      const p = keep(productTexts, reactantTexts.length);
      return equationText(r.map(([t]) => t), p.map(([t]) => t), [...r.map(([, c]) => c), ...p.map(([, c]) => c)]);
    });
    throw fail({
      code: 'NOT_UNIQUE',
      message: `more than one independent balance (${basis.length}); any combination of these balances it: ${shown.map((s, i) => `(${i + 1}) ${s}`).join('; ')}`,
    }, input);
  }
  let ints = smallestIntegers(basis[0]);
  if (ints.every((c) => c <= 0n)) ints = ints.map((c) => -c);
  const zero = ints.findIndex((c) => c === 0n);
  if (zero >= 0) throw fail({ code: 'NO_BALANCE', message: `no balance in which every species takes part: ${texts[zero]} would get a coefficient of 0` }, input);
  const negative = ints.findIndex((c) => c < 0n);
  if (negative >= 0) {
    const s = all[negative];
    throw fail({ code: 'NO_BALANCE', message: `no balance as written: ${s.text} would have to be on the other side (${s.side === 'reactant' ? 'a product' : 'a reactant'})` }, input);
  }
  return { input, balanced: equationText(reactantTexts, productTexts, ints), species: texts, coefficients: ints, equation: eq, notes: eq.notes };
}

/**
 * Non-throwing {@link balance}.
 *
 * @example
 * safeBalance('H2 + O2').success // false (no arrow)
 */
export function safeBalance(input: string, options: ParseOptions = {}): SafeResult<BalanceResult> {
  return toSafe(() => balance(input, options));
}

/** The stable JSON shape of a balance result. */
export function balanceJson(r: BalanceResult) {
  const o: { input: string; balanced: string; species: string[]; coefficients: number[]; notes?: string[] } = {
    input: r.input,
    balanced: r.balanced,
    species: r.species,
    coefficients: r.coefficients.map((c) => Number(c)),
  };
  if (r.notes.length) o.notes = r.notes.map((n) => n.message);
  return o;
}
