/**
 * Gravimetric analysis: the mass of analyte from the mass of the weighed form,
 * and its mass fraction in the sample.
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS, measureAs } from '../calc/measure.js';
import type { MassOptions } from '../mass/formula-mass.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { conversionFactor, type ConversionFactor } from './conversion-factor.js';
import { over100Warning } from './warnings.js';

export interface GravimetricOptions extends MassOptions {
  /** Element the factor rests on, when the two share more than one. */
  element?: string;
  /** Mass of the weighed form: '0.2345 g'. */
  weighedMass?: string;
  /** Mass of the sample taken: '1.0012 g'. */
  sampleMass?: string;
}

export interface GravimetricResult {
  analyte: string;
  weighed: string;
  factor: ConversionFactor;
  analyteMass: Quantity | null;
  /** Percent by mass of analyte in the sample. */
  massPercent: Quantity | null;
  notes: Note[];
}

/**
 * Gravimetric factor, analyte mass and mass fraction.
 *
 * @param analyte - the species sought, as a formula ('Cl', 'Fe').
 * @param weighed - the form weighed, as a formula ('AgCl', 'Fe2O3').
 * @param options - the mass of the weighed form, the sample mass, the key element, the formula-reading options.
 * @returns the gravimetric factor, the analyte mass and its percent in the sample (results, textbook figures), with notes.
 * @throws PondusError: the formula codes (UNKNOWN_ELEMENT, …) for a formula that cannot be read; BAD_OPTION when the two share no element or the key element is not in both, or a sample mass comes without the weighed mass; BAD_AMOUNT for a mass that is not positive; BAD_NUMBER or UNKNOWN_UNIT for a mass that cannot be read; BAD_ARGUMENT for an argument of the wrong kind.
 * @example
 * displayQuantity(gravimetric('Cl', 'AgCl', { weighedMass: '0.2866 g' }).analyteMass, 'g').text // '0.07089 g' (a result: textbook figures)
 */
export function gravimetric(analyte: string, weighed: string, options: GravimetricOptions = {}): GravimetricResult {
  const factor = conversionFactor(analyte, weighed, options.element, options);
  let analyteMass: Quantity | null = null;
  let massPercent: Quantity | null = null;
  const notes: Note[] = [];
  if (options.weighedMass !== undefined) {
    const m = measureAs(options.weighedMass, [MASS], 'the mass of the weighed form', notes);
    if (m.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the mass of the weighed form must be positive' });
    analyteMass = multiply(m, quantity(factor.reported, null));
    if (options.sampleMass !== undefined) {
      const s = measureAs(options.sampleMass, [MASS], 'the sample mass', notes);
      if (s.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the sample mass must be positive' });
      massPercent = multiply(divide(analyteMass, s), quantity(exact(100), null));
      const w = over100Warning(massPercent.value, `${analyte.trim()} in the sample`, 'check the masses, the weighed form (dried and ignited to constant mass?) and the analyte');
      if (w) notes.push(w);
    }
  } else if (options.sampleMass !== undefined) {
    throw fail({ code: 'BAD_OPTION', message: 'a sample mass needs the mass of the weighed form too' });
  }
  notes.unshift(...formulaNotes(factor.sought, true), ...formulaNotes(factor.given, true));
  return { analyte, weighed, factor, analyteMass, massPercent, notes };
}
