/**
 * Entry points of the formula parser: text in, typed tree or PondusError out.
 * Parsing never computes masses; see ../mass and ../composition for that.
 */
import type { IRecognitionException, IToken } from 'chevrotain';
import type { Issue } from '../errors/issue.js';
import { typedIssue } from '../errors/message.js';
import { MAX_ISSUES, PondusError, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';
import type { Note } from '../errors/issue.js';
import { ABBREVIATIONS, REFUSED_ABBREVIATIONS } from './abbreviations.js';
import { fastParse } from './fast-path.js';
import { alkylPrefixHint, unknownElementHint } from './hints.js';
import { fullGrammar } from './grammar-loader.js';
import { REAGENTS } from './names.js';
import { columnOf, MAX_FORMULA_LENGTH, prescanAll } from './prescan.js';
import { leadingNumberIssues } from './leading-number.js';
import { ligandNameIssues } from './ligand-names.js';
import { mixtureRefusals, settleReadings } from './readings.js';
import { end, type ComponentNode, type FormulaTree, type GroupNode, type PartNode, type Span } from './tree.js';
import type { FormulaCstNode } from './cst.js';
import { buildTree, unknownElement, type ReadingMode } from './visitor.js';

/** Options for {@link parseFormula}. */
export interface ParseOptions {
  /**
   * How letters that could be an abbreviation are read.
   * - default (`false` or left out): abbreviations that no element symbol can be confused with
   *   (Me, Ph, Boc, Cp*, dba, py, …) are read, each with a note; letters that are element symbols
   *   and also an abbreviation or reagent name (Ac, Ts, Pr beside C and H, THF, NBS, TBS) are refused
   *   with both readings offered; `Py` (pyridyl or pyridine) is always refused.
   * - `true`: every abbreviation is read, the clashing ones too (Pr propyl, Ac acetyl, Ts tosyl), and
   *   all-capitals reagent names (THF, DMF, NBS, COD) stand for their formulas, each with a note.
   * - `'none'`: element symbols only; nothing is expanded and nothing is refused for looking like a name.
   */
  abbreviations?: boolean | 'none';
  /** Longest input accepted (default 10,000 characters). */
  maxLength?: number;
}

/** Above 0 while a hint re-reads a formula with other letter case. */
let hintDepth = 0;

/**
 * Runs `find` (which may re-read other spellings of the formula to word a hint) unless a hint is
 * being looked for already: a re-read needs only its success, so the search is one level deep
 * whatever the input.
 */
function lookForHints(find: () => void): void {
  if (hintDepth > 0) return;
  hintDepth++;
  try {
    find();
  } finally {
    hintDepth--;
  }
}

/**
 * Parses a chemical formula into a typed tree. Throws a {@link PondusError} on bad input.
 *
 * @param input - the formula text ('CuSO4·5H2O', '[Fe(CN)6]^4-', 'Ph3P').
 * @param options - how abbreviations are read (`abbreviations`) and the longest input accepted (`maxLength`).
 * @returns the typed formula tree: its components, charge and notes.
 * @throws PondusError listing every problem found: EMPTY_INPUT, INPUT_TOO_LONG, CONTROL_CHARACTER, UNEXPECTED_CHARACTER, UNEXPECTED_TOKEN, UNKNOWN_ELEMENT, UNKNOWN_ISOTOPE, UNCLOSED_GROUP, UNMATCHED_CLOSING, MISMATCHED_BRACKET, EMPTY_GROUP, NESTING_TOO_DEEP, BAD_COUNT, COUNT_TOO_LARGE, BAD_CHARGE, AMBIGUOUS_CHARGE, MISPLACED_CHARGE, SPACE_IN_FORMULA, AMBIGUOUS_READING, INEXACT_FRACTION; BAD_ARGUMENT when `input` is not a string or `options` not an object.
 * @example
 * parseFormula('CuSO4·5H2O').components.length // 2
 * parseFormula('[Fe(CN)6]^4-').charge          // -4
 */
export function parseFormula(input: string, options: ParseOptions = {}): FormulaTree {
  if (options.abbreviations !== true && (options.maxLength === undefined || input.length <= options.maxLength)) {
    const fast = fastParse(input);
    if (fast) return fast;
  }
  return parseWithGrammar(input, options);
}

/**
 * The full parser (Chevrotain lexer, grammar and visitor), without the fast path.
 * parseFormula uses it for everything the fast path declines; tests compare the two.
 *
 * @example
 * parseWithGrammar('H2O').components[0].parts.length // 2
 */
export function parseWithGrammar(input: string, options: ParseOptions = {}): FormulaTree {
  const mode: ReadingMode = options.abbreviations === true ? 'abbreviations' : options.abbreviations === 'none' ? 'elements' : 'plain';
  const pre = prescanAll(input, options.maxLength ?? MAX_FORMULA_LENGTH);
  const state = stateSymbol(input);
  const text = state ? input.slice(0, state.offset) : input;
  // the grammars are loaded only for what needs them: not for an empty, overlong or hostile input
  const lex = () => {
    const { formulaLexer, ABBREVIATION_MODE, ELEMENTS_MODE, PLAIN_MODE } = fullGrammar();
    return formulaLexer().tokenize(text, mode === 'abbreviations' ? ABBREVIATION_MODE : mode === 'elements' ? ELEMENTS_MODE : PLAIN_MODE);
  };
  if (pre.length > 0) {
    // brackets that do not pair up leave the words readable: those that are no element symbol are reported too
    if (pre.every((i) => BRACKET_CODES.has(i.code))) {
      const lexed = lex();
      throw new PondusError(byColumn([...pre, ...lexed.errors.slice(0, MAX_ISSUES + 1).map((e) => unexpectedCharacter(input, e.offset)), ...unknownWords(text, lexed.tokens)]), input);
    }
    throw new PondusError(pre, input);
  }
  if (state && text.trim() === '') throw new PondusError([typedIssue({ code: 'EMPTY_INPUT', stateSymbol: state.symbol })], input);

  const lexed = lex();
  if (lexed.errors.length > 0) {
    // every stray character, and every word that is no element symbol among the tokens read around them
    const found = lexed.errors.slice(0, MAX_ISSUES + 1).map((e) => unexpectedCharacter(input, e.offset));
    throw new PondusError(byColumn([...found, ...unknownWords(text, lexed.tokens)]), input);
  }
  const grammar = fullGrammar().formulaGrammar();
  grammar.input = lexed.tokens;
  const cst = grammar.formula() as FormulaCstNode;
  if (grammar.errors.length > 0) {
    // the grammar stops at its first error; the words that are no element symbol are found in the tokens
    const issues = byColumn([syntaxIssue(text, grammar.errors[0], lexed.tokens), ...unknownWords(text, lexed.tokens)]);
    lookForHints(() => {
      const prefix = alkylPrefixHint(text, (s) => safeParseFormula(s, options).success);
      if (prefix) issues[0] = { ...issues[0], hint: prefix };
    });
    throw new PondusError(issues, input);
  }

  const built = buildTree(cst, text, expandAbbreviation);
  // what a failed reading carries: the notes made so far, and the state symbol set aside
  const noted = (more: Note[] = []): Note[] => (state ? [...built.notes, ...more, stateNote(input, state)] : [...built.notes, ...more]);
  if (built.issues.length > 0) {
    // the first few unknown symbols get a hint that looks at the whole formula; the rest keep the visitor's short one
    lookForHints(() => {
      for (const unknown of built.issues.filter((i) => i.code === 'UNKNOWN_ELEMENT').slice(0, 3)) {
        const hint = unknownElementHint(text, unknown, mode, (s) => safeParseFormula(s, { ...options, abbreviations: mode === 'elements' ? 'none' : false }).success);
        if (hint) unknown.hint = hint;
        else delete unknown.hint;
        // the hint names the option neutrally; each reader is shown its own name for it
        if (hint?.includes('`abbreviations')) unknown.options = ['abbreviations'];
      }
    });
    throw new PondusError(built.issues, input, noted());
  }
  const leading = leadingNumberIssues(built.components, text);
  if (leading.length > 0) throw new PondusError(leading, input, noted());
  if (mode !== 'elements') {
    const names = ligandNameIssues(text);
    if (names.length > 0) throw new PondusError(names, input, noted());
  }
  const notes: Note[] = built.notes;
  if (mode === 'plain') {
    const settled = settleReadings(built.components, text);
    if (settled.issues.length > 0) throw new PondusError(settled.issues, input, noted(settled.notes));
    notes.push(...settled.notes);
  } else if (mode === 'abbreviations') {
    const mixtures = mixtureRefusals(built.components, text);
    if (mixtures.length > 0) throw new PondusError(mixtures, input, noted());
  }
  if (state) notes.push(stateNote(input, state));
  return { kind: 'formula', input, components: built.components, charge: built.charge, notes };
}

const STATES: Record<string, string> = { s: 'solid', l: 'liquid', g: 'gas', aq: 'aqueous solution' };

/** The note that a trailing state symbol is set aside. */
function stateNote(input: string, state: { offset: number; symbol: string; letters: string }): Note {
  return { code: 'STATE_SYMBOL', message: `'${state.symbol}' is a state symbol (${STATES[state.letters]}) and is set aside`, column: columnOf(input, state.offset) };
}

/** A trailing state symbol, `(s)`, `(l)`, `(g)` or `(aq)`, in lower case (`(S)` is sulfur). */
function stateSymbol(input: string): { offset: number; symbol: string; letters: string } | null {
  const m = /\((s|l|g|aq)\)\s*$/.exec(input);
  return m ? { offset: m.index, symbol: `(${m[1]})`, letters: m[1] } : null;
}

/**
 * Like {@link parseFormula} but never throws for bad input: returns `{ success, data | error }`.
 *
 * @example
 * safeParseFormula('Xx').success // false
 */
export function safeParseFormula(input: string, options: ParseOptions = {}): SafeResult<FormulaTree> {
  return toSafe(() => parseFormula(input, options));
}

/** The problems of brackets alone, after which the rest of the text can still be read. */
const BRACKET_CODES: ReadonlySet<string> = new Set(['UNCLOSED_GROUP', 'UNMATCHED_CLOSING', 'MISMATCHED_BRACKET', 'EMPTY_GROUP']);

/** Issues in the order of the input (a stable sort: issues at one column keep their order). */
function byColumn(issues: Issue[]): Issue[] {
  return issues.sort((a, b) => (a.column ?? 0) - (b.column ?? 0));
}

/**
 * The words among the tokens that are no element symbol (nor D, T or a name the reader refuses with
 * its readings), as the visitor reports them: for input the grammar could not read as a whole.
 */
function unknownWords(text: string, tokens: IToken[]): Issue[] {
  const out: Issue[] = [];
  for (const t of tokens) {
    if (out.length > MAX_ISSUES) break;
    if (t.tokenType.name !== 'Word') continue;
    const w = t.image;
    if (w === 'D' || w === 'T' || isElementSymbol(w) || Object.hasOwn(REFUSED_ABBREVIATIONS, w)) continue;
    out.push(unknownElement(text, w, t.startOffset));
  }
  return out;
}

const CHAR_HINTS: Record<string, string> = {
  ',': 'give one formula per argument or per line',
  ';': 'give one formula per argument or per line',
  '/': 'a formula has no division; for a fraction of a unit use a decimal count such as ·0.5H2O',
  '^': "a caret starts a charge such as ^2+ or ^-",
  '=': 'equations go to the balance command',
  '>': 'equations go to the balance command',
  '→': 'equations go to the balance command',
  '_': 'write counts directly after the symbol: H2O',
};

function unexpectedCharacter(input: string, offset: number): Issue {
  const ch = String.fromCodePoint(input.codePointAt(offset)!);
  const i: Issue = typedIssue({ code: 'UNEXPECTED_CHARACTER', character: ch, column: columnOf(input, offset), length: 1 });
  const hint = CHAR_HINTS[ch];
  if (hint) i.hint = hint;
  return i;
}

const CHARGE_TOKENS = new Set(['CaretCharge', 'SuperscriptCharge']);

/** For a charge written after the formula the way some texts do ('Ca+2', 'SO4--'): the same charge in pondus's notation. */
function chargeWritten(input: string, at: number): string | undefined {
  const head = input.slice(0, at);
  const tail = input.slice(at).trim();
  const signDigits = /^([+-])([1-9][0-9]?)$/.exec(tail);
  const repeated = /^(\++|-+)$/.exec(tail);
  if (!head.trim() || (!signDigits && !repeated)) return undefined;
  const sign = signDigits ? signDigits[1] : tail[0];
  const n = signDigits ? Number(signDigits[2]) : tail.length;
  return `for a charge of ${n === 1 ? '' : n}${sign === '+' ? '+' : '−'}, write ${head}^${n === 1 ? '' : n}${sign}`;
}

function syntaxIssue(input: string, err: IRecognitionException, tokens: IToken[]): Issue {
  const t = err.token;
  const isEof = t.tokenType.name === 'EOF' || Number.isNaN(t.startOffset);
  if (isEof) {
    const last = tokens[tokens.length - 1];
    const offset = last ? end(last) : input.length;
    return typedIssue({ code: 'UNEXPECTED_TOKEN', token: null, after: last ? last.image : null, expected: 'formula', column: columnOf(input, offset), length: 1 });
  }
  const column = columnOf(input, t.startOffset);
  const length = Math.max(1, end(t) - t.startOffset);
  const name = t.tokenType.name;
  const prev = tokens[tokens.indexOf(t) - 1];
  if (prev && (CHARGE_TOKENS.has(prev.tokenType.name) || prev.tokenType.name === 'Sign')) {
    const issue: Issue = typedIssue({ code: 'MISPLACED_CHARGE', charge: prev.image, following: t.image, column: columnOf(input, prev.startOffset), length: prev.image.length });
    const written = chargeWritten(input, prev.startOffset);
    if (written) issue.hint = written;
    return issue;
  }
  if (CHARGE_TOKENS.has(name) || name === 'Sign') {
    return typedIssue({ code: 'MISPLACED_CHARGE', charge: t.image, following: null, column, length });
  }
  if (name === 'Number' || name === 'SubscriptDigits') {
    return typedIssue({ code: 'UNEXPECTED_TOKEN', token: t.image, after: prev ? prev.image : null, expected: 'count-place', column, length });
  }
  if (name === 'Separator') {
    return typedIssue({ code: 'UNEXPECTED_TOKEN', token: t.image, after: prev ? prev.image : null, expected: 'addition-dot', column, length });
  }
  if (name === 'SuperscriptDigits') {
    return typedIssue({ code: 'UNEXPECTED_TOKEN', token: t.image, after: prev ? prev.image : null, expected: 'superscript', column, length });
  }
  return typedIssue({ code: 'UNEXPECTED_TOKEN', token: t.image, after: prev ? prev.image : null, expected: null, column, length });
}

const expansions = new Map<string, ComponentNode[]>();

/** Parses an abbreviation's formula once and re-spans it onto the abbreviation in the input. */
function expandAbbreviation(name: string, span: Span): ComponentNode[] {
  let body = expansions.get(name);
  if (!body) {
    // abbreviation formulas are plain, so the fast path reads them (and the shared visitor, busy
    // with the formula that holds the abbreviation, is not re-entered)
    const tree = fastParse((ABBREVIATIONS[name] ?? REAGENTS[name]).formula);
    if (!tree) throw new Error(`abbreviation ${name} has a formula the fast path cannot read`);
    body = tree.components;
    expansions.set(name, body);
  }
  return body.map((c) => respanComponent(c, span));
}

function respanComponent(c: ComponentNode, span: Span): ComponentNode {
  return { ...c, span, parts: c.parts.map((p) => respanPart(p, span)) };
}

function respanPart(p: PartNode, span: Span): PartNode {
  if (p.kind === 'atom') return { ...p, span };
  const g: GroupNode = { ...p, span, body: p.body.map((c) => respanComponent(c, span)) };
  return g;
}
