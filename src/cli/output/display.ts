/**
 * How numbers look in tables: reported figures, not raw digits. JSON and
 * CSV carry full precision; tables show what a chemist would write down.
 */
import { Decimal } from '../../exact/decimal.js';
import { scaledRatio } from '../../exact/ratio.js';
import type { Contribution, MassDetail } from '../../mass/formula-mass.js';
import { boxTable } from './box-table.js';
import { ATOMS } from '../../elements/atom-data.js';
import { SCALE_DIGITS } from '../../exact/scaled.js';
import { reportedMolarMass } from '../../mass/reported-mass.js';
import { displayMeasured, roundToPosition, type RoundingMode } from '../../sigfig/round.js';
import type { Cell } from './format.js';

/** The molar mass to the precision the atomic weights support. */
export function displayMolarMass(r: MassDetail, rounding: RoundingMode = 'half-even'): string {
  // the usual case from the exact scaled sum: every weight has decimals, and the mass is plain decimal text
  if (r.molarScaled !== null && r.molarScaled >= 1e12 && r.molarScaled < 1e18) {
    const decimals = leastDecimals(r);
    if (decimals > 0) return scaledFixed(r.molarScaled, decimals, rounding);
  }
  return displayMeasured(reportedMolarMass(r), rounding).text;
}

const decimalsOf: Record<string, number[]> = { standard: [], abridged: [] };

/** The fewest decimals among the atomic weights of a formula (0 when a mass number stands in for one). */
function leastDecimals(r: MassDetail): number {
  const table = decimalsOf[r.weights];
  let least = 99;
  for (const id of r.vector.ids) {
    let d = table[id];
    if (d === undefined) {
      const atom = ATOMS.data[id];
      const text = atom.average[r.weights].text;
      const dot = text.indexOf('.');
      d = table[id] = atom.noStandardWeight && atom.massNumber === null ? 0 : dot < 0 ? 0 : text.length - dot - 1;
    }
    if (d < least) least = d;
  }
  return least;
}

/**
 * Scaled integer units (10^-12) rounded to `decimals` places as text, exactly, in integer arithmetic.
 *
 * @example
 * scaledFixed(18010564683056, 6) // '18.010565'
 */
export function scaledFixed(n: number, decimals: number, rounding: RoundingMode = 'half-even'): string {
  const p = 10 ** (SCALE_DIGITS - decimals);
  const r = n % p;
  let q = (n - r) / p;
  const twice = 2 * r;
  if (twice > p || (twice === p && (rounding === 'half-up' || q % 2 === 1))) q++;
  const t = '' + q;
  const digits = t.length <= decimals ? '0'.repeat(decimals - t.length + 1) + t : t;
  return decimals === 0 ? digits : `${digits.slice(0, digits.length - decimals)}.${digits.slice(digits.length - decimals)}`;
}

/** An element's mass in one mole of the formula, to the decimals of its atomic weight (a count is repeated addition). */
export function displayContribution(c: Contribution): string {
  const dot = c.atomicWeight.indexOf('.');
  // nuclide masses carry up to 12 decimals; six are plenty on screen (JSON keeps them all)
  return c.mass.toFixed(dot < 0 ? 0 : Math.min(6, c.atomicWeight.length - dot - 1));
}

/** Monoisotopic mass to six decimals (accurate-mass practice), half to even. */
export function displayMonoisotopic(r: MassDetail): string {
  if (r.monoScaled !== null && r.charge === 0 && r.monoScaled >= 0) return scaledFixed(r.monoScaled, 6);
  return r.monoisotopicMass.toFixed(6);
}

/** A percentage to two decimals, as analysis reports give it. */
export function displayPercent(p: Decimal, rounding: RoundingMode = 'half-even'): string {
  return roundToPosition(p, -2, rounding).toFixed(2);
}

/** A charge as chemists write it: 2+, 1-, 0. */
export function chargeLabel(charge: number): string {
  if (charge === 0) return '0';
  return `${Math.abs(charge)}${charge > 0 ? '+' : '-'}`;
}

/** A plain aligned table without borders between rows. */
export function fixedTable(head: string[], rows: Cell[][], align?: ('left' | 'right')[]): string {
  return boxTable(head, rows.map((r) => r.map((c) => (c === null || c === undefined ? '' : String(c)))), align ?? head.map(() => 'left' as const));
}

/** The i-th element's mass in one mole of the formula (Hill order), as {@link displayContribution} shows it. */
export function displayElementMass(r: MassDetail, i: number): string {
  const id = r.vector.ids[i];
  const count = r.vector.counts[i];
  if (r.molarScaled !== null && typeof count === 'number') {
    const text = ATOMS.data[id].average[r.weights].text;
    const dot = text.indexOf('.');
    const scaled = count * (r.weights === 'standard' ? ATOMS.standardScaled[id] : ATOMS.abridgedScaled[id]);
    return scaledFixed(scaled, dot < 0 ? 0 : Math.min(6, text.length - dot - 1));
  }
  return displayContribution(r.contributions[i]);
}

/** The i-th element's percent by mass (Hill order) to two decimals, as {@link displayPercent} rounds it. */
export function displayElementPercent(r: MassDetail, i: number, rounding: RoundingMode = 'half-even'): string {
  const id = r.vector.ids[i];
  const count = r.vector.counts[i];
  const total = r.molarScaled;
  if (total !== null && total > 0 && typeof count === 'number') {
    const m = count * (r.weights === 'standard' ? ATOMS.standardScaled[id] : ATOMS.abridgedScaled[id]);
    const v = scaledRatio(m, total, 100) * 100;
    const f = Math.floor(v);
    const frac = v - f;
    // away from a tie the double decides; at one, the exact quotient does
    if (Math.abs(frac - 0.5) > 1e-6) return scaledFixed((frac > 0.5 ? f + 1 : f) * 1e10, 2);
  }
  const c = r.contributions[i];
  return displayPercent(r.molarMass.isZero() ? new Decimal(0) : c.mass.div(r.molarMass).times(100), rounding);
}
