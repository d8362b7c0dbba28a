/**
 * Checks run on the raw text before lexing: length, control characters, and
 * bracket matching with a depth limit. They give precise messages for the
 * problems a grammar reports poorly, and keep hostile input (a 20,000-deep
 * nesting, a megabyte line) away from the recursive-descent parser.
 */
import type { Issue } from '../errors/issue.js';
import { MAX_ISSUES } from '../errors/pondus-error.js';

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
  return prescanAll(text, maxLength)[0] ?? null;
}

/**
 * Every problem found in the raw formula text, in the order of the text (empty when there is
 * none). An empty or overlong input, or nesting past the limit, is the one problem reported; control
 * characters, bracket problems and stray spaces are each reported, up to {@link MAX_ISSUES} (one
 * pass over the text).
 *
 * @example
 * prescanAll('Ca(OH2]').map((i) => i.code) // ['MISMATCHED_BRACKET']
 * prescanAll('(Ca)]Cl)').length           // 2
 */
export function prescanAll(text: string, maxLength = MAX_FORMULA_LENGTH): Issue[] {
  if (text.trim() === '') return [{ code: 'EMPTY_INPUT', message: 'the formula is empty' }];
  if (text.length > maxLength) {
    return [{ code: 'INPUT_TOO_LONG', message: `the formula is ${text.length.toLocaleString('en-US')} characters long; the limit is ${maxLength.toLocaleString('en-US')}`, column: maxLength + 1 }];
  }
  const out: Issue[] = [];
  const stack: number[] = [];
  for (let i = 0; i < text.length && out.length <= MAX_ISSUES; i++) {
    const ch = text[i];
    const code = text.charCodeAt(i);
    if ((code < 0x20 && code !== 0x09) || code === 0x7f || (code >= 0x80 && code < 0xa0)) {
      out.push({ code: 'CONTROL_CHARACTER', message: `control character U+${code.toString(16).toUpperCase().padStart(4, '0')} in the formula`, column: columnOf(text, i) });
      continue;
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
        // hostile input: said once, and the rest of the text is not looked at
        return [...out, { code: 'NESTING_TOO_DEEP', message: `brackets nested more than ${MAX_NESTING} deep`, column: columnOf(text, i) }];
      }
      let j = i + 1;
      while (text[j] === ' ' || text[j] === '\t') j++;
      if (text[j] === OPEN[ch]) {
        out.push({ code: 'EMPTY_GROUP', message: `empty brackets '${ch}${OPEN[ch]}'`, column: columnOf(text, i), length: 2 });
        i = j;
        continue;
      }
      stack.push(i);
    } else if (CLOSE[ch]) {
      if (stack.length === 0) {
        out.push({ code: 'UNMATCHED_CLOSING', message: `'${ch}' has no opening '${CLOSE[ch]}'`, column: columnOf(text, i) });
        continue;
      }
      const open = stack.pop()!;
      if (text[open] !== CLOSE[ch]) {
        out.push({
          code: 'MISMATCHED_BRACKET',
          message: `'${ch}' at column ${columnOf(text, i)} closes '${text[open]}' from column ${columnOf(text, open)}; expected '${OPEN[text[open]]}'`,
          column: columnOf(text, i),
        });
      }
    }
  }
  // brackets never closed, outermost first
  for (const open of stack) {
    if (out.length > MAX_ISSUES) break;
    out.push({ code: 'UNCLOSED_GROUP', message: `'${text[open]}' at column ${columnOf(text, open)} is never closed`, column: columnOf(text, open) });
  }
  if (out.length > 0) return out.sort((a, b) => (a.column ?? 0) - (b.column ?? 0));
  return spaceIssues(text);
}

const SPACES = /[ \t\u00a0\u2009\u202f]+/g;
const ADDITION_DOTS = '·•∙⋅*.';

/**
 * A space inside a formula joins nothing silently: 'H2O 2' would read as H2O2, 'H2O NaCl' as one
 * substance, a tab-separated line as one formula. Spaces are fine at the ends, beside an addition
 * dot ('CuSO4 · 5H2O'), before a state symbol ('Zn (s)'), and after a decimal count ('Fe2.5 O',
 * which settles that the '.' is a decimal point).
 */
function spaceIssues(text: string): Issue[] {
  const out: Issue[] = [];
  let joined: string | null = null;
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
    // (made once, without the shared global pattern, whose position the loop keeps)
    joined ??= text.slice(first, trimmedEnd).replace(/[ \t\u00a0\u2009\u202f]+/g, '');
    const issue: Issue = {
      code: 'SPACE_IN_FORMULA',
      message: `a space at column ${column} inside the formula: pondus does not join the pieces around it, because '${joined}' may be a different substance from what was meant`,
      column,
      length: m[0].length,
    };
    // the advice is given once, with the first space
    if (out.length === 0) issue.hint = 'give one formula per argument or per line; write · between the parts of an addition compound (CuSO4·5H2O)';
    out.push(issue);
    if (out.length > MAX_ISSUES) break;
  }
  return out;
}
