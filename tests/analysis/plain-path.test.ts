import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analysis, exactAnalysis, plainAnalysis, type AnalysisOptions } from '../../src/analysis/check.js';
import { analysisJson, analysisJsonLine } from '../../src/analysis/analysis-json.js';
import { readFoundValues, readPlainFound } from '../../src/analysis/found-values.js';
import { composition } from '../../src/composition/element-shares.js';
import { Decimal } from '../../src/exact/decimal.js';
import { PondusError } from '../../src/errors/pondus-error.js';

// The batch path without solvents (plainAnalysis, readPlainFound, analysisJsonLine) must give what
// the general Decimal path gives, field for field and byte for byte: these tests compare the two
// on generated inputs (no published figures: the general path is the reference, and its figures
// are checked against sources in analysis.test.ts and percent-rounding.test.ts).

/** What a call gives: its result as JSON text (key order included), or its error's code and message. */
function outcome(fn: () => unknown): string {
  try {
    return JSON.stringify(fn());
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    return `error ${e.first.code}: ${e.first.message}`;
  }
}

const organic = fc
  .tuple(fc.integer({ min: 1, max: 60 }), fc.integer({ min: 0, max: 90 }), fc.integer({ min: 0, max: 8 }), fc.integer({ min: 0, max: 12 }), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 0, max: 3 }))
  .map(([c, h, n, o, s, cl]) => `C${c}${h ? `H${h}` : ''}${n ? `N${n}` : ''}${o ? `O${o}` : ''}${s ? `S${s}` : ''}${cl ? `Cl${cl}` : ''}`);
const formula = fc.oneof(
  { weight: 6, arbitrary: organic },
  { weight: 1, arbitrary: fc.constantFrom('C6H6', 'CuSO4·5H2O', 'C17H19NO3·HCl·3H2O', '[13C]H4', 'CD3OD', 'C6H5Cl', 'NH4^+', 'C12H22O11', 'C2H6O', 'TcO2', 'C60', 'C(CH3)4', 'PhMe', 'Xq2') },
);

/** A found value near the formula's own percent: written with 0 to 4 decimals, sometimes zero, sometimes odd. */
const value = (percent: number) =>
  fc.tuple(fc.double({ min: -1.5, max: 1.5, noNaN: true }), fc.integer({ min: 0, max: 4 }), fc.integer({ min: 0, max: 19 })).map(([off, decimals, odd]) => {
    if (odd === 0) return '0';
    if (odd === 1) return '0.00';
    if (odd === 2) return '+' + percent.toFixed(2);
    if (odd === 3) return '0' + percent.toFixed(2);
    if (odd === 4) return percent.toFixed(2) + '%';
    if (odd === 5) return (percent + 30).toFixed(2);
    if (odd === 6) return percent.toFixed(9);
    return Math.max(0, percent + off).toFixed(decimals);
  });

const separator = fc.constantFrom(' ', ',', ', ', ' ', ',', ', ', ' ', ' ,', '; ', '  ');

/** A formula and found values for some of its elements (now and then one it lacks). */
const line = formula.chain((f) => {
  let shares: { symbol: string; massPercent: number }[];
  try {
    shares = composition(f, { abbreviations: true }).elements;
  } catch {
    shares = [{ symbol: 'C', massPercent: 50 }];
  }
  const pool = fc.integer({ min: 0, max: 5 }).map((k) => (k === 0 ? [...shares, { symbol: 'S', massPercent: 2 }] : k === 1 ? [...shares, { symbol: 'Br', massPercent: 10 }] : shares));
  return pool
    .chain((p) => fc.subarray(p, { minLength: 1 }))
    .chain((picked) => fc.tuple(fc.constant(f), fc.tuple(...picked.map((e) => value(e.massPercent).map((v) => `${e.symbol}=${v}`))), fc.array(separator, { minLength: picked.length, maxLength: picked.length })))
    .map(([f, pairs, seps]) => [f, pairs.map((p, i) => (i ? seps[i] : '') + p).join('')] as const);
});

const options: fc.Arbitrary<AnalysisOptions> = fc.record(
  {
    tolerance: fc.constantFrom<AnalysisOptions['tolerance']>('0.4', '0.4', '0.4', '0.3', '0.25', '0', '1', '0.40', '100', '0.123456789', 0.5, new Decimal('0.35'), '-1', 'abc'),
    rounding: fc.constantFrom('half-even' as const, 'half-up' as const),
    weights: fc.constantFrom('standard' as const, 'abridged' as const),
    abbreviations: fc.boolean(),
  },
  { requiredKeys: [] },
);

describe('the plain path of analysis', () => {
  it('gives what the exact path gives, or gives way to it', () => {
    let plain = 0;
    let runs = 0;
    fc.assert(
      fc.property(line, options, ([f, found], o) => {
        runs++;
        const exact = outcome(() => exactAnalysis(f, found, o));
        expect(outcome(() => analysis(f, found, o))).toBe(exact);
        const p = (() => {
          try {
            return plainAnalysis(f, found, o);
          } catch (e) {
            return outcome(() => {
              throw e;
            });
          }
        })();
        if (p === null) return;
        if (typeof p === 'string') expect(p).toBe(exact);
        else {
          plain++;
          expect(JSON.stringify(p)).toBe(exact);
          expect(p).toStrictEqual(JSON.parse(exact));
        }
      }),
      { numRuns: 3000 },
    );
    // the comparison means something only if the plain path is taken often
    expect(plain / runs).toBeGreaterThan(0.2);
  });

  it('notes a sum over 100.5 % and checks a percent no solvent explains as the exact path does', () => {
    // benzene C 92.26 %, H 7.74 % (computed); the sum 100.56 is noted, a C of 95 is flagged
    const r = plainAnalysis('C6H6', 'C=92.26 H=8.30');
    expect(r?.notes.map((n) => n.code)).toEqual(['SUM_OVER_100']);
    expect(r?.notes[0].message).toBe(exactAnalysis('C6H6', 'C=92.26 H=8.30').notes[0].message);
    const s = plainAnalysis('C20H25N3O', 'C=95.00');
    expect(s?.notes.map((n) => n.code)).toEqual(['IMPOSSIBLE_PERCENT']);
    expect(JSON.stringify(s)).toBe(JSON.stringify(exactAnalysis('C20H25N3O', 'C=95.00')));
  });
});

describe('readPlainFound', () => {
  const text = fc
    .array(
      fc.tuple(fc.constantFrom('C', 'H', 'N', 'S', 'Cl', 'Br', 'O', 'P', 'Xx', 'c', 'CO', ''), fc.constantFrom('=', '=', '=', '=', ':', ' = ', '=='), fc.constantFrom('74.75', '7.49', '12.5', '0', '0.00', '1', '100', '100.00', '100.01', '05.1', '.5', '5.', '+7.49', '-1', '7.123456789', '12.34567891', '99.99999999', '7.49%', '60', '45.5', '30.25'), separator),
      { minLength: 1, maxLength: 4 },
    )
    .map((parts) => parts.map(([k, eq, v, sep], i) => (i ? sep : '') + k + eq + v).join(''));

  it('reads what readFoundValues reads, with the same texts and notes, or gives way', () => {
    let read = 0;
    fc.assert(
      fc.property(text, (t) => {
        const p = readPlainFound(t);
        if (p === null) return;
        read++;
        const r = readFoundValues(t);
        expect(p.symbols).toEqual([...r.values.keys()]);
        expect(p.texts).toEqual([...r.text.values()]);
        expect(p.scaled).toEqual([...r.values.values()].map((v) => Number(v.times(1e8).toFixed())));
        expect(p.notes).toEqual(r.notes);
      }),
      { numRuns: 3000 },
    );
    expect(read).toBeGreaterThan(50);
  });

  it('gives way for what it does not read', () => {
    for (const t of ['C=74.75 H=+7.49', 'C=74.75  H=7.49', 'C: 74.75', 'C=074.75', 'C=.5', 'C=5.', 'C=7.123456789', 'C=74.75,', 'C=74.75 C=1', 'Xx=5', 'C=60 H=50', 'C=100.01', ' C=1', 'C=1%']) {
      expect(readPlainFound(t)).toBeNull();
    }
  });
});

describe('analysisJsonLine', () => {
  it('is JSON.stringify of analysisJson with the tail members after', () => {
    fc.assert(
      fc.property(line, fc.constantFrom([], ['water'], ['water', 'DCM', 'HCl']), fc.constantFrom('', ',"rounding":"half-even"'), ([f, found], solvents, tail) => {
        let r;
        try {
          r = analysis(f, found, { solvents, abbreviations: true });
        } catch {
          return;
        }
        const whole = JSON.stringify(Object.assign(analysisJson(r), tail ? { rounding: 'half-even' } : {}));
        expect(analysisJsonLine(r, tail)).toBe(whole);
      }),
      { numRuns: 600 },
    );
  });
});
