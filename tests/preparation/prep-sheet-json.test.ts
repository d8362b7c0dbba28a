// The serialiser of `pondus prepare --sheet`: the CLI's JSON row is exactly the library's
// serialiser fed the row's result and the sheet's caution (plus the writer's `line`, the row's line
// in the file; notes name flags, as the command line writes them), and it validates against the schema.
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

const EXAMPLE = readFileSync(fileURLToPath(new URL('../../examples/prep-sheet.csv', import.meta.url)), 'utf8');
const SOLIDS = 'id,reagent,form,purity,density,target,volume,weighed,taken\nA,copper sulfate,CuSO4·5H2O,98.5 %,,0.100 M,250.0 mL,,\nB,sodium chloride,NaCl,,,0.100 M,250.0 mL,1.470 g,\nC,unknown,Qq,,,0.100 M,250.0 mL,,\nD,sodium chloride,NaCl,,,,250.0 mL,1.461 g,\n';

/** Each row of the sheet as the CLI writes it (from standard input) and as the library writes it. */
function compare(sheet: string, rounding?: 'half-up') {
  const out = pondus(['prepare', '--json', '--sheet', '-', ...(rounding ? ['--rounding', rounding] : [])], sheet).stdout;
  const lines = out.trim().split('\n');
  for (const row of jsonLines(out)) expect(validate(row), JSON.stringify(validate.errors)).toBe(true);
  const rows = api.readPrepSheet(sheet);
  const caution = api.prepSheetCaution(rows);
  expect(lines.length).toBe(rows.length);
  rows.forEach((row, i) => {
    const r = api.safePrepRow(row);
    if (!r.success) return expect(JSON.parse(lines[i])).toHaveProperty('error');
    expect(lines[i]).toBe(JSON.stringify({ line: row.line, ...withNaming(FLAG_NAMING, () => api.prepRowJson(r.data, caution, rounding)) }));
  });
  return { rows, caution };
}

describe('the JSON rows of a prep sheet', () => {
  it('solids and concentrated liquids, with a mass weighed and a volume taken, as the library writes them', () => {
    const { caution } = compare(EXAMPLE);
    expect(caution).toMatch(/^concentrated acids and bases/);
    compare(EXAMPLE, 'half-up');
  });
  it('a sheet of solids only has the bench caution; a row that fails keeps its place; empty columns are null', () => {
    const { rows, caution } = compare(SOLIDS);
    expect(caution).toBe(api.BENCH_CAUTION);
    // source: CIAAW 2021 standard atomic weights: 0.100 M × 0.2500 L × 249.68 g/mol / 0.985 = 6.337 g (arithmetic by hand)
    const row = api.prepRowJson(api.prepRow(rows[0]), caution);
    expect([row.action, row.amount?.display]).toEqual(['weigh', '6.337 g']);
    expect(row.instruction).toBe('weigh 6.337 g of CuSO4·5H2O (copper sulfate; assay 98.5 %), dissolve, and make up to 250.0 mL');
    // a row with only the mass weighed: no target, no purity, no amount to weigh, the concentration made
    // source: 1.461 g / 58.44 g/mol / 0.2500 L = 0.1000 M (arithmetic by hand)
    const made = api.prepRowJson(api.prepRow(rows[3]), caution);
    expect([made.target, made.purity, made.amount, made.instruction, made.made?.display]).toEqual([null, null, null, '', '0.1000 M']);
  });
  it('refuses a value that is not the result it writes', () => {
    expect(() => api.prepRowJson({} as never, api.BENCH_CAUTION)).toThrow(/prepRowJson: argument 1 must be a prep-sheet row result/);
    const [row] = api.readPrepSheet(SOLIDS);
    expect(() => api.prepRowJson(api.prepRow(row), null as never)).toThrow(/prepRowJson: argument 2 must be a string/);
    expect(() => api.prepSheetCaution([{}] as never)).toThrow(/prepSheetCaution: argument 1 must be an array, each item a prep-sheet row/);
  });
});
