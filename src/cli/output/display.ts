/**
 * How numbers look in tables: reported figures, not raw digits. JSON and
 * CSV carry full precision; tables show what a chemist would write down.
 */
import Table from 'cli-table3';
import type { Decimal } from '../../exact/decimal.js';
import type { Contribution, MassResult } from '../../mass/formula-mass.js';
import { reportedMolarMass } from '../../mass/reported-mass.js';
import { displayMeasured, roundToPosition, type RoundingMode } from '../../sigfig/round.js';
import type { Cell } from './format.js';

/** The molar mass to the precision the atomic weights support. */
export function displayMolarMass(r: MassResult, rounding: RoundingMode = 'half-even'): string {
  return displayMeasured(reportedMolarMass(r), rounding).text;
}

/** An element's mass in one mole of the formula, to the decimals of its atomic weight (a count is repeated addition). */
export function displayContribution(c: Contribution): string {
  const dot = c.atomicWeight.indexOf('.');
  // nuclide masses carry up to 12 decimals; six are plenty on screen (JSON keeps them all)
  return c.mass.toFixed(dot < 0 ? 0 : Math.min(6, c.atomicWeight.length - dot - 1));
}

/** Monoisotopic mass to six decimals (accurate-mass practice). */
export function displayMonoisotopic(r: MassResult): string {
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
  const t = new Table({ head, colAligns: align ?? head.map(() => 'left' as const), style: { head: [], border: [] }, chars: { mid: '', 'left-mid': '', 'mid-mid': '', 'right-mid': '' } });
  for (const r of rows) t.push(r.map((c) => (c === null || c === undefined ? '' : String(c))));
  return t.toString();
}
