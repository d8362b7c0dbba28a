import { Decimal } from './decimal.js';

/**
 * Exact fixed-point arithmetic for the hot path: masses are held as integers in
 * units of 10^-12 u (pico-daltons). Every tabulated atomic weight and AME2020
 * nuclide mass has at most 12 decimals, so the scaled values are exact integers,
 * and sums of integer multiples stay exact while they are safe integers
 * (up to about 9000 g/mol); beyond that callers fall back to Decimal.
 */
export const SCALE_DIGITS = 12;
/** 10^12 as a Decimal, made on first use (start-up makes no Decimal it does not need). */
let SCALE: Decimal | undefined;

/**
 * Converts a plain decimal string with at most 12 decimals to scaled integer units.
 *
 * @example
 * toScaled('1.008') // 1008000000000
 */
export function toScaled(text: string): number {
  const neg = text.startsWith('-');
  const t = neg ? text.slice(1) : text;
  const dot = t.indexOf('.');
  const int = dot < 0 ? t : t.slice(0, dot);
  const frac = dot < 0 ? '' : t.slice(dot + 1);
  if (frac.length > SCALE_DIGITS) throw new RangeError(`more than ${SCALE_DIGITS} decimals: ${text}`);
  const n = Number(int + frac.padEnd(SCALE_DIGITS, '0'));
  if (!Number.isSafeInteger(n)) throw new RangeError(`value out of the exact range: ${text}`);
  return neg ? -n : n;
}

/**
 * Converts scaled integer units back to an exact Decimal.
 *
 * @example
 * fromScaled(18015000000000).toString() // '18.015'
 */
export function fromScaled(n: number): Decimal {
  return new Decimal(n).div((SCALE ??= new Decimal(10).pow(SCALE_DIGITS)));
}

/**
 * The tables {@link scaledToString} writes from once a run has formatted enough masses to be a
 * batch: the texts of 0 to 999 as three digits ('007') and the same without trailing zeros ('07'
 * for 70, '' for 0), and the texts of whole numbers below 10,000 (the integer part of most
 * masses), each made on first use. A command that formats a few masses never builds them: the
 * 2,000 strings and the 10,000-slot array were a third of what start-up allocated.
 */
interface DigitTables {
  groups: string[];
  trimmed: string[];
  integers: (string | undefined)[];
  /** The same with the decimal point after them ('18.'): one join less for a mass with a fraction. */
  pointed: (string | undefined)[];
}
let tables: DigitTables | undefined;
/** Masses formatted without the tables; past {@link TABLES_AFTER}, the tables are built. */
let untabled = 0;
const TABLES_AFTER = 64;

function buildTables(): DigitTables {
  const groups: string[] = [];
  const trimmed: string[] = [];
  for (let i = 0; i < 1000; i++) {
    const g = (i < 10 ? '00' : i < 100 ? '0' : '') + i;
    groups.push(g);
    trimmed.push(i === 0 ? '' : i % 100 === 0 ? g.slice(0, 1) : i % 10 === 0 ? g.slice(0, 2) : g);
  }
  return { groups, trimmed, integers: new Array(10000), pointed: new Array(10000) };
}

/** {@link scaledToString} without the tables: the twelve-digit fraction, its trailing zeros cut. */
function untabledToString(n: number): string {
  const abs = n < 0 ? -n : n;
  const int = Math.floor(abs / 1e12);
  const frac = abs - int * 1e12; // exact: both are integers below 2^53
  const head = (n < 0 ? '-' : '') + String(int);
  if (frac === 0) return head;
  const digits = String(frac).padStart(SCALE_DIGITS, '0');
  let end = SCALE_DIGITS;
  while (digits.charCodeAt(end - 1) === 48) end--;
  return head + '.' + digits.slice(0, end);
}

/**
 * Formats scaled integer units as a plain decimal string without trailing zeros, exactly.
 * In a batch, the fraction is cut into four groups of three digits, each written from a table, so
 * a mass's text takes two to four joins of short strings and no number-to-text conversion; the
 * first few masses of a run are written directly, which gives the same text without the tables.
 *
 * @example
 * scaledToString(18015000000000) // '18.015'
 * scaledToString(-1500000) // '-0.0000015'
 */
export function scaledToString(n: number): string {
  if (tables === undefined) {
    if (untabled < TABLES_AFTER) {
      untabled++;
      return untabledToString(n);
    }
    tables = buildTables();
  }
  const { groups: GROUPS, trimmed: GROUPS_TRIMMED, integers: INTEGERS, pointed: POINTED } = tables;
  const abs = n < 0 ? -n : n;
  const int = Math.floor(abs / 1e12);
  const frac = abs - int * 1e12; // exact: both are integers below 2^53
  if (frac === 0) {
    const digits = int < 10000 ? (INTEGERS[int] ??= String(int)) : String(int);
    return n < 0 ? '-' + digits : digits;
  }
  const head = n >= 0 && int < 10000 ? (POINTED[int] ??= String(int) + '.') : (n < 0 ? '-' : '') + String(int) + '.';
  const a = Math.floor(frac / 1e9);
  let rest = frac - a * 1e9;
  const b = Math.floor(rest / 1e6);
  rest -= b * 1e6;
  const c = Math.floor(rest / 1e3);
  const d = rest - c * 1e3;
  if (d !== 0) return head + GROUPS[a] + GROUPS[b] + GROUPS[c] + GROUPS_TRIMMED[d];
  if (c !== 0) return head + GROUPS[a] + GROUPS[b] + GROUPS_TRIMMED[c];
  if (b !== 0) return head + GROUPS[a] + GROUPS_TRIMMED[b];
  return head + GROUPS_TRIMMED[a];
}

/**
 * The JSON text of scaled integer units: the same text JSON.stringify gives the
 * nearest double, produced faster when the value has at most 15 significant digits
 * (where the exact decimal is that double's shortest form).
 *
 * @example
 * scaledToJson(18010564683056) // '18.010564683056'
 */
export function scaledToJson(n: number): string {
  // below 1 (where JavaScript may write 1e-7) and past 15 digits, the double's own text is the answer
  if (Math.abs(n) < 1e12) return String(n / 1e12);
  const text = scaledToString(n);
  const digits = text.length - (n < 0 ? 2 : 1);
  return digits <= 15 ? text : String(n / 1e12);
}

/**
 * Exact decimal text of an integer count of 10^-decimals units (a BigInt), without trailing zeros.
 *
 * @example
 * bigScaledToString(18010016103146935n, 15) // '18.010016103146935'
 */
export function bigScaledToString(n: bigint, decimals: number): string {
  const neg = n < 0n;
  let t = (neg ? -n : n).toString();
  if (t.length <= decimals) t = '0'.repeat(decimals - t.length + 1) + t;
  const int = t.slice(0, t.length - decimals);
  let frac = t.slice(t.length - decimals);
  let end = frac.length;
  while (end > 0 && frac.charCodeAt(end - 1) === 48) end--;
  frac = frac.slice(0, end);
  return `${neg ? '-' : ''}${int}${frac ? `.${frac}` : ''}`;
}
