/**
 * ppm and ppb of a dilute aqueous solution read as mass per volume: 1 ppm as 1 mg/L and 1 ppb as
 * 1 µg/L, which holds where the solution's density is 1.00 g/mL (common practice for trace
 * standards). The one place both readings are made, each with its note.
 */
import type { Note } from '../errors/issue.js';
import { exact } from '../sigfig/measured.js';
import { multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';

/**
 * A ppm or ppb fraction as mass per volume, with the note naming the reading; null for any
 * other text.
 *
 * @param q - the fraction as read (a pure number: 1 ppm is 10⁻⁶).
 * @param text - the text it was read from, whose unit decides.
 * @param notes - where the note of the reading is added.
 * @returns the mass concentration and the unit to show it in, or null.
 * @example
 * partsPerAsMassPerVolume(measure('5.0 ppm'), '5.0 ppm', [])?.unit // 'mg/L'
 * partsPerAsMassPerVolume(measure('5.0 %'), '5.0 %', []) // null
 */
export function partsPerAsMassPerVolume(q: Quantity, text: string, notes: Note[]): { conc: Quantity; unit: string } | null {
  const t = text.trim();
  const ppm = /ppm$/.test(t);
  if (!ppm && !/ppb$/.test(t)) return null;
  const conc = multiply(q, quantity(exact(1000), unitOf('g/L')));
  notes.push(
    ppm
      ? { code: 'PPM_AS_MG_PER_L', message: 'ppm is read as mg/L, which holds for dilute aqueous solutions (density 1.00 g/mL)' }
      : { code: 'PPB_AS_UG_PER_L', message: 'ppb is read as µg/L, which holds for dilute aqueous solutions (density 1.00 g/mL)' },
  );
  return { conc, unit: ppm ? 'mg/L' : 'µg/L' };
}
