/**
 * Suggestions for words that are not element symbols: the ways the same letters
 * split into real symbols (`co` → `CO` or `Co`, `nacl` → `NaCl`).
 */
import { getElement, isElementSymbol } from '../elements/element-table.js';
import type { Note } from '../errors/issue.js';
import { ABBREVIATIONS } from './abbreviations.js';

const MAX_SUGGESTIONS = 4;

/**
 * The ways `word` (any letter case) can be read as a run of element symbols, best first.
 *
 * @example
 * symbolReadings('co') // ['Co', 'CO']
 */
export function symbolReadings(word: string): string[] {
  const lower = word.toLowerCase();
  if (lower.length > 24) return [];
  const out: string[] = [];
  const walk = (i: number, acc: string) => {
    if (out.length >= MAX_SUGGESTIONS) return;
    if (i === lower.length) {
      out.push(acc);
      return;
    }
    for (const len of [2, 1]) {
      const piece = lower.slice(i, i + len);
      if (piece.length !== len) continue;
      const sym = piece[0].toUpperCase() + piece.slice(1);
      if (isElementSymbol(sym)) walk(i + len, acc + sym);
    }
  };
  walk(0, '');
  return out.filter((s) => s !== word);
}

/**
 * A hint for an unknown element symbol, or undefined when there is nothing useful to say.
 *
 * @example
 * unknownSymbolHint('co', 'co2') // "did you mean CO2 (carbon and oxygen) or Co2 (cobalt)? Symbols start with a capital letter"
 */
export function unknownSymbolHint(word: string, abbreviationsOn: boolean): string | undefined {
  if (!abbreviationsOn && Object.hasOwn(ABBREVIATIONS, word)) {
    const a = ABBREVIATIONS[word];
    return `'${word}' is the abbreviation for ${a.name} (${a.formula}); turn abbreviations on to read it (--abbreviations, or { abbreviations: true })`;
  }
  const readings = symbolReadings(word);
  if (readings.length === 0) {
    if (/^[a-z]/.test(word)) return 'element symbols start with a capital letter';
    return undefined;
  }
  const quoted = readings.map((r) => `'${r}'`);
  const list = quoted.length === 1 ? quoted[0] : `${quoted.slice(0, -1).join(', ')} or ${quoted[quoted.length - 1]}`;
  return `did you mean ${list}? Element symbols are one capital letter, or a capital and one lower-case letter`;
}

/** Two-letter symbols that read as two common organic atoms when the case slips (Co vs CO). */
const CASE_TRAPS: Readonly<Record<string, string>> = Object.freeze({
  Co: 'CO',
  Cs: 'CS',
  Sn: 'SN',
  Ni: 'NI',
  No: 'NO',
  Os: 'OS',
  Hs: 'HS',
  Nh: 'NH',
  Ho: 'HO',
  Hf: 'HF',
  Sc: 'SC',
  Cn: 'CN',
});

/**
 * A gentle note when a formula contains a metal symbol that may be a slip of case
 * for two light atoms (`Co` for `CO`), given the other symbols in the formula.
 *
 * @example
 * caseTrapNote('Co', ['C', 'H']) // "'Co' is read as cobalt; carbon and oxygen is 'CO'"
 */
export function caseTrapNote(symbol: string, elementName: string, others: Iterable<string>): string | undefined {
  const alt = CASE_TRAPS[symbol];
  if (!alt) return undefined;
  let organic = false;
  for (const o of others) if (o === 'C' || o === 'H') organic = true;
  if (!organic) return undefined;
  return `'${symbol}' is read as ${elementName}; if you meant the two atoms, write '${alt}'`;
}

/**
 * The case-check notes for the set of element symbols in a formula.
 *
 * @example
 * caseTrapNotes(new Set(['Co', 'H'])) // [{ code: 'CASE_CHECK', message: "'Co' is read as cobalt; …" }]
 */
export function caseTrapNotes(symbols: Set<string>): Note[] {
  const notes: Note[] = [];
  if (symbols.size < 2) return notes;
  for (const s of symbols) {
    if (!CASE_TRAPS[s]) continue;
    const msg = caseTrapNote(s, getElement(s)!.name, [...symbols].filter((o) => o !== s));
    if (msg) notes.push({ code: 'CASE_CHECK', message: msg });
  }
  return notes;
}

/**
 * True when a symbol is one of the two-letter symbols checked for a slip of case.
 *
 * @example
 * isCaseTrap('Co') // true
 */
export function isCaseTrap(symbol: string): boolean {
  return Object.hasOwn(CASE_TRAPS, symbol);
}
