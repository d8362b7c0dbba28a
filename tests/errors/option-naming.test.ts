// The options a message, hint or note names: the library names them as its options objects do
// (`reagentRatio`), the command line as its flags (--reagent-ratio), from the same issue or note;
// a library function named in the text (`dilutionSeries`) is the command on the command line.
import { describe, expect, it } from 'vitest';
import {
  alligation,
  analysis,
  combustion,
  composition,
  compositionCsvRow,
  concentratedReagent,
  convertSampleBasis,
  dilute,
  empirical,
  errorJson,
  milliequivalents,
  potency,
  potencyJson,
  PondusError,
  prepareSolution,
  quantity,
  react,
  readFixOption,
  readMoleRatio,
  readNumber,
  renderError,
  reportOnBasis,
  standardise,
  standardiseJson,
  titrationAssay,
  type Note,
} from '../../src/index.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { noteText, withNaming } from '../../src/errors/message.js';
import { notesJson } from '../../src/errors/note-json.js';
import { pondus } from '../cli/run-cli.js';

function errorOf(run: () => unknown): PondusError {
  try {
    run();
  } catch (e) {
    if (e instanceof PondusError) return e;
    throw e;
  }
  throw new Error('expected a PondusError');
}

/** A call that fails, the message the library gives, and the message the command line gives. */
const CASES: [string, () => unknown, string, string][] = [
  [
    'a reagent ratio without a back-titration',
    () => titrationAssay('NaOH', { sample: '0.5 g', titrant: '0.1 M', volume: '20 mL', reagentRatio: '1:1' }),
    '`reagentRatio` belongs to a back-titration: give `added` or `back` too',
    '--reagent-ratio belongs to a back-titration: give --added or --back too',
  ],
  [
    'a back-titration with neither the excess nor a blank',
    () => titrationAssay('NaOH', { sample: '0.5 g', titrant: '0.1 M', volume: '20 mL', back: true }),
    'a back-titration needs `added` (the excess reagent, e.g. `added: "50.00 mL of 0.5000 M"`) or `blank` (the titre of the reagent alone)',
    'a back-titration needs --added (the excess reagent, e.g. --added "50.00 mL of 0.5000 M") or --blank (the titre of the reagent alone)',
  ],
  ['empty ions', () => milliequivalents('NaCl', { mass: '1 g', ions: '' }), '`ions` is empty', '--ions is empty'],
  [
    'a basis that needs the loss on drying',
    () => convertSampleBasis('99.1 %', 'as-is', 'dried', {}),
    "the dried basis needs the loss on drying: give `loss` (e.g. `loss: '0.50 %'`)",
    "the dried basis needs the loss on drying: give --loss (e.g. --loss '0.50 %')",
  ],
  [
    'a molar-mass range written backwards',
    () => empirical('C=40.00 H=6.71 O=53.29', { molarMass: '190-170' }),
    '`molarMass: 190-170`: a range goes from the lower to the higher molar mass, both above zero',
    '--molar-mass 190-170: a range goes from the lower to the higher molar mass, both above zero',
  ],
  // `amounts` is a list in the library; the command line takes one --amount at a time
  ['no amount', () => react('H2 + O2 -> H2O', { amounts: [] }), 'give the amount of at least one reactant: `amounts: H2=4.00 g`', 'give the amount of at least one reactant: --amount H2=4.00 g'],
  [
    'strengths mixed neither by mass nor by volume',
    () => alligation('10 %', { higher: '20 %', lower: '5 %' }),
    "say how the strengths are mixed: `total: '500 g'` (by mass) or `total: '250 mL'` (by volume), or `by: mass|volume` for parts only",
    "say how the strengths are mixed: --total '500 g' (by mass) or --total '250 mL' (by volume), or --by mass|volume for parts only",
  ],
  ['a coefficient fixed twice', () => readFixOption(['H2=2', 'H2=3']), '`fix` gives H2 twice', '--fix gives H2 twice'],
  // a library function named in a message: the command that does the same on the command line
  [
    'a content by mass for a solution made up to a volume',
    () => prepareSolution('NaCl', { concentration: '5 % w/w', volume: '100 mL' }),
    "'5 % w/w' is a fraction by mass: a solution made up to a volume needs a concentration per volume (% w/v, g/L, mg/mL, mg/dL, M), or the density of the solution; for a solid or semisolid let down by mass, use `diluteByMass`",
    "'5 % w/w' is a fraction by mass: a solution made up to a volume needs a concentration per volume (% w/v, g/L, mg/mL, mg/dL, M), or the density of the solution; for a solid or semisolid let down by mass, use dilute --mass",
  ],
];

describe('options named by the reader', () => {
  it.each(CASES)('%s: the library names the option, the command line its flag', (_what, run, library, cli) => {
    const e = errorOf(run);
    expect(e.first.message).toBe(library);
    expect(errorJson(e).message).toBe(library);
    expect(renderError(e)).toContain(`: ${library}`);
    expect(errorJson(e, FLAG_NAMING).message).toBe(cli);
    expect(renderError(e, { naming: FLAG_NAMING })).toContain(`: ${cli}`);
  });

  it('names the options of a hint the same way', () => {
    const e = errorOf(() => prepareSolution('C17H19NO3.HCl', { as: 'C17H19NO3', concentration: '1 mg/mL', volume: '100 mL', purity: '80 %' }));
    expect(errorJson(e).hint).toBe("say which: `purityBasis: reagent` (the assay of the reagent as weighed) or `purityBasis: part` (the content of the `as` species, as on a label 'potency as base')");
    expect(errorJson(e, FLAG_NAMING).hint).toBe("say which: --purity-basis reagent (the assay of the reagent as weighed) or --purity-basis part (the content of the --as species, as on a label 'potency as base')");
  });

  it('a hint that shows the call: the library function and its options, the command line its command and flags', () => {
    const e = errorOf(() => prepareSolution('HCl', { concentration: '1 M', volume: '100 mL' }));
    expect(errorJson(e).hint).toBe("`concentratedReagent` HCl `fraction: '37 %'` `density: '1.19 g/mL'` `concentration: …` `volume: …` (from the label of the bottle)");
    expect(errorJson(e, FLAG_NAMING).hint).toBe("pondus prepare HCl --fraction '37 %' --density '1.19 g/mL' --concentration … --volume … (from the label of the bottle)");
    expect(pondus(['prepare', 'HCl', '--concentration', '1 M', '--volume', '100 mL']).stderr).toContain("  hint: pondus prepare HCl --fraction '37 %' --density '1.19 g/mL' --concentration … --volume … (from the label of the bottle)\n");
  });
});

const SOLVENTS = ['water', 'dcm', 'chloroform', 'methanol', 'ethanol', 'isopropanol', 'etoac', 'ether', 'thf', 'dioxane', 'acetone', 'mecn', 'dmf', 'dmso', 'toluene', 'benzene', 'hexane', 'pentane', 'heptane', 'cyclohexane', 'dce', 'pyridine', 'acoh', 'et3n', 'formic acid'];

/**
 * A library call with a note that names options or functions, the note's code, what the library
 * writes and what the command line writes in its place, and the same call on the command line.
 */
const NOTE_CASES: [string, () => { notes: Note[] }, string, string, string, string[]][] = [
  [
    'a density from the table',
    () => concentratedReagent('HCl', { fraction: '37 %', concentration: '1 M', volume: '100 mL' }),
    'DENSITY_FROM_TABLE',
    'the label or certificate of your bottle decides (give `density`)',
    'the label or certificate of your bottle decides (give --density)',
    ['prepare', 'HCl', '--fraction', '37 %', '--concentration', '1 M', '--volume', '100 mL'],
  ],
  [
    'a dilution for a serial plan',
    () => dilute('1.00 M', '1.00 µM', '100.0 mL'),
    'SERIAL_DILUTION',
    'for example 1:100, then 1:100, then 1:100 (`dilutionSeries` plans the steps)',
    'for example 1:100, then 1:100, then 1:100 (dilute --series plans the steps)',
    ['dilute', '1.00 M', '--to', '1.00 µM', '--volume', '100.0 mL'],
  ],
  [
    'molecular formulas the analysis cannot tell apart',
    () => empirical('C=40.0 H=6.7 O=rest', { molarMass: '170-370' }),
    'DATA_CANNOT_DECIDE',
    "an accurate mass can: `candidateFormulas` M/Z `ion: '[M+H]+'` `found: 'C=40.00 H=6.70 O=53.30'`",
    "an accurate mass can: pondus candidates M/Z --ion '[M+H]+' --found 'C=40.00 H=6.70 O=53.30'",
    ['empirical', 'C=40.0 H=6.7 O=rest', '--molar-mass', '170-370'],
  ],
  [
    "a label's strength",
    () => milliequivalents('KCl', { concentration: '14.9 % w/v' }),
    'NOMINAL_STRENGTH',
    'use `measured: true` for a measured strength',
    'use --measured for a measured strength',
    ['meq', 'KCl', '--concentration', '14.9 % w/v'],
  ],
  [
    'a potency read as is',
    () => potency('98.5 %', { need: '250 mg' }),
    'POTENCY_AS_IS',
    'give `basis: anhydrous` (with `water`) or `basis: dried` (with `loss`) if the certificate',
    'give --basis anhydrous (with --water) or --basis dried (with --loss) if the certificate',
    ['potency', '98.5 %', '--need', '250 mg'],
  ],
  [
    'a standard taken as pure',
    () => standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' }),
    'PURITY_ASSUMED',
    'give `purity` with its certified assay',
    'give --purity with its certified assay',
    ['standardise', 'KHC8H4O4', '--mass', '0.5105 g', '--volume', '24.95 mL'],
  ],
  [
    'a mole ratio assumed',
    () => titrationAssay('C9H8O4', { sample: '0.5012 g', titrant: '0.1000 M', volume: '24.85 mL' }),
    'RATIO_ASSUMED',
    'give `ratio` if the reaction is otherwise',
    'give --ratio if the reaction is otherwise',
    ['titration', 'C9H8O4', '--sample', '0.5012 g', '--titrant', '0.1000 M', '--volume', '24.85 mL'],
  ],
  [
    'a basis the content implies',
    () => reportOnBasis(quantity(readNumber('0.893'), null), 'as-is', 'dried', { loss: '0.50 %', inferred: true }),
    'BASIS_INFERRED',
    'the one the content given implies; give `on` to choose',
    'the one the content given implies; give --on to choose',
    ['titration', 'C9H8O4', '--sample', '0.5012 g', '--titrant', '0.1000 M', '--volume', '24.85 mL', '--loss', '0.50 %'],
  ],
  [
    'a trace element from combustion',
    () => combustion({ sample: '2.000 mg', collected: { co2: '6.000 mg', h2o: '0.010 mg' } }),
    'NO_FORMULA_FITS',
    'give a tighter tolerance (search the percentages above with `empirical` and `tolerance`) if the analysis',
    'give a tighter tolerance (search the percentages above with empirical and --tolerance) if the analysis',
    ['combustion', '2.000 mg', '--co2', '6.000 mg', '--h2o', '0.010 mg'],
  ],
  [
    'solvate pairs beyond the bound',
    () => analysis('C20H25N3O', 'C=72.3 H=7.91 N=12.6', { solvents: SOLVENTS, step: 0.01, max: 20 }),
    'PAIRS_NOT_SEARCHED',
    'Give fewer solvents or a coarser `step`',
    'Give fewer solvents or a coarser --step',
    ['analysis', 'C20H25N3O', 'C=72.3 H=7.91 N=12.6', '--solvents', SOLVENTS.join(','), '--step', '0.01', '--max', '20'],
  ],
];

describe('notes name options the way the reader does', () => {
  it.each(NOTE_CASES)('%s: the library result names the option, the command line its flag', (_what, run, code, library, cli, args) => {
    const note = run().notes.find((n) => n.code === code && n.message.includes(library));
    expect(note, `a ${code} note saying ${library}`).toBeDefined();
    const n = note!;
    expect(n.message).not.toMatch(/ --[a-z]/);
    expect(noteText(n)).toBe(n.message);
    expect(notesJson([n])[0].message).toBe(n.message);
    const flags = noteText(n, FLAG_NAMING);
    expect(flags).toBe(n.message.replace(library, cli));
    expect(withNaming(FLAG_NAMING, () => notesJson([n]))[0].message).toBe(flags);
    // the command line: the same note, in flags, in the table, the JSON row and the CSV notes cell
    expect(pondus(args).stdout).toContain(`note: ${flags}\n`);
    const row = JSON.parse(pondus([...args, '--json']).stdout.split('\n')[0]) as { notes: { code: string; message: string }[] };
    expect(row.notes).toContainEqual({ code, message: flags });
    expect(pondus([...args, '--csv']).stdout).toContain(`${code}: ${flags}`.replace(/"/g, '""'));
  });

  it('a mole ratio of the reagent names its own option', () => {
    const notes: Note[] = [];
    readMoleRatio(undefined, 'reagent', 'titrant', notes, 'reagentRatio');
    expect(notes[0].message).toBe('1:1 mole ratio assumed between reagent and titrant; give `reagentRatio` if the reaction is otherwise');
    expect(noteText(notes[0], FLAG_NAMING)).toBe('1:1 mole ratio assumed between reagent and titrant; give --reagent-ratio if the reaction is otherwise');
    const back = pondus(['titration', 'C9H8O4', '--sample', '0.5012 g', '--titrant', '0.1000 M', '--volume', '24.85 mL', '--back', '--blank', '40.00 mL', '--ratio', '1:2']);
    expect(back.stdout).toContain('note: 1:1 mole ratio assumed between reagent and titrant; give --reagent-ratio if the reaction is otherwise\n');
  });

  it('a CSV note from the serialiser itself: the long form is a function in the library, a flag on the command line', () => {
    const { notes } = compositionCsvRow(composition('NaCl'), ['input', 'formula', 'molarMass', 'H_percent', 'O_percent']);
    expect(notes[0].message).toMatch(/: the element columns come from the first block of rows; `compositionCsvLongRows` writes one row per element$/);
    const lines = ['H2O', ...new Array<string>(600).fill('H2O2'), 'NaCl'];
    const last = pondus(['composition', '--csv', '-'], lines.join('\n') + '\n').stdout.trim().split('\n').pop()!;
    expect(last).toContain(`NO_COLUMN: ${noteText(notes[0], FLAG_NAMING)}`);
    expect(last).toMatch(/; --long writes one row per element",,$/);
  });

  it("the library's serialisers write the library's words; the command line's JSON differs from them only in the notes' words", () => {
    const r = potency('98.5 %', { need: '250 mg' });
    const library = potencyJson(r, '98.5 %', 'half-even', '250 mg') as { notes: { code: string; message: string }[] };
    expect(library.notes.find((n) => n.code === 'POTENCY_AS_IS')!.message).toContain('give `basis: anhydrous`');
    const cli = withNaming(FLAG_NAMING, () => potencyJson(r, '98.5 %', 'half-even', '250 mg')) as typeof library;
    expect(cli.notes.find((n) => n.code === 'POTENCY_AS_IS')!.message).toContain('give --basis anhydrous');
    expect({ ...cli, notes: cli.notes.map((n) => n.code) }).toEqual({ ...library, notes: library.notes.map((n) => n.code) });
    expect(pondus(['potency', '--json', '98.5 %', '--need', '250 mg']).stdout).toBe(`${JSON.stringify({ line: 1, ...cli })}\n`);
    // and the naming ends with the call: the library's words again after it
    expect(JSON.stringify(potencyJson(r, '98.5 %', 'half-even', '250 mg'))).toBe(JSON.stringify(library));
    expect(() => withNaming(FLAG_NAMING, () => standardiseJson(null as never, 'x'))).toThrow();
    expect(standardiseJson(standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' }), 'KHC8H4O4').notes.map((n) => n.message).join(' ')).toContain('give `purity`');
  });
});

