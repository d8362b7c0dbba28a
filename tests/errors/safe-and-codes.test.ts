// toSafe never throws what its function throws, and every issue code is one some part of pondus raises.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { PondusError, parseFormula, toSafe } from '../../src/index.js';

describe('toSafe through the public API', () => {
  it('returns an error of another type as a failed result, INTERNAL_ERROR with the original as cause', () => {
    const boom = new TypeError('boom');
    const r = toSafe(() => {
      throw boom;
    });
    expect(r.success).toBe(false);
    if (r.success) return;
    expect(r.error).toBeInstanceOf(PondusError);
    expect(r.error.first.code).toBe('INTERNAL_ERROR');
    expect(r.error.first.message).toMatch(/boom/);
    expect((r.error as { cause?: unknown }).cause).toBe(boom);
  });

  it('keeps a division by zero as DIVISION_BY_ZERO and a thrown string as INTERNAL_ERROR', () => {
    const div = toSafe(() => {
      throw new Error('Division by zero');
    });
    expect(div.success ? '' : div.error.first.code).toBe('DIVISION_BY_ZERO');
    const text = toSafe(() => {
      throw 'not an error object';
    });
    expect(text.success ? '' : text.error.first.code).toBe('INTERNAL_ERROR');
  });

  it('returns a PondusError as it is, and a result as data', () => {
    const bad = toSafe(() => parseFormula('Xx'));
    expect(bad.success ? '' : bad.error.first.code).toBe('UNKNOWN_ELEMENT');
    expect(toSafe(() => 42)).toEqual({ success: true, data: 42 });
  });

  it('still refuses an argument that is not a function', () => {
    expect(() => toSafe(42 as unknown as () => number)).toThrow(PondusError);
  });
});

const SRC = join(__dirname, '..', '..', 'src');

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sources(path) : name.endsWith('.ts') ? [path] : [];
  });
}

describe('issue codes', () => {
  it('every code of the union is raised somewhere in the source (a code nothing raises is not a code)', () => {
    const issueFile = join(SRC, 'errors', 'issue.ts');
    const text = readFileSync(issueFile, 'utf8');
    const union = /export type IssueCode =([\s\S]*?);/.exec(text)![1];
    const codes = [...union.matchAll(/'([A-Z_]+)'/g)].map((m) => m[1]);
    expect(codes.length).toBeGreaterThan(40);
    // quoted in code (not only named in a comment) anywhere but the union itself and the message table
    const elsewhere = sources(SRC)
      .filter((f) => f !== issueFile && !f.endsWith(join('errors', 'message.ts')))
      .map((f) => readFileSync(f, 'utf8').replace(/^\s*(\*|\/\/).*$/gm, ''))
      .join('\n');
    const unraised = codes.filter((c) => !elsewhere.includes(`'${c}'`));
    expect(unraised).toEqual([]);
  });
});
