import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { hintFor } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { ABBREVIATIONS, ABBREVIATION_CLASHES, SAFE_ABBREVIATIONS, readsAsElements } from '../../src/formula-parser/abbreviations.js';
import { formulaReadings } from '../../src/formula-parser/hints.js';
import { parseFormula, safeParseFormula, type ParseOptions } from '../../src/formula-parser/parse.js';
import { formulaMass } from '../../src/mass/formula-mass.js';
import { isElementSymbol } from '../../src/elements/element-table.js';
import { flattenFormula } from '../../src/formula/flatten.js';
import { hillFormula } from '../../src/formula/hill.js';

const hill = (s: string, o: ParseOptions = {}) => {
  const t = parseFormula(s, o);
  return hillFormula(flattenFormula(t), t.charge);
};

function refusal(input: string, options: ParseOptions = {}) {
  try {
    parseFormula(input, options);
  } catch (e) {
    if (e instanceof PondusError) return e.first;
    throw e;
  }
  throw new Error(`expected ${input} to be refused`);
}

const codes = (s: string, o: ParseOptions = {}) => parseFormula(s, o).notes.map((n) => n.code);

describe('hydrate multipliers after the addition dot', () => {
  it('reads a decimal multiplier after a dot as written', () => {
    // calcium sulfate hemihydrate, CaSO4·0.5H2O (common practice)
    expect(hill('CaSO4.0.5H2O')).toBe('CaHO4.5S');
    expect(parseFormula('CaSO4.0.5H2O').notes.map((n) => n.message)).toEqual(["'.' at column 6 is read as the addition dot: CaSO4·0.5H2O"]);
    expect(hill('CaSO4·0.5H2O')).toBe('CaHO4.5S');
    expect(hill('CaSO4.1.5H2O')).toBe('CaH3O5.5S');
  });

  it('reads fractions, in ASCII or as Unicode vulgar fractions, exactly', () => {
    for (const f of ['CaSO4·½H2O', 'CaSO4·1/2H2O', 'CaSO4.1/2H2O', 'CaSO4.½H2O', 'CaSO4*1/2H2O']) expect(hill(f), f).toBe('CaHO4.5S');
    expect(hill('CaSO4·¼H2O')).toBe('CaH0.5O4.25S');
    expect(hill('CaSO4·¾H2O')).toBe('CaH1.5O4.75S');
    expect(hill('Na2CO3·3/2H2O2')).toBe('CH3Na2O6');
    expect(hill('2Na2CO3·3H2O2')).toBe('C2H6Na4O12');
    expect(hill('MgSO4·⅛H2O')).toBe('H0.25MgO4.125S');
    expect(hill('CaSO4·2/2H2O')).toBe('CaH2O5S');
  });

  it('refuses thirds and other fractions with no exact decimal, saying what to write', () => {
    const i = refusal('CaSO4·⅓H2O');
    expect(i.code).toBe('INEXACT_FRACTION');
    expect(i.hint).toContain('3CaSO4·H2O');
    expect(refusal('2CaSO4·2/3H2O').hint).toContain('6CaSO4·2H2O');
    expect(refusal('CaSO4·1/0H2O').code).toBe('BAD_COUNT');
    expect(refusal('CaSO4·0/2H2O').code).toBe('BAD_COUNT');
  });

  it('keeps the CuSO4.5H2O shorthand, naming the reading', () => {
    expect(hill('CuSO4.5H2O')).toBe('CuH10O9S');
    expect(parseFormula('CuSO4.5H2O').notes.map((n) => n.message)).toEqual(["'.' at column 6 is read as the addition dot: CuSO4·5H2O (not a count of 4.5)"]);
    expect(hill('Na2CO3.10H2O')).toBe('CH20Na2O13');
    expect(hill('AlCl3.6NH3')).toBe('AlCl3H18N6');
  });

  it('refuses a dot that could as well be a decimal point, offering both readings', () => {
    const i = refusal('Fe2.5O');
    expect(i.code).toBe('AMBIGUOUS_READING');
    expect(i.message).toContain('a count of 2.5');
    expect(i.message).toContain('Fe2·5O');
    expect(hill('Fe2.5 O')).toBe('Fe2.5O');
    expect(hill('Fe2·5O')).toBe('Fe2O5');
    expect(hill('Fe0.95O')).toBe('Fe0.95O'); // wüstite (common practice): a '0.' is always a decimal
    expect(hill('YBa2Cu3O6.5')).toBe('Ba2Cu3O6.5Y');
  });

  it('refuses a fraction as a count', () => {
    expect(refusal('H1/2').code).toBe('UNEXPECTED_TOKEN');
  });
});

describe('abbreviations', () => {
  it('reads Cp* as pentamethylcyclopentadienyl, not Cp and an addition dot', () => {
    // Cp* = C5(CH3)5 (IUPAC Red Book 2005, ligand abbreviations)
    expect(hill('[Cp*RhCl2]2')).toBe('C20H30Cl4Rh2');
    expect(hill('[Cp*RhCl2]2', { abbreviations: true })).toBe('C20H30Cl4Rh2');
    expect(hill('Cp*2Fe')).toBe('C20H30Fe');
    expect(hill('Cp*TiCl3')).toBe('C10H15Cl3Ti');
    expect(hill('CuSO4*5H2O')).toBe('CuH10O9S'); // '*' is still the addition dot elsewhere
  });

  it('reads the abbreviations no element symbol can be confused with by default, each with a note', () => {
    expect(hill('Pd(PPh3)4')).toBe('C72H60P4Pd');
    expect(hill('PhCOOH')).toBe('C7H6O2');
    expect(hill('KOtBu')).toBe('C4H9KO');
    expect(hill('Boc2O')).toBe('C10H18O5');
    expect(hill('Cp2Fe')).toBe('C10H10Fe');
    expect(hill('MeCN')).toBe('C2H3N');
    expect(hill('Pd2(dba)3')).toBe('C51H42O3Pd2');
    expect(hill('PdCl2(dppf)')).toBe('C34H28Cl2FeP2Pd');
    expect(hill('Ni(cod)2')).toBe('C16H24Ni');
    expect(hill('Fe(acac)3')).toBe('C15H21FeO6');
    expect(hill('B2pin2')).toBe('C12H24B2O4');
    expect(hill('PhBpin')).toBe('C12H17BO2');
    expect(hill('[Ru(bpy)3]Cl2')).toBe('C30H24Cl2N6Ru');
    expect(parseFormula('Pd(PPh3)4').notes.map((n) => n.message)).toEqual(["'Ph' is read as phenyl (C6H5)"]);
    expect(codes('Me3SiOTf')).toEqual(['ABBREVIATION', 'ABBREVIATION']);
  });

  it('reads only element symbols when told', () => {
    expect(refusal('Pd(PPh3)4', { abbreviations: 'none' }).code).toBe('UNKNOWN_ELEMENT');
    expect(hill('Ac2O3', { abbreviations: 'none' })).toBe('Ac2O3');
    expect(hill('THF', { abbreviations: 'none' })).toBe('FHT');
  });

  it('classifies every abbreviation by whether its letters read as element symbols', () => {
    for (const name of Object.keys(ABBREVIATIONS)) {
      const symbols = name.match(/[A-Z][a-z]*|[^A-Z]+/g)!;
      const elements = symbols.every((w) => w === 'D' || w === 'T' || isElementSymbol(w));
      expect(readsAsElements(name), name).toBe(elements);
      if (elements) expect(ABBREVIATION_CLASHES, name).toContain(name);
    }
    for (const safe of ['Me', 'Et', 'Bu', 'tBu', 'Ph', 'Bn', 'Bz', 'Boc', 'Cbz', 'Fmoc', 'Ms', 'Tf', 'Cp', 'Cp*', 'Cy', 'py']) expect(SAFE_ABBREVIATIONS, safe).toContain(safe);
    for (const clash of ['Ac', 'Pr', 'Ts', 'OAc', 'TBS', 'TIPS']) expect(ABBREVIATION_CLASHES, clash).toContain(clash);
    expect(SAFE_ABBREVIATIONS).not.toContain('Py');
  });

  it('gives every entry a source, and a formula the fast path reads', () => {
    for (const [name, a] of Object.entries(ABBREVIATIONS)) {
      expect(a.source.length, name).toBeGreaterThan(5);
      expect(() => parseFormula(a.formula, { abbreviations: 'none' }), name).not.toThrow();
    }
  });

  it('refuses Py, which means pyridyl or pyridine, and reads py as the pyridine ligand', () => {
    const i = refusal('PdCl2(Py)2');
    expect(i.code).toBe('AMBIGUOUS_READING');
    expect(i.hint).toContain('PdCl2(py)2');
    expect(i.hint).toContain('PdCl2(C5H4N)2');
    expect(refusal('PdCl2(Py)2', { abbreviations: true }).code).toBe('AMBIGUOUS_READING');
    expect(hill('PdCl2(py)2')).toBe('C10H10Cl2N2Pd');
    expect(refusal('PhPy').hint).toBe('write Ph(py) for pyridine (py, C5H5N), or Ph(C5H4N) for pyridyl');
  });

  it('notes a formula of abbreviations alone that may be a slip of case for the elements', () => {
    expect(parseFormula('Ph3').notes.map((n) => n.message)).toContain("'Ph3' is read as abbreviations only; if you meant the elements, write 'PH3'");
    expect(codes('Bn')).toContain('CASE_CHECK');
    expect(codes('PH3')).toEqual([]);
    expect(codes('thf')).toEqual(['ABBREVIATION']); // THF would be tritium: no such note
  });
});

describe('readings that must be settled', () => {
  it.each([
    ['AcOH', 1, 'acetic acid'],
    ['NaOAc', 4, 'sodium acetate'],
    ['Ac2O', 1, 'acetic anhydride'],
    ['EtOAc', 4, 'ethyl acetate'],
    ['TsCl', 1, 'tosyl chloride'],
    ['HOTs', 3, 'p-toluenesulfonic acid'],
  ])('%s is refused: Ac and Ts are acetyl and tosyl as well as elements with no standard weight', (input, column, name) => {
    const i = refusal(input);
    expect(i.code).toBe('AMBIGUOUS_READING');
    expect(i.column).toBe(column);
    expect(i.message).toContain(name);
    // the hint names the option neutrally for the library; the command line shows the flag
    expect(i.hint).toContain('`abbreviations: true`');
    expect(i.options).toEqual(['abbreviations']);
    expect(hintFor(i, FLAG_NAMING)).toContain('read abbreviations with --abbreviations;');
  });

  it('reads them as abbreviations when asked', () => {
    // acetic acid C2H4O2, sodium acetate C2H3NaO2, acetic anhydride C4H6O3, tosyl chloride C7H7ClO2S (common practice)
    expect(hill('AcOH', { abbreviations: true })).toBe('C2H4O2');
    expect(hill('NaOAc', { abbreviations: true })).toBe('C2H3NaO2');
    expect(hill('Ac2O', { abbreviations: true })).toBe('C4H6O3');
    expect(hill('TsCl', { abbreviations: true })).toBe('C7H7ClO2S');
    expect(hill('HOTs', { abbreviations: true })).toBe('C7H8O3S');
  });

  it('offers the element reading as a nuclide label', () => {
    expect(refusal('AcOH').hint).toContain('[227Ac]OH');
    expect(hill('[227Ac]OH')).toBe('[227Ac]HO');
  });

  it.each([
    ['THF', 'tetrahydrofuran', '[3H]HF'],
    ['COD', 'cycloocta-1,5-diene', 'CO[2H]'],
    ['TiCl4(THF)2', 'tetrahydrofuran', '[3H]HF'],
    ['NBS', 'N-bromosuccinimide', 'BNS'],
    ['DBU', '1,8-diazabicyclo', '[2H]BU'],
    ['TBSCl', 'tert-butyldimethylsilyl', '[3H]BS'],
    ['TIPSOTf', 'triisopropylsilyl', '[3H]IPS'],
    ['BOC2O', 'Boc', 'Boc2O'],
    // lab names, common practice; formulas from memory (KHP, the primary standard, 204.22 g/mol)
    ['KHP', 'potassium hydrogen phthalate', 'HKP'],
    ['SDS', 'sodium dodecyl sulfate', 'S[2H]S'],
    ['NHS', 'N-hydroxysuccinimide', 'HNS'],
    ['DTT', 'dithiothreitol', '[2H][3H][3H]'],
    ['HOAt', '1-hydroxy-7-azabenzotriazole', 'AtHO'],
    ['HFIP', 'hexafluoro-2-propanol', 'FHIP'],
  ])('%s reads as elements but is a name: refused with both readings', (input, name, other) => {
    const i = refusal(input);
    expect(i.code).toBe('AMBIGUOUS_READING');
    expect(`${i.message} ${i.hint}`).toContain(name);
    expect(i.hint).toContain(other);
  });

  it('reads names as their formulas when abbreviations are on', () => {
    expect(hill('THF', { abbreviations: true })).toBe('C4H8O');
    expect(hill('TiCl4(THF)2', { abbreviations: true })).toBe('C8H16Cl4O2Ti');
    expect(hill('[Ir(COD)Cl]2', { abbreviations: true })).toBe('C16H24Cl2Ir2');
    expect(hill('TBSCl', { abbreviations: true })).toBe('C6H15ClSi');
  });

  it('keeps real deuterated and tritiated formulas', () => {
    for (const [f, h] of [['CDCl3', 'CDCl3'], ['D2O', 'D2O'], ['[2H]2O', 'D2O'], ['C6D6', 'C6D6'], ['CD3OD', 'CD4O'], ['(CD3)2SO', 'C2D6OS'], ['CDI3', 'CDI3'], ['T2O', 'T2O'], ['CH3COOD', 'C2H3DO2'], ['LiAlD4', 'AlD4Li'], ['NaBD4', 'BD4Na']]) {
      expect(hill(f), f).toBe(h);
      expect(codes(f), f).toEqual([]);
    }
  });

  it('keeps praseodymium compounds, and refuses Pr where it reads as propyl', () => {
    // praseodymium oxide Pr6O11, chloride, nitrate hexahydrate, hydroxide (common practice)
    for (const [f, h] of [['Pr6O11', 'O11Pr6'], ['PrCl3', 'Cl3Pr'], ['Pr2O3', 'O3Pr2'], ['PrCl3·7H2O', 'Cl3H14O7Pr'], ['Pr(NO3)3·6H2O', 'H12N3O15Pr'], ['Pr(OH)3', 'H3O3Pr'], ['Pr2(SO4)3', 'O12Pr2S3'], ['PrF3', 'F3Pr'], ['PrN', 'NPr'], ['Pr', 'Pr'], ['Pr(acac)3', 'C15H21O6Pr']]) {
      expect(hill(f), f).toBe(h);
    }
    expect(hill('PrNi5')).toBe('Ni5Pr'); // an intermetallic
    for (const f of ['PrOH', 'PrNH2', 'Pr2NH', 'PrBr', 'Pr3N', 'Pr2O', 'PrCOOH', 'PrCH2OH', 'PrMgBr', 'PrLi', 'Pr4NBr']) {
      const i = refusal(f);
      expect(i.code, f).toBe('AMBIGUOUS_READING');
      expect(i.hint, f).toContain('nPr');
    }
    expect(hill('nPrOH')).toBe('C3H8O');
    expect(hill('iPrOH')).toBe('C3H8O');
    expect(hill('PrOH', { abbreviations: true })).toBe('C3H8O');
  });

  it('notes that Np is read as neptunium, and a lone Ac as actinium', () => {
    expect(codes('NpO2')).toEqual(['ELEMENT_NOT_ABBREVIATION']);
    expect(codes('Ac')).toEqual(['ELEMENT_NOT_ABBREVIATION']);
  });

  it('notes that Ar beside other atoms is argon, not an aryl group, and Am americium, not amyl', () => {
    // Ar for aryl and Am for amyl: common practice in organic formulas
    expect(codes('ArCl')).toEqual(['ELEMENT_NOT_ABBREVIATION']);
    expect(codes('AmOH')).toContain('ELEMENT_NOT_ABBREVIATION');
    expect(codes('Ar')).toEqual([]); // argon alone is argon
  });

  it('names what a solvent or reagent name stands for', () => {
    expect(refusal('DMF').hint).toContain('N,N-dimethylformamide (C3H7NO)');
    expect(refusal('DMSO').hint).toContain('dimethyl sulfoxide (C2H6OS)');
    expect(refusal('DCM').hint).toContain('dichloromethane (CH2Cl2)');
    expect(refusal('Thf').hint).toContain('tetrahydrofuran (C4H8O)');
    expect(hill('thf')).toBe('C4H8O'); // lower-case thf is the ligand abbreviation (IUPAC Red Book 2005)
    expect(refusal('EtOAc').message).toContain('ethyl acetate');
    expect(refusal('benzene').hint).toBe("'benzene' is C6H6; write its formula, C6H6");
  });
});

describe('state symbols', () => {
  it('sets (s), (l), (g) and (aq) aside with a note', () => {
    expect(hill('Zn(s)')).toBe('Zn');
    expect(parseFormula('Zn(s)').notes.map((n) => n.message)).toEqual(["'(s)' is a state symbol (solid) and is set aside"]);
    expect(hill('H2O(l)')).toBe('H2O');
    expect(hill('CO2(g)')).toBe('CO2');
    expect(hill('NaCl(aq)')).toBe('ClNa');
    expect(hill('Fe^3+(aq)')).toBe('Fe^3+');
    expect(hill('CuSO4·5H2O(s)')).toBe('CuH10O9S');
  });

  it('keeps (S) as sulfur', () => {
    expect(hill('Zn(S)')).toBe('SZn');
    expect(codes('Zn(S)')).toEqual([]);
  });
});

describe('hints keep the substance', () => {
  it('re-cases formulas typed in one case', () => {
    for (const [input, want] of [['h2o', 'H2O'], ['NACL', 'NaCl'], ['nacl', 'NaCl'], ['KMNO4', 'KMnO4'], ['NaCL', 'NaCl'], ['CuSo4', 'CuSO4']]) {
      expect(refusal(input).hint, input).toContain(`'${want}'`);
    }
  });

  it('never re-cases an abbreviation: it names it instead', () => {
    for (const [input, abbr] of [['Pd(PPh3)4', 'phenyl'], ['PhCOOH', 'phenyl'], ['KOtBu', 'tert-butoxy'], ['Boc2O', 'tert-butoxycarbonyl'], ['Cp2Fe', 'cyclopentadienyl']]) {
      const i = refusal(input, { abbreviations: 'none' });
      expect(i.hint, input).toContain(abbr);
      expect(i.hint, input).not.toMatch(/did you mean/);
    }
  });

  it('never suggests sulfur for a state symbol', () => {
    expect(safeParseFormula('Zn(s)').success).toBe(true);
  });

  // Property: a hint changes nothing but the letter case of the words that failed to read as
  // element symbols (or of a run written in one case throughout, like NACL), never touches an
  // abbreviation, and every formula it proposes parses. Hence an input that reads as elements
  // gets no suggestion at all, and a correctly written symbol is never turned into another.
  const element = fc.constantFrom('C', 'H', 'O', 'N', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Co', 'Pd', 'Mn', 'Mg', 'Zn', 'B', 'I');
  const count = fc.oneof(fc.constant(''), fc.integer({ min: 2, max: 12 }).map(String));
  const part = fc.tuple(element, count).map(([e, c]) => e + c);
  const formula = fc.array(fc.oneof({ weight: 4, arbitrary: part }, { weight: 1, arbitrary: fc.tuple(fc.array(part, { minLength: 1, maxLength: 3 }), count).map(([ps, c]) => `(${ps.join('')})${c || '2'}`) }), { minLength: 1, maxLength: 5 }).map((a) => a.join(''));
  const parsesAsElements = (s: string) => safeParseFormula(s, { abbreviations: 'none' }).success;
  const suggestions = (hint: string | undefined) => (hint && /^did you mean/.test(hint) ? [...hint.matchAll(/'([^']+)'/g)].map((m) => m[1]) : []);

  it('an input that reads as elements gets no re-reading', () => {
    fc.assert(fc.property(formula, (f) => {
      expect(formulaReadings(f, parsesAsElements)).toEqual([]);
    }), { numRuns: 1000 });
  });

  it('a failed input gets suggestions that only re-case its unknown words', () => {
    const abbreviations = fc.constantFrom('Ph', 'tBu', 'Boc', 'Cp', 'Me', 'Et', 'Bn', 'Cy', 'Bu', 'OtBu');
    const mutation = fc.oneof(fc.constant('lower'), fc.constant('upper'), fc.constant('swap'), abbreviations);
    fc.assert(
      fc.property(formula, fc.nat(), mutation, (f, at, how) => {
        const words = [...f.matchAll(/[A-Z][a-z]?/g)];
        const w = words[at % words.length];
        const from = w.index!;
        const to = from + w[0].length;
        const replacement = how === 'lower' ? w[0].toLowerCase() : how === 'upper' ? w[0].toUpperCase() : how === 'swap' ? w[0].replace(/^./, (c) => c.toLowerCase()) : how;
        const input = f.slice(0, from) + replacement + f.slice(to);
        const r = safeParseFormula(input, { abbreviations: 'none' });
        if (r.success) return;
        for (const issue of r.error.issues) {
          for (const s of suggestions(issue.hint)) {
            expect(parsesAsElements(s), `${input} → ${s}`).toBe(true);
            expect(s.toLowerCase(), `${input} → ${s}`).toBe(input.toLowerCase());
            if (how !== 'lower' && how !== 'upper' && how !== 'swap') throw new Error(`${input}: the abbreviation ${how} was re-cased to ${s}`);
            // letters outside the changed word keep their case unless their run is in one case
            for (const m of input.matchAll(/[A-Za-z]+/g)) {
              const run = m[0];
              const oneCase = run === run.toUpperCase() || run === run.toLowerCase();
              if (oneCase) continue;
              for (let k = 0; k < run.length; k++) {
                const i = m.index! + k;
                const inWord = i >= from && i < from + replacement.length;
                if (!inWord) {
                  // a letter of a valid symbol in a mixed-case run keeps its case
                  const words = [...run.matchAll(/[A-Z][a-z]*|[a-z]+/g)];
                  const word = words.find((x) => x.index! <= k && k < x.index! + x[0].length)!;
                  if (isElementSymbol(word[0])) expect(s[i], `${input} → ${s} at ${i}`).toBe(input[i]);
                }
              }
            }
          }
        }
      }),
      { numRuns: 1500 },
    );
  });
});

describe('names of mixtures and polymers that read as element symbols', () => {
  it('are refused in every reading that could compute them, with no formula offered', () => {
    // PBS (phosphate-buffered saline), HBSS, PVP: lab names, common practice; none is one substance
    for (const name of ['PBS', 'HBSS', 'PVP', 'TBST']) {
      const r = safeParseFormula(name);
      expect(r.success, name).toBe(false);
      if (!r.success) {
        expect(r.error.issues[0].code).toBe('AMBIGUOUS_READING');
        expect(r.error.issues[0].message).toContain('no one formula');
      }
      // with abbreviations read, TBST is the TBS group and tritium, with a note (TBS is an abbreviation there)
      if (name !== 'TBST') expect(safeParseFormula(name, { abbreviations: true }).success, `${name} with abbreviations`).toBe(false);
    }
    // the elements themselves, written in another order, still read
    expect(safeParseFormula('BPS').success).toBe(true);
    expect(safeParseFormula('PBS', { abbreviations: 'none' }).success).toBe(true);
  });
});

describe('carbon written straight before iodine', () => {
  it('gets a note that chlorine is Cl: NaCI is a common slip for NaCl', () => {
    // a capital I typed for the lower-case L of Cl: common practice (the two look alike in many fonts)
    for (const f of ['NaCI', 'CuCI2', '[Co(NH3)4CI2]', 'CI4']) {
      expect(parseFormula(f).notes.map((n) => n.code), f).toContain('CASE_CHECK');
      expect(formulaMass(f).notes.map((n) => n.message).join(' '), f).toContain('chlorine is written Cl');
    }
    for (const f of ['NaCl', 'CHI3', 'CH2ClI', 'C2I2']) expect(formulaMass(f).notes.map((n) => n.code), f).not.toContain('CASE_CHECK');
  });
});

describe('two capitals where the pair is a common element', () => {
  it('CUSO4, SIO2, PB: computed as written, with a note naming the element the pair would be', () => {
    // an upper-case second letter reads as another element (C and U for Cu): common practice
    const cases: [string, string, string][] = [
      ['CUSO4', 'CO4SU', "'CU' is read as carbon and uranium; copper is written Cu"],
      ['SIO2', 'IO2S', "'SI' is read as sulfur and iodine; silicon is written Si"],
      ['PB', 'BP', "'PB' is read as phosphorus and boron; lead is written Pb"],
      ['CUCl2', 'CCl2U', "'CU' is read as carbon and uranium; copper is written Cu"],
      ['YBCl3', 'BCl3Y', "'YB' is read as yttrium and boron; ytterbium is written Yb"],
    ];
    for (const [f, hill, note] of cases) {
      const m = formulaMass(f);
      expect(m.formula, f).toBe(hill);
      expect(m.notes.map((n) => n.message), f).toContain(note);
    }
    for (const f of ['CuSO4', 'SiO2', 'PbO', 'CO2', 'CS2', 'HF', 'CH3SCN', 'BCl3']) expect(formulaMass(f).notes.map((n) => n.code), f).not.toContain('CASE_CHECK');
  });

  it('a synthetic element beside other atoms, or a metal written twice in a row, gets the case note', () => {
    // NaNo3 is NaNO3 mistyped (nobelium is never in a bench formula); CoCo3 is CoCO3 (from memory)
    expect(formulaMass('NaNo3').notes.map((n) => n.message)).toContain("'No' is read as nobelium; if you meant the two atoms, write 'NO'");
    expect(formulaMass('CoCo3').notes.map((n) => n.message)).toContain("'Co' is read as cobalt; if you meant the two atoms, write 'CO'");
    for (const f of ['CoCl2', 'CoSO4', 'NaNO3', 'Co2(CO)8']) expect(formulaMass(f).notes.map((n) => n.code), f).not.toContain('CASE_CHECK');
  });
});

describe('a number first in a formula that is also a mass number', () => {
  it('13CO2, 2H2O, [13C6]H12O6 are refused with both readings', () => {
    // 13CO2 is how carbon-13 dioxide is often typed; read as a multiplier it was C13O26, 572 g/mol
    const cases: [string, string][] = [
      ['13CO2', 'for carbon-13 write [13C]O2; for 13 × CO2 write (CO2)13'],
      ['2H2O', 'for hydrogen-2 (deuterium) write [2H]2O; for 2 × H2O write (H2O)2'],
      ['[13C6]H12O6', 'for carbon-13 write [13C]6H12O6; for 13 × C6 write (C6)13H12O6'],
      ['15NH3', 'for nitrogen-15 write [15N]H3; for 15 × NH3 write (NH3)15'],
      ['14CO2', 'for carbon-14 write [14C]O2; for 14 × CO2 write (CO2)14'],
      ['13C', 'for carbon-13 write [13C]; for 13 × C write C13'],
    ];
    for (const [f, hint] of cases) {
      const r = safeParseFormula(f);
      expect(r.success, f).toBe(false);
      if (!r.success) {
        expect(r.error.issues[0].code, f).toBe('AMBIGUOUS_READING');
        expect(r.error.issues[0].hint, f).toBe(hint);
      }
      expect(() => formulaMass(f), f).toThrow(PondusError);
    }
    // the readings offered compute: [13C]O2 is 45.001 g/mol by AME2020's 13.003354835 u (from the project's data)
    expect(formulaMass('[13C]O2').molarMass.toFixed(3)).toBe('45.001');
    expect(formulaMass('(CO2)13').formula).toBe('C13O26');
  });

  it('a multiplier that is no mass number of the atom after it, or after the addition dot, reads as written', () => {
    for (const [f, hill] of [['2CaSO4·H2O', 'Ca2H2O9S2'], ['CaSO4·2H2O', 'CaH4O6S'], ['3O2', 'O6'], ['2(H2O)', 'H4O2'], ['2D2O', 'D4O2']]) {
      expect(formulaMass(f).formula, f).toBe(hill);
    }
  });
});

describe('reagent and ligand names that read as atoms', () => {
  it('NCS alone, and the carbenes IMes, SIMes, IPr and SIPr anywhere, are refused with both readings', () => {
    // NCS was computed as C, N, S (58.08 g/mol), SIPr as S, I, Pr, IMes as iodomesitylene: N-chlorosuccinimide
    // is C4H4ClNO2 and IMes C21H24N2 (from memory)
    for (const [f, formula] of [['NCS', 'C4H4ClNO2'], ['SIPr', 'C27H38N2'], ['(SIPr)CuCl', 'C27H38N2'], ['Pd(IMes)Cl2', 'C21H24N2'], ['SIMes', 'C21H26N2'], ['IPr', 'C27H36N2']]) {
      const r = safeParseFormula(f);
      expect(r.success, f).toBe(false);
      if (!r.success) {
        expect(r.error.issues[0].code, f).toBe('AMBIGUOUS_READING');
        expect(r.error.issues[0].hint, f).toContain(formula);
      }
    }
    // in brackets NCS is the thiocyanate ligand, and the atoms read in another order
    for (const f of ['Hg(NCS)2', 'KSCN', 'CNS', 'NCS^-']) expect(safeParseFormula(f).success, f).toBe(true);
    expect(safeParseFormula('NCS', { abbreviations: 'none' }).success).toBe(true);
  });
});

describe('a formula of abbreviations only', () => {
  it('one abbreviation may be a slip of case for the elements (Ph3 for PH3); several get no such note (PhBpin is no PHBPIN)', () => {
    expect(formulaMass('Ph3').notes.map((n) => n.message)).toContain("'Ph3' is read as abbreviations only; if you meant the elements, write 'PH3'");
    expect(formulaMass('PhBpin').notes.map((n) => n.code)).not.toContain('CASE_CHECK');
  });
});

describe('a charge written after the formula in another notation', () => {
  it("'Ca+2', 'SO4--' and 'Fe+++' are refused with the same charge written the pondus way", () => {
    const hint = (f: string) => {
      const r = safeParseFormula(f);
      return r.success ? 'parsed' : r.error.issues[0].hint;
    };
    expect(hint('Ca+2')).toBe('for a charge of 2+, write Ca^2+');
    expect(hint('SO4--')).toBe('for a charge of 2−, write SO4^2-');
    expect(hint('Fe+++')).toBe('for a charge of 3+, write Fe^3+');
    expect(safeParseFormula('Ca^2+').success).toBe(true);
  });
});

describe('the capital-slip and nobelium notes, where they do not and do belong', () => {
  it('a formula in Hill order keeps its capitals without a note (C6H4INO2, C6H6BIO2); CUSO4 and CI4 still get theirs', () => {
    // Hill order puts I before N and B before I: pondus's own output must read back without a note
    for (const f of ['C6H4INO2', 'C6H6BIO2', 'C5H4IN']) expect(formulaMass(f).notes.map((n) => n.code), f).not.toContain('CASE_CHECK');
    expect(formulaMass('CUSO4').notes.map((n) => n.code)).toContain('CASE_CHECK');
    expect(formulaMass('CI4').notes.map((n) => n.code)).toContain('CASE_CHECK');
  });
  it('nobelium in brackets gets the note too: Ca(No3)2 is surely Ca(NO3)2', () => {
    expect(formulaMass('Ca(No3)2').notes.map((n) => n.message)).toContain("'No' is read as nobelium; if you meant the two atoms, write 'NO'");
    expect(formulaMass('Cu(No3)2·3H2O').notes.map((n) => n.code)).toContain('CASE_CHECK');
  });
});
