// Every `@example` in the library's doc comments, run as a test. An example is a run of lines;
// a line `expression // expected` checks that the expression gives the expected value (a JS
// literal; for a string, a trailing '…' inside the quotes matches any rest), and any other line
// is a statement run before the next check. Names in scope: the public API, the module's own
// exports, Decimal and PondusError.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { Decimal } from '../../src/exact/decimal.js';
import { PondusError } from '../../src/errors/pondus-error.js';

const srcRoot = join(__dirname, '..', '..', 'src');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) return name === 'cli' ? [] : sourceFiles(p);
    return p.endsWith('.ts') ? [p] : [];
  });
}

interface Example {
  file: string;
  line: number;
  lines: string[];
}

function examplesIn(file: string): Example[] {
  const text = readFileSync(file, 'utf8').split('\n');
  const out: Example[] = [];
  for (let i = 0; i < text.length; i++) {
    if (!/^\s*\*\s*@example\b/.test(text[i])) continue;
    const lines: string[] = [];
    let j = i + 1;
    for (; j < text.length; j++) {
      const m = /^\s*\*(?: (.*))?$/.exec(text[j]);
      if (!m || /^\s*\*\//.test(text[j]) || /^\s*@\w/.test(m[1] ?? '')) break;
      if ((m[1] ?? '').trim() !== '') lines.push(m[1]);
    }
    out.push({ file: relative(srcRoot, file), line: i + 1, lines });
  }
  return out;
}

/** Splits `code // expected` at the last '//' that is outside quotes. */
function splitCheck(line: string): [string, string] | null {
  let quote: string | null = null;
  let at = -1;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quote) {
      if (c === '\\') i++;
      else if (c === quote) quote = null;
    } else if (c === "'" || c === '"' || c === '`') quote = c;
    else if (c === '/' && line[i + 1] === '/') {
      at = i;
      break;
    }
  }
  if (at < 0) return null;
  return [line.slice(0, at).trim().replace(/;$/, ''), line.slice(at + 2).trim()];
}

/** The value of a JS literal, or undefined when the text is not one. */
function literal(text: string): { value: unknown } | undefined {
  try {
    return { value: new Function(`return (${text});`)() };
  } catch {
    return undefined;
  }
}

const show = (v: unknown) => JSON.stringify(v, (_k, x) => (typeof x === 'bigint' ? `${x}n` : x));

function plain(v: unknown): unknown {
  if (v instanceof Decimal) return v.toString();
  return v;
}

/** A string with '…' in it matches any text in place of each '…'. */
function wildcard(actual: string, expected: string): boolean {
  const pieces = expected.split('…');
  let at = 0;
  for (let i = 0; i < pieces.length; i++) {
    const found = i === 0 ? (actual.startsWith(pieces[0]) ? 0 : -1) : actual.indexOf(pieces[i], at);
    if (found < 0) return false;
    at = found + pieces[i].length;
  }
  return pieces[pieces.length - 1] === '' || actual.endsWith(pieces[pieces.length - 1]);
}

/** The leading digits of a number, written in an example as `0.574…`. */
class NumberPrefix {
  constructor(readonly digits: string) {}
}

function matches(actual: unknown, expected: unknown): boolean {
  if (expected instanceof NumberPrefix) return (typeof actual === 'number' || actual instanceof Decimal) && String(actual).startsWith(expected.digits);
  if (actual instanceof Decimal && typeof expected === 'number') return actual.eq(expected);
  const a = plain(actual);
  if (typeof expected === 'string' && typeof a === 'string' && expected.includes('…')) return wildcard(a, expected);
  try {
    expect(a).toEqual(expected);
    return true;
  } catch {
    return false;
  }
}

const files = sourceFiles(srcRoot);
const all = files.flatMap(examplesIn);

describe('doc-comment examples', () => {
  it('there are examples to run', () => {
    expect(all.length).toBeGreaterThan(100);
  });

  it.each(all.map((e) => [`${e.file}:${e.line}`, e] as const))('%s', async (_name, ex) => {
    const mod = (await import(join(srcRoot, ex.file))) as Record<string, unknown>;
    const scope: Record<string, unknown> = { ...api, ...mod, Decimal, PondusError };
    const names = Object.keys(scope).filter((n) => /^[A-Za-z_$][\w$]*$/.test(n));
    const values = names.map((n) => scope[n]);
    // one function runs the whole example in order; each check's value is collected as it comes
    let body = '';
    const checks: { code: string; expectedText: string; expected: { value: unknown } }[] = [];
    let last = '';
    for (const raw of ex.lines) {
      if (/^\s*import\b/.test(raw)) continue;
      let check = splitCheck(raw);
      // an expected value on a line of its own checks the statement before it
      if (check && check[0] === '' && last !== '') {
        body = body.slice(0, body.length - last.length - 1);
        check = [last.trim().replace(/;$/, ''), check[1]];
      }
      if (!check || check[0] === '') {
        body += `${raw}\n`;
        last = check ? '' : raw;
        continue;
      }
      last = '';
      const [code, expectedText] = check;
      // a remark in brackets may follow the expected value: `// false (no arrow)`
      // a number ending in '…' matches any number whose digits start so: `// 0.574… (35Cl2)`
      const prefix = /^(-?\d[\d.]*)…(\s*\([^()]*\))?$/.exec(expectedText);
      const expected = prefix ? { value: new NumberPrefix(prefix[1]) } : (literal(expectedText) ?? literal(expectedText.replace(/\s*\([^()]*\)$/, '')));
      if (expected === undefined) throw new Error(`${ex.file}:${ex.line}: the expected value '${expectedText}' is not a literal`);
      body += `__seen.push((${code}));\n`;
      checks.push({ code, expectedText, expected });
    }
    const seen: unknown[] = [];
    new Function(...names, '__seen', body)(...values, seen);
    checks.forEach((c, i) => {
      expect(matches(seen[i], c.expected.value), `${ex.file}:${ex.line}: ${c.code} gave ${show(plain(seen[i]))}, the example says ${c.expectedText}`).toBe(true);
    });
    expect(checks.length, `${ex.file}:${ex.line}: the example checks nothing`).toBeGreaterThan(0);
  });
});
