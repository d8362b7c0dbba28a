// A batch plan reads the options once; every reagent must still get what prepareSolution gives it
// alone: the same masses, the same notes (solubility, handling, hydrate and reading notes), and
// the same errors, in the same order, whichever reagent came first.
import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { prepareSolution, solutionPlan, type SolutionOptions } from '../../src/preparation/solution.js';
import { solutionJson, solutionJsonLine } from '../../src/preparation/prepare-json.js';
import { withNaming } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';

const REAGENTS = ['NaCl', 'CuSO4·5H2O', 'CuSO4.5H2O', 'NaOH', 'HF', 'Pb(NO3)2', 'K2Cr2O7', 'HCl', 'CaCl2·2H2O', 'NaCl(s)', 'KHP', 'Xx', 'bad((', '', 'C12H22O11', 'Ca(OH)2', 'Na+', 'Tc'];

const OPTION_SETS: SolutionOptions[] = [
  { concentration: '0.100 M', volume: '250.0 mL' },
  { concentration: '0.1 M', volume: '250 mL' },
  { concentration: '7.00 M', volume: '1.000 L' },
  { concentration: '1000 ppm', volume: '1.000 L' },
  { concentration: '2.0 %', volume: '100.0 mL' },
  { concentration: '1:1000', volume: '100.0 mL' },
  { concentration: '0.100 M', volume: '250.0 mL', purity: '98.5 %' },
  { concentration: '0.100 M', volume: '250.0 mL', purity: '0.985' },
  { concentration: '0.100 M', volume: '250.0 mL', as: 'Cl' },
  { concentration: '0.100 M', volume: '250.0 mL', as: 'Cl', purity: '30 %' },
  { concentration: '0.100 M', volume: '250.0 mL', weighed: '1.4587 g' },
  { weighed: '1.4587 g', volume: '250.0 mL' },
  { concentration: '1000 ppm Cu', volume: '1.000 L' },
  { concentration: '0.1 g', volume: '250.0 mL' },
  { concentration: '0.100 M', volume: '-250.0 mL' },
  { concentration: '0.100 M', volume: '250.0 mL', purity: '120 %' },
  { volume: '250.0 mL' },
];

/** What a call gives, as plain data: the result, or the error's issues. */
function outcome(f: () => unknown): unknown {
  try {
    return JSON.parse(JSON.stringify(f()));
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    return { issues: e.issues, input: e.input };
  }
}

describe('solutionPlan: the options read once, each reagent as prepareSolution gives it', () => {
  for (const options of OPTION_SETS) {
    it(JSON.stringify(options), () => {
      // twice through the same plan, so the second reagent of each kind reads the kept options
      const plan = solutionPlan(options);
      for (const text of [...REAGENTS, ...REAGENTS.slice().reverse()]) {
        expect(outcome(() => plan(text)), text).toEqual(outcome(() => prepareSolution(text, options)));
      }
    });
  }

  it('gives each result its own notes: a caller changing one result changes no other', () => {
    const plan = solutionPlan({ concentration: '2.0 %', volume: '100.0 mL' });
    const a = plan('NaCl');
    a.notes[0].message = 'changed';
    a.notes.push({ code: 'X', message: 'x' });
    expect(plan('NaCl').notes.map((n) => n.code)).toEqual(prepareSolution('NaCl', { concentration: '2.0 %', volume: '100.0 mL' }).notes.map((n) => n.code));
    expect(plan('KCl').notes[0].message).toBe('% is read as % w/v (grams per 100 mL)');
  });

  it('reads the options as they were when the plan was made', () => {
    const options: SolutionOptions = { concentration: '0.100 M', volume: '250.0 mL' };
    const plan = solutionPlan(options);
    options.volume = '1.000 L';
    expect(plan('NaCl').mass!.quantity.value.toString()).toBe(prepareSolution('NaCl', { concentration: '0.100 M', volume: '250.0 mL' }).mass!.quantity.value.toString());
  });
});

describe('solutionJsonLine: the text of JSON.stringify(solutionJson(…)), written directly', () => {
  it('for every reagent and option set read, in both roundings and both namings, with and without a line number', () => {
    let rows = 0;
    for (const options of OPTION_SETS) {
      const plan = solutionPlan(options);
      for (const text of REAGENTS) {
        let r;
        try {
          r = plan(text);
        } catch {
          continue;
        }
        for (const rounding of ['half-even', 'half-up'] as const) {
          // the batch hands the same options object to every row: the kept echoes must follow it
          const given = { ...options, concentration: options.concentration && ` ${options.concentration} ` };
          expect(solutionJsonLine(r, given, rounding)).toBe(JSON.stringify(solutionJson(r, given, rounding)));
          expect(withNaming(FLAG_NAMING, () => solutionJsonLine(r, options, rounding, 7))).toBe(JSON.stringify({ line: 7, ...withNaming(FLAG_NAMING, () => solutionJson(r, options, rounding)) }));
          rows++;
        }
      }
    }
    expect(rows).toBeGreaterThan(100);
  });

  it('echoes the options as they are now, when the same options object is changed between rows', () => {
    const given: Partial<SolutionOptions> = { concentration: '0.100 M', volume: '250.0 mL' };
    const r = prepareSolution('NaCl', { concentration: '0.100 M', volume: '250.0 mL' });
    expect(solutionJsonLine(r, given)).toContain('"volume":"250.0 mL"');
    given.volume = '1.000 L';
    expect(solutionJsonLine(r, given)).toBe(JSON.stringify(solutionJson(r, given)));
  });
});
