/**
 * Tokens of the formula language. Patterns only; the grammar lives in grammar.ts.
 */
import { createToken, Lexer, type TokenType } from 'chevrotain';
import { ABBREVIATIONS, abbreviationPattern, REFUSED_ABBREVIATIONS, SAFE_ABBREVIATIONS } from './abbreviations.js';
import { REAGENTS } from './names.js';

/** What the lexer reads as one group with abbreviations on: every abbreviation but the refused ones, and the all-capitals reagent names. */
const ABBREVIATION_MODE_NAMES: readonly string[] = [
  ...Object.keys(ABBREVIATIONS).filter((k) => !Object.hasOwn(REFUSED_ABBREVIATIONS, k)),
  ...Object.keys(REAGENTS).filter((k) => /^[A-Z]+$/.test(k) && !Object.hasOwn(ABBREVIATIONS, k)),
];

function isDigit(ch: string | undefined): boolean {
  return ch !== undefined && ch >= '0' && ch <= '9';
}

/**
 * A count or multiplier in ASCII digits, with a decimal point when it is one.
 * A '.' between digits is a decimal point (`Fe0.95O`, `YBa2Cu3O6.5`) except in
 * the hydrate shorthand `CuSO4.5H2O`: digits other than 0 or 1 before the dot
 * and a whole multiplier of one or two digits after it, followed by the start
 * of a formula. There the '.' is left for the Separator token.
 */
function matchNumber(text: string, offset: number): RegExpExecArray | null {
  let i = offset;
  while (isDigit(text[i])) i++;
  if (i === offset) return null;
  if (text[i] === '.' && isDigit(text[i + 1])) {
    let j = i + 1;
    while (isDigit(text[j])) j++;
    const intPart = text.slice(offset, i);
    const after = text.slice(i + 1, j);
    const next = text[j];
    const startsFormula = next !== undefined && /[A-Z([{]/.test(next);
    const hydrateShorthand = intPart !== '0' && intPart !== '1' && after.length <= 2 && after[0] !== '0' && startsFormula;
    // `CaSO4.0.5H2O`, `CaSO4.1/2H2O`: a second '.' or a '/' after the digits means the first '.'
    // was the addition dot and a decimal or fractional multiplier follows it
    const multiplierFollows = next === '/' || (next === '.' && (isDigit(text[j + 1]) || VULGAR.includes(text[j + 1] ?? '')));
    if (!hydrateShorthand && !multiplierFollows) i = j;
  }
  const m = [text.slice(offset, i)] as unknown as RegExpExecArray;
  return m;
}

/** Unicode vulgar fractions read as multipliers. */
export const VULGAR = '½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒';

export const WhiteSpace = createToken({ name: 'WhiteSpace', pattern: /[ \t\u00a0\u2009\u202f]+/, group: Lexer.SKIPPED });
/** `[13C]`: a nuclide label in square brackets. */
export const IsotopeLabel = createToken({ name: 'IsotopeLabel', pattern: /\[[0-9]+[A-Za-z]+\]/, start_chars_hint: ['['] });
/** `²⁻`, `⁺`: a charge in Unicode superscripts. */
export const SuperscriptCharge = createToken({ name: 'SuperscriptCharge', pattern: /[⁰¹²³⁴⁵⁶⁷⁸⁹]*[⁺⁻]/ });
/** `¹³`: a mass number in Unicode superscripts, before an element symbol. */
export const SuperscriptDigits = createToken({ name: 'SuperscriptDigits', pattern: /[⁰¹²³⁴⁵⁶⁷⁸⁹]+/ });
/** `₂`: a count in Unicode subscripts. */
export const SubscriptDigits = createToken({ name: 'SubscriptDigits', pattern: /[₀₁₂₃₄₅₆₇₈₉]+/ });
/** `^2+`, `^-`, `^+3`: a charge after a caret. */
export const CaretCharge = createToken({ name: 'CaretCharge', pattern: /\^(?:[+\-−][0-9]+|[0-9]*[+\-−])/, start_chars_hint: ['^'] });
/** `12`, `0.5`: a count or a multiplier. */
export const NumberToken = createToken({
  name: 'Number',
  pattern: { exec: matchNumber },
  line_breaks: false,
  start_chars_hint: ['0', '1', '2', '3', '4', '5', '6', '7', '8', '9'],
});
/** `1/2`, `½`: a fractional multiplier, written before a component (`CaSO4·½H2O`). */
export const Fraction = createToken({ name: 'Fraction', pattern: /[0-9]+\/[0-9]+|[½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒]/ });
/** `·`, `*`, `.` and look-alike dots between the parts of an addition compound. */
export const Separator = createToken({ name: 'Separator', pattern: /[·•∙⋅*.]/ });
/** A bare `+` or `-` at the end: a charge of one. */
export const Sign = createToken({ name: 'Sign', pattern: /[+\-−]/ });
export const LParen = createToken({ name: 'LParen', pattern: /\(/ });
export const RParen = createToken({ name: 'RParen', pattern: /\)/ });
export const LSquare = createToken({ name: 'LSquare', pattern: /\[/ });
export const RSquare = createToken({ name: 'RSquare', pattern: /\]/ });
export const LCurly = createToken({ name: 'LCurly', pattern: /\{/ });
export const RCurly = createToken({ name: 'RCurly', pattern: /\}/ });
/** An element symbol, abbreviation, or a mistyped word: one capital and its lower-case letters, or a run of lower case. */
export const Word = createToken({ name: 'Word', pattern: /[A-Z][a-z]*|[a-z]+/ });

/** A group abbreviation (`Me`, `Boc`, `TMS`): the category the grammar consumes. */
export const Abbreviation = createToken({ name: 'Abbreviation', pattern: Lexer.NA });
/** Abbreviations no element symbol can be confused with: read by default. */
export const SafeAbbreviation = createToken({ name: 'SafeAbbreviation', pattern: abbreviationPattern(SAFE_ABBREVIATIONS), categories: [Abbreviation] });
/** Every abbreviation, and the capitalised reagent names (THF, NBS): read with abbreviations on. */
export const AnyAbbreviation = createToken({ name: 'AnyAbbreviation', pattern: abbreviationPattern(ABBREVIATION_MODE_NAMES), categories: [Abbreviation] });

/** All tokens, in the order the lexer tries them. */
export const allTokens: TokenType[] = [
  Abbreviation,
  AnyAbbreviation,
  SafeAbbreviation,
  WhiteSpace,
  IsotopeLabel,
  SuperscriptCharge,
  SuperscriptDigits,
  SubscriptDigits,
  CaretCharge,
  Fraction,
  NumberToken,
  Separator,
  Sign,
  LParen,
  RParen,
  LSquare,
  RSquare,
  LCurly,
  RCurly,
  Word,
];

/** Lexer modes: element symbols only; the default (abbreviations no element can be confused with); every abbreviation. */
export const ELEMENTS_MODE = 'elements';
export const PLAIN_MODE = 'plain';
export const ABBREVIATION_MODE = 'abbreviations';

const rest = (): TokenType[] => allTokens.slice(3);

let lexer: Lexer | null = null;

/** The formula lexer, built on first use. Positions are tracked as offsets only, which is all the error messages need. */
export function formulaLexer(): Lexer {
  lexer ??= new Lexer(
    {
      modes: { [ELEMENTS_MODE]: rest(), [PLAIN_MODE]: [SafeAbbreviation, ...rest()], [ABBREVIATION_MODE]: [AnyAbbreviation, ...rest()] },
      defaultMode: PLAIN_MODE,
    },
    { positionTracking: 'onlyOffset', skipValidations: true, safeMode: true },
  );
  return lexer;
}
