// The serialiser of `pondus mass --uncertainty`: the CLI's JSON row is exactly the library's
// serialiser fed the mass result and its uncertainty (plus the writer's `line`), and it validates
// against the schema.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { withNaming } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { jsonLines, pondus } from '../cli/run-cli.js';

const SCHEMAS = fileURLToPath(new URL('../../schemas/', import.meta.url));
const ajv = new Ajv2020({ allErrors: true, strict: true });
ajv.addSchema(JSON.parse(readFileSync(`${SCHEMAS}common.schema.json`, 'utf8')));
const validate = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}mass.schema.json`, 'utf8')));

const row = (f: string) => {
  const d = api.formulaMassDetail(f);
  return api.massUncertaintyJson(api.plainMass(d), api.molarMassUncertainty(d));
};

describe('the JSON rows of mass --uncertainty', () => {
  it('each line of a batch as the library writes it, a line that fails in its place', () => {
    const formulas = ['H2O', 'Qq', 'CuSO4·5H2O', 'Co2'];
    const out = pondus(['mass', '--json', '--uncertainty', '-'], formulas.join('\n') + '\n').stdout;
    const lines = out.trim().split('\n');
    for (const r of jsonLines(out)) expect(validate(r), JSON.stringify(validate.errors)).toBe(true);
    formulas.forEach((f, i) => {
      if (f === 'Qq') return expect(JSON.parse(lines[i])).toHaveProperty('error');
      expect(lines[i]).toBe(JSON.stringify({ line: i + 1, ...withNaming(FLAG_NAMING, () => row(f)) }));
    });
  });
  it('the mass row, then the uncertainty and its basis', () => {
    // source: CIAAW 2021 intervals H [1.00784, 1.00811], O [15.99903, 15.99977], read as rectangular
    // (van der Veen et al., Pure Appl. Chem. 93 (2021) 629): centre 2 × 1.007975 + 15.99940 = 18.01535,
    // u = √((2 × 0.000135/√3)² + (0.00037/√3)²) = 0.000264 g/mol (arithmetic by hand)
    const r = row('H2O');
    expect(r.molarMassUncertainty.value).toBe(18.01535);
    expect(r.molarMassUncertainty.standardUncertainty).toBeCloseTo(0.000264, 6);
    const { molarMassUncertainty, caution, ...mass } = r;
    expect(mass).toEqual(api.massJson(api.formulaMass('H2O')));
    expect([Object.keys(molarMassUncertainty), caution]).toEqual([['value', 'standardUncertainty'], api.UNCERTAINTY_BASIS]);
  });
  it('refuses a value that is not the result it writes', () => {
    expect(() => api.massUncertaintyJson(api.formulaMass('H2O'), {} as never)).toThrow(/massUncertaintyJson: argument 2 must be a molar-mass uncertainty/);
    expect(() => api.massUncertaintyJson(api.formulaMassDetail('H2O') as never, api.molarMassUncertainty(api.formulaMassDetail('H2O')))).toThrow(/massUncertaintyJson: argument 1 must be a mass result/);
  });
});
