import type { Issue, LibraryFunction } from './issue.js';
import { hintFor, LIBRARY_NAMING, messageFor, noteText, type OptionNaming } from './message.js';
import { PondusError } from './pondus-error.js';

/** Options whose flag is not their name in kebab case: `amounts` (a list) is given one `--amount` at a time. */
const FLAGS: Record<string, string> = { amounts: 'amount' };

/** What does on the command line what each library function does (its command, or for the long CSV form a flag), as a message names it. */
const COMMANDS: { [F in LibraryFunction]: string } = {
  candidateFormulas: 'pondus candidates',
  compositionCsvLongRows: '--long',
  concentratedReagent: 'pondus prepare',
  diluteByMass: 'dilute --mass',
  dilutionSeries: 'dilute --series',
  empirical: 'empirical',
  formulaMass: 'pondus mass',
  milliequivalents: 'meq',
};

/**
 * The command line's naming of options: the flag (`` `molarMass` `` → `--molar-mass`,
 * `` `abbreviations: true` `` → `--abbreviations`, `` `density: 1.19 g/mL` `` → `--density 1.19 g/mL`);
 * and of library functions: the command (`` `diluteByMass` `` → `dilute --mass`).
 *
 * @example
 * FLAG_NAMING.option('molarMass', undefined) // '--molar-mass'
 * FLAG_NAMING.command('dilutionSeries')      // 'dilute --series'
 */
export const FLAG_NAMING: OptionNaming = {
  option: (name, value) => `--${FLAGS[name] ?? name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}${value === undefined || value === 'true' ? '' : ` ${value}`}`,
  command: (name) => COMMANDS[name],
};

/** Options for {@link renderError}. */
export interface RenderOptions {
  /** 1-based input line, shown in batch mode. */
  line?: number;
  /** Wraps text that should stand out (the caret, the code); identity by default. */
  emphasis?: (s: string) => string;
  /** How the options an issue names are named: the library's names by default, {@link FLAG_NAMING} on the command line. */
  naming?: OptionNaming;
}

const MAX_SHOWN = 100;

/**
 * Renders an error for people: the message, the input with a caret under the
 * column, and any hint. This is the only place errors are turned into text.
 *
 * @param error - a PondusError with at least one issue.
 * @param options - the batch line number, the emphasis wrapper and the naming of options (all optional).
 * @returns the text for people, one or more lines without a final newline.
 * @throws PondusError: BAD_ARGUMENT when `error` is not a PondusError with issues or `options` is not an object.
 * @example
 * renderError(safeParseFormula('Xx2').error) // "error UNKNOWN_ELEMENT: unknown element symbol 'Xx'\n  Xx2\n  ^^"
 */
export function renderError(error: PondusError, options: RenderOptions = {}): string {
  const em = options.emphasis ?? ((s: string) => s);
  const where = options.line !== undefined ? `line ${options.line}: ` : '';
  const naming = options.naming ?? LIBRARY_NAMING;
  const out: string[] = [];
  for (const issue of error.issues) {
    out.push(`${where}${em(`error ${issue.code}`)}: ${visibleText(messageFor(issue, naming))}`);
    if (error.input !== undefined && issue.column !== undefined) {
      const [shown, caretAt] = window(error.input, issue.column - 1);
      const len = Math.max(1, Math.min(issue.length ?? 1, MAX_SHOWN - caretAt));
      out.push(`  ${shown}`);
      out.push(`  ${' '.repeat(caretAt)}${em('^'.repeat(len))}`);
    }
    const hint = hintFor(issue, naming);
    if (hint) out.push(`  hint: ${visibleText(hint)}`);
  }
  if (error.more) out.push(`${where}  … and more problems; the first ${error.issues.length} are shown`);
  return out.join('\n');
}

/** Shows at most MAX_SHOWN code points of the input around the column, with control characters made visible. */
function window(input: string, col: number): [string, number] {
  // counted on code units, so a 10 MB input costs one pass, not an array of its characters
  const total = codePointCount(input);
  let start = 0;
  if (total > MAX_SHOWN) start = Math.max(0, Math.min(col - 40, total - MAX_SHOWN));
  const from = codeUnitOffset(input, 0, 0, start);
  const to = codeUnitOffset(input, from, start, start + MAX_SHOWN);
  const slice = Array.from(input.slice(from, to)).map(visible);
  const prefix = start > 0 ? '…' : '';
  const suffix = start + MAX_SHOWN < total ? '…' : '';
  return [prefix + slice.join('') + suffix, col - start + prefix.length];
}

/** The number of code points in a string (a surrogate pair counts once). */
function codePointCount(s: string): number {
  let n = s.length;
  for (let i = 0; i < s.length - 1; i++) {
    const c = s.charCodeAt(i);
    if (c >= 0xd800 && c < 0xdc00) {
      const d = s.charCodeAt(i + 1);
      if (d >= 0xdc00 && d < 0xe000) {
        n--;
        i++;
      }
    }
  }
  return n;
}

/** The code-unit offset of code point `target`, walking from code unit `at` (code point `point`). */
function codeUnitOffset(s: string, at: number, point: number, target: number): number {
  let i = at;
  while (point < target && i < s.length) {
    const c = s.charCodeAt(i);
    const d = s.charCodeAt(i + 1);
    i += c >= 0xd800 && c < 0xdc00 && d >= 0xdc00 && d < 0xe000 ? 2 : 1;
    point++;
  }
  return i;
}

/** A message or hint with any control character it quotes from the input made visible (␦). */
function visibleText(text: string): string {
  return /[\u0000-\u001f\u007f-\u009f]/.test(text) ? Array.from(text).map(visible).join('') : text;
}

function visible(ch: string): string {
  const c = ch.codePointAt(0)!;
  if (c < 0x20 || c === 0x7f || (c >= 0x80 && c < 0xa0)) return '\u2426'; // ␦ stands in for any control character
  return ch;
}

/** The JSON form of one issue: its code, message, column (or null) and any hint. */
export interface IssueJson {
  code: string;
  message: string;
  column: number | null;
  hint?: string;
}

/**
 * The JSON form of an error's first issue, as written in a failed row's `error`.
 *
 * @param error - a PondusError with at least one issue.
 * @param naming - how the options a message names are written (the library's names by default).
 * @returns the first issue as `{ code, message, column, hint? }`, with `column` null when the issue has none.
 * @throws PondusError: BAD_ARGUMENT when `error` is not a PondusError with issues.
 * @example
 * errorJson(safeParseFormula('Xx2').error) // { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 }
 */
export function errorJson(error: PondusError, naming: OptionNaming = LIBRARY_NAMING): IssueJson {
  return issueJson(error.first, naming);
}

/**
 * The JSON form of every issue of an error, in the order of the input, as written in a failed row's `errors`.
 *
 * @example
 * errorsJson(safeParseFormula('XxQq').error).map((e) => e.column) // [1, 3]
 */
export function errorsJson(error: PondusError, naming: OptionNaming = LIBRARY_NAMING): IssueJson[] {
  return error.issues.map((i) => issueJson(i, naming));
}

function issueJson(i: Issue, naming: OptionNaming): IssueJson {
  const o: IssueJson = { code: i.code, message: messageFor(i, naming), column: i.column ?? null };
  const hint = hintFor(i, naming);
  if (hint) o.hint = hint;
  return o;
}

/**
 * The fields of a failed row after its identification: `error` (the first issue, as before there
 * was a list), `errors` (every issue), `errorsTruncated: true` when the input had more than
 * are kept, and `notes` (what was noted about the input before it failed; `[]` when nothing was),
 * as every row carries them. The one place the error part of a JSON row is made.
 *
 * @example
 * Object.keys(errorRowFields(safeParseFormula('XxQq').error)) // ['error', 'errors', 'notes']
 */
export function errorRowFields(error: PondusError, naming: OptionNaming = LIBRARY_NAMING): ErrorRowFields {
  const errors = errorsJson(error, naming);
  // notes last, as in an ok row: every row carries them, [] when there are none
  const notes = error.notes.map((n) => ({ code: n.code, message: noteText(n, naming) }));
  return error.more ? { error: errors[0], errors, errorsTruncated: true, notes } : { error: errors[0], errors, notes };
}

/** The error part of a failed JSON row: the first issue, every issue, and the notes made before the input failed. */
export interface ErrorRowFields {
  error: IssueJson;
  errors: IssueJson[];
  errorsTruncated?: true;
  /** What was noted about the input before it failed, as an ok row's notes ([] when nothing). */
  notes: { code: string; message: string }[];
}
