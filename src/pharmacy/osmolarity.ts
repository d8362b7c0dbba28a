/**
 * The osmolarity and the milliequivalents per litre of a solution of one or
 * more salts, each given with its strength: 'NaCl=0.9 %' or
 * 'NaCl=0.6 %, KCl=0.03 %, CaCl2·2H2O=0.02 %'. Each salt contributes its
 * mmol/L × particles per formula unit (complete dissociation, noted); each ion
 * its mmol/L × |charge|, summed over the salts that give it. Label strengths
 * are taken as nominal (exact) and results kept at working precision unless
 * the strengths are marked measured.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { readKeyValuePair } from '../key-values/read-key-values.js';
import { Decimal } from '../exact/decimal.js';
import type { MassOptions } from '../mass/formula-mass.js';
import { add, type Quantity } from '../sigfig/quantity.js';
import { milliequivalents, type MilliequivalentResult } from './milliequivalents.js';
import { atWorkingPrecision } from './working-precision.js';

export interface OsmolarityOptions extends MassOptions {
  /** Strengths are measured values (keep their figures) rather than nominal label values. */
  measured?: boolean;
}

export interface OsmolarityComponent {
  salt: string;
  strength: string;
  result: MilliequivalentResult;
}

export interface IonTotal {
  ion: string;
  charge: number;
  /** mmol/L of the ion, in mol/L. */
  molarity: Quantity;
  /** mEq/L of the ion, in mol/L of charge. */
  equivalents: Quantity;
}

export interface OsmolarityResult {
  components: OsmolarityComponent[];
  /** Total osmolarity, osmol/L (complete dissociation). */
  osmolarity: Quantity;
  ions: IonTotal[];
  notes: Note[];
}

/** Most salts in one solution. */
export const MAX_COMPONENTS = 50;

/**
 * Osmolarity and mEq/L of a solution of salts.
 *
 * @param text - the salts and their strengths: 'NaCl=0.45 %, KCl=0.15 %'.
 * @param o - `measured` for measured strengths (their figures are kept), atomic-weight options.
 * @returns each component's mOsm/L, the total (complete dissociation), and the mmol/L and mEq/L of each ion.
 * @throws PondusError: EMPTY_INPUT for no salt; INPUT_TOO_LONG past {@link MAX_COMPONENTS} salts; BAD_RECORD for a piece not written salt=strength, e.g. NaCl=0.9 % (with its column); a salt's own error (its formula, its strength, its ions) with the salt named and its column; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = osmolarity('NaCl=0.9 %')
 * displayQuantity(r.osmolarity, 'mM').figure // '308.0'
 */
export function osmolarity(text: string, o: OsmolarityOptions = {}): OsmolarityResult {
  const pieces = text.split(/[;,]/).map((s) => s.trim()).filter((s) => s !== '');
  if (pieces.length === 0) throw fail({ code: 'EMPTY_INPUT', message: "give the salts and their strengths: 'NaCl=0.9 %'" }, text);
  if (pieces.length > MAX_COMPONENTS) throw fail({ code: 'INPUT_TOO_LONG', message: `more than ${MAX_COMPONENTS} salts in one solution` }, text);
  const notes: Note[] = [];
  const components: OsmolarityComponent[] = [];
  for (const piece of pieces) {
    const pair = readKeyValuePair(piece);
    if (!pair || pair.keyText === '') throw fail({ code: 'BAD_RECORD', message: `each salt is written SALT=STRENGTH, e.g. 'NaCl=0.9 %'; got '${piece}'`, column: text.indexOf(piece) + 1 }, text);
    const salt = pair.key;
    const strength = pair.value;
    let result: MilliequivalentResult;
    try {
      result = milliequivalents(salt, { ...o, concentration: strength, measured: o.measured });
    } catch (e) {
      // a salt the split does not know would need its ions named, which a solution list cannot do
      if (e instanceof PondusError && e.first.code === 'BAD_OPTION' && e.first.options?.includes('ions')) {
        throw fail({ code: 'BAD_RECORD', message: `${salt}: pondus cannot split it into ions here: the osmolarity of a solution counts only salts it splits itself (NaCl, KCl, CaCl2, NaHCO3, …), and does not yet count a non-electrolyte such as dextrose; work such a salt on its own with meq and \`ions\``, column: text.indexOf(piece) + 1, options: ['ions'] }, text);
      }
      if (e instanceof PondusError && e.first.code !== 'USAGE') throw fail({ code: e.first.code, message: `${salt}: ${e.first.message}`, column: text.indexOf(piece) + 1, hint: e.first.hint, options: e.first.options }, text);
      throw e;
    }
    for (const n of result.notes) if (n.code !== 'COMPLETE_DISSOCIATION' && n.code !== 'NOMINAL_STRENGTH' && n.code !== 'MEASURED_STRENGTH') notes.push({ ...n, message: n.message.startsWith(salt) ? n.message : `${salt}: ${n.message}` });
    components.push({ salt, strength, result });
  }
  let total: Quantity | null = null;
  const byIon = new Map<string, IonTotal>();
  for (const c of components) {
    total = total ? add(total, c.result.osmoles) : c.result.osmoles;
    for (const i of c.result.perIon) {
      const key = `${i.ion}`;
      const prev = byIon.get(key);
      byIon.set(key, prev ? { ...prev, molarity: add(prev.molarity, i.amount), equivalents: add(prev.equivalents, i.equivalents) } : { ion: i.ion, charge: i.charge, molarity: i.amount, equivalents: i.equivalents });
    }
  }
  const fix = o.measured ? (q: Quantity) => q : atWorkingPrecision;
  const ions = [...byIon.values()].map((i) => ({ ...i, molarity: fix(i.molarity), equivalents: fix(i.equivalents) }));
  const cations = ions.filter((i) => i.charge > 0).reduce((s, i) => s.plus(i.equivalents.value), new Decimal(0));
  const anions = ions.filter((i) => i.charge < 0).reduce((s, i) => s.plus(i.equivalents.value), new Decimal(0));
  if (!cations.minus(anions).abs().lte(cations.times('1e-9'))) notes.push({ code: 'CHARGE_IMBALANCE', message: 'the cations and anions do not balance: check the ions read' });
  notes.push(
    o.measured
      ? { code: 'MEASURED_STRENGTH', message: 'the strengths are measured values: the results keep their significant figures' }
      : { code: 'NOMINAL_STRENGTH', message: 'the strengths are read as nominal label values, taken as exact; results keep working precision (4 figures); use --measured for measured strengths' },
  );
  notes.push({ code: 'COMPLETE_DISSOCIATION', message: 'the osmolarity assumes complete dissociation into the ions named (ideal); a measured osmolality is lower' });
  return { components, osmolarity: fix(total!), ions, notes };
}
