import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { jsonLines, pondus } from './run-cli.js';
import { noteCodes } from '../support/notes.js';

const SHEET = fileURLToPath(new URL('../../examples/prep-sheet.csv', import.meta.url));
const csvRows = (text: string) => text.trim().split('\n');

describe('pondus prepare --fraction: concentrated reagents', () => {
  it('gives the molarity and a volume to take, never a mass of HCl, with the acid-to-water warning and the caution', () => {
    const r = pondus(['prepare', 'HCl', '--fraction', '37 %', '--density', '1.19 g/mL', '--concentration', '1.00 M', '--volume', '500.0 mL']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('molarity w·ρ/M = 12.08 M');
    expect(r.stdout).toContain('take 41.40 mL of the concentrated reagent');
    expect(r.stdout).not.toMatch(/weigh [0-9.]+ g of HCl/);
    expect(r.stdout).toContain('never water to the acid');
    expect(r.stdout).toContain('caution: concentrated acids and bases are corrosive');
  });

  it('JSON: input, notes as {code, message}, the volume as an instruction; CSV: the shared notes column with the caution', () => {
    const j = jsonLines(pondus(['prepare', 'H2SO4', '--fraction', '96 %', '--concentration', '0.500 M', '--volume', '1.000 L', '--json']).stdout)[0];
    expect(j).toMatchObject({ input: 'H2SO4', form: 'concentrated', densitySource: 'table', take: { kind: 'instruction', display: '27.76 mL' } });
    expect(noteCodes(j)).toEqual(expect.arrayContaining(['DENSITY_FROM_TABLE', 'ADD_ACID_TO_WATER']));
    const c = csvRows(pondus(['prepare', 'H2SO4', '--fraction', '96 %', '--concentration', '0.500 M', '--volume', '1.000 L', '--csv']).stdout);
    expect(c[0]).toBe('input,line,formula,fraction,density_g_per_mL,molarity_M,molarity,take_L,take,notes,error,message');
    expect(c[1]).toContain('ADD_ACID_TO_WATER: ');
    expect(c[1]).toContain('CAUTION: concentrated acids');
  });

  it('options of a solid do not go with --fraction (exit 2)', () => {
    expect(pondus(['prepare', 'HCl', '--fraction', '37 %', '--purity', '99 %']).status).toBe(2);
    expect(pondus(['prepare', 'HCl', '--density', '1.19 g/mL', '--concentration', '1 M', '--volume', '1 L']).status).toBe(2);
  });
});

describe('pondus dilute --series and --mass', () => {
  it('plans 1:1000 as steps with no transfer below 100 µL', () => {
    const r = pondus(['dilute', '1000. µg/mL', '--to', '1.000 µg/mL', '--volume', '10.00 mL', '--series']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('1. 1:100: take 100.0 µL of the stock');
    expect(r.stdout).toContain('2. 1:10: take 1.000 mL of solution 1');
    const j = jsonLines(pondus(['dilute', '1:1000', '--series', '--volume', '10.00 mL', '--json']).stdout)[0];
    expect(j.input).toBe('1:1000');
    expect(j.steps.map((s: { factor: number }) => s.factor)).toEqual([100, 10]);
    expect(Array.isArray(j.notes)).toBe(true);
  });

  it('dilutes an ointment by mass, and refuses plan options without --series', () => {
    const r = pondus(['dilute', '10. % w/w', '--to', '2.5 % w/w', '--mass', '60.0 g', '--json']);
    expect(jsonLines(r.stdout)[0]).toMatchObject({ input: '10. % w/w', take: { display: '15.00 g' }, diluent: { display: '45.00 g' } });
    expect(pondus(['dilute', '1.00 M', '--to', '0.100 M', '--volume', '100.0 mL', '--min-transfer', '200 µL']).status).toBe(2);
    expect(pondus(['dilute', '10 %', '--to', '2 %', '--mass', '50 g', '--volume', '50 mL']).status).toBe(2);
  });

  it('one-step dilute names its input `input` (not stock) in JSON and CSV', () => {
    const j = jsonLines(pondus(['dilute', '1.00 M', '--to', '0.100 M', '--volume', '250.0 mL', '--json']).stdout)[0];
    expect(j.input).toBe('1.00 M');
    expect(j).not.toHaveProperty('stock');
    expect(csvRows(pondus(['dilute', '1.00 M', '--to', '0.100 M', '--volume', '250.0 mL', '--csv']).stdout)[0].startsWith('input,')).toBe(true);
  });
});

describe('pondus salt: metal salts of acidic drugs', () => {
  it('naproxen sodium and atorvastatin calcium trihydrate', () => {
    const a = pondus(['salt', 'C14H13NaO3', '--parent', 'C14H14O3', '--dose', '200. mg']);
    expect(a.stdout).toContain('200. mg of parent is carried by 219.1 mg of the salt');
    expect(a.stdout).toContain('read as the sodium salt of C14H14O3');
    expect(a.stdout).toContain('verified by the pharmacist');
    const b = jsonLines(pondus(['salt', '(C33H34FN2O5)2Ca·3H2O', '--parent', 'C33H35FN2O5', '--json']).stdout)[0];
    expect(b).toMatchObject({ form: 'metal', metalSalt: { metal: 'Ca', water: '3' } });
  });
});

describe('pondus potency and strength', () => {
  it('potency on the anhydrous basis over 100 %, and the mass to weigh', () => {
    const r = pondus(['potency', '101.2 %', '--basis', 'anhydrous', '--water', '4.8 %', '--need', '250.0 mg']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('96.3 % as is');
    expect(r.stdout).toContain('weigh 0.2595 g'); // 250.0 mg ÷ (1.012 × 0.952)
    expect(pondus(['potency', '101.2 %']).status).toBe(1);
    expect(pondus(['potency', '99 %', '--water', '1 %']).status).toBe(2);
  });

  it('ratio strengths and the other forms, one flat CSV column each', () => {
    const r = pondus(['strength', '1:1000', '0.02 % w/v', '--csv']);
    const [head, a, b] = csvRows(r.stdout);
    expect(head).toBe('input,line,kind,ratio,percent_w_per_v,mg_per_mL,mg_per_dL,percent_w_per_w,mg_per_g,mg_per_kg,percent_v_per_v,g_per_L,notes,error,message');
    expect(a.startsWith('1:1000,1,w/v,1:1000,0.1,1,100,')).toBe(true);
    expect(b.startsWith('0.02 % w/v,2,w/v,1:5000,0.02,0.2,20,')).toBe(true);
  });
});

describe('pondus prepare --sheet', () => {
  it('--weights abridged reaches the sheet and one reagent alike, with its note', () => {
    // source: CIAAW 2021 abridged table: Na 22.990, Cl 35.45; 0.1000 M × 0.2500 L × 58.44 g/mol = 1.461 g
    const one = jsonLines(pondus(['prepare', 'NaCl', '--concentration', '0.1000 M', '--volume', '250.0 mL', '--weights', 'abridged', '--json']).stdout)[0];
    expect(one.mass.display).toBe('1.461 g');
    expect(noteCodes(one)).toContain('WEIGHTS_ABRIDGED');
    const sheet = jsonLines(pondus(['prepare', '--sheet', SHEET, '--weights', 'abridged', '--json']).stdout);
    expect(sheet.every((r) => noteCodes(r).includes('WEIGHTS_ABRIDGED'))).toBe(true);
  });

  it('gives one printable instruction per row, in order, with the concentration made', () => {
    const r = pondus(['prepare', '--sheet', SHEET]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('weigh 6.337 g of CuSO4·5H2O (copper(II) sulfate; assay 98.5 %)');
    expect(r.stdout).toContain('take 41.40 mL of 37 % HCl (hydrochloric acid; d 1.19 g/mL)');
    expect(r.stdout).toContain('made: 2.0437 g weighed gives 0.1000 M');
  });

  it('a hydrate row names the form to weigh first; a concentrated grade with no density takes the table density, as prepare does', () => {
    // 'weigh 7.153 g of Na2CO3 (Na2CO3·10H2O)' could be read as 7.153 g of the anhydrous salt (0.270 M, not 0.1000 M)
    const sheet = 'id,reagent,form,purity,density,target,volume\nA,Na2CO3,Na2CO3·10H2O,,,0.1000 M,250.0 mL\nB,hydrochloric acid,HCl,37 %,,1.000 M,500.0 mL\n';
    const r = pondus(['prepare', '--sheet', '-'], sheet);
    expect(r.status, r.stderr).toBe(0);
    // worked by hand: 0.1000 mol/L × 0.2500 L × 286.14 g/mol = 7.153 g of the decahydrate
    expect(r.stdout).toContain('weigh 7.153 g of Na2CO3·10H2O (Na2CO3), dissolve');
    // the same as prepare HCl --fraction '37 %': 41.40 mL, with the table's density named
    expect(r.stdout).toContain('take 41.40 mL of 37 % HCl (hydrochloric acid; d 1.19 g/mL, from the table of common grades)');
    expect(r.stdout).toContain('density 1.19 g/mL for 37 % hydrochloric acid');
  });

  it('each row matches prepare for the same reagent, purity, target and volume', () => {
    const rows = jsonLines(pondus(['prepare', '--sheet', SHEET, '--json']).stdout);
    const lines = readFileSync(SHEET, 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
    expect(rows).toHaveLength(lines.length);
    rows.forEach((row, i) => {
      const [, , form, purity, density, target, volume] = lines[i];
      const args = density
        ? ['prepare', form, '--fraction', purity, '--density', density, '--concentration', target, '--volume', volume, '--json']
        : ['prepare', form, '--concentration', target, '--volume', volume, ...(purity ? ['--purity', purity] : []), '--json'];
      const direct = jsonLines(pondus(args).stdout)[0];
      const amount = density ? direct.take : direct.mass;
      expect(row.amount).toEqual(amount);
      expect(row.notes.filter((n: { code: string }) => n.code !== 'MADE_FROM_WEIGHED' && n.code !== 'MADE_FROM_TAKEN')).toEqual(direct.notes);
    });
  });

  it('a bad row fails alone; the others keep their results', () => {
    const r = pondus(['prepare', '--sheet', '-', '--json'], 'reagent,target,volume\nNaCl,0.100 M,250.0 mL\nNaCl,,250.0 mL\nKCl,0.200 M,100.0 mL\n');
    expect(r.status).toBe(1);
    const rows = jsonLines(r.stdout);
    expect(rows).toHaveLength(3);
    expect(rows[1].line).toBe(3); // the line in the sheet
    expect(rows[1].error.code).toBe('BAD_RECORD');
    expect(rows[2].amount.display).toBe('1.491 g');
    expect(pondus(['prepare', '--sheet', SHEET, '--volume', '1 L']).status).toBe(2);
  });
});
