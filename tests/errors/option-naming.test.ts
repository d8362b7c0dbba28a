// The options a message or hint names: the library names them as its options objects do
// (`reagentRatio`), the command line as its flags (--reagent-ratio), from the same issue.
import { describe, expect, it } from 'vitest';
import { alligation, convertSampleBasis, empirical, errorJson, milliequivalents, PondusError, prepareSolution, react, readFixOption, renderError, titrationAssay } from '../../src/index.js';
import { FLAG_NAMING } from '../../src/errors/render.js';

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
    () => titrationAssay('NaOH', { sample: '0.5 g', titrant: '0.1 M', volume: '20 mL', back: '10 mL' }),
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
});

