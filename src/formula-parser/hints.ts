/**
 * Suggestions for words that are not element symbols: the ways the same letters
 * split into real symbols (`co` → `CO` or `Co`, `nacl` → `NaCl`).
 */
import { getElement, isElementSymbol } from '../elements/element-table.js';
import type { Note } from '../errors/issue.js';
import type { AtomNode, ComponentNode } from './tree.js';
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

/** Two-letter symbols that read as two common light atoms when the case slips (Co vs CO). */
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

const ORGANIC = new Set(['C', 'H', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'I']);

/**
 * True when a symbol is one of the two-letter symbols checked for a slip of case.
 *
 * @example
 * isCaseTrap('Co') // true
 */
export function isCaseTrap(symbol: string): boolean {
  return Object.hasOwn(CASE_TRAPS, symbol);
}

/**
 * Gentle notes where a metal symbol is probably a slip of case for two light
 * atoms: a lone `Co2` or `No2` (surely CO2, NO2), or an organic formula without
 * brackets where the symbol sits among C, H, N, O, S, P and halogens (`CH3Co`).
 * Cobalt salts, complexes and organometallics written with brackets get no note.
 *
 * @example
 * caseTrapNotes(parseFormula('Co2').components) // [{ code: 'CASE_CHECK', message: "'Co' is read as cobalt; …" }]
 */
export function caseTrapNotes(components: ComponentNode[]): Note[] {
  const atoms: AtomNode[] = [];
  let brackets = false;
  for (const c of components) {
    for (const p of c.parts) {
      if (p.kind === 'atom') atoms.push(p);
      else brackets = true;
    }
  }
  const traps = atoms.filter((a) => a.massNumber === null && isCaseTrap(a.symbol));
  if (traps.length === 0) return [];
  const symbols = new Set(atoms.map((a) => a.symbol));
  const lone = symbols.size === 1 && components.length === 1 && atoms.length === 1 && atoms[0].count !== null && !brackets;
  const organic = !brackets && components.length === 1 && symbols.has('C') && [...symbols].every((s) => ORGANIC.has(s) || isCaseTrap(s));
  if (!lone && !organic) return [];
  const seen = new Set<string>();
  const notes: Note[] = [];
  for (const t of traps) {
    if (seen.has(t.symbol)) continue;
    seen.add(t.symbol);
    notes.push({ code: 'CASE_CHECK', message: `'${t.symbol}' is read as ${getElement(t.symbol)!.name}; if you meant the two atoms, write '${CASE_TRAPS[t.symbol]}'` });
  }
  return notes;
}

/**
 * Whole-formula suggestions when the letter case slipped throughout (`h2o`, `NACL`): every run of
 * letters re-read as element symbols, keeping the readings that parse. Best first: readings with
 * more symbols (CO2 before Co2), as a lower-case formula is usually made of light elements.
 *
 * @example
 * formulaReadings('nacl', (s) => true) // ['NaCl']
 */
export function formulaReadings(input: string, parses: (s: string) => boolean): string[] {
  const runs = [...input.matchAll(/[A-Za-z]+/g)];
  if (runs.length === 0 || runs.length > 20) return [];
  const options = runs.map((m) => {
    const r = symbolReadings(m[0]);
    return isWordOfSymbols(m[0]) ? [m[0], ...r] : r;
  });
  if (options.some((o) => o.length === 0)) return [];
  const build = (pick: (i: number) => string) => {
    let out = '';
    let last = 0;
    runs.forEach((m, i) => {
      out += input.slice(last, m.index) + pick(i);
      last = m.index! + m[0].length;
    });
    return out + input.slice(last);
  };
  const candidates = new Set<string>();
  const symbolsIn = (s: string) => (s.match(/[A-Z]/g) ?? []).length;
  const most = (o: string[]) => [...o].sort((a, b) => symbolsIn(b) - symbolsIn(a));
  candidates.add(build((i) => most(options[i])[0]));
  const first = options.findIndex((o) => o.length > 1);
  if (first >= 0) candidates.add(build((i) => (i === first ? most(options[i])[1] : most(options[i])[0])));
  return [...candidates].filter((c) => c !== input && parses(c)).slice(0, 2);
}

/** True when a word is already a run of correctly written element symbols. */
function isWordOfSymbols(word: string): boolean {
  const parts = word.match(/[A-Z][a-z]?/g);
  return parts !== null && parts.join('') === word && parts.every((p) => isElementSymbol(p));
}
