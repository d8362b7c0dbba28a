/**
 * The one serialiser of `pondus mass`: the JSON object and JSON line of a plain
 * mass result, and its CSV cells. The CLI prints exactly these (the shared writer
 * adds the input's line number); tests/mass/serialisers.test.ts holds the line to
 * JSON.stringify of the object.
 */
import type { LibraryFunction } from '../errors/issue.js';
import { noteText as noteWords } from '../errors/message.js';
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { jsonNumber } from '../exact/json-number.js';
import type { MassResult } from './formula-mass.js';
import type { MolarMassUncertainty } from './uncertainty.js';
import { LazyTexts } from '../exact/lazy-texts.js';

/** A note as it appears in JSON rows. */

/** The stable JSON shape of a mass result (the `mass --json` contract, before the shared writer's `line`). */
export { notesJson, type NoteJson };

export interface MassJson {
  input: string;
  formula: string;
  molarMass: number;
  monoisotopicMass: number;
  nominalMass: number | null;
  charge: number;
  notes: NoteJson[];
}


/**
 * The JSON object `pondus mass --json` writes for one result; numbers at full precision.
 *
 * @param r - a mass result (from formulaMass).
 * @returns the row object: input, formula, molar and monoisotopic mass, nominal mass, charge and notes (code and message).
 * @throws PondusError: BAD_ARGUMENT when `r` is not a mass result.
 * @example
 * massJson(formulaMass('H2O')) // { input: 'H2O', formula: 'H2O', molarMass: 18.015, monoisotopicMass: 18.010564683056, nominalMass: 18, charge: 0, notes: [] }
 */
export function massJson(r: MassResult): MassJson {
  return {
    input: r.input,
    formula: r.formula,
    molarMass: r.molarMass,
    monoisotopicMass: r.monoisotopicMass,
    nominalMass: r.nominalMass,
    charge: r.charge,
    notes: notesJson(r.notes),
  };
}

/** How the uncertainty of `mass --uncertainty` is obtained, said wherever it is shown (table, JSON, CSV). */
export const UNCERTAINTY_BASIS =
  'u from the CIAAW atomic-weight intervals and uncertainties read as rectangular distributions (van der Veen et al., Pure Appl. Chem. 93 (2021) 629); the value is the centre of those distributions, not the molar mass from the conventional weights';

/** The stable JSON shape of a mass result with the uncertainty of its molar mass (`mass --uncertainty --json`). */
export interface MassUncertaintyJson extends MassJson {
  molarMassUncertainty: {
    /** The centre of the atomic-weight distributions, g/mol. */
    value: number;
    /** The standard uncertainty, g/mol (k = 1). */
    standardUncertainty: number;
  };
  /** How the uncertainty was obtained ({@link UNCERTAINTY_BASIS}). */
  caution: string;
}

/**
 * The JSON object `pondus mass --uncertainty --json` writes for one result: the mass row, the
 * molar mass's standard uncertainty and the basis of it.
 *
 * @param r - a mass result (from formulaMass, or plainMass of a detailed result).
 * @param u - the uncertainty of the same formula's molar mass (from molarMassUncertainty).
 * @returns the fields of {@link massJson}, then `molarMassUncertainty` (the centre value and the standard uncertainty, g/mol) and the basis as `caution`.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a mass result or `u` not a molar-mass uncertainty.
 * @example
 * const d = formulaMassDetail('H2O')
 * massUncertaintyJson(plainMass(d), molarMassUncertainty(d)).molarMassUncertainty.standardUncertainty // 0.000264…
 */
export function massUncertaintyJson(r: MassResult, u: MolarMassUncertainty): MassUncertaintyJson {
  return Object.assign(massJson(r), {
    molarMassUncertainty: { value: u.value.toNumber(), standardUncertainty: u.standardUncertainty.toNumber() },
    caution: UNCERTAINTY_BASIS,
  });
}

/**
 * The same text as JSON.stringify(massJson(r)), written straight to one JSON line: the batch
 * hot path, without an intermediate object. With `line`, the row starts with the input's line
 * number, as the CLI's JSON writer gives every row (JSON.stringify({ line, ...massJson(r) })).
 *
 * @param r - a mass result (from formulaMass).
 * @param line - the input's line number to put first in the row; left out by default.
 * @returns one line of JSON text, without a newline.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a mass result or `line` is given and not a number.
 * @example
 * massJsonLine(formulaMass('H2O')) // '{"input":"H2O","formula":"H2O","molarMass":18.015,…}'
 */
export function massJsonLine(r: MassResult, line?: number): string {
  // Hill formulas hold only letters, digits, brackets, '.', '^', '+' and '-': nothing to escape.
  // Every piece joined is a node the output's flattening walks later, so constant runs are kept
  // whole: the input's quotes go with the keys, and the usual end (a neutral formula's nominal mass,
  // charge and empty notes) is one string.
  return `${line === undefined ? '{"input":"' : `{"line":${line},"input":"`}${jsonInner(r.input)}","formula":"${r.formula}","molarMass":${jsonNumber(r.molarMass, r.molarMassExact)},"monoisotopicMass":${jsonNumber(r.monoisotopicMass, r.monoisotopicMassExact)}${rowEnd(r)}`;
}

/** Nominal masses below this have the row end of a neutral formula with no notes kept. */
const ENDS = 8192;
const neutralEnds = new LazyTexts(ENDS);

/** The row from the nominal mass on: `,"nominalMass":18,"charge":0,"notes":[]}`. */
function rowEnd(r: MassResult): string {
  const nominal = r.nominalMass;
  if (r.charge === 0 && r.notes.length === 0 && nominal !== null && nominal >= 0 && nominal < ENDS && (nominal | 0) === nominal) {
    return neutralEnds.get(nominal) ?? neutralEnds.keep(nominal, `,"nominalMass":${nominal},"charge":0,"notes":[]}`);
  }
  return `,"nominalMass":${nominal},"charge":${r.charge},"notes":${notesLine(r.notes)}}`;
}

/** The CSV/TSV columns of `pondus mass` (the shared writer adds notes, error and message). */
export const MASS_COLUMNS = ['input', 'formula', 'molarMass', 'monoisotopicMass', 'nominalMass', 'charge'] as const;

/**
 * The CSV/TSV cells of a mass result, matching {@link MASS_COLUMNS}: the exact decimals.
 *
 * @param r - a mass result (from formulaMass).
 * @returns the cells in the order of MASS_COLUMNS, the masses as exact decimal text.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a mass result.
 * @example
 * massCells(formulaMass('H2O')) // ['H2O', 'H2O', '18.015', '18.010564683056', 18, 0]
 */
export function massCells(r: MassResult): (string | number | null)[] {
  return [r.input, r.formula, r.molarMassExact, r.monoisotopicMassExact, r.nominalMass, r.charge];
}

/** Characters JSON.stringify would escape (and lone surrogates): strings without them are quoted as they are. */
export const NEEDS_ESCAPE = /["\\\u0000-\u001f\u2028\u2029\ud800-\udfff]/;

/**
 * A JSON string literal; plain text (the usual formula) skips JSON.stringify.
 *
 * @example
 * jsonString('H2O') // '"H2O"'
 */
export function jsonString(s: string): string {
  return NEEDS_ESCAPE.test(s) ? JSON.stringify(s) : `"${s}"`;
}

/**
 * {@link jsonString} without its quotes: the text to put between two quotes a row already holds.
 *
 * @example
 * jsonInner('a"b') // 'a\\"b'
 */
export function jsonInner(s: string): string {
  return NEEDS_ESCAPE.test(s) ? JSON.stringify(s).slice(1, -1) : s;
}

/**
 * The JSON text of a notes list as rows carry it (`[]` when there are none).
 *
 * @example
 * notesLine([]) // '[]'
 */
export function notesLine(notes: readonly { code: string; message: string; options?: readonly string[]; functions?: readonly LibraryFunction[] }[]): string {
  if (notes.length === 0) return '[]';
  let s = '[';
  for (let i = 0; i < notes.length; i++) s += (i ? ',' : '') + noteText(notes[i]);
  return s + ']';
}

// the same few notes recur through a batch (an ion's electrons, non-integer counts): their JSON is kept
const noteTexts = new Map<string, string>();

// a frozen note that names no option or function has one text whatever the naming: kept by the note itself
const frozenNoteTexts = new Map<object, string>();

/** A note's JSON text, its options named as notesJson names them. */
function noteText(n: { code: string; message: string; options?: readonly string[]; functions?: readonly LibraryFunction[] }): string {
  const plain = n.options === undefined && n.functions === undefined && Object.isFrozen(n);
  if (plain) {
    const t = frozenNoteTexts.get(n);
    if (t !== undefined) return t;
  }
  const message = noteWords(n);
  const key = `${n.code}\u0000${message}`;
  let t = noteTexts.get(key);
  if (t === undefined) {
    t = JSON.stringify({ code: n.code, message });
    if (noteTexts.size >= 512) noteTexts.clear();
    noteTexts.set(key, t);
  }
  if (plain) {
    if (frozenNoteTexts.size >= 512) frozenNoteTexts.clear();
    frozenNoteTexts.set(n, t);
  }
  return t;
}
