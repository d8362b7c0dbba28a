import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { dividedBy, minus, plus, sigFigsOf, times, type Measured } from '../../src/sigfig/measured.js';
import { divide, multiply, quantity } from '../../src/sigfig/quantity.js';
import { readNumber } from '../../src/sigfig/read-number.js';
import { displayMeasured, type RoundingMode } from '../../src/sigfig/round.js';
import { unitOf } from '../../src/sigfig/units.js';

// Properties of the textbook rules (OpenStax Chemistry 2e §1.5, from memory) and of rounding
// once at the end (ASTM E29, from memory): rounding never adds a figure, is idempotent, and the
// figure shown reads back with the figures reported.

const SUPER: Record<string, string> = { '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-' };

/** The shown figure as plain text a reader would type: '1.00 × 10³' → '1.00e3'. */
function plain(text: string): string {
  const m = /^(.*) × 10(.*)$/.exec(text);
  if (!m) return text;
  return `${m[1]}e${[...m[2]].map((c) => SUPER[c]).join('')}`;
}

/** Significant figures of a shown figure, read back by the textbook rules. */
const figuresOf = (text: string) => sigFigsOf(readNumber(plain(text)));

/** Digits written in a shown figure, leading zeros not counted. */
const digitsShown = (text: string) => plain(text).split('e')[0].replace(/[-.]/g, '').replace(/^0+/, '').length;

// a measured number written with a decimal point (so every figure is significant), biased
// towards runs of 9 so that rounding often carries into the next power of ten
const digits = fc.oneof(
  fc.integer({ min: 1, max: 999_999 }).map(String),
  fc.tuple(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 0, max: 9 }), fc.integer({ min: 0, max: 2 })).map(([k, d, z]) => '9'.repeat(k) + String(d) + '0'.repeat(z)),
);
const measuredText = fc.tuple(digits, fc.nat(), fc.integer({ min: -6, max: 6 }), fc.boolean()).map(([d, p, e, neg]) => {
  const point = p % (d.length + 1);
  const int = d.slice(0, point) || '0';
  return `${neg ? '-' : ''}${int}.${d.slice(point)}e${e}`;
});
const mode = fc.constantFrom<RoundingMode>('half-even', 'half-up');

function checkShown(m: Measured, rounding: RoundingMode) {
  const d = displayMeasured(m, rounding);
  if (d.belowPrecision) return d;
  // the digits shown are the figures reported, and read back as them
  expect(digitsShown(d.text)).toBe(d.sigFigs);
  expect(figuresOf(d.text)).toBe(d.sigFigs);
  // idempotent: the shown figure, read and shown again, is itself
  const again = displayMeasured(readNumber(plain(d.text)), rounding);
  expect(again.text).toBe(d.text);
  expect(again.value.eq(d.value)).toBe(true);
  return d;
}

describe('rounding never adds a figure', () => {
  it('products and quotients show exactly the figures of the limiting operand', () => {
    fc.assert(
      fc.property(measuredText, measuredText, fc.boolean(), mode, (ta, tb, divideIt, rounding) => {
        const a = readNumber(ta);
        const b = readNumber(tb);
        const limit = Math.min(sigFigsOf(a), sigFigsOf(b));
        const r = divideIt ? dividedBy(a, b) : times(a, b);
        expect(sigFigsOf(r)).toBe(limit);
        const d = checkShown(r, rounding);
        expect(d.belowPrecision).toBe(false);
        expect(d.sigFigs).toBe(limit);
      }),
      { numRuns: 1000 },
    );
  });

  it('sums and differences show the fewest decimal places', () => {
    fc.assert(
      fc.property(measuredText, measuredText, fc.boolean(), mode, (ta, tb, sub, rounding) => {
        const a = readNumber(ta);
        const b = readNumber(tb);
        const r = sub ? minus(a, b) : plus(a, b);
        const d = checkShown(r, rounding);
        expect(d.lsd).toBe(Math.max(a.lsd!, b.lsd!));
        if (!d.belowPrecision) expect(d.sigFigs).toBe(sigFigsOf(r));
      }),
      { numRuns: 1000 },
    );
  });

  it('chains of products keep the fewest figures, and a product’s figures match its display', () => {
    fc.assert(
      fc.property(fc.array(measuredText, { minLength: 2, maxLength: 5 }), mode, (texts, rounding) => {
        const xs = texts.map((t) => readNumber(t));
        const r = xs.slice(1).reduce<Measured>((acc, x) => times(acc, x), xs[0]);
        const d = checkShown(r, rounding);
        expect(d.sigFigs).toBe(Math.min(...xs.map(sigFigsOf)));
      }),
      { numRuns: 500 },
    );
  });

  it('quantities shown in any unit of their kind keep the same figures', () => {
    fc.assert(
      fc.property(measuredText, measuredText, fc.constantFrom('g', 'mg', 'kg', 'µg'), fc.constantFrom('mL', 'L', 'µL'), mode, (ta, tb, mu, vu, rounding) => {
        const m = quantity(readNumber(ta), unitOf(mu));
        const v = quantity(readNumber(tb), unitOf(vu));
        const limit = Math.min(sigFigsOf(readNumber(ta)), sigFigsOf(readNumber(tb)));
        for (const u of ['g/L', 'mg/mL', 'µg/mL', 'g/100 mL', 'mg/dL']) {
          const d = displayQuantity(divide(m, v), u, rounding);
          expect(d.sigFigs).toBe(limit);
          expect(figuresOf(d.figure)).toBe(limit);
        }
        const back = displayQuantity(multiply(divide(m, v), v), 'g', rounding);
        expect(back.sigFigs).toBe(limit);
      }),
      { numRuns: 300 },
    );
  });

  it('a number as written is shown as written (rounding is idempotent on its own output)', () => {
    fc.assert(
      fc.property(measuredText, mode, (t, rounding) => {
        const n = readNumber(t);
        const d = checkShown(n, rounding);
        expect(d.value.eq(new Decimal(n.value))).toBe(true);
        expect(d.sigFigs).toBe(sigFigsOf(n));
      }),
      { numRuns: 500 },
    );
  });
});
