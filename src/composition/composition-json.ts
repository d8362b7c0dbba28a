/**
 * The one serialiser of `pondus composition`: the JSON object and JSON line of a
 * plain composition result, and its CSV/TSV rows, wide (one `X_percent` column per
 * element) or long (one row per element). The CLI prints exactly these (the shared
 * writer adds the input's line number and the notes column).
 */
import { jsonNumber, numberText, smallNumberText } from '../exact/json-number.js';
import { alphabeticalRank } from '../elements/atom-data.js';
import type { Note } from '../errors/issue.js';
import { jsonInner, jsonString, notesJson, notesLine, type NoteJson } from '../mass/mass-json.js';
import type { CompositionResult } from './element-shares.js';

/** The stable JSON shape of a composition result (the `composition --json` contract, before the shared writer's `line`). */
export interface CompositionJson {
  input: string;
  formula: string;
  molarMass: number;
  elements: { symbol: string; count: number; mass: number; massPercent: number }[];
  part?: { part: string; formula: string; count: number; mass: number; massPercent: number; countedFrom: string };
  notes: NoteJson[];
}

/**
 * The JSON object `pondus composition --json` writes for one result.
 *
 * @param r - a composition result (from composition).
 * @returns the row object: input, formula, molar mass, each element's count, mass and mass percent, the part when one was asked for, and the notes.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a composition result.
 * @example
 * compositionJson(composition('H2O')).elements[0].symbol // 'H'
 * String(compositionJson(composition('H2O')).elements[0].massPercent) // '11.19…'
 */
export function compositionJson(r: CompositionResult): CompositionJson {
  const o = {
    input: r.input,
    formula: r.formula,
    molarMass: r.molarMass,
    elements: r.elements.map((e) => ({ symbol: e.symbol, count: e.count, mass: e.mass, massPercent: e.massPercent })),
  } as CompositionJson;
  if (r.part) {
    const p = r.part;
    o.part = { part: p.part, formula: p.formula, count: p.count, mass: p.mass, massPercent: p.massPercent, countedFrom: p.countedFrom };
  }
  o.notes = notesJson(r.notes);
  return o;
}

/**
 * The same text as JSON.stringify(compositionJson(r)), written straight to one line (with `line`,
 * JSON.stringify({ line, ...compositionJson(r) }), as the CLI's JSON writer gives every row).
 *
 * @param r - a composition result (from composition).
 * @param line - the input's line number to put first in the row; left out by default.
 * @returns one line of JSON text, without a newline.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a composition result or `line` is given and not a number.
 * @example
 * compositionJsonLine(composition('H2')) // '{"input":"H2","formula":"H2","molarMass":2.016,"elements":[{"symbol":"H","count":2,"mass":2.016,"massPercent":100}],"notes":[]}'
 */
export function compositionJsonLine(r: CompositionResult, line?: number): string {
  // every piece joined is a node the output's flattening walks later: constant runs are kept whole
  // (an element's key texts with its symbol, a count with the key after it, the usual end)
  let s = `${line === undefined ? '{"input":"' : `{"line":${line},"input":"`}${jsonInner(r.input)}","formula":"${r.formula}","molarMass":${jsonNumber(r.molarMass, r.molarMassExact)}`;
  const els = r.elements;
  for (let i = 0; i < els.length; i++) {
    const e = els[i];
    s += `${elementHead(e.symbol, i === 0)}${countText(e.count)}${jsonNumber(e.mass, e.massExact)},"massPercent":${numberText(e.massPercent)}`;
  }
  s += els.length === 0 ? ',"elements":[]' : '}]';
  if (r.part) {
    const p = r.part;
    s += `,"part":{"part":${jsonString(p.part)},"formula":"${p.formula}","count":${numberText(p.count)},"mass":${numberText(p.mass)},"massPercent":${numberText(p.massPercent)},"countedFrom":"${p.countedFrom}"}`;
  }
  return r.notes.length === 0 ? s + ',"notes":[]}' : `${s},"notes":${notesLine(r.notes)}}`;
}

// the opening of an element's object up to its count, by symbol: first in the list, and after another
const firstHeads = new Map<string, string>();
const nextHeads = new Map<string, string>();

/** `,"elements":[{"symbol":"C","count":` for the first element, `},{"symbol":"C","count":` after one. */
function elementHead(symbol: string, first: boolean): string {
  const heads = first ? firstHeads : nextHeads;
  let h = heads.get(symbol);
  if (h === undefined) {
    h = `${first ? ',"elements":[' : '},'}{"symbol":"${symbol}","count":`;
    if (heads.size >= 512) heads.clear();
    heads.set(symbol, h);
  }
  return h;
}

/** The texts of whole counts below COUNT_TEXTS with the key after them (`12,"mass":`), each made on first use. */
const COUNT_TEXTS = 4096;
const countTexts: (string | undefined)[] = new Array(COUNT_TEXTS).fill(undefined);

/** A count's JSON text and the `mass` key after it. */
function countText(count: number): string {
  if (count >= 0 && count < COUNT_TEXTS && (count | 0) === count) return (countTexts[count] ??= `${smallNumberText(count)},"mass":`);
  return `${smallNumberText(count)},"mass":`;
}

/** Cells of one CSV/TSV row. */
export type CsvCell = string | number | null;

/** The columns of the wide CSV form before the element columns. */
const WIDE_HEAD = ['input', 'formula', 'molarMass'];
const PART_COLUMNS = ['part', 'partCount', 'partMassPercent'];

/** Hill-like order of element labels for column headers: C, H, then alphabetical, nuclides after their element. */
function columnRank(label: string): number {
  const m = /^\[?([0-9]*)([A-Z][a-z]?)\]?$/.exec(label);
  const symbol = label === 'D' || label === 'T' ? 'H' : m ? m[2] : label;
  const a = label === 'D' ? 2 : label === 'T' ? 3 : m && m[1] ? Number(m[1]) : 0;
  return symbol === 'C' ? a - 1e6 : symbol === 'H' ? a - 5e5 : alphabeticalRank(symbol) * 1000 + a;
}

/**
 * The header of the wide CSV form: one `X_percent` column per element that occurs in `results`
 * (the first block of a batch), C and H first, then alphabetically.
 *
 * @param results - the results the element columns are decided from.
 * @param withPart - whether the `--part` columns (part, partCount, partMassPercent) follow.
 * @returns the column names (the shared writer adds notes, error and message).
 * @throws PondusError: BAD_ARGUMENT when `results` is not an array of composition results.
 * @example
 * compositionCsvColumns([composition('H2O'), composition('NaCl')], false) // ['input', 'formula', 'molarMass', 'H_percent', 'Cl_percent', 'Na_percent', 'O_percent']
 */
export function compositionCsvColumns(results: readonly CompositionResult[], withPart: boolean): string[] {
  const seen = new Set<string>();
  for (const r of results) for (const e of r.elements) seen.add(e.symbol);
  const labels = [...seen].sort((a, b) => columnRank(a) - columnRank(b));
  return [...WIDE_HEAD, ...labels.map((l) => `${l}_percent`), ...(withPart ? PART_COLUMNS : [])];
}

/**
 * The wide CSV row of a result under `columns` (from {@link compositionCsvColumns}). An element
 * with no column (it first occurs after the block the header came from) is not dropped: a note
 * gives its percent and points to `--long`.
 *
 * @param r - a composition result (from composition).
 * @param columns - the header the row is written under (from compositionCsvColumns).
 * @returns the cells, and a NO_COLUMN note for any element the header has no column for.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a composition result or `columns` not an array of strings.
 * @example
 * compositionCsvRow(composition('H2O'), ['input', 'formula', 'molarMass', 'H_percent', 'O_percent']).cells[3] // 11.190674437968359
 */
export function compositionCsvRow(r: CompositionResult, columns: readonly string[]): { cells: CsvCell[]; notes: Note[] } {
  const cells: CsvCell[] = [r.input, r.formula, r.molarMassExact];
  const at = new Map<string, number>();
  for (let i = 0; i < r.elements.length; i++) at.set(`${r.elements[i].symbol}_percent`, i);
  const notes: Note[] = [];
  let used = 0;
  for (let c = WIDE_HEAD.length; c < columns.length; c++) {
    const name = columns[c];
    if (PART_COLUMNS.includes(name)) break;
    const i = at.get(name);
    if (i === undefined) cells.push(0);
    else {
      cells.push(r.elements[i].massPercent);
      used++;
    }
  }
  if (used < r.elements.length) {
    const missing = r.elements.filter((e) => !columns.includes(`${e.symbol}_percent`));
    notes.push({ code: 'NO_COLUMN', message: `no column for ${missing.map((e) => `${e.symbol} (${e.massPercent} %)`).join(', ')}: the element columns come from the first block of rows; \`compositionCsvLongRows\` writes one row per element`, functions: ['compositionCsvLongRows'] });
  }
  if (columns.includes('part')) {
    cells.push(r.part ? r.part.part : null, r.part ? r.part.count : null, r.part ? r.part.massPercent : null);
  }
  return { cells, notes };
}

/** The columns of the long CSV form: one row per element. */
export const COMPOSITION_LONG_COLUMNS = ['input', 'formula', 'molarMass', 'symbol', 'count', 'mass', 'massPercent'];

/**
 * The long CSV rows of a result: one per element, under {@link COMPOSITION_LONG_COLUMNS}
 * (with `--part`, the part columns follow on every row).
 *
 * @param r - a composition result (from composition).
 * @param withPart - whether each row ends with the part columns.
 * @returns one row of cells per element.
 * @throws PondusError: BAD_ARGUMENT when `r` is not a composition result.
 * @example
 * compositionCsvLongRows(composition('H2O'), false).map((row) => row[3]) // ['H', 'O']
 */
export function compositionCsvLongRows(r: CompositionResult, withPart: boolean): CsvCell[][] {
  return r.elements.map((e) => {
    const row: CsvCell[] = [r.input, r.formula, r.molarMassExact, e.symbol, e.count, e.mass, e.massPercent];
    if (withPart) row.push(r.part ? r.part.part : null, r.part ? r.part.count : null, r.part ? r.part.massPercent : null);
    return row;
  });
}
