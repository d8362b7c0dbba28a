/**
 * Converting a value between an element and its oxide basis (P ↔ P2O5,
 * K ↔ K2O, Si ↔ SiO2): the factor, and a value given on one basis expressed on
 * the other. The value is a measurement or a label figure, so the converted
 * value is a result with textbook significant figures.
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS, PURE, measureAs } from '../calc/measure.js';
import type { MassOptions } from '../mass/formula-mass.js';
import { multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { conversionFactor, type ConversionFactor } from './conversion-factor.js';
import { over100Warning } from './warnings.js';

export interface BasisOptions extends MassOptions {
  /** The element the conversion rests on, when the two share several. */
  element?: string;
  /** A value on the `from` basis: '12.5 %', '3.40 g', '1300 ppm'. */
  value?: string;
}

export interface BasisResult {
  factor: ConversionFactor;
  /** The value given (null when only the factor was asked for). */
  value: Quantity | null;
  /** The value on the other basis (a result). */
  converted: Quantity | null;
  notes: Note[];
}

/**
 * A value on the basis `from`, converted to the basis `to`.
 *
 * @param from - the basis the value is given on, as a formula ('P2O5').
 * @param to - the basis to convert to, as a formula ('P').
 * @param options - the value (a mass or a percent), the key element, the formula-reading options.
 * @returns the conversion factor, the value given and the converted value (a result), with notes.
 * @throws PondusError: the formula codes (UNKNOWN_ELEMENT, …) for a formula that cannot be read; BAD_OPTION when the two share no element or the key element is not in both; BAD_AMOUNT for a negative value; BAD_NUMBER or UNKNOWN_UNIT for a value that cannot be read; BAD_ARGUMENT for an argument of the wrong kind.
 * @example
 * displayQuantity(convertBasis('P2O5', 'P', { value: '12.5 %' }).converted, '%').text // '5.46 %'
 */
export function convertBasis(from: string, to: string, options: BasisOptions = {}): BasisResult {
  const factor = conversionFactor(to, from, options.element, options);
  const notes: Note[] = [];
  let value: Quantity | null = null;
  let converted: Quantity | null = null;
  if (options.value !== undefined) {
    value = measureAs(options.value, [MASS, PURE], 'the value', notes);
    if (value.value.lt(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the value cannot be negative' });
    converted = multiply(value, quantity(factor.reported, null));
    if (value.unit?.symbol === '%') {
      const given = over100Warning(value.value.times(100), `the value on the ${factor.given.input} basis`, 'check the value');
      if (given) notes.push(given);
      else {
        const w = over100Warning(converted.value.times(100), `the value on the ${factor.sought.input} basis`, `no material holds more than 100 % ${factor.sought.input}; check the value and the direction of the conversion (--to)`);
        if (w) notes.push(w);
      }
    }
  }
  notes.unshift(...formulaNotes(factor.given, true), ...formulaNotes(factor.sought, true));
  return { factor, value, converted, notes };
}
