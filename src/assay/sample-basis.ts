/**
 * A result on another basis of the sample: as is, dried (after loss on
 * drying), anhydrous (water by Karl Fischer removed), solvent-free (residual
 * solvent removed), or anhydrous and solvent-free. A basis with a fraction r
 * removed relates to the as-is value by value(basis) = value(as is) ÷ (1 − r),
 * so value(to) = value(from) × (1 − r_from) ÷ (1 − r_to). 1 is exact; the
 * difference 1 − r keeps the decimals of r (OpenStax Chemistry 2e §1.5).
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { PURE } from '../calc/measure.js';
import { exact } from '../sigfig/measured.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import { add, divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { readPositive, readShare } from './read-quantity.js';

export type SampleBasis = 'as-is' | 'dried' | 'anhydrous' | 'solvent-free' | 'anhydrous-solvent-free';

export const SAMPLE_BASES: readonly SampleBasis[] = Object.freeze(['as-is', 'dried', 'anhydrous', 'solvent-free', 'anhydrous-solvent-free']);

/** What the sample loses or holds, as read (fractions, pure numbers). */
export interface SampleContent {
  /** Loss on drying: '0.45 %'. */
  loss?: string;
  /** Water content (Karl Fischer): '0.32 %'. */
  water?: string;
  /** Residual solvent: '0.10 %'. */
  solvent?: string;
}

export interface BasisConversion {
  from: SampleBasis;
  to: SampleBasis;
  /** The value as given. */
  value: Quantity;
  /** The value on the new basis. */
  converted: Quantity;
  /** The multiplying factor (1 − r_from) ÷ (1 − r_to). */
  factor: Quantity;
  notes: Note[];
}

const ONE = quantity(exact(1), null);

/**
 * Reads a basis name; throws BAD_OPTION for an unknown one.
 *
 * @param text - a basis name: 'as-is', 'dried', 'anhydrous' or 'solvent-free'.
 * @returns the basis.
 * @throws PondusError: BAD_OPTION for an unknown basis (the message lists the known ones); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readBasis('dried') // 'dried'
 */
export function readBasis(text: string): SampleBasis {
  const t = text.trim().toLowerCase().replace(/[\s_]+/g, '-');
  const basis = t === 'as-is' || t === 'asis' ? 'as-is' : t === 'dry' ? 'dried' : t;
  if (!(SAMPLE_BASES as readonly string[]).includes(basis)) throw fail({ code: 'BAD_OPTION', message: `unknown basis '${text}': choose one of ${SAMPLE_BASES.join(', ')}` }, text);
  return basis as SampleBasis;
}

/** The contents each basis removes: what converting to or from it reads. */
export const CONTENT_FOR: Readonly<Record<SampleBasis, readonly (keyof SampleContent)[]>> = {
  'as-is': [],
  dried: ['loss'],
  anhydrous: ['water'],
  'solvent-free': ['solvent'],
  'anhydrous-solvent-free': ['water', 'solvent'],
};

/**
 * The contents given that none of the bases removes: what a conversion between them would ignore.
 *
 * @param content - the loss on drying, water and solvent contents given.
 * @param bases - the bases converted between (none for a value as is).
 * @returns the keys of the contents given and not used, in the order loss, water, solvent.
 * @example
 * unusedContents({ loss: '0.5 %', water: '4.8 %' }, 'as-is', 'dried') // ['water']
 */
export function unusedContents(content: SampleContent, ...bases: SampleBasis[]): (keyof SampleContent)[] {
  return (['loss', 'water', 'solvent'] as const).filter((k) => content[k] !== undefined && !bases.some((b) => CONTENT_FOR[b].includes(k)));
}

const NAMES: Record<SampleBasis, string> = { 'as-is': 'as-is', dried: 'dried', anhydrous: 'anhydrous', 'solvent-free': 'solvent-free', 'anhydrous-solvent-free': 'anhydrous and solvent-free' };

/**
 * The fraction removed for a basis (null for as is), read from the content, with a note of the reading.
 *
 * @param basis - the basis.
 * @param content - the loss on drying, water or solvent content, as percentages.
 * @param notes - where the note of the reading is added.
 * @returns the fraction the basis removes, or null for as is.
 * @throws PondusError: USAGE when the content the basis needs is not given; BAD_AMOUNT for a content of 100 % or more; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * removedFraction('dried', { loss: '0.50 %' }, [])?.value.toString() // '0.005'
 */
export function removedFraction(basis: SampleBasis, content: SampleContent, notes: Note[]): Quantity | null {
  const need = (key: keyof SampleContent, label: string): Quantity => {
    const text = content[key];
    if (text === undefined) throw fail({ code: 'USAGE', message: `the ${NAMES[basis]} basis needs the ${label}: give \`${key}\` (e.g. \`${key}: '0.50 %'\`)`, options: [key] });
    return readShare(text, `the ${label}`, notes, { bare: 'refuse', allowZero: true, below: true });
  };
  switch (basis) {
    case 'as-is':
      return null;
    case 'dried':
      return need('loss', 'loss on drying');
    case 'anhydrous':
      return need('water', 'water content');
    case 'solvent-free':
      return need('solvent', 'residual solvent');
    case 'anhydrous-solvent-free':
      return add(need('water', 'water content'), need('solvent', 'residual solvent'));
  }
}

/**
 * Reads a result given as a share of the sample (an assay, an impurity): '99.1 %', '991 mg/g'. A
 * number with no unit is refused: '0.991' may be 0.991 % or 99.1 %.
 *
 * @param text - the result as written.
 * @param notes - where the notes of the reading go.
 * @returns the result as a fraction of 1 (it may be above 1: an assay within its method's uncertainty).
 * @throws PondusError: BAD_AMOUNT for a number with no unit, zero or a negative result; a measurement that cannot be read (BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE).
 * @example
 * readResultShare('99.1 %', []).value.toString() // '0.991'
 */
export function readResultShare(text: string, notes: Note[]): Quantity {
  const q = readPositive(text, [PURE], 'the result', notes);
  if (!q.unit) {
    const t = text.trim();
    const asFraction = q.value.lte(1) ? `; for a fraction ${t} of 1 write '${q.value.times(100).toFixed()} %'` : '';
    throw fail({ code: 'BAD_AMOUNT', message: `the result ${t} has no unit`, hint: `for per cent write '${t} %'${asFraction}` }, text);
  }
  return q;
}

const pct = (q: Quantity) => displayQuantity(q, '%').text;

/**
 * Converts a result (a fraction, e.g. an assay) from one basis of the sample to another.
 *
 * @param valueText - the result: '99.1 %', or a Quantity (a fraction).
 * @param from - the basis it is on ('as-is', 'dried', 'anhydrous', 'solvent-free').
 * @param to - the basis wanted.
 * @param content - what the other basis removes: `loss` (on drying), `water` or `solvent`, as percentages.
 * @returns the value given, the factor and the converted value (a result), with a note of the conversion.
 * @throws PondusError: a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_AMOUNT for a content of 100 % or more; USAGE when from and to are the same, the content a basis needs is not given, or a content is given that neither basis removes; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = convertSampleBasis('99.1 %', 'as-is', 'dried', { loss: '0.50 %' })
 * displayQuantity(r.converted, '%').text // '99.6 %'
 */
export function convertSampleBasis(valueText: string | Quantity, from: SampleBasis, to: SampleBasis, content: SampleContent): BasisConversion {
  const notes: Note[] = [];
  const value = typeof valueText === 'string' ? readResultShare(valueText, notes) : valueText;
  if (from === to) throw fail({ code: 'USAGE', message: `the result is already on the ${NAMES[to]} basis: choose another \`to\``, options: ['to'] });
  const unused = unusedContents(content, from, to);
  if (unused.length) {
    const names = unused.map((k) => `\`${k}\``).join(' and ');
    throw fail({ code: 'USAGE', message: `${names} would be ignored converting from the ${NAMES[from]} to the ${NAMES[to]} basis: leave ${unused.length === 1 ? 'it' : 'them'} out, or give the basis ${unused.length === 1 ? 'it belongs' : 'they belong'} to`, options: [...unused] });
  }
  const rFrom = removedFraction(from, content, notes);
  const rTo = removedFraction(to, content, notes);
  const keepFrom = rFrom ? subtract(ONE, rFrom) : ONE;
  const keepTo = rTo ? subtract(ONE, rTo) : ONE;
  const factor = divide(keepFrom, keepTo);
  const converted = multiply(value, factor);
  const removed = (b: SampleBasis, r: Quantity | null) => (r ? `${NAMES[b]} (${pct(r)} removed)` : NAMES[b]);
  notes.push({ code: 'BASIS_CONVERTED', message: `from the ${removed(from, rFrom)} to the ${removed(to, rTo)} basis: × ${rFrom ? `(100 % − ${pct(rFrom)})` : '100 %'} ÷ ${rTo ? `(100 % − ${pct(rTo)})` : '100 %'}` });
  if (converted.value.gt(1)) notes.push({ code: 'ABOVE_100_PERCENT', message: `the result on the ${NAMES[to]} basis is above 100 % (${pct(converted)}); this is possible for an assay within its method's uncertainty` });
  return { from, to, value, converted, factor, notes };
}
