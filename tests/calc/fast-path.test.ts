import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fastParseExpression } from '../../src/calc/fast-path.js';
import { parseExpression, parseWithGrammar } from '../../src/calc/parse-expression.js';
import { calcUnitSpellings } from '../../src/calc/tokens.js';
import { toSafe } from '../../src/errors/pondus-error.js';
// @ts-expect-error: a plain JavaScript module of the benchmark, without types
import { generateCalc } from '../../bench/generate-quantities.mjs';

/**
 * parseExpression (the prescan, then the fast reader, then the grammar for what it declines) must
 * answer exactly as the grammar alone: the same tree, key for key, or the same error. Returns
 * whether the fast reader took the input.
 */
function agree(input: string): boolean {
  const full = toSafe(() => parseWithGrammar(input));
  const both = toSafe(() => parseExpression(input));
  const fast = full.success ? fastParseExpression(input) : null;
  if (full.success) {
    expect(both.success, `parseExpression rejects ${JSON.stringify(input)} but the grammar reads it`).toBe(true);
    if (both.success) {
      expect(both.data).toEqual(full.data);
      expect(JSON.stringify(both.data)).toBe(JSON.stringify(full.data));
    }
    if (fast !== null) {
      expect(fast.expr).toEqual(full.data.expr);
      expect(fast.target).toEqual(full.data.target);
    }
  } else {
    // the fast reader must decline whatever the grammar refuses (after the prescan), so the error is the grammar's
    expect(both.success, `parseExpression reads ${JSON.stringify(input)} but the grammar refuses it`).toBe(false);
    if (!both.success) {
      expect(both.error.message).toBe(full.error.message);
      expect(both.error.issues).toEqual(full.error.issues);
    }
  }
  return fast !== null;
}

const space = fc.constantFrom('', ' ', ' ', '  ', '\t', '\u00a0');
const digits = fc.integer({ min: 0, max: 99999 }).map(String);
const numberText = fc.oneof(
  digits,
  fc.tuple(digits, digits).map(([a, b]) => `${a}.${b}`),
  digits.map((a) => `${a}.`),
  digits.map((b) => `.${b}`),
  fc.tuple(digits, fc.constantFrom('e', 'E', 'e+', 'e-', 'E-'), fc.integer({ min: 0, max: 120 })).map(([a, e, x]) => `${a}${e}${x}`),
  fc.tuple(digits, digits, fc.constantFrom('e', 'E-'), fc.integer({ min: 0, max: 30 })).map(([a, b, e, x]) => `${a}.${b}${e}${x}`),
  fc.constantFrom('0', '100', '1300', '0.00340', '250.', '8.80', '1e3', '2.50e2'),
);
const unit = fc.constantFrom(...calcUnitSpellings());
const plusMinus = fc.constantFrom('±', '+/-', '+-');
const formula = fc.constantFrom('NaCl', 'CuSO4·5H2O', 'KAl(SO4)2·12H2O', 'H2O', 'C6H12O6', 'Ca(OH)2', 'Xy', '(CH3)2CO', 'Na2CO3*10H2O');
const quantityText = fc
  .tuple(numberText, fc.option(fc.tuple(space, plusMinus, space, numberText), { nil: undefined }), fc.option(fc.tuple(space, unit), { nil: undefined }))
  .map(([n, pm, u]) => n + (pm ? pm.join('') : '') + (u ? u.join('') : ''));
const operator = fc.constantFrom('+', '-', '−', '*', '×', '·', '/', '÷');
const exponent = fc.constantFrom('2', '3', '-1', '-2', '0', '-0', '10', '100', '101', '2.5', '1e1');

const expression: fc.Arbitrary<string> = fc.letrec((tie) => ({
  atom: fc.oneof(
    { weight: 6, arbitrary: quantityText },
    { weight: 2, arbitrary: formula.map((f) => `M(${f})`) },
    { weight: 1, arbitrary: fc.tuple(space, tie('sum'), space).map(([a, s, b]) => `(${a}${s}${b})`) },
  ),
  power: fc.oneof(
    { weight: 5, arbitrary: tie('atom') },
    { weight: 1, arbitrary: fc.tuple(tie('atom'), space, exponent).map(([a, s, e]) => `${a}${s}^${s}${e}`) },
  ),
  unary: fc.oneof({ weight: 6, arbitrary: tie('power') }, { weight: 1, arbitrary: fc.tuple(fc.constantFrom('-', '+', '−'), space, tie('power')).map(([s, w, p]) => s + w + p) }),
  sum: fc.tuple(tie('unary'), fc.array(fc.tuple(space, operator, space, tie('unary')), { maxLength: 4 })).map(([first, rest]) => first + rest.map((r) => r.join('')).join('')),
})).sum as fc.Arbitrary<string>;

const calculation = fc
  .tuple(space, expression, fc.option(fc.tuple(space, fc.constantFrom('to', 'in'), space, unit), { nil: undefined }), space)
  .map(([a, e, t, b]) => a + e + (t ? t.join('') : '') + b);

const pieces = [
  '1', '0', '25', '2.5', '.5', '1.', '1e3', '1E-2', '1e', 'e', 'E', '.', ' ', '\t', '\u00a0', '\u2009',
  '+', '-', '−', '*', '×', '·', '/', '÷', '^', '(', ')', ':', '±', '+-', '+/-', '+/',
  'g', 'mg', 'mL', 'ml', 'M', 'mM', 'µ', 'μ', 'µL', 'μg', 'mol', 'mol/L', 'g/100 mL', 'g/100', '%', '% w/v', '%w/v', 'ppm', 'u', 'x', 'L',
  'to', 'in', 'inch', 'tog', 'M(', 'M(NaCl)', 'M(H2O', 'NaCl', 'mLx', 'gµ', '1:1000', 'mol·L⁻¹', '¹',
  'cm³', 'cm3', 'dm', 'mol dm⁻³', 'mol dm-3', 'g·mL⁻¹', 'g·mol⁻¹', '⁻', '³', 'mol L⁻¹',
];

describe('the fast reader and the calculator grammar agree', () => {
  it('on well-formed calculations (and the fast reader takes nearly all of them)', () => {
    let taken = 0;
    let total = 0;
    fc.assert(
      fc.property(calculation, (c) => {
        total++;
        if (agree(c)) taken++;
      }),
      { numRuns: 4000 },
    );
    expect(taken / total).toBeGreaterThan(0.5);
  });

  it('on arbitrary strings built from calculator pieces', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...pieces), { minLength: 1, maxLength: 14 }), (ps) => {
        agree(ps.join(''));
      }),
      { numRuns: 6000 },
    );
  });

  it('on arbitrary Unicode text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 20 }), (s) => {
        agree(s);
      }),
      { numRuns: 2000 },
    );
  });

  it('on the benchmark’s mix of lab calculations, all of which it takes', () => {
    const lines = [...(generateCalc(2000, 7) as Iterable<string>)];
    expect(lines.filter((l) => agree(l)).length).toBe(lines.length);
  });

  it('declines ratios, which only the grammar reads', () => {
    expect(fastParseExpression('1:1000')).toBeNull();
    expect(parseExpression('1:1000 g/mL').expr.kind).toBe('ratio');
  });

  it('declines an exponent the visitor refuses, so the message is the grammar’s', () => {
    expect(fastParseExpression('2^2.5')).toBeNull();
    expect(toSafe(() => parseExpression('2^101')).success).toBe(false);
  });
});
