// The serialisers of `pondus prepare`: the CLI's JSON row is exactly the library's serialiser fed
// the plain result and the amounts as given (plus the writer's `line`; the notes name flags, as the
// command line writes them), and it validates against the schema.
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
const validate = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}prepare.schema.json`, 'utf8')));

const cliRow = (args: string[]) => {
  const out = pondus(['prepare', '--json', ...args]).stdout;
  const [row] = jsonLines(out);
  expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
  return out;
};

describe('the JSON rows of prepare', () => {
  it('a solution to make up, with an assay and a mass weighed, as the library writes it', () => {
    // source: CIAAW 2021 standard atomic weights (Na 22.98976928, Cl 35.45): 0.100 M × 0.2500 L × 58.44 g/mol = 1.461 g (arithmetic by hand)
    for (const given of [
      { concentration: '0.100 M', volume: '250.0 mL' },
      { concentration: '0.100 M', volume: '250.0 mL', purity: '99.5 %', weighed: '1.4700 g' },
      { concentration: '50 mg/L', volume: '1.000 L', as: 'Cu' },
    ]) {
      const args = ['CuSO4·5H2O', ...Object.entries(given).flatMap(([k, v]) => [`--${k}`, v])];
      const r = api.prepareSolution('CuSO4·5H2O', given);
      expect(cliRow(args)).toBe(`${JSON.stringify({ line: 1, ...withNaming(FLAG_NAMING, () => api.solutionJson(r, given)) })}\n`);
    }
    const row = api.solutionJson(api.prepareSolution('NaCl', { concentration: '0.100 M', volume: '250.0 mL' }), { concentration: ' 0.100 M', volume: '250.0 mL ' });
    expect(row.mass?.display).toBe('1.461 g');
    expect([row.concentration, row.volume]).toEqual(['0.100 M', '250.0 mL']);
  });
  it('a form weighed in place of another, and a concentrated reagent to measure by volume', () => {
    const s = api.substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g');
    expect(cliRow(['CuSO4·5H2O', '--replace', 'CuSO4=10.00 g'])).toBe(`${JSON.stringify({ line: 1, ...withNaming(FLAG_NAMING, () => api.substituteJson(s, '10.00 g')) })}\n`);
    const given = { fraction: '37 %', concentration: '1.00 M', volume: '500.0 mL' };
    const c = api.concentratedReagent('HCl', given);
    expect(cliRow(['HCl', '--fraction', '37 %', '--concentration', '1.00 M', '--volume', '500.0 mL'])).toBe(`${JSON.stringify({ line: 1, ...withNaming(FLAG_NAMING, () => api.concentratedJson(c, given)) })}\n`);
    expect(api.concentratedJson(c, given).density).toBe('1.19 g/mL');
    // the library names the option, the command line its flag
    const note = (row: { notes: { code: string; message: string }[] }) => row.notes.find((n) => n.code === 'DENSITY_FROM_TABLE')?.message;
    expect(note(api.concentratedJson(c, given))).toMatch(/\(give `density`\)$/);
    expect(note(withNaming(FLAG_NAMING, () => api.concentratedJson(c, given)))).toMatch(/\(give --density\)$/);
  });
  it('refuses a value that is not the result it writes', () => {
    expect(() => api.solutionJson({} as never, {})).toThrow(/solutionJson: argument 1 must be a solution result/);
    expect(() => api.substituteJson(api.substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g'), 10 as never)).toThrow(/BAD_ARGUMENT|must be a string/);
  });
});
