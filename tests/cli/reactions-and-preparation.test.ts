import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus balance', () => {
  it('writes the contract JSON keys: balanced, species, coefficients', () => {
    const [j] = jsonLines(pondus(['balance', '--json', 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O']).stdout);
    expect(j).toEqual({
      line: 1,
      input: 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O',
      balanced: '5 Fe^2+ + MnO4^- + 8 H^+ → 5 Fe^3+ + Mn^2+ + 4 H2O',
      species: ['Fe^2+', 'MnO4^-', 'H^+', 'Fe^3+', 'Mn^2+', 'H2O'],
      coefficients: [5, 1, 8, 5, 1, 4],
      exactCoefficients: ['5', '1', '8', '5', '1', '4'],
      balancedAsWritten: false,
      unique: true,
      independentBalances: 1,
      basis: [],
      settledBy: 'computed',
      catalysts: [],
      notes: [],
    });
  });

  it('balances a batch with failures in place', () => {
    const r = pondus(['balance', '--json', '-'], 'H2 + O2 -> H2O\nH2 + O2\nC + O2 -> CO + CO2\n');
    expect(r.status).toBe(1);
    expect(jsonLines(r.stdout).map((o) => o.error?.code ?? o.balanced)).toEqual(['2 H2 + O2 → 2 H2O', 'BAD_EQUATION', 'NOT_UNIQUE']);
  });
});

describe('pondus react, prepare, dilute, gravimetric, basis, salt', () => {
  it('finds the limiting reagent and the yields, with the caution', () => {
    const r = pondus(['react', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--amount', 'O2=16.0 g', '--actual', 'H2O=15.0 g']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('limiting reagent: O2');
    expect(r.stdout).toContain('percent yield of H2O: 83.3 %');
    expect(r.stdout).toContain('caution: check the reagent label');
    const [j] = jsonLines(pondus(['react', '--json', 'H2 + O2 -> H2O', '--amount', 'H2=4.00 g', '--amount', 'O2=16.0 g']).stdout);
    expect(j.limiting).toBe('O2');
    expect(j.products[0]).toMatchObject({ species: 'H2O', molesDisplay: '1.00', massDisplay: '18.0' });
  });

  it('gives the mass to weigh for a solution, allowing for assay', () => {
    const r = pondus(['prepare', 'CuSO4·5H2O', '--concentration', '0.100 M', '--volume', '250.0 mL', '--purity', '98.5 %']);
    expect(r.stdout).toContain('weigh 6.337 g of CuSO4·5H2O'); // an instruction: working precision
    expect(r.stdout).toContain('caution:');
    const [j] = jsonLines(pondus(['prepare', '--json', 'NaCl', '--concentration', '5.30 M', '--volume', '0.250 L']).stdout);
    expect(j.mass).toMatchObject({ kind: 'instruction', display: '77.43 g', unit: 'g', textbookSigFigs: 3 });
    expect(j.caution).toMatch(/lab's procedures/);
    expect(pondus(['prepare', 'NaCl']).stderr).toContain('give --concentration and --volume');
  });

  it('dilutes, converts bases, and computes gravimetric and salt factors', () => {
    expect(pondus(['dilute', '1.59 M', '--to', '0.100 M', '--volume', '5.00 L']).stdout).toContain('take 314.5 mL of the stock');
    expect(pondus(['basis', 'P2O5', '--to', 'P', '--value', '12.5 %']).stdout).toContain('12.5 % P2O5 = 5.46 % P');
    expect(pondus(['gravimetric', 'Cl', '--weighed', 'AgCl', '--mass', '0.2866 g']).stdout).toContain('= 0.2474');
    const s = pondus(['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '10.0 mg']);
    expect(s.stdout).toContain('13.17 mg of the salt');
    expect(s.stdout).toContain('dosing decisions follow licensed practice');
  });
});

describe('pondus empirical, combustion, candidates', () => {
  it('writes the contract keys empirical and molecular', () => {
    const [j] = jsonLines(pondus(['empirical', '--json', 'C=40.00 H=6.71 O=53.29', '--molar-mass', '180.16']).stdout);
    expect(j).toMatchObject({ empirical: 'CH2O', molecular: 'C6H12O6' });
  });

  it('reads one measurement set per line, JSON objects too, with errors in place', () => {
    const r = pondus(['empirical', '--json', '-'], 'C=40.00 H=6.71 O=53.29\n{"Fe": "34.97 g", "O": "15.03 g"}\nC=130 H=5\n');
    expect(r.status).toBe(1);
    expect(jsonLines(r.stdout).map((o) => o.empirical ?? o.error.code)).toEqual(['CH2O', 'Fe2O3', 'BAD_MEASUREMENT']);
  });

  it('works out a combustion analysis', () => {
    const r = pondus(['combustion', '1.000 g', '--co2', '1.499 g', '--h2o', '0.4091 g']);
    expect(r.stdout).toContain('empirical formula: C3H4O3');
  });

  it('lists candidate formulas for an accurate mass', () => {
    const [j] = jsonLines(pondus(['candidates', '--json', '180.06339', '--ppm', '3']).stdout);
    expect(j.candidates[0]).toMatchObject({ formula: 'C6H12O6', rdbe: 1 });
  });
});

describe('pondus empirical --sheet', () => {
  it('gives one result per row, in order, errors in place', () => {
    const r = pondus(['empirical', '--sheet', '-', '--json'], 'id,C,H,O,molar mass\nS1,40.00,6.71,53.29,180.16\nS2,abc,1,1,\nS3,40.0,6.7,53.3,\n');
    expect(r.status).toBe(1);
    expect(jsonLines(r.stdout).map((o) => o.molecular ?? o.empirical ?? o.error.code)).toEqual(['C6H12O6', 'BAD_MEASUREMENT', 'CH2O']);
  });
});
