/**
 * Exact rational numbers on BigInt, for balancing equations without floats.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { gcd as gcdOf, wholeGcd } from '../exact/gcd.js';

const WHOLE = /^[+-]?[0-9]{1,15}$/;
const SAFE = BigInt(Number.MAX_SAFE_INTEGER);

export class Rational {
  readonly num: bigint;
  readonly den: bigint;

  private constructor(num: bigint, den: bigint) {
    this.num = num;
    this.den = den;
  }

  /**
   * A normalised fraction num/den.
   *
   * @example
   * Rational.of(2n, 4n).toString() // '1/2'
   */
  static of(num: bigint, den = 1n): Rational {
    if (typeof num !== 'bigint' || typeof den !== 'bigint') {
      throw fail({ code: 'BAD_NUMBER', message: `a fraction takes whole numbers as BigInt (got ${typeof num} and ${typeof den}); use Rational.fromDecimal for text` });
    }
    if (den === 0n) throw fail({ code: 'DIVISION_BY_ZERO', message: 'a fraction with a zero denominator' });
    if (den < 0n) {
      num = -num;
      den = -den;
    }
    const g = gcd(num < 0n ? -num : num, den);
    return new Rational(g > 1n ? num / g : num, g > 1n ? den / g : den);
  }

  /**
   * An exact decimal as a fraction ('0.95' → 19/20; '1e21' and '2.5E-3' too).
   *
   * @example
   * Rational.fromDecimal('0.95').toString() // '19/20'
   * Rational.fromDecimal('1e21').toString() // '1000000000000000000000'
   */
  static fromDecimal(text: string): Rational {
    if (typeof text !== 'string' && typeof text !== 'number') throw fail({ code: 'BAD_NUMBER', message: `a decimal number must be given as text (got ${text === null ? 'null' : typeof text})` });
    // a whole number of up to 15 digits needs no Decimal
    if (typeof text === 'string' && WHOLE.test(text)) return new Rational(BigInt(text), 1n);
    let d: Decimal;
    try {
      d = new Decimal(text);
    } catch {
      d = new Decimal(NaN);
    }
    if (!d.isFinite()) throw fail({ code: 'BAD_NUMBER', message: `'${text}' is not a finite decimal number` });
    if (d.abs().gt('1e1000') || (!d.isZero() && d.abs().lt('1e-1000'))) throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: String(text), exponentLimit: 1000, reading: 'fraction', what: null }));
    if (!/^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(String(text).trim())) throw fail({ code: 'BAD_NUMBER', message: `'${text}' is not a decimal number` });
    const [num, den] = d.toFraction();
    return Rational.of(BigInt(num.toFixed()), BigInt(den.toFixed()));
  }

  /**
   * A whole number given as a plain safe integer.
   *
   * @example
   * Rational.whole(3).toString() // '3'
   */
  static whole(n: number): Rational {
    if (!Number.isSafeInteger(n)) throw fail({ code: 'BAD_NUMBER', message: `a whole number must be a safe integer (got ${String(n)})` });
    return new Rational(BigInt(n), 1n);
  }

  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);

  isZero(): boolean {
    return this.num === 0n;
  }
  sign(): number {
    return this.num > 0n ? 1 : this.num < 0n ? -1 : 0;
  }
  neg(): Rational {
    return new Rational(-this.num, this.den);
  }
  plus(o: Rational): Rational {
    operand(o);
    return Rational.of(this.num * o.den + o.num * this.den, this.den * o.den);
  }
  minus(o: Rational): Rational {
    return this.plus(o.neg());
  }
  times(o: Rational): Rational {
    operand(o);
    return Rational.of(this.num * o.num, this.den * o.den);
  }
  div(o: Rational): Rational {
    operand(o);
    if (o.num === 0n) throw fail({ code: 'DIVISION_BY_ZERO', message: 'division by zero' });
    return Rational.of(this.num * o.den, this.den * o.num);
  }
  /** The nearest float (for plain-data results). */
  toNumber(): number {
    // two safe integers: one float division, correctly rounded
    if (this.num <= SAFE && this.num >= -SAFE && this.den <= SAFE) return Number(this.num) / Number(this.den);
    return new Decimal(this.num.toString()).div(this.den.toString()).toNumber();
  }
  toString(): string {
    return this.den === 1n ? String(this.num) : `${this.num}/${this.den}`;
  }
}

function operand(o: unknown): void {
  if (!(o instanceof Rational)) throw fail({ code: 'BAD_NUMBER', message: 'arithmetic on fractions takes another fraction (Rational.of or Rational.fromDecimal)' });
}

/**
 * Greatest common divisor of two non-negative BigInts.
 *
 * @example
 * gcd(12n, 18n) // 6n
 */
export function gcd(a: bigint, b: bigint): bigint {
  if (typeof a !== 'bigint' || typeof b !== 'bigint') throw fail({ code: 'BAD_NUMBER', message: 'gcd takes two BigInts' });
  return gcdOf(a, b);
}

/** Least common multiple of two positive BigInts. */
export function lcm(a: bigint, b: bigint): bigint {
  return (a / gcd(a, b)) * b;
}

/**
 * Gauss–Jordan elimination over the rationals: the reduced row-echelon form of a copy of the matrix,
 * reduced over its first `columns` columns, and the pivot column of each leading row.
 *
 * @param matrix the rows (not changed)
 * @param columns how many leading columns to reduce (later columns, such as an augmented one, follow)
 * @returns the reduced rows and the pivot columns, in row order
 * @example
 * const r = (n) => Rational.of(BigInt(n))
 * reducedRowEchelon([[r(2), r(4)], [r(1), r(3)]], 2).pivots // [0, 1]
 */
export function reducedRowEchelon(matrix: readonly Rational[][], columns: number): { m: Rational[][]; pivots: number[] } {
  const m = matrix.map((row) => [...row]);
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < columns && r < m.length; c++) {
    let p = r;
    while (p < m.length && m[p][c].isZero()) p++;
    if (p === m.length) continue;
    [m[r], m[p]] = [m[p], m[r]];
    const inv = Rational.ONE.div(m[r][c]);
    m[r] = m[r].map((x) => x.times(inv));
    for (let i = 0; i < m.length; i++) {
      if (i === r || m[i][c].isZero()) continue;
      const f = m[i][c];
      m[i] = m[i].map((x, j) => x.minus(f.times(m[r][j])));
    }
    pivots.push(c);
    r++;
  }
  return { m, pivots };
}

/**
 * A basis of the null space of a rational matrix (rows × columns), by reduction
 * to reduced row echelon form. Each basis vector has one free column set to 1.
 *
 * @param matrix - the rows of the matrix, each with at least `columns` fractions.
 * @param columns - how many columns to reduce.
 * @returns the basis vectors of the null space, one for each free column (none when the matrix has full column rank).
 * @throws PondusError: BAD_NUMBER for a matrix that is not rows of fractions or a column count that is not a whole number of 0 or more; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = (n) => Rational.of(BigInt(n))
 * nullSpace([[r(2), r(0), r(-2)], [r(0), r(2), r(-1)]], 3).map((v) => v.map(String)) // [['1', '1/2', '1']]
 */
export function nullSpace(matrix: Rational[][], columns: number): Rational[][] {
  if (!Array.isArray(matrix) || !Number.isSafeInteger(columns) || columns < 0 || matrix.some((row) => !Array.isArray(row) || row.length < columns || row.slice(0, columns).some((x) => !(x instanceof Rational)))) {
    throw fail({ code: 'BAD_NUMBER', message: `a null space needs a matrix of fractions with ${columns} columns` });
  }
  return wholeNullSpace(matrix, columns) ?? rationalNullSpace(matrix, columns);
}

/**
 * The null space by elimination over the fractions (the general route of {@link nullSpace}).
 *
 * @example
 * const r = (n) => Rational.of(BigInt(n))
 * rationalNullSpace([[r(2), r(0), r(-2)], [r(0), r(2), r(-1)]], 3).map((v) => v.map(String)) // [['1', '1/2', '1']]
 */
export function rationalNullSpace(matrix: readonly Rational[][], columns: number): Rational[][] {
  const { m, pivots } = reducedRowEchelon(matrix, columns);
  return basisOf(columns, pivots, (i, f) => m[i][f].neg());
}

/**
 * The null space's basis from a reduced matrix: one vector for each free column, set to 1, with
 * the entry of each pivot column from `entry(row, free column)`.
 */
function basisOf(columns: number, pivots: readonly number[], entry: (row: number, free: number) => Rational): Rational[][] {
  const free: number[] = [];
  for (let c = 0; c < columns; c++) if (!pivots.includes(c)) free.push(c);
  return free.map((f) => {
    const v = new Array<Rational>(columns).fill(Rational.ZERO);
    v[f] = Rational.ONE;
    pivots.forEach((pc, i) => {
      v[pc] = entry(i, f);
    });
    return v;
  });
}

/** Whole entries below this size go the route of plain numbers. */
const SMALL_ENTRY = 2 ** 31;
const EXACT = 2 ** 53;

/**
 * The null space of a matrix of whole numbers by fraction-free elimination on plain numbers: each
 * row reduced by the greatest common divisor of its entries after each step, so that the entries
 * stay small. The reduced rows are the reduced row-echelon form's up to a factor per row, so the
 * basis (each free column set to 1) is the same. Null when an entry is not a small whole number
 * or a step would leave the safe integers: then the fractions' route is taken.
 *
 * @example
 * const r = (n) => Rational.of(BigInt(n))
 * wholeNullSpace([[r(2), r(0), r(-2)], [r(0), r(2), r(-1)]], 3)?.map((v) => v.map(String)) // [['1', '1/2', '1']]
 */
export function wholeNullSpace(matrix: readonly Rational[][], columns: number): Rational[][] | null {
  const m: number[][] = [];
  for (const row of matrix) {
    const out = new Array<number>(columns);
    for (let j = 0; j < columns; j++) {
      const x = row[j];
      if (x.den !== 1n || x.num >= 2147483648n || x.num <= -2147483648n) return null;
      out[j] = Number(x.num);
    }
    m.push(out);
  }
  return integerNullSpace(m, columns);
}

/**
 * {@link wholeNullSpace} on a matrix of plain whole numbers, each below 2^31 in size (the rows
 * are reduced in place): the same basis as {@link nullSpace}, or null when a step would leave the
 * safe integers.
 *
 * @example
 * integerNullSpace([[2, 0, -2], [0, 2, -1]], 3)?.map((v) => v.map(String)) // [['1', '1/2', '1']]
 */
export function integerNullSpace(m: number[][], columns: number): Rational[][] | null {
  const e = wholeEchelon(m, columns);
  return e && echelonBasis(e, columns);
}

/** A whole-number matrix reduced by {@link wholeEchelon}: each pivot row is the reduced row-echelon form's row times its pivot entry. */
export interface WholeEchelon {
  m: number[][];
  /** The pivot column of each leading row, in row order. */
  pivots: number[];
}

/**
 * The fraction-free elimination of {@link wholeNullSpace} on a matrix of plain whole numbers,
 * each below 2^31 in size, reduced in place; null when a step would leave the safe integers.
 *
 * @example
 * wholeEchelon([[2, 0, -2], [0, 2, -1]], 3)?.pivots // [0, 1]
 */
export function wholeEchelon(m: number[][], columns: number): WholeEchelon | null {
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < columns && r < m.length; c++) {
    let p = r;
    while (p < m.length && m[p][c] === 0) p++;
    if (p === m.length) continue;
    const pivot = m[p];
    m[p] = m[r];
    m[r] = pivot;
    const a = pivot[c];
    for (let i = 0; i < m.length; i++) {
      const row = m[i];
      const b = row[c];
      if (i === r || b === 0) continue;
      let g = 0;
      for (let j = 0; j < columns; j++) {
        const x = a * row[j] - b * pivot[j];
        // each product below 2^53 is exact (and one that is not computes as 2^53 or more)
        if (!(Math.abs(a * row[j]) < EXACT && Math.abs(b * pivot[j]) < EXACT && Math.abs(x) < SMALL_ENTRY)) return null;
        row[j] = x;
        g = wholeGcd(g, x);
      }
      if (g > 1) for (let j = 0; j < columns; j++) row[j] /= g;
    }
    pivots.push(c);
    r++;
  }
  return { m, pivots };
}

/**
 * The null space's basis from a reduced whole-number matrix, as fractions (what {@link nullSpace} gives).
 *
 * @example
 * const e = wholeEchelon([[2, 0, -2], [0, 2, -1]], 3)
 * echelonBasis(e, 3).map((v) => v.map(String)) // [['1', '1/2', '1']]
 */
export function echelonBasis({ m, pivots }: WholeEchelon, columns: number): Rational[][] {
  return basisOf(columns, pivots, (i, f) => (m[i][f] === 0 ? Rational.ZERO : Rational.of(BigInt(-m[i][f]), BigInt(m[i][pivots[i]]))));
}

/**
 * When the null space has one dimension: its basis vector scaled to the smallest whole numbers,
 * as plain numbers (what {@link smallestIntegers} gives for it); null when it has not one
 * dimension, or a step would leave the safe integers.
 *
 * @example
 * const e = wholeEchelon([[2, 0, -2], [0, 2, -1]], 3)
 * smallestWholeBalance(e, 3) // [2, 1, 2]
 */
export function smallestWholeBalance({ m, pivots }: WholeEchelon, columns: number): number[] | null {
  if (columns - pivots.length !== 1) return null;
  let f = 0;
  while (f < pivots.length && pivots[f] === f) f++;
  const num = new Array<number>(columns).fill(0);
  const den = new Array<number>(columns).fill(1);
  num[f] = 1;
  let l = 1;
  for (let i = 0; i < pivots.length; i++) {
    let a = -m[i][f];
    let b = m[i][pivots[i]];
    if (a === 0) continue;
    if (b < 0) {
      a = -a;
      b = -b;
    }
    const g = wholeGcd(a, b);
    a /= g;
    b /= g;
    num[pivots[i]] = a;
    den[pivots[i]] = b;
    l = (l / wholeGcd(l, b)) * b;
    if (!(l < EXACT)) return null;
  }
  const out = new Array<number>(columns);
  let g = 0;
  for (let j = 0; j < columns; j++) {
    const x = num[j] * (l / den[j]);
    if (!(Math.abs(x) < EXACT)) return null;
    out[j] = x;
    g = wholeGcd(g, x);
  }
  if (g > 1) for (let j = 0; j < columns; j++) out[j] /= g;
  return out;
}

/**
 * Scales a rational vector to the smallest whole numbers with the same ratios.
 *
 * @param v - the fractions to scale.
 * @returns the smallest whole numbers in the same ratios, signs kept.
 * @throws PondusError: BAD_NUMBER for a list that is not of fractions; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * smallestIntegers([Rational.of(1n, 2n), Rational.ONE]) // [1n, 2n]
 */
export function smallestIntegers(v: Rational[]): bigint[] {
  if (!Array.isArray(v) || v.some((x) => !(x instanceof Rational))) throw fail({ code: 'BAD_NUMBER', message: 'smallestIntegers takes a list of fractions' });
  let l = 1n;
  for (const x of v) l = lcm(l, x.den);
  const ints = v.map((x) => (x.num * l) / x.den);
  let g = 0n;
  for (const x of ints) g = gcd(g, x < 0n ? -x : x);
  return g > 1n ? ints.map((x) => x / g) : ints;
}
