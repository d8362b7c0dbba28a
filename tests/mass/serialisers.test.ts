import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { composition, compositionDetail } from '../../src/composition/element-shares.js';
import { compositionCsvColumns, compositionCsvLongRows, compositionCsvRow, compositionJson, compositionJsonLine } from '../../src/composition/composition-json.js';
import { safeFormulaMass, formulaMass, formulaMassDetail } from '../../src/mass/formula-mass.js';
import { massCells, massJson, massJsonLine } from '../../src/mass/mass-json.js';
import { Decimal } from '../../src/exact/decimal.js';
import { scaledRatio } from '../../src/exact/ratio.js';
import { toSafe } from '../../src/errors/pondus-error.js';

// formulas of every kind the pipeline reads: plain, charged, isotopes, decimal counts, '.' hydrates,
// Unicode subscripts, state symbols, abbreviations, elements without a standard weight
const element = fc.constantFrom('C', 'H', 'O', 'N', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Pt', 'U', 'Tc', 'D', '[13C]', 'Ph');
const count = fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 60 }).map(String), fc.constantFrom('0.5', '0.95', '2.25', '₂', '₁₂'));
const part = fc.tuple(element, count).map(([e, c]) => e + c);
const simple = fc.array(part, { minLength: 1, maxLength: 5 }).map((ps) => ps.join(''));
const formula = fc
  .tuple(
    simple,
    fc.oneof(fc.constant(''), fc.tuple(fc.constantFrom('·', '.', '*'), fc.integer({ min: 1, max: 10 }), fc.constantFrom('H2O', 'NH3', 'D2O')).map(([d, n, w]) => `${d}${n}${w}`)),
    fc.constantFrom('', '', '', '^+', '^2-', '(s)'),
    fc.integer({ min: 1, max: 3 }),
  )
  .map(([a, b, z, n]) => (n === 1 ? `${a}${b}${z}` : `(${a})${n}${b}${z}`));

const parsed = formula.filter((f) => safeFormulaMass(f).success);

describe('one serialiser per command writes each row from the plain result', () => {
  it('mass: the direct JSON line is JSON.stringify of the JSON form', () => {
    fc.assert(
      fc.property(parsed, (f) => {
        const r = formulaMass(f);
        expect(massJsonLine(r)).toBe(JSON.stringify(massJson(r)));
      }),
      { numRuns: 1500 },
    );
  });

  it('composition: the direct JSON line is JSON.stringify of the JSON form, with and without a part', () => {
    fc.assert(
      fc.property(parsed, fc.constantFrom(undefined, 'H2O', 'H'), (f, p) => {
        const r = toSafe(() => composition(f, { part: p }));
        if (!r.success) return;
        expect(compositionJsonLine(r.data)).toBe(JSON.stringify(compositionJson(r.data)));
      }),
      { numRuns: 1500 },
    );
  });

  it('an input that needs JSON escaping is escaped the same way', () => {
    // a state symbol after a formula keeps the input as written; a quote cannot reach a formula, so test the writer on the string itself
    const r = { ...formulaMass('H2O'), input: 'H2O "x"\u2028' };
    expect(massJsonLine(r)).toBe(JSON.stringify(massJson(r)));
  });
});

describe('library results are plain data', () => {
  it('JSON.stringify, spread and structuredClone keep every field of a mass result', () => {
    const r = formulaMass('SO4^2-');
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect({ ...r }).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    for (const key of ['input', 'formula', 'molarMass', 'molarMassExact', 'monoisotopicMass', 'monoisotopicMassExact', 'nominalMass', 'charge', 'notes']) {
      expect(Object.keys(JSON.parse(JSON.stringify(r)))).toContain(key);
    }
    expect(Object.getPrototypeOf(r)).toBe(Object.prototype);
  });

  it('and of a composition result', () => {
    const r = composition('CuSO4·5H2O', { part: 'H2O' });
    expect(structuredClone(r)).toEqual(r);
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect({ ...r }).toEqual(r);
  });

  it('notes are always present as {code, message}', () => {
    expect(massJson(formulaMass('H2O')).notes).toEqual([]);
    expect(compositionJson(composition('H2O')).notes).toEqual([]);
    expect(massJson(formulaMass('CuSO4.5H2O')).notes.map((n) => Object.keys(n))).toEqual([['code', 'message']]);
  });
});

describe('every JSON number is the nearest double to its exact decimal', () => {
  it('masses: the number is Number() of the exact text', () => {
    fc.assert(
      fc.property(parsed, (f) => {
        const r = formulaMass(f);
        expect(r.molarMass).toBe(Number(r.molarMassExact));
        expect(r.monoisotopicMass).toBe(Number(r.monoisotopicMassExact));
        const d = formulaMassDetail(f);
        expect(r.molarMassExact).toBe(d.molarMass.toFixed());
        expect(r.monoisotopicMassExact).toBe(d.monoisotopicMass.toFixed());
      }),
      { numRuns: 1500 },
    );
  });

  it('composition: each mass and percent is the exact Decimal value, to the nearest double', () => {
    fc.assert(
      fc.property(parsed, (f) => {
        const { result, mass } = compositionDetail(f);
        expect(result.molarMass).toBe(mass.molarMass.toNumber());
        mass.contributions.forEach((c, i) => {
          const e = result.elements[i];
          expect(e.symbol).toBe(c.label);
          expect(e.mass).toBe(c.mass.toNumber());
          expect(e.massPercent).toBe(c.mass.div(mass.molarMass).times(100).toNumber());
        });
      }),
      { numRuns: 1500 },
    );
  });

  it('the plain-double percent is correctly rounded on random integers', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }), fc.integer({ min: 1, max: Number.MAX_SAFE_INTEGER }), (a, b) => {
        const [m, t] = a <= b ? [a, b] : [b, a];
        expect(scaledRatio(m, t, 100)).toBe(new Decimal(m).times(100).div(t).toNumber());
      }),
      { numRuns: 20000 },
    );
  });

  it('JSON text of a mass is the exact decimal (no binary tail)', () => {
    // source: sums of CIAAW 2021 weights, exact: C7H16OS2 = 7 × 12.011 + 16 × 1.008 + 15.999 + 2 × 32.06
    expect(massJsonLine(formulaMass('C7H16OS2'))).toContain('"molarMass":180.324,');
  });
});

describe('CSV rows', () => {
  it('mass cells carry the exact decimals', () => {
    expect(massCells(formulaMass('NaCl'))).toEqual(['NaCl', 'ClNa', '58.43976928', '57.95862197595', 58, 0]);
  });

  it('composition wide form: one X_percent column per element of the first block, C and H first', () => {
    const first = [composition('C2H6O'), composition('NaCl')];
    const columns = compositionCsvColumns(first, false);
    expect(columns).toEqual(['input', 'formula', 'molarMass', 'C_percent', 'H_percent', 'Cl_percent', 'Na_percent', 'O_percent']);
    const row = compositionCsvRow(composition('NaCl'), columns);
    expect(row.cells).toEqual(['NaCl', 'ClNa', '58.43976928', 0, 0, composition('NaCl').elements[0].massPercent, composition('NaCl').elements[1].massPercent, 0]);
    expect(row.notes).toEqual([]);
  });

  it('an element with no column is not dropped: a note gives it and points to the long form', () => {
    const columns = compositionCsvColumns([composition('H2O')], false);
    const row = compositionCsvRow(composition('CuSO4'), columns);
    expect(row.notes.map((n) => n.code)).toEqual(['NO_COLUMN']);
    expect(row.notes[0].message).toContain('Cu');
    expect(row.notes[0].message).toContain('S');
    expect(row.notes[0].message).toContain('`compositionCsvLongRows`');
  });

  it('composition long form: one row per element', () => {
    const rows = compositionCsvLongRows(composition('H2O'), false);
    expect(rows.map((r) => r[3])).toEqual(['H', 'O']);
    expect(rows[0].slice(0, 3)).toEqual(['H2O', 'H2O', '18.015']);
  });
});

describe('rows with their line number', () => {
  it('equal JSON.stringify of the JSON form with line first', () => {
    fc.assert(
      fc.property(parsed, fc.integer({ min: 1, max: 1e9 }), (f, line) => {
        expect(massJsonLine(formulaMass(f), line)).toBe(JSON.stringify({ line, ...massJson(formulaMass(f)) }));
        expect(compositionJsonLine(composition(f), line)).toBe(JSON.stringify({ line, ...compositionJson(composition(f)) }));
      }),
      { numRuns: 500 },
    );
  });
});
