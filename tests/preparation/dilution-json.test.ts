// The serialisers of `pondus dilute` (one step, --series, --mass): the CLI's JSON row is exactly the
// library's serialiser fed the plain result (plus the writer's `line`; the notes name flags, as the
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
const validate = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}dilute.schema.json`, 'utf8')));

/** The CLI's JSON rows for `dilute`, each checked against the schema. */
const cliRows = (args: string[], stdin?: string) => {
  const out = pondus(['dilute', '--json', ...args], stdin).stdout;
  for (const row of jsonLines(out)) expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
  return out;
};
const line = (n: number, row: () => object) => JSON.stringify({ line: n, ...withNaming(FLAG_NAMING, row) });

describe('the JSON rows of dilute', () => {
  it('one step: the stock to take, or the concentration made, as the library writes them', () => {
    // source: C1·V1 = C2·V2, 1.00 M × V1 = 0.100 M × 250.0 mL gives V1 = 25.00 mL (arithmetic by hand)
    const r = api.dilute('1.00 M', '0.100 M', '250.0 mL');
    expect(cliRows(['1.00 M', '--to', '0.100 M', '--volume', '250.0 mL'])).toBe(`${line(1, () => api.dilutionJson(r))}\n`);
    expect(api.dilutionJson(r).stockVolume?.display).toBe('25.00 mL');
    const made = api.dilute('1.00 M', undefined, '250.0 mL', '25.00 mL');
    expect(cliRows(['1.00 M', '--taken', '25.00 mL', '--volume', '250.0 mL', '--rounding', 'half-up'])).toBe(`${line(1, () => api.dilutionJson(made, 'half-up'))}\n`);
    expect(api.dilutionJson(made).made?.display).toBe('0.100 M');
  });
  it('one step, a batch from standard input with a line that fails: every other line as the library writes it', () => {
    const stocks = ['1.00 M', '2.0 M', 'bad', '12.0 mol/L'];
    const rows = cliRows(['-', '--to', '0.100 M', '--volume', '250.0 mL'], stocks.join('\n') + '\n').trim().split('\n');
    stocks.forEach((s, i) => {
      if (s === 'bad') return expect(JSON.parse(rows[i])).toHaveProperty('error');
      expect(rows[i]).toBe(line(i + 1, () => api.dilutionJson(api.dilute(s, '0.100 M', '250.0 mL'))));
    });
    // a note that names a command: the command line's words in its rows, the library's own otherwise
    const big = api.dilute('12.0 mol/L', '0.100 M', '250.0 mL');
    expect(JSON.parse(rows[3]).notes).toEqual(withNaming(FLAG_NAMING, () => api.dilutionJson(big)).notes);
  });
  it('a serial plan and a dilution by mass, as the library writes them', () => {
    // source: 1:1000 with steps of at most 1:100 and transfers of at least 100 µL is 1:100 then 1:10 (common practice)
    const plan = api.dilutionSeries({ stock: '1000 µg/mL', target: '1.000 µg/mL', volume: '10.00 mL' });
    expect(cliRows(['1000 µg/mL', '--to', '1.000 µg/mL', '--series', '--volume', '10.00 mL'])).toBe(`${line(1, () => api.seriesJson(plan))}\n`);
    expect(api.seriesJson(plan).steps.map((s) => s.factor)).toEqual([100, 10]);
    const byFactor = api.dilutionSeries({ factor: '1:1000000', volume: '10.00 mL', minTransfer: '50 µL', maxStep: '50' });
    expect(cliRows(['1:1000000', '--series', '--volume', '10.00 mL', '--min-transfer', '50 µL', '--max-step', '50', '--rounding', 'half-up'])).toBe(`${line(1, () => api.seriesJson(byFactor, 'half-up'))}\n`);
    expect(api.seriesJson(byFactor).input).toBe('1:1000000');
    // source: 10 % w/w to 2.5 % w/w is 1:4, so 60.0 g holds 15.00 g of the stronger material (arithmetic by hand)
    const m = api.diluteByMass('10 % w/w', '2.5 % w/w', '60.0 g');
    expect(cliRows(['10 % w/w', '--to', '2.5 % w/w', '--mass', '60.0 g'])).toBe(`${line(1, () => api.massDilutionJson(m))}\n`);
    expect([api.massDilutionJson(m).take.display, api.massDilutionJson(m).diluent.display]).toEqual(['15.00 g', '45.00 g']);
  });
  it('refuses a value that is not the result it writes', () => {
    expect(() => api.dilutionJson({} as never)).toThrow(/dilutionJson: argument 1 must be a dilution result/);
    expect(() => api.seriesJson(api.dilute('1.00 M', '0.100 M', '250.0 mL') as never)).toThrow(/seriesJson: argument 1 must be a serial dilution plan/);
    expect(() => api.massDilutionJson(api.diluteByMass('10 % w/w', '2.5 % w/w', '60.0 g'), 'up' as never)).toThrow(/BAD_ARGUMENT|must be 'half-even' or 'half-up'/);
  });
});
