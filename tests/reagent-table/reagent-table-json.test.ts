// The serialiser of `pondus reagents`: the CLI's JSON row is exactly the library's row serialiser,
// the table's own notes carried on the first row (plus the writer's `line`; notes name flags, as the
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
const validate = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}reagents.schema.json`, 'utf8')));

const EQUATION = 'C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2';
const SPECS: api.ReagentSpec[] = [
  { role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' },
  { role: 'reagent', reagent: 'C4H6O3', amount: '3.0 equiv', density: '1.08 g/mL' },
  { role: 'product', reagent: 'C9H8O4' },
];

describe('the JSON rows of reagents', () => {
  it('each row as the library writes it, the table notes on the first row only', () => {
    const out = pondus(['reagents', '--json', '--reference', 'C7H6O3=2.00 g', '--reagent', 'C4H6O3=3.0 equiv, density=1.08 g/mL', '--product', 'C9H8O4', '--equation', EQUATION]).stdout;
    for (const row of jsonLines(out)) expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
    const table = api.reagentTable(SPECS, { equation: EQUATION });
    expect(table.notes.length).toBeGreaterThan(0);
    const inputs = ['C7H6O3=2.00 g', 'C4H6O3=3.0 equiv, density=1.08 g/mL', 'C9H8O4'];
    const expected = table.rows.map((r, i) => JSON.stringify({ line: i + 1, ...withNaming(FLAG_NAMING, () => api.reagentRowJson({ ...r, input: inputs[i] }, i === 0 ? table.notes : undefined)) }));
    expect(out).toBe(`${expected.join('\n')}\n`);
    // source: 2.00 g / 138.12 g/mol (salicylic acid, CIAAW 2021 weights) = 14.5 mmol (arithmetic by hand)
    const first = api.reagentRowJson(table.rows[0], table.notes);
    expect(first.amount?.display).toBe('14.5 mmol');
    expect(first.notes.map((n) => n.code).slice(0, table.notes.length)).toEqual(table.notes.map((n) => n.code));
    expect(api.reagentRowJson(table.rows[1]).notes.map((n) => n.code)).toEqual(table.rows[1].notes.map((n) => n.code));
    expect(first.caution).toBe(api.TABLE_CAUTION);
  });
  it('a first row that fails does not take the table notes with it: the first row with a result carries them', () => {
    const procedure = `role,reagent,formula,amount\nequation,${EQUATION},,\nreagent,Qq,,3.0 equiv\nreference,salicylic acid,C7H6O3,2.00 g\nproduct,aspirin,C9H8O4,\n`;
    const table = api.reagentTable([SPECS[0], SPECS[2]], { equation: EQUATION });
    const codes = table.notes.map((n) => n.code);
    expect(codes.length).toBeGreaterThan(0);
    const run = pondus(['reagents', '--json', '--procedure', '-'], procedure);
    const rows = jsonLines(run.stdout);
    expect(rows[0]).toHaveProperty('error');
    expect(rows[1].notes.map((n: { code: string }) => n.code).slice(0, codes.length)).toEqual(codes);
    expect(rows[2].notes.map((n: { code: string }) => n.code)).not.toContain(codes[0]);
    // and in the table's own output
    const text = pondus(['reagents', '--procedure', '-'], procedure).stdout;
    expect(text).toContain(table.notes[0].message);
  });
  it('refuses a value that is not the result it writes', () => {
    const table = api.reagentTable(SPECS);
    expect(() => api.reagentRowJson({} as never)).toThrow(/reagentRowJson: argument 1 must be a reagent-table row/);
    expect(() => api.reagentRowJson(table.rows[0], ['set aside'] as never)).toThrow(/reagentRowJson: argument 2 must be an array, each item a note/);
  });
});
