/**
 * Alligation: the amounts of a higher and a lower strength to mix for a
 * target strength between them. Parts of the higher = target − lower; parts of
 * the lower = higher − target (alligation alternate; the lower may be 0 for a
 * diluent). Mixing by mass suits % w/w; mixing by volume suits % v/v and % w/v
 * and takes volumes as additive (noted). With a total, the amounts are
 * instructions: kept at working precision, four figures at least.
 */
import type { Note } from '../errors/issue.js';
import { typedIssue } from '../errors/message.js';
import { fail } from '../errors/pondus-error.js';
import { MASS, VOLUME } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { exact } from '../sigfig/measured.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { baseUnitText, sameDims } from '../sigfig/units.js';
import { readStrength, type PercentKind, type Strength } from './strength.js';
import { atWorkingPrecision, noteFewFigures } from './working-precision.js';

export interface AlligationOptions {
  /** The higher strength: '20 %'. */
  higher: string;
  /** The lower strength (or '0 %' for a diluent): '5 %'. */
  lower: string;
  /** The total to make: a mass ('500 g') for mixing by mass, a volume ('250 mL') for mixing by volume. */
  total?: string;
  /** Mixing by mass or by volume, when no total says which. */
  by?: 'mass' | 'volume';
}

export interface AlligationResult {
  by: 'mass' | 'volume';
  target: Strength;
  higher: Strength;
  lower: Strength;
  /** Parts of the higher strength (target − lower), in the strength's own terms. */
  higherParts: Quantity;
  /** Parts of the lower strength (higher − target). */
  lowerParts: Quantity;
  /** Fraction of the total that is the higher strength (exact arithmetic, working precision). */
  higherFraction: Quantity;
  total: Quantity | null;
  higherAmount: Quantity | null;
  lowerAmount: Quantity | null;
  notes: Note[];
}

/**
 * Amounts to mix for a target strength.
 *
 * @param targetText - the strength wanted: '10 %'.
 * @param o - the `higher` and `lower` strengths (required); the `total` to make, or `by` ('mass' or 'volume') for parts only.
 * @returns the parts of each strength, the fraction of the higher one and, with a total, the amounts to mix (instructions at working precision).
 * @throws PondusError: a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); USAGE when the mixing (by mass or volume) is not given or conflicts with the total; INCOMPATIBLE_UNITS for strengths of different kinds, or of a kind that does not fit the mixing; BAD_AMOUNT for a target not between the lower and higher strengths; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = alligation('10 %', { higher: '20 %', lower: '5 %', total: '300 g' })
 * displayQuantity(r.higherAmount, 'g').text // '100.0 g'
 */
export function alligation(targetText: string, o: AlligationOptions): AlligationResult {
  const notes: Note[] = [];
  let total: Quantity | null = null;
  let by = o.by;
  if (o.total !== undefined) {
    total = readPositive(o.total, [MASS, VOLUME], 'the total', notes);
    const totalBy = sameDims(total.dims, MASS) ? 'mass' : 'volume';
    if (by !== undefined && by !== totalBy) throw fail({ code: 'USAGE', message: `\`by: ${by}\` conflicts with a total that is a ${totalBy} ('${o.total}')`, options: ['by'] });
    by = totalBy;
  }
  if (by === undefined) throw fail({ code: 'USAGE', message: "say how the strengths are mixed: `total: '500 g'` (by mass) or `total: '250 mL'` (by volume), or `by: mass|volume` for parts only", options: ['total', 'by'] });
  const kind: PercentKind = by === 'mass' ? 'w/w' : 'w/v';
  const target = readStrength(targetText, kind, notes, 'the target strength');
  const higher = readStrength(o.higher, kind, notes, 'the higher strength');
  const lower = readStrengthOrZero(o.lower, kind, notes, target);
  for (const [name, s] of [['target', target], ['higher', higher], ['lower', lower]] as const) {
    if (!sameDims(s.value.dims, target.value.dims)) {
      throw fail(typedIssue({ code: 'INCOMPATIBLE_UNITS', operation: 'mix', first: 'target', firstDimension: baseUnitText(target.value.dims) || null, second: name, secondDimension: baseUnitText(s.value.dims) || null }));
    }
    if (s.percent && target.percent && s.percent !== target.percent) throw fail({ code: 'INCOMPATIBLE_UNITS', message: `the strengths mix % ${s.percent} and % ${target.percent}; give them all the same way` });
    if (by === 'mass' && (s.percent === 'w/v' || s.percent === 'v/v' || s.percent === null)) throw fail({ code: 'INCOMPATIBLE_UNITS', message: `mixing by mass needs strengths by mass (% w/w); a ${s.percent ? `% ${s.percent}` : 'per-volume'} strength needs mixing by volume or the densities` });
    if (by === 'volume' && s.percent === 'w/w') throw fail({ code: 'INCOMPATIBLE_UNITS', message: 'mixing by volume needs strengths per volume (% w/v, % v/v, mg/mL); a % w/w strength needs mixing by mass' });
  }
  if (!higher.value.value.gt(lower.value.value)) throw fail({ code: 'BAD_AMOUNT', message: `the higher strength (${o.higher}) must be above the lower (${o.lower})` });
  if (!target.value.value.gt(lower.value.value) || !target.value.value.lt(higher.value.value)) throw fail({ code: 'BAD_AMOUNT', message: `the target (${targetText}) must lie strictly between the lower (${o.lower}) and the higher (${o.higher}) strength` }, targetText);
  const higherParts = subtract(target.value, lower.value);
  const lowerParts = subtract(higher.value, target.value);
  const spread = subtract(higher.value, lower.value);
  const asExact = (q: Quantity): Quantity => ({ ...q, lsd: null });
  const higherFraction = atWorkingPrecision(divide(asExact(higherParts), asExact(spread)));
  if (by === 'volume') notes.push({ code: 'VOLUMES_ADDITIVE', message: 'mixing by volume takes the volumes as additive; make up to the final volume if they are not' });
  noteFewFigures(target.value, targetText, 'the target strength', notes);
  let higherAmount: Quantity | null = null;
  let lowerAmount: Quantity | null = null;
  if (total) {
    const t = asExact(total);
    higherAmount = atWorkingPrecision(divide(multiply(t, asExact(higherParts)), asExact(spread)));
    lowerAmount = atWorkingPrecision(subtract(t, { ...higherAmount, lsd: null }));
    notes.push({ code: 'ALLIGATION_PARTS', message: `parts: ${displayQuantity(asExact(higherParts), target.value.unit?.symbol).figure} of the higher to ${displayQuantity(asExact(lowerParts), target.value.unit?.symbol).figure} of the lower, scaled to ${o.total!.trim()}` });
  }
  return { by, target, higher, lower, higherParts, lowerParts, higherFraction, total, higherAmount, lowerAmount, notes };
}

/** A lower strength of 0 is a diluent: any kind fits it, and a bare '0 %' takes the target's kind (% v/v for '70 % v/v'). */
function readStrengthOrZero(text: string, kind: PercentKind, notes: Note[], target: Strength): Strength {
  const like = target.value;
  const t = text.trim();
  if (/^0+(?:\.0*)?(?:\s*[^\d.\s].*)?$/.test(t)) {
    const m = /(w\/v|w\/w|v\/v)\s*$/i.exec(t);
    notes.push({ code: 'DILUENT', message: 'the lower strength is 0: a diluent or base with none of the ingredient' });
    const isPercent = /%/.test(t);
    return { value: { ...quantity(exact(0), null), dims: like.dims, unit: like.unit }, percent: isPercent ? (m ? (m[1].toLowerCase() as PercentKind) : (target.percent ?? kind)) : null, defaulted: isPercent && !m && !target.percent };
  }
  return readStrength(text, kind, notes, 'the lower strength');
}
