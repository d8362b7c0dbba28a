/**
 * The atom totals of a plain formula straight from its text, with no tree in between: the
 * batch hot path of `mass` and `composition`. It takes the plainest part of what the fast
 * reader (formula-parser/fast-path.ts) takes (element symbols, D and T, whole counts in ASCII
 * or subscript digits, brackets, `·`/`*` with whole multipliers, a charge at the end, spaces at
 * the ends) and declines everything that gets a note or needs settling (decimal counts, the
 * `CuSO4.5H2O` dot, a case trap such as `Co` where it may get a note, runs such as THF), which
 * then takes the tree path.
 * What it gives is exactly `atomVector(parseFormula(text))`, with the tree's charge and no notes;
 * tests/formula/plain-vector.test.ts checks that on generated formulas.
 */
import { atomId } from '../elements/atom-data.js';
import { mayStartCharge, plainSymbol, readEndCharge } from '../formula-parser/fast-path.js';
import { isCapitalSlipAt, isCaseTrap, isSyntheticTrap } from '../formula-parser/hints.js';
import { isMassNumberOf } from '../formula-parser/leading-number.js';
import { MAX_FORMULA_LENGTH, MAX_NESTING } from '../formula-parser/prescan.js';
import { mayNeedSettling } from '../formula-parser/readings.js';
import type { ParseOptions } from '../formula-parser/parse.js';
import { MAX_COUNT_DIGITS } from '../formula-parser/visitor.js';
import { hillIds, MAX_ATOMS, type AtomVector } from './flatten.js';

/** The atom totals and charge of a plain formula. */
export interface PlainVector {
  vector: AtomVector;
  charge: number;
}

// scratch space, reused by every call (the library is single-threaded): one entry per atom
// written, and per open bracket where its entries and its component start
const entryId = new Int32Array(MAX_FORMULA_LENGTH);
const entryCount = new Float64Array(MAX_FORMULA_LENGTH);
const groupStart = new Int32Array(MAX_NESTING + 1);
const componentStart = new Int32Array(MAX_NESTING + 1);
const componentMultiplier = new Float64Array(MAX_NESTING + 1);
const componentParts = new Int32Array(MAX_NESTING + 1);
const closeOf = new Int32Array(MAX_NESTING + 1);
const TOTALS_SIZE = 8192;
/** The kinds of atom of the formula being read, in order of first appearance. */
const firstIds = new Int32Array(MAX_FORMULA_LENGTH);
const totals = new Float64Array(TOTALS_SIZE);

/** Dense-table ids by letters (first × 27 + second, or first × 27 + 26 for one letter); -2 not looked up yet, -1 declined. */
const idByLetters = new Int32Array(26 * 27).fill(-2);
/** 1 for the symbols that may be a slip of case (Co for CO), which get a note in some formulas; 2 for those that are synthetic elements. */
const trapByLetters = new Uint8Array(26 * 27);
/** Set by symbolId: whether the symbol just looked up is a case trap. */
let lastTrap = false;
/** Set by symbolId: whether that trap is a synthetic element (No, Nh, Hs, Cn), noted wherever it stands. */
let lastSynthetic = false;

function symbolId(text: string, start: number, end: number): number {
  const first = text.charCodeAt(start) - 65;
  const k = first * 27 + (end - start === 1 ? 26 : text.charCodeAt(start + 1) - 97);
  let id = idByLetters[k];
  if (id === -2) {
    const symbol = plainSymbol(text, start, end);
    if (symbol === undefined) id = -1;
    else {
      if (end - start === 2 && isCaseTrap(symbol)) trapByLetters[k] = isSyntheticTrap(symbol) ? 2 : 1;
      const letter = text[start];
      id = end - start === 1 && (letter === 'D' || letter === 'T') ? atomId('H', letter === 'D' ? 2 : 3) : atomId(symbol, null);
      if (id >= TOTALS_SIZE) id = -1;
    }
    idByLetters[k] = id;
  }
  lastTrap = trapByLetters[k] !== 0;
  lastSynthetic = trapByLetters[k] === 2;
  return id;
}

const GIVE_UP = -1;
/** Where a count read stops, and its value (module scratch, so reading a count allocates nothing). */
let countEnd = 0;

/**
 * A whole count at `pos`: ASCII digits, or (after a symbol or bracket) subscript digits; 1 when
 * none is written, GIVE_UP for what the tree path must read (a leading zero, too many digits, a
 * '.' after it, ASCII and subscript digits mixed). Sets countEnd.
 */
function readCount(t: string, pos: number, limit: number, afterPart: boolean): number {
  let end = pos;
  let v = 0;
  while (end < limit) {
    const c = t.charCodeAt(end);
    if (c < 48 || c > 57) break;
    v = v * 10 + (c - 48);
    end++;
  }
  if (end > pos) {
    const next = end < limit ? t.charCodeAt(end) : -1;
    if (t.charCodeAt(pos) === 48 || end - pos > MAX_COUNT_DIGITS || next === 46 || (next >= 0x2080 && next <= 0x2089)) return GIVE_UP;
    countEnd = end;
    return v;
  }
  if (!afterPart) {
    countEnd = pos;
    return 0; // no multiplier written
  }
  while (end < limit) {
    const c = t.charCodeAt(end);
    if (c < 0x2080 || c > 0x2089) break;
    v = v * 10 + (c - 0x2080);
    end++;
  }
  if (end === pos) {
    countEnd = pos;
    return 0; // no count written
  }
  const next = end < limit ? t.charCodeAt(end) : -1;
  if (t.charCodeAt(pos) === 0x2080 || end - pos > MAX_COUNT_DIGITS || (next >= 48 && next <= 57) || next === 46) return GIVE_UP;
  countEnd = end;
  return v;
}

/** The number written first in the formula or a bracket, at each depth (0 when none): it may be a mass number. */
const leadingNumber = new Float64Array(MAX_NESTING + 2);

/**
 * Starts a component at `pos` at this depth: reads its multiplier (1 when none is written) and
 * marks where its atoms begin. False when the multiplier needs the tree path. Sets countEnd.
 */
function startComponent(t: string, pos: number, limit: number, depth: number, sp: number, first: boolean): boolean {
  const m = readCount(t, pos, limit, false);
  if (m === GIVE_UP) return false;
  // a number first in the formula or a bracket may be a mass number (13CO2, [13C6]): checked at its atom
  leadingNumber[depth] = first ? m : 0;
  componentStart[depth] = sp;
  componentMultiplier[depth] = m === 0 ? 1 : m;
  componentParts[depth] = 0;
  return true;
}

/** Multiplies entries [from, to) by k; false when a product passes MAX_ATOMS (the tree path then reports it). */
function scale(from: number, to: number, k: number): boolean {
  if (k === 1) return true;
  for (let i = from; i < to; i++) {
    const p = entryCount[i] * k;
    if (p > MAX_ATOMS) return false;
    entryCount[i] = p;
  }
  return true;
}

/**
 * The atom totals of a plain formula, or null when the formula needs the tree path (anything
 * with a note, a reading to settle, an error, or counts past 10^12).
 *
 * @param input - the formula text.
 * @returns the atom vector (Hill order, whole counts) and the charge, or null.
 * @example
 * plainVector('CuSO4·5H2O')?.vector.counts // [1, 10, 9, 1]
 * plainVector('SO4^2-')?.charge            // -2
 * plainVector('CuSO4.5H2O')                // null
 */
export function plainVector(input: string): PlainVector | null {
  if (input.length === 0 || input.length > MAX_FORMULA_LENGTH) return null;
  const t = input;
  let pos = 0;
  let limit = t.length;
  while (pos < limit && t.charCodeAt(pos) === 32) pos++;
  while (limit > pos && t.charCodeAt(limit - 1) === 32) limit--;
  if (pos === limit) return null;

  let sp = 0;
  let depth = 0;
  let run = 0;
  let longRun = false;
  let charge = 0;
  // a case trap among the top level's atoms may get a note when the top level is one component with no brackets
  let trapAtTop = false;
  /** Where the last atom read ends when it has no count (-1 when it has one). */
  let lastAtomEnd = -1;
  let bracketAtTop = false;
  let componentsAtTop = 1;
  if (!startComponent(t, pos, limit, 0, 0, true)) return null;
  pos = countEnd;
  for (;;) {
    const c = pos < limit ? t.charCodeAt(pos) : -1;
    if (c >= 65 && c <= 90) {
      let end = pos + 1;
      while (end < limit) {
        const l = t.charCodeAt(end);
        if (l < 97 || l > 122) break;
        end++;
      }
      if (end - pos > 2) return null;
      if (end - pos === 1 && isCapitalSlipAt(t, pos)) return null; // 'CI', 'CU' get a note (Cl, Cu?) on the tree path
      const id = symbolId(t, pos, end);
      if (id < 0) return null;
      if (leadingNumber[depth] !== 0 && componentParts[depth] === 0 && (c !== 68 && c !== 84 || end - pos > 1) && isMassNumberOf(t.slice(pos, end), leadingNumber[depth])) return null;
      // noted in any formula, at any depth: a synthetic element (NaNo3, Ca(No3)2)
      if (lastSynthetic) return null;
      if (lastTrap && depth === 0) {
        trapAtTop = true;
        // noted in any formula: the same symbol twice in a row (CoCo3)
        if (sp > 0 && entryId[sp - 1] === id && lastAtomEnd === pos) return null;
      }
      const k = readCount(t, end, limit, true);
      if (k === GIVE_UP) return null;
      lastAtomEnd = k === 0 ? end : -1;
      pos = countEnd;
      if (++run >= 3) longRun = true;
      if (k !== 0) run = 0;
      entryId[sp] = id;
      entryCount[sp++] = k === 0 ? 1 : k;
      componentParts[depth]++;
      continue;
    }
    if (c === 40 || c === 91 || c === 123) {
      if (depth >= MAX_NESTING) return null;
      const after = t.charCodeAt(pos + 1);
      if (c === 91 && after >= 48 && after <= 57) return null; // '[13C]' is a nuclide label
      componentParts[depth]++;
      if (depth === 0) bracketAtTop = true;
      depth++;
      groupStart[depth] = sp;
      closeOf[depth] = c === 40 ? 41 : c + 2;
      if (!startComponent(t, pos + 1, limit, depth, sp, true)) return null;
      pos = countEnd;
      continue;
    }
    // the parts of a component end here
    if (componentParts[depth] === 0) return null;
    if (!scale(componentStart[depth], sp, componentMultiplier[depth])) return null;
    if (c === 0xb7 || c === 42) {
      if (depth === 0) componentsAtTop++;
      if (!startComponent(t, pos + 1, limit, depth, sp, false)) return null;
      pos = countEnd;
      continue;
    }
    if (depth > 0) {
      if (c !== closeOf[depth]) return null;
      const k = readCount(t, pos + 1, limit, true);
      if (k === GIVE_UP) return null;
      pos = countEnd;
      if (!scale(groupStart[depth], sp, k === 0 ? 1 : k)) return null;
      depth--;
      continue;
    }
    if (c === -1) break;
    if (!mayStartCharge(t, pos)) return null;
    const z = readEndCharge(t, pos, limit);
    if (z === null) return null;
    charge = z;
    break;
  }
  if (longRun && mayNeedSettling(input)) return null;
  if (trapAtTop && !bracketAtTop && componentsAtTop === 1) return null; // the tree path decides on the note

  // totals per kind of atom, in order of first appearance (gathered in scratch space, then one
  // array of the right length: no array grown by pushing for each formula)
  let n = 0;
  let tooMany = false;
  for (let i = 0; i < sp; i++) {
    const id = entryId[i];
    if (totals[id] === 0) firstIds[n++] = id;
    const s = totals[id] + entryCount[i];
    if (s > MAX_ATOMS) tooMany = true;
    totals[id] = s;
  }
  const seen = new Array<number>(n);
  for (let i = 0; i < n; i++) seen[i] = firstIds[i];
  const ids = hillIds(seen);
  const counts = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    // whole counts up to 2^30 as small integers, as the tree path holds them: one kind of array
    // for the readers of counts (sums, the serialisers) whichever path a formula took
    const v = totals[ids[i]];
    counts[i] = v < 0x40000000 ? v | 0 : v;
    totals[ids[i]] = 0;
  }
  if (tooMany) return null;
  return { vector: { ids, counts, whole: true, seen }, charge };
}

/**
 * {@link plainVector} for a text read with reading options: null also where the options ask for
 * what the plain reader does not do (every abbreviation read, or a shorter length limit).
 *
 * @example
 * plainVectorFor('H2O', {})?.vector.counts                  // [2, 1]
 * plainVectorFor('H2O', { abbreviations: true })            // null
 */
export function plainVectorFor(input: string, options: ParseOptions): PlainVector | null {
  if (options.abbreviations === true || (options.maxLength !== undefined && input.length > options.maxLength)) return null;
  return plainVector(input);
}
