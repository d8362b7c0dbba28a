/**
 * Reads a chemical equation: species separated by `+`, sides by `->`, `→`,
 * `=` (or `<=>`, `⇌`). Coefficients written in front of species are kept
 * with each species (`written`); balancing decides whether to use them. Electrons are written `e-`, `e^-` or `e⁻`.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { ATOMS } from '../elements/atom-data.js';
import type { Amount } from '../formula/amount.js';
import { countsMap, flattenFormula, type AtomCounts } from '../formula/flatten.js';
import { formatFormula, hillFormula } from '../formula/hill.js';
import { plainVectorFor } from '../formula/plain-vector.js';
import { parseFormula, type ParseOptions } from '../formula-parser/parse.js';
import { columnOf } from '../formula-parser/prescan.js';

/** Most species in one equation. */
export const MAX_SPECIES = 100;
/** Longest equation text accepted. */
export const MAX_EQUATION_LENGTH = 20_000;

export interface Species {
  /** As written, without a coefficient: 'H2O', 'Fe^3+', 'e-'. */
  text: string;
  /** Hill formula with charge; 'e-' for the electron. */
  formula: string;
  atoms: AtomCounts;
  charge: number;
  side: 'reactant' | 'product';
  /** 0-based offset of the species in the equation. */
  start: number;
  /** The coefficient written in front of it, if any. */
  written: string | null;
}

export interface Equation {
  input: string;
  reactants: Species[];
  products: Species[];
  /** Species left out of the balance: written on both sides, or named as catalysts. */
  catalysts: Species[];
  notes: Note[];
}

const ARROWS = /<=>|<->|⇌|⇄|->|→|⟶|=>|=/g;
const ELECTRON = /^e(?:\^?-|⁻|−|\^−)$/;
const COEFFICIENT = /^([0-9]+(?:\.[0-9]+)?|[0-9]+\/[0-9]+)\s*(?=[A-Z([{¹²³⁴⁵⁶⁷⁸⁹⁰]|e\b)/;

/** A state symbol, `(s)`, `(l)`, `(g)` or `(aq)`, ending a species. */
const STATE_AFTER = /^\((?:s|l|g|aq)\)(?:$|\s|\+)/;

const NO_NOTES: readonly Note[] = Object.freeze([]);

/**
 * The plain species read so far (a batch names O2, H2O and CO2 again and again), by their text:
 * what the plain reader gave, which depends on the text alone; each species gets its own map.
 * Bounded: emptied when full.
 */
const plainSpecies = new Map<string, { formula: string; atoms: [string, Amount][]; charge: number }>();
const PLAIN_SPECIES_KEPT = 4096;

/**
 * The atoms of one species' formula: a plain formula (no note, nothing to settle) straight from
 * its text, the rest through the formula tree.
 *
 * @example
 * speciesFormula('Ca3(PO4)2', {}).formula // 'Ca3O8P2'
 */
export function speciesFormula(body: string, options: ParseOptions): { formula: string; atoms: AtomCounts; charge: number; notes: readonly Note[] } {
  const plainOptions = options.abbreviations !== true && (options.maxLength === undefined || body.length <= options.maxLength);
  const known = plainOptions ? plainSpecies.get(body) : undefined;
  if (known) return { formula: known.formula, atoms: new Map(known.atoms), charge: known.charge, notes: NO_NOTES };
  const plain = plainVectorFor(body, options);
  if (plain) {
    const { ids, counts } = plain.vector;
    const read = { formula: formatFormula(ids.map((id) => ATOMS.data[id].label), counts, plain.charge), atoms: countsMap(plain.vector), charge: plain.charge, notes: NO_NOTES };
    if (plainOptions) {
      if (plainSpecies.size >= PLAIN_SPECIES_KEPT) plainSpecies.clear();
      plainSpecies.set(body, { formula: read.formula, atoms: [...read.atoms], charge: read.charge });
    }
    return read;
  }
  const tree = parseFormula(body, options);
  const atoms = flattenFormula(tree);
  return { formula: hillFormula(atoms, tree.charge), atoms, charge: tree.charge, notes: tree.notes };
}

/** Whether a UTF-16 unit is white space as `\s` in a pattern reads it (what {@link splitSide} asks of one character). */
function isSpace(c: number): boolean {
  if (c < 128) return c === 32 || (c >= 9 && c <= 13);
  return c === 0xa0 || c === 0x1680 || (c >= 0x2000 && c <= 0x200a) || c === 0x2028 || c === 0x2029 || c === 0x202f || c === 0x205f || c === 0x3000 || c === 0xfeff;
}

/** Splits one side into species texts with their offsets. */
function splitSide(side: string, base: number): { text: string; start: number }[] {
  const out: { text: string; start: number }[] = [];
  let start = 0;
  const spaced = /\s/.test(side.trim());
  for (let i = 0; i <= side.length; i++) {
    const ch = side[i];
    let split = false;
    if (i === side.length) split = true;
    else if (ch === '+') {
      const before = side[i - 1];
      const after = side[i + 1];
      if (spaced) split = before !== undefined && after !== undefined && isSpace(before.charCodeAt(0)) && isSpace(after.charCodeAt(0));
      // unspaced: a '+' before the start of a species separates; '^+', and a sign before another sign, do not ('Na++Cl-')
      // nor a charge before a state symbol ('Fe^2+(aq)')
      else split = before !== '^' && after !== undefined && /[A-Za-z0-9([{¹²³⁴⁵⁶⁷⁸⁹⁰]/.test(after) && !STATE_AFTER.test(side.slice(i + 1));
    }
    if (split) {
      const raw = side.slice(start, i);
      const lead = raw.length - raw.trimStart().length;
      out.push({ text: raw.trim(), start: base + start + lead });
      start = i + 1;
    }
  }
  return out;
}

/**
 * Parses an equation into its species.
 *
 * @param input - the equation, reactants and products separated by an arrow (->, → or =), species by +.
 * @param options - the formula options each species is read with.
 * @returns the reactants and products with their formulas, atoms, charges, written coefficients and columns, any catalysts written on both sides, and the notes.
 * @throws PondusError: EMPTY_INPUT for an empty equation; INPUT_TOO_LONG past the length limit; BAD_EQUATION for no arrow or more than one, a missing species, too many species, or a species on both sides with different coefficients or that leaves nothing to balance; a species' formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …, with the column in the equation); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * parseEquation('H2 + O2 -> H2O').products[0].formula // 'H2O'
 */
export function parseEquation(input: string, options: ParseOptions = {}): Equation {
  if (input.trim() === '') throw fail({ code: 'EMPTY_INPUT', message: 'the equation is empty' });
  if (input.length > MAX_EQUATION_LENGTH) throw fail({ code: 'INPUT_TOO_LONG', message: `the equation is ${input.length.toLocaleString('en-US')} characters long; the limit is ${MAX_EQUATION_LENGTH.toLocaleString('en-US')}` });
  const arrows = [...input.matchAll(ARROWS)];
  if (arrows.length === 0) throw fail({ code: 'BAD_EQUATION', message: 'no arrow between the sides: write -> (or →, =) between reactants and products' }, input);
  if (arrows.length > 1) {
    const second = arrows[1].index!;
    throw fail({ code: 'BAD_EQUATION', message: `more than one arrow (another '${arrows[1][0]}' at column ${columnOf(input, second)})`, column: columnOf(input, second), length: arrows[1][0].length }, input);
  }
  const a = arrows[0];
  const left = input.slice(0, a.index);
  const right = input.slice(a.index! + a[0].length);
  const notes: Note[] = [];
  // an equilibrium arrow: balanced as the forward reaction, which it says (the coefficients are the same both ways)
  if (/^(<=>|<->|⇌|⇄)$/.test(a[0])) notes.push({ code: 'EQUILIBRIUM_ARROW', message: `'${a[0]}' (an equilibrium) is read as the reaction left to right; the balanced coefficients are the same both ways`, column: columnOf(input, a.index!) });
  const states = new Set<string>();
  const read = (side: string, base: number, which: Species['side']): Species[] => {
    const parts = splitSide(side, base);
    return parts.map(({ text, start }) => {
      if (text === '') {
        throw fail({ code: 'BAD_EQUATION', message: which === 'reactant' ? 'a reactant is missing (nothing before the arrow, or a stray +)' : 'a product is missing (nothing after the arrow, or a stray +)', column: columnOf(input, start) }, input);
      }
      let written: string | null = null;
      let body = text;
      let offset = start;
      const m = COEFFICIENT.exec(text);
      if (m) {
        written = m[1];
        body = text.slice(m[0].length);
        offset = start + m[0].length;
      }
      if (ELECTRON.test(body) || body === 'e') {
        return { text: body, formula: 'e-', atoms: new Map(), charge: -1, side: which, start: offset, written };
      }
      try {
        const read = speciesFormula(body, options);
        const shift = read.notes.length > 0 ? columnOf(input, offset) - 1 : 0;
        for (const n of read.notes) {
          if (n.code === 'STATE_SYMBOL') states.add(body.slice(body.lastIndexOf('(')));
          else if (!notes.some((m) => m.code === n.code && m.message === `${body}: ${n.message}`)) notes.push({ ...n, message: `${body}: ${n.message}`, ...(n.column !== undefined ? { column: n.column + shift } : {}) }); // a species written twice is read once
        }
        return { text: body, formula: read.formula, atoms: read.atoms, charge: read.charge, side: which, start: offset, written };
      } catch (e) {
        if (e instanceof PondusError) {
          const shift = columnOf(input, offset) - 1;
          throw new PondusError(e.issues.map((i) => ({ ...i, column: i.column !== undefined ? i.column + shift : columnOf(input, offset) })), input);
        }
        throw e;
      }
    });
  };
  const reactants = read(left, 0, 'reactant');
  const products = read(right, a.index! + a[0].length, 'product');
  if (states.size > 0) {
    notes.unshift({ code: 'STATE_SYMBOL', message: `the state symbols ${[...states].join(', ')} are set aside: they do not change the balance` });
  }
  const total = reactants.length + products.length;
  if (total > MAX_SPECIES) throw fail({ code: 'BAD_EQUATION', message: `${total} species; pondus balances up to ${MAX_SPECIES}` }, input);
  // a species written on both sides with the same coefficient is a catalyst: left out of the balance, with a note
  const catalysts: Species[] = [];
  for (const r of [...reactants]) {
    const p = products.find((x) => x.formula === r.formula);
    if (!p) continue;
    if ((r.written ?? '1') !== (p.written ?? '1')) {
      throw fail({ code: 'BAD_EQUATION', message: `${r.text} appears on both sides with different coefficients; cancel it, or write the two forms differently`, column: columnOf(input, p.start), length: p.text.length }, input);
    }
    catalysts.push(r);
    reactants.splice(reactants.indexOf(r), 1);
    products.splice(products.indexOf(p), 1);
    notes.push({ code: 'CATALYST', message: `${r.text} appears on both sides: read as a catalyst (or a spectator), left out of the balance` });
  }
  if (reactants.length === 0 || products.length === 0) {
    throw fail({ code: 'BAD_EQUATION', message: `every ${reactants.length === 0 ? 'reactant' : 'product'} appears on both sides: nothing is left to balance` }, input);
  }
  return { input, reactants, products, catalysts, notes };
}
