/**
 * Suggestions for words that are not element symbols: the ways the same letters
 * split into real symbols (`co` → `CO` or `Co`, `nacl` → `NaCl`).
 */
import { getElement, isElementSymbol } from '../elements/element-table.js';
import type { Issue, Note } from '../errors/issue.js';
import type { AtomNode, ComponentNode, PartNode } from './tree.js';
import { ABBREVIATIONS } from './abbreviations.js';
import { namedSubstance } from './names.js';

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
 * A hint for an unknown element symbol on its own, or undefined when there is nothing useful to say.
 * (parse.ts replaces it with {@link unknownElementHint}, which sees the whole formula.)
 *
 * @example
 * unknownSymbolHint('Xx', false) // undefined
 */
export function unknownSymbolHint(word: string, abbreviationsOn: boolean): string | undefined {
  if (!abbreviationsOn && Object.hasOwn(ABBREVIATIONS, word)) {
    const a = ABBREVIATIONS[word];
    return `'${word}' is the abbreviation for ${a.name} (${a.formula})`;
  }
  if (/^[a-z]/.test(word)) return 'element symbols start with a capital letter';
  return undefined;
}

/** The abbreviation spelled (exact case) in `run` over the letters from `from` to `to`, if any. */
function abbreviationOver(run: string, from: number, to: number): string | null {
  let best: string | null = null;
  for (const name of Object.keys(ABBREVIATIONS)) {
    for (let at = run.indexOf(name); at >= 0; at = run.indexOf(name, at + 1)) {
      if (at < to && at + name.length > from && (best === null || name.length > best.length)) best = name;
    }
  }
  return best;
}

/**
 * The hint for an unknown element symbol in a formula: what a name or abbreviation stands for,
 * or the formula re-read with the letter case of the unknown words changed. Hints never re-case
 * letters that already read as element symbols (unless their whole run is in one case, like
 * NACL or h2o, which carries no case information), and never re-case an abbreviation (Ph, tBu,
 * Boc, Cp): so a hint cannot turn Pd(PPh3)4 into Pd(PPH3)4.
 *
 * @example
 * unknownElementHint('DMF', { code: 'UNKNOWN_ELEMENT', message: '', column: 2 }, 'plain', () => true) // "'DMF' is the abbreviation for N,N-dimethylformamide (C3H7NO); …"
 */
export function unknownElementHint(text: string, issue: Issue, mode: 'elements' | 'plain' | 'abbreviations', parses: (s: string) => boolean): string | undefined {
  const whole = namedSubstance(text.trim());
  if (whole && whole.formula.toLowerCase() !== text.trim().toLowerCase()) {
    const how = mode === 'abbreviations' || !/^[A-Z]+$/.test(text.trim()) ? '' : ', or read names with `abbreviations: true`';
    const what = whole.name.toLowerCase() === text.trim().toLowerCase() ? `'${text.trim()}' is ${whole.formula}` : `'${text.trim()}' is the abbreviation for ${whole.name} (${whole.formula})`;
    return `${what}; write its formula, ${whole.formula}${how}`;
  }
  // the unknown word's letter run, and any abbreviation written over it
  const offset = offsetOfColumn(text, issue.column ?? 1);
  for (const m of text.matchAll(/[A-Za-z*]+/g)) {
    const from = m.index!;
    if (offset < from || offset >= from + m[0].length) continue;
    const abbr = abbreviationOver(m[0], offset - from, offset - from + (issue.length ?? 1));
    if (abbr) {
      const a = ABBREVIATIONS[abbr];
      const why = mode === 'elements' ? 'the element-only reading does not expand it' : Object.hasOwn(ABBREVIATIONS, abbr) ? 'read it with `abbreviations: true`' : '';
      return `'${abbr}' is the abbreviation for ${a.name} (${a.formula})${why ? `; ${why}` : ''}`;
    }
    const name = namedSubstance(m[0]);
    if (name && name.formula.toLowerCase() !== m[0].toLowerCase()) return `'${m[0]}' is the abbreviation for ${name.name} (${name.formula}); write its formula, ${name.formula}`;
  }
  const readings = formulaReadings(text, parses);
  if (readings.length > 0) return `did you mean ${readings.map((r) => `'${r}'`).join(' or ')}? Element symbols are one capital letter, or a capital and one lower-case letter`;
  return unknownSymbolHint(text.slice(offset, offset + (issue.length ?? 1)), true);
}

/**
 * The hint for an alkyl prefix written with a hyphen (n-Bu, t-Bu, s-Bu, i-Pr), which a formula
 * writes without it (nBu, tBu): the formula re-written that way, when it then reads.
 *
 * @example
 * alkylPrefixHint('n-BuLi', () => true) // 'write the alkyl prefix without the hyphen: nBuLi'
 */
export function alkylPrefixHint(text: string, parses: (s: string) => boolean): string | undefined {
  if (!/(?:^|[^A-Za-z])[nsti]-[A-Z]/.test(text)) return undefined;
  const joined = text.replace(/(^|[^A-Za-z])([nsti])-(?=[A-Z])/g, '$1$2');
  return joined !== text && parses(joined) ? `write the alkyl prefix without the hyphen: ${joined}` : undefined;
}

/** UTF-16 offset of a 1-based code-point column. */
function offsetOfColumn(text: string, column: number): number {
  let col = 1;
  let i = 0;
  while (i < text.length && col < column) {
    const c = text.charCodeAt(i);
    i += c >= 0xd800 && c <= 0xdbff ? 2 : 1;
    col++;
  }
  return i;
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

/** Case traps that are synthetic elements, never in a bench formula: noted wherever they stand (NaNo3). */
const SYNTHETIC_TRAPS = new Set(['No', 'Nh', 'Hs', 'Cn']);

/**
 * Two capitals that read as two one-letter elements, where the same letters with the second in
 * lower case are a common element: CUSO4 is C, U, S, O4, and copper is Cu (common practice). 'CI'
 * is the capital I typed for the lower-case L of Cl.
 */
const CAPITAL_SLIPS: Readonly<Record<string, string>> = Object.freeze({
  CI: 'Cl',
  CU: 'Cu',
  SI: 'Si',
  PB: 'Pb',
  YB: 'Yb',
  NB: 'Nb',
  IN: 'In',
  PU: 'Pu',
  BI: 'Bi',
  NI: 'Ni',
  SN: 'Sn',
});

const SLIP_PAIRS = new Uint8Array(26 * 26);
for (const pair of Object.keys(CAPITAL_SLIPS)) SLIP_PAIRS[(pair.charCodeAt(0) - 65) * 26 + pair.charCodeAt(1) - 65] = 1;

/**
 * True when the capital at `i` and the capital before it are one of the pairs checked for a slip
 * of case (CU for Cu, CI for Cl): what the fast readers test before leaving a formula to the tree.
 *
 * @example
 * isCapitalSlipAt('CUSO4', 1) // true
 * isCapitalSlipAt('CO2', 1) // false
 */
export function isCapitalSlipAt(text: string, i: number): boolean {
  if (i < 1) return false;
  const a = text.charCodeAt(i - 1) - 65;
  const b = text.charCodeAt(i) - 65;
  return a >= 0 && a < 26 && b >= 0 && b < 26 && SLIP_PAIRS[a * 26 + b] === 1;
}

/**
 * True when a case trap is a synthetic element (No, Nh, Hs, Cn), noted wherever it stands.
 *
 * @example
 * isSyntheticTrap('No') // true
 * isSyntheticTrap('Co') // false
 */
export function isSyntheticTrap(symbol: string): boolean {
  return SYNTHETIC_TRAPS.has(symbol);
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

/**
 * Gentle notes where a metal symbol is probably a slip of case for two light
 * atoms: a lone `Co2` or `No2` (surely CO2, NO2), or an organic formula without
 * brackets where the symbol sits among C, H, N, O, S, P and halogens (`CH3Co`).
 * Cobalt salts, complexes and organometallics written with brackets get no note.
 *
 * @example
 * caseTrapNotes(parseFormula('Co2').components)[0].message // "'Co' is read as cobalt; …"
 */
export function caseTrapNotes(components: ComponentNode[]): Note[] {
  return [...twoLetterTrapNotes(components), ...capitalSlipNotes(components)];
}

/** The synthetic case traps (No, Nh, Hs, Cn) written inside brackets, first of each. */
function bracketedSynthetic(components: ComponentNode[]): AtomNode[] {
  const found: AtomNode[] = [];
  const visit = (parts: PartNode[], inside: boolean) => {
    for (const p of parts) {
      if (p.kind === 'atom') {
        if (inside && p.massNumber === null && SYNTHETIC_TRAPS.has(p.symbol) && !found.some((f) => f.symbol === p.symbol)) found.push(p);
      } else if (!p.abbreviation) for (const c of p.body) visit(c.parts, true);
    }
  };
  for (const c of components) visit(c.parts, false);
  return found;
}

/** The note for a two-letter symbol that may be two light atoms (Co for CO). */
function twoLetterTrapNotes(components: ComponentNode[]): Note[] {
  const atoms: AtomNode[] = [];
  let brackets = false;
  for (const c of components) {
    for (const p of c.parts) {
      if (p.kind === 'atom') atoms.push(p);
      else brackets = true;
    }
  }
  const traps = atoms.filter((a) => a.massNumber === null && isCaseTrap(a.symbol));
  const inBrackets = brackets ? bracketedSynthetic(components) : [];
  if (traps.length === 0 && inBrackets.length === 0) return [];
  const symbols = new Set(atoms.map((a) => a.symbol));
  const lone = symbols.size === 1 && components.length === 1 && atoms.length === 1 && atoms[0].count !== null && !brackets;
  const organic = !brackets && components.length === 1 && symbols.has('C') && [...symbols].every((s) => ORGANIC.has(s) || isCaseTrap(s));
  // elsewhere: a synthetic element (NaNo3), or the same symbol twice in a row (CoCo3, surely CoCO3)
  // the atoms that repeat the atom just before them, written with no count between (one pass)
  const doubled = new Set<AtomNode>();
  for (let i = 1; i < atoms.length; i++) {
    const [a, t] = [atoms[i - 1], atoms[i]];
    if (a.symbol === t.symbol && a.count === null && a.span.end === t.span.start) doubled.add(t);
  }
  const noted = lone || organic ? traps : traps.filter((t) => SYNTHETIC_TRAPS.has(t.symbol) || doubled.has(t));
  // a synthetic element in brackets too: Ca(No3)2 is surely Ca(NO3)2
  for (const t of inBrackets) if (!noted.some((n) => n.symbol === t.symbol)) noted.push(t);
  const seen = new Set<string>();
  const notes: Note[] = [];
  for (const t of noted) {
    if (seen.has(t.symbol)) continue;
    seen.add(t.symbol);
    notes.push({ code: 'CASE_CHECK', message: `'${t.symbol}' is read as ${getElement(t.symbol)!.name}; if you meant the two atoms, write '${CASE_TRAPS[t.symbol]}'` });
  }
  return notes;
}

/** True for one component of atoms only, written in Hill order: C, H, then the rest alphabetically (all alphabetically without C). */
function inHillOrder(components: ComponentNode[]): boolean {
  if (components.length !== 1) return false;
  const parts = components[0].parts;
  if (parts.some((p) => p.kind !== 'atom')) return false;
  const symbols = (parts as AtomNode[]).map((a) => a.symbol);
  const rank = (s: string, hasC: boolean) => (hasC && s === 'C' ? '0' : hasC && s === 'H' ? '1' : `2${s}`);
  const hasC = symbols.includes('C');
  for (let i = 1; i < symbols.length; i++) if (rank(symbols[i - 1], hasC) >= rank(symbols[i], hasC)) return false;
  return true;
}

/**
 * The notes for two capitals read as two one-letter elements where the pair, second letter in
 * lower case, is a common element ('CUSO4' as C, U, S, O4; 'NaCI' with a capital I for the L of
 * Cl). Both readings are real formulas (CI4, NI3), so the formula is computed, with a note.
 */
function capitalSlipNotes(components: ComponentNode[]): Note[] {
  // a formula written in Hill order (C6H4INO2, C6H6BIO2) has its capitals in that order on purpose:
  // only CI (a capital I for the L of Cl) is checked there
  const hill = inHillOrder(components);
  const found = new Set<string>();
  const visit = (parts: PartNode[]) => {
    for (let i = 1; i < parts.length; i++) {
      const a = parts[i - 1];
      const b = parts[i];
      if (a.kind !== 'atom' || b.kind !== 'atom' || a.massNumber !== null || b.massNumber !== null || a.count !== null || a.span.end !== b.span.start) continue;
      const pair = a.symbol + b.symbol;
      if (Object.hasOwn(CAPITAL_SLIPS, pair) && (pair === 'CI' || !hill)) found.add(pair);
    }
    for (const p of parts) if (p.kind === 'group' && !p.abbreviation) for (const c of p.body) visit(c.parts);
  };
  for (const c of components) visit(c.parts);
  return [...found].map((pair) => {
    const meant = CAPITAL_SLIPS[pair];
    const read = `'${pair}' is read as ${getElement(pair[0])!.name} and ${getElement(pair[1])!.name}`;
    if (pair === 'CI') return { code: 'CASE_CHECK', message: `${read}; chlorine is written Cl, with a lower-case L` };
    return { code: 'CASE_CHECK', message: `${read}; ${getElement(meant)!.name} is written ${meant}` };
  });
}

/**
 * Re-readings of one run of letters as element symbols, changing the case of the letters marked
 * free only (the others must keep their case), best first: more symbols first.
 *
 * @example
 * recaseRun('NACL', [true, true, true, true]) // ['NaCl']
 * recaseRun('NaCL', [false, false, false, true]) // ['NaCl']
 */
export function recaseRun(run: string, free: boolean[]): string[] {
  if (run.length > 24) return [];
  const out: string[] = [];
  const walk = (i: number, acc: string) => {
    if (out.length >= MAX_SUGGESTIONS) return;
    if (i === run.length) {
      out.push(acc);
      return;
    }
    for (const len of [1, 2]) {
      if (i + len > run.length) continue;
      const piece = run.slice(i, i + len);
      const sym = piece[0].toUpperCase() + piece.slice(1).toLowerCase();
      let keeps = true;
      for (let k = 0; k < len; k++) if (!free[i + k] && run[i + k] !== sym[k]) keeps = false;
      if (!keeps) continue;
      const fixed = !free.slice(i, i + len).some(Boolean);
      if (isElementSymbol(sym) || (fixed && (sym === 'D' || sym === 'T'))) walk(i + len, acc + sym);
    }
  };
  walk(0, '');
  const symbolsIn = (s: string) => (s.match(/[A-Z]/g) ?? []).length;
  return out.sort((a, b) => symbolsIn(b) - symbolsIn(a));
}

/**
 * Whole-formula suggestions when letter case slipped (`h2o`, `NACL`, `NaCL`): each run of letters
 * re-read as element symbols, keeping the readings that parse. Only the letters of words that are
 * not element symbols may change case, or every letter of a run written in one case throughout
 * (`NACL`, `h`); a run with an abbreviation over an unknown word gets no suggestion.
 *
 * @example
 * formulaReadings('nacl', (s) => true) // ['NaCl']
 */
export function formulaReadings(input: string, parses: (s: string) => boolean): string[] {
  const runs = [...input.matchAll(/[A-Za-z]+/g)];
  if (runs.length === 0 || runs.length > 20) return [];
  const options: string[][] = [];
  for (const m of runs) {
    const run = m[0];
    const words = [...run.matchAll(/[A-Z][a-z]*|[a-z]+/g)];
    const bad = words.filter((w) => !(w[0] === 'D' || w[0] === 'T' || isElementSymbol(w[0])));
    if (bad.length === 0) {
      options.push([run]);
      continue;
    }
    const oneCase = run === run.toUpperCase() || run === run.toLowerCase();
    const free = new Array<boolean>(run.length).fill(oneCase);
    if (!oneCase) {
      for (const w of bad) {
        if (abbreviationOver(run, w.index!, w.index! + w[0].length)) return [];
        for (let k = 0; k < w[0].length; k++) free[w.index! + k] = true;
      }
    }
    const r = recaseRun(run, free);
    if (r.length === 0) return [];
    options.push(r);
  }
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
  candidates.add(build((i) => options[i][0]));
  const first = options.findIndex((o) => o.length > 1);
  if (first >= 0) candidates.add(build((i) => (i === first ? options[i][1] : options[i][0])));
  return [...candidates].filter((c) => c !== input && parses(c)).slice(0, 2);
}

/** One way to split the digits before a bare sign: the count they end with ('' for none) and the charge's digits ('' for 1). */
export interface ChargeReading {
  count: string;
  charge: string;
}

/**
 * Every way the digits written before a bare sign split into a count and a charge (`SO42-`: count
 * 4 and charge 2-, count 42 and charge 1-, or charge 42-), the likeliest first, and only the
 * splits the formula language reads (no leading zero, a charge of at most `maxCharge`, a count
 * after a decimal point). The order is common practice: with two or more digits the last is the
 * charge and the rest the count (SO4^2-, Hg2^2+, Fe(CN)6^4-); with one digit after a lone atom it
 * is the charge (Fe^3+, N^3-), after anything longer the count (NH4^+, NO3^-). Then the count of
 * every digit with a charge of 1, then the other splits, longer counts first; a charge of all the
 * digits comes last. A split with a count of 1 is never the first: nobody writes that count.
 *
 * @param digits - the digits between the last symbol or bracket and the sign.
 * @param loneAtom - true when the formula is one atom with these digits as its count.
 * @param afterPoint - true when the digits follow a decimal point (the count cannot be empty).
 * @example
 * chargeReadings('42', false, false, 99) // [{ count: '4', charge: '2' }, { count: '42', charge: '' }, { count: '', charge: '42' }]
 * chargeReadings('3', true, false, 99)   // [{ count: '', charge: '3' }, { count: '3', charge: '' }]
 * chargeReadings('12', true, false, 99)  // [{ count: '12', charge: '' }, { count: '1', charge: '2' }, { count: '', charge: '12' }]
 */
export function chargeReadings(digits: string, loneAtom: boolean, afterPoint: boolean, maxCharge: number): ChargeReading[] {
  const all: ChargeReading[] = [];
  for (let k = digits.length; k >= 0; k--) {
    const count = digits.slice(0, k);
    const charge = digits.slice(k);
    if (count === '' && afterPoint) continue;
    if (count !== '' && count[0] === '0') continue;
    if (charge !== '' && (charge[0] === '0' || charge.length > 2 || Number(charge) > maxCharge)) continue;
    all.push({ count, charge });
  }
  // all: the count of every digit first, then longer counts first, the charge of every digit last
  let first = digits.length >= 2 ? all.find((r) => r.charge.length === 1 && r.count !== '') : loneAtom ? all.find((r) => r.count === '') : all[0];
  // a count of 1 is not written (C1^2- for C12-): such a split is not the likeliest
  if (first?.count === '1') first = all.find((r) => r.count !== '1') ?? first;
  return first === undefined ? all : [first, ...all.filter((r) => r !== first)];
}
