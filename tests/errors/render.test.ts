// How errors become text and JSON: every issue is shown, the first stays `error` in JSON.
import { describe, expect, it } from 'vitest';
import { MAX_ISSUES, PondusError } from '../../src/errors/pondus-error.js';
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
    expect(Object.keys(fields)).toEqual(['error', 'errors']);
    expect(fields.errors[0]).toEqual(fields.error);
    expect(errorRowFields(errorOf('Xx'.repeat(100))).errorsTruncated).toBe(true);
  });

  it('a hint and a missing column reach the JSON form', () => {
    expect(errorsJson(errorOf('co2'))[0].hint).toMatch(/./);
    expect(errorsJson(errorOf(''))[0].column).toBeNull();
  });
});
