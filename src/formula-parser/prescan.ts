/**
 * Checks run on the raw text before lexing: length, control characters, and
 * bracket matching with a depth limit. They give precise messages for the
 * problems a grammar reports poorly, and keep hostile input (a 20,000-deep
 * nesting, a megabyte line) away from the recursive-descent parser.
 */
import type { Issue } from '../errors/issue.js';
import { typedIssue } from '../errors/message.js';
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
  if (text.trim() === '') return [typedIssue({ code: 'EMPTY_INPUT', stateSymbol: null })];
  if (text.length > maxLength) {
    return [typedIssue({ code: 'INPUT_TOO_LONG', characters: text.length, limit: maxLength, column: maxLength + 1 })];
  }
  const out: Issue[] = [];
  const stack: number[] = [];
  for (let i = 0; i < text.length && out.length <= MAX_ISSUES; i++) {
    const ch = text[i];
    const code = text.charCodeAt(i);
    if ((code < 0x20 && code !== 0x09) || code === 0x7f || (code >= 0x80 && code < 0xa0)) {
      out.push(typedIssue({ code: 'CONTROL_CHARACTER', codePoint: code, column: columnOf(text, i) }));
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
        return [...out, typedIssue({ code: 'NESTING_TOO_DEEP', limit: MAX_NESTING, column: columnOf(text, i) })];
      }
      let j = i + 1;
      while (text[j] === ' ' || text[j] === '\t') j++;
      if (text[j] === OPEN[ch]) {
        out.push(typedIssue({ code: 'EMPTY_GROUP', bracket: ch, column: columnOf(text, i), length: 2 }));
        i = j;
        continue;
      }
      stack.push(i);
    } else if (CLOSE[ch]) {
      if (stack.length === 0) {
        out.push(typedIssue({ code: 'UNMATCHED_CLOSING', bracket: ch, column: columnOf(text, i) }));
        continue;
      }
      const open = stack.pop()!;
      if (text[open] !== CLOSE[ch]) {
        out.push(typedIssue({ code: 'MISMATCHED_BRACKET', bracket: ch, opening: text[open], openingColumn: columnOf(text, open), column: columnOf(text, i) }));
      }
    }
  }
  // brackets never closed, outermost first
  for (const open of stack) {
    if (out.length > MAX_ISSUES) break;
    out.push(typedIssue({ code: 'UNCLOSED_GROUP', bracket: text[open], column: columnOf(text, open) }));
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
    const issue: Issue = typedIssue({ code: 'SPACE_IN_FORMULA', joined, column, length: m[0].length });
    // the advice is given once, with the first space
    if (out.length === 0) issue.hint = 'give one formula per argument or per line; write · between the parts of an addition compound (CuSO4·5H2O)';
    out.push(issue);
    if (out.length > MAX_ISSUES) break;
  }
  return out;
}
