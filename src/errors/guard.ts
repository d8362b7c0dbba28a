import { Decimal } from '../exact/decimal.js';
import { PondusError, toSafe, type SafeResult } from './pondus-error.js';

/**
 * The kind of value a public function's parameter takes, checked at the public API's boundary:
 * `text` a string; `tree` a string or a parsed formula (an object); `numeric` a number, Decimal or string;
 * `notation` a string or a read ion notation; `number` a number; `decimal` a
 * Decimal; `object` a non-null object (an options object, or a value the library returned);
 * `options` an options object whose `weights` and `rounding`, when given, are among their values;
 * `posint` a whole number of at least 1; `rounding` 'half-even' or 'half-up'; `array`, `map`,
 * `function`, `bigint`, `iterable`; `any` is not checked. A trailing `?` also accepts undefined (an
 * omitted argument); `|null` also accepts null.
 */
export type ParamKind =
  | `${'text' | 'tree' | 'numeric' | 'notation' | 'number' | 'posint' | 'rounding' | 'decimal' | 'object' | 'options' | 'array' | 'map' | 'function' | 'bigint' | 'iterable'}${'' | '?' | '|null' | '|null?'}`
  | 'any';

const NAMES: Record<string, string> = {
  text: 'a string',
  tree: 'a formula (a string or a parsed formula)',
  numeric: 'a number, a Decimal or a numeric string',
  notation: 'an ion notation (a string or a read notation)',
  number: 'a number',
  posint: 'a whole number of at least 1',
  rounding: "'half-even' or 'half-up'",
  options: 'an options object',
  decimal: 'a Decimal',
  object: 'an object',
  array: 'an array',
  map: 'a Map',
  function: 'a function',
  bigint: 'a bigint',
  iterable: 'an iterable (an array, a Map, a Set or a string)',
};

function describe(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'an array';
  if (v instanceof Map) return 'a Map';
  if (typeof v === 'number') return Number.isNaN(v) ? 'NaN' : `the number ${v}`;
  if (typeof v === 'string') return 'a string';
  if (typeof v === 'object') return 'an object';
  return typeof v === 'undefined' ? 'nothing (undefined)' : `a ${typeof v}`;
}

function fits(base: string, v: unknown): boolean {
  switch (base) {
    case 'text':
      return typeof v === 'string';
    case 'tree':
      return typeof v === 'string' || (typeof v === 'object' && v !== null && Array.isArray((v as { components?: unknown }).components));
    case 'numeric':
      return typeof v === 'number' || typeof v === 'string' || Decimal.isDecimal(v);
    case 'notation':
      return typeof v === 'string' || (typeof v === 'object' && v !== null && Array.isArray((v as { terms?: unknown }).terms));
    case 'number':
      return typeof v === 'number';
    case 'posint':
      return typeof v === 'number' && Number.isSafeInteger(v) && v >= 1;
    case 'rounding':
      return v === 'half-even' || v === 'half-up';
    case 'bigint':
      return typeof v === 'bigint';
    case 'decimal':
      return Decimal.isDecimal(v);
    case 'object':
    case 'options':
      return typeof v === 'object' && v !== null && !Array.isArray(v);
    case 'array':
      return Array.isArray(v);
    case 'map':
      return v instanceof Map;
    case 'function':
      return typeof v === 'function';
    case 'iterable':
      return v !== null && v !== undefined && typeof (v as { [Symbol.iterator]?: unknown })[Symbol.iterator] === 'function';
    default:
      return true;
  }
}

/** The options every function that takes them reads the same way, with the values they may have. */
const OPTION_VALUES: Record<string, readonly string[]> = {
  weights: ['standard', 'abridged'],
  rounding: ['half-even', 'half-up'],
};

function checkOptions(name: string, i: number, o: Record<string, unknown>): void {
  for (const [key, values] of Object.entries(OPTION_VALUES)) {
    const v = o[key];
    if (v === undefined || (typeof v === 'string' && values.includes(v))) continue;
    const shown = typeof v === 'string' ? `'${v.length > 40 ? v.slice(0, 40) + '…' : v}'` : describe(v);
    throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: option ${key} (argument ${i + 1}) must be ${values.map((x) => `'${x}'`).join(' or ')}, not ${shown}` }]);
  }
}

/** Throws a BAD_ARGUMENT PondusError when an argument is not of its parameter's kind. */
function checkArguments(name: string, kinds: readonly ParamKind[], args: readonly unknown[]): void {
  for (let i = 0; i < kinds.length; i++) {
    const kind = kinds[i];
    if (kind === 'any') continue;
    const v = args[i];
    const optional = kind.endsWith('?');
    const nullable = kind.includes('|null');
    if (v === undefined && optional) continue;
    if (v === null && nullable) continue;
    const base = kind.replace(/\|null|\?/g, '');
    if (fits(base, v)) {
      if (base === 'options') checkOptions(name, i, v as Record<string, unknown>);
      continue;
    }
    const wanted = NAMES[base] + (nullable ? ' or null' : '');
    throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: argument ${i + 1} must be ${wanted}, not ${describe(v)}` }]);
  }
}

/**
 * What an error that is not a PondusError becomes when it reaches the public API's boundary: a
 * division by zero keeps its meaning (DIVISION_BY_ZERO), a value decimal.js cannot read as a number
 * is BAD_ARGUMENT; anything else is a PondusError with code
 * INTERNAL_ERROR naming the function and the original message (kept as `cause`).
 */
function asPondusError(name: string, e: unknown): PondusError {
  if (e instanceof PondusError) return e;
  const message = e instanceof Error ? e.message : String(e);
  const invalid = /^\[DecimalError\] Invalid argument: (.*)$/s.exec(message);
  const err = /division by zero/i.test(message)
    ? new PondusError([{ code: 'DIVISION_BY_ZERO', message: `${name}: division by zero` }])
    : invalid
      ? new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: not a number: '${invalid[1].slice(0, 40)}'` }])
      : new PondusError([{ code: 'INTERNAL_ERROR', message: `${name}: internal error (please report it): ${message}` }]);
  (err as { cause?: unknown }).cause = e;
  return err;
}

const GUARDED = new WeakSet<object>();

/**
 * Wraps a public function so that it answers or throws a {@link PondusError} and nothing else: its
 * arguments are checked against `kinds` first (BAD_ARGUMENT naming the argument), and any other
 * error thrown inside becomes a PondusError (DIVISION_BY_ZERO or INTERNAL_ERROR, the original as
 * `cause`). The wrapper has the function's type and name.
 *
 * @param name - the function's public name, used in messages.
 * @param fn - the function.
 * @param kinds - the kind of each parameter, in order.
 * @returns the guarded function.
 * @throws never itself; the returned function throws only PondusError (BAD_ARGUMENT, INTERNAL_ERROR, or the function's own codes).
 * @example
 * const half = guarded('half', (x) => x / 2, ['number'])
 * half(3) // 1.5
 * let code = ''
 * try { half('3') } catch (e) { if (e instanceof PondusError) code = e.first.code }
 * code // 'BAD_ARGUMENT'
 */
export function guarded<F extends (...args: never[]) => unknown>(name: string, fn: F, kinds: readonly ParamKind[]): F {
  const wrapper = function (this: unknown, ...args: unknown[]) {
    checkArguments(name, kinds, args);
    try {
      return fn.apply(this, args as never[]);
    } catch (e) {
      throw asPondusError(name, e);
    }
  };
  Object.defineProperty(wrapper, 'name', { value: name });
  Object.defineProperty(wrapper, 'length', { value: fn.length });
  GUARDED.add(wrapper);
  return wrapper as unknown as F;
}

/**
 * Whether a function was made by {@link guarded} (the public API's tests check every export).
 *
 * @example
 * isGuarded(guarded('f', () => 1, [])) // true
 * isGuarded(() => 1) // false
 */
export function isGuarded(fn: unknown): boolean {
  return typeof fn === 'function' && GUARDED.has(fn);
}

/**
 * The non-throwing form of a function: `{ success: true, data }`, or `{ success: false, error }`
 * for a PondusError. Every `safe…` function of the public API is made with it from the throwing
 * function, so the two take the same arguments and cannot drift apart.
 *
 * @param fn - a function that throws only PondusError (a {@link guarded} one).
 * @returns the same function returning a SafeResult.
 * @throws nothing for a guarded function: every error becomes `{ success: false }`.
 * @example
 * const half = safely(guarded('half', (x) => x / 2, ['number']))
 * half(3) // { success: true, data: 1.5 }
 * half(null).success // false
 */
export function safely<A extends unknown[], R>(fn: (...args: A) => R): (...args: A) => SafeResult<R> {
  return (...args: A) => toSafe(() => fn(...args));
}
