/**
 * Checks run on the raw text before lexing: length, control characters, and
 * bracket matching with a depth limit. They give precise messages for the
 * problems a grammar reports poorly, and keep hostile input (a 20,000-deep
 * nesting, a megabyte line) away from the recursive-descent parser.
 */
import type { Issue } from '../errors/issue.js';

/** Longest formula text accepted, in UTF-16 code units. */
export const MAX_FORMULA_LENGTH = 10_000;
/** Deepest bracket nesting accepted. Real formulas rarely go past four. */
export const MAX_NESTING = 32;

const ISOTOPE_LABEL = /\[[0-9]+[A-Za-z]+\]/y;
const OPEN: Record<string, string> = { '(': ')', '[': ']', '{': '}' };
const CLOSE: Record<string, string> = { ')': '(', ']': '[', '}': '{' };

/**
 * 1-based column (in code points) of a UTF-16 offset.
 *
 * @example
 * columnOf('H₂O', 2) // 3
 */
export function columnOf(text: string, offset: number): number {
  let col = 1;
  for (let i = 0; i < offset && i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0xd800 && c <= 0xdbff) i++;
    col++;
  }
  return col;
}

/**
 * Returns the first problem found in the raw formula text, or null.
 *
 * @example
 * prescan('Ca(OH2').code   // 'UNCLOSED_GROUP'
 * prescan('Ca(OH2').column // 3
 */
export function prescan(text: string, maxLength = MAX_FORMULA_LENGTH): Issue | null {
  if (text.trim() === '') return { code: 'EMPTY_INPUT', message: 'the formula is empty' };
  if (text.length > maxLength) {
    return { code: 'INPUT_TOO_LONG', message: `the formula is ${text.length.toLocaleString('en-US')} characters long; the limit is ${maxLength.toLocaleString('en-US')}`, column: maxLength + 1 };
  }
  const stack: number[] = [];
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    const code = text.charCodeAt(i);
    if ((code < 0x20 && code !== 0x09) || code === 0x7f || (code >= 0x80 && code < 0xa0)) {
      return { code: 'CONTROL_CHARACTER', message: `control character U+${code.toString(16).toUpperCase().padStart(4, '0')} in the formula`, column: columnOf(text, i) };
    }
    if (ch === '[') {
      ISOTOPE_LABEL.lastIndex = i;
      const label = ISOTOPE_LABEL.exec(text);
      if (label) {
        i += label[0].length - 1;
        continue;
      }
    }
    if (OPEN[ch]) {
      if (stack.length >= MAX_NESTING) {
        return { code: 'NESTING_TOO_DEEP', message: `brackets nested more than ${MAX_NESTING} deep`, column: columnOf(text, i) };
      }
      let j = i + 1;
      while (text[j] === ' ' || text[j] === '\t') j++;
      if (text[j] === OPEN[ch]) {
        return { code: 'EMPTY_GROUP', message: `empty brackets '${ch}${OPEN[ch]}'`, column: columnOf(text, i), length: 2 };
      }
      stack.push(i);
    } else if (CLOSE[ch]) {
      if (stack.length === 0) {
        return { code: 'UNMATCHED_CLOSING', message: `'${ch}' has no opening '${CLOSE[ch]}'`, column: columnOf(text, i) };
      }
      const open = stack.pop()!;
      if (text[open] !== CLOSE[ch]) {
        return {
          code: 'MISMATCHED_BRACKET',
          message: `'${ch}' at column ${columnOf(text, i)} closes '${text[open]}' from column ${columnOf(text, open)}; expected '${OPEN[text[open]]}'`,
          column: columnOf(text, i),
        };
      }
    }
  }
  if (stack.length > 0) {
    const open = stack[stack.length - 1];
    return { code: 'UNCLOSED_GROUP', message: `'${text[open]}' at column ${columnOf(text, open)} is never closed`, column: columnOf(text, open) };
  }
  return spaceIssue(text);
}

const SPACES = /[ \t\u00a0\u2009\u202f]+/g;
const ADDITION_DOTS = '·•∙⋅*.';

/**
 * A space inside a formula joins nothing silently: 'H2O 2' would read as H2O2, 'H2O NaCl' as one
 * substance, a tab-separated line as one formula. Spaces are fine at the ends, beside an addition
 * dot ('CuSO4 · 5H2O'), before a state symbol ('Zn (s)'), and after a decimal count ('Fe2.5 O',
 * which settles that the '.' is a decimal point).
 */
function spaceIssue(text: string): Issue | null {
  const first = text.search(/[^ \t\u00a0\u2009\u202f]/);
  const trimmedEnd = text.replace(/[ \t\u00a0\u2009\u202f]+$/, '').length;
  SPACES.lastIndex = 0;
  for (let m = SPACES.exec(text); m !== null; m = SPACES.exec(text)) {
    const at = m.index;
    const after = at + m[0].length;
    if (at < first || after >= trimmedEnd) continue;
    if (ADDITION_DOTS.includes(text[at - 1]) || ADDITION_DOTS.includes(text[after])) continue;
    if (/[0-9]\.[0-9]+$/.test(text.slice(Math.max(0, at - 24), at))) continue;
    if (/^\((?:s|l|g|aq)\)/.test(text.slice(after, after + 4))) continue; // 'Zn (s)': a state symbol
    if (/(?:^|[·•∙⋅*.])[ \t\u00a0\u2009\u202f]*[0-9]+(?:\.[0-9]+)?$/.test(text.slice(0, at))) continue; // '· 5 H2O': a component's multiplier
    const column = columnOf(text, at);
    const joined = text.slice(first, trimmedEnd).replace(SPACES, '');
    return {
      code: 'SPACE_IN_FORMULA',
      message: `a space at column ${column} inside the formula: pondus does not join the pieces around it, because '${joined}' may be a different substance from what was meant`,
      column,
      length: m[0].length,
      hint: 'give one formula per argument or per line; write · between the parts of an addition compound (CuSO4·5H2O)',
    };
  }
  return null;
}
