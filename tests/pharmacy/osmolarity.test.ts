import { describe, expect, it } from 'vitest';
import { osmolarity } from '../../src/pharmacy/osmolarity.js';
import { toSafe } from '../../src/errors/pondus-error.js';
import { messageFor } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { osmolarityJson } from '../../src/pharmacy/osmolarity-json.js';
import { jsonLines, pondus } from '../cli/run-cli.js';

const mOsm = (text: string) => displayQuantity(osmolarity(text).osmolarity, 'mM').value.toNumber();

describe('osmolarity and mEq/L of a solution', () => {
  it('0.9 % sodium chloride is about 308 mOsm/L', () => {
    // source: labelling of 0.9 % Sodium Chloride Injection USP ("308 mOsmol/L (calc)"), from memory
    expect(Math.round(mOsm('NaCl=0.9 %'))).toBe(308);
    expect(displayQuantity(osmolarity('NaCl=0.9 %').osmolarity, 'mM').figure).toBe('308.0');
  });

  it("lactated Ringer's: 273 mOsm/L, Na 130, K 4, Ca 2.7, Cl 109, lactate 28 mEq/L", () => {
    // source: labelling of Lactated Ringer's Injection USP (per 100 mL: NaCl 600 mg, sodium lactate 310 mg, KCl 30 mg,
    // CaCl2·2H2O 20 mg; 273 mOsmol/L calc; Na 130, K 4, Ca 2.7, Cl 109, lactate 28 mEq/L), from memory
    const r = osmolarity('NaCl=0.6 %, CH3CH(OH)COONa=0.31 %, KCl=0.03 %, CaCl2·2H2O=0.02 %');
    expect(Math.round(displayQuantity(r.osmolarity, 'mM').value.toNumber())).toBe(273);
    const eq = Object.fromEntries(r.ions.map((i) => [i.ion, displayQuantity(i.equivalents, 'mM').value.toNumber()]));
    expect(Math.round(eq['Na^+'])).toBe(130);
    expect(Math.round(eq['K^+'])).toBe(4);
    expect(eq['Ca^2+']).toBeCloseTo(2.7, 1);
    expect(Math.round(eq['Cl^-'])).toBe(109);
    expect(Math.round(eq['C3H5O3^-'])).toBe(28);
  });

  it('refuses a solute given twice, rather than adding the two strengths', () => {
    // 'NaCl=0.9 %, NaCl=0.45 %' was 462.0 mOsm/L with no word
    expect(() => osmolarity('NaCl=0.9 %, NaCl=0.45 %')).toThrow('NaCl is given twice');
  });

  it('says it assumes complete dissociation, and reads % as w/v', () => {
    const codes = osmolarity('NaCl=0.9 %').notes.map((n) => n.code);
    expect(codes).toContain('COMPLETE_DISSOCIATION');
    expect(codes).toContain('PERCENT_AS_W_V');
    expect(codes).toContain('NOMINAL_STRENGTH');
  });

  it('a salt giving three particles counts three (CaCl2)', () => {
    const r = osmolarity('CaCl2=1.110 g/L');
    expect(displayQuantity(r.osmolarity, 'mM').value.toNumber()).toBeCloseTo((1.11 / 110.98) * 3000, 2);
  });

  it('refuses a piece without =, naming the salt in errors from inside', () => {
    expect(() => osmolarity('NaCl 0.9 %')).toThrow(/SOLUTE=STRENGTH/);
    expect(() => osmolarity('NaCl=0.9 %, Glucose=5 %')).toThrow(/Glucose/);
    expect(() => osmolarity('')).toThrow();
  });

  it('refuses a solute it can neither split nor count as a non-electrolyte, at its column, naming the one way to work it', () => {
    // an amine hydrochloride is an electrolyte (common practice): it is not counted as one particle
    const e = toSafe(() => osmolarity('NaCl=0.9 %, C6H11NO2·HCl=1 %'));
    expect(e.success).toBe(false);
    if (e.success) return;
    expect(e.error.first.code).toBe('BAD_RECORD');
    expect(e.error.first.column).toBe(13);
    expect(messageFor(e.error.first, FLAG_NAMING)).toMatch(/^C6H11NO2·HCl: pondus cannot count it here: .*contains Cl, so it may be a salt that gives ions .*; work a salt on its own with meq and --ions$/);
    expect(messageFor(e.error.first)).toMatch(/with `milliequivalents` and `ions`$/);
  });
});

const figure = (q: Parameters<typeof displayQuantity>[0] | null) => (q === null ? null : displayQuantity(q, 'mM').figure);
const codes = (text: string) => osmolarity(text).notes.map((n) => n.code);
const failure = (text: string) => {
  const r = toSafe(() => osmolarity(text));
  if (r.success) throw new Error(`${text} was not refused`);
  return r.error.first;
};

describe('non-electrolytes: one particle per molecule, no mEq', () => {
  it('5 % dextrose (as the monohydrate) is 252 mOsm/L', () => {
    // source: labelling of 5% Dextrose Injection USP (Fresenius Kabi, DailyMed): "each 100 mL contains dextrose
    // monohydrate, 5 g ... The osmolarity is 252 mOsmol/L (calc.)"
    expect(Math.round(mOsm('C6H12O6·H2O=5 %'))).toBe(252);
    expect(figure(osmolarity('C6H12O6·H2O=5 %').osmolarity)).toBe('252.3');
  });

  it.each([
    // source: labelling of Dextrose and Sodium Chloride Injection USP (Baxter, Table 1: g/L of dextrose hydrous and
    // NaCl, osmolarity mOsmol/L calc, Na and Cl mEq/L)
    ['C6H12O6·H2O=2.5 %, NaCl=0.45 %', 280, 77],
    ['C6H12O6·H2O=5 %, NaCl=0.45 %', 406, 77],
    ['C6H12O6·H2O=5 %, NaCl=0.9 %', 560, 154],
    ['C6H12O6·H2O=10 %, NaCl=0.9 %', 813, 154],
  ])('%s: %i mOsm/L, Na and Cl %i mEq/L', (text, total, meq) => {
    const r = osmolarity(text);
    expect(Math.round(displayQuantity(r.osmolarity, 'mM').value.toNumber())).toBe(total);
    expect(r.ions.map((i) => [i.ion, Math.round(displayQuantity(i.equivalents, 'mM').value.toNumber())])).toEqual([['Na^+', meq], ['Cl^-', meq]]);
  });

  it('anhydrous C6H12O6 is counted as written (277.5 mOsm/L), with a note that a label strength is usually of the monohydrate', () => {
    // 50 g/L ÷ 180.156 g/mol (CIAAW 2021 weights) = 277.5 mmol/L, one particle each (arithmetic by hand)
    const r = osmolarity('C6H12O6=5 %, NaCl=0.45 %');
    expect(r.components.map((c) => [c.kind, c.solute, c.particles, figure(c.result.osmoles)])).toEqual([
      ['non-electrolyte', 'C6H12O6', 1, '277.5'],
      ['salt', 'NaCl', 2, '154.0'],
    ]);
    expect(figure(r.osmolarity)).toBe('431.5');
    expect(figure(r.nonElectrolyteOsmolarity)).toBe('277.5');
    expect(figure(r.saltOsmolarity)).toBe('154.0');
    const note = r.notes.find((n) => n.code === 'ANHYDROUS_DEXTROSE');
    expect(note?.message).toMatch(/^C6H12O6 is taken as written, anhydrous \(M = 180\.156 g\/mol\); .*monohydrate C6H12O6·H2O \(M = 198\.171 g\/mol\)/);
    expect(codes('C6H12O6·H2O=5 %')).not.toContain('ANHYDROUS_DEXTROSE');
    expect(codes('C6H12O6·H2O=5 %')).toContain('HYDRATE_WATER_COUNTED');
  });

  it('names the reading in a note, and only the salts give ions and mEq', () => {
    const r = osmolarity('C6H12O6·H2O=5 %, KCl=0.15 %');
    const n = r.notes.find((x) => x.code === 'NON_ELECTROLYTE');
    expect(n?.message).toMatch(/^C6H12O6·H2O counted as a non-electrolyte: 1 mOsm per mmol and no mEq .*its 1 H2O of crystallisation counted in the molar mass, not as particles/);
    expect(r.ions.map((i) => i.ion)).toEqual(['K^+', 'Cl^-']);
    expect(r.components[0].kind === 'non-electrolyte' && r.components[0].result.moles).toEqual(r.components[0].result.osmoles);
    const salt = r.components[1];
    expect(salt.kind === 'salt' && salt.salt).toBe('KCl');
  });

  it('says complete dissociation only when there is a salt', () => {
    expect(codes('C6H12O6·H2O=5 %')).not.toContain('COMPLETE_DISSOCIATION');
    expect(codes('C6H12O6·H2O=5 %')).toContain('NON_ELECTROLYTE');
    expect(osmolarity('C6H12O6·H2O=5 %').saltOsmolarity).toBeNull();
    expect(osmolarity('NaCl=0.9 %').nonElectrolyteOsmolarity).toBeNull();
    expect(osmolarity('C6H12O6·H2O=5 %, NaCl=0.9 %').notes.find((x) => x.code === 'COMPLETE_DISSOCIATION')?.message).toMatch(/of the salts .* one particle per molecule of a non-electrolyte/);
  });

  it('counts urea, mannitol, glycerol and an amino acid (a zwitterion) as one particle', () => {
    // 10 g/L over the molar mass (CIAAW 2021 weights: urea 60.056, glycine 75.067; mannitol 182.172 and glycerol
    // 92.094 g/mol), one particle each (arithmetic by hand)
    expect(figure(osmolarity('CH4N2O=1 %').osmolarity)).toBe('166.5');
    expect(figure(osmolarity('C2H5NO2=1 %').osmolarity)).toBe('133.2');
    expect(mOsm('C6H14O6=20 %')).toBeCloseTo(200_000 / 182.172, 1);
    expect(mOsm('C3H8O3=1 %')).toBeCloseTo(10_000 / 92.094, 1);
  });

  it('keeps working precision for nominal strengths and the figures of measured ones', () => {
    expect(figure(osmolarity('C6H12O6·H2O=5 %').components[0].result.osmoles)).toBe('252.3');
    expect(figure(osmolarity('C6H12O6·H2O=5.00 %', { measured: true }).osmolarity)).toBe('252');
    expect(codes('C6H12O6·H2O=5.00 %')).toContain('NOMINAL_STRENGTH');
  });

  it('refuses a % w/w strength, which needs a density', () => {
    expect(failure('C6H12O6·H2O=5 % w/w')).toMatchObject({ code: 'BAD_AMOUNT', column: 1 });
  });

  it.each([
    ['C4H4Na2O4=1 %', /contains Na, a metal, so it gives ions/],
    ['C5H11NO2S=1 %', /contains S, and pondus counts one particle per molecule only for a compound of C, H, N and O/],
    ['H2O2=1 %', /has no carbon/],
    ['C6H12O6·C3H8O3=1 %', /parts joined by '·'/],
    ['2C6H12O6=1 %', /a count in front/],
  ])('refuses %s with the reason', (text, why) => {
    const e = failure(`NaCl=0.9 %, ${text}`);
    expect(e.code).toBe('BAD_RECORD');
    expect(e.column).toBe(13);
    expect(e.message).toMatch(why);
  });
});

describe('dextrose by name', () => {
  it.each(['dextrose', 'Dextrose', 'glucose', 'D-glucose'])('refuses %s alone with both readings, at its column', (name) => {
    const e = failure(`NaCl=0.45 %, ${name}=5 %`);
    expect(e.code).toBe('AMBIGUOUS_READING');
    expect(e.column).toBe(14);
    expect(e.message).toContain("write the form you mean: 'C6H12O6·H2O=5 %' or 'C6H12O6=5 %'");
    expect(e.message).toMatch(/monohydrate .*C6H12O6·H2O.* anhydrous dextrose, C6H12O6/);
  });

  it('reads a name that says the form, with a note, and no note on the other form', () => {
    const hydrous = osmolarity('dextrose monohydrate=5 %');
    expect(figure(hydrous.osmolarity)).toBe('252.3');
    expect(hydrous.notes[0]).toEqual({ code: 'NAME_READ', message: 'dextrose monohydrate is read as dextrose monohydrate (dextrose hydrous), C6H12O6·H2O' });
    const anhydrous = osmolarity('Anhydrous  Dextrose=5 %');
    expect(figure(anhydrous.osmolarity)).toBe('277.5');
    expect(anhydrous.notes.map((n) => n.code)).not.toContain('ANHYDROUS_DEXTROSE');
    expect(anhydrous.components[0].solute).toBe('Anhydrous  Dextrose');
  });

  it('says that solutes are written as formulas for another name', () => {
    const e = failure('mannitol=20 %');
    expect(e.code).toBe('UNKNOWN_ELEMENT');
    expect(e.hint).toMatch(/write the solute as its formula/);
  });
});

describe('the solution list', () => {
  it('points at the piece itself when its text also ends an earlier one', () => {
    // 'Cl=1 %' is also the end of 'KCl=1 %'
    expect(failure('KCl=1 %, Cl=1 %').column).toBe(10);
  });

  it('a text past the limit is refused before it is read, without being quoted back', () => {
    const long = `NaCl=0.9 %, ${'ab c '.repeat(4000)}`;
    const e = failure(long);
    expect(e.code).toBe('INPUT_TOO_LONG');
    expect(e.message).toBe('the solution is 20,012 characters long; the limit is 10,000');
  });
});

describe('pondus osmolarity with non-electrolytes: the table, JSON, CSV and a batch', () => {
  const d5half = 'C6H12O6·H2O=5 %, NaCl=0.45 %';

  it('the table gives each solute its kind and the total, with the caution', () => {
    const out = pondus(['osmolarity', d5half]).stdout;
    expect(out).toContain('  C6H12O6·H2O 5 %: 252.3 mmol/L × 1 = 252.3 mOsm/L (non-electrolyte)\n  NaCl 0.45 %: 77.00 mmol/L × 2 = 154.0 mOsm/L\n  osmolarity 406.3 mOsm/L (ideal, complete dissociation of the salts)\n  mEq/L: Na^+ 77.00, Cl^- 77.00\n');
    expect(out).toContain('note: C6H12O6·H2O counted as a non-electrolyte');
    expect(out).toContain('caution: a dose, a mass to weigh or an amount to mix must be verified by the pharmacist');
    expect(pondus(['osmolarity', 'C6H12O6·H2O=5 %']).stdout).toContain('  mEq/L: none (no salt)\n');
  });

  it('JSON: each component has its kind, particles and mOsm/L, a salt its mEq and ions; the parts of the total', () => {
    const [row] = jsonLines(pondus(['osmolarity', '--json', d5half]).stdout);
    expect(row.components.map((c: { kind: string; solute: string; particles: number; mOsmPerL: { figure: string } }) => [c.kind, c.solute, c.particles, c.mOsmPerL.figure])).toEqual([
      ['non-electrolyte', 'C6H12O6·H2O', 1, '252.3'],
      ['salt', 'NaCl', 2, '154.0'],
    ]);
    expect(row.components[0]).not.toHaveProperty('ions');
    expect(row.components[0]).not.toHaveProperty('meqPerL');
    expect(row.components[1]).toMatchObject({ salt: 'NaCl', saltHill: 'ClNa', soluteHill: 'ClNa', meqPerL: { figure: '77.00', unit: 'Eq/L' } });
    expect(row.components[1].ions.map((i: { ion: string }) => i.ion)).toEqual(['Na^+', 'Cl^-']);
    expect(row.mOsmPerL.figure).toBe('406.3');
    expect(row.saltMOsmPerL.figure).toBe('154.0');
    expect(row.nonElectrolyteMOsmPerL.figure).toBe('252.3');
    expect(row.notes.map((n: { code: string }) => n.code)).toContain('NON_ELECTROLYTE');
    expect(row.caution).toMatch(/pharmacist/);
    expect(osmolarityJson(osmolarity('NaCl=0.9 %'), 'NaCl=0.9 %').nonElectrolyteMOsmPerL).toBeNull();
  });

  it('CSV: the total and its parts from salts and from non-electrolytes, the notes with the reading', () => {
    const [head, line, salt] = pondus(['osmolarity', '--csv', '-'], `${d5half}\nNaCl=0.9 %\n`).stdout.trim().split('\n');
    const cols = head.split(',');
    const cell = (l: string, c: string) => l.split(',')[cols.indexOf(c)];
    expect(cols.slice(0, 5)).toEqual(['input', 'line', 'mOsm_per_L', 'salt_mOsm_per_L', 'nonelectrolyte_mOsm_per_L']);
    // the input holds a comma, so it is quoted: count the cells from the end of the quoted input
    const after = line.slice(line.indexOf('",') + 2).split(',');
    // a number cell is the exact decimal (the README's CSV rule), the figures reported in the table and JSON's display
    expect(after[0]).toBe('1');
    expect(after.slice(1, 5).map((c) => Number(c).toPrecision(4))).toEqual(['406.3', '154.0', '252.3', '77.00']);
    expect(after.slice(1, 5).every((c) => /^[0-9]+(\.[0-9]+)?$/.test(c))).toBe(true);
    expect(line).toContain('NON_ELECTROLYTE: C6H12O6·H2O counted as a non-electrolyte');
    expect(Number(cell(salt, 'salt_mOsm_per_L')).toPrecision(4)).toBe('308.0');
    expect(cell(salt, 'nonelectrolyte_mOsm_per_L')).toBe('');
  });

  it('a batch answers every good line in order and refuses the bad ones in place', () => {
    const r = pondus(['osmolarity', '--json', '-'], 'C6H12O6·H2O=5 %\ndextrose=5 %\nC6H11NO2·HCl=1 %\nC6H12O6·H2O=5 %, NaCl=0.9 %\n');
    expect(r.status).toBe(1);
    const rows = jsonLines(r.stdout);
    expect(rows.map((x) => x.line)).toEqual([1, 2, 3, 4]);
    expect(rows.map((x) => x.error?.code ?? x.mOsmPerL.figure)).toEqual(['252.3', 'AMBIGUOUS_READING', 'BAD_RECORD', '560.3']);
    expect(rows[1].error.column).toBe(1);
  });
});

describe('an error inside one solute points at its place in the whole list', () => {
  it('a unit in the strength: the column of the unit itself, in the message, the field and the span', () => {
    const e = failure('NaCl=0.9 %, KCl=20 IU/L');
    expect(e.code).toBe('UNKNOWN_UNIT');
    expect([e.column, e.length]).toEqual([20, 4]);
    expect(e.message).toBe("KCl: the strength: unknown unit or word 'IU/L' at column 20");
  });

  it('an element in the formula: the column of the symbol', () => {
    const e = failure('NaCl=0.9 %,  KXl=20 mM');
    expect(e.code).toBe('UNKNOWN_ELEMENT');
    expect(e.column).toBe(15);
  });

  describe('strengths in milliequivalents per volume', () => {
    it('KCl 20 mEq/L is 20 mmol/L and 40 mOsm/L; CaCl2 40 mEq/L is 20 mmol/L and 60 mOsm/L', () => {
      // source: mEq = mmol × valence (total charge of the cation per formula unit), the definition used in
      // pharmaceutical calculations (Ansel's Pharmaceutical Calculations, milliequivalents chapter), from memory
      const k = osmolarity('KCl=20 mEq/L');
      expect(displayQuantity(k.osmolarity, 'mM').figure).toBe('40.00');
      expect(k.notes.map((n) => n.code)).toContain('EQUIVALENTS_STRENGTH');
      const ca = osmolarity('CaCl2=40 mEq/L');
      expect(displayQuantity(ca.osmolarity, 'mM').figure).toBe('60.00');
      const eq = Object.fromEntries(ca.ions.map((i) => [i.ion, displayQuantity(i.equivalents, 'mM').figure]));
      expect(eq).toEqual({ 'Ca^2+': '40.00', 'Cl^-': '40.00' });
    });

    it('8.4 % sodium bicarbonate and 1 mEq/mL give the same osmolarity', () => {
      // source: 8.4 % Sodium Bicarbonate Injection is labelled 1 mEq/mL (84 mg/mL; M = 84.007 g/mol), from memory
      const byPercent = displayQuantity(osmolarity('NaHCO3=8.4 %').osmolarity, 'mM').value.toNumber();
      const byEq = displayQuantity(osmolarity('NaHCO3=1 mEq/mL').osmolarity, 'mM').value.toNumber();
      expect(Math.abs(byPercent - byEq) / byEq).toBeLessThan(1e-4);
    });

    it('refuses equivalents for a non-electrolyte and per mass, naming the problem', () => {
      const dextrose = toSafe(() => osmolarity('C6H12O6=20 mEq/L'));
      expect(dextrose.success).toBe(false);
      if (!dextrose.success) {
        expect(dextrose.error.first.code).toBe('BAD_AMOUNT');
        expect(dextrose.error.first.message).toMatch(/non-electrolyte.*no ions/);
      }
      const perKg = toSafe(() => osmolarity('KCl=20 mEq/kg'));
      expect(perKg.success).toBe(false);
      if (!perKg.success) expect(perKg.error.first.message).toMatch(/per volume of solution/);
    });
  });
});

