// The serialiser of `pondus salt`: the CLI's JSON row is exactly the library's serialiser fed the
// plain result and the masses as given (plus the writer's `line`; notes name flags, as the command
// line writes them), and it validates against the schema.
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
const validate = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}salt.schema.json`, 'utf8')));

const cliRows = (args: string[], stdin?: string) => {
  const out = pondus(['salt', '--json', ...args], stdin).stdout;
  for (const row of jsonLines(out)) expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
  return out;
};
const line = (n: number, row: () => object) => JSON.stringify({ line: n, ...withNaming(FLAG_NAMING, row) });

describe('the JSON row of salt', () => {
  it('the factor, and the masses either way, as the library writes them', () => {
    // source: CIAAW 2021 standard atomic weights: M(C17H19NO3·HCl·3H2O) 375.85 / M(C17H19NO3) 285.34 = 1.3172 (arithmetic by hand)
    const morphine = ['C17H19NO3·HCl·3H2O', 'C17H19NO3'] as const;
    const plain = api.saltFactor(...morphine);
    expect(cliRows([morphine[0], '--parent', morphine[1]])).toBe(`${line(1, () => api.saltFactorJson(plain, {}))}\n`);
    expect(api.saltFactorJson(plain, {}).factorDisplay).toBe('1.3172');
    const dose = { parentMass: ' 10.0 mg ' };
    const r = api.saltFactor(...morphine, dose);
    expect(cliRows([morphine[0], '--parent', morphine[1], '--dose', ' 10.0 mg '])).toBe(`${line(1, () => api.saltFactorJson(r, dose))}\n`);
    expect([api.saltFactorJson(r, dose).dose, api.saltFactorJson(r, dose).saltMass?.display]).toEqual(['10.0 mg', '13.17 mg']);
    const salt = { saltMass: '12.5 mg' };
    const s = api.saltFactor(...morphine, salt);
    expect(cliRows([morphine[0], '--parent', morphine[1], '--salt-mass', '12.5 mg', '--rounding', 'half-up'])).toBe(`${line(1, () => api.saltFactorJson(s, salt, 'half-up'))}\n`);
    expect(api.saltFactorJson(s, salt).saltGiven).toBe('12.5 mg');
  });
  it('a batch from standard input, metal salts and a line that fails among them', () => {
    const salts = ['C14H13NaO3', 'bad((', 'C14H13KO3'];
    const given = { parentMass: '250 mg' };
    const rows = cliRows(['-', '--parent', 'C14H14O3', '--dose', '250 mg'], salts.join('\n') + '\n').trim().split('\n');
    salts.forEach((t, i) => {
      if (t === 'bad((') return expect(JSON.parse(rows[i])).toHaveProperty('error');
      expect(rows[i]).toBe(line(i + 1, () => api.saltFactorJson(api.saltFactor(t, 'C14H14O3', given), given)));
    });
    expect(JSON.parse(rows[0]).form).toBe('metal');
  });
  it('refuses a value that is not the result it writes', () => {
    expect(() => api.saltFactorJson({} as never, {})).toThrow(/saltFactorJson: argument 1 must be a salt\/parent factor/);
    expect(() => api.saltFactorJson(api.saltFactor('C14H13NaO3', 'C14H14O3'), '250 mg' as never)).toThrow(/saltFactorJson: argument 2 must be an object/);
  });
});
