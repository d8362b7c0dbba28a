/**
 * Bench preparation as a chemist uses it: every option honoured or refused as a
 * usage error naming the conflict, instructions at working precision, results
 * with textbook figures, and warnings as notes with codes.
 */
import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

const codes = (j: { notes: { code: string }[] }) => j.notes.map((n) => n.code);

describe('options are never silently ignored', () => {
  it('--replace with --purity: the assay of the form weighed (12.28 g, not 12.04 g)', () => {
    // 24.65 g MgSO4·7H2O ÷ 246.47 g/mol × 120.36 g/mol = 12.04 g of pure MgSO4; ÷ 0.980 = 12.28 g
    const r = pondus(['prepare', 'MgSO4', '--replace', 'MgSO4·7H2O=24.65 g', '--purity', '98.0 %']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('weigh 12.28 g of MgSO4');
    expect(r.stdout).toContain('the assay 98.0 % is read as that of MgSO4, the form weighed');
  });

  it.each([
    [['--concentration', '0.1 M'], '--concentration'],
    [['--volume', '250 mL'], '--volume'],
    [['--as', 'Mg'], '--as'],
    [['--weighed', '12.28 g'], '--weighed'],
    [['--purity', '98.0 %', '--purity-basis', 'reagent'], '--purity-basis'],
  ])('--replace with %j is a usage error naming %s', (extra, named) => {
    const r = pondus(['prepare', 'MgSO4', '--replace', 'MgSO4·7H2O=24.65 g', ...extra]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`--replace cannot be combined with ${named}`);
    expect(r.stdout).toBe('');
  });

  it.each([
    [['dilute', '1.00 M', '--to', '0.100 M', '--to', '0.200 M', '--volume', '250.0 mL'], '--to'],
    [['dilute', '1.00 M', '--to', '0.100 M', '--volume', '250.0 mL', '--volume', '100.0 mL'], '--volume'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--concentration', '0.2 M', '--volume', '1.000 L'], '--concentration'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1.000 L', '--purity', '99 %', '--purity', '98 %'], '--purity'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1.000 L', '--rounding', 'half-up', '--rounding', 'half-even'], '--rounding'],
    [['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '10 mg', '--dose', '20 mg'], '--dose'],
    [['basis', 'K', '--to', 'K2O', '--to', 'P2O5'], '--to'],
    [['gravimetric', 'Cl', '--weighed', 'AgCl', '--mass', '0.2866 g', '--mass', '0.3000 g'], '--mass'],
    [['react', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--actual', 'H2O=15.0 g', '--actual', 'H2O=16.0 g'], '--actual'],
    [['calc', '1.00 g * 2', '--rounding', 'half-up', '--rounding', 'half-up'], '--rounding'],
  ])('a repeated single-value option is refused: %j', (args, flag) => {
    const r = pondus(args);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(`${flag} is given twice`);
  });

  it('calc --explain with --json gives the steps in JSON', () => {
    const [j] = jsonLines(pondus(['calc', '--json', '--explain', '2.45 g * 1.000']).stdout);
    expect(j.steps[0].rule).toContain('fewest significant figures: 3');
    expect(j.rounding).toBe('half-even');
  });

  it('--amount of react may be repeated: one per reactant', () => {
    expect(pondus(['react', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--amount', 'O2=16.0 g']).status).toBe(0);
  });

  it.each([
    [['prepare', 'NaCl'], 'give --concentration and --volume'],
    [['prepare', 'NaCl', '--concentration', '0.1 M'], 'give --concentration and --volume'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1 L', '--purity-basis', 'part'], '--purity-basis needs --purity'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1 L', '--purity', '99 %', '--purity-basis', 'part'], '--purity-basis part needs --as'],
    [['prepare', 'MgSO4', '--replace', 'MgSO4·7H2O'], '--replace takes FORM=AMOUNT'],
    [['dilute', '1.00 M', '--to', '0.100 M'], 'give --to'],
    [['dilute', '1.00 M', '--volume', '250.0 mL'], 'give --to'],
    [['gravimetric', 'Cl'], 'give the formula of the weighed form'],
    [['gravimetric', 'Cl', '--weighed', 'AgCl', '--sample', '1.000 g'], '--sample needs --mass'],
    [['basis', 'K'], 'give the basis to convert to'],
    [['salt', 'C17H19NO3·HCl·3H2O'], 'give the formula of the parent compound'],
    [['react', 'H2 + O2 -> H2O', '--actual', 'H2O=15.0 g'], 'give the amount of at least one reactant'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1 L', '--json', '--csv'], 'choose one output format'],
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '1 L', '--rounding', 'up'], "Allowed choices are half-even, half-up"],
    [['react', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--amount', 'H2=5.00 g'], '--amount gives H2 twice'],
    [['calc', '2.45 g * 1.000', '--explain', '--csv'], '--explain cannot be combined with --csv or --tsv'],
  ])('%j is a usage error: %s', (args, message) => {
    const r = pondus(args);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain(message);
  });

  it('a potency as base with --as is not corrected twice (49.88 mg, not 62.20 mg)', () => {
    const args = ['prepare', 'C18H19N3O·HCl·2H2O', '--concentration', '2.00 mg/mL', '--volume', '20.0 mL', '--as', 'C18H19N3O', '--purity', '80.2 %'];
    const ambiguous = pondus(args);
    expect(ambiguous.status).toBe(1);
    expect(ambiguous.stderr).toContain('AMBIGUOUS_PURITY');
    expect(ambiguous.stderr).toContain('weigh 62.20 mg');
    expect(ambiguous.stderr).toContain('weigh 49.88 mg');
    expect(pondus([...args, '--purity-basis', 'part']).stdout).toContain('weigh 49.88 mg of C18H19N3O·HCl·2H2O');
    expect(pondus([...args, '--purity-basis', 'reagent']).stdout).toContain('weigh 62.20 mg of C18H19N3O·HCl·2H2O');
  });
});

describe('instructions at working precision, results with textbook figures', () => {
  it.each([
    // the table; the 334 mL it gives is 3 figures, 334.4 mL is the same rule (4 figures) applied consistently
    [['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '250 mL'], 'weigh 1.461 g of NaCl'],
    [['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '10 mg'], 'carried by 13.17 mg of the salt'],
    [['dilute', '99 %', '--to', '70 %', '--volume', '473 mL'], 'take 334.4 mL of the stock'],
    [['prepare', 'CuSO4·5H2O', '--concentration', '1000 ppm', '--volume', '1.000 L', '--as', 'Cu'], 'weigh 3.929 g of CuSO4·5H2O'],
  ])('%j says %s, with a note on the target’s figures', (args, says) => {
    const r = pondus(args);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain(says);
    expect(r.stdout).toMatch(/has 1 significant figure.*working precision \(4 significant figures\)/);
  });

  it('JSON carries the instruction and the unrounded value, clearly named', () => {
    const [j] = jsonLines(pondus(['prepare', '--json', 'NaCl', '--concentration', '0.1 M', '--volume', '250 mL']).stdout);
    expect(j.mass).toEqual({ kind: 'instruction', value: 1.460994232, unit: 'g', display: '1.461 g', sigFigs: 4, textbookSigFigs: 1, figure: '1.461', displayUnit: 'g' });
    expect(codes(j)).toEqual(['MEASUREMENT', 'WORKING_PRECISION']);
    expect(j.caution).toMatch(/lab's procedures/);
  });

  it('--weighed gives the concentration made, a result with the figures of the measurements', () => {
    const r = pondus(['prepare', 'NaCl', '--concentration', '0.1 M', '--volume', '250.0 mL', '--weighed', '1.4587 g']);
    expect(r.stdout).toContain('weigh 1.461 g of NaCl');
    expect(r.stdout).toContain('made: 1.4587 g of NaCl in 250.0 mL gives 0.09984 M');
    expect(r.stdout).toContain('caution:');
    const [j] = jsonLines(pondus(['prepare', '--json', 'CH3CO2H', '--volume', '0.500 L', '--weighed', '25.2 g']).stdout);
    // source: OpenStax Chemistry 2e §3.3, vinegar: 25.2 g acetic acid in 0.500 L is 0.839 M (from memory)
    expect(j.made).toMatchObject({ kind: 'result', display: '0.839 M', sigFigs: 3, unit: 'M' });
    expect(j.mass).toBeNull();
  });

  it('--taken gives the concentration made by a dilution', () => {
    // source: OpenStax Chemistry 2e §3.3, 0.850 L of 5.00 M Cu(NO3)2 diluted to 1.80 L is 2.36 M (from memory)
    const r = pondus(['dilute', '5.00 M', '--volume', '1.80 L', '--taken', '0.850 L']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('gives 2.36 M');
  });

  it('salt and basis get the note on ambiguous trailing zeros', () => {
    expect(pondus(['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '100 mg']).stdout).toContain('the trailing zeros of 100 are read as not significant');
    expect(pondus(['basis', 'P2O5', '--to', 'P', '--value', '1300 ppm']).stdout).toContain('the trailing zeros of 1300 are read as not significant');
    const [j] = jsonLines(pondus(['salt', '--json', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '100 mg']).stdout);
    expect(codes(j)).toContain('MEASUREMENT');
    expect(j.saltMass).toMatchObject({ kind: 'instruction', display: '131.7 mg' });
  });
});

describe('--rounding on every command that rounds', () => {
  it('an instruction: 1.2345 mL to take rounds half-even to 1.234 mL, half-up to 1.235 mL', () => {
    // 1.00 M × 2.469 mL / 2.00 M = 1.2345 mL, a tie at the fourth figure
    const args = ['dilute', '2.00 M', '--to', '1.00 M', '--volume', '2.469 mL'];
    expect(pondus(args).stdout).toContain('take 1.234 mL');
    expect(pondus([...args, '--rounding', 'half-even']).stdout).toContain('take 1.234 mL');
    expect(pondus([...args, '--rounding', 'half-up']).stdout).toContain('take 1.235 mL');
  });

  it('a result: 0.1225 M made to 3 figures is 0.122 M half-even, 0.123 M half-up', () => {
    const args = ['dilute', '1.00 M', '--volume', '10.000 mL', '--taken', '1.2250 mL'];
    expect(pondus(args).stdout).toContain('gives 0.122 M');
    expect(pondus([...args, '--rounding', 'half-up']).stdout).toContain('gives 0.123 M');
  });

  it.each([
    ['prepare', 'NaCl', '--concentration', '0.100 M', '--volume', '1.000 L'],
    ['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '10.0 mg'],
    ['basis', 'K', '--to', 'K2O', '--value', '8.30 %'],
    ['gravimetric', 'Cl', '--weighed', 'AgCl', '--mass', '0.2866 g'],
    ['react', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g'],
    ['calc', '2.45 g * 1.000'],
  ])('%s takes --rounding half-up', (...args) => {
    expect(pondus([...args, '--rounding', 'half-up']).status).toBe(0);
  });
});

describe('warnings where material would be wasted', () => {
  it('a mass too small to weigh points to a stock solution', () => {
    // 2.70 µmol/L × 0.1000 L × 58.44 g/mol = 1.578 × 10⁻⁵ g
    const [j] = jsonLines(pondus(['prepare', '--json', 'NaCl', '--concentration', '2.70 µM', '--volume', '100.0 mL']).stdout);
    expect(j.mass.display).toBe('15.78 µg');
    const w = j.notes.find((n: { code: string }) => n.code === 'MASS_TOO_SMALL');
    expect(w.message).toMatch(/below 10 mg.*stock solution/);
  });

  it('a 1:1000 one-step dilution needing 50 µL points to serial dilution', () => {
    const r = pondus(['dilute', '1.00 M', '--to', '1.00 mM', '--volume', '50.0 mL']);
    expect(r.stdout).toContain('take 50.00 µL of the stock');
    expect(r.stdout).toMatch(/serial dilution/);
    const [j] = jsonLines(pondus(['dilute', '--json', '1.00 M', '--to', '1.00 mM', '--volume', '50.0 mL']).stdout);
    expect(codes(j)).toContain('SERIAL_DILUTION');
  });

  it.each([
    [['gravimetric', '--json', 'Cl', '--weighed', 'AgCl', '--mass', '0.5000 g', '--sample', '0.1000 g'], 'RESULT_OVER_100'],
    [['basis', '--json', 'K', '--to', 'K2O', '--value', '90.0 %'], 'RESULT_OVER_100'],
    [['react', '--json', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--amount', 'O2=16.0 g', '--actual', 'H2O=19.0 g'], 'YIELD_OVER_100'],
  ])('a result over 100 %% is computed with a warning: %j', (args, code) => {
    const r = pondus(args);
    expect(r.status).toBe(0);
    expect(codes(jsonLines(r.stdout)[0])).toContain(code);
  });
});
