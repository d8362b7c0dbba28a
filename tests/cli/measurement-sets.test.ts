import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';
import { noteMessages } from '../support/notes.js';

describe('KEY=VALUE sets typed without quotes', () => {
  it('empirical C=40.00 H=6.71 O=53.29 is one measurement set, and says so', () => {
    // source: OpenStax Chemistry 2e §3.4 (glucose, CH2O), from memory
    const r = pondus(['empirical', '--json', 'C=40.00', 'H=6.71', 'O=53.29']);
    expect(r.status).toBe(0);
    const [j] = jsonLines(r.stdout);
    expect(j.empirical).toBe('CH2O');
    expect(noteMessages(j)[0]).toContain('were read as one measurement set');
  });

  it('a line of standard input with the same text as a joined set gets no joining note', () => {
    const r = jsonLines(pondus(['empirical', '--json', 'C=40.00', 'H=6.71', 'O=53.29', '-'], 'C=40.00 H=6.71 O=53.29\n').stdout);
    expect(r.map((j) => j.notes.length)).toEqual([1, 0]);
  });

  it('quoted sets stay apart; a key repeated in an unquoted run is refused as a usage error', () => {
    const two = jsonLines(pondus(['empirical', '--json', 'C=40 H=6.7 O=53.3', 'C=85.6 H=14.4']).stdout);
    expect(two.map((j) => j.empirical)).toEqual(['CH2O', 'CH2']);
    expect(two.every((j) => j.notes.length === 0)).toBe(true);
    const bad = pondus(['empirical', 'C=40', 'H=6.7', 'O=53.3', 'C=85.6', 'H=14.4']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('give C twice');
    expect(bad.stdout).toBe('');
  });

  it('units typed as separate words join their value (masses, mixtures)', () => {
    // source: OpenStax Chemistry 2e §3.4 (34.97 g Fe, 15.03 g O: Fe2O3), from memory
    expect(jsonLines(pondus(['empirical', '--json', 'Fe=34.97', 'g', 'O=15.03', 'g']).stdout)[0].empirical).toBe('Fe2O3');
    const mix = jsonLines(pondus(['composition', '--mixture', '--json', 'NaCl=5.00', 'g', 'KCl=3.00', 'g']).stdout);
    expect(mix).toHaveLength(1);
    expect(mix[0].components.map((c: { massPercentDisplay: string }) => c.massPercentDisplay)).toEqual(['62.5', '37.5']);
    expect(noteMessages(mix[0])[0]).toContain('one mixture');
    // single pairs quoted with their unit join too: a one-component 'mixture' is never meant
    const quoted = jsonLines(pondus(['composition', '--mixture', '--json', 'NaCl=5.00 g', 'KCl=3.00 g']).stdout);
    expect(quoted).toHaveLength(1);
    expect(quoted[0].components).toHaveLength(2);
  });

  it('analysis: --found C=72.30 H=7.91 N=12.60 unquoted is one set of found values', () => {
    const r = pondus(['analysis', '--json', 'C20H25N3O', '--found', 'C=72.30', 'H=7.91', 'N=12.60']);
    expect(r.status).toBe(0);
    const j = jsonLines(r.stdout);
    expect(j).toHaveLength(1);
    expect(Object.keys(j[0].found)).toEqual(['C', 'H', 'N']);
    expect(noteMessages(j[0])[0]).toContain('were read as one set of found values');
  });

  it('analysis: values after a formula are its found values; with several formulas and --found, refused', () => {
    const r = jsonLines(pondus(['analysis', '--json', 'C20H25N3O', 'C=72.30', 'H=7.91', 'N=12.60', 'C9H8O4', 'C=60.21', 'H=4.42']).stdout);
    expect(r.map((j) => j.formula)).toEqual(['C20H25N3O', 'C9H8O4']);
    expect(r[1].pass).toBe(true);
    const amb = pondus(['analysis', 'C20H25N3O', 'C6H6', '--found', 'C=72.30', 'H=7.91']);
    expect(amb.status).toBe(2);
    expect(pondus(['analysis', 'C=72.30', 'C6H6']).status).toBe(2);
  });

  it('candidates: --found C=40.00 H=6.71 unquoted is one set; found values without --found are refused', () => {
    const r = pondus(['candidates', '--json', '180.0634', '--found', 'C=40.00', 'H=6.71', '--elements', 'C0-20 H0-40 O0-10']);
    expect(r.status).toBe(0);
    const [j] = jsonLines(r.stdout);
    expect(j.input).toBe('180.0634');
    expect(j.search).toContain('found C=40.00 H=6.71');
    expect(j.candidates[0].formula).toBe('C6H12O6');
    expect(pondus(['candidates', '180.0634', 'C=40.00']).status).toBe(2);
  });
});

describe('masses typed without quotes in combustion', () => {
  it('0.1000 g --co2 … g: each unit joins its number, with a note', () => {
    // the docs example of combustion(): 1.000 g sample, 1.499 g CO2, 0.4091 g H2O gives C3H4O3
    const quoted = jsonLines(pondus(['combustion', '--json', '1.000 g', '--co2', '1.499 g', '--h2o', '0.4091 g']).stdout)[0];
    const r = pondus(['combustion', '--json', '1.000', 'g', '--co2', '1.499', 'g', '--h2o', '0.4091', 'g']);
    expect(r.status).toBe(0);
    const j = jsonLines(r.stdout)[0];
    expect(j.empirical).toBe(quoted.empirical);
    expect(j.elements).toEqual(quoted.elements);
    expect(noteMessages(j)[0]).toContain('--co2 1.499 g');
    const lone = pondus(['combustion', '1.000', 'g', 'g', '--co2', '1.499']);
    expect(lone.status).toBe(2);
  });
});

describe('oxide columns in a measurement sheet', () => {
  it('SiO2 and MgO columns are read as compound keys', () => {
    // source: ideal forsterite composition MgO 57.30 %, SiO2 42.70 % (from memory)
    const r = jsonLines(pondus(['empirical', '--json', '--sheet', '-'], 'id,SiO2,MgO\nFo,42.70,57.30\n').stdout);
    expect(r[0]).toMatchObject({ id: 'Fo', empirical: 'Mg2SiO4', hill: 'Mg2O4Si' });
  });
});

describe('option combinations: honoured, or refused with exit 2 naming the conflict', () => {
  it.each([
    [['empirical', '--sheet', '-', 'C=40 H=6.7 O=53.3'], 'not both'],
    [['empirical', '--molar-mass', 'abc', 'C=40 H=6.7 O=53.3'], '--molar-mass'],
    [['combustion', '0.1000 g'], '--co2'],
    [['combustion', '0.1000 g', '--h2o', '0.05 g'], 'CO2'],
    [['candidates', '--molar-mass', '--ppm', '3', '180.16'], '--ppm'],
    [['candidates', '--tolerance', '0.3', '180.06'], '--tolerance'],
    [['candidates', '--elements', 'C0-10 Xx1', '180.06'], 'Xx'],
    [['candidates', '--limit', '2.5', '180.06'], '--limit'],
    [['analysis', 'C6H6', '--found', 'C=92.26', '--step', '0.1'], '--step'],
    [['analysis', 'C6H6', '--found', 'C=92.26', '--top', '3'], '--top'],
    [['analysis', 'C6H6', '--found', 'C=92.26', '--solvents', 'water', '--step', '5', '--max', '2'], '--step 5 and --max 2'],
    [['analysis', '--sheet', '-', '--found', 'C=92.26'], '--found and --sheet'],
    [['composition', '--mixture', '--part', 'Na', 'NaCl=5.00 g'], '--part'],
    [['mass', '--uncertainty', '--weights', 'abridged', 'H2O'], '--uncertainty'],
    [['composition', '--rounding', 'up', 'NaCl'], 'rounding'],
    [['empirical', '--molar-mass', '190-170', 'C=40.00 H=6.71 O=53.29'], 'lower to the higher'],
    [['empirical', '--molar-mass', '0', 'C=40.00 H=6.71 O=53.29'], 'positive'],
    [['candidates', '--ppm', '5000', '180.06'], '--ppm 5000'],
    [['analysis', 'C6H6', '--found', 'C=92.26', '--tolerance', '200'], '--tolerance 200'],
  ])('%j', (args, words) => {
    const r = pondus(args as string[], 'id,formula,C\nA,C6H6,92.26\n');
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(words);
    expect(r.stdout).toBe('');
  });

  it('a sheet with a molar-mass column and --molar-mass too is refused', () => {
    const r = pondus(['empirical', '--sheet', '-', '--molar-mass', '180.16'], 'id,C,H,O,molar mass\nS1,40.00,6.71,53.29,180.16\n');
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('molar-mass column');
  });

  it('a batch line with its own found values says that --found was not used for it', () => {
    const r = jsonLines(pondus(['analysis', '--json', '--found', 'C=92.26', '-'], 'C9H8O4 C=60.21 H=4.42\nC6H6\n').stdout);
    expect(noteMessages(r[0])[0]).toContain('its own found values');
    expect(r[1].found).toEqual({ C: 92.26 });
  });

  it('--rounding half-up is honoured in composition, mass and analysis', () => {
    // 1.0 g in 8.0 g is exactly 12.5 %: two figures, 12 half-even, 13 half-up
    const mix = (rule: string) => jsonLines(pondus(['composition', '--mixture', '--json', '--rounding', rule, 'NaCl=1.0 g, KCl=7.0 g']).stdout)[0].components[0].massPercentDisplay;
    expect(mix('half-even')).toBe('12');
    expect(mix('half-up')).toBe('13');
    expect(jsonLines(pondus(['analysis', '--json', '--rounding', 'half-up', 'C6H6', '--found', 'C=92.26']).stdout)[0].rounding).toBe('half-up');
    expect(pondus(['mass', '--rounding', 'half-up', 'H2O']).status).toBe(0);
  });
});

describe('CSV and TSV carry the notes', () => {
  it('a notes column with CODE: message, joined by " | "', () => {
    const r = pondus(['empirical', '--csv', 'MgO=57.30 SiO2=42.70 O=rest']);
    const [head, row] = r.stdout.split('\n');
    expect(head).toBe('input,line,id,empirical,molecular,multiple,empiricalMass,largestResidual,alternative_1,alternative_2,alternative_3,notes,error,message');
    expect(row).toContain('BY_DIFFERENCE: O by difference: 0 %');
    expect(row).toContain(' | COMPOUND_CONVERTED: ');
    expect(row).toContain(' | DIFFERENCE_ADDED: ');
  });

  it('cautions reach every CSV row of commands that have them', () => {
    const r = pondus(['mass', '--uncertainty', '--csv', 'H2O', 'NaCl']);
    const rows = r.stdout.trim().split('\n').slice(1);
    expect(rows).toHaveLength(2);
    for (const row of rows) expect(row).toContain('CAUTION: u from the CIAAW');
  });

  it('text cells that a spreadsheet would run as a formula get an apostrophe; numbers do not', () => {
    const r = pondus(['mass', '--csv', '-'], '=1+2\n@SUM\n-H2O\n');
    const rows = r.stdout.trim().split('\n').slice(1);
    expect(rows[0].startsWith("'=1+2,")).toBe(true);
    expect(rows[1].startsWith("'@SUM,")).toBe(true);
    expect(rows[2].startsWith("'-H2O,")).toBe(true);
    // a negative deviation stays a number
    const a = pondus(['analysis', '--csv', 'C20H25N3O', '--found', 'C=72.30,H=7.91,N=12.60', '--solvents', 'water']);
    expect(a.stdout).not.toContain("'-");
  });
});
