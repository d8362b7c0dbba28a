import type { Issue } from './issue.js';
import { PondusError } from './pondus-error.js';

/** Options for {@link renderError}. */
export interface RenderOptions {
  /** 1-based input line, shown in batch mode. */
  line?: number;
  /** Wraps text that should stand out (the caret, the code); identity by default. */
  emphasis?: (s: string) => string;
}

const MAX_SHOWN = 100;

/**
 * Renders an error for people: the message, the input with a caret under the
 * column, and any hint. This is the only place errors are turned into text.
 *
 * @example
 * renderError(safeParseFormula('Xx2').error) // "error UNKNOWN_ELEMENT: unknown element symbol 'Xx'\n  Xx2\n  ^^"
 */
export function renderError(error: PondusError, options: RenderOptions = {}): string {
  const em = options.emphasis ?? ((s: string) => s);
  const where = options.line !== undefined ? `line ${options.line}: ` : '';
  const out: string[] = [];
  for (const issue of error.issues) {
    out.push(`${where}${em(`error ${issue.code}`)}: ${visibleText(issue.message)}`);
    if (error.input !== undefined && issue.column !== undefined) {
      const [shown, caretAt] = window(error.input, issue.column - 1);
      const len = Math.max(1, Math.min(issue.length ?? 1, MAX_SHOWN - caretAt));
      out.push(`  ${shown}`);
      out.push(`  ${' '.repeat(caretAt)}${em('^'.repeat(len))}`);
    }
    if (issue.hint) out.push(`  hint: ${visibleText(issue.hint)}`);
  }
  return out.join('\n');
}

/** Shows at most MAX_SHOWN code points of the input around the column, with control characters made visible. */
function window(input: string, col: number): [string, number] {
  const chars = Array.from(input).map(visible);
  let start = 0;
  if (chars.length > MAX_SHOWN) start = Math.max(0, Math.min(col - 40, chars.length - MAX_SHOWN));
  const slice = chars.slice(start, start + MAX_SHOWN);
  const prefix = start > 0 ? '…' : '';
  const suffix = start + MAX_SHOWN < chars.length ? '…' : '';
  return [prefix + slice.join('') + suffix, col - start + prefix.length];
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

/**
 * The JSON form of an error, as written in place of a failed result in batch output.
 *
 * @example
 * errorJson(safeParseFormula('Xx2').error) // { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 }
 */
export function errorJson(error: PondusError): { code: string; message: string; column: number | null; hint?: string } {
  const i: Issue = error.first;
  const o: { code: string; message: string; column: number | null; hint?: string } = {
    code: i.code,
    message: i.message,
    column: i.column ?? null,
  };
  if (i.hint) o.hint = i.hint;
  return o;
}
