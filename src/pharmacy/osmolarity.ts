/**
 * The osmolarity and the milliequivalents per litre of a solution of one or
 * more solutes, each given with its strength: 'NaCl=0.9 %',
 * 'NaCl=0.6 %, KCl=0.03 %, CaCl2·2H2O=0.02 %' or 'C6H12O6·H2O=5 %, NaCl=0.45 %'.
 * Each salt contributes its mmol/L × particles per formula unit (complete
 * dissociation, noted); each ion its mmol/L × |charge|, summed over the salts
 * that give it. A solute that does not split into known ions is counted as a
 * non-electrolyte, one particle per molecule and no mEq, only when its formula
 * is a neutral compound of C, H, N and O (noted, see non-electrolyte.ts);
 * any other is refused at its column. Dextrose by name must say its form
 * (solute-names.ts). Label strengths are taken as nominal (exact) and results
 * kept at working precision unless the strengths are marked measured.
 */
import { checkInputLength } from '../errors/input-length.js';
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { readKeyValuePair } from '../key-values/read-key-values.js';
import { Decimal } from '../exact/decimal.js';
import { formulaMassDetail, type MassOptions } from '../mass/formula-mass.js';
import { add, type Quantity } from '../sigfig/quantity.js';
import { milliequivalents, type MilliequivalentResult } from './milliequivalents.js';
import { isEquivalentsStrength } from './molar-strength.js';
import { nonElectrolyte, notNonElectrolyte, type NonElectrolyteResult } from './non-electrolyte.js';
import { soluteName } from './solute-names.js';
import { atWorkingPrecision } from './working-precision.js';

export interface OsmolarityOptions extends MassOptions {
  /** Strengths are measured values (keep their figures) rather than nominal label values. */
  measured?: boolean;
}

interface ComponentBase {
  /** The solute as written: a formula, or a name of dextrose that says its form. */
  solute: string;
  /** The strength as written. */
  strength: string;
  /** Particles per formula unit in solution: the salt's ions, or 1 for a non-electrolyte. */
  particles: number;
}

/** A salt, split into its ions (complete dissociation). */
export interface SaltComponent extends ComponentBase {
  kind: 'salt';
  /** The salt as written (the same as `solute`). */
  salt: string;
  result: MilliequivalentResult;
}

/** A non-electrolyte: one particle per molecule, no mEq. */
export interface NonElectrolyteComponent extends ComponentBase {
  kind: 'non-electrolyte';
  result: NonElectrolyteResult;
}

/** One solute of the solution: a salt or a non-electrolyte. */
export type OsmolarityComponent = SaltComponent | NonElectrolyteComponent;

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
  /** Total osmolarity, osmol/L (complete dissociation of the salts, one particle per molecule of a non-electrolyte). */
  osmolarity: Quantity;
  /** The part of the total from the salts, osmol/L; null when there is none. */
  saltOsmolarity: Quantity | null;
  /** The part of the total from the non-electrolytes, osmol/L; null when there is none. */
  nonElectrolyteOsmolarity: Quantity | null;
  ions: IonTotal[];
  notes: Note[];
}

/** Most solutes in one solution. */
export const MAX_COMPONENTS = 50;

/** The pieces of a solution list, each with the 1-based column where its text starts. */
function pieces(text: string): { piece: string; column: number }[] {
  const out: { piece: string; column: number }[] = [];
  for (const m of text.matchAll(/[^;,]+/g)) {
    const piece = m[0].trim();
    if (piece !== '') out.push({ piece, column: m.index + (m[0].length - m[0].trimStart().length) + 1 });
  }
  return out;
}

/** A name-like solute (a word of three small letters, or a space): its formula errors say that solutes are written as formulas. */
const NAME_LIKE = /[a-z]{3,}|\s/;

/**
 * Osmolarity and mEq/L of a solution of salts and non-electrolytes.
 *
 * @param text - the solutes and their strengths: 'NaCl=0.45 %, KCl=0.15 %', 'C6H12O6·H2O=5 %, NaCl=0.45 %'.
 * @param o - `measured` for measured strengths (their figures are kept), atomic-weight options.
 * @returns each component with its kind (salt or non-electrolyte), particles and mOsm/L (a salt with its ions and mEq); the total (complete dissociation of the salts, one particle per molecule of a non-electrolyte), its parts from salts and from non-electrolytes, and the mmol/L and mEq/L of each ion.
 * @throws PondusError: EMPTY_INPUT for no solute; INPUT_TOO_LONG past {@link MAX_COMPONENTS} solutes or 10,000 characters; BAD_RECORD for a piece not written solute=strength, e.g. NaCl=0.9 % (with its column), or a solute that neither splits into known ions nor is a neutral compound of C, H, N and O (an amine hydrochloride, a metal salt of unknown ions); AMBIGUOUS_READING for 'dextrose' or 'glucose' without its form (the monohydrate or anhydrous); a solute's own error (its formula, its strength, its ions) with the solute named and its column; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = osmolarity('NaCl=0.9 %')
 * displayQuantity(r.osmolarity, 'mM').figure // '308.0'
 * const d = osmolarity('C6H12O6·H2O=5 %, NaCl=0.45 %')
 * d.components.map((c) => c.kind) // ['non-electrolyte', 'salt']
 * displayQuantity(d.osmolarity, 'mM').figure // '406.3'
 * displayQuantity(d.nonElectrolyteOsmolarity, 'mM').figure // '252.3'
 */
export function osmolarity(text: string, o: OsmolarityOptions = {}): OsmolarityResult {
  checkInputLength(text, 'the solution');
  const list = pieces(text);
  if (list.length === 0) throw fail({ code: 'EMPTY_INPUT', message: "give the solutes and their strengths: 'NaCl=0.9 %'" }, text);
  if (list.length > MAX_COMPONENTS) throw fail({ code: 'INPUT_TOO_LONG', message: `more than ${MAX_COMPONENTS} solutes in one solution` }, text);
  const notes: Note[] = [];
  const components: OsmolarityComponent[] = [];
  const seen = new Set<string>();
  for (const { piece, column } of list) {
    const pair = readKeyValuePair(piece);
    if (!pair || pair.keyText === '') throw fail({ code: 'BAD_RECORD', message: `each solute is written SOLUTE=STRENGTH, e.g. 'NaCl=0.9 %'; got '${piece}'`, column }, text);
    const solute = pair.key;
    const strength = pair.value;
    // the same solute twice is a slip or two forms to add up: refused, as pondus would not add them silently
    if (seen.has(solute)) {
      throw fail({ code: 'BAD_RECORD', message: `${solute} is given twice: give each solute once, at its total strength`, column }, text);
    }
    seen.add(solute);
    const own = (e: unknown): never => {
      if (e instanceof PondusError && e.first.code !== 'USAGE') {
        const hint = e.first.code === 'UNKNOWN_ELEMENT' && NAME_LIKE.test(solute) ? 'write the solute as its formula (NaCl, C6H12O6·H2O); pondus reads no name here but dextrose with its form' : e.first.hint;
        // a column inside the solute's formula or its strength becomes a column of the whole list
        const within = e.first.column !== undefined ? (e.input === strength ? pair.valueColumn : e.input === solute ? pair.column : undefined) : undefined;
        const at = within !== undefined ? column + within - 1 + e.first.column! - 1 : column;
        const message = within !== undefined ? e.first.message.replace(`at column ${e.first.column}`, `at column ${at}`) : e.first.message;
        throw fail({ code: e.first.code, message: `${solute}: ${message}`, column: at, ...(within !== undefined && e.first.length !== undefined ? { length: e.first.length } : {}), hint, options: e.first.options }, text);
      }
      throw e;
    };
    const named = soluteName(solute);
    if (named?.kind === 'ambiguous') {
      throw fail({ code: 'AMBIGUOUS_READING', message: `${solute} could be ${named.readings.map((r) => `${r.name}, ${r.formula}`).join(', or ')}; the strength on a dextrose injection's label is usually of dextrose hydrous, the monohydrate; write the form you mean: '${named.readings.map((r) => `${r.formula}=${strength}`).join("' or '")}'`, column }, text);
    }
    const formula = named ? named.reading.formula : solute;
    const prefix = (n: Note): Note => ({ ...n, message: n.message.startsWith(solute) ? n.message : `${solute}: ${n.message}` });
    if (named) notes.push({ code: 'NAME_READ', message: `${solute} is read as ${named.reading.name}, ${named.reading.formula}` });
    let result: MilliequivalentResult | null = null;
    try {
      result = milliequivalents(formula, { ...o, concentration: strength, measured: o.measured });
    } catch (e) {
      // a solute the split does not know: a non-electrolyte when its formula says so, else refused
      if (!(e instanceof PondusError && e.first.code === 'BAD_OPTION' && e.first.options?.includes('ions'))) own(e);
    }
    if (result) {
      for (const n of result.notes) if (n.code !== 'COMPLETE_DISSOCIATION' && n.code !== 'NOMINAL_STRENGTH' && n.code !== 'MEASURED_STRENGTH') notes.push(prefix(n));
      components.push({ kind: 'salt', solute, salt: solute, strength, particles: result.ions.particles, result });
      continue;
    }
    let r: NonElectrolyteResult;
    try {
      const detail = formulaMassDetail(formula, o);
      const why = notNonElectrolyte(detail);
      if (why !== null) {
        throw fail({ code: 'BAD_RECORD', message: `${solute}: pondus cannot count it here: it does not split into a cation and an anion pondus knows, and it is not counted as a non-electrolyte (one particle per molecule) because ${why}; work a salt on its own with \`milliequivalents\` and \`ions\``, column, options: ['ions'], functions: ['milliequivalents'] }, text);
      }
      if (isEquivalentsStrength(strength)) {
        throw fail({ code: 'BAD_AMOUNT', message: `${solute} is counted as a non-electrolyte, which has no ions, so a strength in equivalents ('${strength.trim()}') does not apply: give it as % w/v, g/L or mmol/L`, column: column + pair.valueColumn - 1 }, text);
      }
      r = nonElectrolyte(detail, strength, o, named !== null);
    } catch (e) {
      if (e instanceof PondusError && (e.first.code === 'BAD_RECORD' || (e.first.code === 'BAD_AMOUNT' && e.input === text))) throw e;
      own(e);
    }
    for (const n of r!.notes) if (n.code !== 'NOMINAL_STRENGTH' && n.code !== 'MEASURED_STRENGTH') notes.push(prefix(n));
    components.push({ kind: 'non-electrolyte', solute, strength, particles: 1, result: r! });
  }
  const fix = o.measured ? (q: Quantity) => q : atWorkingPrecision;
  const sum = (qs: Quantity[]): Quantity | null => (qs.length === 0 ? null : fix(qs.reduce((s, q) => add(s, q))));
  const byIon = new Map<string, IonTotal>();
  for (const c of components) {
    if (c.kind !== 'salt') continue;
    for (const i of c.result.perIon) {
      const prev = byIon.get(i.ion);
      byIon.set(i.ion, prev ? { ...prev, molarity: add(prev.molarity, i.amount), equivalents: add(prev.equivalents, i.equivalents) } : { ion: i.ion, charge: i.charge, molarity: i.amount, equivalents: i.equivalents });
    }
  }
  const ions = [...byIon.values()].map((i) => ({ ...i, molarity: fix(i.molarity), equivalents: fix(i.equivalents) }));
  const cations = ions.filter((i) => i.charge > 0).reduce((s, i) => s.plus(i.equivalents.value), new Decimal(0));
  const anions = ions.filter((i) => i.charge < 0).reduce((s, i) => s.plus(i.equivalents.value), new Decimal(0));
  if (!cations.minus(anions).abs().lte(cations.times('1e-9'))) notes.push({ code: 'CHARGE_IMBALANCE', message: 'the cations and anions do not balance: check the ions read' });
  notes.push(
    o.measured
      ? { code: 'MEASURED_STRENGTH', message: 'the strengths are measured values: the results keep their significant figures' }
      : { code: 'NOMINAL_STRENGTH', message: 'the strengths are read as nominal label values, taken as exact; results keep working precision (4 figures); use `measured: true` for measured strengths', options: ['measured'] },
  );
  const salts = components.filter((c) => c.kind === 'salt');
  const others = components.filter((c) => c.kind === 'non-electrolyte');
  if (salts.length > 0) {
    notes.push({ code: 'COMPLETE_DISSOCIATION', message: others.length > 0 ? 'the osmolarity assumes complete dissociation of the salts into the ions named and one particle per molecule of a non-electrolyte (ideal); a measured osmolality is lower' : 'the osmolarity assumes complete dissociation into the ions named (ideal); a measured osmolality is lower' });
  }
  return {
    components,
    osmolarity: sum(components.map((c) => c.result.osmoles))!,
    saltOsmolarity: sum(salts.map((c) => c.result.osmoles)),
    nonElectrolyteOsmolarity: sum(others.map((c) => c.result.osmoles)),
    ions,
    notes,
  };
}
