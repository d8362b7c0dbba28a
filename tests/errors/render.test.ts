// How errors become text and JSON: every issue is shown, the first stays `error` in JSON.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { fail, MAX_ISSUES, PondusError } from '../../src/errors/pondus-error.js';
import { errorJson, errorRowFields, errorsJson, renderError } from '../../src/errors/render.js';
import { safeParseFormula } from '../../src/formula-parser/parse.js';

const errorOf = (input: string): PondusError => {
  const r = safeParseFormula(input);
  if (r.success) throw new Error(`expected ${input} to fail`);
  return r.error;
};

describe('error rendering', () => {
  it('shows each issue with its caret', () => {
    expect(renderError(errorOf('XxQq'))).toBe(
      ["error UNKNOWN_ELEMENT: unknown element symbol 'Xx'", '  XxQq', '  ^^', "error UNKNOWN_ELEMENT: unknown element symbol 'Qq'", '  XxQq', '    ^^'].join('\n'),
    );
  });

  it('says when issues were left out', () => {
    const text = renderError(errorOf('Xx'.repeat(100)), { line: 4 });
    expect(text.split('\n').filter((l) => l.startsWith('line 4: error'))).toHaveLength(MAX_ISSUES);
    expect(text.endsWith(`line 4:   … and more problems; the first ${MAX_ISSUES} are shown`)).toBe(true);
  });

  it('JSON: error is the first issue, errors every one, in order', () => {
    const e = errorOf('XxQq');
    expect(errorJson(e)).toEqual({ code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 });
    expect(errorsJson(e).map((i) => i.column)).toEqual([1, 3]);
    const fields = errorRowFields(e);
    // every row carries notes, a failed one too: [] when nothing was noted (common practice of this contract)
    expect(Object.keys(fields)).toEqual(['error', 'errors', 'notes']);
    expect(fields.notes).toEqual([]);
    expect(fields.errors[0]).toEqual(fields.error);
    expect(errorRowFields(errorOf('Xx'.repeat(100))).errorsTruncated).toBe(true);
  });

  it('a hint and a missing column reach the JSON form', () => {
    expect(errorsJson(errorOf('co2'))[0].hint).toMatch(/./);
    expect(errorsJson(errorOf(''))[0].column).toBeNull();
  });
});

describe('the input window of a long input', () => {
  // the reference: the window cut from the array of the input's code points
  const reference = (input: string, col: number) => {
    const chars = Array.from(input).map((ch) => (/[\u0000-\u001f\u007f-\u009f]/.test(ch) ? '\u2426' : ch));
    const start = chars.length > 100 ? Math.max(0, Math.min(col - 1 - 40, chars.length - 100)) : 0;
    const prefix = start > 0 ? '…' : '';
    return prefix + chars.slice(start, start + 100).join('') + (start + 100 < chars.length ? '…' : '');
  };
  it('shows the same 100 code points as the array of characters would, surrogate pairs included', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom('a', 'Qq', '😀', '\u0007', '₂', ' '), { minLength: 1, maxLength: 300, size: 'max' }), fc.nat(), (parts, n) => {
        const input = parts.join('');
        const col = 1 + (n % Array.from(input).length);
        const shown = renderError(fail({ code: 'UNKNOWN_ELEMENT', message: 'x', column: col }, input)).split('\n')[1];
        expect(shown).toBe(`  ${reference(input, col)}`);
      }),
      { numRuns: 300 },
    );
  });
});
