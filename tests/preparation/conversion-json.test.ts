// The serialisers of `pondus gravimetric` and `pondus basis`: the CLI's JSON row is exactly the
// library's serialiser fed the plain result (plus the writer's `line`), amounts have the one shape
// every command uses, percentages are fractions shown in %, and the rows validate against the schemas.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { convertBasis } from '../../src/preparation/basis.js';
import { basisJson } from '../../src/preparation/basis-json.js';
import { gravimetric } from '../../src/preparation/gravimetric.js';
import { gravimetricJson } from '../../src/preparation/gravimetric-json.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { jsonLines, pondus } from '../cli/run-cli.js';

const SCHEMAS = fileURLToPath(new URL('../../schemas/', import.meta.url));
const ajv = new Ajv2020({ allErrors: true, strict: true });
ajv.addSchema(JSON.parse(readFileSync(`${SCHEMAS}common.schema.json`, 'utf8')));
const schema = (name: string) => ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}${name}.schema.json`, 'utf8')));

const codeOf = (f: () => unknown): string | undefined => {
  try {
    f();
  } catch (e) {
    return e instanceof PondusError ? e.issues[0].code : `not a PondusError: ${String(e)}`;
  }
  return undefined;
};

describe('gravimetricJson', () => {
  it('writes the analyte mass and the mass percent as result amounts', () => {
    // source: CIAAW 2021 standard atomic weights (Ag 107.8682, Cl 35.45): 0.2866 g AgCl × 35.45/143.32 = 0.07089 g Cl,
    // 14.18 % of a 0.5000 g sample (arithmetic by hand)
    const row = gravimetricJson(gravimetric('Cl', 'AgCl', { weighedMass: '0.2866 g', sampleMass: '0.5000 g' }));
    expect(row.analyteMass).toMatchObject({ kind: 'result', unit: 'g', display: '0.07089 g', sigFigs: 4, figure: '0.07089', displayUnit: 'g' });
    expect(row.analyteMass!.value).toBeCloseTo(0.07089, 5);
    expect(row.massPercent).toMatchObject({ kind: 'result', unit: '', display: '14.18 %', sigFigs: 4, figure: '14.18', displayUnit: '%' });
    expect(row.massPercent!.value).toBeCloseTo(0.1418, 4);
    expect(Object.keys(row)).not.toContain('analyteMassDisplay');
    expect(Object.keys(row)).not.toContain('massPercentDisplay');
  });

  it('keeps the figures of the library result: the mass fraction is the percent over 100, to the same figures', () => {
    const r = gravimetric('Fe', 'Fe2O3', { weighedMass: '0.2345 g', sampleMass: '1.0012 g' });
    const row = gravimetricJson(r);
    expect(row.massPercent!.figure).toBe(displayQuantity(r.massPercent!).figure); // '16.38'
    expect(row.massPercent!.value * 100).toBeCloseTo(r.massPercent!.value.toNumber(), 10);
    expect(row.massPercent!.sigFigs).toBe(displayQuantity(r.massPercent!).sigFigs);
  });

  it('writes null amounts when only the factor was asked for', () => {
    const row = gravimetricJson(gravimetric('Fe', 'Fe2O3'));
    expect(row.factorDisplay).toBe('0.69943');
    expect(row.analyteMass).toBeNull();
    expect(row.massPercent).toBeNull();
  });

  it('is exactly what the CLI prints, and the rows validate against the schema', () => {
    const validate = schema('gravimetric');
    for (const [args, r] of [
      [['Cl', '--weighed', 'AgCl', '--mass', '0.2866 g', '--sample', '0.5000 g'], gravimetric('Cl', 'AgCl', { weighedMass: '0.2866 g', sampleMass: '0.5000 g' })],
      [['Cl', '--weighed', 'AgCl', '--mass', '0.5000 g', '--sample', '0.1000 g'], gravimetric('Cl', 'AgCl', { weighedMass: '0.5000 g', sampleMass: '0.1000 g' })],
      [['Fe', '--weighed', 'Fe2O3'], gravimetric('Fe', 'Fe2O3')],
    ] as const) {
      const out = pondus(['gravimetric', '--json', ...args]).stdout;
      expect(out).toBe(`${JSON.stringify({ line: 1, ...gravimetricJson(r) })}\n`);
      const [row] = jsonLines(out);
      expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
    }
  });
});

describe('basisJson', () => {
  it('writes the value given and the converted value as result amounts, percentages as fractions', () => {
    // source: IFA fertilizer conversion factors (from memory): P = 0.4364 × P2O5, so 12.5 % P2O5 is 5.46 % P
    const row = basisJson(convertBasis('P2O5', 'P', { value: '12.5 %' }));
    expect(row.value).toEqual({ kind: 'result', value: 0.125, unit: '', display: '12.5 %', sigFigs: 3, figure: '12.5', displayUnit: '%' });
    expect(row.converted).toMatchObject({ kind: 'result', unit: '', display: '5.46 %', sigFigs: 3, figure: '5.46', displayUnit: '%' });
    expect(row.converted!.value).toBeCloseTo(0.0546, 4);
    expect(Object.keys(row)).not.toContain('convertedDisplay');
  });

  it('keeps a mass in grams', () => {
    // source: IFA fertilizer conversion factors (from memory): K2O = 1.2046 × K; 3.40 g K is 4.10 g K2O
    const row = basisJson(convertBasis('K', 'K2O', { value: '3.40 g' }));
    expect(row.converted).toMatchObject({ kind: 'result', unit: 'g', display: '4.10 g', figure: '4.10', displayUnit: 'g' });
    expect(row.converted!.value).toBeCloseTo(4.0956, 4);
  });

  it('is exactly what the CLI prints, and the rows validate against the schema', () => {
    const validate = schema('basis');
    for (const [args, r] of [
      [['P2O5', '--to', 'P', '--value', '12.5 %'], convertBasis('P2O5', 'P', { value: '12.5 %' })],
      [['P2O5', '--to', 'P', '--value', '1300 ppm'], convertBasis('P2O5', 'P', { value: '1300 ppm' })],
      [['K', '--to', 'K2O', '--value', '90.0 %'], convertBasis('K', 'K2O', { value: '90.0 %' })],
      [['P2O5', '--to', 'P'], convertBasis('P2O5', 'P')],
    ] as const) {
      const out = pondus(['basis', '--json', ...args]).stdout;
      expect(out).toBe(`${JSON.stringify({ line: 1, ...basisJson(r) })}\n`);
      const [row] = jsonLines(out);
      expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
    }
  });
});

describe('the public serialisers refuse what is not their result', () => {
  it.each([
    ['gravimetricJson', () => api.gravimetricJson({} as never)],
    ['gravimetricJson of a basis result', () => api.gravimetricJson(api.convertBasis('P2O5', 'P') as never)],
    ['gravimetricJson with a broken factor', () => api.gravimetricJson({ ...api.gravimetric('Fe', 'Fe2O3'), factor: {} } as never)],
    ['gravimetricJson with a bad rounding', () => api.gravimetricJson(api.gravimetric('Fe', 'Fe2O3'), 'up' as never)],
    ['basisJson', () => api.basisJson(null as never)],
    ['basisJson with a converted value as text', () => api.basisJson({ ...api.convertBasis('P2O5', 'P'), converted: '5.46 %' } as never)],
  ])('%s: BAD_ARGUMENT', (_, f) => {
    expect(codeOf(f)).toBe('BAD_ARGUMENT');
  });

  it('serialise their own results', () => {
    expect(api.gravimetricJson(api.gravimetric('Fe', 'Fe2O3')).factorDisplay).toBe('0.69943');
    expect(api.basisJson(api.convertBasis('P2O5', 'P', { value: '12.5 %' })).converted?.display).toBe('5.46 %');
  });
});
