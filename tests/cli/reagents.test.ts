import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { noteCodes, noteMessages } from '../support/notes.js';
import { jsonLines, pondus } from './run-cli.js';

const example = 'examples/organolithium-coupling.csv';

const fromOptions = [
  'reagents',
  '--reference', '4-bromoanisole=1.25 mL, purity=99.0 %, density=1.494 g/mL',
  '--reagent', 'n-BuLi=1.20 equiv, solution=1.6 M in hexanes',
  '--catalyst', 'Pd(PPh3)4=5.0 mol %',
  '--additive', 'PPh3=10 mol %, purity=99 %',
  '--product', '4-butylanisole, formula=C11H16O',
  '--equation', 'C7H7BrO + C4H9Li -> C11H16O + LiBr',
  '--concentration', '0.20 M', '--solvent', 'toluene',
  '--actual', '1.21 g',
];

describe('pondus reagents', () => {
  it('prints the table with the columns a notebook needs, the notes and the cautions', () => {
    const r = pondus(['reagents', '--procedure', example]);
    expect(r.status).toBe(0);
    const head = r.stdout.split('\n')[1];
    for (const h of ['reagent', 'formula', 'M g/mol', 'equiv', 'n mmol', 'mass', 'volume', 'notes']) expect(head).toContain(h);
    // 1.25 mL × 1.494 g/mL × 0.990 ÷ 187.04 g/mol = 9.88 mmol; × 1.20 ÷ 1.6 M = 7.414 mL
    expect(r.stdout).toMatch(/n-BuLi .*11\.86 .* 7\.414 mL/);
    expect(r.stdout).toMatch(/toluene .* 49\.42 mL/);
    expect(r.stdout).toMatch(/4-butylanisole .* 1\.62 g .*yield 74\.5 %/);
    expect(r.stdout).toContain('caution: n-BuLi is pyrophoric: titrate the solution before use');
    expect(r.stdout).toContain("follow your lab's procedures and risk assessment");
    expect(r.stdout).toContain('Pd(PPh3)4 is a catalyst: shown in the table, left out of the stoichiometry');
  });

  it('writes one JSON line per row, with input and notes, the same from options as from the file', () => {
    const a = jsonLines(pondus(['reagents', '--procedure', example, '--json']).stdout);
    const b = jsonLines(pondus([...fromOptions, '--json']).stdout);
    expect(a.map((o) => o.role)).toEqual(['reference', 'reagent', 'catalyst', 'additive', 'solvent', 'product']);
    for (const o of a) {
      expect(typeof o.input).toBe('string');
      expect(Array.isArray(o.notes)).toBe(true);
      expect(o.caution).toMatch(/risk assessment/);
    }
    expect(a[1]).toMatchObject({ reagent: 'n-BuLi', formula: 'C4H9Li', equiv: 1.2, volume: { kind: 'instruction', display: '7.414 mL' }, hazard: 'pyrophoric' });
    expect(noteCodes(a[1])).toContain('CAUTION');
    expect(a[5].percentYield).toMatchObject({ kind: 'result', figure: '74.5' });
    const strip = (rows: Record<string, unknown>[]) => rows.map(({ input: _i, line: _l, ...rest }) => rest);
    expect(strip(b)).toEqual(strip(a));
  });

  it('reads its own CSV back as the same table', () => {
    const first = pondus(['reagents', '--procedure', example, '--csv']);
    expect(first.status).toBe(0);
    const second = pondus(['reagents', '--procedure', '-', '--csv'], first.stdout);
    expect(second.status).toBe(0);
    const rows = (text: string) => (parse(text, { columns: true }) as Record<string, string>[]).map(({ input: _i, line: _l, ...rest }) => rest); // the line is where each row stands in its own file
    expect(rows(second.stdout)).toEqual(rows(first.stdout));
    const header = first.stdout.split('\n')[0];
    expect(header).toBe('input,line,role,reagent,formula,amount,purity,density,solution,form,actual,equation,name,hill_formula,M_g_per_mol,equiv,n_mmol,mass,mass_unit,volume,volume_unit,percent_yield,notes,error,message');
    expect(rows(second.stdout).at(-1)).toMatchObject({ role: 'product', equation: 'C7H7BrO + C4H9Li -> C11H16O + LiBr', mass: '1.62', percent_yield: '74.5' });
  });

  it('writes a Markdown table for electronic notebooks', () => {
    const r = pondus(['reagents', '--procedure', example, '--markdown']);
    const lines = r.stdout.split('\n');
    expect(lines[0]).toBe('| reagent | formula | M g/mol | equiv | n mmol | mass | volume | notes |');
    expect(lines[1]).toBe('| --- | --- | ---: | ---: | ---: | ---: | ---: | --- |');
    expect(lines.slice(2, 8).every((l) => l.startsWith('| '))).toBe(true);
    expect(lines[8]).toBe(''); // a blank line ends the table before the notes
  });

  it('refuses a missing reference or conflicting options (exit 2), and reports a bad row in place (exit 1)', () => {
    expect(pondus(['reagents', '--reagent', 'Ac2O=1 equiv']).status).toBe(2);
    // an amount obtained with no product row would be dropped
    const noProduct = pondus(['reagents', '--reference', 'C6H5Br=5.00 mmol', '--reagent', 'C4H9Li=1.1 equiv', '--actual', '0.5 g']);
    expect(noProduct.status).toBe(2);
    // one usage message, not a refusal on every row
    expect(noProduct.stderr.trim().split('\n')).toEqual(['pondus: the amount obtained (0.5 g) is of a product: give the product row with --product']);
    expect(pondus(['reagents', '--procedure', example, '--markdown', '--json']).status).toBe(2);
    expect(pondus(['reagents', '--procedure', example, '--reference', 'C7H6O3=2.00 g']).status).toBe(2);
    const r = pondus(['reagents', '--reference', 'C7H6O3=2.00 g', '--reagent', 'Ac2O=1.5 equiv, colour=red', '--reagent', 'Et3N=2.0 equiv, density=0.726 g/mL', '--json']);
    expect(r.status).toBe(1);
    const rows = jsonLines(r.stdout);
    expect(rows).toHaveLength(3);
    expect(rows[1].error.code).toBe('BAD_RECORD');
    // triethylamine, d 0.726 g/mL (CRC Handbook of Chemistry and Physics, from memory): 28.96 mmol × 101.19 g/mol ÷ 0.726 g/mL
    expect(rows[2].volume.display).toBe('4.037 mL');
  });

  it('hostile rows get a clear error in place, never an internal error', () => {
    const hostile = ['__proto__=1 g', 'C7H6O3=1e999 g', 'C7H6O3=', '=2 g', 'C7H6O3=2 g, density=__proto__', 'C7H6O3=2 g, solution=1.6 M in', 'C7H6O3=2 g, purity=0 %', 'C7H6O3\u0007=2 g', 'C((((((((((H=2 g', 'C7H6O3=2 g, solution=5 % w/v', 'C7H6O3=2 g, density=-1 g/mL', 'C7H6O3=2 g, density=3 M'];
    for (const ref of hostile) {
      const r = pondus(['reagents', '--reference', ref, '--reagent', 'Ac2O=1e7 equiv', '--json']);
      expect(r.status).toBe(1);
      const rows = jsonLines(r.stdout);
      expect(rows).toHaveLength(2);
      for (const row of rows) expect(row.error.code).not.toBe('INTERNAL_ERROR');
    }
  });

  it('the example procedure file is a valid procedure', () => {
    expect(readFileSync(example, 'utf8').split('\n')[0]).toBe('role,reagent,formula,amount,purity,density,solution,form,actual');
  });
});

describe('balance and react, as written', () => {
  it('the aspirin synthesis in both spellings says balanced as written and not unique from atoms alone', () => {
    for (const e of ['C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', '1 C7H6O3 + 1 C4H6O3 -> 1 C9H8O4 + 1 C2H4O2']) {
      const r = pondus(['balance', '--json', e]);
      expect(r.status).toBe(0);
      const [j] = jsonLines(r.stdout);
      expect(j).toMatchObject({ balanced: 'C7H6O3 + C4H6O3 → C9H8O4 + C2H4O2', coefficients: [1, 1, 1, 1], balancedAsWritten: true, unique: false });
      expect(noteMessages(j).join(' ')).toContain('not unique from atoms alone');
    }
  });

  it('the peracetylation balances as written; --fix settles an equation written without coefficients', () => {
    const [j] = jsonLines(pondus(['balance', '--json', 'C6H12O6 + 5 C4H6O3 -> C16H22O11 + 5 C2H4O2']).stdout);
    expect(j).toMatchObject({ coefficients: [1, 5, 1, 5], balancedAsWritten: true, unique: false });
    const plain = pondus(['balance', 'C6H12O6 + C4H6O3 -> C16H22O11 + C2H4O2']);
    expect(plain.status).toBe(1);
    expect(plain.stderr).toContain('more than one independent balance');
    const fixed = pondus(['balance', '--json', 'C6H12O6 + C4H6O3 -> C16H22O11 + C2H4O2', '--fix', 'C6H12O6=1', '--fix', 'C4H6O3=5']);
    expect(jsonLines(fixed.stdout)[0]).toMatchObject({ coefficients: [1, 5, 1, 5], settledBy: 'fixed' });
  });

  it('react reads equivalents and densities', () => {
    const r = pondus(['react', '--json', 'C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', '--amount', 'C7H6O3=2.00 g', '--amount', 'C4H6O3=5.00 mL, density=1.08 g/mL', '--actual', 'C9H8O4=2.10 g']);
    expect(r.status).toBe(0);
    const [j] = jsonLines(r.stdout);
    expect(j).toMatchObject({ limiting: 'C7H6O3', balancedAsWritten: true, unique: false });
    expect(j.products[0]).toMatchObject({ species: 'C9H8O4', massDisplay: '2.61' });
    expect(j.percentYield.display).toBe('80.5');
  });
});
